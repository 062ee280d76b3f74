import { describe, expect, it } from "vitest";
import { propagate, stateToElements, elementsToState, stumpff } from "@/lib/astro/kepler";
import type { OrbitalElements, Vec3 } from "@/lib/astro/types";

const MU_E = 398600.4418;

function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    // mulberry32
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const n3 = (a: ArrayLike<number>) => Math.hypot(a[0]!, a[1]!, a[2]!);
const d3 = (a: ArrayLike<number>, b: ArrayLike<number>) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);
const crossv = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const energy = (r: Vec3, v: Vec3, mu: number) => (v[0] ** 2 + v[1] ** 2 + v[2] ** 2) / 2 - mu / n3(r);

describe("stumpff", () => {
  it("matches the closed forms on both sides of the series switch", () => {
    // C(z) = (1 − cos√z)/z, S(z) = (√z − sin√z)/√z³ (Stumpff functions, Curtis §3.7, from memory)
    for (const z of [0.0999, 0.1001, -0.0999, -0.1001, 4, -4]) {
      const out = stumpff(z);
      const sz = Math.sqrt(Math.abs(z));
      const C = z > 0 ? (1 - Math.cos(sz)) / z : (Math.cosh(sz) - 1) / -z;
      const S = z > 0 ? (sz - Math.sin(sz)) / sz ** 3 : (Math.sinh(sz) - sz) / sz ** 3;
      expect(out[0]).toBeCloseTo(C, 13);
      expect(out[1]).toBeCloseTo(S, 13);
    }
    expect(stumpff(0)[0]).toBe(0.5);
    expect(stumpff(0)[1]).toBeCloseTo(1 / 6, 15);
  });
});

