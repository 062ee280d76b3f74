/**
 * Pure edits of a draft StoredTour for the Workbench (no React, no DOM): every function returns
 * a new tour and leaves its input untouched. Node ids are stable: moving a node keeps its id,
 * a new node gets a fresh id that is not in the tour. Epochs are TDB seconds past J2000.
 *
 * Legs: `legs[i]` joins node i and node i+1. An empty `legs` array means "all defaults"
 * (0 revolutions, prograde) and stays empty until a leg option is edited.
 */
import type { StoredTour, StoredNode } from "@/lib/validation/tour";
import { isoToTdbSeconds, tdbSecondsToIso } from "@/lib/astro/time";

export const DAY = 86400;
export const MAX_NODES = 12;
export const MIN_NODES = 2;
/** Default half-width of a new node's epoch window, days. */
export const NEW_WINDOW_HALF_DAYS = 30;

type Leg = StoredTour["legs"][number];
type Arrival = StoredTour["arrival"];
type BodyId = StoredNode["body"];

const DEFAULT_LEG: Leg = { revs: 0, prograde: true };

function slugOf(body: string): string {
  const s = body.startsWith("custom:") ? body.slice(7) : body;
  return s.replace(/[^A-Za-z0-9_-]/g, "").slice(0, 40) || "node";
}

/**
 * A node id for `body` that no node of `tour` has: `<slug>-<4 base-36 chars>` (matches the stored
 * schema's `[A-Za-z0-9_-]{1,64}`). `random` is injectable for tests.
 */
export function freshNodeId(tour: StoredTour, body: string, random: () => number = Math.random): string {
  const taken = new Set(tour.nodes.map((n) => n.id));
  const slug = slugOf(body);
  for (let k = 0; k < 1000; k++) {
    const suffix = Math.floor(random() * 36 ** 4)
      .toString(36)
      .padStart(4, "0")
      .slice(-4);
    const id = `${slug}-${suffix}`;
    if (!taken.has(id)) return id;
  }
  // A broken random source: fall back to a counter, still unique.
  let n = tour.nodes.length + 1;
  while (taken.has(`${slug}-${n}`)) n++;
  return `${slug}-${n}`;
}

function withLegs(tour: StoredTour): Leg[] {
  const n = tour.nodes.length - 1;
  if (tour.legs.length === n) return tour.legs.map((l) => ({ ...l }));
  return Array.from({ length: n }, () => ({ ...DEFAULT_LEG }));
}

function indexOfNode(tour: StoredTour, nodeId: string): number {
  return tour.nodes.findIndex((n) => n.id === nodeId);
}

/** Body of one node. Unknown id: the tour unchanged. */
export function setNodeBody(tour: StoredTour, nodeId: string, body: BodyId): StoredTour {
  const i = indexOfNode(tour, nodeId);
  if (i < 0 || tour.nodes[i]!.body === body) return tour;
  return { ...tour, nodes: tour.nodes.map((n, k) => (k === i ? { ...n, body } : n)) };
}

/**
 * Epoch of one node (TDB s). The node's window moves with it when the new epoch falls outside it
 * (keeping its width), so a stored tour stays valid. Non-finite epochs are refused.
 */
export function setNodeEpoch(tour: StoredTour, nodeId: string, epoch: number): StoredTour {
  const i = indexOfNode(tour, nodeId);
  if (i < 0 || !Number.isFinite(epoch) || tour.nodes[i]!.epoch === epoch) return tour;
  return {
    ...tour,
    nodes: tour.nodes.map((n, k) => {
      if (k !== i) return n;
      let window = n.window;
      if (window && (epoch < window.start || epoch > window.end)) {
        const shift = epoch - n.epoch;
        window = { start: window.start + shift, end: window.end + shift };
      }
      return window ? { ...n, epoch, window } : { ...n, epoch };
    }),
  };
}

/** Window of one node (TDB s); `null` removes it. A window with end < start is refused. */
export function setNodeWindow(tour: StoredTour, nodeId: string, window: { start: number; end: number } | null): StoredTour {
  const i = indexOfNode(tour, nodeId);
  if (i < 0) return tour;
  if (window && !(Number.isFinite(window.start) && Number.isFinite(window.end) && window.end >= window.start)) return tour;
  return {
    ...tour,
    nodes: tour.nodes.map((n, k) => {
      if (k !== i) return n;
      if (!window) {
        const { window: _drop, ...rest } = n;
        return rest;
      }
      return { ...n, window };
    }),
  };
}

/** Options of leg `index` (node index → index+1). Materialises the default legs when needed. */
export function setLeg(tour: StoredTour, index: number, patch: Partial<Leg>): StoredTour {
  if (!Number.isInteger(index) || index < 0 || index >= tour.nodes.length - 1) return tour;
  const legs = withLegs(tour);
  const next: Leg = { ...legs[index]!, ...patch };
  if (!next.revs) delete next.branch;
  else if (!next.branch) next.branch = "left";
  legs[index] = next;
  return { ...tour, legs };
}

export function setArrival(tour: StoredTour, arrival: Arrival): StoredTour {
  return { ...tour, arrival };
}

