/**
 * Pure read-outs for the Workbench cards: which flyby a node is, constraint flag levels, where the
 * replay clock is in the tour, and what differs between two versions of a tour (for the 409 dialog).
 * Units: epochs TDB s, distances km, speeds km/s, angles rad (degrees only on screen).
 */
import type { FlagLevel } from "@/components/ui/badge";
import type { TourFlybyResult, TourResult, TourSpec, TourViolation } from "@/lib/astro/types";
import { rpMinFor } from "@/lib/astro/tour";
import type { StoredTour } from "@/lib/validation/tour";
import { bodyLabel, dateOf } from "@/lib/format";

/** A flyby within this distance above its minimum radius is flagged "margin": max(200 km, 5 % of rpMin). */
export function marginThresholdKm(rpMin: number): number {
  return Math.max(200, 0.05 * rpMin);
}

/** The flyby result of node `index` (nodes 1 … n−2 are flybys, in order), or null. */
export function flybyOfNode(result: TourResult | null, index: number, nodeCount: number): TourFlybyResult | null {
  if (!result || index <= 0 || index >= nodeCount - 1) return null;
  return result.flybys[index - 1] ?? null;
}

/** rpMin (km) for a body of the spec; NaN when the body has no physical data. */
export function safeRpMin(spec: TourSpec, body: TourSpec["nodes"][number]["body"]): number {
  try {
    return rpMinFor(spec, body);
  } catch {
    return Number.NaN;
  }
}

export interface FlybyFlag {
  level: FlagLevel;
  /** rp − rpMin, km (negative: below the minimum). */
  marginKm: number;
  rpMin: number;
  text: string;
}

export function flybyFlag(f: TourFlybyResult, rpMin: number): FlybyFlag {
  const marginKm = f.rp - rpMin;
  if (!Number.isFinite(f.rp) || !Number.isFinite(rpMin)) {
    return { level: "violated", marginKm: Number.NaN, rpMin, text: "no solution" };
  }
  if (!f.feasible || marginKm < -1e-3) {
    return { level: "violated", marginKm, rpMin, text: `${Math.round(-marginKm).toLocaleString("en-US")} km below minimum` };
  }
  if (marginKm < marginThresholdKm(rpMin)) {
    return { level: "margin", marginKm, rpMin, text: `${Math.round(marginKm).toLocaleString("en-US")} km above minimum` };
  }
  return { level: "ok", marginKm, rpMin, text: `${Math.round(marginKm).toLocaleString("en-US")} km above minimum` };
}

/** Violations belonging to node `index`. */
export function violationsAt(result: TourResult | null, index: number): TourViolation[] {
  return result ? result.violations.filter((v) => v.node === index) : [];
}

export interface TourProgress {
  phase: "before" | "leg" | "after";
  /** Leg in progress, 0-based (phase "leg"). */
  leg: number;
  legCount: number;
  /** Body the spacecraft is heading to, and days until it gets there (phase "leg"). */
  nextBody: string | null;
  daysToNext: number;
  /** Days since launch (negative before it). */
  daysSinceLaunch: number;
}

/** Where epoch `t` (TDB s) falls in a chain of nodes with increasing epochs. */
export function progressAt(nodes: { body: string; epoch: number }[], t: number): TourProgress {
  const legCount = Math.max(0, nodes.length - 1);
  const first = nodes[0];
  const last = nodes[nodes.length - 1];
  const base: TourProgress = { phase: "before", leg: 0, legCount, nextBody: null, daysToNext: 0, daysSinceLaunch: 0 };
  if (!first || !last || !Number.isFinite(t)) return base;
  const daysSinceLaunch = (t - first.epoch) / 86400;
  if (t < first.epoch) return { ...base, daysSinceLaunch, nextBody: first.body, daysToNext: -daysSinceLaunch };
  if (t >= last.epoch) return { ...base, phase: "after", leg: legCount - 1, daysSinceLaunch };
  for (let k = 0; k < legCount; k++) {
    const b = nodes[k + 1]!;
    if (t < b.epoch) {
      return { phase: "leg", leg: k, legCount, nextBody: b.body, daysToNext: (b.epoch - t) / 86400, daysSinceLaunch };
    }
  }
  // epochs not increasing: report the last leg
  return { ...base, phase: "after", leg: legCount - 1, daysSinceLaunch };
}

/** "Leg 2 of 4 · 130 d to Venus" and friends. */
export function progressText(p: TourProgress): string {
  if (p.legCount === 0) return "";
  if (p.phase === "before") return `Before launch · ${Math.round(p.daysToNext)} d to go`;
  if (p.phase === "after") return `Arrived · ${Math.round(p.daysSinceLaunch)} d after launch`;
  return `Leg ${p.leg + 1} of ${p.legCount} · ${Math.round(p.daysToNext)} d to ${bodyLabel(p.nextBody ?? "")}`;
}

/* ---------- what changed between two versions (409 dialog) ---------- */

