/**
 * The object the astro Web Worker exposes through comlink. Pure computation: it imports lib/astro
 * only. Functions cannot cross into a worker, so callers send an EphemerisSpec and the worker
 * builds (and keeps) the Ephemeris itself: vsop always through the Hermite cache (cheap after
 * the first call), mean elements direct (see lib/astro/ephemeris.ts on why they are not cached).
 */
import { transfer } from "comlink";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { evaluateTour } from "@/lib/astro/tour";
import { sampleTour } from "@/lib/astro/sample";
import type { Ephemeris, EphemerisSpec, TourResult, TourSamples, TourSpec } from "@/lib/astro/types";

const MAX_CACHED = 4;
const ephemerides = new Map<string, Ephemeris>();

/** The Ephemeris for a spec, built once per distinct spec (a few are kept, oldest dropped). */
export function ephemerisFor(spec: EphemerisSpec): Ephemeris {
  const normal: EphemerisSpec = { ...spec, cached: spec.kind === "vsop" ? true : spec.cached };
  const key = JSON.stringify(normal);
  let eph = ephemerides.get(key);
  if (!eph) {
    eph = ephemerisFromSpec(normal);
    ephemerides.set(key, eph);
    if (ephemerides.size > MAX_CACHED) ephemerides.delete(ephemerides.keys().next().value!);
  }
  return eph;
}

/** `evaluateTour` in the worker: TourResult (km, km/s, rad; epochs TDB s). Throws RangeError for a malformed spec. */
function evaluate(spec: TourSpec, ephemeris: EphemerisSpec): TourResult {
  return evaluateTour(spec, ephemerisFor(ephemeris));
}

/**
 * Evaluate and sample the tour for the scene: positions km EclJ2000, epochs TDB s. The typed
 * arrays are transferred (not copied) to the caller.
 */
function sample(spec: TourSpec, ephemeris: EphemerisSpec, pointsPerLeg: number): TourSamples {
  const eph = ephemerisFor(ephemeris);
  const samples = sampleTour(spec, evaluateTour(spec, eph), eph, { pointsPerLeg });
  const buffers: ArrayBuffer[] = [samples.epochs.buffer as ArrayBuffer, samples.positions.buffer as ArrayBuffer];
  if (samples.velocities) buffers.push(samples.velocities.buffer as ArrayBuffer);
  return transfer(samples, buffers);
}

export const astroApi = { evaluate, sample };
export type AstroApi = typeof astroApi;
