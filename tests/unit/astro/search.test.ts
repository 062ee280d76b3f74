import { describe, expect, it } from "vitest";
import { CASSINI1_BOUNDS, cassini1Spec as cassini1SpecAt } from "../../fixtures/cassini1";
import {
  porkchop,
  optimizeTour,
  mergeCandidates,
  islandBudget,
  runIsland,
  candidateValue,
  epochsOf,
  TourObjective,
} from "@/lib/astro/search";
import { evaluateTour, tourObjective } from "@/lib/astro/tour";
import { cachedEphemeris, meanElementsEphemeris, vsopEphemeris } from "@/lib/astro/ephemeris";
import { isoToTdbSeconds, mjd2000ToTdbSeconds } from "@/lib/astro/time";
import { DAY_S } from "@/lib/astro/constants";
import type { SearchBounds, SearchCandidate, TourSpec } from "@/lib/astro/types";

const vsop = cachedEphemeris(vsopEphemeris());
const mean = meanElementsEphemeris();

function range(start: number, step: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => start + i * step);
}

function argminFinite(a: Float64Array): number {
  let k = -1;
  for (let i = 0; i < a.length; i++) if (a[i] === a[i] && (k < 0 || a[i]! < a[k]!)) k = i;
  return k;
}

// ---- the published multiple-flyby benchmark "Cassini1" (GTOP database, Vinkó & Izzo 2008; CHECKS.md)
const cassini1Spec: TourSpec = cassini1SpecAt(); // the search replaces its epochs
const cassini1Bounds: SearchBounds = CASSINI1_BOUNDS;

describe("porkchop", () => {
  it("Earth→Mars 2026 and 2028 opportunities: minimum C3 in 8–16 km²/s², about 780 days apart (common practice)", () => {
    const scan = (startIso: string) => {
      const departures = range(isoToTdbSeconds(startIso), 4 * DAY_S, 120); // 480 days of departures
      const tofs = range(120 * DAY_S, 5 * DAY_S, 60); // 120 … 415 d
      const res = porkchop({ from: "earth", to: "mars", departures, tofs }, vsop);
      const k = argminFinite(res.c3);
      return { c3: res.c3[k]!, dep: departures[Math.floor(k / tofs.length)]! };
    };
    const a = scan("2026-05-01T00:00:00Z");
    const b = scan("2028-07-01T00:00:00Z");
    for (const m of [a, b]) {
      expect(m.c3).toBeGreaterThan(8);
      expect(m.c3).toBeLessThan(16);
    }
    const gapDays = (b.dep - a.dep) / DAY_S;
    expect(gapDays).toBeGreaterThan(780 - 90);
    expect(gapDays).toBeLessThan(780 + 90);
  });

  it("a cell agrees with evaluateTour on the same leg (rendezvous arrival: dv = v∞ dep + v∞ arr)", () => {
    const d = isoToTdbSeconds("2026-11-01T00:00:00Z");
    const arr = d + 250 * DAY_S;
    const res = porkchop({ from: "earth", to: "mars", departures: [d], arrivals: [arr], arrival: { kind: "rendezvous" } }, vsop);
    const tour = evaluateTour({ nodes: [{ body: "earth", epoch: d }, { body: "mars", epoch: arr }], arrival: { kind: "rendezvous" } }, vsop);
    expect(res.c3[0]).toBeCloseTo(tour.launch.c3, 9);
    expect(res.vinfArr[0]).toBeCloseTo(tour.arrival.vinf, 9);
    expect(res.dv[0]).toBeCloseTo(tour.launch.vinf + tour.arrival.vinf, 9);
  });

  it("arrival-epoch and time-of-flight grids give the same cells; NaN where the flight time is not positive", () => {
    const deps = range(isoToTdbSeconds("2026-10-01T00:00:00Z"), 10 * DAY_S, 4);
    const tofs = [-5 * DAY_S, 0, 200 * DAY_S, 300 * DAY_S];
    const byTof = porkchop({ from: "earth", to: "mars", departures: deps, tofs }, mean);
    for (let i = 0; i < deps.length; i++) {
      const byArr = porkchop({ from: "earth", to: "mars", departures: [deps[i]!], arrivals: tofs.map((t) => deps[i]! + t) }, mean);
      for (let j = 0; j < tofs.length; j++) {
        const a = byTof.dv[i * tofs.length + j]!;
        const b = byArr.dv[j]!;
        if (j < 2) {
          expect(Number.isNaN(a) && Number.isNaN(b)).toBe(true);
        } else {
          expect(a).toBeCloseTo(b, 12);
          expect(a).toBeGreaterThan(0);
        }
      }
    }
  });

  it("more revolutions never make a cell worse (best over 0..N revs)", () => {
    const deps = range(isoToTdbSeconds("2027-01-01T00:00:00Z"), 30 * DAY_S, 6);
    const tofs = range(500 * DAY_S, 60 * DAY_S, 6);
    const r0 = porkchop({ from: "earth", to: "mars", departures: deps, tofs, maxRevs: 0 }, mean);
    const r1 = porkchop({ from: "earth", to: "mars", departures: deps, tofs, maxRevs: 1 }, mean);
    let better = 0;
    for (let c = 0; c < r0.dv.length; c++) {
      expect(r1.dv[c]!).toBeLessThanOrEqual(r0.dv[c]! + 1e-12);
      if (r1.dv[c]! < r0.dv[c]! - 1e-6) better++;
    }
    expect(better).toBeGreaterThan(0);
  });

  it("rejects bad grids with RangeError", () => {
    const d = [0];
    expect(() => porkchop({ from: "earth", to: "mars", departures: d }, mean)).toThrow(RangeError);
    expect(() => porkchop({ from: "earth", to: "mars", departures: d, tofs: [1], arrivals: [1] }, mean)).toThrow(RangeError);
    expect(() => porkchop({ from: "earth", to: "mars", departures: [], tofs: [1] }, mean)).toThrow(RangeError);
    expect(() => porkchop({ from: "earth", to: "mars", departures: [Number.NaN], tofs: [1] }, mean)).toThrow(RangeError);
    expect(() => porkchop({ from: "earth", to: "mars", departures: d, tofs: [1], maxRevs: -1 }, mean)).toThrow(RangeError);
    expect(() => porkchop({ from: "earth", to: "custom:nope", departures: d, tofs: [1] }, mean)).toThrow(RangeError);
  });
});

