import { requireApiUser } from "@/lib/auth/dal";
import { reviewTour } from "@/lib/db/queries/review";
import { handle, idParam, json, parseJson } from "@/lib/server/http";
import { reviewSchema } from "@/lib/validation/team-work";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

/**
 * A review transition `{ action: submit | baseline | return | reopen, comment?, version }`.
 * 403 wrong role, 400 missing required comment, 409 wrong status or stale version.
 */
export const POST = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const input = await parseJson(req, reviewSchema, 20_000);
  return json(await reviewTour(user, id, input));
});
