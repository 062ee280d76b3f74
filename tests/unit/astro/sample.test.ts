import { describe, expect, it } from "vitest";
import { sampleTour, spacecraftAt, spacecraftAtInto, legAt } from "@/lib/astro/sample";
import { lambert } from "@/lib/astro/lambert";
import { meanElementsEphemeris } from "@/lib/astro/ephemeris";
import { MU_SUN, DAY_S } from "@/lib/astro/constants";
import { propagate } from "@/lib/astro/kepler";
import type { BodyId, Ephemeris, TourResult, TourSpec, Vec3 } from "@/lib/astro/types";

const d3 = (a: ArrayLike<number>, b: ArrayLike<number>) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);

/** A minimal TourResult with the zero-rev prograde Lambert arc of every leg (no flyby data needed here). */
function lambertResult(spec: TourSpec, eph: Ephemeris): TourResult {
  const legs = [];
  for (let i = 0; i + 1 < spec.nodes.length; i++) {
    const a = spec.nodes[i]!;
    const b = spec.nodes[i + 1]!;
    const r1 = eph.state(a.body, a.epoch).r;
    const r2 = eph.state(b.body, b.epoch).r;
    const sol = lambert(r1, r2, b.epoch - a.epoch, MU_SUN)[0]!;
    legs.push({ from: a.body, to: b.body, tof: b.epoch - a.epoch, v1: sol.v1, v2: sol.v2, revs: 0 });
  }
  return {
    legs,
    launch: { vinf: 0, c3: 0, dla: 0, rla: 0 },
    flybys: [],
    arrival: { vinf: 0, dv: 0 },
    totalDv: 0,
    violations: [],
  };
}

// An invented three-leg chain (demo-style data; not a real mission).
const eph = meanElementsEphemeris();
const day = (d: number) => d * DAY_S;
const spec: TourSpec = {
  nodes: [
    { body: "earth" as BodyId, epoch: day(9000) },
    { body: "venus" as BodyId, epoch: day(9000 + 160) },
    { body: "earth" as BodyId, epoch: day(9000 + 160 + 420) },
    { body: "jupiter" as BodyId, epoch: day(9000 + 160 + 420 + 1000) },
  ],
};
const result = lambertResult(spec, eph);

