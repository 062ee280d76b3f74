/**
 * Tests of lib/astro/lambert.ts (Izzo's Lambert algorithm).
 *
 * Reference values: /work/shared/CHECKS.md (sources named beside each check). Property tests
 * propagate every returned solution with universal-variable Kepler propagation for the time of
 * flight and require that it reaches r2: the project's lib/astro/kepler.ts `propagate` and an
 * independent test-only propagator (tests/support/propagate.ts) must both agree.
 */
import { describe, expect, it } from "vitest";
import { lambert, lambertInto } from "@/lib/astro/lambert";
import { propagate } from "@/lib/astro/kepler";
import { propagateUV } from "../../support/propagate";
import type { LambertSolution } from "@/lib/astro/types";

type V = [number, number, number];
const AU = 149597870.7; // km (IAU 2012 Resolution B2)
const DAY = 86400;
const MU_SUN = 1.32712440018e11; // km³/s², JPL planet-only GM (CHECKS.md)
const MU_EARTH = 398600.4418; // km³/s², Vallado 4th ed. (from memory)

/** mulberry32 PRNG (common practice): seeded, reproducible. */
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

function randomDir(rnd: () => number): V {
  const z = 2 * rnd() - 1;
  const phi = 2 * Math.PI * rnd();
  const q = Math.sqrt(1 - z * z);
  return [q * Math.cos(phi), q * Math.sin(phi), z];
}

const norm = (a: readonly number[]) => Math.hypot(a[0]!, a[1]!, a[2]!);
const sub = (a: readonly number[], b: readonly number[]): V => [a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!];
const cross = (a: readonly number[], b: readonly number[]): V => [
  a[1]! * b[2]! - a[2]! * b[1]!,
  a[2]! * b[0]! - a[0]! * b[2]!,
  a[0]! * b[1]! - a[1]! * b[0]!,
];
const scale = (a: readonly number[], k: number): V => [a[0]! * k, a[1]! * k, a[2]! * k];

/** Relative miss |r(tof) − r2| / |r2| after propagating (r1, v1), with both propagators. */
function miss(r1: V, v1: readonly number[], tof: number, mu: number, r2: V): { project: number; independent: number } {
  const a = propagate(r1, v1 as V, tof, mu).r;
  const b = propagateUV(r1, v1, tof, mu).r;
  return { project: norm(sub(a, r2)) / norm(r2), independent: norm(sub(b, r2)) / norm(r2) };
}

/** Periapsis radius of the conic through (r, v), km. */
function periapsis(r: V, v: readonly number[], mu: number): number {
  const h = norm(cross(r, v));
  const en = (v[0]! ** 2 + v[1]! ** 2 + v[2]! ** 2) / 2 - mu / norm(r);
  const e = Math.sqrt(Math.max(0, 1 + (2 * en * h * h) / (mu * mu)));
  return (h * h) / (mu * (1 + e));
}

function expectVec(actual: readonly number[], expected: readonly number[], tol: number): void {
  for (let k = 0; k < 3; k++) expect(Math.abs(actual[k]! - expected[k]!)).toBeLessThanOrEqual(tol);
}