describe("propagate (universal variables)", () => {
  it("Vallado Example 2-4: 40 min from r0, v0 (Vallado, Fundamentals of Astrodynamics and Applications, Ex. 2-4, from memory)", () => {
    const { r, v } = propagate([1131.34, -2282.343, 6672.423], [-5.64305, 4.30333, 2.42879], 40 * 60, MU_E);
    const rExp = [-4219.7527, 4363.0292, -3958.7666];
    const vExp = [3.689866, -1.916735, -6.112511];
    for (let k = 0; k < 3; k++) {
      expect(Math.abs(r[k]! - rExp[k]!)).toBeLessThan(2e-3); // book prints 4 decimals (km)
      expect(Math.abs(v[k]! - vExp[k]!)).toBeLessThan(2e-6);
    }
  });

  it("Curtis Example 3.7: 1 h on a hyperbola (Curtis, Orbital Mechanics for Engineering Students, Ex. 3.7, from memory; recomputed)", () => {
    const { r, v } = propagate([7000, -12124, 0], [2.6679, 4.621, 0], 3600, 398600);
    const rExp = [-3297.7686, 7413.3966, 0];
    const vExp = [-8.297603, -0.964045, 0];
    for (let k = 0; k < 3; k++) {
      expect(Math.abs(r[k]! - rExp[k]!)).toBeLessThan(2e-3);
      expect(Math.abs(v[k]! - vExp[k]!)).toBeLessThan(2e-6);
    }
  });

  it("dt = 0 returns the input; accepts Float64Array", () => {
    const r0 = new Float64Array([7000, 100, -20]);
    const v0 = new Float64Array([0.1, 7.5, 1]);
    const s = propagate(r0, v0, 0, MU_E);
    expect(s.r).toEqual([7000, 100, -20]);
    expect(s.v).toEqual([0.1, 7.5, 1]);
  });

  it("conserves energy and angular momentum and returns to the start forward-then-backward (ellipse, parabola, hyperbola)", () => {
    const rnd = rng(7);
    let worstRet = 0;
    for (let k = 0; k < 600; k++) {
      const rn = 6600 + rnd() * 60000;
      const vc = Math.sqrt(MU_E / rn);
      // speed from 0.3·vc to 4·vc (covers ellipses to strongly hyperbolic)
      const vs = vc * (0.3 + 3.7 * rnd());
      const r0: Vec3 = [rn * (rnd() - 0.5), rn * (rnd() - 0.5), rn * (rnd() - 0.5)];
      const sr = rn / n3(r0);
      r0[0] *= sr; r0[1] *= sr; r0[2] *= sr;
      const dir: Vec3 = [rnd() - 0.5, rnd() - 0.5, rnd() - 0.5];
      const sd = vs / n3(dir);
      const v0: Vec3 = [dir[0] * sd, dir[1] * sd, dir[2] * sd];
      const dt = (rnd() - 0.3) * 86400 * 5;
      let s;
      try {
        s = propagate(r0, v0, dt, MU_E);
      } catch {
        continue; // a nearly rectilinear fall through the centre is legitimately rejected
      }
      const e0 = energy(r0, v0, MU_E);
      const e1 = energy(s.r, s.v, MU_E);
      expect(Math.abs(e1 - e0)).toBeLessThan(1e-9 * (Math.abs(e0) + MU_E / rn));
      const h0 = crossv(r0, v0);
      const h1 = crossv(s.r, s.v);
      expect(d3(h0, h1)).toBeLessThan(1e-9 * n3(h0) + 1e-6);
      const back = propagate(s.r, s.v, -dt, MU_E);
      const ret = d3(back.r, r0) / rn;
      worstRet = Math.max(worstRet, ret);
      expect(ret).toBeLessThan(1e-7);
      expect(d3(back.v, v0)).toBeLessThan(1e-7 * vs);
    }
    expect(worstRet).toBeLessThan(1e-7);
  });

  it("handles an exact parabola (energy 0) and strongly hyperbolic, long dt", () => {
    const rn = 7000;
    const vesc = Math.sqrt((2 * MU_E) / rn);
    const s = propagate([rn, 0, 0], [0, vesc, 0], 3 * 86400, MU_E);
    expect(Math.abs(energy(s.r, s.v, MU_E))).toBeLessThan(1e-9);
    // Barker's equation: parabola time from periapsis, t = √(p³/μ)/2 · (D + D³/3), D = tan(ν/2), p = 2 rp (Curtis §3.3, from memory)
    const p = 2 * rn;
    const nu = Math.atan2(s.r[1], s.r[0]);
    const D = Math.tan(nu / 2);
    const tB = 0.5 * Math.sqrt(p ** 3 / MU_E) * (D + D ** 3 / 3);
    expect(Math.abs(tB - 3 * 86400)).toBeLessThan(1e-5);
    // strongly hyperbolic: v∞ = 40 km/s, propagated 10 years out and back
    const vh = Math.sqrt(40 ** 2 + vesc ** 2);
    const dt = 10 * 365.25 * 86400;
    const f = propagate([rn, 0, 0], [0, vh, 0], dt, MU_E);
    expect(n3(f.v)).toBeCloseTo(Math.sqrt(40 ** 2 + (2 * MU_E) / n3(f.r)), 9);
    const b = propagate(f.r, f.v, -dt, MU_E);
    expect(d3(b.r, [rn, 0, 0])).toBeLessThan(1e-3);
    // back in from intermediate distances too (universal variables and hyperbolic-anomaly paths)
    for (const t of [1e3, 1e4, 1e5, 1e6, 1e7]) {
      const o = propagate([rn, 0, 0], [0, vh, 0], t, MU_E);
      const i2 = propagate(o.r, o.v, -t, MU_E);
      expect(d3(i2.r, [rn, 0, 0])).toBeLessThan(1e-5);
      expect(d3(i2.v, [0, vh, 0])).toBeLessThan(1e-9);
    }
  });

  it("many revolutions of an ellipse come back to the same place (period reduction)", () => {
    const a = 8000;
    const period = 2 * Math.PI * Math.sqrt(a ** 3 / MU_E);
    const { r, v } = elementsToState({ a, e: 0.3, i: 0.5, raan: 1, argp: 2, nu: 0.7 }, MU_E);
    const s = propagate(r, v, 1000 * period + 123.0, MU_E);
    const s1 = propagate(r, v, 123.0, MU_E);
    expect(d3(s.r, s1.r)).toBeLessThan(1e-4);
  });

  it("rejects bad input with RangeError", () => {
    expect(() => propagate([0, 0, 0], [1, 0, 0], 10, MU_E)).toThrow(RangeError);
    expect(() => propagate([7000, 0, 0], [0, Number.NaN, 0], 10, MU_E)).toThrow(RangeError);
    expect(() => propagate([7000, 0, 0], [0, 7, 0], Number.POSITIVE_INFINITY, MU_E)).toThrow(RangeError);
    expect(() => propagate([7000, 0, 0], [0, 7, 0], 10, 0)).toThrow(RangeError);
    expect(() => propagate([7000, 0, 0], [0, 7, 0], 10, -1)).toThrow(RangeError);
    expect(() => propagate([7000, 0] as unknown as Vec3, [0, 7, 0], 10, MU_E)).toThrow(RangeError);
  });
});

