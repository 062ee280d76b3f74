import { describe, expect, it } from "vitest";
import {
  dispersionEllipse,
  erfc,
  flybyRisk,
  normalCdf,
  principalAxes,
  probabilityInsideCircle,
  probabilityInsideCircleMC,
} from "@/lib/aim/probability";

/** I0(z) by its power series Σ (z/2)^(2k)/(k!)² (Abramowitz & Stegun 9.6.10, from memory). */
function besselI0(z: number): number {
  let term = 1;
  let sum = 1;
  for (let k = 1; k < 200; k++) {
    term *= (z / 2) ** 2 / (k * k);
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return sum;
}

/** Rice CDF P(|x| < r) for a circular normal (σ) centred ν from the origin, by Simpson's rule. */
function riceCdf(nu: number, sigma: number, r: number): number {
  const n = 4000;
  const h = r / n;
  const f = (x: number) => (x / sigma ** 2) * Math.exp(-(x * x + nu * nu) / (2 * sigma ** 2)) * besselI0((x * nu) / sigma ** 2);
  let s = f(0) + f(r);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(i * h);
  return (s * h) / 3;
}

describe("probabilityInsideCircle", () => {
  it("centred circular normal matches the Rayleigh CDF 1 − exp(−r²/2σ²)", () => {
    // Source: Rayleigh distribution of the radius of a circular bivariate normal (standard result, common practice).
    const sigma = 250;
    for (const r of [10, 100, 250, 600, 1200]) {
      const p = probabilityInsideCircle(0, 0, { sigmaT: sigma, sigmaR: sigma, rho: 0 }, r);
      expect(Math.abs(p - (1 - Math.exp(-(r * r) / (2 * sigma * sigma))))).toBeLessThan(1e-9);
    }
  });

  it("off-centre circular normal matches the Rice distribution (independent Bessel-series integral)", () => {
    // Source: Rice distribution of |x| for a circular normal with non-zero mean (standard result, common practice).
    const sigma = 100;
    for (const [mt, mr] of [[150, 0], [0, -150], [90, 120]] as const) {
      const nu = Math.hypot(mt, mr);
      for (const r of [50, 200, 400]) {
        const p = probabilityInsideCircle(mt, mr, { sigmaT: sigma, sigmaR: sigma, rho: 0 }, r);
        expect(Math.abs(p - riceCdf(nu, sigma, r))).toBeLessThan(2e-7);
      }
    }
  });

  it("a far-off small circle gives the tiny probability the Rice integral gives (beyond Monte Carlo reach)", () => {
    const sigma = 100;
    const p = probabilityInsideCircle(800, 0, { sigmaT: sigma, sigmaR: sigma, rho: 0 }, 200);
    const ref = riceCdf(800, sigma, 200);
    expect(ref).toBeGreaterThan(1e-12);
    expect(ref).toBeLessThan(1e-6);
    expect(Math.abs(p - ref) / ref).toBeLessThan(1e-4);
  });

  it("correlated, elongated dispersion agrees with a seeded Monte Carlo within 4 standard errors", () => {
    const d = { sigmaT: 400, sigmaR: 90, rho: 0.7 };
    for (const [mt, mr, r] of [[300, 200, 350], [0, 0, 120], [-900, 100, 500], [50, -40, 2000]] as const) {
      const p = probabilityInsideCircle(mt, mr, d, r);
      const mc = probabilityInsideCircleMC(mt, mr, d, r, 400_000, 7);
      expect(Math.abs(p - mc.p)).toBeLessThan(4 * mc.stderr + 1e-6);
    }
  });

  it("a singular dispersion reduces to a 1-D normal (σR = 0) or to a point", () => {
    // Along T only: P(|mean + t| < r) with t ~ N(0, σT²) and mean on the T axis.
    const p = probabilityInsideCircle(100, 0, { sigmaT: 200, sigmaR: 0, rho: 0 }, 150);
    expect(Math.abs(p - (normalCdf(50 / 200) - normalCdf(-250 / 200)))).toBeLessThan(1e-7);
    expect(probabilityInsideCircle(100, 0, { sigmaT: 0, sigmaR: 0, rho: 0 }, 150)).toBe(1);
    expect(probabilityInsideCircle(200, 0, { sigmaT: 0, sigmaR: 0, rho: 0 }, 150)).toBe(0);
    // |ρ| = 1 is the singular case along the diagonal; it matches a nearly singular one.
    const a = probabilityInsideCircle(300, 300, { sigmaT: 200, sigmaR: 200, rho: 1 }, 250);
    const b = probabilityInsideCircleMC(300, 300, { sigmaT: 200, sigmaR: 200, rho: 1 }, 250, 200_000, 3);
    expect(Math.abs(a - b.p)).toBeLessThan(4 * b.stderr + 1e-6);
  });

  it("rejects bad input with RangeError", () => {
    expect(() => probabilityInsideCircle(0, 0, { sigmaT: -1, sigmaR: 1, rho: 0 }, 1)).toThrow(RangeError);
    expect(() => probabilityInsideCircle(0, 0, { sigmaT: 1, sigmaR: 1, rho: 1.5 }, 1)).toThrow(RangeError);
    expect(() => probabilityInsideCircle(NaN, 0, { sigmaT: 1, sigmaR: 1, rho: 0 }, 1)).toThrow(RangeError);
    expect(() => probabilityInsideCircle(0, 0, { sigmaT: 1, sigmaR: 1, rho: 0 }, -1)).toThrow(RangeError);
  });
});

describe("dispersion ellipse and helpers", () => {
  it("uncorrelated axes give σT, σR along T, R", () => {
    const e = dispersionEllipse({ sigmaT: 300, sigmaR: 100, rho: 0 }, 1);
    expect(e.major).toBeCloseTo(300, 9);
    expect(e.minor).toBeCloseTo(100, 9);
    expect(e.angle).toBeCloseTo(0, 12);
    expect(dispersionEllipse({ sigmaT: 300, sigmaR: 100, rho: 0 }, 3).major).toBeCloseTo(900, 9);
  });

  it("equal σ with ρ > 0 has its major axis at 45° with eigenvalues σ²(1 ± ρ)", () => {
    const a = principalAxes({ sigmaT: 100, sigmaR: 100, rho: 0.5 });
    expect(a.l1).toBeCloseTo(15000, 6);
    expect(a.l2).toBeCloseTo(5000, 6);
    expect(a.angle).toBeCloseTo(Math.PI / 4, 12);
  });

  it("erfc matches tabulated values (Abramowitz & Stegun table 7.1, from memory)", () => {
    expect(erfc(0)).toBeCloseTo(1, 6);
    expect(erfc(0.5)).toBeCloseTo(0.4795001222, 6);
    expect(erfc(1)).toBeCloseTo(0.1572992071, 6);
    expect(erfc(-1)).toBeCloseTo(1.8427007929, 6);
    expect(normalCdf(1.959963985)).toBeCloseTo(0.975, 6);
  });

  it("flybyRisk orders the two probabilities and names its method", () => {
    const r = flybyRisk(9000, 0, { sigmaT: 500, sigmaR: 500, rho: 0 }, { impactRadius: 7000, minAltRadius: 7600 });
    expect(r.pImpact).toBeGreaterThan(0);
    expect(r.pBelowMin).toBeGreaterThan(r.pImpact);
    expect(r.method).toMatch(/quadrature/);
  });
});
