/**
 * What changed between two saved states of a tour: nodes added/removed/moved, bodies and epochs
 * (days), legs, arrival, ephemeris, flyby options (rpMin), aim points, and the key numbers of the
 * stored server summaries. Pure: no database, no React (the History panel renders the result).
 */
import type { StoredTour } from "@/lib/validation/tour";
import type { TourSummary } from "./evaluate";

const DAY_S = 86400;

/** What a revision's summaryJson holds (the server's summary at that time, plus name and status). */
export interface RevisionSummary extends Partial<TourSummary> {
  name?: string;
  status?: string;
}

export interface NodeRef {
  id: string;
  body: string;
  index: number;
}

export interface EpochChange {
  id: string;
  body: string;
  /** TDB seconds past J2000. */
  from: number;
  to: number;
  deltaDays: number;
}

export interface LegOptions {
  revs: number;
  branch: "left" | "right" | null;
  prograde: boolean;
}

export interface LegChange {
  /** "fromNodeId→toNodeId" */
  key: string;
  fromNode: string;
  toNode: string;
  change: "added" | "removed" | "changed";
  from?: LegOptions;
  to?: LegOptions;
}

export interface AimChange {
  nodeId: string;
  change: "added" | "removed" | "changed";
  from?: StoredTour["aim"][string];
  to?: StoredTour["aim"][string];
}

export interface MetricChange {
  key: "c3" | "launchVinf" | "totalDv" | "tof" | "arrivalVinf" | "minMargin" | "violations" | "launch" | "arrival";
  label: string;
  unit: string;
  from: number | null;
  to: number | null;
  /** to − from; null when either side is missing. */
  delta: number | null;
}

export interface TourDiff {
  identical: boolean;
  name: { from: string; to: string } | null;
  status: { from: string; to: string } | null;
  ephemeris: { from: string; to: string } | null;
  nodes: {
    added: NodeRef[];
    removed: NodeRef[];
    /** Kept nodes whose order among the kept nodes changed. */
    moved: { id: string; body: string; fromIndex: number; toIndex: number }[];
    bodyChanged: { id: string; from: string; to: string }[];
    epochs: EpochChange[];
    windows: { id: string; from: { start: number; end: number } | null; to: { start: number; end: number } | null }[];
  };
  legs: LegChange[];
  arrival: { from: string; to: string } | null;
  rpMin: { body: string; from: number | null; to: number | null }[];
  aim: AimChange[];
  /** Every key number, changed or not (the table shows them side by side); `changed` lists the keys that differ. */
  metrics: MetricChange[];
  changedMetrics: MetricChange["key"][];
}

function legOptions(tour: StoredTour, i: number): LegOptions {
  const l = tour.legs[i] ?? {};
  const revs = l.revs ?? 0;
  return { revs, branch: revs > 0 ? (l.branch ?? "left") : null, prograde: l.prograde ?? true };
}

function legMap(tour: StoredTour): Map<string, { fromNode: string; toNode: string; options: LegOptions }> {
  const m = new Map<string, { fromNode: string; toNode: string; options: LegOptions }>();
  for (let i = 0; i + 1 < tour.nodes.length; i++) {
    const a = tour.nodes[i]!.id;
    const b = tour.nodes[i + 1]!.id;
    m.set(`${a}→${b}`, { fromNode: a, toNode: b, options: legOptions(tour, i) });
  }
  return m;
}

export function describeArrival(a: StoredTour["arrival"]): string {
  if (a.kind === "capture") return `capture (rp ${Math.round(a.rp)} km, e ${a.e})`;
  return a.kind;
}

const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

const num = (x: number | null | undefined) => (x === undefined || x === null || !Number.isFinite(x) ? null : x);

function metric(key: MetricChange["key"], label: string, unit: string, from: number | null, to: number | null): MetricChange {
  return { key, label, unit, from, to, delta: from !== null && to !== null ? to - from : null };
}

/** Numbers closer than this (relative) count as unchanged: re-evaluation noise is not a change. */
function differs(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a !== b;
  return Math.abs(a - b) > 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
}

export function keyMetrics(from: RevisionSummary, to: RevisionSummary): MetricChange[] {
  const days = (s: number | null | undefined) => (num(s) === null ? null : (s as number) / DAY_S);
  return [
    metric("launch", "Launch", "TDB s", num(from.launchTdbS), num(to.launchTdbS)),
    metric("arrival", "Arrival", "TDB s", num(from.arrivalTdbS), num(to.arrivalTdbS)),
    metric("c3", "Launch C3", "km²/s²", num(from.c3Km2S2), num(to.c3Km2S2)),
    metric("launchVinf", "Launch v∞", "km/s", num(from.launchVinfKmS), num(to.launchVinfKmS)),
    metric("totalDv", "Total Δv", "km/s", num(from.totalDvKmS), num(to.totalDvKmS)),
    metric("tof", "Flight time", "d", days(from.tofS), days(to.tofS)),
    metric("arrivalVinf", "Arrival v∞", "km/s", num(from.arrivalVinfKmS), num(to.arrivalVinfKmS)),
    metric("minMargin", "Min flyby margin", "km", num(from.minFlybyMarginKm), num(to.minFlybyMarginKm)),
    metric("violations", "Violations", "", num(from.violationCount), num(to.violationCount)),
  ];
}

