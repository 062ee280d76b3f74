/**
 * Review transitions (DESIGN.md "Review flow"). Each one, in one transaction: bumps the tour's
 * version (guarded against a concurrent writer), writes a TourRevision whose note names the
 * transition and carries the comment, stores the comment as a Comment, writes an AuditEvent.
 * After the commit it e-mails the people concerned through the mailer:
 *   submit → the team's active leads;
 *   return → the tour's owner and whoever submitted it;
 *   baseline, reopen → the owner, the submitter and the team's other active leads.
 * The actor is never mailed about their own action.
 */
import "server-only";
import { Op } from "sequelize";
import { sequelize } from "@/lib/db/sequelize";
import { AuditEvent, Comment, Tour, TourRevision, User } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { HttpError, badRequest, forbidden } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";
import { sendMail } from "@/lib/mail/mailer";
import { appUrl } from "@/lib/env";
import { TRANSITIONS, wrongStateMessage, type ReviewAction } from "@/lib/tours/review-flow";
import { getTourDetail, type TourDetail } from "./tours";
import { teamTour } from "./revisions";

export interface ReviewResult {
  id: number;
  status: Tour["status"];
  version: number;
  /** E-mail addresses that were notified. */
  notified: string[];
  tour: TourDetail;
}

async function lastSubmitterId(teamId: number, tourId: number): Promise<number | null> {
  const e = await AuditEvent.findOne({ where: { teamId, action: "tour.review.submit", target: `tour:${tourId}` }, order: [["at", "DESC"], ["id", "DESC"]] });
  return e?.actorId ?? null;
}

async function recipients(user: CurrentUser, t: Tour, action: ReviewAction): Promise<User[]> {
  const ids = new Set<number>();
  const leads = async () => (await User.findAll({ where: { teamId: user.teamId, role: "lead", active: true } })).forEach((u) => ids.add(u.id));
  if (action === "submit") await leads();
  else {
    ids.add(t.ownerId as number);
    const submitter = await lastSubmitterId(user.teamId, t.id);
    if (submitter) ids.add(submitter);
    if (action !== "return") await leads();
  }
  ids.delete(user.id);
  if (ids.size === 0) return [];
  return User.findAll({ where: { id: { [Op.in]: [...ids] }, teamId: user.teamId, active: true }, order: [["id", "ASC"]] });
}

export async function reviewTour(
  user: CurrentUser,
  tourId: number,
  input: { action: ReviewAction; comment?: string; version: number },
): Promise<ReviewResult> {
  const t = await teamTour(user, tourId);
  const tr = TRANSITIONS[input.action];
  if (!can(user.role, tr.permission)) {
    throw forbidden(tr.permission === "review:decide" ? `Only a lead may ${input.action} a tour.` : "Only a lead or a designer may submit a tour for review.");
  }
  const comment = input.comment?.trim() || undefined;
  if (tr.commentRequired && !comment) {
    throw badRequest(`A comment is required to ${input.action} a tour: say what needs to change.`, [{ path: "comment", message: `a comment is required to ${input.action}` }]);
  }
  const wrong = wrongStateMessage(input.action, t.status);
  if (wrong) throw new HttpError(409, "wrong_state", wrong, { status: t.status, version: t.version });
  if (input.version !== t.version) {
    throw new HttpError(409, "stale_version", `This tour changed after you opened it (you saw version ${input.version}, the current one is ${t.version}). Reload and try again.`, {
      status: t.status,
      version: t.version,
    });
  }

  const nextVersion = t.version + 1;
  const note = comment ? `${tr.past}: ${comment}` : tr.past;
  await sequelize.transaction(async (transaction) => {
    const [n] = await Tour.update({ status: tr.to, version: nextVersion }, { where: { id: t.id, version: t.version, status: t.status }, transaction });
    if (n !== 1) throw new HttpError(409, "stale_version", "Someone changed this tour at the same moment; reload and try again.");
    const last = await TourRevision.findOne({ where: { tourId: t.id }, order: [["version", "DESC"], ["id", "DESC"]], transaction });
    const summary = { ...(last ? (JSON.parse(last.summaryJson) as Record<string, unknown>) : {}), name: t.name, status: tr.to };
    await TourRevision.create({ tourId: t.id, version: nextVersion, specJson: t.specJson, summaryJson: JSON.stringify(summary), authorId: user.id, note: note.slice(0, 2000) }, { transaction });
    if (comment) await Comment.create({ tourId: t.id, authorId: user.id, body: `${capitalize(tr.past)}: ${comment}`, nodeId: null }, { transaction });
    await audit(
      { teamId: user.teamId, actorId: user.id, action: `tour.review.${input.action}`, target: `tour:${t.id}`, detail: { from: t.status, to: tr.to, version: nextVersion, comment: comment ?? null } },
      transaction,
    );
  });

  const people = await recipients(user, t, input.action);
  const link = `${appUrl()}/tours/${t.id}`;
  for (const p of people) {
    const subject = input.action === "submit" ? `Review requested: ${t.name}` : `${t.name} was ${tr.past}`;
    const text =
      `Hello ${p.name},\n\n` +
      `${user.name} ${tr.past} the tour "${t.name}" (now ${tr.to.replace("_", " ")}, version ${nextVersion}).\n` +
      (comment ? `\nComment:\n${comment}\n` : "") +
      `\nOpen the tour: ${link}\nDiscussion and review: ${link}/discussion\n\n` +
      `Results in Gybe are preliminary patched-conic design; verify with high-fidelity navigation software.\n`;
    await sendMail({ teamId: user.teamId, to: p.email, subject, text });
  }

  return { id: t.id, status: tr.to, version: nextVersion, notified: people.map((p) => p.email), tour: await getTourDetail(user, t.id) };
}

function capitalize(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
