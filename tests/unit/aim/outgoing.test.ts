import { describe, expect, it } from "vitest";
import { aimUpdate, buildAimContext, vinfOutForAim } from "@/lib/aim/outgoing";
import { vinfOutFromAim } from "@/lib/astro/bplane";
import { lambert } from "@/lib/astro/lambert";
import { meanElementsEphemeris } from "@/lib/astro/ephemeris";
import { MU_SUN, DAY_S, BODIES } from "@/lib/astro/constants";
import type { BodyId, Ephemeris, TourResult, TourSpec } from "@/lib/astro/types";

function lambertResult(spec: TourSpec, eph: Ephemeris): TourResult {
  const legs = spec.nodes.slice(1).map((b, i) => {
    const a = spec.nodes[i]!;
    const sol = lambert(eph.state(a.body, a.epoch).r, eph.state(b.body, b.epoch).r, b.epoch - a.epoch, MU_SUN)[0]!;
    return { from: a.body, to: b.body, tof: b.epoch - a.epoch, v1: sol.v1, v2: sol.v2, revs: 0 };
  });
  return { legs, launch: { vinf: 0, c3: 0, dla: 0, rla: 0 }, flybys: [], arrival: { vinf: 0, dv: 0 }, totalDv: 0, violations: [] };
}

// An invented Earth → Venus → Earth → Jupiter chain (demo-style epochs, not a real mission).
const eph = meanElementsEphemeris();
const day = (d: number) => d * DAY_S;
const spec: TourSpec = {
  nodes: [
    { body: "earth" as BodyId, epoch: day(9000) },
    { body: "venus" as BodyId, epoch: day(9160) },
    { body: "earth" as BodyId, epoch: day(9580) },
    { body: "jupiter" as BodyId, epoch: day(10580) },
  ],
};
const result = lambertResult(spec, eph);
const ctx = buildAimContext({ spec, result, nodeIndex: 1, ephemeris: eph });

describe("aim drag update", () => {
  it("aiming at the planned point reproduces the planned outgoing v∞ and meets the next body (≈ 0 miss)", () => {
    const out = vinfOutForAim(ctx, ctx.planned.bT, ctx.planned.bR).vinfOut;
    const dv = Math.hypot(out[0] - ctx.vinfOutPlanned[0], out[1] - ctx.vinfOutPlanned[1], out[2] - ctx.vinfOutPlanned[2]);
    expect(dv).toBeLessThan(1e-9);
    const r = aimUpdate(ctx, ctx.planned.bT, ctx.planned.bR);
    // Lambert + propagation consistency (common practice): well under 10 km over 420 days.
    expect(r.missAtPlanned).toBeLessThan(10);
    expect(r.closest.distance).toBeLessThan(10);
    expect(Math.abs(r.dtVsPlanned)).toBeLessThan(600);
    expect(r.closest.onEdge).toBe(false);
    expect(r.arc.length).toBe(3 * ctx.arcEpochs.length);
  });

  it("for an unpowered flyby it equals bplane.vinfOutFromAim (independent implementation)", () => {
    const unpowered = { ...ctx, vinfOutMag: ctx.vinfInMag };
    for (const [bT, bR] of [[12000, 3000], [-8000, -9000], [0, 20000]] as const) {
      const a = vinfOutForAim(unpowered, bT, bR).vinfOut;
      const b = vinfOutFromAim(ctx.vinfIn, bT, bR, ctx.mu).vinfOut;
      expect(Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2])).toBeLessThan(1e-12);
    }
  });

  it("readouts follow the hyperbola relations |B| = rp·√(1 + 2μ/(rp·v∞²)) (Curtis ch. 8)", () => {
    const r = aimUpdate(ctx, ctx.planned.bT + 2500, ctx.planned.bR - 1000);
    const v = ctx.vinfInMag;
    expect(r.rp * Math.sqrt(1 + (2 * ctx.mu) / (r.rp * v * v))).toBeCloseTo(r.b, 6);
    expect(r.altitude).toBeCloseTo(r.rp - BODIES.venus.radius, 9);
    expect(r.theta).toBeCloseTo(Math.atan2(r.bR, r.bT), 15);
    expect(r.turnAngle).toBeGreaterThan(0);
  });

  it("moving the aim 1,000 km off the planned point opens a large miss at the next body", () => {
    const r = aimUpdate(ctx, ctx.planned.bT + 1000, ctx.planned.bR);
    expect(r.missAtPlanned).toBeGreaterThan(1e4);
    expect(r.closest.distance).toBeLessThanOrEqual(r.missAtPlanned + 1e-6);
  });

  it("flags an aim inside the impact circle and below the minimum altitude", () => {
    const inside = aimUpdate(ctx, ctx.impactRadius * 0.5, 0);
    expect(inside.impact).toBe(true);
    expect(inside.belowMin).toBe(true);
    const between = aimUpdate(ctx, (ctx.impactRadius + ctx.minAltRadius) / 2, 0);
    expect(between.impact).toBe(false);
    expect(between.belowMin).toBe(true);
  });

  it("rejects a node that is not a flyby and a non-finite aim", () => {
    expect(() => buildAimContext({ spec, result, nodeIndex: 0, ephemeris: eph })).toThrow(RangeError);
    expect(() => buildAimContext({ spec, result, nodeIndex: 3, ephemeris: eph })).toThrow(RangeError);
    expect(() => aimUpdate(ctx, NaN, 0)).toThrow(RangeError);
    const broken = { ...result, legs: [result.legs[0]!, { ...result.legs[1]!, v1: [NaN, 0, 0] as [number, number, number] }] };
    expect(() => buildAimContext({ spec, result: broken, nodeIndex: 1, ephemeris: eph })).toThrow(RangeError);
  });
});

describe("aim context with the spin pole", () => {
  it("keeps |B| and the needed point's geometry; re-expressing the aim between frames is exact", async () => {
    const { spinPole } = await import("@/lib/astro/frames");
    const { reexpressAim } = await import("@/lib/aim/plot");
    const node = spec.nodes[1]!;
    const spin = buildAimContext({ spec, result, nodeIndex: 1, ephemeris: eph, pole: "spin", spinPole: spinPole("venus", node.epoch) });
    const ecl = ctx;
    // Same incoming asymptote, different T axis: |B|, rp and the turn angle do not depend on the pole.
    expect(Math.hypot(spin.planned.bT, spin.planned.bR)).toBeCloseTo(Math.hypot(ecl.planned.bT, ecl.planned.bR), 6);
    expect(spin.planned.rp).toBeCloseTo(ecl.planned.rp, 6);
    // Venus's IAU north pole lies a few degrees off ecliptic north (IAU WGCCRE, from memory): the T axes differ.
    expect(Math.abs(spin.planned.bT - ecl.planned.bT)).toBeGreaterThan(1);
    const moved = reexpressAim(ecl.planned.bT, ecl.planned.bR, ecl, spin);
    expect(moved.bT).toBeCloseTo(spin.planned.bT, 6);
    expect(moved.bR).toBeCloseTo(spin.planned.bR, 6);
    // The same physical aim gives the same outgoing v∞ in either frame.
    const a = vinfOutForAim(ecl, ecl.planned.bT + 500, ecl.planned.bR - 300).vinfOut;
    const m2 = reexpressAim(ecl.planned.bT + 500, ecl.planned.bR - 300, ecl, spin);
    const b = vinfOutForAim(spin, m2.bT, m2.bR).vinfOut;
    expect(Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2])).toBeLessThan(1e-9);
  });
});