/** The diff from revision `a` (older, usually) to revision `b`. */
export function diffTours(a: StoredTour, b: StoredTour, sa: RevisionSummary = {}, sb: RevisionSummary = {}): TourDiff {
  const aIds = new Map(a.nodes.map((n, i) => [n.id, { n, i }]));
  const bIds = new Map(b.nodes.map((n, i) => [n.id, { n, i }]));

  const added = b.nodes.filter((n) => !aIds.has(n.id)).map((n) => ({ id: n.id, body: n.body, index: bIds.get(n.id)!.i }));
  const removed = a.nodes.filter((n) => !bIds.has(n.id)).map((n) => ({ id: n.id, body: n.body, index: aIds.get(n.id)!.i }));

  // Order among the nodes kept on both sides: a node moved when its rank among them changed.
  const keptA = a.nodes.filter((n) => bIds.has(n.id)).map((n) => n.id);
  const keptB = b.nodes.filter((n) => aIds.has(n.id)).map((n) => n.id);
  const rankB = new Map(keptB.map((id, i) => [id, i]));
  const moved = keptA
    .map((id, i) => ({ id, i }))
    .filter(({ id, i }) => rankB.get(id) !== i)
    .map(({ id }) => ({ id, body: bIds.get(id)!.n.body, fromIndex: aIds.get(id)!.i, toIndex: bIds.get(id)!.i }));

  const bodyChanged: TourDiff["nodes"]["bodyChanged"] = [];
  const epochs: EpochChange[] = [];
  const windows: TourDiff["nodes"]["windows"] = [];
  for (const id of keptB) {
    const na = aIds.get(id)!.n;
    const nb = bIds.get(id)!.n;
    if (na.body !== nb.body) bodyChanged.push({ id, from: na.body, to: nb.body });
    if (na.epoch !== nb.epoch) epochs.push({ id, body: nb.body, from: na.epoch, to: nb.epoch, deltaDays: (nb.epoch - na.epoch) / DAY_S });
    if (!sameJson(na.window ?? null, nb.window ?? null)) windows.push({ id, from: na.window ?? null, to: nb.window ?? null });
  }

  const la = legMap(a);
  const lb = legMap(b);
  const legs: LegChange[] = [];
  for (const [key, l] of lb) {
    const old = la.get(key);
    if (!old) legs.push({ key, fromNode: l.fromNode, toNode: l.toNode, change: "added", to: l.options });
    else if (!sameJson(old.options, l.options)) legs.push({ key, fromNode: l.fromNode, toNode: l.toNode, change: "changed", from: old.options, to: l.options });
  }
  for (const [key, l] of la) if (!lb.has(key)) legs.push({ key, fromNode: l.fromNode, toNode: l.toNode, change: "removed", from: l.options });

  const rpMin: TourDiff["rpMin"] = [];
  for (const body of new Set([...Object.keys(a.rpMin), ...Object.keys(b.rpMin)])) {
    const x = (a.rpMin as Record<string, number>)[body] ?? null;
    const y = (b.rpMin as Record<string, number>)[body] ?? null;
    if (x !== y) rpMin.push({ body, from: x, to: y });
  }

  const aim: AimChange[] = [];
  for (const nodeId of new Set([...Object.keys(a.aim), ...Object.keys(b.aim)])) {
    const x = a.aim[nodeId];
    const y = b.aim[nodeId];
    if (x && !y) aim.push({ nodeId, change: "removed", from: x });
    else if (!x && y) aim.push({ nodeId, change: "added", to: y });
    else if (x && y && !sameJson(x, y)) aim.push({ nodeId, change: "changed", from: x, to: y });
  }

  const arrivalA = describeArrival(a.arrival);
  const arrivalB = describeArrival(b.arrival);
  const metrics = keyMetrics(sa, sb);
  const changedMetrics = metrics.filter((m) => differs(m.from, m.to)).map((m) => m.key);

  const diff: TourDiff = {
    identical: false,
    name: sa.name !== undefined && sb.name !== undefined && sa.name !== sb.name ? { from: sa.name, to: sb.name } : null,
    status: sa.status !== undefined && sb.status !== undefined && sa.status !== sb.status ? { from: sa.status, to: sb.status } : null,
    ephemeris: a.ephemeris.kind !== b.ephemeris.kind ? { from: a.ephemeris.kind, to: b.ephemeris.kind } : null,
    nodes: { added, removed, moved, bodyChanged, epochs, windows },
    legs,
    arrival: sameJson(a.arrival, b.arrival) ? null : { from: arrivalA, to: arrivalB },
    rpMin,
    aim,
    metrics,
    changedMetrics,
  };
  diff.identical =
    !diff.name && !diff.status && !diff.ephemeris && !diff.arrival &&
    added.length + removed.length + moved.length + bodyChanged.length + epochs.length + windows.length === 0 &&
    legs.length + rpMin.length + aim.length + changedMetrics.length === 0;
  return diff;
}
