/**
 * Tour benchmark section: evaluateTour throughput for a six-body tour (the GTOP "Cassini1"
 * sequence Earth–Venus–Venus–Earth–Jupiter–Saturn with Saturn capture, Vinkó & Izzo 2008)
 * with cachedEphemeris(vsopEphemeris()), and the Cassini1 objective at its published decision
 * vector (from memory, CHECKS.md) under each of our ephemerides.
 * Throughput: 2,000 seeded decision vectors within ±30 days of the published one (per component),
 * one warm-up pass (builds the Hermite tables), then the best of 5 timed passes.
 * Wall-clock on a shared 2-core machine: figures are noisy.
 */
import { evaluateTour, tourObjective } from "../../lib/astro/tour";
import { cachedEphemeris, meanElementsEphemeris, vsopEphemeris } from "../../lib/astro/ephemeris";
import type { Ephemeris, TourSpec } from "../../lib/astro/types";
import type { BenchRow } from "./types";
import { CASSINI1_X, cassini1Spec } from "../../tests/fixtures/cassini1";

export { cassini1Spec };


function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}


function objectiveAt(eph: Ephemeris): { value: number; launchVinf: number; arrivalVinf: number } {
  const spec = cassini1Spec();
  const r = evaluateTour(spec, eph);
  return { value: tourObjective(r, spec), launchVinf: r.launch.vinf, arrivalVinf: r.arrival.vinf };
}

export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const rnd = mulberry32(2008);
  const N = 2000;
  const specs: TourSpec[] = [];
  for (let i = 0; i < N; i++) specs.push(cassini1Spec(CASSINI1_X.map((v) => v + (rnd() - 0.5) * 60)));
  const eph = cachedEphemeris(vsopEphemeris());
  let sink = 0;
  for (const s of specs) sink += evaluateTour(s, eph).totalDv; // warm-up, builds the tables
  let best = 0;
  for (let pass = 0; pass < 5; pass++) {
    const t0 = performance.now();
    for (const s of specs) sink += evaluateTour(s, eph).totalDv;
    const dt = (performance.now() - t0) / 1000;
    best = Math.max(best, N / dt);
  }
  rows.push({
    name: "evaluateTour, 6-body Cassini1 tour, cachedEphemeris(vsop)",
    value: best,
    unit: "evals/s",
    target: "≥ 50,000",
    pass: best >= 50_000,
    note: `best of 5 passes × ${N} vectors (±30 d around the published x); shared machine, noisy${Number.isNaN(sink) ? " (NaN seen)" : ""}`,
  });
  // mean-elements ephemeris throughput (no cache: it is cheap)
  const mean = meanElementsEphemeris();
  let bestMean = 0;
  for (let pass = 0; pass < 3; pass++) {
    const t0 = performance.now();
    for (const s of specs) sink += evaluateTour(s, mean).totalDv;
    bestMean = Math.max(bestMean, N / ((performance.now() - t0) / 1000));
  }
  rows.push({ name: "evaluateTour, 6-body tour, meanElementsEphemeris", value: bestMean, unit: "evals/s", note: "best of 3 passes" });

  const cases: [string, Ephemeris][] = [
    ["meanElementsEphemeris", mean],
    ["vsopEphemeris", vsopEphemeris()],
    ["cachedEphemeris(vsop)", eph],
  ];
  for (const [label, e] of cases) {
    const o = objectiveAt(e);
    rows.push({
      name: `Cassini1 objective at published x, ${label}`,
      value: o.value,
      unit: "km/s",
      note: `launch v∞ ${o.launchVinf.toFixed(4)}, Saturn v∞ ${o.arrivalVinf.toFixed(4)} km/s; incl. Earth-flyby rp penalty; GTOP's own ephemeris gives 4.9307`,
    });
  }
  return rows;
}
