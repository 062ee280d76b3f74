/**
 * Patched-conic planetary flybys: turn angle, periapsis radius, powered flyby.
 *
 * Units: km, km/s, km³/s², rad. Vectors are planet-relative v∞ in any inertial frame (both in
 * the same frame). Time scale: not applicable.
 * Sources: Curtis, *Orbital Mechanics for Engineering Students*, ch. 8 (hyperbolic flyby:
 * e = 1 + rp·v∞²/μ, δ = 2·asin(1/e)); powered flyby with the burn at periapsis: the relation
 * asin(1/e_in) + asin(1/e_out) = δ as used in the GTOP benchmark definitions (Vinkó & Izzo, 2008).
 */
import type { Vec3Like } from "./types";
import { assertFinite, assertNonNegative, assertPositive, assertVec3 } from "./vec3";

/**
 * Turn angle δ (rad, in (0, π]) of an unpowered hyperbolic flyby: e = 1 + rp·v∞²/μ, δ = 2·asin(1/e).
 * vinf km/s (≥ 0; 0 gives π), rp km (> 0), mu km³/s² (> 0). Source: Curtis ch. 8.
 */
export function turnAngleFor(vinf: number, rp: number, mu: number): number {
  assertNonNegative("vinf", vinf);
  assertPositive("rp", rp);
  assertPositive("mu", mu);
  const e = 1 + (rp * vinf * vinf) / mu;
  return 2 * Math.asin(1 / e);
}

/**
 * Periapsis radius rp (km) that turns v∞ by delta on an unpowered flyby: e = 1/sin(δ/2),
 * rp = (e − 1)·μ/v∞². vinf km/s (> 0), delta rad in [0, π] (0 gives Infinity, π gives 0),
 * mu km³/s² (> 0). Source: Curtis ch. 8 (inverse of δ = 2·asin(1/e)).
 */
export function rpForTurn(vinf: number, delta: number, mu: number): number {
  assertPositive("vinf", vinf);
  assertFinite("delta", delta);
  assertPositive("mu", mu);
  if (delta < 0 || delta > Math.PI) throw new RangeError(`delta must be in [0, π] rad (got ${delta})`);
  const s = Math.sin(delta / 2);
  if (s === 0) return Infinity;
  const e = 1 / s;
  return ((e - 1) * mu) / (vinf * vinf);
}

/**
 * Periapsis radius (km) of a powered flyby that turns v∞ from |v∞in| = vin to |v∞out| = vout
 * through the angle delta: the root of asin(1/e_in) + asin(1/e_out) = delta with
 * e = 1 + rp·v²/μ. Scalar and allocation-free (for searches). Safeguarded Newton (the left
 * side decreases monotonically from π at rp = 0 to 0 as rp → ∞, so the root is bracketed).
 * Returns 0 for delta ≥ π and Infinity for delta ≤ 0. Inputs: vin, vout km/s > 0, delta rad
 * (finite), mu km³/s² > 0 (checked with a few comparisons only: RangeError otherwise).
 * Relative accuracy ~1e-12.
 * Source: GTOP powered-flyby model (Vinkó & Izzo, 2008); Curtis ch. 8 for δ(e).
 */
