import { describe, expect, it } from "vitest";
import { turnAngleFor, rpForTurn, poweredFlyby, poweredFlybyRp } from "@/lib/astro/flyby";
import { propagate } from "@/lib/astro/kepler";
import { BODIES } from "@/lib/astro/constants";
import type { Vec3 } from "@/lib/astro/types";

const n3 = (a: ArrayLike<number>) => Math.hypot(a[0]!, a[1]!, a[2]!);
const ang = (a: Vec3, b: Vec3) =>
  Math.atan2(
    n3([a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]]),
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2],
  );
function rng(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("unpowered flyby relations (Curtis ch. 8: e = 1 + rp·v∞²/μ, δ = 2·asin(1/e))", () => {
  it("turn angle matches a hyperbola propagated far out (10⁹–10¹⁰ km) with kepler.propagate", () => {
    const mu = BODIES.venus.mu; // JPL planet-only GM (CHECKS.md)
    for (const [vinf, rp] of [
      [5, 6351.8],
      [3, 7000],
      [10, 20000],
    ] as const) {
      const vp = Math.sqrt(vinf * vinf + (2 * mu) / rp); // vis-viva at periapsis (Curtis ch. 2)
      const T = 1e10 / vinf; // about 10¹⁰ km out
      const outS = propagate([rp, 0, 0], [0, vp, 0], T, mu);
      const inS = propagate([rp, 0, 0], [0, vp, 0], -T, mu);
      expect(n3(outS.r)).toBeGreaterThan(1e9);
      const measured = ang(inS.v, outS.v);
      expect(Math.abs(measured - turnAngleFor(vinf, rp, mu))).toBeLessThan(1e-5);
    }
  });

  it("rpForTurn inverts turnAngleFor; limits δ = 0 → ∞ and δ = π → 0", () => {
    const mu = BODIES.earth.mu;
    for (const rp of [6678, 10000, 1e5, 1e6]) {
      for (const v of [0.5, 3, 12]) {
        const d = turnAngleFor(v, rp, mu);
        expect(rpForTurn(v, d, mu) / rp).toBeCloseTo(1, 9);
      }
    }
    expect(rpForTurn(3, 0, mu)).toBe(Infinity);
    expect(rpForTurn(3, Math.PI, mu)).toBeCloseTo(0, 6);
    expect(turnAngleFor(0, 7000, mu)).toBeCloseTo(Math.PI, 12);
  });

  it("a slower flyby turns more (common practice: δ decreases with v∞ and with rp)", () => {
    const mu = BODIES.jupiter.mu;
    expect(turnAngleFor(5, 600000, mu)).toBeGreaterThan(turnAngleFor(10, 600000, mu));
    expect(turnAngleFor(5, 600000, mu)).toBeGreaterThan(turnAngleFor(5, 1e6, mu));
  });

  it("rejects invalid input", () => {
    expect(() => turnAngleFor(5, 0, 1)).toThrow(RangeError);
    expect(() => turnAngleFor(5, 7000, 0)).toThrow(RangeError);
    expect(() => turnAngleFor(Number.NaN, 7000, 1)).toThrow(RangeError);
    expect(() => rpForTurn(5, 4, 1)).toThrow(RangeError);
    expect(() => rpForTurn(0, 1, 1)).toThrow(RangeError);
  });
});

describe("powered flyby (asin(1/e_in) + asin(1/e_out) = δ; Curtis ch. 8, GTOP model of Vinkó & Izzo 2008)", () => {
  it("unpowered case (equal |v∞|): dv ≈ 0 and rp = rpForTurn", () => {
    const mu = BODIES.earth.mu;
    const vin: Vec3 = [5, 0, 0];
    const d = 0.7;
    const vout: Vec3 = [5 * Math.cos(d), 5 * Math.sin(d), 0];
    const r = poweredFlyby(vin, vout, mu, 6778.1);
    expect(r.dv).toBeLessThan(1e-12);
    expect(r.turnAngle).toBeCloseTo(d, 14);
    expect(r.rp / rpForTurn(5, d, mu)).toBeCloseTo(1, 11);
    expect(r.eIn).toBeCloseTo(r.eOut, 12);
    expect(r.feasible).toBe(r.rp >= 6778.1);
  });

  it("solves the periapsis relation to 1e-12 over many random cases and dv follows the periapsis formula", () => {
    const rnd = rng(99);
    for (let k = 0; k < 5000; k++) {
      const mu = [BODIES.venus.mu, BODIES.earth.mu, BODIES.jupiter.mu][k % 3]!;
      const a = 0.5 + 15 * rnd();
      const b = 0.5 + 15 * rnd();
      const d = 1e-4 + (Math.PI - 2e-4) * rnd();
      const vin: Vec3 = [a, 0, 0];
      const vout: Vec3 = [b * Math.cos(d), 0, b * Math.sin(d)];
      const r = poweredFlyby(vin, vout, mu, 0);
      const res = Math.asin(1 / r.eIn) + Math.asin(1 / r.eOut) - d;
      expect(Math.abs(res)).toBeLessThan(1e-11);
      const dv = Math.abs(Math.sqrt(b * b + (2 * mu) / r.rp) - Math.sqrt(a * a + (2 * mu) / r.rp));
      expect(Math.abs(r.dv - dv)).toBeLessThan(1e-12 * (1 + dv));
      expect(r.eIn).toBeCloseTo(1 + (r.rp * a * a) / mu, 8);
      expect(poweredFlybyRp(a, b, d, mu) / r.rp).toBeCloseTo(1, 10);
    }
  });

  it("the powered solution flies: incoming hyperbola + periapsis burn + outgoing hyperbola reproduce v∞in, v∞out", () => {
    const mu = BODIES.earth.mu;
    const vin = 4, vout = 6, d = 1.1;
    const r = poweredFlyby([vin, 0, 0], [vout * Math.cos(d), vout * Math.sin(d), 0], mu, 0);
    const vpIn = Math.sqrt(vin * vin + (2 * mu) / r.rp);
    const vpOut = Math.sqrt(vout * vout + (2 * mu) / r.rp);
    expect(Math.abs(vpOut - vpIn - r.dv)).toBeLessThan(1e-12);
    const T = 2e9;
    const a = propagate([r.rp, 0, 0], [0, vpIn, 0], -T, mu);
    const b = propagate([r.rp, 0, 0], [0, vpOut, 0], T, mu);
    expect(Math.abs(ang(a.v, b.v) - d)).toBeLessThan(1e-5);
    // far out the speed tends to v∞ (vis-viva: v² = v∞² + 2μ/r)
    expect(n3(a.v)).toBeCloseTo(Math.sqrt(vin * vin + (2 * mu) / n3(a.r)), 9);
    expect(n3(b.v)).toBeCloseTo(Math.sqrt(vout * vout + (2 * mu) / n3(b.r)), 9);
    expect(Math.abs(n3(a.v) - vin)).toBeLessThan(1e-4);
  });

  it("feasible is rp ≥ rpMin; a full reversal needs rp = 0", () => {
    const mu = BODIES.venus.mu;
    const big = poweredFlyby([5, 0, 0], [0, 5, 0], mu, 6351.8);
    const rpNeeded = rpForTurn(5, Math.PI / 2, mu);
    expect(big.feasible).toBe(rpNeeded >= 6351.8);
    const tight = poweredFlyby([5, 0, 0], [0, 5, 0], mu, rpNeeded * 1.01);
    expect(tight.feasible).toBe(false);
    expect(tight.rp).toBeCloseTo(rpNeeded, 6);
    const rev = poweredFlyby([5, 0, 0], [-5, 0, 0], mu, 6351.8);
    expect(rev.rp).toBe(0);
    expect(rev.feasible).toBe(false);
    const straight = poweredFlyby([5, 0, 0], [6, 0, 0], mu, 6351.8);
    expect(straight.rp).toBe(Infinity);
    expect(straight.dv).toBeCloseTo(1, 12);
  });

  it("rejects invalid input", () => {
    expect(() => poweredFlyby([0, 0, 0], [1, 0, 0], 1, 0)).toThrow(RangeError);
    expect(() => poweredFlyby([1, 0, 0], [1, Number.NaN, 0], 1, 0)).toThrow(RangeError);
    expect(() => poweredFlyby([1, 0, 0], [0, 1, 0], 0, 0)).toThrow(RangeError);
    expect(() => poweredFlyby([1, 0, 0], [0, 1, 0], 1, -1)).toThrow(RangeError);
  });
});
