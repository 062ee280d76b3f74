/**
 * Two-body (Keplerian) motion: universal-variable propagation and classical elements.
 *
 * Units: km, s, km/s, km³/s², rad. Frame: any inertial frame; outputs are in the frame of the
 * inputs. Time: dt is a duration in seconds (time scale irrelevant).
 * Sources: universal-variable formulation with Stumpff functions (Bate, Mueller & White,
 * *Fundamentals of Astrodynamics*, ch. 4; Curtis, *Orbital Mechanics for Engineering Students*,
 * §3.7; Vallado, *Fundamentals of Astrodynamics and Applications*, Algorithm 8 "KEPLER";
 * Vallado Algorithms 9 "RV2COE" / 10 "COE2RV" for the elements).
 */
import type { OrbitalElements, StateVector, Vec3Like } from "./types";
import { assertFinite, assertNonZeroVec3, assertPositive, assertVec3 } from "./vec3";

const TWO_PI = 2 * Math.PI;

/**
 * Stumpff functions C(z) = (1 − cos√z)/z and S(z) = (√z − sin√z)/√z³ (z > 0), with their
 * hyperbolic continuations for z < 0 and the series near z = 0. Writes [C, S] into `out`.
 * Valid for any finite z; for z < about −5e5 the values overflow to Infinity.
 * Source: Curtis §3.7 (Stumpff functions; section number from memory).
 */
export function stumpff(z: number, out: Float64Array | number[] = new Float64Array(2)): Float64Array | number[] {
  if (typeof z !== "number" || Number.isNaN(z) || z === Infinity || z === -Infinity) {
    throw new RangeError(`stumpff: z must be a finite number (got ${String(z)})`);
  }
  return stumpffInto(z, out);
}

/** Unchecked Stumpff evaluation used inside the solver (non-finite z gives non-finite values). */
function stumpffInto(z: number, out: Float64Array | number[]): Float64Array | number[] {
  if (Math.abs(z) < 0.1) {
    // Series: C = Σ (−z)^k/(2k+2)!, S = Σ (−z)^k/(2k+3)!; 9 terms give full double precision here.
    let c = 0;
    let s = 0;
    let term = 1; // (−z)^k
    let fc = 2; // (2k+2)!
    let fs = 6; // (2k+3)!
    for (let k = 0; k < 9; k++) {
      c += term / fc;
      s += term / fs;
      term *= -z;
      fc *= (2 * k + 3) * (2 * k + 4);
      fs *= (2 * k + 4) * (2 * k + 5);
    }
    out[0] = c;
    out[1] = s;
  } else if (z > 0) {
    const sz = Math.sqrt(z);
    out[0] = (1 - Math.cos(sz)) / z;
    out[1] = (sz - Math.sin(sz)) / (sz * z);
  } else {
    const sz = Math.sqrt(-z);
    out[0] = (Math.cosh(sz) - 1) / -z;
    out[1] = (Math.sinh(sz) - sz) / (sz * -z);
  }
  return out;
}

const cs = new Float64Array(2);

/**
 * Propagate a two-body state by dt seconds with universal variables (any conic: ellipse,
 * parabola, hyperbola; forward or backward dt; dt = 0 returns a copy of the input).
 *
 * Inputs: r0 km (non-zero), v0 km/s, dt s (finite, any sign), mu km³/s² (> 0); any inertial
 * frame, output in the same frame. Elliptic dt is reduced modulo the period first. The
 * universal-anomaly equation is solved by Newton's method inside a bracket (bisection when a
 * Newton step leaves it), so it converges for many revolutions and strongly hyperbolic orbits.
 * Throws RangeError on invalid input, or when the result is not finite (e.g. a rectilinear
 * orbit through the centre, or a hyperbolic state too far out to represent).
 * Source: Vallado Algorithm 8 (KEPLER); Curtis Algorithm 3.3/3.4 (universal variables).
 */