export function poweredFlybyRp(vin: number, vout: number, delta: number, mu: number): number {
  if (!(vin > 0 && vin < Infinity && vout > 0 && vout < Infinity && mu > 0 && mu < Infinity) || Number.isNaN(delta)) {
    throw new RangeError(
      `poweredFlybyRp: vin (${vin}) and vout (${vout}) km/s and mu (${mu}) must be finite and positive, delta (${delta}) a number`,
    );
  }
  if (!(delta > 0)) return Infinity;
  if (delta >= Math.PI) return 0;
  const ai = (vin * vin) / mu;
  const ao = (vout * vout) / mu;
  // Initial guess: unpowered flyby at the mean v∞².
  const am = Math.sqrt(ai * ao);
  let rp = (1 / Math.sin(delta / 2) - 1) / am;
  let lo = 0;
  let hi = Infinity;
  for (let it = 0; it < 60; it++) {
    const ei = 1 + rp * ai;
    const eo = 1 + rp * ao;
    const g = Math.asin(1 / ei) + Math.asin(1 / eo) - delta;
    if (g === 0) return rp;
    if (g > 0) lo = rp;
    else hi = rp;
    // d/drp asin(1/e) = −a / (e·√(e² − 1))
    const dg = -ai / (ei * Math.sqrt(ei * ei - 1)) - ao / (eo * Math.sqrt(eo * eo - 1));
    let next = rp - g / dg;
    if (!(next > lo && next < hi)) next = hi === Infinity ? 2 * rp + 1e-300 : 0.5 * (lo + hi);
    if (Math.abs(next - rp) <= 1e-13 * rp) return next;
    rp = next;
  }
  return rp;
}

/** Result of {@link poweredFlyby}. */
export interface PoweredFlybyResult {
  /** Angle between v∞in and v∞out, rad in [0, π]. */
  turnAngle: number;
  /** Periapsis radius that achieves it, km (Infinity for zero turn, 0 for a full reversal). */
  rp: number;
  /** Periapsis burn |√(vout² + 2μ/rp) − √(vin² + 2μ/rp)|, km/s. */
  dv: number;
  /** Eccentricities of the incoming and outgoing hyperbolas (dimensionless). */
  eIn: number;
  eOut: number;
  /** rp ≥ rpMin. */
  feasible: boolean;
}

/**
 * Powered flyby with an impulsive burn at periapsis joining the incoming and outgoing
 * hyperbolas. vinfIn, vinfOut: planet-relative v∞ vectors km/s (same inertial frame, non-zero);
 * mu km³/s² (> 0); rpMin km (≥ 0). Returns the turn angle (rad), the periapsis radius rp (km)
 * solving asin(1/eIn) + asin(1/eOut) = δ, the periapsis Δv (km/s), eIn, eOut, and
 * feasible = rp ≥ rpMin. When no periapsis above the body achieves the turn, feasible is false
 * and rp is the radius the turn would need (0 for an exact reversal).
 * Source: Curtis ch. 8; GTOP powered-flyby model (Vinkó & Izzo, 2008).
 */
export function poweredFlyby(vinfIn: Vec3Like, vinfOut: Vec3Like, mu: number, rpMin: number): PoweredFlybyResult {
  assertVec3("vinfIn", vinfIn);
  assertVec3("vinfOut", vinfOut);
  assertPositive("mu", mu);
  assertNonNegative("rpMin", rpMin);
  const ix = vinfIn[0]!, iy = vinfIn[1]!, iz = vinfIn[2]!;
  const ox = vinfOut[0]!, oy = vinfOut[1]!, oz = vinfOut[2]!;
  const vin = Math.sqrt(ix * ix + iy * iy + iz * iz);
  const vout = Math.sqrt(ox * ox + oy * oy + oz * oz);
  if (!(vin > 0)) throw new RangeError("vinfIn must be non-zero (no hyperbola for v∞ = 0)");
  if (!(vout > 0)) throw new RangeError("vinfOut must be non-zero (no hyperbola for v∞ = 0)");
  const cx = iy * oz - iz * oy, cy = iz * ox - ix * oz, cz = ix * oy - iy * ox;
  const delta = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ix * ox + iy * oy + iz * oz);
  const rp = poweredFlybyRp(vin, vout, delta, mu);
  let dv: number;
  if (rp === Infinity) dv = Math.abs(vout - vin);
  else if (rp === 0) dv = Infinity;
  else dv = Math.abs(Math.sqrt(vout * vout + (2 * mu) / rp) - Math.sqrt(vin * vin + (2 * mu) / rp));
  return {
    turnAngle: delta,
    rp,
    dv,
    eIn: 1 + (rp * vin * vin) / mu,
    eOut: 1 + (rp * vout * vout) / mu,
    feasible: rp >= rpMin,
  };
}
