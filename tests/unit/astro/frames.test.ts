import { describe, expect, it } from "vitest";
import { Rotation_EQJ_ECL, Rotation_ECL_EQJ, RotateVector, Vector, AstroTime } from "astronomy-engine";
import {
  COS_OBLIQUITY,
  SIN_OBLIQUITY,
  eclJ2000ToEqj2000,
  eqj2000ToEclJ2000,
  rotateFrame,
  spinPole,
} from "@/lib/astro/frames";
import type { PlanetId } from "@/lib/astro/types";

const DEG = Math.PI / 180;

describe("EqJ2000 ↔ EclJ2000 rotation", () => {
  it("matches astronomy-engine's Rotation_EQJ_ECL matrix element by element", () => {
    // Source: astronomy-engine 2.1 Rotation_EQJ_ECL (reference library; obliquity 84381.406″, IAU 2006).
    const m = Rotation_EQJ_ECL().rot;
    // astronomy-engine stores the matrix so that out_j = Σ_i rot[i][j]·in_i.
    const cols: [number, number, number][] = [
      eqj2000ToEclJ2000([1, 0, 0]),
      eqj2000ToEclJ2000([0, 1, 0]),
      eqj2000ToEclJ2000([0, 0, 1]),
    ];
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        expect(Math.abs((cols[i] as number[])[j]! - m[i]![j]!)).toBeLessThan(1e-15);
      }
    }
    // The angle is the published J2000 obliquity 84381.406″ (IAU 2006, Capitaine et al. 2003),
    // to astronomy-engine's rounding (5e-12 rad).
    const eps = Math.atan2(SIN_OBLIQUITY, COS_OBLIQUITY);
    expect(Math.abs(eps - (84381.406 / 3600) * DEG)).toBeLessThan(1e-11);
  });

  it("agrees with RotateVector on random vectors both ways and round-trips", () => {
    // Source: astronomy-engine Rotation_EQJ_ECL / Rotation_ECL_EQJ (reference library).
    const t = AstroTime.FromTerrestrialTime(0);
    let seed = 7;
    const rnd = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 2 - 1;
    for (let n = 0; n < 50; n++) {
      const v: [number, number, number] = [rnd() * 1e8, rnd() * 1e8, rnd() * 1e8];
      const a = RotateVector(Rotation_EQJ_ECL(), new Vector(v[0], v[1], v[2], t));
      const e = eqj2000ToEclJ2000(v);
      expect(Math.hypot(e[0] - a.x, e[1] - a.y, e[2] - a.z)).toBeLessThan(1e-6);
      const b = RotateVector(Rotation_ECL_EQJ(), new Vector(v[0], v[1], v[2], t));
      const q = eclJ2000ToEqj2000(v);
      expect(Math.hypot(q[0] - b.x, q[1] - b.y, q[2] - b.z)).toBeLessThan(1e-6);
      const back = eclJ2000ToEqj2000(e);
      expect(Math.hypot(back[0] - v[0], back[1] - v[1], back[2] - v[2])).toBeLessThan(1e-6);
    }
    expect(rotateFrame([1, 2, 3], "EclJ2000", "EclJ2000")).toEqual([1, 2, 3]);
    expect(rotateFrame([1, 2, 3], "EqJ2000", "EclJ2000")).toEqual(eqj2000ToEclJ2000([1, 2, 3]));
  });

  it("rejects bad vectors and frames with RangeError", () => {
    expect(() => eqj2000ToEclJ2000([1, Number.NaN, 0])).toThrow(RangeError);
    expect(() => eclJ2000ToEqj2000([1, 2] as unknown as [number, number, number])).toThrow(RangeError);
    expect(() => rotateFrame([1, 2, 3], "Galactic" as never, "EclJ2000")).toThrow(RangeError);
  });
});

describe("spinPole", () => {
  it("Earth's pole is 23.44° from the ecliptic pole at J2000", () => {
    // Source: the obliquity of the ecliptic at J2000, 84381.406″ = 23.4393° (IAU 2006); the IAU
    // WGCCRE Earth pole is α0 = 0° − 0.641°T, δ0 = 90° − 0.557°T (from memory).
    const p = spinPole("earth", 0);
    const angle = Math.acos(p[2]) / DEG;
    expect(Math.abs(angle - 23.4393)).toBeLessThan(0.01);
    expect(Math.abs(Math.hypot(...p) - 1)).toBeLessThan(1e-12);
  });

  it("Mars's pole matches the IAU WGCCRE α0, δ0 at J2000", () => {
    // Source: IAU WGCCRE report (Archinal et al. 2011/2018): Mars α0 = 317.68143° − 0.1061°T,
    // δ0 = 52.88650° − 0.0609°T (from memory); T = 0 at J2000.
    const a = 317.68143 * DEG;
    const d = 52.8865 * DEG;
    const expected = eqj2000ToEclJ2000([Math.cos(d) * Math.cos(a), Math.cos(d) * Math.sin(a), Math.sin(d)]);
    const p = spinPole("mars", 0);
    const sep = Math.acos(Math.min(1, p[0] * expected[0] + p[1] * expected[1] + p[2] * expected[2]));
    expect(sep).toBeLessThan(0.01 * DEG);
  });

  it("Uranus's IAU north pole lies near the ecliptic, on its north side (tilt ~98°, retrograde)", () => {
    // Source: Uranus's axial tilt of about 97.8° to its orbit (JPL SSD physical data, from memory);
    // the IAU convention takes as "north" the pole on the north side of the invariable plane, so for
    // this retrograde rotator the IAU pole is 180° − 97.8° ≈ 82° from ecliptic north (orbit
    // inclination 0.77° adds ±1°).
    const p = spinPole("uranus", 0);
    const angle = Math.acos(p[2]) / DEG;
    expect(angle).toBeGreaterThan(80.5);
    expect(angle).toBeLessThan(83.7);
  });

  it("validates body and epoch", () => {
    expect(() => spinPole("vulcan" as PlanetId, 0)).toThrow(RangeError);
    expect(() => spinPole("mars", Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});