describe("stateToElements / elementsToState", () => {
  it("elements of a periapsis state: e and a from the vis-viva relation (Curtis ch. 2, common practice)", () => {
    // Periapsis state of an orbit with rp = 7000 km, e = 0.2: v = √(μ(1+e)/rp) (vis-viva, Curtis ch. 2)
    const rp = 7000, e = 0.2;
    const vp = Math.sqrt((MU_E * (1 + e)) / rp);
    const el = stateToElements([rp, 0, 0], [0, vp, 0], MU_E);
    expect(el.e).toBeCloseTo(0.2, 12);
    expect(el.a).toBeCloseTo(rp / (1 - e), 6);
    expect(el.i).toBe(0);
    expect(el.raan).toBe(0);
    expect(el.argp).toBeCloseTo(0, 12);
    expect(el.nu).toBeCloseTo(0, 12);
  });

  it("conventions: circular → argp = 0, nu = argument of latitude; equatorial → raan = 0; hyperbola a < 0", () => {
    const vc = Math.sqrt(MU_E / 7000);
    const ce = stateToElements([0, 7000, 0], [-vc, 0, 0], MU_E); // circular equatorial, true longitude 90°
    expect(ce.raan).toBe(0);
    expect(ce.argp).toBe(0);
    expect(ce.nu).toBeCloseTo(Math.PI / 2, 12);
    const ret = stateToElements([0, 7000, 0], [vc, 0, 0], MU_E); // retrograde equatorial circular
    expect(ret.i).toBeCloseTo(Math.PI, 12);
    const st = elementsToState(ret, MU_E);
    expect(d3(st.r, [0, 7000, 0])).toBeLessThan(1e-8);
    const ci = stateToElements([0, 0, 7000], [0, -vc, 0], MU_E); // polar circular
    expect(ci.argp).toBe(0);
    expect(ci.nu).toBeCloseTo(Math.PI / 2, 12);
    expect(ci.i).toBeCloseTo(Math.PI / 2, 12);
    const hy = stateToElements([7000, 0, 0], [0, 12, 0], MU_E);
    expect(hy.a).toBeLessThan(0);
    expect(hy.e).toBeGreaterThan(1);
    // parabola convention: e = 1, a = periapsis radius
    const pa = stateToElements([7000, 0, 0], [0, Math.sqrt((2 * MU_E) / 7000), 0], MU_E);
    expect(pa.e).toBe(1);
    expect(pa.a).toBeCloseTo(7000, 6);
    const ps = elementsToState({ ...pa, nu: 1 }, MU_E);
    expect(Math.abs(energy(ps.r, ps.v, MU_E))).toBeLessThan(1e-9);
  });

  it("round-trips thousands of random states (ellipses and hyperbolas, incl. near-circular and near-equatorial)", () => {
    const rnd = rng(2024);
    const modes = ["generic", "nearCircular", "nearEquatorial", "both", "hyperbola", "retro"] as const;
    for (let k = 0; k < 6000; k++) {
      const mode = modes[k % modes.length]!;
      let e = rnd() * 0.95;
      let i = rnd() * Math.PI;
      if (mode === "nearCircular" || mode === "both") e = 10 ** (-12 + 10 * rnd()) * (rnd() < 0.1 ? 0 : 1);
      if (mode === "nearEquatorial" || mode === "both") i = 10 ** (-14 + 12 * rnd()) * (rnd() < 0.1 ? 0 : 1);
      if (mode === "retro") i = Math.PI - 10 ** (-14 + 12 * rnd());
      if (mode === "hyperbola") e = 1.001 + rnd() * 5;
      const rp = 6600 + rnd() * 50000;
      const a = rp / (1 - e);
      const nuMax = e > 1 ? Math.acos(-1 / e) * 0.98 : Math.PI;
      const el: OrbitalElements = {
        a,
        e,
        i,
        raan: rnd() * 2 * Math.PI,
        argp: rnd() * 2 * Math.PI,
        nu: (2 * rnd() - 1) * nuMax,
      };
      const s = elementsToState(el, MU_E);
      const back = stateToElements(s.r, s.v, MU_E);
      const s2 = elementsToState(back, MU_E);
      const rn = n3(s.r);
      const vn = n3(s.v);
      expect(d3(s2.r, s.r)).toBeLessThan(1e-9 * rn);
      expect(d3(s2.v, s.v)).toBeLessThan(1e-9 * vn);
      expect(Math.abs(back.e - e)).toBeLessThan(1e-9 * Math.max(1, e));
      expect(Math.abs(back.i - i)).toBeLessThan(1e-8);
      if (mode === "generic" || mode === "hyperbola") {
        // away from the singularities the angles come back too
        const dAng = (x: number, y: number) => Math.abs(Math.atan2(Math.sin(x - y), Math.cos(x - y)));
        if (Math.sin(i) > 1e-3 && e > 1e-3) {
          expect(dAng(back.raan, el.raan)).toBeLessThan(1e-8);
          expect(dAng(back.argp, el.argp)).toBeLessThan(1e-7);
          expect(dAng(back.nu, el.nu)).toBeLessThan(1e-7);
          expect(Math.abs(back.a - a) / Math.abs(a)).toBeLessThan(1e-9);
        }
      }
      expect(back.raan).toBeGreaterThanOrEqual(0);
      expect(back.raan).toBeLessThan(2 * Math.PI);
      expect(back.argp).toBeGreaterThanOrEqual(0);
      expect(back.argp).toBeLessThan(2 * Math.PI);
    }
  });

  it("propagation agrees with Kepler's equation through elements (mean motion)", () => {
    // Kepler's equation M = E − e sin E (Curtis §3.4): propagate by dt and compare ν.
    const el: OrbitalElements = { a: 12000, e: 0.4, i: 0.3, raan: 0.2, argp: 0.1, nu: 0 };
    const s0 = elementsToState(el, MU_E);
    const n = Math.sqrt(MU_E / el.a ** 3);
    const dt = 2345.6;
    const M = n * dt;
    let E = M;
    for (let k = 0; k < 50; k++) E -= (E - el.e * Math.sin(E) - M) / (1 - el.e * Math.cos(E));
    const nu = 2 * Math.atan(Math.sqrt((1 + el.e) / (1 - el.e)) * Math.tan(E / 2));
    const exp = elementsToState({ ...el, nu }, MU_E);
    const got = propagate(s0.r, s0.v, dt, MU_E);
    expect(d3(got.r, exp.r)).toBeLessThan(1e-6);
  });

  it("rejects invalid elements and states", () => {
    expect(() => elementsToState({ a: 7000, e: 1.5, i: 0, raan: 0, argp: 0, nu: 0 }, MU_E)).toThrow(RangeError);
    expect(() => elementsToState({ a: -7000, e: 0.5, i: 0, raan: 0, argp: 0, nu: 0 }, MU_E)).toThrow(RangeError);
    expect(() => elementsToState({ a: -7000, e: 2, i: 0, raan: 0, argp: 0, nu: 3 }, MU_E)).toThrow(RangeError);
    expect(() => elementsToState({ a: 7000, e: -0.1, i: 0, raan: 0, argp: 0, nu: 0 }, MU_E)).toThrow(RangeError);
    expect(() => elementsToState({ a: 7000, e: 0.1, i: Number.NaN, raan: 0, argp: 0, nu: 0 }, MU_E)).toThrow(RangeError);
    expect(() => elementsToState({ a: 7000, e: 0.1, i: 0, raan: 0, argp: 0, nu: 0 }, 0)).toThrow(RangeError);
    expect(() => stateToElements([7000, 0, 0], [7, 0, 0], MU_E)).toThrow(RangeError);
    expect(() => stateToElements([0, 0, 0], [0, 7, 0], MU_E)).toThrow(RangeError);
  });
});
