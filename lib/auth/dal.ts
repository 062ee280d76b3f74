/**
 * The data-access layer for the session: pages and route handlers ask here who is signed in.
 * `getCurrentUser` is cached per request (React `cache`).
 */
import "server-only";
import { cache } from "react";
import { redirect } from "next/navigation";
import { getSession, loadUser, type CurrentUser } from "./current-user";
import { can, type Action } from "./roles";
import { forbidden, unauthorized } from "@/lib/server/http";

export type { CurrentUser };

export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await getSession();
  return loadUser(session.userId);
});

/** For pages: the signed-in user, or a redirect to /sign-in. */
export async function requireUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  return user;
}

/** For pages that need a role: the user, or a redirect to /tours when the role cannot. */
export async function requirePageRole(action: Action): Promise<CurrentUser> {
  const user = await requireUser();
  if (!can(user.role, action)) redirect("/tours?denied=1");
  return user;
}

/**
 * For route handlers and server actions: the one shared role check.
 * 401 when nobody is signed in, 403 when the role may not do `action`.
 */
export async function requireApiUser(action: Action = "tour:read"): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw unauthorized();
  if (!can(user.role, action)) throw forbidden();
  return user;
}
