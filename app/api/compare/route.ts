import { requireApiUser } from "@/lib/auth/dal";
import { getTourDetail } from "@/lib/db/queries/tours";
import { badRequest, handle, json } from "@/lib/server/http";
import { COMPARE_MAX, COMPARE_MIN, compareItemOf, parseCompareIds } from "@/lib/tours/compare";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Compare 2–6 tours of the team: `{ items, total }` in the order asked, each with its summary,
 * per-flyby margins and Δv budget. Any role. An id of another team (or none) answers 404.
 */
export const GET = handle(async (req) => {
  const user = await requireApiUser("tour:read");
  const raw = new URL(req.url).searchParams.get("ids");
  const ids = parseCompareIds(raw);
  if (!ids) throw badRequest("ids must be a comma-separated list of tour ids, e.g. ids=3,7", [{ path: "ids", message: "comma-separated tour ids" }]);
  if (ids.length < COMPARE_MIN || ids.length > COMPARE_MAX) {
    throw badRequest(`Compare takes ${COMPARE_MIN}–${COMPARE_MAX} different tours (got ${ids.length}).`, [{ path: "ids", message: `${COMPARE_MIN}–${COMPARE_MAX} tour ids` }]);
  }
  const items = [];
  for (const id of ids) items.push(compareItemOf(await getTourDetail(user, id)));
  return json({ items, total: items.length });
});
