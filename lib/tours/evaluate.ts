/**
 * Server-side evaluation of a stored tour: the one place that turns stored JSON + the team's
 * catalog into a TourSpec and an Ephemeris, runs `evaluateTour`, and computes the summary columns.
 * The stored summary never trusts numbers sent by a browser. Pure of the database: callers pass
 * the team's custom bodies in.
 */
import { evaluateTour } from "@/lib/astro/tour";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { BODIES } from "@/lib/astro/constants";
import type { BodyId, BodyPhysical, CustomBodySpec, PlanetId, TourResult, TourSpec } from "@/lib/astro/types";
import type { StoredTour } from "@/lib/validation/tour";

export interface TeamBody extends CustomBodySpec {
  name: string;
  radius: number;
  minFlybyAltitude: number;
}

/** Summary columns (units in the names); null where the tour has no solution. */
export interface TourSummary {
  launchTdbS: number | null;
  arrivalTdbS: number | null;
  c3Km2S2: number | null;
  launchVinfKmS: number | null;
  totalDvKmS: number | null;
  tofS: number | null;
  arrivalVinfKmS: number | null;
  minFlybyMarginKm: number | null;
  violationCount: number;
}

export function physicalOf(body: BodyId, spec: Pick<TourSpec, "bodies">): BodyPhysical | undefined {
  return (BODIES as Record<string, BodyPhysical>)[body as PlanetId] ?? spec.bodies?.[body];
}

/** StoredTour → TourSpec (pure: the workbench worker uses it too). `teamBodies` gives small bodies' physical data. */
export function toTourSpec(tour: StoredTour, teamBodies: Pick<TeamBody, "id" | "mu" | "radius" | "minFlybyAltitude">[]): TourSpec {
  const bodies: TourSpec["bodies"] = {};
  for (const b of teamBodies) bodies[b.id] = { mu: b.mu, radius: b.radius, minFlybyAltitude: b.minFlybyAltitude };
  return {
    nodes: tour.nodes.map((n) => ({ body: n.body as BodyId, epoch: n.epoch })),
    legs: tour.legs.length ? tour.legs : undefined,
    arrival: tour.arrival,
    rpMin: tour.rpMin as TourSpec["rpMin"],
    bodies,
  };
}

/** Bodies of the chain that are neither planets nor in the team's catalog. */
export function unknownBodies(tour: StoredTour, teamBodies: TeamBody[]): string[] {
  const known = new Set<string>(teamBodies.map((b) => b.id));
  return [...new Set(tour.nodes.map((n) => n.body).filter((b) => b.startsWith("custom:") && !known.has(b)))];
}

const finiteOrNull = (x: number | undefined) => (x !== undefined && Number.isFinite(x) ? x : null);

export function summarize(tour: StoredTour, spec: TourSpec, result: TourResult): TourSummary {
  const first = tour.nodes[0]!;
  const last = tour.nodes[tour.nodes.length - 1]!;
  let margin: number | null = null;
  for (const f of result.flybys) {
    const phys = physicalOf(f.body, spec);
    const rpMin = spec.rpMin?.[f.body] ?? (phys ? phys.radius + phys.minFlybyAltitude : NaN);
    const m = f.rp - rpMin;
    if (Number.isFinite(m)) margin = margin === null ? m : Math.min(margin, m);
  }
  return {
    launchTdbS: first.epoch,
    arrivalTdbS: last.epoch,
    c3Km2S2: finiteOrNull(result.launch.c3),
    launchVinfKmS: finiteOrNull(result.launch.vinf),
    totalDvKmS: finiteOrNull(result.totalDv),
    tofS: last.epoch - first.epoch,
    arrivalVinfKmS: finiteOrNull(result.arrival.vinf),
    minFlybyMarginKm: margin,
    violationCount: result.violations.length,
  };
}

export function evaluateStoredTour(tour: StoredTour, teamBodies: TeamBody[]): { spec: TourSpec; result: TourResult; summary: TourSummary } {
  const spec = toTourSpec(tour, teamBodies);
  const eph = ephemerisFromSpec({ kind: tour.ephemeris.kind, cached: false, customBodies: teamBodies });
  const result = evaluateTour(spec, eph);
  return { spec, result, summary: summarize(tour, spec, result) };
}
