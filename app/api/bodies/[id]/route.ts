import { requireApiUser } from "@/lib/auth/dal";
import { deleteBody, getCatalogBody, updateBody } from "@/lib/db/queries/catalog";
import { handle, idParam, json, parseJson } from "@/lib/server/http";
import { bodyInputSchema } from "@/lib/validation/body";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (_req, { params }) => {
  const user = await requireApiUser("tour:read");
  return json(await getCatalogBody(user, idParam((await params).id, "Body")));
});

/** Edit name and elements (lead, designer); the body id `custom:<slug>` stays the same. */
export const PATCH = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Body");
  // Team scoping first (another team's id is 404 even for a viewer), then the role.
  await getCatalogBody(user, id);
  await requireApiUser("catalog:edit");
  const input = await parseJson(req, bodyInputSchema, 16_000);
  return json(await updateBody(user, id, input));
});

/** Delete (lead, designer); 409 with the tours' names while a tour uses the body. */
export const DELETE = handle<Ctx>(async (_req, { params }) => {
  const user = await requireApiUser("tour:read");
  const id = idParam((await params).id, "Body");
  await getCatalogBody(user, id);
  await requireApiUser("catalog:edit");
  await deleteBody(user, id);
  return json({ ok: true });
});
