/**
 * Comments on a tour, optionally pinned to a node (by its stable id). Posting a comment that
 * @-mentions team members e-mails them (rule in lib/team/mentions.ts). The author or a lead may
 * delete a comment.
 */
import "server-only";
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { Comment, User } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { badRequest, forbidden, notFound } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";
import { sendMail } from "@/lib/mail/mailer";
import { appUrl } from "@/lib/env";
import { findMentions } from "@/lib/team/mentions";
import { parseStored } from "./tours";
import { teamTour } from "./revisions";

export interface CommentItem {
  id: number;
  authorId: number;
  authorName: string | null;
  body: string;
  nodeId: string | null;
  createdAt: string;
  /** The caller may delete it (author or lead). */
  canDelete: boolean;
}

function toItem(c: Comment, user: CurrentUser): CommentItem {
  const author = (c as unknown as { author?: User }).author;
  return {
    id: c.id,
    authorId: c.authorId,
    authorName: author?.name ?? null,
    body: c.body,
    nodeId: c.nodeId,
    createdAt: c.createdAt.toISOString(),
    canDelete: can(user.role, "comment") && (c.authorId === user.id || user.role === "lead"),
  };
}

export async function listComments(user: CurrentUser, tourId: number, nodeId?: string): Promise<{ items: CommentItem[]; total: number }> {
  const t = await teamTour(user, tourId);
  const where: Record<string, unknown> = { tourId: t.id };
  if (nodeId) where.nodeId = nodeId;
  const rows = await Comment.findAll({ where, include: [{ model: User, as: "author", attributes: ["id", "name"] }], order: [["createdAt", "ASC"], ["id", "ASC"]] });
  return { items: rows.map((c) => toItem(c, user)), total: rows.length };
}

export async function addComment(
  user: CurrentUser,
  tourId: number,
  input: { body: string; nodeId?: string | null },
): Promise<{ comment: CommentItem; mentioned: { id: number; name: string }[] }> {
  const t = await teamTour(user, tourId);
  if (!can(user.role, "comment")) throw forbidden("Your role may read tours but not comment on them.");
  const nodeId = input.nodeId ?? null;
  if (nodeId !== null) {
    const tour = parseStored(t.specJson);
    if (!tour.nodes.some((n) => n.id === nodeId)) {
      throw badRequest(`nodeId: this tour has no node "${nodeId}".`, [{ path: "nodeId", message: `no node "${nodeId}" in this tour` }]);
    }
  }
  const c = await Comment.create({ tourId: t.id, authorId: user.id, body: input.body, nodeId });
  await audit({ teamId: user.teamId, actorId: user.id, action: "comment.create", target: `tour:${t.id}`, detail: { commentId: c.id, nodeId } });

  const members = await User.findAll({ where: { teamId: user.teamId, active: true }, attributes: ["id", "name", "email"] });
  const mentionedIds = findMentions(input.body, members.map((m) => ({ id: m.id, name: m.name, email: m.email }))).filter((id) => id !== user.id);
  const mentioned = mentionedIds.map((id) => members.find((m) => m.id === id)!);
  const link = `${appUrl()}/tours/${t.id}/discussion#comment-${c.id}`;
  for (const m of mentioned) {
    await sendMail({
      teamId: user.teamId,
      to: m.email,
      subject: `${user.name} mentioned you on ${t.name}`,
      text: `Hello ${m.name},\n\n${user.name} mentioned you in a comment on "${t.name}"${nodeId ? ` (node ${nodeId})` : ""}:\n\n${input.body}\n\nReply in Gybe: ${link}\n`,
    });
  }

  const withAuthor = (await Comment.findByPk(c.id, { include: [{ model: User, as: "author", attributes: ["id", "name"] }] }))!;
  return { comment: toItem(withAuthor, user), mentioned: mentioned.map((m) => ({ id: m.id, name: m.name })) };
}

export async function deleteComment(user: CurrentUser, tourId: number, commentId: number): Promise<void> {
  const t = await teamTour(user, tourId);
  const c = await Comment.findOne({ where: { id: commentId, tourId: t.id } });
  if (!c) throw notFound("Comment");
  if (!can(user.role, "comment") || (c.authorId !== user.id && user.role !== "lead")) {
    throw forbidden("Only the author or a lead may delete a comment.");
  }
  await c.destroy();
  await audit({ teamId: user.teamId, actorId: user.id, action: "comment.delete", target: `tour:${t.id}`, detail: { commentId, authorId: c.authorId } });
}