export interface ChangeLine {
  what: string;
  mine: string;
  theirs: string;
}

function legText(l: StoredTour["legs"][number] | undefined): string {
  if (!l) return "0 rev, prograde";
  const revs = l.revs ?? 0;
  return `${revs} rev${revs ? ` ${l.branch ?? "left"}` : ""}, ${l.prograde === false ? "retrograde" : "prograde"}`;
}

function arrivalText(a: StoredTour["arrival"]): string {
  return a.kind === "capture" ? `capture rp ${Math.round(a.rp).toLocaleString("en-US")} km, e ${a.e}` : a.kind;
}

/**
 * Node-by-node differences between my draft and their saved version: nodes added or removed,
 * bodies, epochs (UTC dates, shift in days), leg options, arrival, rpMin and ephemeris.
 */
export function tourChanges(mine: StoredTour, theirs: StoredTour): ChangeLine[] {
  const out: ChangeLine[] = [];
  const mineById = new Map(mine.nodes.map((n, i) => [n.id, { n, i }]));
  const theirsById = new Map(theirs.nodes.map((n, i) => [n.id, { n, i }]));
  const label = (n: { body: string }, i: number) => `#${i + 1} ${bodyLabel(n.body)}`;
  for (const [id, { n, i }] of theirsById) {
    if (!mineById.has(id)) out.push({ what: `Node ${label(n, i)}`, mine: "absent", theirs: `added, ${dateOf(n.epoch)}` });
  }
  for (const [id, { n, i }] of mineById) {
    const o = theirsById.get(id);
    if (!o) {
      out.push({ what: `Node ${label(n, i)}`, mine: `added, ${dateOf(n.epoch)}`, theirs: "absent" });
      continue;
    }
    if (o.i !== i) out.push({ what: `Node ${label(n, i)} position`, mine: `#${i + 1}`, theirs: `#${o.i + 1}` });
    if (o.n.body !== n.body) out.push({ what: `Node ${label(n, i)} body`, mine: bodyLabel(n.body), theirs: bodyLabel(o.n.body) });
    if (Math.abs(o.n.epoch - n.epoch) > 0.5) {
      const shift = (o.n.epoch - n.epoch) / 86400;
      out.push({
        what: `Node ${label(n, i)} epoch`,
        mine: dateOf(n.epoch),
        theirs: `${dateOf(o.n.epoch)} (${shift > 0 ? "+" : ""}${shift.toFixed(1)} d)`,
      });
    }
  }
  const legCount = Math.max(mine.nodes.length, theirs.nodes.length) - 1;
  for (let k = 0; k < legCount; k++) {
    const a = k < mine.nodes.length - 1 ? legText(mine.legs[k]) : null;
    const b = k < theirs.nodes.length - 1 ? legText(theirs.legs[k]) : null;
    if (a !== null && b !== null && a !== b) out.push({ what: `Leg ${k + 1}`, mine: a, theirs: b });
  }
  if (arrivalText(mine.arrival) !== arrivalText(theirs.arrival)) {
    out.push({ what: "Arrival", mine: arrivalText(mine.arrival), theirs: arrivalText(theirs.arrival) });
  }
  const bodies = new Set([...Object.keys(mine.rpMin), ...Object.keys(theirs.rpMin)]);
  for (const b of bodies) {
    const x = (mine.rpMin as Record<string, number>)[b];
    const y = (theirs.rpMin as Record<string, number>)[b];
    if (x !== y) {
      const f = (v: number | undefined) => (v === undefined ? "default" : `${Math.round(v).toLocaleString("en-US")} km`);
      out.push({ what: `Minimum rp at ${bodyLabel(b)}`, mine: f(x), theirs: f(y) });
    }
  }
  if (mine.ephemeris.kind !== theirs.ephemeris.kind) {
    out.push({ what: "Ephemeris", mine: mine.ephemeris.kind, theirs: theirs.ephemeris.kind });
  }
  if (JSON.stringify(mine.aim) !== JSON.stringify(theirs.aim)) out.push({ what: "Aim points", mine: "differ", theirs: "differ" });
  return out;
}

export interface KeyNumbers {
  c3: number | null;
  launchVinf: number | null;
  totalDv: number | null;
  arrivalVinf: number | null;
  tofDays: number | null;
  violations: number | null;
}

export function keyNumbers(tour: StoredTour, result: TourResult | null): KeyNumbers {
  const fin = (x: number | undefined) => (x !== undefined && Number.isFinite(x) ? x : null);
  const first = tour.nodes[0];
  const last = tour.nodes[tour.nodes.length - 1];
  return {
    c3: fin(result?.launch.c3),
    launchVinf: fin(result?.launch.vinf),
    totalDv: fin(result?.totalDv),
    arrivalVinf: fin(result?.arrival.vinf),
    tofDays: first && last ? (last.epoch - first.epoch) / 86400 : null,
    violations: result ? result.violations.length : null,
  };
}
