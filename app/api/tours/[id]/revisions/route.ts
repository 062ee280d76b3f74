import { requireApiUser } from "@/lib/auth/dal";
import { compareRevisions, listRevisions, restoreRevision } from "@/lib/db/queries/revisions";
import { handle, idParam, json, parseJson, parseQuery } from "@/lib/server/http";
import { restoreSchema, revisionsQuerySchema } from "@/lib/validation/team-work";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

/**
 * The tour's revisions, newest first: `{ items, total, currentVersion, status }`.
 * With `?compare=a,b`: `{ from, to, diff }`, what changed from version a to version b.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const q = parseQuery(req, revisionsQuerySchema);
  if (q.compare) return json(await compareRevisions(user, id, q.compare[0], q.compare[1]));
  return json(await listRevisions(user, id, { limit: q.limit, offset: q.offset }));
});

/** Restore `{ restoreVersion, version }` as a new revision (lead, designer); 409 when `version` is stale. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const input = await parseJson(req, restoreSchema, 10_000);
  return json(await restoreRevision(user, id, input.restoreVersion, input.version), 201);
});
