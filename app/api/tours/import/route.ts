import { requireApiUser } from "@/lib/auth/dal";
import { createTour } from "@/lib/db/queries/tours";
import { HttpError, handle, json, parseWith } from "@/lib/server/http";
import { readUploadText } from "@/lib/server/upload";
import { TOUR_FILE_MAX_BYTES, tourImportSchemaFor, tourImportWrappedSchema } from "@/lib/files/tour-json";
import type { StoredTour } from "@/lib/validation/tour";
import { tdbSecondsToIso } from "@/lib/astro/time";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Import a tour from JSON (lead, designer): `{ name?, tour }`, an exported tour file, or a bare
 * stored tour — as the body or as the `file` field of a multipart form. Validated with the one
 * stored-tour schema; bodies missing from the team's catalog answer 400. Creates a new tour
 * (evaluated on the server, with a revision and an audit event).
 */
export const POST = handle(async (req) => {
  const user = await requireApiUser("tour:create");
  const text = await readUploadText(req, TOUR_FILE_MAX_BYTES);
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    throw new HttpError(400, "invalid_json", "The file is not valid JSON.");
  }
  const schema = tourImportSchemaFor(body);
  let name: string | undefined;
  let tour: StoredTour;
  if (schema === tourImportWrappedSchema) {
    const r = parseWith(tourImportWrappedSchema, body, "tour file");
    name = r.name;
    tour = r.tour;
  } else {
    tour = parseWith(schema, body, "tour file") as StoredTour;
  }
  const fallback = `Imported tour (launch ${tdbSecondsToIso(tour.nodes[0]!.epoch).slice(0, 10)})`;
  return json(await createTour(user, { name: name ?? fallback, tour }, "imported from a file"), 201);
});
