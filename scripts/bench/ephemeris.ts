/**
 * Ephemeris benchmark section: states per second of the astronomy-engine adapter (direct) and of
 * the cubic-Hermite cache over the same seeded list of random planets (Mercury … Neptune) and
 * epochs across a decade (2025–2035), after a warm-up pass that fills the tables; the speed-up
 * (target ≥ 20×); the mean-elements rate; and the maximum cache error per body against the direct
 * ephemeris. All on the allocation-free `stateInto` path, best of several timed passes.
 * Wall-clock on a shared 2-core machine: figures are noisy.
 */
import { cachedEphemeris, meanElementsEphemeris, vsopEphemeris } from "../../lib/astro/ephemeris";
import type { FastEphemeris, PlanetId } from "../../lib/astro/types";
import type { BenchRow } from "./types";

const DAY_S = 86400;
const YEAR_S = 365.25 * DAY_S;
const N = 20_000;
const VSOP_PLANETS: PlanetId[] = ["mercury", "venus", "earth", "mars", "jupiter", "saturn", "uranus", "neptune"];
const ALL_PLANETS: PlanetId[] = [...VSOP_PLANETS, "pluto"];

/** mulberry32 PRNG (common practice), seeded for a reproducible list. */
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

function makeList(n: number, seed: number): { bodies: PlanetId[]; epochs: Float64Array } {
  const rnd = mulberry32(seed);
  const bodies: PlanetId[] = [];
  const epochs = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    bodies.push(VSOP_PLANETS[Math.floor(rnd() * VSOP_PLANETS.length)] as PlanetId);
    epochs[i] = (25 + 10 * rnd()) * YEAR_S;
  }
  return { bodies, epochs };
}

/** States per second: best of `passes` timed passes of `reps` sweeps over the list. */
function rate(eph: FastEphemeris, list: { bodies: PlanetId[]; epochs: Float64Array }, reps: number, passes: number): number {
  const out = new Float64Array(6);
  const n = list.epochs.length;
  let sink = 0;
  let best = 0;
  for (let p = 0; p < passes; p++) {
    const t0 = performance.now();
    for (let r = 0; r < reps; r++) {
      for (let i = 0; i < n; i++) {
        eph.stateInto(list.bodies[i] as PlanetId, list.epochs[i] as number, out, 0);
        sink += out[0] as number;
      }
    }
    const dt = (performance.now() - t0) / 1000;
    best = Math.max(best, (n * reps) / dt);
  }
  if (!Number.isFinite(sink)) throw new Error("non-finite state in benchmark");
  return best;
}

/** Benchmark rows of the ephemeris section. */
export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const vsop = vsopEphemeris();
  const list = makeList(N, 20250101);

  // direct: warm-up, then best of 3
  rate(vsop, list, 1, 1);
  const direct = rate(vsop, list, 1, 3);
  rows.push({ name: "vsop direct stateInto", value: direct, unit: "states/s", note: `${N} random (planet ≠ pluto, epoch 2025–2035)` });

  // cached: a cold pass (fills the tables), then warm timed passes
  const cache = cachedEphemeris(vsop);
  const cold = rate(cache, list, 1, 1);
  const warm = rate(cache, list, 10, 3);
  const nodes = cache.cacheInfo().reduce((s, i) => s + i.nodes, 0);
  rows.push({ name: "cached stateInto, cold (first pass)", value: cold, unit: "states/s", note: `fills ${nodes} nodes` });
  rows.push({ name: "cached stateInto, warm", value: warm, unit: "states/s", note: "same list after warm-up" });
  const speedup = warm / direct;
  rows.push({ name: "cache speed-up (warm vs direct)", value: speedup, unit: "×", target: "≥ 20", pass: speedup >= 20 });

  // cached state() (allocating {r, v})
  {
    let best = 0;
    let sink = 0;
    for (let p = 0; p < 3; p++) {
      const t0 = performance.now();
      for (let r = 0; r < 5; r++) {
        for (let i = 0; i < N; i++) sink += cache.state(list.bodies[i] as PlanetId, list.epochs[i] as number).r[0];
      }
      best = Math.max(best, (5 * N) / ((performance.now() - t0) / 1000));
    }
    if (!Number.isFinite(sink)) throw new Error("non-finite state in benchmark");
    rows.push({ name: "cached state() (allocating)", value: best, unit: "states/s" });
  }

  const mean = meanElementsEphemeris();
  rate(mean, list, 1, 1);
  rows.push({ name: "mean-elements stateInto", value: rate(mean, list, 3, 3), unit: "states/s" });

  // max cache error per body, 2000 random epochs each over 2025–2035
  const rnd = mulberry32(7);
  const a = new Float64Array(6);
  const b = new Float64Array(6);
  for (const body of ALL_PLANETS) {
    let er = 0;
    let ev = 0;
    for (let i = 0; i < 2000; i++) {
      const t = (25 + 10 * rnd()) * YEAR_S;
      cache.stateInto(body, t, a);
      vsop.stateInto(body, t, b);
      er = Math.max(er, Math.hypot((a[0] as number) - (b[0] as number), (a[1] as number) - (b[1] as number), (a[2] as number) - (b[2] as number)));
      ev = Math.max(ev, Math.hypot((a[3] as number) - (b[3] as number), (a[4] as number) - (b[4] as number), (a[5] as number) - (b[5] as number)));
    }
    rows.push({ name: `cache max |Δr| ${body}`, value: er, unit: "km", target: "≤ 0.05", pass: er <= 0.05 });
    rows.push({ name: `cache max |Δv| ${body}`, value: ev, unit: "km/s", target: "≤ 1e-6", pass: ev <= 1e-6 });
  }
  return rows;
}
