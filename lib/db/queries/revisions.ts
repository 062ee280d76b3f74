/**
 * Revisions of a tour: the list (author, note, time, stored summary), the diff between two of
 * them, and restoring an older one as a new revision (through updateTour, so it re-evaluates,
 * checks the role and the version, and refuses a baselined tour).
 */
import "server-only";
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { Tour, TourRevision, User } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { forbidden, notFound } from "@/lib/server/http";
import { diffTours, type RevisionSummary, type TourDiff } from "@/lib/tours/diff";
import { parseStored, updateTour, type TourDetail } from "./tours";

export interface RevisionItem {
  id: number;
  version: number;
  authorId: number | null;
  authorName: string | null;
  note: string | null;
  createdAt: string;
  summary: RevisionSummary;
}

/** The caller's team's tour, or 404 (another team's tour is "not found", never "forbidden"). */
export async function teamTour(user: CurrentUser, id: number): Promise<Tour> {
  const t = await Tour.findOne({ where: { id, teamId: user.teamId }, include: [{ model: User, as: "owner", attributes: ["id", "name", "email", "active"] }] });
  if (!t) throw notFound("Tour");
  return t;
}

function parseSummary(json: string): RevisionSummary {
  try {
    const s = JSON.parse(json) as unknown;
    return s && typeof s === "object" ? (s as RevisionSummary) : {};
  } catch {
    return {};
  }
}

function toItem(r: TourRevision): RevisionItem {
  const author = (r as unknown as { author?: User }).author;
  return {
    id: r.id,
    version: r.version,
    authorId: r.authorId,
    authorName: author?.name ?? null,
    note: r.note,
    createdAt: r.createdAt.toISOString(),
    summary: parseSummary(r.summaryJson),
  };
}

export async function listRevisions(
  user: CurrentUser,
  tourId: number,
  page: { limit?: number; offset?: number } = {},
): Promise<{ items: RevisionItem[]; total: number; currentVersion: number; status: Tour["status"] }> {
  const t = await teamTour(user, tourId);
  const { rows, count } = await TourRevision.findAndCountAll({
    where: { tourId: t.id },
    include: [{ model: User, as: "author", attributes: ["id", "name"] }],
    order: [["version", "DESC"], ["id", "DESC"]],
    limit: Math.max(1, Math.min(500, page.limit ?? 200)),
    offset: page.offset ?? 0,
  });
  return { items: rows.map(toItem), total: count, currentVersion: t.version, status: t.status };
}

async function revisionOf(tourId: number, version: number): Promise<TourRevision> {
  // Several rows can share a version only in data written before versions were unique; take the newest.
  const r = await TourRevision.findOne({
    where: { tourId, version },
    include: [{ model: User, as: "author", attributes: ["id", "name"] }],
    order: [["id", "DESC"]],
  });
  if (!r) throw notFound(`Revision ${version}`);
  return r;
}

export interface RevisionCompare {
  from: RevisionItem;
  to: RevisionItem;
  diff: TourDiff;
}

/** The diff from version `a` to version `b` of the tour (either order is allowed). */
export async function compareRevisions(user: CurrentUser, tourId: number, a: number, b: number): Promise<RevisionCompare> {
  const t = await teamTour(user, tourId);
  const [ra, rb] = [await revisionOf(t.id, a), await revisionOf(t.id, b)];
  const from = toItem(ra);
  const to = toItem(rb);
  const diff = diffTours(parseStored(ra.specJson), parseStored(rb.specJson), from.summary, to.summary);
  return { from, to, diff };
}

/**
 * Restore the tour JSON of `restoreVersion` as a new revision (the name stays as it is now).
 * Lead and designer only; `version` is the version the caller is looking at (409 when stale).
 */
export async function restoreRevision(user: CurrentUser, tourId: number, restoreVersion: number, version: number): Promise<TourDetail> {
  const t = await teamTour(user, tourId);
  if (!can(user.role, "tour:create")) throw forbidden("Only a lead or a designer may restore a revision.");
  const r = await revisionOf(t.id, restoreVersion);
  return updateTour(user, t.id, { version, tour: parseStored(r.specJson), note: `restored version ${restoreVersion}` });
}