describe("lambert: published examples (CHECKS.md)", () => {
  it("geocentric 1 h transfer — Curtis, Orbital Mechanics for Engineering Students, Example 5.2", () => {
    const sols = lambert([5000, 10000, 2100], [-14600, 2500, 7000], 3600, 398600);
    expect(sols).toHaveLength(1);
    const s = sols[0]!;
    expect(s.revs).toBe(0);
    expect(s.branch).toBe("single");
    // Curtis Example 5.2 (the book prints 4–5 digits; 6-decimal values from CHECKS.md)
    expectVec(s.v1, [-5.992495, 1.925363, 3.245637], 2e-6);
    expectVec(s.v2, [-3.31246, -4.196617, -0.385288], 2e-6);
  });

  it("short way, 76 min — Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Example 7-5 (from memory)", () => {
    const r1: V = [15945.34, 0, 0];
    const r2: V = [12214.83899, 10249.46731, 0];
    const [s] = lambert(r1, r2, 76 * 60, MU_EARTH);
    // Vallado Example 7-5 (from memory), ±2e-6 km/s
    expectVec(s!.v1, [2.058913, 2.915964, 0], 2e-6);
    expectVec(s!.v2, [-3.451565, 0.910314, 0], 2e-6);
  });

  it("long way (prograde: false, h_z < 0, 320° sweep) — Vallado Example 7-5 (from memory)", () => {
    const r1: V = [15945.34, 0, 0];
    const r2: V = [12214.83899, 10249.46731, 0];
    const [s] = lambert(r1, r2, 4560, MU_EARTH, { prograde: false });
    // Vallado Example 7-5 (from memory)
    expectVec(s!.v1, [-3.811158, -2.003854, 0], 2e-6);
    expectVec(s!.v2, [4.207569, 0.914724, 0], 2e-6);
    expect(cross(r1, s!.v1)[2]).toBeLessThan(0);
  });

  it("Earth→Mars, 309 days: departure and arrival v∞ — Curtis Example 8.8 (from memory)", () => {
    const r1: V = [1.04994e8, 1.04655e8, 988.331];
    const r2: V = [-2.08329e7, -2.18404e8, -4.06287e6];
    const vE: V = [-21.5148, 20.9865, 0.000132284];
    const vM: V = [25.0386, -0.220288, -0.620623];
    const [s] = lambert(r1, r2, 309 * DAY, MU_SUN);
    // Curtis Example 8.8 (from memory): v∞ dep 3.1653 km/s, arr 2.8853 km/s, ±1e-3 (6-digit inputs)
    expect(Math.abs(norm(sub(s!.v1, vE)) - 3.1653)).toBeLessThan(1e-3);
    expect(Math.abs(norm(sub(s!.v2, vM)) - 2.8853)).toBeLessThan(1e-3);
  });
});

interface CaseSet {
  name: string;
  seed: number;
  count: number;
  rMin: number;
  rMax: number;
  tofMin: number;
  tofMax: number;
  mu: number;
  maxRevs: number;
}

const SETS: CaseSet[] = [
  // heliocentric, wide: the benchmark's domain (mostly single-rev, many hyperbolic arcs)
  { name: "heliocentric 0.3–30 AU, 20–3000 d", seed: 11, count: 2000, rMin: 0.3 * AU, rMax: 30 * AU, tofMin: 20 * DAY, tofMax: 3000 * DAY, mu: MU_SUN, maxRevs: 2 },
  // heliocentric, inner: many multi-revolution solutions
  { name: "heliocentric 0.5–2 AU, 100–3000 d", seed: 12, count: 1500, rMin: 0.5 * AU, rMax: 2 * AU, tofMin: 100 * DAY, tofMax: 3000 * DAY, mu: MU_SUN, maxRevs: 5 },
  // geocentric
  { name: "geocentric 6600–50000 km, 10 min–2 d", seed: 13, count: 1500, rMin: 6600, rMax: 50000, tofMin: 600, tofMax: 2 * DAY, mu: MU_EARTH, maxRevs: 4 },
];

