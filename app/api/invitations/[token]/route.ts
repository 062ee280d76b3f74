import { getSession, loadUser } from "@/lib/auth/current-user";
import { acceptInvitation, publicInvitation } from "@/lib/db/queries/team-admin";
import { handle, json, parseJson } from "@/lib/server/http";
import { acceptInvitationSchema } from "@/lib/validation/team-work";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ token: string }> };

/** Public: the team, e-mail and role of a live invitation; 404 when unknown, expired or used. */
export const GET = handle<Ctx>(async (_req, { params }) => {
  return json(await publicInvitation((await params).token));
});

/** Public: accept with `{ name, password }`: creates the user, marks the link used, signs them in. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const token = (await params).token;
  await publicInvitation(token); // 404 before reading the body: a dead link says so first
  const input = await parseJson(req, acceptInvitationSchema, 10_000);
  const userId = await acceptInvitation(token, input);
  const session = await getSession();
  session.userId = userId;
  await session.save();
  const user = (await loadUser(userId))!;
  return json({ user: { id: user.id, name: user.name, email: user.email, role: user.role, teamName: user.teamName } }, 201);
});
