/**
 * Test-only two-body propagator in universal variables, independent of lib/astro, used to
 * check Lambert solutions (propagate (r1, v1) for tof, compare with r2).
 *
 * Method: universal Kepler equation with Stumpff functions C(z), S(z) (Curtis, "Orbital
 * Mechanics for Engineering Students", Algorithm 3.4; Vallado, "Fundamentals of
 * Astrodynamics and Applications", Algorithm 8), solved with the Laguerre–Conway iteration
 * (Conway 1986, "An improved algorithm due to Laguerre for the solution of Kepler's
 * equation"). Elliptic time spans are first reduced modulo the period so that many
 * revolutions do not cost accuracy. Units: km, s, km/s, km³/s²; any inertial frame.
 */

export type V3 = [number, number, number];

/** Stumpff C(z) and S(z); series for |z| < 1 (no cancellation), closed forms otherwise. */
function stumpff(z: number): [number, number] {
  if (Math.abs(z) < 1) {
    // C = Σ (−z)^k/(2k+2)!, S = Σ (−z)^k/(2k+3)!
    let c = 0;
    let s = 0;
    let termC = 1 / 2;
    let termS = 1 / 6;
    for (let k = 0; k < 20; k++) {
      c += termC;
      s += termS;
      termC *= -z / ((2 * k + 3) * (2 * k + 4));
      termS *= -z / ((2 * k + 4) * (2 * k + 5));
    }
    return [c, s];
  }
  if (z > 0) {
    const sz = Math.sqrt(z);
    const h = Math.sin(sz / 2);
    return [(2 * h * h) / z, (sz - Math.sin(sz)) / (z * sz)];
  }
  const sz = Math.sqrt(-z);
  return [(Math.cosh(sz) - 1) / -z, (Math.sinh(sz) - sz) / (-z * sz)];
}

/** Propagates (r0, v0) by dt seconds about a body of GM mu (km³/s²). */
export function propagateUV(r0: readonly number[], v0: readonly number[], dt: number, mu: number): { r: V3; v: V3 } {
  const [x, y, z] = r0 as V3;
  const [vx, vy, vz] = v0 as V3;
  const r0n = Math.hypot(x, y, z);
  const v02 = vx * vx + vy * vy + vz * vz;
  const sqmu = Math.sqrt(mu);
  const rv = x * vx + y * vy + z * vz;
  const alpha = 2 / r0n - v02 / mu; // 1/a
  let t = dt;
  if (alpha > 0) {
    const period = (2 * Math.PI) / Math.sqrt(mu * alpha * alpha * alpha);
    t = dt - period * Math.floor(dt / period);
  }
  // Initial guess (Vallado, Algorithm 8).
  let chi: number;
  if (alpha > 1e-12) chi = sqmu * t * alpha;
  else if (alpha < -1e-12) {
    const a = 1 / alpha;
    const sg = t >= 0 ? 1 : -1;
    chi =
      sg *
      Math.sqrt(-a) *
      Math.log((-2 * mu * alpha * t) / (rv + sg * Math.sqrt(-mu * a) * (1 - r0n * alpha)));
    if (!Number.isFinite(chi)) chi = (sqmu * t) / r0n;
  } else chi = (sqmu * t) / r0n;
  const k1 = rv / sqmu;
  const k2 = 1 - alpha * r0n;
  for (let it = 0; it < 200; it++) {
    const zz = alpha * chi * chi;
    const [c, s] = stumpff(zz);
    const F = k1 * chi * chi * c + k2 * chi * chi * chi * s + r0n * chi - sqmu * t;
    const F1 = k1 * chi * (1 - zz * s) + k2 * chi * chi * c + r0n;
    const F2 = k1 * (1 - zz * c) + k2 * chi * (1 - zz * s);
    const disc = Math.sqrt(Math.abs(16 * F1 * F1 - 20 * F * F2));
    const dchi = (5 * F) / (F1 + (F1 >= 0 ? disc : -disc));
    chi -= dchi;
    if (Math.abs(dchi) <= 1e-15 * Math.max(1, Math.abs(chi))) break;
  }
  const zz = alpha * chi * chi;
  const [c, s] = stumpff(zz);
  const f = 1 - ((chi * chi) / r0n) * c;
  const g = t - ((chi * chi * chi) / sqmu) * s;
  const r: V3 = [f * x + g * vx, f * y + g * vy, f * z + g * vz];
  const rn = Math.hypot(r[0], r[1], r[2]);
  const fd = (sqmu / (rn * r0n)) * chi * (zz * s - 1);
  const gd = 1 - ((chi * chi) / rn) * c;
  const v: V3 = [fd * x + gd * vx, fd * y + gd * vy, fd * z + gd * vz];
  return { r, v };
}
