import { describe, expect, it } from "vitest";
import { cassini1Spec } from "../../fixtures/cassini1";
import { evaluateTour, tourObjective, rpMinFor } from "@/lib/astro/tour";
import { bPlaneFromVinf } from "@/lib/astro/bplane";
import { poweredFlyby } from "@/lib/astro/flyby";
import { lambert } from "@/lib/astro/lambert";
import { vsopEphemeris, meanElementsEphemeris, cachedEphemeris } from "@/lib/astro/ephemeris";
import { BODIES, MU_SUN, DAY_S, OBLIQUITY_J2000 } from "@/lib/astro/constants";
import type { BodyId, Ephemeris, TourSpec, Vec3 } from "@/lib/astro/types";

const n3 = (a: ArrayLike<number>) => Math.hypot(a[0]!, a[1]!, a[2]!);

/** Circular coplanar orbits about the Sun (test-only fake ephemeris). */
function circularEphemeris(orbits: Partial<Record<BodyId, { r: number; theta0: number }>>, mu = MU_SUN): Ephemeris {
  return {
    state(body, t) {
      const o = orbits[body];
      if (!o) throw new RangeError(`unknown body ${body}`);
      const n = Math.sqrt(mu / o.r ** 3);
      const th = o.theta0 + n * t;
      const v = Math.sqrt(mu / o.r);
      return { r: [o.r * Math.cos(th), o.r * Math.sin(th), 0], v: [-v * Math.sin(th), v * Math.cos(th), 0] };
    },
  };
}

/** Hohmann tour between circular orbits r1 → r2, arriving 0.01° short of 180° (exactly 180° is collinear). */
function hohmann(r1: number, r2: number, body2: BodyId) {
  const aT = (r1 + r2) / 2;
  const tof = Math.PI * Math.sqrt(aT ** 3 / MU_SUN);
  const n2 = Math.sqrt(MU_SUN / r2 ** 3);
  const eph = circularEphemeris({ earth: { r: r1, theta0: 0 }, [body2]: { r: r2, theta0: Math.PI - 1e-4 * (Math.PI / 180) * 100 - n2 * tof } });
  const spec: TourSpec = { nodes: [{ body: "earth", epoch: 0 }, { body: body2, epoch: tof }], arrival: { kind: "rendezvous" } };
  return { tof, res: evaluateTour(spec, eph) };
}

describe("evaluateTour: Hohmann transfers between circular coplanar orbits", () => {
  it("Earth→Mars: 258.8 d, v∞ dep 2.943, arr 2.648 km/s, Δv from 300 km LEO 3.590 km/s (Curtis Examples 8.3/8.4, from memory)", () => {
    // Curtis's constants: r_E = 149.6e6 km, r_M = 227.9e6 km (μ☉ 132.712e9 vs our MU_SUN: 3e-6 relative, negligible)
    const { tof, res } = hohmann(149.6e6, 227.9e6, "mars");
    expect(tof / DAY_S).toBeCloseTo(258.8, 1);
    expect(res.violations).toEqual([]);
    expect(Math.abs(res.launch.vinf - 2.943)).toBeLessThan(2e-3);
    expect(Math.abs(res.arrival.vinf - 2.648)).toBeLessThan(2e-3);
    expect(res.arrival.dv).toBe(res.arrival.vinf); // rendezvous pays v∞
    expect(res.totalDv).toBe(res.arrival.dv);
    expect(res.launch.c3).toBeCloseTo(res.launch.vinf ** 2, 12);
    // Δv from a 300 km circular parking orbit (Curtis: μ_E = 398600, R_E = 6378 km)
    const rc = 6378 + 300;
    const dvLeo = Math.sqrt(res.launch.vinf ** 2 + (2 * 398600) / rc) - Math.sqrt(398600 / rc);
    expect(Math.abs(dvLeo - 3.59)).toBeLessThan(2e-3);
    // v∞ is along the Earth's velocity (+y at t = 0): in the ecliptic plane, so DLA = asin(sin ε·ŷ) and RLA = 90°
    // (the 0.01° offset from 180° tilts v∞ by < 1e-3 rad)
    expect(Math.abs(res.launch.rla - Math.PI / 2)).toBeLessThan(2e-3);
    expect(Math.abs(res.launch.dla - OBLIQUITY_J2000)).toBeLessThan(2e-3);
  });

  it("Earth→Jupiter: about 2.73 years and departure v∞ about 8.79 km/s (Curtis ch. 8, from memory)", () => {
    const { tof, res } = hohmann(149.6e6, 778.6e6, "jupiter");
    expect(tof / (365.25 * DAY_S)).toBeCloseTo(2.73, 2);
    expect(Math.abs(res.launch.vinf - 8.79)).toBeLessThan(0.01);
  });
});