export function propagate(r0: Vec3Like, v0: Vec3Like, dt: number, mu: number): StateVector {
  assertNonZeroVec3("r0", r0);
  assertVec3("v0", v0);
  assertFinite("dt", dt);
  assertPositive("mu", mu);
  const rx = r0[0]!, ry = r0[1]!, rz = r0[2]!;
  const vx = v0[0]!, vy = v0[1]!, vz = v0[2]!;
  if (dt === 0) return { r: [rx, ry, rz], v: [vx, vy, vz] };
  const rn = Math.sqrt(rx * rx + ry * ry + rz * rz);
  const v2 = vx * vx + vy * vy + vz * vz;
  const rdv = rx * vx + ry * vy + rz * vz;
  const smu = Math.sqrt(mu);
  const alpha = 2 / rn - v2 / mu; // 1/a, 1/km
  // Reduce elliptic time of flight modulo the period (precision for many revolutions).
  let t = dt;
  if (alpha * rn > 1e-9) {
    const period = TWO_PI / (smu * alpha * Math.sqrt(alpha));
    if (Math.abs(t) > period) {
      t = t % period;
      if (t === 0) return { r: [rx, ry, rz], v: [vx, vy, vz] };
    }
  }
  // Far out on a clear hyperbola the universal-variable equation suffers cancellation
  // (terms ~ r0·e^{2H} cancel to √μ·t); use the hyperbolic anomaly in the perifocal frame there.
  if (alpha * rn < -4) {
    const hyp = propagateHyperbolic(rx, ry, rz, vx, vy, vz, rn, rdv, alpha, t, mu);
    if (hyp) return hyp;
  }
  const A = rdv / smu; // r0·vr0/√μ
  const B = 1 - alpha * rn;
  const target = smu * t;
  // F(χ) = A χ² C + B χ³ S + r0 χ − √μ t; F'(χ) = A χ (1 − z S) + B χ² C + r0 = r(χ).
  const F = (x: number): number => {
    const z = alpha * x * x;
    stumpffInto(z, cs);
    const val = A * x * x * cs[0]! + B * x * x * x * cs[1]! + rn * x - target;
    return Number.isNaN(val) ? (x > 0 ? Infinity : -Infinity) : val;
  };
  // Initial guess.
  let x: number;
  if (alpha * rn > 1e-9) {
    x = smu * t * alpha;
  } else if (alpha * rn < -1e-9) {
    const a = 1 / alpha;
    const sgn = t > 0 ? 1 : -1;
    const den = rdv + sgn * Math.sqrt(-mu * a) * B;
    const arg = (-2 * mu * alpha * t) / den;
    x = arg > 0 && Number.isFinite(arg) ? sgn * Math.sqrt(-a) * Math.log(arg) : smu * t / rn;
  } else {
    x = (smu * t) / rn;
  }
  if (!Number.isFinite(x) || x === 0) x = (smu * t) / rn;
  // Bracket: F is increasing (F' = r > 0) and F(0) = −√μ t.
  let lo: number, hi: number;
  if (t > 0) {
    lo = 0;
    hi = x > 0 ? x : (smu * t) / rn;
    let fh = F(hi);
    let n = 0;
    while (fh <= 0 && n < 2000) {
      lo = hi;
      hi *= 2;
      fh = F(hi);
      n++;
    }
  } else {
    hi = 0;
    lo = x < 0 ? x : (smu * t) / rn;
    let fl = F(lo);
    let n = 0;
    while (fl >= 0 && n < 2000) {
      hi = lo;
      lo *= 2;
      fl = F(lo);
      n++;
    }
  }
  if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
  let C = 0;
  let S = 0;
  for (let it = 0; it < 200; it++) {
    const z = alpha * x * x;
    stumpffInto(z, cs);
    C = cs[0]!;
    S = cs[1]!;
    let f = A * x * x * C + B * x * x * x * S + rn * x - target;
    const fp = A * x * (1 - z * S) + B * x * x * C + rn;
    if (Number.isNaN(f)) f = x > 0 ? Infinity : -Infinity;
    if (f === 0) break;
    if (f > 0) hi = x;
    else lo = x;
    let xn = x - f / fp;
    if (!(xn > lo && xn < hi) || !Number.isFinite(xn)) xn = 0.5 * (lo + hi);
    const step = Math.abs(xn - x);
    x = xn;
    if (step <= 1e-15 * Math.abs(x) + 1e-300 || hi - lo <= 4e-16 * Math.abs(x)) {
      const z2 = alpha * x * x;
      stumpffInto(z2, cs);
      C = cs[0]!;
      S = cs[1]!;
      break;
    }
  }
  const x2 = x * x;
  const fL = 1 - (x2 / rn) * C;
  const gL = t - (x2 * x * S) / smu;
  const r: [number, number, number] = [fL * rx + gL * vx, fL * ry + gL * vy, fL * rz + gL * vz];
  const rnew = Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]);
  const fd = (smu / (rnew * rn)) * (alpha * x2 * x * S - x);
  const gd = 1 - (x2 / rnew) * C;
  const v: [number, number, number] = [fd * rx + gd * vx, fd * ry + gd * vy, fd * rz + gd * vz];
  if (!Number.isFinite(rnew) || !(rnew > 0) || !Number.isFinite(v[0] + v[1] + v[2])) {
    throw new RangeError(
      `propagate: no finite state after dt = ${dt} s (rectilinear orbit through the centre or state beyond double range)`,
    );
  }
  return { r, v };
}

