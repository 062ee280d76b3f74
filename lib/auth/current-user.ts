/**
 * Load the signed-in user from the session cookie. The cookie carries only the user id, so a
 * role change or deactivation takes effect at the next request.
 */
import "server-only";
import { cookies } from "next/headers";
import { getIronSession } from "iron-session";
import { sessionOptions, type SessionData } from "./session";
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { User, Team } from "@/models";
import type { Role } from "./roles";

export interface CurrentUser {
  id: number;
  name: string;
  email: string;
  role: Role;
  teamId: number;
  teamName: string;
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}

export async function loadUser(userId: number | undefined): Promise<CurrentUser | null> {
  if (!userId) return null;
  const user = await User.findByPk(userId, { include: [{ model: Team, as: "team" }] });
  if (!user || !user.active) return null;
  const team = (user as unknown as { team?: Team }).team;
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    teamId: user.teamId as number,
    teamName: team?.name ?? "",
  };
}