describe("lambert: every solution reaches r2 (seeded random cases)", () => {
  for (const set of SETS) {
    it(`${set.name}: all N and branches, propagated for tof, miss < 1e-9 relative; h_z sign matches prograde`, () => {
      const rnd = mulberry32(set.seed);
      let solutions = 0;
      let multi = 0;
      let wellConditioned = 0;
      let worstProject = 0;
      let worstIndependent = 0;
      let worstIll = 0;
      for (let i = 0; i < set.count; i++) {
        const a = set.rMin + (set.rMax - set.rMin) * rnd();
        const b = set.rMin + (set.rMax - set.rMin) * rnd();
        const r1 = scale(randomDir(rnd), a);
        const r2 = scale(randomDir(rnd), b);
        const tof = set.tofMin + (set.tofMax - set.tofMin) * rnd();
        const prograde = rnd() < 0.5;
        const sols = lambert(r1, r2, tof, set.mu, { prograde, maxRevs: set.maxRevs });

        // Structure: one single-rev solution, then complete (left, right) pairs for N = 1…k.
        expect(sols.length % 2).toBe(1);
        expect(sols[0]!.branch).toBe("single");
        expect(sols[0]!.revs).toBe(0);
        for (let k = 1; k < sols.length; k += 2) {
          const L = sols[k]!;
          const R = sols[k + 1]!;
          expect([L.revs, L.branch, R.revs, R.branch]).toEqual([(k + 1) / 2, "left", (k + 1) / 2, "right"]);
          expect(norm(sub(L.v1, R.v1))).toBeGreaterThan(0); // two distinct roots
        }

        for (const s of sols) {
          solutions++;
          if (s.revs > 0) multi++;
          expect(s.iterations).toBeGreaterThan(0);
          expect(s.iterations).toBeLessThanOrEqual(15);
          // prograde ⇔ h_z > 0 (skip only planes so steep that h_z is rounding noise)
          const h = cross(r1, s.v1);
          if (Math.abs(h[2]) > 1e-9 * norm(h)) expect(h[2] > 0).toBe(prograde);

          const m = miss(r1, s.v1, tof, set.mu, r2);
          // Conditioning: an arc whose conic periapsis is < 2 % of the smaller radius swings
          // past the centre at huge speed (heliocentric: inside a few solar radii, v ~ 1000
          // km/s); the final position then amplifies any rounding of v1 by ~ r/rp. There only
          // the project propagator (with its hyperbolic-anomaly path) is used, and the
          // tolerance is scaled by the conditioning: 1e-9 · 0.02·min(r1, r2)/rp.
          const rp = periapsis(r1, s.v1, set.mu);
          if (rp >= 0.02 * Math.min(a, b)) {
            wellConditioned++;
            worstProject = Math.max(worstProject, m.project);
            worstIndependent = Math.max(worstIndependent, m.independent);
            expect(m.project).toBeLessThan(1e-9);
            expect(m.independent).toBeLessThan(1e-9);
          } else {
            const scaled = (m.project * rp) / (0.02 * Math.min(a, b));
            worstIll = Math.max(worstIll, scaled);
            expect(scaled).toBeLessThan(1e-9);
          }
        }
      }
      // the filter must not hollow the test out
      expect(wellConditioned).toBeGreaterThan(0.75 * solutions);
      if (set.maxRevs >= 4) expect(multi).toBeGreaterThan(set.count);
      expect(worstProject).toBeLessThan(1e-9);
      expect(worstIndependent).toBeLessThan(1e-9);
      expect(worstIll).toBeLessThan(1e-9);
    });
  }
});

