/**
 * Tours: every function takes the signed-in user and scopes by team and role.
 * Another team's tour answers 404, never 403.
 */
import "server-only";
import { Op, type Order, type WhereOptions } from "sequelize";
import * as v from "valibot";
import { sequelize } from "@/lib/db/sequelize";
import { Tour, TourRevision, User } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { HttpError, badRequest, forbidden, notFound } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";
import { teamBodies } from "./bodies";
import { evaluateStoredTour, unknownBodies, type TourSummary } from "@/lib/tours/evaluate";
import {
  PLANETS,
  defaultStoredTour,
  storedTourSchema,
  type StoredTour,
  type createTourSchema,
  type patchTourSchema,
  type tourListQuerySchema,
} from "@/lib/validation/tour";
import type { CustomBodySpec, TourResult } from "@/lib/astro/types";

export interface TourListItem extends TourSummary {
  id: number;
  name: string;
  status: Tour["status"];
  version: number;
  ownerId: number;
  ownerName: string;
  chain: string[];
  ephemeris: string;
  updatedAt: string;
}

export interface TourDetail extends TourListItem {
  tour: StoredTour;
  result: TourResult | null;
  createdAt: string;
  /** The team's small bodies, for the client-side ephemeris (EphemerisSpec.customBodies). */
  customBodies: CustomBodySpec[];
  /** Bodies a chain may use: the planets and the team's small bodies. */
  bodyOptions: { id: string; name: string }[];
}

function summaryOf(t: Tour): TourSummary {
  return {
    launchTdbS: t.launchTdbS,
    arrivalTdbS: t.arrivalTdbS,
    c3Km2S2: t.c3Km2S2,
    launchVinfKmS: t.launchVinfKmS,
    totalDvKmS: t.totalDvKmS,
    tofS: t.tofS,
    arrivalVinfKmS: t.arrivalVinfKmS,
    minFlybyMarginKm: t.minFlybyMarginKm,
    violationCount: t.violationCount,
  };
}

function toItem(t: Tour): TourListItem {
  const owner = (t as unknown as { owner?: User }).owner;
  return {
    id: t.id,
    name: t.name,
    status: t.status,
    version: t.version,
    ownerId: t.ownerId as number,
    ownerName: owner?.name ?? "—",
    chain: t.chain ? t.chain.split(",") : [],
    ephemeris: t.ephemeris,
    updatedAt: t.updatedAt.toISOString(),
    ...summaryOf(t),
  };
}

export function parseStored(json: string): StoredTour {
  return v.parse(storedTourSchema, JSON.parse(json));
}

const SORTS: Record<string, string> = {
  name: "name",
  status: "status",
  updated: "updatedAt",
  launch: "launchTdbS",
  c3: "c3Km2S2",
  dv: "totalDvKmS",
  tof: "tofS",
  arrivalVinf: "arrivalVinfKmS",
  margin: "minFlybyMarginKm",
};

export async function listTours(user: CurrentUser, q: v.InferOutput<typeof tourListQuerySchema>): Promise<{ items: TourListItem[]; total: number }> {
  const where: WhereOptions<Tour> & Record<string | symbol, unknown> = { teamId: user.teamId };
  if (q.status) where.status = q.status;
  if (q.owner) where.ownerId = Number(q.owner);
  if (q.q) where.name = { [Op.like]: `%${q.q.replace(/[%_]/g, (m) => "\\" + m)}%` };
  if (q.body) where.chain = { [Op.like]: `%${q.body.toLowerCase().replace(/[%_]/g, "")}%` };
  const range = (lo?: string, hi?: string) => ({
    ...(lo ? { [Op.gte]: Number(lo) } : {}),
    ...(hi ? { [Op.lte]: Number(hi) } : {}),
  });
  if (q.dvMin || q.dvMax) where.totalDvKmS = range(q.dvMin, q.dvMax);
  if (q.c3Min || q.c3Max) where.c3Km2S2 = range(q.c3Min, q.c3Max);
  const dir = q.dir === "asc" ? "ASC" : "DESC";
  const order: Order =
    q.sort === "owner"
      ? [[{ model: User, as: "owner" }, "name", dir]]
      : [[SORTS[q.sort ?? "updated"] ?? "updatedAt", dir], ["id", "DESC"]];
  const limit = Math.min(500, Math.max(1, Number(q.limit ?? 200)));
  const offset = Number(q.offset ?? 0);
  const { rows, count } = await Tour.findAndCountAll({
    where,
    include: [{ model: User, as: "owner", attributes: ["id", "name"] }],
    order,
    limit,
    offset,
  });
  return { items: rows.map(toItem), total: count };
}

