import * as v from "valibot";
import { requireApiUser } from "@/lib/auth/dal";
import { addComment, listComments } from "@/lib/db/queries/comments";
import { handle, idParam, json, parseJson, parseQuery } from "@/lib/server/http";
import { commentSchema } from "@/lib/validation/team-work";
import { nodeIdSchema } from "@/lib/validation/tour";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

const listQuery = v.object({ nodeId: v.optional(nodeIdSchema) });

/** The tour's comments, oldest first: `{ items, total }`; `?nodeId=` keeps those pinned to one node. */
export const GET = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const q = parseQuery(req, listQuery);
  return json(await listComments(user, id, q.nodeId));
});

/** Post `{ body, nodeId? }` (lead, designer, analyst). @-mentioned members get an e-mail. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const input = await parseJson(req, commentSchema, 40_000);
  return json(await addComment(user, id, input), 201);
});