describe("lambert: multi-revolution minimum time of flight", () => {
  /** The smallest tof (bisection) at which lambert returns N-rev solutions. */
  function thresholdTof(r1: V, r2: V, mu: number, N: number, prograde: boolean, lo: number, hi: number): number {
    const has = (t: number) => lambert(r1, r2, t, mu, { prograde, maxRevs: N }).some((s) => s.revs === N);
    expect(has(lo)).toBe(false);
    expect(has(hi)).toBe(true);
    for (let k = 0; k < 80; k++) {
      const mid = 0.5 * (lo + hi);
      if (has(mid)) hi = mid;
      else lo = mid;
    }
    return hi;
  }

  const rnd = mulberry32(99);
  const geometries: { r1: V; r2: V; prograde: boolean }[] = [];
  for (let i = 0; i < 12; i++) {
    geometries.push({
      r1: scale(randomDir(rnd), (0.7 + 1.5 * rnd()) * AU),
      r2: scale(randomDir(rnd), (0.7 + 1.5 * rnd()) * AU),
      prograde: rnd() < 0.5,
    });
  }

  it("none below the minimum, two above; at the minimum the left and right branches merge", () => {
    for (const g of geometries) {
      for (const N of [1, 2, 3]) {
        // bracket: N revolutions of the smallest circular orbit cannot be done in less than …
        const rmin = Math.min(norm(g.r1), norm(g.r2));
        const lo = 0.2 * N * 2 * Math.PI * Math.sqrt(rmin ** 3 / MU_SUN);
        const rmax = Math.max(norm(g.r1), norm(g.r2));
        const hi = (N + 1) * 2 * Math.PI * Math.sqrt((2 * rmax) ** 3 / MU_SUN);
        const tMin = thresholdTof(g.r1, g.r2, MU_SUN, N, g.prograde, lo, hi);

        const below = lambert(g.r1, g.r2, tMin * (1 - 1e-6), MU_SUN, { prograde: g.prograde, maxRevs: N });
        expect(below.filter((s) => s.revs === N)).toHaveLength(0);
        for (const f of [1 + 1e-6, 1.01, 1.5]) {
          const t = tMin * f;
          const above = lambert(g.r1, g.r2, t, MU_SUN, { prograde: g.prograde, maxRevs: N }).filter((s) => s.revs === N);
          expect(above.map((s) => s.branch)).toEqual(["left", "right"]);
          for (const s of above) expect(miss(g.r1, s.v1, t, MU_SUN, g.r2).project).toBeLessThan(1e-9);
          const gap = norm(sub(above[0]!.v1, above[1]!.v1)) / norm(above[0]!.v1);
          // a fold: the two roots separate like √(t − tMin); just above tMin they (nearly)
          // coincide, which shows the threshold is the true minimum and not a missed root.
          if (f === 1 + 1e-6) expect(gap).toBeLessThan(0.02);
          if (f === 1.5) expect(gap).toBeGreaterThan(0.02);
        }
      }
    }
  });
});

