import { requireApiUser } from "@/lib/auth/dal";
import { createTour, listTours } from "@/lib/db/queries/tours";
import { handle, json, parseJson, parseQuery } from "@/lib/server/http";
import { createTourSchema, tourListQuerySchema } from "@/lib/validation/tour";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The team's tours: `{ items, total }`, filtered and sorted by the query. */
export const GET = handle(async (req) => {
  const user = await requireApiUser("tour:read");
  const q = parseQuery(req, tourListQuerySchema);
  return json(await listTours(user, q));
});

/** Create a tour (lead, designer); the server evaluates it and stores the summary. */
export const POST = handle(async (req) => {
  const user = await requireApiUser("tour:create");
  const input = await parseJson(req, createTourSchema);
  return json(await createTour(user, input), 201);
});
