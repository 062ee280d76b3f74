import * as v from "valibot";
import { requireApiUser } from "@/lib/auth/dal";
import { listAudit } from "@/lib/db/queries/team";
import { handle, json, parseQuery } from "@/lib/server/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const query = v.object({
  limit: v.optional(v.pipe(v.string(), v.regex(/^\d{1,3}$/, "limit must be 1–500"), v.transform(Number), v.minValue(1, "limit must be 1–500"), v.maxValue(500, "limit must be 1–500"))),
});

/** The team's audit trail, newest first (lead only): `{ items, total }`. */
export const GET = handle(async (req) => {
  const user = await requireApiUser("team:manage");
  const q = parseQuery(req, query);
  return json(await listAudit(user, q.limit ?? 200));
});