describe("lambert: geometry edge cases", () => {
  const r1: V = [1.2 * AU, 0.1 * AU, 0.05 * AU];
  const rotZ = (v: V, ang: number): V => [
    v[0] * Math.cos(ang) - v[1] * Math.sin(ang),
    v[0] * Math.sin(ang) + v[1] * Math.cos(ang),
    v[2],
  ];

  it("is stable near (but not at) 180°: both directions, both senses reach r2", () => {
    for (const eps of [1e-3, 1e-6, 1e-9, 1e-12, 1e-14]) {
      for (const sign of [1, -1]) {
        const r2 = scale(rotZ(r1, Math.PI + sign * eps), 1.3);
        for (const prograde of [true, false]) {
          const tof = 250 * DAY;
          const sols = lambert(r1, r2, tof, MU_SUN, { prograde, maxRevs: 1 });
          expect(sols.length).toBeGreaterThanOrEqual(1);
          for (const s of sols) {
            expect(s.v1.every(Number.isFinite)).toBe(true);
            expect(miss(r1, s.v1, tof, MU_SUN, r2).project).toBeLessThan(1e-9);
            expect(cross(r1, s.v1)[2] > 0).toBe(prograde);
          }
        }
      }
    }
  });

  it("is stable near 180° in random planes (r2 ≈ −k·r1 plus a tiny sideways offset)", () => {
    const rnd = mulberry32(180);
    for (let i = 0; i < 1000; i++) {
      const a = (0.5 + 5 * rnd()) * AU;
      const u = randomDir(rnd);
      const w = randomDir(rnd);
      const side = cross(u, w); // ⟂ u
      const offset = 10 ** (-3 - 11 * rnd()); // 1e-3 … 1e-14 of the radius
      const k = 0.5 + 2 * rnd();
      const p1 = scale(u, a);
      const p2: V = [0, 1, 2].map((j) => -k * a * u[j]! + offset * a * side[j]! / norm(side)) as V;
      const tof = (50 + 1500 * rnd()) * DAY;
      const prograde = rnd() < 0.5;
      for (const s of lambert(p1, p2, tof, MU_SUN, { prograde, maxRevs: 2 })) {
        expect(miss(p1, s.v1, tof, MU_SUN, p2).project).toBeLessThan(1e-9);
        const h = cross(p1, s.v1);
        if (Math.abs(h[2]) > 1e-9 * norm(h)) expect(h[2] > 0).toBe(prograde);
      }
    }
  });

  it("recovers a parabolic arc (Izzo's x = 1, where the closed-form derivatives are 0/0)", () => {
    const mu = MU_EARTH;
    const r1: V = [7000, 0, 0];
    const vEsc = Math.sqrt((2 * mu) / 7000); // parabola: v = √(2μ/r) (any textbook)
    const v1: V = [0, 0.6 * vEsc, 0.8 * vEsc];
    for (const dt of [600, 3600, 86400]) {
      const r2 = propagate(r1, v1, dt, mu).r;
      const sols = lambert(r1, r2, dt, mu);
      expect(sols).toHaveLength(1);
      expectVec(sols[0]!.v1, v1, 1e-9 * vEsc);
      expect(sols[0]!.iterations).toBeLessThanOrEqual(15);
    }
  });

  it("finds every revolution count up to a large maxRevs (LEO, 10 days)", () => {
    const r1: V = [7000, 100, 0];
    const r2: V = [-7100, 3000, 500];
    const tof = 10 * DAY;
    for (const prograde of [true, false]) {
      const sols = lambert(r1, r2, tof, MU_EARTH, { prograde, maxRevs: 200 });
      // ~139 periods of a 7000 km orbit fit in 10 days; each N up to the largest feasible has two roots
      const nTop = sols[sols.length - 1]!.revs;
      expect(nTop).toBeGreaterThan(100);
      expect(nTop).toBeLessThan(200);
      expect(sols).toHaveLength(2 * nTop + 1);
      for (const s of sols) expect(miss(r1, s.v1, tof, MU_EARTH, r2).project).toBeLessThan(1e-9);
    }
  });

  it("prograde means h_z > 0, not the short way: a 270° prograde arc", () => {
    const r2 = rotZ(r1, -Math.PI / 2); // 90° clockwise from r1: prograde must sweep 270°
    const tof = 300 * DAY;
    const [pro] = lambert(r1, r2, tof, MU_SUN, { prograde: true });
    const [retro] = lambert(r1, r2, tof, MU_SUN, { prograde: false });
    expect(cross(r1, pro!.v1)[2]).toBeGreaterThan(0);
    expect(cross(r1, retro!.v1)[2]).toBeLessThan(0);
    expect(miss(r1, pro!.v1, tof, MU_SUN, r2).project).toBeLessThan(1e-9);
    expect(miss(r1, retro!.v1, tof, MU_SUN, r2).project).toBeLessThan(1e-9);
  });

  it("throws RangeError for exactly collinear r1, r2 (0° and 180°)", () => {
    expect(() => lambert(r1, scale(r1, 2), DAY, MU_SUN)).toThrow(RangeError);
    expect(() => lambert(r1, scale(r1, -1), DAY, MU_SUN)).toThrow(/collinear/);
    expect(() => lambertInto(new Float64Array(6), r1, r1, DAY, MU_SUN, true, 0)).toThrow(/collinear/);
  });
});