describe("TourObjective", () => {
  it("matches tourObjective(evaluateTour(...)) at the published Cassini1 decision vector (GTOP, Vinkó & Izzo 2008, from memory)", () => {
    const x = [-789.8117, 158.302027105278, 449.385873819743, 54.7489684339665, 1024.36205846918, 4552.30796805542];
    const xs = [mjd2000ToTdbSeconds(x[0]!), ...x.slice(1).map((t) => t * DAY_S)];
    const ep = epochsOf(xs);
    for (const eph of [mean, vsop]) {
      const spec = { ...cassini1Spec, nodes: cassini1Spec.nodes.map((n, i) => ({ body: n.body, epoch: ep[i]! })) };
      const fast = new TourObjective(cassini1Spec, eph).value(xs);
      const result = evaluateTour(spec, eph);
      expect(fast).toBeCloseTo(tourObjective(result, spec), 9);
      expect(fast).toBeCloseTo(candidateValue(spec, ep, result), 9);
      // With our ephemerides the published optimum (4.9307 km/s with the benchmark's own) scores
      // worse: the optimum moves (CHECKS.md). Recorded values: mean ≈ 6.74, vsop ≈ 6.66 km/s.
      expect(fast).toBeGreaterThan(4.9307);
    }
  });

  it("caps add their documented penalties", () => {
    const d = isoToTdbSeconds("2026-11-01T00:00:00Z");
    const spec: TourSpec = { nodes: [{ body: "earth", epoch: d }, { body: "mars", epoch: d + 250 * DAY_S }] };
    const x = [d, 250 * DAY_S];
    const free = new TourObjective(spec, mean).value(x);
    const res = evaluateTour(spec, mean);
    const capped = new TourObjective(spec, mean, { caps: { c3: res.launch.c3 - 1, totalTof: 240 * DAY_S } }).value(x);
    expect(capped - free).toBeCloseTo(0.1 * 1 + 0.1 * 10, 9);
    const dvOnly = new TourObjective(spec, mean, { objective: "dv" }).value(x);
    expect(dvOnly).toBe(0); // flyby arrival, no flybys: nothing paid by the spacecraft
  });
});

