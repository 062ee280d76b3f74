import * as v from "valibot";
import { requireApiUser } from "@/lib/auth/dal";
import { getTourDetail } from "@/lib/db/queries/tours";
import { HttpError, badRequest, handle, idParam, parseQuery } from "@/lib/server/http";
import { exportTour, ExportError } from "@/lib/tours/export";
import { OEM_MAX_STEP_DAYS, OEM_MIN_STEP_DAYS } from "@/lib/files/oem";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

const querySchema = v.object({
  format: v.optional(v.picklist(["json", "csv", "oem"], "format must be json, csv or oem"), "json"),
  step: v.optional(v.pipe(v.string(), v.regex(/^\d{1,4}(\.\d{1,6})?$/, "step must be a number of days, e.g. 1 or 0.5"))),
});

/**
 * Download a tour (any role): `format=json` (the tour file, importable back), `csv` (node table)
 * or `oem` (CCSDS Orbit Ephemeris Message of the trajectory, sampled every `step` days).
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Tour");
  const q = parseQuery(req, querySchema);
  const stepDays = q.step === undefined ? 1 : Number(q.step);
  if (q.format === "oem" && !(stepDays >= OEM_MIN_STEP_DAYS && stepDays <= OEM_MAX_STEP_DAYS)) {
    throw badRequest(`step must be between ${OEM_MIN_STEP_DAYS} and ${OEM_MAX_STEP_DAYS} days (got ${q.step}).`, [{ path: "step", message: `${OEM_MIN_STEP_DAYS}–${OEM_MAX_STEP_DAYS} days` }]);
  }
  const detail = await getTourDetail(user, id);
  let file;
  try {
    file = exportTour(detail, q.format, { stepDays });
  } catch (err) {
    if (err instanceof ExportError) {
      if (err.kind === "too_many_lines") throw badRequest(err.message, [{ path: "step", message: err.message }]);
      throw new HttpError(409, err.kind, err.message);
    }
    throw err;
  }
  return new Response(file.body, {
    status: 200,
    headers: {
      "content-type": file.contentType,
      "content-disposition": `attachment; filename="${file.filename}"`,
      "cache-control": "no-store",
    },
  });
});