describe("lambert: input validation", () => {
  const r1: V = [7000, 0, 0];
  const r2: V = [0, 8000, 100];
  const bad: [string, () => unknown, RegExp][] = [
    ["NaN in r1", () => lambert([NaN, 0, 0], r2, 3000, MU_EARTH), /r1/],
    ["Infinity in r2", () => lambert(r1, [0, Infinity, 0], 3000, MU_EARTH), /r2/],
    ["short r1", () => lambert([7000, 0] as unknown as V, r2, 3000, MU_EARTH), /r1/],
    ["zero r1", () => lambert([0, 0, 0], r2, 3000, MU_EARTH), /r1.*zero/],
    ["zero r2", () => lambert(r1, new Float64Array(3), 3000, MU_EARTH), /r2.*zero/],
    ["tof 0", () => lambert(r1, r2, 0, MU_EARTH), /tof/],
    ["tof < 0", () => lambert(r1, r2, -5, MU_EARTH), /tof/],
    ["tof NaN", () => lambert(r1, r2, NaN, MU_EARTH), /tof/],
    ["tof Infinity", () => lambert(r1, r2, Infinity, MU_EARTH), /tof/],
    ["mu 0", () => lambert(r1, r2, 3000, 0), /mu/],
    ["mu < 0", () => lambert(r1, r2, 3000, -1), /mu/],
    ["mu NaN", () => lambert(r1, r2, 3000, NaN), /mu/],
    ["maxRevs -1", () => lambert(r1, r2, 3000, MU_EARTH, { maxRevs: -1 }), /maxRevs/],
    ["maxRevs 1.5", () => lambert(r1, r2, 3000, MU_EARTH, { maxRevs: 1.5 }), /maxRevs/],
    ["maxRevs NaN", () => lambert(r1, r2, 3000, MU_EARTH, { maxRevs: NaN }), /maxRevs/],
    ["maxRevs Infinity", () => lambert(r1, r2, 3000, MU_EARTH, { maxRevs: Infinity }), /maxRevs/],
    ["prograde not a boolean", () => lambert(r1, r2, 3000, MU_EARTH, { prograde: "yes" as unknown as boolean }), /prograde/],
    ["lambertInto prograde undefined", () => lambertInto(new Float64Array(6), r1, r2, 3000, MU_EARTH, undefined as unknown as boolean, 0), /prograde/],
    ["lambertInto out too short", () => lambertInto(new Float64Array(12), r1, r2, 3000, MU_EARTH, true, 1), /out/],
    ["lambertInto tof 0", () => lambertInto(new Float64Array(6), r1, r2, 0, MU_EARTH, true, 0), /tof/],
  ];
  for (const [label, fn, msg] of bad) {
    it(`throws RangeError naming the argument: ${label}`, () => {
      expect(fn).toThrow(RangeError);
      expect(fn).toThrow(msg);
    });
  }
});

describe("lambertInto", () => {
  it("writes the same solutions as lambert, in the same order, from tuples or Float64Arrays", () => {
    const r1: V = [0.9 * AU, 0.3 * AU, 0.01 * AU];
    const r2: V = [-0.8 * AU, 1.1 * AU, -0.02 * AU];
    const tof = 1400 * DAY;
    const maxRevs = 3;
    const sols: LambertSolution[] = lambert(r1, r2, tof, MU_SUN, { maxRevs });
    expect(sols.length).toBeGreaterThanOrEqual(3);
    const out = new Float64Array(6 * (2 * maxRevs + 1)).fill(NaN);
    const n = lambertInto(out, Float64Array.from(r1), Float64Array.from(r2), tof, MU_SUN, true, maxRevs);
    expect(n).toBe(sols.length);
    sols.forEach((s, i) => {
      expect(Array.from(out.subarray(6 * i, 6 * i + 6))).toEqual([...s.v1, ...s.v2]);
    });
    // nothing written past the count
    expect(out.subarray(6 * n).every(Number.isNaN)).toBe(true);
  });

  it("returns only the single-revolution solution when maxRevs = 0 even if tof allows more", () => {
    const out = new Float64Array(6);
    const n = lambertInto(out, [1 * AU, 0, 0], [0, 1.2 * AU, 0], 3000 * DAY, MU_SUN, true, 0);
    expect(n).toBe(1);
    expect(lambert([1 * AU, 0, 0], [0, 1.2 * AU, 0], 3000 * DAY, MU_SUN, { maxRevs: 3 }).length).toBeGreaterThan(1);
  });
});
