import "server-only";
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { MailMessage, User, AuditEvent } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";

export interface MemberItem {
  id: number;
  name: string;
  email: string;
  role: User["role"];
  active: boolean;
  createdAt: string;
}

export async function listMembers(user: CurrentUser): Promise<{ items: MemberItem[]; total: number }> {
  const rows = await User.findAll({ where: { teamId: user.teamId }, order: [["active", "DESC"], ["name", "ASC"]] });
  const items = rows.map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role, active: u.active, createdAt: u.createdAt.toISOString() }));
  return { items, total: items.length };
}

export interface OutboxItem {
  id: number;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  sentAt: string;
}

export async function listOutbox(user: CurrentUser, limit = 200): Promise<{ items: OutboxItem[]; total: number }> {
  const { rows, count } = await MailMessage.findAndCountAll({ where: { teamId: user.teamId }, order: [["sentAt", "DESC"], ["id", "DESC"]], limit });
  return {
    items: rows.map((m) => ({ id: m.id, to: m.to, subject: m.subject, text: m.text, html: m.html, sentAt: m.sentAt.toISOString() })),
    total: count,
  };
}

export interface AuditItem {
  id: number;
  actorName: string | null;
  action: string;
  target: string;
  detail: string | null;
  at: string;
}

export async function listAudit(user: CurrentUser, limit = 200): Promise<{ items: AuditItem[]; total: number }> {
  const { rows, count } = await AuditEvent.findAndCountAll({
    where: { teamId: user.teamId },
    include: [{ model: User, as: "actor", attributes: ["name"] }],
    order: [["at", "DESC"], ["id", "DESC"]],
    limit,
  });
  return {
    items: rows.map((a) => ({
      id: a.id,
      actorName: (a as unknown as { actor?: User }).actor?.name ?? null,
      action: a.action,
      target: a.target,
      detail: a.detail,
      at: a.at.toISOString(),
    })),
    total: count,
  };
}