/** Minimum periapsis radius override for a body, km; `null` (or a non-positive value) removes it. */
export function setRpMin(tour: StoredTour, body: BodyId, rpMin: number | null): StoredTour {
  const rp = { ...tour.rpMin } as Record<string, number>;
  if (rpMin === null || !Number.isFinite(rpMin) || rpMin <= 0) delete rp[body];
  else rp[body] = rpMin;
  return { ...tour, rpMin: rp as StoredTour["rpMin"] };
}

export function setEphemerisKind(tour: StoredTour, kind: "vsop" | "mean"): StoredTour {
  if (tour.ephemeris.kind === kind) return tour;
  return { ...tour, ephemeris: { ...tour.ephemeris, kind } };
}

/**
 * Insert a node at position `at` (0 … nodes.length) with a fresh id. Its epoch is midway
 * between its neighbours, or 180 d before the first / after the last node; its window is
 * ±30 d. The leg it splits keeps its options on the earlier half; the new leg gets defaults.
 * At 12 nodes (the schema's limit) the tour is returned unchanged.
 */
export function addNode(
  tour: StoredTour,
  at: number,
  body: BodyId,
  id: string = freshNodeId(tour, body),
): StoredTour {
  const n = tour.nodes.length;
  if (n >= MAX_NODES || !Number.isInteger(at) || at < 0 || at > n) return tour;
  if (tour.nodes.some((x) => x.id === id)) return tour;
  const prev = tour.nodes[at - 1];
  const next = tour.nodes[at];
  const epoch =
    prev && next ? (prev.epoch + next.epoch) / 2 : prev ? prev.epoch + 180 * DAY : next ? next.epoch - 180 * DAY : 0;
  const node: StoredNode = {
    id,
    body,
    epoch,
    window: { start: epoch - NEW_WINDOW_HALF_DAYS * DAY, end: epoch + NEW_WINDOW_HALF_DAYS * DAY },
  };
  const nodes = [...tour.nodes.slice(0, at), node, ...tour.nodes.slice(at)];
  let legs = tour.legs;
  if (tour.legs.length === n - 1 && tour.legs.length > 0) {
    legs = [...tour.legs];
    // New leg index: the leg after the new node (at), or the one before it when appended.
    const legAt = at === n ? n - 1 : at;
    legs.splice(legAt, 0, { ...DEFAULT_LEG });
  } else if (tour.legs.length !== 0) {
    legs = Array.from({ length: n }, () => ({ ...DEFAULT_LEG }));
  }
  return { ...tour, nodes, legs };
}

/**
 * Remove a node by id (never below two nodes). The two legs around it merge into one, which keeps
 * the earlier leg's options (the later one's for the first node); its aim point goes with it.
 */
export function removeNode(tour: StoredTour, nodeId: string): StoredTour {
  const n = tour.nodes.length;
  const i = indexOfNode(tour, nodeId);
  if (i < 0 || n <= MIN_NODES) return tour;
  const nodes = tour.nodes.filter((x) => x.id !== nodeId);
  let legs = tour.legs;
  if (tour.legs.length === n - 1) {
    legs = [...tour.legs];
    legs.splice(i === 0 ? 0 : i === n - 1 ? n - 2 : i, 1);
  }
  const aim = { ...tour.aim };
  delete aim[nodeId];
  return { ...tour, nodes, legs, aim };
}

/**
 * Move a node one place earlier (−1) or later (+1). Ids, bodies and aim points travel with the
 * node; the epoch sequence (and each slot's window) stays in place, so the chain stays in time
 * order: reordering changes which body is visited when, not the calendar.
 */
export function moveNode(tour: StoredTour, nodeId: string, dir: -1 | 1): StoredTour {
  const i = indexOfNode(tour, nodeId);
  const j = i + dir;
  if (i < 0 || j < 0 || j >= tour.nodes.length) return tour;
  const a = tour.nodes[i]!;
  const b = tour.nodes[j]!;
  const slot = (n: StoredNode, from: StoredNode): StoredNode => {
    const out: StoredNode = { id: n.id, body: n.body, epoch: from.epoch };
    if (from.window) out.window = from.window;
    return out;
  };
  const nodes = tour.nodes.map((n, k) => (k === i ? slot(b, a) : k === j ? slot(a, b) : n));
  return { ...tour, nodes };
}

/* ---------- conversions for the epoch fields ---------- */

/** TDB s → the value of an `<input type="datetime-local">` read as UTC: "YYYY-MM-DDTHH:MM". */
export function tdbToUtcInput(t: number): string {
  if (!Number.isFinite(t)) return "";
  try {
    return tdbSecondsToIso(t).slice(0, 16);
  } catch {
    return "";
  }
}

/**
 * A `datetime-local` (or date-only) value read as UTC → TDB s; null when empty or malformed.
 * Seconds, when typed, are kept.
 */
export function utcInputToTdb(value: string): number | null {
  const v = value.trim();
  if (!/^\d{4}-\d{2}-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d+)?)?)?$/.test(v)) return null;
  try {
    const t = isoToTdbSeconds(`${v}${v.length > 10 ? "" : "T00:00"}Z`);
    return Number.isFinite(t) ? t : null;
  } catch {
    return null;
  }
}

/** Parse a number typed in a field; null for empty / non-finite. */
export function parseNumberInput(value: string): number | null {
  const v = value.trim().replace(/\u2212/g, "-");
  if (v === "") return null;
  const x = Number(v);
  return Number.isFinite(x) ? x : null;
}