/**
 * Hyperbolic propagation through the hyperbolic anomaly H (e·sinh H − H = n·(t − tp)),
 * used by {@link propagate} when the start is far out (r0 > 4|a|). Returns null for e < 1.01
 * (near-parabolic: left to the universal variables).
 * Source: Vallado §2.2 (hyperbolic Kepler equation); Curtis §3.5.
 */
function propagateHyperbolic(
  rx: number, ry: number, rz: number, vx: number, vy: number, vz: number,
  rn: number, rdv: number, alpha: number, t: number, mu: number,
): StateVector | null {
  const v2 = vx * vx + vy * vy + vz * vz;
  const c1 = v2 - mu / rn;
  const ex = (c1 * rx - rdv * vx) / mu;
  const ey = (c1 * ry - rdv * vy) / mu;
  const ez = (c1 * rz - rdv * vz) / mu;
  const e = Math.sqrt(ex * ex + ey * ey + ez * ez);
  if (!(e > 1.01)) return null;
  const hx = ry * vz - rz * vy, hy = rz * vx - rx * vz, hz = rx * vy - ry * vx;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  if (!(hn > 0)) return null;
  const a = 1 / alpha; // < 0
  const px = ex / e, py = ey / e, pz = ez / e; // P̂
  const qx = (hy * pz - hz * py) / hn, qy = (hz * px - hx * pz) / hn, qz = (hx * py - hy * px) / hn; // Q̂ = ĥ×P̂
  const sq = Math.sqrt((e + 1) / (e - 1));
  // H0 from r0 = a(1 − e cosh H), sign from r·v.
  const ch = (1 - rn / a) / e;
  let H0 = Math.acosh(Math.max(1, ch));
  if (rdv < 0) H0 = -H0;
  const n = Math.sqrt(mu / -(a * a * a));
  const N = e * Math.sinh(H0) - H0 + n * t;
  // Solve e sinh H − H = N (monotonic); Newton with bisection safeguard.
  let H = Math.asinh(N / e);
  let lo = -Math.abs(H) - 1 - Math.abs(N), hi = Math.abs(H) + 1 + Math.abs(N);
  lo = Math.max(lo, -Math.asinh(Math.abs(N) / (e - 1)) - 1);
  hi = Math.min(hi, Math.asinh(Math.abs(N) / (e - 1)) + 1);
  for (let it = 0; it < 100; it++) {
    const f = e * Math.sinh(H) - H - N;
    if (f === 0) break;
    if (f > 0) hi = H;
    else lo = H;
    let Hn = H - f / (e * Math.cosh(H) - 1);
    if (!(Hn > lo && Hn < hi)) Hn = 0.5 * (lo + hi);
    const step = Math.abs(Hn - H);
    H = Hn;
    if (step <= 1e-15 * Math.max(1, Math.abs(H))) break;
  }
  const r = a * (1 - e * Math.cosh(H));
  const nu = 2 * Math.atan(sq * Math.tanh(H / 2));
  const cn = Math.cos(nu), sn = Math.sin(nu);
  const p = (hn * hn) / mu;
  const sp = Math.sqrt(mu / p);
  const xw = r * cn, yw = r * sn;
  const vxw = -sp * sn, vyw = sp * (e + cn);
  const out: StateVector = {
    r: [xw * px + yw * qx, xw * py + yw * qy, xw * pz + yw * qz],
    v: [vxw * px + vyw * qx, vxw * py + vyw * qy, vxw * pz + vyw * qz],
  };
  if (!Number.isFinite(out.r[0] + out.r[1] + out.r[2] + out.v[0] + out.v[1] + out.v[2])) return null;
  return out;
}

