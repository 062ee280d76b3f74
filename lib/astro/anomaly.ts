/**
 * Anomalies of an elliptic orbit (0 ≤ e < 1): mean M ⇄ eccentric E ⇄ true ν.
 *
 * Units: rad. Kepler's equation M = E − e·sin E is solved by Halley's method (Newton with a
 * second-order correction) from Danby's starting guess; results are normalised to [0, 2π).
 * Source: Kepler's equation and tan(ν/2) = √((1+e)/(1−e))·tan(E/2) (Curtis, *Orbital Mechanics
 * for Engineering Students*, §3.4; Vallado, *Fundamentals of Astrodynamics and Applications*,
 * Algorithm 2 "KEPEQTNE" — both from memory).
 */
import { assertFinite } from "./vec3";

const TWO_PI = 2 * Math.PI;

function wrap(x: number): number {
  let y = x % TWO_PI;
  if (y < 0) y += TWO_PI;
  return y >= TWO_PI ? 0 : y; // −1e-17 + 2π rounds to 2π
}

function checkE(e: number): void {
  assertFinite("e", e);
  if (e < 0 || e >= 1) throw new RangeError(`e must be in [0, 1) for an elliptic orbit (got ${e})`);
}

/**
 * Solve Kepler's equation M = E − e·sin E for the eccentric anomaly.
 * @param M mean anomaly, rad (any finite value).
 * @param e eccentricity, 0 ≤ e < 1.
 * @returns E, rad, in [0, 2π); |E − e·sin E − M (mod 2π)| < 1e-14 for e ≤ 0.99.
 * @throws RangeError for non-finite input or e outside [0, 1).
 */
export function meanToEccentricAnomaly(M: number, e: number): number {
  assertFinite("M (mean anomaly, rad)", M);
  checkE(e);
  const m = wrap(M);
  if (e === 0) return m;
  // Work on (−π, π] for a well-behaved start, then wrap back.
  const mm = m > Math.PI ? m - TWO_PI : m;
  // Starting guess E0 = M + 0.85·e·sign(sin M) (Danby's guess, from memory): robust for all e < 1.
  let E = mm + 0.85 * e * Math.sign(Math.sin(mm) || 1);
  for (let k = 0; k < 50; k++) {
    const f = E - e * Math.sin(E) - mm;
    const fp = 1 - e * Math.cos(E);
    const fpp = e * Math.sin(E);
    // Halley's step (cubic convergence); falls back to Newton when the correction is odd.
    let dE = -f / fp;
    const denom = fp + 0.5 * dE * fpp;
    if (denom !== 0 && Number.isFinite(denom)) dE = -f / denom;
    E += dE;
    if (Math.abs(dE) < 1e-15 * Math.max(1, Math.abs(E))) break;
  }
  return wrap(E);
}

/** Eccentric anomaly E → true anomaly ν (rad, in [0, 2π)), 0 ≤ e < 1. */
export function eccentricToTrueAnomaly(E: number, e: number): number {
  assertFinite("E (eccentric anomaly, rad)", E);
  checkE(e);
  const beta = Math.sqrt(1 - e * e);
  return wrap(Math.atan2(beta * Math.sin(E), Math.cos(E) - e));
}

/** True anomaly ν → eccentric anomaly E (rad, in [0, 2π)), 0 ≤ e < 1. */
export function trueToEccentricAnomaly(nu: number, e: number): number {
  assertFinite("nu (true anomaly, rad)", nu);
  checkE(e);
  const beta = Math.sqrt(1 - e * e);
  return wrap(Math.atan2(beta * Math.sin(nu), e + Math.cos(nu)));
}

/**
 * Mean anomaly → true anomaly of an ellipse.
 * @param M mean anomaly, rad (any finite value).
 * @param e eccentricity, 0 ≤ e < 1.
 * @returns ν, rad, in [0, 2π).
 */
export function meanToTrueAnomaly(M: number, e: number): number {
  return eccentricToTrueAnomaly(meanToEccentricAnomaly(M, e), e);
}

/** True anomaly → mean anomaly of an ellipse (rad, in [0, 2π)), 0 ≤ e < 1. */
export function trueToMeanAnomaly(nu: number, e: number): number {
  const E = trueToEccentricAnomaly(nu, e);
  return wrap(E - e * Math.sin(E));
}
