/**
 * Team management (lead only): change a member's role or deactivate them, invite people by
 * e-mail, and accept an invitation (public, by its one-time token).
 *
 * Invitation tokens are 32 random bytes (base64url); only their SHA-256 is stored. A link is
 * valid for 7 days and once. Inviting the same address again replaces its pending invitation.
 */
import "server-only";
import crypto from "node:crypto";
import { Op } from "sequelize";
import { sequelize } from "@/lib/db/sequelize";
import { Invitation, Team, User } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";
import type { Role } from "@/lib/auth/roles";
import { hashPassword } from "@/lib/auth/password";
import { HttpError, notFound } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";
import { sendMail } from "@/lib/mail/mailer";
import { appUrl } from "@/lib/env";
import { TOKEN_RE } from "@/lib/validation/team-work";
import type { MemberItem } from "./team";

export const INVITATION_DAYS = 7;

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token).digest("hex");
}

function memberOf(u: User): MemberItem {
  return { id: u.id, name: u.name, email: u.email, role: u.role, active: u.active, createdAt: u.createdAt.toISOString() };
}

/** Change role and/or active of a member of the caller's team. The last active lead stays a lead. */
export async function updateMember(lead: CurrentUser, userId: number, patch: { role?: Role; active?: boolean }): Promise<MemberItem> {
  let roleChange: { email: string; name: string; from: Role; to: Role } | null = null;
  const member = await sequelize.transaction(async (transaction) => {
    const u = await User.findOne({ where: { id: userId, teamId: lead.teamId }, transaction });
    if (!u) throw notFound("Member");
    const nextRole = patch.role ?? u.role;
    const nextActive = patch.active ?? u.active;
    const losesLead = u.role === "lead" && u.active && (nextRole !== "lead" || !nextActive);
    if (losesLead) {
      const others = await User.count({ where: { teamId: lead.teamId, role: "lead", active: true, id: { [Op.ne]: u.id } }, transaction });
      if (others === 0) {
        throw new HttpError(
          409,
          "last_lead",
          u.id === lead.id
            ? "You are the team's last active lead: make someone else a lead before you change your own role or deactivate yourself."
            : "This is the team's last active lead: make someone else a lead first.",
        );
      }
    }
    const before = { role: u.role, active: u.active };
    if (nextRole === before.role && nextActive === before.active) return memberOf(u);
    await u.update({ role: nextRole, active: nextActive }, { transaction });
    await audit(
      {
        teamId: lead.teamId,
        actorId: lead.id,
        action: nextActive !== before.active ? (nextActive ? "member.reactivate" : "member.deactivate") : "member.role",
        target: `user:${u.id}`,
        detail: { email: u.email, from: before, to: { role: nextRole, active: nextActive } },
      },
      transaction,
    );
    if (nextRole !== before.role && nextActive && u.id !== lead.id) roleChange = { email: u.email, name: u.name, from: before.role, to: nextRole };
    return memberOf(u);
  });
  // Tell the member, after the commit (a mail failure must not undo the change).
  const rc = roleChange as { email: string; name: string; from: Role; to: Role } | null;
  if (rc) {
    await sendMail({
      teamId: lead.teamId,
      to: rc.email,
      subject: `Your role on ${lead.teamName} is now ${rc.to}`,
      text: `Hello ${rc.name},\n\n${lead.name} changed your role on ${lead.teamName} in Gybe from ${rc.from} to ${rc.to}.\nOpen Gybe: ${appUrl()}/tours\n`,
    });
  }
  return member;
}

export type InvitationState = "pending" | "accepted" | "expired";

export interface InvitationItem {
  id: number;
  email: string;
  role: Role;
  state: InvitationState;
  expiresAt: string;
  createdAt: string;
  acceptedAt: string | null;
  invitedByName: string | null;
}

function stateOf(i: Invitation, now = Date.now()): InvitationState {
  if (i.acceptedAt) return "accepted";
  return i.expiresAt.getTime() <= now ? "expired" : "pending";
}

function invitationOf(i: Invitation, names: Map<number, string>): InvitationItem {
  return {
    id: i.id,
    email: i.email,
    role: i.role,
    state: stateOf(i),
    expiresAt: i.expiresAt.toISOString(),
    createdAt: i.createdAt.toISOString(),
    acceptedAt: i.acceptedAt ? i.acceptedAt.toISOString() : null,
    invitedByName: i.invitedById ? (names.get(i.invitedById) ?? null) : null,
  };
}

/** The team's invitations, newest first (pending ones and the last 30 days of the others). */
export async function listInvitations(lead: CurrentUser): Promise<{ items: InvitationItem[]; total: number }> {
  const since = new Date(Date.now() - 30 * 86400_000);
  const rows = await Invitation.findAll({
    where: { teamId: lead.teamId, [Op.or]: [{ acceptedAt: null, expiresAt: { [Op.gt]: new Date() } }, { createdAt: { [Op.gte]: since } }] },
    order: [["createdAt", "DESC"], ["id", "DESC"]],
    limit: 200,
  });
  const users = await User.findAll({ where: { teamId: lead.teamId }, attributes: ["id", "name"] });
  const names = new Map(users.map((u) => [u.id, u.name]));
  const items = rows.map((r) => invitationOf(r, names));
  return { items, total: items.length };
}