async function findTeamTour(user: CurrentUser, id: number): Promise<Tour> {
  const t = await Tour.findOne({ where: { id, teamId: user.teamId }, include: [{ model: User, as: "owner", attributes: ["id", "name"] }] });
  if (!t) throw notFound("Tour");
  return t;
}

export async function getTourDetail(user: CurrentUser, id: number): Promise<TourDetail> {
  const t = await findTeamTour(user, id);
  return detailOf(t, user.teamId);
}

async function detailOf(t: Tour, teamId: number): Promise<TourDetail> {
  const tour = parseStored(t.specJson);
  const bodies = await teamBodies(teamId);
  let result: TourResult | null = null;
  try {
    result = evaluateStoredTour(tour, bodies).result;
  } catch (err) {
    console.error("[gybe] evaluation failed for tour", t.id, err);
  }
  return {
    ...toItem(t),
    tour,
    result,
    createdAt: t.createdAt.toISOString(),
    customBodies: bodies.map((b) => ({ id: b.id, elements: b.elements, epoch: b.epoch, mu: b.mu, radius: b.radius, minFlybyAltitude: b.minFlybyAltitude })),
    bodyOptions: [
      ...PLANETS.map((p) => ({ id: p, name: p.charAt(0).toUpperCase() + p.slice(1) })),
      ...bodies.map((b) => ({ id: b.id as string, name: b.name })),
    ],
  };
}

async function evaluateForTeam(user: CurrentUser, tour: StoredTour) {
  const bodies = await teamBodies(user.teamId);
  const missing = unknownBodies(tour, bodies);
  if (missing.length) {
    throw badRequest(`Unknown bodies: ${missing.join(", ")} are not in your team's catalog.`, missing.map((m) => ({ path: "tour.nodes", message: `${m} is not in the catalog` })));
  }
  try {
    return evaluateStoredTour(tour, bodies);
  } catch (err) {
    if (err instanceof RangeError) throw badRequest(`The tour cannot be evaluated: ${err.message}`);
    throw err;
  }
}

function columnsOf(tour: StoredTour, summary: TourSummary) {
  return { specJson: JSON.stringify(tour), ephemeris: tour.ephemeris.kind, chain: tour.nodes.map((n) => n.body).join(","), ...summary };
}

export async function createTour(user: CurrentUser, input: v.InferOutput<typeof createTourSchema>, note = "created"): Promise<TourDetail> {
  if (!can(user.role, "tour:create")) throw forbidden();
  const tour = input.tour ?? defaultStoredTour();
  const { summary } = await evaluateForTeam(user, tour);
  const created = await sequelize.transaction(async (transaction) => {
    const t = await Tour.create({ teamId: user.teamId, ownerId: user.id, name: input.name, ...columnsOf(tour, summary) }, { transaction });
    await TourRevision.create({ tourId: t.id, version: 1, specJson: t.specJson, summaryJson: JSON.stringify({ name: t.name, status: t.status, ...summary }), authorId: user.id, note }, { transaction });
    await audit({ teamId: user.teamId, actorId: user.id, action: "tour.create", target: `tour:${t.id}`, detail: { name: t.name } }, transaction);
    return t;
  });
  return getTourDetail(user, created.id);
}

