/**
 * Compare: the numbers the lead weighs when choosing between tours, from each tour's server-side
 * evaluation — summary, per-flyby margins and the Δv budget — plus which tour is best on each
 * metric. Pure (works on TourDetail objects); the page and GET /api/compare share it.
 */
import type { TourDetail } from "@/lib/db/queries/tours";
import type { BodyId } from "@/lib/astro/types";
import { physicalOf, toTourSpec, type TourSummary } from "@/lib/tours/evaluate";

export const COMPARE_MIN = 2;
export const COMPARE_MAX = 6;

export interface CompareFlyby {
  nodeId: string;
  body: string;
  epoch: number;
  vinfInKmS: number | null;
  vinfOutKmS: number | null;
  turnAngleDeg: number | null;
  rpKm: number | null;
  rpMinKm: number | null;
  altitudeKm: number | null;
  marginKm: number | null;
  dvKmS: number | null;
  feasible: boolean;
}

export interface CompareItem extends TourSummary {
  id: number;
  name: string;
  status: TourDetail["status"];
  ownerName: string;
  chain: string[];
  ephemeris: string;
  updatedAt: string;
  arrivalKind: string;
  nodes: { id: string; body: string; epoch: number; role: "launch" | "flyby" | "arrival" }[];
  flybys: CompareFlyby[];
  /** Δv budget, km/s: what the spacecraft pays is flyby + arrival (= total); launch v∞ is the launcher's. */
  dv: { launchVinfKmS: number | null; flybyDvKmS: number | null; arrivalDvKmS: number | null; totalDvKmS: number | null };
  violations: { node: number; kind: string; message: string }[];
}

const fin = (x: number | undefined | null): number | null => (x !== undefined && x !== null && Number.isFinite(x) ? x : null);

export function compareItemOf(d: TourDetail): CompareItem {
  const spec = toTourSpec(d.tour, d.customBodies.map((b) => ({ id: b.id, mu: b.mu, radius: b.radius ?? 0, minFlybyAltitude: b.minFlybyAltitude ?? 0 })));
  const r = d.result;
  const last = d.tour.nodes.length - 1;
  const flybys: CompareFlyby[] = d.tour.nodes.slice(1, -1).map((n, k) => {
    const f = r?.flybys[k];
    const phys = physicalOf(n.body as BodyId, spec);
    const rpMin = fin(spec.rpMin?.[n.body as BodyId] ?? (phys ? phys.radius + phys.minFlybyAltitude : undefined));
    const rp = fin(f?.rp);
    return {
      nodeId: n.id,
      body: n.body,
      epoch: n.epoch,
      vinfInKmS: fin(f?.vinfIn),
      vinfOutKmS: fin(f?.vinfOut),
      turnAngleDeg: f ? fin((f.turnAngle * 180) / Math.PI) : null,
      rpKm: rp,
      rpMinKm: rpMin,
      altitudeKm: fin(f?.altitude),
      marginKm: rp !== null && rpMin !== null ? rp - rpMin : null,
      dvKmS: fin(f?.dv),
      feasible: f?.feasible ?? false,
    };
  });
  const flybyDv = r ? r.flybys.reduce((s, f) => s + f.dv, 0) : NaN;
  return {
    id: d.id,
    name: d.name,
    status: d.status,
    ownerName: d.ownerName,
    chain: d.chain,
    ephemeris: d.ephemeris,
    updatedAt: d.updatedAt,
    launchTdbS: d.launchTdbS,
    arrivalTdbS: d.arrivalTdbS,
    c3Km2S2: d.c3Km2S2,
    launchVinfKmS: d.launchVinfKmS,
    totalDvKmS: d.totalDvKmS,
    tofS: d.tofS,
    arrivalVinfKmS: d.arrivalVinfKmS,
    minFlybyMarginKm: d.minFlybyMarginKm,
    violationCount: d.violationCount,
    arrivalKind: d.tour.arrival.kind,
    nodes: d.tour.nodes.map((n, k) => ({ id: n.id, body: n.body, epoch: n.epoch, role: k === 0 ? "launch" : k === last ? "arrival" : "flyby" })),
    flybys,
    dv: {
      launchVinfKmS: fin(r?.launch.vinf),
      flybyDvKmS: fin(flybyDv),
      arrivalDvKmS: fin(r?.arrival.dv),
      totalDvKmS: fin(r?.totalDv),
    },
    violations: r?.violations.map((x) => ({ node: x.node, kind: x.kind, message: x.message })) ?? [],
  };
}

export type CompareMetric =
  | "launch"
  | "arrival"
  | "c3"
  | "launchVinf"
  | "totalDv"
  | "tof"
  | "arrivalVinf"
  | "margin"
  | "violations"
  | "status";

/** How each metric ranks: lower or higher is better; `null` = no "best" (a launch date is a choice, not a score). */
export const METRIC_SENSE: Record<CompareMetric, "min" | "max" | null> = {
  launch: null,
  arrival: "min",
  c3: "min",
  launchVinf: "min",
  totalDv: "min",
  tof: "min",
  arrivalVinf: "min",
  margin: "max",
  violations: "min",
  status: null,
};

export function metricValue(item: CompareItem, m: CompareMetric): number | null {
  switch (m) {
    case "launch": return item.launchTdbS;
    case "arrival": return item.arrivalTdbS;
    case "c3": return item.c3Km2S2;
    case "launchVinf": return item.launchVinfKmS;
    case "totalDv": return item.totalDvKmS;
    case "tof": return item.tofS;
    case "arrivalVinf": return item.arrivalVinfKmS;
    case "margin": return item.minFlybyMarginKm;
    case "violations": return item.violationCount;
    case "status": return null;
  }
}

/** Ids of the tours with the best value of a metric (ties all marked); empty when there is no ranking or fewer than two values. */
export function bestIds(items: CompareItem[], m: CompareMetric): number[] {
  const sense = METRIC_SENSE[m];
  if (!sense) return [];
  const vals = items.map((i) => ({ id: i.id, v: metricValue(i, m) })).filter((x): x is { id: number; v: number } => x.v !== null && Number.isFinite(x.v));
  if (vals.length < 2) return [];
  const best = sense === "min" ? Math.min(...vals.map((x) => x.v)) : Math.max(...vals.map((x) => x.v));
  const tol = Math.max(1e-9, Math.abs(best) * 1e-9);
  const ids = vals.filter((x) => Math.abs(x.v - best) <= tol).map((x) => x.id);
  return ids.length === vals.length ? [] : ids; // all equal: nothing stands out
}

/** `ids=3,1,7` → [3, 1, 7] (order kept, duplicates dropped); null when malformed. */
export function parseCompareIds(raw: string | null | undefined): number[] | null {
  if (!raw || !/^\s*[1-9]\d{0,9}(\s*,\s*[1-9]\d{0,9})*\s*,?\s*$/.test(raw)) return null;
  return [...new Set(raw.split(",").map((s) => s.trim()).filter(Boolean).map(Number))];
}