describe("evaluateTour: Curtis Example 8.8 (Earth→Mars, 309 d) via a fake ephemeris", () => {
  it("departure v∞ 3.1653, arrival v∞ 2.8853 km/s ±1e-3 (Curtis Example 8.8, from memory; 6-digit inputs)", () => {
    const t1 = 0;
    const t2 = 309 * DAY_S;
    const states: Record<string, { r: Vec3; v: Vec3 }> = {
      earth: { r: [1.04994e8, 1.04655e8, 988.331], v: [-21.5148, 20.9865, 0.000132284] },
      mars: { r: [-2.08329e7, -2.18404e8, -4.06287e6], v: [25.0386, -0.220288, -0.620623] },
    };
    const eph: Ephemeris = {
      state(body, t) {
        const s = states[body];
        if (!s || (body === "earth" && t !== t1) || (body === "mars" && t !== t2)) throw new RangeError("not in fake table");
        return s;
      },
    };
    const res = evaluateTour(
      { nodes: [{ body: "earth", epoch: t1 }, { body: "mars", epoch: t2 }], arrival: { kind: "capture", rp: 3396.19 + 300, e: 0 } },
      eph,
    );
    expect(Math.abs(res.launch.vinf - 3.1653)).toBeLessThan(1e-3);
    expect(Math.abs(res.arrival.vinf - 2.8853)).toBeLessThan(1e-3);
    // capture: periapsis burn √(v∞² + 2μ/rp) − √(μ(1+e)/rp) (Curtis ch. 8)
    const mu = BODIES.mars.mu, rp = 3696.19;
    expect(res.arrival.dv).toBeCloseTo(Math.sqrt(res.arrival.vinf ** 2 + (2 * mu) / rp) - Math.sqrt(mu / rp), 12);
    expect(res.legs[0]!.tof).toBe(t2);
    expect(res.flybys).toEqual([]);
  });
});