/** True when `next` differs from `prev` only in what an analyst may edit (aim points and flyby options). */
function onlyAnalystFields(prev: StoredTour, next: StoredTour): boolean {
  const strip = (t: StoredTour) => JSON.stringify({ ...t, aim: undefined, rpMin: undefined });
  return strip(prev) === strip(next);
}

export async function updateTour(user: CurrentUser, id: number, input: v.InferOutput<typeof patchTourSchema>): Promise<TourDetail> {
  const t = await findTeamTour(user, id);
  const prev = parseStored(t.specJson);
  const isEditor = can(user.role, "tour:create");
  if (!isEditor) {
    if (!can(user.role, "tour:aim")) throw forbidden();
    if (input.name !== undefined && input.name !== t.name) throw forbidden("Your role may edit aim points and flyby options only.");
    if (input.tour && !onlyAnalystFields(prev, input.tour)) throw forbidden("Your role may edit aim points and flyby options only.");
  }
  if (t.status === "baselined") throw new HttpError(409, "read_only", "This tour is baselined and read-only; a lead can reopen it.");
  if (input.version !== t.version) {
    const mayOverwrite = user.role === "lead" || t.ownerId === user.id;
    if (!(input.overwrite && mayOverwrite)) {
      throw new HttpError(409, "stale_version", `Someone saved this tour after you opened it (you edited version ${input.version}, the current one is ${t.version}).`, {
        current: await detailOf(t, user.teamId),
        canOverwrite: mayOverwrite,
      });
    }
  }
  const tour = input.tour ?? prev;
  const { summary } = await evaluateForTeam(user, tour);
  await sequelize.transaction(async (transaction) => {
    const nextVersion = t.version + 1;
    // Guard against a concurrent writer between our read and this write.
    const [n] = await Tour.update(
      { name: input.name ?? t.name, version: nextVersion, ...columnsOf(tour, summary) },
      { where: { id: t.id, version: t.version }, transaction },
    );
    if (n !== 1) throw new HttpError(409, "stale_version", "Someone saved this tour at the same moment; reload and try again.");
    await TourRevision.create(
      { tourId: t.id, version: nextVersion, specJson: JSON.stringify(tour), summaryJson: JSON.stringify({ name: input.name ?? t.name, status: t.status, ...summary }), authorId: user.id, note: input.note ?? (input.overwrite ? "saved (overwrote a newer version)" : "saved") },
      { transaction },
    );
    await audit({ teamId: user.teamId, actorId: user.id, action: input.overwrite && input.version !== t.version ? "tour.overwrite" : "tour.update", target: `tour:${t.id}`, detail: { version: nextVersion } }, transaction);
  });
  return getTourDetail(user, t.id);
}

export async function deleteTour(user: CurrentUser, id: number): Promise<void> {
  const t = await findTeamTour(user, id);
  if (!can(user.role, "tour:delete")) throw forbidden("Only a lead may delete a tour.");
  await sequelize.transaction(async (transaction) => {
    await t.destroy({ transaction });
    await audit({ teamId: user.teamId, actorId: user.id, action: "tour.delete", target: `tour:${id}`, detail: { name: t.name } }, transaction);
  });
}

/**
 * Re-evaluate the team's tours that pass through `bodyId` (after its elements changed) and store
 * the server's new summary columns. The tour JSON and its version do not change: the summary is
 * derived data, and it must agree with the catalog the tour is evaluated against.
 */
export async function refreshSummariesForBody(teamId: number, bodyId: string): Promise<number> {
  const bodies = await teamBodies(teamId);
  const rows = await Tour.findAll({ where: { teamId, chain: { [Op.like]: `%${bodyId}%` } } });
  let n = 0;
  for (const t of rows) {
    if (!t.chain.split(",").includes(bodyId)) continue;
    const tour = parseStored(t.specJson);
    try {
      const { summary } = evaluateStoredTour(tour, bodies);
      await Tour.update(summary, { where: { id: t.id }, silent: true });
      n++;
    } catch (err) {
      console.error("[gybe] could not refresh the summary of tour", t.id, err);
    }
  }
  return n;
}