export async function createInvitation(lead: CurrentUser, input: { email: string; role: Role }): Promise<{ invitation: InvitationItem; link: string }> {
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) {
    throw new HttpError(409, "email_taken", existing.teamId === lead.teamId ? `${input.email} is already a member of your team.` : `${input.email} already has a Gybe account.`, {
      issues: [{ path: "email", message: "this address already has an account" }],
    });
  }
  const token = crypto.randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86400_000);
  const inv = await sequelize.transaction(async (transaction) => {
    // One live link per address: an older pending invitation stops working.
    await Invitation.update(
      { expiresAt: new Date() },
      { where: { teamId: lead.teamId, email: input.email, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction },
    );
    const created = await Invitation.create(
      { teamId: lead.teamId, email: input.email, role: input.role, tokenHash: hashToken(token), expiresAt, acceptedAt: null, invitedById: lead.id },
      { transaction },
    );
    await audit({ teamId: lead.teamId, actorId: lead.id, action: "invitation.create", target: `invitation:${created.id}`, detail: { email: input.email, role: input.role } }, transaction);
    return created;
  });
  const link = `${appUrl()}/invite/${token}`;
  await sendMail({
    teamId: lead.teamId,
    to: input.email,
    subject: `${lead.name} invited you to ${lead.teamName} on Gybe`,
    text:
      `Hello,\n\n${lead.name} invited you to join ${lead.teamName} on Gybe as ${input.role}.\n\n` +
      `Set your name and password here (the link works once and expires on ${expiresAt.toISOString().slice(0, 10)}):\n${link}\n\n` +
      `If you did not expect this, ignore this message.\n`,
  });
  return { invitation: invitationOf(inv, new Map([[lead.id, lead.name]])), link };
}

/** Revoke a pending invitation of the caller's team (its link stops working). */
export async function revokeInvitation(lead: CurrentUser, id: number): Promise<void> {
  const inv = await Invitation.findOne({ where: { id, teamId: lead.teamId } });
  if (!inv) throw notFound("Invitation");
  if (stateOf(inv) !== "pending") throw new HttpError(409, "not_pending", `This invitation is already ${stateOf(inv)}.`);
  await inv.update({ expiresAt: new Date() });
  await audit({ teamId: lead.teamId, actorId: lead.id, action: "invitation.revoke", target: `invitation:${inv.id}`, detail: { email: inv.email } });
}

export interface InvitationLookup {
  state: "pending" | "accepted" | "expired" | "unknown";
  teamName?: string;
  email?: string;
  role?: Role;
  expiresAt?: string;
}

/** What the invite page shows for a token (no authentication: the token is the secret). */
export async function lookupInvitation(token: string): Promise<InvitationLookup & { invitation?: Invitation }> {
  if (!TOKEN_RE.test(token)) return { state: "unknown" };
  // No `include` here: the association has no alias, and a minified production build can give two
  // model classes the same name (Sequelize's default alias), which makes the join ambiguous.
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!inv) return { state: "unknown" };
  const team = await Team.findByPk(inv.teamId as number, { attributes: ["id", "name"] });
  return { state: stateOf(inv), teamName: team?.name ?? "", email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString(), invitation: inv };
}

const GONE: Record<Exclude<InvitationLookup["state"], "pending">, [string, string]> = {
  unknown: ["not_found", "This invitation link is not valid. Ask your team lead for a new one."],
  expired: ["invitation_expired", "This invitation has expired. Ask your team lead for a new one."],
  accepted: ["invitation_used", "This invitation has already been used. Sign in instead."],
};

/** The public view of a live invitation, or 404 (unknown, expired and used links alike). */
export async function publicInvitation(token: string): Promise<{ teamName: string; email: string; role: Role; expiresAt: string }> {
  const l = await lookupInvitation(token);
  if (l.state !== "pending") throw new HttpError(404, GONE[l.state][0], GONE[l.state][1]);
  return { teamName: l.teamName!, email: l.email!, role: l.role!, expiresAt: l.expiresAt! };
}

/** Create the invited user (bcrypt hash), mark the invitation used; returns the new user's id. */
export async function acceptInvitation(token: string, input: { name: string; password: string }): Promise<number> {
  const l = await lookupInvitation(token);
  if (l.state !== "pending" || !l.invitation) throw new HttpError(404, GONE[l.state === "pending" ? "unknown" : l.state][0], GONE[l.state === "pending" ? "unknown" : l.state][1]);
  const inv = l.invitation;
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    // Claim the invitation first: a second use at the same moment finds it taken.
    const [n] = await Invitation.update({ acceptedAt: new Date() }, { where: { id: inv.id, acceptedAt: null }, transaction });
    if (n !== 1) throw new HttpError(404, GONE.accepted[0], GONE.accepted[1]);
    if (await User.findOne({ where: { email: inv.email }, transaction })) {
      throw new HttpError(409, "email_taken", `${inv.email} already has a Gybe account. Sign in instead.`);
    }
    const u = await User.create({ teamId: inv.teamId as number, email: inv.email, name: input.name, role: inv.role, passwordHash }, { transaction });
    await audit({ teamId: inv.teamId as number, actorId: u.id, action: "invitation.accept", target: `user:${u.id}`, detail: { email: u.email, role: u.role, invitationId: inv.id } }, transaction);
    return u.id;
  });
}