describe("evaluateTour: flybys, B-plane, violations", () => {
  const eph = circularEphemeris({
    earth: { r: 149.6e6, theta0: 0 },
    venus: { r: 108.2e6, theta0: 2.2 },
    mars: { r: 227.9e6, theta0: 1.3 },
    jupiter: { r: 778.6e6, theta0: 3.5 },
  });
  const base: TourSpec = {
    nodes: [
      { body: "earth", epoch: 0 },
      { body: "venus", epoch: 150 * DAY_S },
      { body: "earth", epoch: 560 * DAY_S },
      { body: "jupiter", epoch: 1500 * DAY_S },
    ],
  };

  it("flyby quantities follow poweredFlyby and bPlaneFromVinf (ecliptic pole) and totals add up", () => {
    const res = evaluateTour(base, eph);
    expect(res.legs).toHaveLength(3);
    expect(res.flybys).toHaveLength(2);
    let sum = 0;
    for (let k = 1; k <= 2; k++) {
      const node = base.nodes[k]!;
      const s = eph.state(node.body, node.epoch);
      const vin: Vec3 = [res.legs[k - 1]!.v2[0] - s.v[0], res.legs[k - 1]!.v2[1] - s.v[1], res.legs[k - 1]!.v2[2] - s.v[2]];
      const vout: Vec3 = [res.legs[k]!.v1[0] - s.v[0], res.legs[k]!.v1[1] - s.v[1], res.legs[k]!.v1[2] - s.v[2]];
      const mu = BODIES[node.body as "venus"].mu;
      const pf = poweredFlyby(vin, vout, mu, rpMinFor(base, node.body));
      const bp = bPlaneFromVinf(vin, vout, mu);
      const f = res.flybys[k - 1]!;
      expect(f.body).toBe(node.body);
      expect(f.vinfIn).toBeCloseTo(n3(vin), 10);
      expect(f.vinfOut).toBeCloseTo(n3(vout), 10);
      expect(f.rp / pf.rp).toBeCloseTo(1, 10);
      expect(f.dv).toBeCloseTo(pf.dv, 10);
      expect(f.turnAngle).toBeCloseTo(pf.turnAngle, 12);
      expect(f.altitude).toBeCloseTo(pf.rp - BODIES[node.body as "venus"].radius, 4);
      expect(Math.abs(f.bT - bp.bT)).toBeLessThan(1e-8 * bp.b);
      expect(Math.abs(f.bR - bp.bR)).toBeLessThan(1e-8 * bp.b);
      expect(Math.hypot(f.bT, f.bR) / bp.b).toBeCloseTo(1, 9);
      expect(f.feasible).toBe(pf.feasible);
      sum += f.dv;
    }
    expect(res.arrival.dv).toBe(0); // default arrival: flyby
    expect(res.totalDv).toBeCloseTo(sum, 12);
    const pen = res.flybys.reduce((acc, f) => {
      const m = rpMinFor(base, f.body);
      return acc + (f.rp < m ? (m >= 1e5 ? 0.001 : 0.01) * (m - f.rp) : 0);
    }, 0);
    expect(tourObjective(res, base)).toBeCloseTo(res.launch.vinf + res.totalDv + pen, 10);
    expect(tourObjective(res, base, "dv")).toBeCloseTo(res.totalDv + pen, 10);
    // below_min_radius appears exactly for infeasible flybys, with the node index
    const below = res.violations.filter((v) => v.kind === "below_min_radius").map((v) => v.node);
    expect(below).toEqual(res.flybys.map((f, i) => (f.feasible ? -1 : i + 1)).filter((i) => i >= 0));
  });

  it("a high rpMin makes the flyby infeasible with a penalty and a plain-language message", () => {
    const spec: TourSpec = { ...base, rpMin: { venus: 5e7 } };
    const res = evaluateTour(spec, eph);
    const v = res.violations.find((x) => x.kind === "below_min_radius");
    expect(v?.node).toBe(1);
    expect(v?.message).toMatch(/Venus flyby \(node 1\).*below its minimum/);
    expect(res.flybys[0]!.feasible).toBe(false);
    const pen = 0.001 * (5e7 - res.flybys[0]!.rp); // rpMin ≥ 100,000 km → 0.001 km/s per km (DESIGN.md)
    const okSpec: TourSpec = { ...base, rpMin: { venus: 1 } };
    const ok = evaluateTour(okSpec, eph);
    expect(tourObjective(res, spec)).toBeCloseTo(tourObjective(ok, okSpec) + pen, 6);
  });

  it("epochs not increasing → epochs_not_increasing, totals Infinity, no throw", () => {
    const spec: TourSpec = {
      nodes: [
        { body: "earth", epoch: 0 },
        { body: "venus", epoch: 150 * DAY_S },
        { body: "earth", epoch: 100 * DAY_S },
        { body: "jupiter", epoch: 1500 * DAY_S },
      ],
    };
    const res = evaluateTour(spec, eph);
    expect(res.violations.some((v) => v.kind === "epochs_not_increasing" && v.node === 2)).toBe(true);
    expect(res.totalDv).toBe(Infinity);
    expect(tourObjective(res, spec)).toBe(Infinity);
    expect(Number.isNaN(res.legs[1]!.v1[0])).toBe(true);
  });

  it("collinear r1, r2 (exactly 180°) → no_solution, not a throw", () => {
    const e2: Ephemeris = {
      state: (body) =>
        body === "earth" ? { r: [1.496e8, 0, 0], v: [0, 29.8, 0] } : { r: [-2.279e8, 0, 0], v: [0, -24.1, 0] },
    };
    const res = evaluateTour({ nodes: [{ body: "earth", epoch: 0 }, { body: "mars", epoch: 100 * DAY_S }] }, e2);
    expect(res.violations.map((v) => v.kind)).toEqual(["no_solution"]);
    expect(res.violations[0]!.node).toBe(1);
    expect(res.violations[0]!.message).toMatch(/No prograde transfer from Earth to Mars/);
    expect(res.totalDv).toBe(Infinity);
    expect(res.launch.vinf).toBe(Infinity);
  });

  it("multi-revolution legs: revs > 0 with no branch takes 'left'; below the minimum tof → no_solution", () => {
    const spec: TourSpec = {
      nodes: [{ body: "earth", epoch: 0 }, { body: "mars", epoch: 1100 * DAY_S }],
      legs: [{ revs: 1 }],
    };
    const res = evaluateTour(spec, eph);
    const e = eph.state("earth", 0);
    const m = eph.state("mars", 1100 * DAY_S);
    const sols = lambert(e.r, m.r, 1100 * DAY_S, MU_SUN, { maxRevs: 1 });
    const left = sols.find((s) => s.revs === 1 && s.branch === "left");
    expect(left).toBeDefined();
    expect(res.legs[0]!.v1[0]).toBeCloseTo(left!.v1[0], 9);
    expect(res.legs[0]!.revs).toBe(1);
    const right = evaluateTour({ ...spec, legs: [{ revs: 1, branch: "right" }] }, eph);
    const r = sols.find((s) => s.revs === 1 && s.branch === "right")!;
    expect(right.legs[0]!.v1[1]).toBeCloseTo(r.v1[1], 9);
    const short = evaluateTour({ ...spec, nodes: [{ body: "earth", epoch: 0 }, { body: "mars", epoch: 100 * DAY_S }] }, eph);
    expect(short.violations.map((v) => v.kind)).toEqual(["no_solution"]);
  });

  it("custom bodies take physical data from spec.bodies; caps add violations; bad specs throw RangeError", () => {
    const e3: Ephemeris = {
      state(body, t) {
        if (body === "custom:rock") return circularEphemeris({ x: { r: 180e6, theta0: 2 } } as never).state("x" as BodyId, t);
        return eph.state(body, t);
      },
    };
    const spec: TourSpec = {
      nodes: [
        { body: "earth", epoch: 0 },
        { body: "custom:rock", epoch: 200 * DAY_S },
        { body: "mars", epoch: 500 * DAY_S },
      ],
      bodies: { "custom:rock": { mu: 5, radius: 10, minFlybyAltitude: 1 } },
    };
    const res = evaluateTour(spec, e3, { c3: 0.1, arrivalVinf: 0.1, totalTof: 100 * DAY_S });
    expect(res.flybys[0]!.altitude).toBeCloseTo(res.flybys[0]!.rp - 10, 6);
    expect(res.violations.map((v) => v.kind)).toEqual(expect.arrayContaining(["c3_cap", "arrival_vinf_cap", "tof_cap"]));
    expect(() => evaluateTour({ ...spec, bodies: {} }, e3)).toThrow(RangeError);
    expect(() => evaluateTour({ nodes: [{ body: "earth", epoch: 0 }] }, eph)).toThrow(RangeError);
    expect(() => evaluateTour({ nodes: [{ body: "earth", epoch: 0 }, { body: "mars", epoch: Number.NaN }] }, eph)).toThrow(RangeError);
    expect(() => evaluateTour({ ...base, arrival: { kind: "capture", rp: -1, e: 0 } }, eph)).toThrow(RangeError);
    expect(() => evaluateTour({ ...base, legs: [{ revs: -1 }] }, eph)).toThrow(RangeError);
  });
});

