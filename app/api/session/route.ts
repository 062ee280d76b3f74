import { getSession, loadUser } from "@/lib/auth/current-user";
import { checkCredentials } from "@/lib/auth/sign-in";
import { signInSchema } from "@/lib/validation/auth";
import { handle, json, parseJson } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

function publicUser(u: NonNullable<Awaited<ReturnType<typeof loadUser>>>) {
  return { id: u.id, name: u.name, email: u.email, role: u.role, teamName: u.teamName };
}

/** The signed-in user, or `{ user: null }`. */
export const GET = handle(async () => {
  const session = await getSession();
  const user = await loadUser(session.userId);
  return json({ user: user ? publicUser(user) : null });
});

/** Sign in: 200 with the user, 400 bad input, 401 wrong credentials, 429 locked. */
export const POST = handle(async (req) => {
  const { email, password } = await parseJson(req, signInSchema, 10_000);
  const userId = await checkCredentials(email, password);
  const user = await loadUser(userId);
  if (!user) return json({ error: "invalid_credentials", message: "That e-mail and password do not match an active account." }, 401);
  const session = await getSession();
  session.userId = user.id;
  await session.save();
  await audit({ teamId: user.teamId, actorId: user.id, action: "sign_in", target: `user:${user.id}` });
  return json({ user: publicUser(user) });
});

/** Sign out. */
export const DELETE = handle(async () => {
  const session = await getSession();
  session.destroy();
  return json({ ok: true });
});