/** Eccentricity below which an orbit is treated as circular (argp = 0); dimensionless. Common practice. */
export const CIRCULAR_TOL = 1e-11;
/** |h_xy|/|h| = sin(i) below which an orbit is treated as equatorial (raan = 0). Common practice. */
export const EQUATORIAL_TOL = 1e-11;
/** |e − 1| below which an orbit is treated as parabolic (e set to 1). Common practice. */
export const PARABOLIC_TOL = 1e-12;

function wrap2pi(x: number): number {
  const y = x % TWO_PI;
  return y < 0 ? y + TWO_PI : y;
}

/**
 * Cartesian state → classical orbital elements { a, e, i, raan, argp, nu }.
 *
 * Inputs: r km (non-zero), v km/s (non-zero, not parallel to r), mu km³/s² (> 0); any inertial
 * frame (the reference plane is its x–y plane, the node line is measured from its x axis).
 * Conventions: a < 0 for a hyperbola; angles in rad, raan and argp in [0, 2π), nu in (−π, π];
 * circular (e < CIRCULAR_TOL): argp = 0 and nu is the argument of latitude; equatorial
 * (sin i < EQUATORIAL_TOL): raan = 0 and argp is measured from the x axis about h;
 * circular equatorial: raan = argp = 0 and nu is the true longitude.
 * Parabola (|e − 1| < PARABOLIC_TOL): e is set to exactly 1 and `a` carries the periapsis
 * radius q = p/2 (km, positive) instead of the infinite semi-major axis; elementsToState reads
 * it back the same way.
 * Source: Vallado Algorithm 9 (RV2COE), with atan2 forms for robustness.
 */
export function stateToElements(r: Vec3Like, v: Vec3Like, mu: number): OrbitalElements {
  assertNonZeroVec3("r", r);
  assertNonZeroVec3("v", v);
  assertPositive("mu", mu);
  const rx = r[0]!, ry = r[1]!, rz = r[2]!;
  const vx = v[0]!, vy = v[1]!, vz = v[2]!;
  const rn = Math.sqrt(rx * rx + ry * ry + rz * rz);
  const v2 = vx * vx + vy * vy + vz * vz;
  const rdv = rx * vx + ry * vy + rz * vz;
  const hx = ry * vz - rz * vy;
  const hy = rz * vx - rx * vz;
  const hz = rx * vy - ry * vx;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  if (!(hn > 1e-14 * rn * Math.sqrt(v2))) {
    throw new RangeError("stateToElements: r and v are parallel (rectilinear orbit has no orbital plane)");
  }
  const ux = hx / hn, uy = hy / hn, uz = hz / hn; // ĥ
  const c1 = v2 - mu / rn;
  const ex = (c1 * rx - rdv * vx) / mu;
  const ey = (c1 * ry - rdv * vy) / mu;
  const ez = (c1 * rz - rdv * vz) / mu;
  let e = Math.sqrt(ex * ex + ey * ey + ez * ez);
  const p = (hn * hn) / mu;
  const hxy = Math.sqrt(hx * hx + hy * hy);
  const i = Math.atan2(hxy, hz);
  const equatorial = hxy < EQUATORIAL_TOL * hn;
  const circular = e < CIRCULAR_TOL;
  let a: number;
  if (Math.abs(e - 1) < PARABOLIC_TOL) {
    e = 1;
    a = p / 2;
  } else {
    a = p / (1 - e * e);
  }
  // Node direction n̂ (x axis for an equatorial orbit).
  let nx: number, ny: number;
  let raan: number;
  if (equatorial) {
    nx = 1;
    ny = 0;
    raan = 0;
  } else {
    nx = -hy / hxy;
    ny = hx / hxy;
    raan = wrap2pi(Math.atan2(hx, -hy));
  }
  // angle from unit-ish vector (ax, ay, az) to (bx, by, bz) about ĥ
  const angle = (ax: number, ay: number, az: number, bx: number, by: number, bz: number): number => {
    const cxv = ay * bz - az * by;
    const cyv = az * bx - ax * bz;
    const czv = ax * by - ay * bx;
    return Math.atan2(cxv * ux + cyv * uy + czv * uz, ax * bx + ay * by + az * bz);
  };
  let argp: number;
  let nu: number;
  if (circular) {
    argp = 0;
    nu = angle(nx, ny, 0, rx, ry, rz);
  } else {
    argp = wrap2pi(angle(nx, ny, 0, ex, ey, ez));
    nu = angle(ex, ey, ez, rx, ry, rz);
  }
  return { a, e, i, raan, argp, nu };
}

