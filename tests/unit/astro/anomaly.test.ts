import { describe, expect, it } from "vitest";
import {
  eccentricToTrueAnomaly,
  meanToEccentricAnomaly,
  meanToTrueAnomaly,
  trueToEccentricAnomaly,
  trueToMeanAnomaly,
} from "@/lib/astro/anomaly";

const deg = Math.PI / 180;

describe("meanToEccentricAnomaly", () => {
  it("Vallado Example 2-1 (from memory): M = 235.4°, e = 0.4 → E = 220.512074767522°", () => {
    const E = meanToEccentricAnomaly(235.4 * deg, 0.4);
    expect(E / deg).toBeCloseTo(220.512074767522, 9);
  });

  it("Curtis Example 3.2 (from memory): e = 0.37255, M = 3.6029 rad → E ≈ 3.4794 rad, ν ≈ 193.2°", () => {
    // Orbit of Curtis Example 3.1: perigee 9600 km, apogee 21000 km; 3 h after perigee (T = 18834 s).
    const e = (21000 - 9600) / (21000 + 9600);
    expect(e).toBeCloseTo(0.37255, 5);
    const M = (2 * Math.PI * 10800) / 18834;
    expect(M).toBeCloseTo(3.603, 3);
    const E = meanToEccentricAnomaly(M, e);
    expect(E).toBeCloseTo(3.4794, 3);
    const nu = meanToTrueAnomaly(M, e);
    expect(Math.abs(nu / deg - 193.2)).toBeLessThan(0.1);
  });

  it("Curtis Example 3.1 (from memory): ν = 120°, e = 0.37255 → E = 1.7281 rad, M = 1.3601 rad, t = 4077 s", () => {
    const e = (21000 - 9600) / (21000 + 9600);
    expect(trueToEccentricAnomaly(120 * deg, e)).toBeCloseTo(1.7281, 4);
    const M = trueToMeanAnomaly(120 * deg, e);
    expect(M).toBeCloseTo(1.3601, 4);
    expect(Math.abs((M / (2 * Math.PI)) * 18834 - 4077)).toBeLessThan(1);
  });

  it("satisfies Kepler's equation to 1e-13 over a grid of M and e up to 0.99", () => {
    for (const e of [0, 0.001, 0.1, 0.5, 0.8, 0.95, 0.99]) {
      for (let k = -20; k <= 20; k++) {
        const M = k * 0.41;
        const E = meanToEccentricAnomaly(M, e);
        expect(E).toBeGreaterThanOrEqual(0);
        expect(E).toBeLessThan(2 * Math.PI);
        const resid = E - e * Math.sin(E) - M;
        const wrapped = Math.atan2(Math.sin(resid), Math.cos(resid));
        expect(Math.abs(wrapped)).toBeLessThan(1e-13);
      }
    }
  });
});

describe("true ⇄ mean", () => {
  it("round-trips and keeps periapsis and apoapsis fixed", () => {
    for (const e of [0, 0.2, 0.7, 0.97]) {
      expect(meanToTrueAnomaly(0, e)).toBeCloseTo(0, 14);
      expect(meanToTrueAnomaly(Math.PI, e)).toBeCloseTo(Math.PI, 12);
      for (let nu = 0.05; nu < 2 * Math.PI; nu += 0.37) {
        const back = meanToTrueAnomaly(trueToMeanAnomaly(nu, e), e);
        expect(back).toBeCloseTo(nu, 10);
      }
    }
    expect(eccentricToTrueAnomaly(Math.PI / 2, 0.6)).toBeCloseTo(Math.PI - Math.acos(0.6), 12);
  });

  it("rejects e outside [0, 1) and non-finite input with RangeError", () => {
    expect(() => meanToTrueAnomaly(1, 1)).toThrow(RangeError);
    expect(() => meanToTrueAnomaly(1, -0.1)).toThrow(RangeError);
    expect(() => meanToTrueAnomaly(Number.NaN, 0.1)).toThrow(RangeError);
    expect(() => trueToMeanAnomaly(Infinity, 0.1)).toThrow(RangeError);
  });
});
