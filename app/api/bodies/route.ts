import { requireApiUser } from "@/lib/auth/dal";
import { createBody, listCatalog } from "@/lib/db/queries/catalog";
import { handle, json, parseJson } from "@/lib/server/http";
import { bodyInputSchema } from "@/lib/validation/body";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The team's custom small bodies: `{ items, total }`, each with the tours that use it. */
export const GET = handle(async () => {
  const user = await requireApiUser("tour:read");
  return json(await listCatalog(user));
});

/** Add a body (lead, designer). Its id `custom:<slug>` comes from the name; a taken id answers 409. */
export const POST = handle(async (req) => {
  const user = await requireApiUser("catalog:edit");
  const input = await parseJson(req, bodyInputSchema, 16_000);
  return json(await createBody(user, input), 201);
});
