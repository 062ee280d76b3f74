import { requireApiUser } from "@/lib/auth/dal";
import { createInvitation, listInvitations } from "@/lib/db/queries/team-admin";
import { handle, json, parseJson } from "@/lib/server/http";
import { invitationSchema } from "@/lib/validation/team-work";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The team's invitations (lead only): `{ items, total }`. */
export const GET = handle(async () => {
  const user = await requireApiUser("team:manage");
  return json(await listInvitations(user));
});

/** Invite `{ email, role }` (lead only): e-mails a one-time link valid 7 days; 409 when the address has an account. */
export const POST = handle(async (req) => {
  const user = await requireApiUser("team:manage");
  const input = await parseJson(req, invitationSchema, 10_000);
  const { invitation } = await createInvitation(user, input);
  return json({ invitation }, 201);
});