/**
 * Classical orbital elements → Cartesian state { r km, v km/s } in the elements' frame.
 *
 * Inputs as produced by {@link stateToElements}: a km (≠ 0; a > 0 needs 0 ≤ e < 1, a < 0
 * needs e > 1; for e = 1 exactly `a` is the periapsis radius q > 0), e ≥ 0, i, raan, argp,
 * nu in rad (any finite value); mu km³/s² > 0. For a hyperbola nu must lie strictly inside
 * the asymptotes (1 + e·cos nu > 0). Throws RangeError otherwise.
 * Source: Vallado Algorithm 10 (COE2RV): perifocal state rotated by R3(−Ω)·R1(−i)·R3(−ω).
 */
export function elementsToState(el: OrbitalElements, mu: number): StateVector {
  if (el == null || typeof el !== "object") throw new RangeError("el must be an OrbitalElements object");
  const { a, e, i, raan, argp, nu } = el;
  assertFinite("el.a", a);
  assertFinite("el.e", e);
  assertFinite("el.i", i);
  assertFinite("el.raan", raan);
  assertFinite("el.argp", argp);
  assertFinite("el.nu", nu);
  assertPositive("mu", mu);
  if (e < 0) throw new RangeError(`el.e must be ≥ 0 (got ${e})`);
  if (a === 0) throw new RangeError("el.a must be non-zero");
  let p: number;
  if (e === 1) {
    if (!(a > 0)) throw new RangeError("el.a (periapsis radius q for a parabola) must be positive");
    p = 2 * a;
  } else if (e < 1) {
    if (!(a > 0)) throw new RangeError(`el.a must be positive for an ellipse (e = ${e} < 1), got ${a}`);
    p = a * (1 - e * e);
  } else {
    if (!(a < 0)) throw new RangeError(`el.a must be negative for a hyperbola (e = ${e} > 1), got ${a}`);
    p = a * (1 - e * e);
  }
  const cn = Math.cos(nu), sn = Math.sin(nu);
  const den = 1 + e * cn;
  if (!(den > 0)) {
    throw new RangeError(`el.nu = ${nu} rad lies outside the hyperbola's asymptotes (1 + e·cos nu ≤ 0)`);
  }
  const rp = p / den;
  const sp = Math.sqrt(mu / p);
  const xp = rp * cn, yp = rp * sn;
  const vxp = -sp * sn, vyp = sp * (e + cn);
  const cO = Math.cos(raan), sO = Math.sin(raan);
  const cw = Math.cos(argp), sw = Math.sin(argp);
  const ci = Math.cos(i), si = Math.sin(i);
  const m11 = cO * cw - sO * sw * ci, m12 = -cO * sw - sO * cw * ci;
  const m21 = sO * cw + cO * sw * ci, m22 = -sO * sw + cO * cw * ci;
  const m31 = sw * si, m32 = cw * si;
  return {
    r: [m11 * xp + m12 * yp, m21 * xp + m22 * yp, m31 * xp + m32 * yp],
    v: [m11 * vxp + m12 * vyp, m21 * vxp + m22 * vyp, m31 * vxp + m32 * vyp],
  };
}
