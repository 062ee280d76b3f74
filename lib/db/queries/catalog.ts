/**
 * The team's catalog of custom small bodies: list, add, edit, delete, import a CSV.
 * Every function takes the signed-in user and scopes by team; another team's body answers 404.
 * Writes check the role here too (the route handlers check it first).
 */
import "server-only";
import { UniqueConstraintError } from "sequelize";
import { sequelize } from "@/lib/db/sequelize";
import { CustomBody, Tour } from "@/models";
import type { CurrentUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { HttpError, forbidden, notFound } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";
import { refreshSummariesForBody } from "./tours";
import { bodyInputOf, bodyRecordOf, type BodyInput } from "@/lib/validation/body";
import { parseBodiesCsv, summarizeErrors, type CsvRowError } from "@/lib/files/bodies-csv";
import { AU_KM } from "@/lib/astro/constants";

export interface CatalogBody {
  id: number;
  /** The id tours use: `custom:<slug>`. */
  bodyId: string;
  slug: string;
  name: string;
  /** The values as the form shows them (AU, degrees, mean anomaly, ISO UTC). */
  input: BodyInput;
  /** Stored values (km, TDB s, true anomaly in degrees for display). */
  aKm: number;
  epochTdbS: number;
  nuDeg: number;
  perihelionAu: number;
  aphelionAu: number;
  /** Tours of the team whose chain uses this body. */
  usedBy: { id: number; name: string }[];
  updatedAt: string;
}

async function usage(teamId: number): Promise<Map<string, { id: number; name: string }[]>> {
  const tours = await Tour.findAll({ where: { teamId }, attributes: ["id", "name", "chain"], order: [["name", "ASC"]] });
  const map = new Map<string, { id: number; name: string }[]>();
  for (const t of tours) {
    for (const b of new Set((t.chain ?? "").split(","))) {
      if (!b.startsWith("custom:")) continue;
      const list = map.get(b) ?? [];
      list.push({ id: t.id, name: t.name });
      map.set(b, list);
    }
  }
  return map;
}

function toCatalogBody(b: CustomBody, used: Map<string, { id: number; name: string }[]>): CatalogBody {
  const bodyId = `custom:${b.slug}`;
  return {
    id: b.id,
    bodyId,
    slug: b.slug,
    name: b.name,
    input: bodyInputOf(b),
    aKm: b.aKm,
    epochTdbS: b.epochTdbS,
    nuDeg: (b.nuRad * 180) / Math.PI,
    perihelionAu: (b.aKm * (1 - b.e)) / AU_KM,
    aphelionAu: (b.aKm * (1 + b.e)) / AU_KM,
    usedBy: used.get(bodyId) ?? [],
    updatedAt: b.updatedAt.toISOString(),
  };
}

export async function listCatalog(user: CurrentUser): Promise<{ items: CatalogBody[]; total: number }> {
  const rows = await CustomBody.findAll({ where: { teamId: user.teamId }, order: [["name", "ASC"], ["id", "ASC"]] });
  const used = await usage(user.teamId);
  return { items: rows.map((b) => toCatalogBody(b, used)), total: rows.length };
}

async function findTeamBody(user: CurrentUser, id: number): Promise<CustomBody> {
  const b = await CustomBody.findOne({ where: { id, teamId: user.teamId } });
  if (!b) throw notFound("Body");
  return b;
}

export async function getCatalogBody(user: CurrentUser, id: number): Promise<CatalogBody> {
  const b = await findTeamBody(user, id);
  return toCatalogBody(b, await usage(user.teamId));
}

function duplicate(slug: string, name?: string): HttpError {
  return new HttpError(
    409,
    "duplicate_body",
    `The catalog already has a body with the id custom:${slug}${name ? ` (“${name}”)` : ""}; choose another name.`,
    { issues: [{ path: "name", message: `custom:${slug} already exists` }] },
  );
}

export async function createBody(user: CurrentUser, input: BodyInput): Promise<CatalogBody> {
  if (!can(user.role, "catalog:edit")) throw forbidden();
  const rec = bodyRecordOf(input);
  const existing = await CustomBody.findOne({ where: { teamId: user.teamId, slug: rec.slug } });
  if (existing) throw duplicate(rec.slug, existing.name);
  try {
    const created = await sequelize.transaction(async (transaction) => {
      const b = await CustomBody.create({ teamId: user.teamId, ...rec }, { transaction });
      await audit({ teamId: user.teamId, actorId: user.id, action: "body.create", target: `body:${b.id}`, detail: { bodyId: `custom:${rec.slug}`, name: rec.name } }, transaction);
      return b;
    });
    return getCatalogBody(user, created.id);
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicate(rec.slug);
    throw err;
  }
}

/**
 * Edit a body's name and elements. Its id (`custom:<slug>`) never changes, so tours that use it
 * keep working; their stored summary columns are re-evaluated against the new elements at once.
 */
export async function updateBody(user: CurrentUser, id: number, input: BodyInput): Promise<CatalogBody> {
  const b = await findTeamBody(user, id);
  if (!can(user.role, "catalog:edit")) throw forbidden();
  const { slug: _slug, ...rec } = bodyRecordOf(input);
  await sequelize.transaction(async (transaction) => {
    await b.update(rec, { transaction });
    await audit({ teamId: user.teamId, actorId: user.id, action: "body.update", target: `body:${b.id}`, detail: { bodyId: `custom:${b.slug}`, name: rec.name } }, transaction);
  });
  await refreshSummariesForBody(user.teamId, `custom:${b.slug}`);
  return getCatalogBody(user, b.id);
}

/** Delete a body; refused with 409 while a tour of the team uses it (the message names the tours). */
export async function deleteBody(user: CurrentUser, id: number): Promise<void> {
  const b = await findTeamBody(user, id);
  if (!can(user.role, "catalog:edit")) throw forbidden();
  const used = (await usage(user.teamId)).get(`custom:${b.slug}`) ?? [];
  if (used.length) {
    const names = used.map((t) => `“${t.name}”`);
    throw new HttpError(
      409,
      "body_in_use",
      `${b.name} (custom:${b.slug}) is used by ${used.length === 1 ? "the tour" : `${used.length} tours:`} ${names.join(", ")}. Remove it from ${used.length === 1 ? "that tour" : "those tours"} first.`,
      { tours: used },
    );
  }
  await sequelize.transaction(async (transaction) => {
    await b.destroy({ transaction });
    await audit({ teamId: user.teamId, actorId: user.id, action: "body.delete", target: `body:${id}`, detail: { bodyId: `custom:${b.slug}`, name: b.name } }, transaction);
  });
}

/**
 * Import a bodies CSV: every row is checked (schema, duplicates in the file, ids already in the
 * catalog); any bad row rejects the whole file with 400 listing every bad line; otherwise all
 * rows are inserted in one transaction (all or nothing).
 */
export async function importBodies(user: CurrentUser, text: string): Promise<{ items: CatalogBody[]; total: number }> {
  if (!can(user.role, "catalog:edit")) throw forbidden();
  const parsed = parseBodiesCsv(text);
  const errors: CsvRowError[] = parsed.ok ? [] : [...parsed.errors];
  if (!parsed.ok && parsed.tooManyRows) {
    throw new HttpError(400, "too_many_rows", parsed.message, { rows: errors, issues: errors.map((e) => ({ path: `line ${e.line}`, message: e.reasons.join("; ") })) });
  }
  if (parsed.rows.length) {
    const taken = await CustomBody.findAll({ where: { teamId: user.teamId }, attributes: ["slug", "name"] });
    const bySlug = new Map(taken.map((t) => [t.slug, t.name]));
    for (const row of parsed.rows) {
      const existing = bySlug.get(row.record.slug);
      if (existing !== undefined) {
        errors.push({ line: row.line, reasons: [`name: the catalog already has custom:${row.record.slug} (“${existing}”)`] });
      }
    }
  }
  if (errors.length) {
    errors.sort((a, b) => a.line - b.line);
    throw new HttpError(400, "invalid_csv", summarizeErrors(errors), {
      rows: errors,
      issues: errors.map((e) => ({ path: `line ${e.line}`, message: e.reasons.join("; ") })),
    });
  }
  let ids: number[];
  try {
    ids = await sequelize.transaction(async (transaction) => {
      const created: number[] = [];
      for (const row of parsed.rows) {
        const b = await CustomBody.create({ teamId: user.teamId, ...row.record }, { transaction });
        created.push(b.id);
      }
      await audit({ teamId: user.teamId, actorId: user.id, action: "body.import", target: "catalog", detail: { count: created.length, bodyIds: parsed.rows.map((r) => `custom:${r.record.slug}`) } }, transaction);
      return created;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw new HttpError(409, "duplicate_body", "Another upload added one of these bodies at the same moment; nothing was imported. Try again.");
    throw err;
  }
  const used = await usage(user.teamId);
  const rows = await CustomBody.findAll({ where: { id: ids, teamId: user.teamId }, order: [["name", "ASC"]] });
  return { items: rows.map((b) => toCatalogBody(b, used)), total: rows.length };
}