describe("sampleTour", () => {
  const samples = sampleTour(spec, result, eph, { pointsPerLeg: 96 });

  it("has the documented layout", () => {
    expect(samples.epochs.length).toBe(3 * 96);
    expect(samples.positions.length).toBe(3 * samples.epochs.length);
    expect(samples.legStarts).toEqual([0, 96, 192]);
    expect(samples.legOk).toEqual([true, true, true]);
    for (let k = 1; k < samples.epochs.length; k++) expect(samples.epochs[k]!).toBeGreaterThanOrEqual(samples.epochs[k - 1]!);
  });

  it("each arc starts at the departure body and ends at the arrival body (Lambert + propagation)", () => {
    // Tolerance 1 km over 10⁸–10⁹ km: the Lambert solution and the propagator are independent
    // implementations of the same two-body problem (common practice: they must agree closely).
    for (let i = 0; i < 3; i++) {
      const s = samples.legStarts[i]!;
      const e = s + 95;
      const from = eph.state(spec.nodes[i]!.body, spec.nodes[i]!.epoch).r;
      const to = eph.state(spec.nodes[i + 1]!.body, spec.nodes[i + 1]!.epoch).r;
      expect(d3(samples.positions.subarray(3 * s, 3 * s + 3), from)).toBeLessThan(1);
      expect(d3(samples.positions.subarray(3 * e, 3 * e + 3), to)).toBeLessThan(1);
      expect(samples.epochs[s]).toBe(spec.nodes[i]!.epoch);
      expect(samples.epochs[e]).toBe(spec.nodes[i + 1]!.epoch);
    }
  });

  it("is a conic, not a straight line: mid-leg samples sit far from the chord", () => {
    // Leg 3 (Earth → Jupiter, 1000 d) sweeps well over 90°: the midpoint is far off the chord.
    const s = samples.legStarts[2]!;
    const a = samples.positions.subarray(3 * s, 3 * s + 3);
    const b = samples.positions.subarray(3 * (s + 95), 3 * (s + 95) + 3);
    const mid = samples.positions.subarray(3 * (s + 48), 3 * (s + 48) + 3);
    const chordMid = [(a[0]! + b[0]!) / 2, (a[1]! + b[1]!) / 2, (a[2]! + b[2]!) / 2];
    expect(d3(mid, chordMid)).toBeGreaterThan(5e7);
  });

  it("spacing is denser near the ends of a leg than in the middle", () => {
    const e = samples.epochs;
    expect(e[1]! - e[0]!).toBeLessThan((e[48]! - e[47]!) / 10);
  });

  it("spacecraftAt at node epochs equals the body positions", () => {
    for (let i = 0; i < spec.nodes.length; i++) {
      const n = spec.nodes[i]!;
      const r = spacecraftAt(samples, n.epoch);
      expect(d3(r, eph.state(n.body, n.epoch).r)).toBeLessThan(1);
    }
  });

  it("spacecraftAt between samples matches direct propagation (Hermite accuracy)", () => {
    // Reference: kepler.propagate from the departure state; tolerance 2,000 km at the coarsest
    // spacing (~16 d) of a 1000-day leg with 96 samples — visual accuracy (common practice).
    for (let i = 0; i < 3; i++) {
      const a = spec.nodes[i]!;
      const b = spec.nodes[i + 1]!;
      const r0 = eph.state(a.body, a.epoch).r;
      for (const f of [0.013, 0.21, 0.5, 0.77, 0.993]) {
        const t = a.epoch + f * (b.epoch - a.epoch);
        const ref = propagate(r0, result.legs[i]!.v1, t - a.epoch, MU_SUN).r;
        expect(d3(spacecraftAt(samples, t), ref)).toBeLessThan(2000);
      }
    }
  });

  it("clamps outside the tour and picks the right leg", () => {
    const first = spacecraftAt(samples, spec.nodes[0]!.epoch - 1e9);
    const last = spacecraftAt(samples, spec.nodes[3]!.epoch + 1e9);
    expect(d3(first, samples.positions.subarray(0, 3))).toBe(0);
    const m = samples.epochs.length - 1;
    expect(d3(last, samples.positions.subarray(3 * m, 3 * m + 3))).toBe(0);
    expect(legAt(samples, spec.nodes[1]!.epoch + 1)).toBe(1);
    expect(legAt(samples, spec.nodes[0]!.epoch - 5)).toBe(0);
    const out = new Float64Array(3);
    spacecraftAtInto(samples, spec.nodes[2]!.epoch + day(3), out);
    expect(d3(out, spacecraftAt(samples, spec.nodes[2]!.epoch + day(3)))).toBe(0);
  });

  it("marks a leg without a solution and stays finite", () => {
    const broken: TourResult = { ...result, legs: [result.legs[0]!, { ...result.legs[1]!, v1: [NaN, NaN, NaN] as Vec3 }] };
    const s = sampleTour(spec, broken, eph, { pointsPerLeg: 8 });
    expect(s.legOk).toEqual([true, false, false]);
    for (const x of s.positions) expect(Number.isFinite(x)).toBe(true);
  });

  it("rejects bad input with RangeError", () => {
    expect(() => sampleTour({ nodes: [spec.nodes[0]!] }, result, eph)).toThrow(RangeError);
    expect(() => sampleTour(spec, result, eph, { pointsPerLeg: 1 })).toThrow(RangeError);
    expect(() => sampleTour({ nodes: [spec.nodes[1]!, spec.nodes[0]!] }, result, eph)).toThrow(RangeError);
    expect(() => spacecraftAt(samples, NaN)).toThrow(RangeError);
  });
});