describe("optimizeTour on Cassini1 (GTOP benchmark, Vinkó & Izzo 2008)", () => {
  it("mean-elements ephemeris: reaches 5.3073 km/s (our best known value for this ephemeris) with 300,000 evaluations", async () => {
    const { candidates, evaluations } = await optimizeTour(cassini1Spec, cassini1Bounds, mean, { seed: 1, budget: 300_000 });
    expect(evaluations).toBeLessThanOrEqual(300_001);
    const best = candidates[0]!;
    expect(best.value).toBeLessThan(5.3073 + 2e-3);
    // ranked, distinct, and candidates[0].result is evaluateTour at its epochs
    for (let i = 1; i < candidates.length; i++) expect(candidates[i]!.value).toBeGreaterThanOrEqual(candidates[i - 1]!.value);
    expect(candidates.length).toBeGreaterThan(1);
    const spec = { ...cassini1Spec, nodes: cassini1Spec.nodes.map((n, i) => ({ body: n.body, epoch: best.epochs[i]! })) };
    expect(best.result).toEqual(evaluateTour(spec, mean));
    expect(tourObjective(best.result, spec)).toBeCloseTo(best.value, 9);
  });

  it("astronomy-engine (cached): reaches 5.2307 km/s in the Venus–Venus ≈ 449 d (2 Venus years) basin", async () => {
    const { candidates } = await optimizeTour(cassini1Spec, cassini1Bounds, vsop, { seed: 1, budget: 300_000 });
    const best = candidates[0]!;
    expect(best.value).toBeLessThan(5.2307 + 2e-3);
    const vv = (best.epochs[2]! - best.epochs[1]!) / DAY_S;
    expect(Math.abs(vv - 449.4)).toBeLessThan(3);
  });

  it("is reproducible: the same seed gives the same candidates and evaluation count", async () => {
    const run = (seed: number) => optimizeTour(cassini1Spec, cassini1Bounds, mean, { seed, budget: 30_000 });
    const a = await run(7);
    const b = await run(7);
    expect(b.evaluations).toBe(a.evaluations);
    expect(b.candidates.map((c) => [c.value, ...c.epochs])).toEqual(a.candidates.map((c) => [c.value, ...c.epochs]));
  });

  it("cancelling through the signal resolves quickly with what was found so far", async () => {
    const ac = new AbortController();
    let progressed = 0;
    const t0 = Date.now();
    setTimeout(() => ac.abort(), 300);
    const { candidates, evaluations } = await optimizeTour(cassini1Spec, cassini1Bounds, mean, {
      seed: 3,
      budget: 50_000_000,
      signal: ac.signal,
      onProgress: () => progressed++,
    });
    expect(Date.now() - t0).toBeLessThan(3000);
    expect(evaluations).toBeLessThan(50_000_000);
    expect(progressed).toBeGreaterThan(0);
    expect(candidates.length).toBeGreaterThan(0);
    expect(Number.isFinite(candidates[0]!.value)).toBe(true);
  });

  it("honours a C3 cap on a single leg (penalty makes the capped optimum respect it)", async () => {
    const spec: TourSpec = { nodes: [{ body: "earth", epoch: 0 }, { body: "mars", epoch: 0 }], arrival: { kind: "rendezvous" } };
    const bounds: SearchBounds = {
      launch: [isoToTdbSeconds("2026-08-01T00:00:00Z"), isoToTdbSeconds("2027-03-01T00:00:00Z")],
      tof: [[120 * DAY_S, 400 * DAY_S]],
    };
    const { candidates } = await optimizeTour(spec, bounds, mean, { seed: 1, budget: 20_000, objective: "dv", caps: { c3: 12 } });
    expect(candidates[0]!.result.launch.c3).toBeLessThan(12 + 0.05);
  });

  it("rejects bad bounds and options with RangeError", async () => {
    await expect(optimizeTour(cassini1Spec, { launch: [0, 1], tof: [] }, mean)).rejects.toThrow(RangeError);
    await expect(optimizeTour(cassini1Spec, { ...cassini1Bounds, launch: [5, 1] }, mean)).rejects.toThrow(RangeError);
    await expect(optimizeTour(cassini1Spec, cassini1Bounds, mean, { budget: 0 })).rejects.toThrow(RangeError);
    await expect(optimizeTour(cassini1Spec, cassini1Bounds, mean, { objective: "x" as never })).rejects.toThrow(RangeError);
    await expect(optimizeTour({ nodes: [{ body: "earth", epoch: 0 }] }, { launch: [0, 1], tof: [] }, mean)).rejects.toThrow(RangeError);
  });
});

describe("islands", () => {
  const cand = (value: number, e0: number): SearchCandidate => ({
    value,
    epochs: [e0, e0 + 100 * DAY_S],
    result: {} as SearchCandidate["result"],
  });

  it("mergeCandidates: best first, ties kept in island order, duplicates (all epochs within 2 d) dropped", () => {
    const a = [cand(1, 0), cand(3, 50 * DAY_S)];
    const b = [cand(1, 10 * DAY_S), cand(2, 0.5 * DAY_S)];
    const m = mergeCandidates([a, b]);
    expect(m.map((c) => [c.value, c.epochs[0]! / DAY_S])).toEqual([
      [1, 0],
      [1, 10],
      [3, 50],
    ]);
  });

  it("islandBudget splits a budget exactly", () => {
    for (const n of [1, 2, 3, 7]) {
      let s = 0;
      for (let k = 0; k < n; k++) s += islandBudget(100_003, k, n);
      expect(s).toBe(100_003);
    }
  });

  it("runIsland: islands seeded seed + k, merged in island order, give the same answer twice", async () => {
    const task = { spec: cassini1Spec, bounds: cassini1Bounds, ephemeris: { kind: "mean" as const }, seed: 11, budget: 40_000, islands: 2 };
    const go = async () => mergeCandidates(await Promise.all([0, 1].map((island) => runIsland({ ...task, island }).then((r) => r.candidates))));
    const a = await go();
    const b = await go();
    expect(b.map((c) => c.epochs)).toEqual(a.map((c) => c.epochs));
    await expect(runIsland({ ...task, island: 2 })).rejects.toThrow(RangeError);
  });
});