// GTOP "Cassini1" (Vinkó & Izzo, 2008): E-V-V-E-J-S, x = [t0 MJD2000, T1…T5 days] at the published best
// decision vector (from memory, CHECKS.md); zero-rev prograde legs; rpMin Venus 6351.8, Earth 6778.1,
// Jupiter 600000 km; Saturn capture rp 108950 km, e 0.98. Its 4.9307 km/s holds only with the benchmark's own
// analytic ephemeris; our ephemerides give different values (recorded below, measured on this code).

describe("GTOP Cassini1 at the published decision vector", () => {
  // Measured on this code (2026-12-02): launch v∞ 2.7557 km/s, Venus rp 13,266 / 46,550 km, Earth rp 6,691 km
  // (87 km below 6,778.1: penalty 0.87 km/s), Jupiter rp 838,660 km, Saturn arrival v∞ 4.2689 km/s, capture Δv 0.4754 km/s;
  // objective 6.7415 km/s incl. penalty. The ±0.05 band below is a regression guard on our own value.
  it("meanElementsEphemeris(): objective 6.742 km/s incl. 0.87 km/s Earth-flyby penalty (benchmark's own ephemeris gives 4.9307)", () => {
    const spec = cassini1Spec();
    const res = evaluateTour(spec, meanElementsEphemeris());
    const obj = tourObjective(res, spec);
    expect(res.violations.filter((v) => v.kind !== "below_min_radius")).toEqual([]);
    expect(Number.isFinite(obj)).toBe(true);
    // plausible: launch v∞ a few km/s, Saturn arrival v∞ a few km/s, objective within a few km/s of 4.93
    expect(res.launch.vinf).toBeGreaterThan(2);
    expect(res.launch.vinf).toBeLessThan(5);
    expect(res.arrival.vinf).toBeGreaterThan(3);
    expect(res.arrival.vinf).toBeLessThan(7);
    expect(obj).toBeGreaterThan(4.9);
    expect(obj).toBeLessThan(9);
    expect(Math.abs(obj - 6.7415)).toBeLessThan(0.05);
    expect(res.flybys.map((f) => f.body)).toEqual(["venus", "venus", "earth", "jupiter"]);
  });

  // Measured on this code (2026-12-02): launch v∞ 2.7672 km/s, Venus rp 14,969 / 31,304 km, Earth rp 6,694 km
  // (penalty 0.84 km/s), Jupiter rp 837,047 km, Saturn arrival v∞ 4.2690 km/s, capture Δv 0.4754 km/s;
  // objective 6.6568 km/s incl. penalty.
  it("vsopEphemeris(): objective 6.657 km/s incl. 0.84 km/s Earth-flyby penalty (benchmark's own ephemeris gives 4.9307)", () => {
    const spec = cassini1Spec();
    const res = evaluateTour(spec, vsopEphemeris());
    const obj = tourObjective(res, spec);
    expect(Number.isFinite(obj)).toBe(true);
    expect(res.launch.vinf).toBeGreaterThan(2);
    expect(res.launch.vinf).toBeLessThan(5);
    expect(obj).toBeGreaterThan(4.9);
    expect(obj).toBeLessThan(9);
    const cached = evaluateTour(spec, cachedEphemeris(vsopEphemeris()));
    expect(Math.abs(tourObjective(cached, spec) - obj)).toBeLessThan(1e-4);
    expect(Math.abs(obj - 6.6568)).toBeLessThan(0.05);
  });
});
