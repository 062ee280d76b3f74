import { requireApiUser } from "@/lib/auth/dal";
import { importBodies } from "@/lib/db/queries/catalog";
import { handle, json } from "@/lib/server/http";
import { readUploadText } from "@/lib/server/upload";
import { BODY_CSV_MAX_BYTES } from "@/lib/files/bodies-csv";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Upload a bodies CSV (text/csv body, or multipart form-data with a `file` field), lead or
 * designer. All rows or none: any bad row answers 400 listing every bad line and its reasons.
 */
export const POST = handle(async (req) => {
  const user = await requireApiUser("catalog:edit");
  const text = await readUploadText(req, BODY_CSV_MAX_BYTES);
  return json(await importBodies(user, text), 201);
});
