import { requireApiUser } from "@/lib/auth/dal";
import { deleteTour, getTourDetail, updateTour } from "@/lib/db/queries/tours";
import { handle, idParam, json, parseJson } from "@/lib/server/http";
import { patchTourSchema } from "@/lib/validation/tour";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (_req, { params }) => {
  const user = await requireApiUser("tour:read");
  return json(await getTourDetail(user, idParam((await params).id, "Tour")));
});

/** Save: `version` is the version the caller edited; a stale one answers 409 with the current tour. */
export const PATCH = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const input = await parseJson(req, patchTourSchema);
  return json(await updateTour(user, id, input));
});

export const DELETE = handle<Ctx>(async (_req, { params }) => {
  const user = await requireApiUser("tour:read");
  await deleteTour(user, idParam((await params).id, "Tour"));
  return json({ ok: true });
});
