/**
 * Search benchmark section.
 *
 * 1. Window scan: a 365 × 365 Earth→Mars porkchop (one departure a day × one arrival a day) in
 *    one thread (Node; the browser splits the rows over its workers), astronomy-engine through
 *    the Hermite cache: first run (tables filled on demand) and a warm run. Target < 1 s.
 * 2. "Cassini1" (GTOP database, Vinkó & Izzo 2008; CHECKS.md) under each of our ephemerides:
 *    the best value we have ever found for it (recorded below, from long runs during
 *    development), the value of the published best decision vector under our ephemeris, and
 *    over SEEDS seeds the median objective evaluations and wall time for a 2-worker search to
 *    come within 1 % and 0.1 % of that best. The two islands (seed + 0, seed + 1, each half of
 *    the budget) run one after the other in this process; their wall time as 2 parallel workers
 *    is that of the island that gets there first measured on its own clock, and the
 *    evaluations are twice that island's count (both islands spend evaluations meanwhile).
 *    A run that never gets there counts as Infinity (so a median of Infinity means most runs
 *    missed). Target: within 1 % in under 30 s.
 * Figures are wall-clock on a shared 2-core machine: noisy.
 * Env: BENCH_SEARCH_SEEDS (default 10), BENCH_SEARCH_BUDGET (total per search, default 600,000).
 */
import { optimizeTour, porkchop, TourObjective } from "../../lib/astro/search";
import { cachedEphemeris, meanElementsEphemeris, vsopEphemeris } from "../../lib/astro/ephemeris";
import { isoToTdbSeconds, mjd2000ToTdbSeconds } from "../../lib/astro/time";
import type { Ephemeris, SearchBounds, TourSpec } from "../../lib/astro/types";
import type { BenchRow } from "./types";
import { CASSINI1_BOUNDS, CASSINI1_X, cassini1Spec } from "../../tests/fixtures/cassini1";

const DAY = 86400;

/** Best values found so far for Cassini1 with our ephemerides (km/s), from development runs. */
export const CASSINI1_BEST = {
  mean: 5.30726, // V–V 415 d basin: x ≈ [−769.69 MJD2000, 175.72, 415.23, 52.79, 1041.49, 4608.85] d
  vsop: 5.23068, // V–V 449.4 d (≈ 2 Venus years): x ≈ [−781.49, 144.26, 449.40, 58.63, 970.03, 4473.26] d
} as const;

// Cassini1 (GTOP, Vinkó & Izzo 2008): the search replaces the epochs of the spec.
const spec: TourSpec = cassini1Spec();
const bounds: SearchBounds = CASSINI1_BOUNDS;
const PUBLISHED_X = CASSINI1_X;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const n = s.length;
  if (n === 0) return Number.NaN;
  return n % 2 ? s[(n - 1) / 2]! : (s[n / 2 - 1]! + s[n / 2]!) / 2;
}

interface Hit {
  evals: number;
  seconds: number;
}

async function island(eph: Ephemeris, seed: number, budget: number, targets: number[]): Promise<{ hits: Hit[]; best: number }> {
  const hits: Hit[] = targets.map(() => ({ evals: Infinity, seconds: Infinity }));
  const t0 = performance.now();
  const res = await optimizeTour(spec, bounds, eph, {
    seed,
    budget,
    progressEvery: 256,
    onProgress: (p) => {
      targets.forEach((t, k) => {
        if (hits[k]!.evals === Infinity && p.best <= t) hits[k] = { evals: p.evaluations, seconds: (performance.now() - t0) / 1000 };
      });
    },
  });
  return { hits, best: res.candidates[0]?.value ?? Infinity };
}

export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const seeds = Number(process.env.BENCH_SEARCH_SEEDS ?? 10);
  const budget = Number(process.env.BENCH_SEARCH_BUDGET ?? 600_000);

  // 1. scan
  const departures = Array.from({ length: 365 }, (_, i) => isoToTdbSeconds("2026-06-01T00:00:00Z") + i * DAY);
  const arrivals = Array.from({ length: 365 }, (_, i) => isoToTdbSeconds("2026-12-01T00:00:00Z") + i * DAY);
  const eph = cachedEphemeris(vsopEphemeris());
  let t = performance.now();
  porkchop({ from: "earth", to: "mars", departures, arrivals }, eph);
  const cold = (performance.now() - t) / 1000;
  let warm = Infinity;
  for (let k = 0; k < 3; k++) {
    t = performance.now();
    porkchop({ from: "earth", to: "mars", departures, arrivals }, eph);
    warm = Math.min(warm, (performance.now() - t) / 1000);
  }
  rows.push({ name: "scan 365×365 Earth→Mars, 1 thread, cache cold", value: cold, unit: "s", target: "< 1", pass: cold < 1, note: "astronomy-engine via Hermite cache, tables filled on demand" });
  rows.push({ name: "scan 365×365 Earth→Mars, 1 thread, cache warm", value: warm, unit: "s", target: "< 1", pass: warm < 1, note: "best of 3" });

  // 2. Cassini1
  for (const kind of ["mean", "vsop"] as const) {
    const e = kind === "mean" ? meanElementsEphemeris() : cachedEphemeris(vsopEphemeris());
    const best = CASSINI1_BEST[kind];
    const xs = [mjd2000ToTdbSeconds(PUBLISHED_X[0]!), ...PUBLISHED_X.slice(1).map((d) => d * DAY)];
    const published = new TourObjective(spec, e as never).value(xs);
    rows.push({ name: `Cassini1 [${kind}] value at the published best x`, value: published, unit: "km/s", note: "4.9307 with GTOP's own ephemeris; the optimum moves with ours" });
    rows.push({ name: `Cassini1 [${kind}] best value ever found`, value: best, unit: "km/s", note: "recorded from development runs" });
    const targets = [best * 1.01, best * 1.001];
    const evals: number[][] = [[], []];
    const secs: number[][] = [[], []];
    const found: number[] = [];
    for (let s = 1; s <= seeds; s++) {
      const isl = [await island(e, 1000 * s, budget / 2, targets), await island(e, 1000 * s + 1, budget / 2, targets)];
      found.push(Math.min(isl[0]!.best, isl[1]!.best));
      for (let k = 0; k < 2; k++) {
        const h = isl.map((i) => i.hits[k]!);
        const first = h[0]!.seconds <= h[1]!.seconds ? h[0]! : h[1]!;
        evals[k]!.push(2 * first.evals);
        secs[k]!.push(first.seconds);
      }
    }
    const hitRate = (k: number) => evals[k]!.filter((x) => Number.isFinite(x)).length;
    rows.push({ name: `Cassini1 [${kind}] median best over seeds`, value: median(found), unit: "km/s", note: `${seeds} seeds, budget ${budget.toLocaleString("en-US")} per search (2 islands)` });
    for (const [k, label] of [[0, "1%"], [1, "0.1%"]] as const) {
      const m = median(secs[k]!);
      rows.push({
        name: `Cassini1 [${kind}] median evaluations to within ${label}`,
        value: median(evals[k]!),
        unit: "evaluations",
        note: `reached in ${hitRate(k)}/${seeds} seeds`,
      });
      rows.push({
        name: `Cassini1 [${kind}] median wall time to within ${label}, 2 workers`,
        value: m,
        unit: "s",
        ...(k === 0 ? { target: "< 30", pass: m < 30 } : {}),
        note: "islands run sequentially in Node; time of the first island to get there, on its own clock",
      });
    }
  }
  return rows;
}
