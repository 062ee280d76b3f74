/**
 * Lambert's problem: the two-body conic arc from r1 to r2 in a given time of flight.
 *
 * Method: D. Izzo, "Revisiting Lambert's problem", Celestial Mechanics and Dynamical
 * Astronomy 121 (2015) 1–15. The unknown is Izzo's x (x ∈ (−1, 1) ellipse, x = 1 parabola,
 * x > 1 hyperbola); the non-dimensional time of flight T(x) is evaluated with Battin's
 * hypergeometric series close to x = 1 (|x − 1| < 0.01), Lagrange's expression in
 * 0.01 ≤ |x − 1| < 0.2 and Lancaster's expression elsewhere; the root is found with
 * Householder (3rd-order) iterations from the paper's initial guesses, and for N ≥ 1
 * revolutions the minimum time of flight is found with Halley iterations on dT/dx = 0.
 *
 * Departures from the paper's reference code, each for accuracy: the iterations stop once
 * the time-of-flight residual before a step is below eps·T (not on the size of the x step,
 * which left strongly hyperbolic arcs with x ≫ 1 unconverged); within ~5e-7 of the parabola
 * x = 1, where the closed-form derivatives are 0/0, a Newton step on a central difference is
 * taken; λ² is formed as r1·r2·(1 + cos θ)/(2s²) and, for sin θ < 1e-4, r1 × r2 with exact
 * products, so arcs near (not at) 180° keep full accuracy; the velocity terms λy ± x and
 * y + λx are formed without cancellation for near-rectilinear arcs.
 * Measured accuracy (tests/unit/astro/lambert.test.ts): propagating (r1, v1) for tof reaches
 * r2 within ~1e-12 relative on well-conditioned arcs.
 *
 * Units: km, s, km/s, km³/s². Frame: whatever inertial frame r1 and r2 are given in; the
 * velocities come back in the same frame. Time scale: tof is a duration in seconds of any
 * uniform scale (TDB for Gybe's legs); no epoch enters.
 *
 * `prograde` means the transfer's angular momentum has h_z > 0 in the frame of the inputs
 * (for a heliocentric ecliptic leg: counter-clockwise seen from ecliptic north), not "the
 * short way". When r1 × r2 has h_z = 0 exactly (transfer plane contains the z axis)
 * `prograde: true` gives the short-way (< 180°) arc and `false` the long way.
 * Exactly collinear r1, r2 (r1 × r2 = 0: the transfer plane is undefined) throws RangeError.
 */

import type { LambertSolution, Vec3, Vec3Like } from "./types";

const PI = Math.PI;
/** ln 2 (for the paper's single-revolution initial guess). */
const LN2 = 0.6931471805599453;
/** |x − 1| below which Battin's series is used (Izzo 2015, reference implementation thresholds). */
const BATTIN = 0.01;
/** |x − 1| below which (and above BATTIN) Lagrange's expression is used. */
const LAGRANGE = 0.2;
/** Householder tolerance, single revolution: stop after the step taken at residual < eps·T (cubic → ~eps³). */
const EPS_SINGLE = 1e-5;
/** Householder tolerance, multi-revolution (tighter: convergence is slower near the minimum tof). */
const EPS_MULTI = 1e-8;
/** Largest revolution count lambert() will list (2·N + 1 solution objects). */
const MAX_LIST_REVS = 100_000;
/** Householder iteration cap. */
const MAX_IT = 15;

/** Iterations of the last Householder solve (module scratch: no allocation). */
let hhIters = 0;
/**
 * Numeric "registers". Doubles cross function boundaries through this typed array, never as
 * arguments or return values, so a call that V8 does not inline cannot box a double into a
 * heap object: the hot path stays allocation-free.
 * [R_T] target T, [R_X] Householder x (in: initial guess, out: root), [R_LAM] λ, [R_EPS]
 * tolerance, [R_TX] x for x2tof, [R_TOF] x2tof result.
 */
const R = new Float64Array(8);
const R_T = 0;
const R_X = 1;
const R_LAM = 2;
const R_EPS = 3;
const R_TX = 4;
const R_TOF = 5;
/** Per-solution Householder iteration counts of the last core solve, in output order. */
let itersScratch = new Int32Array(16);
/** Per-solution slot of the last core solve (0 single, 2N−1 left, 2N right), in output order. */
let slotScratch = new Int32Array(16);

/**
 * Non-dimensional time of flight T(x) for N complete revolutions, x = R[R_TX], λ = R[R_LAM];
 * result to R[R_TOF]. Battin's hypergeometric series 2F1(3, 1; 5/2; S1) near x = 1
 * (|x − 1| < 0.01, terms to 1e-11), Lagrange's expression for 0.01 ≤ |x − 1| < 0.2,
 * Lancaster's elsewhere. Source: Izzo 2015, §2 (eqs. 9, 18, 20) and the band thresholds of
 * its reference implementation.
 */
function x2tof(N: number): void {
  const x = R[R_TX] as number;
  const lam = R[R_LAM] as number;
  const l2 = lam * lam;
  const dist = x > 1 ? x - 1 : 1 - x;
  if (dist < LAGRANGE && dist >= BATTIN) {
    // Lagrange
    const a = 1 / (1 - x * x);
    if (a > 0) {
      const alfa = 2 * Math.acos(x);
      let beta = 2 * Math.asin(Math.sqrt(l2 / a));
      if (lam < 0) beta = -beta;
      R[R_TOF] = a * Math.sqrt(a) * (alfa - Math.sin(alfa) - (beta - Math.sin(beta)) + 2 * PI * N) * 0.5;
      return;
    }
    const alfa = 2 * Math.acosh(x);
    let beta = 2 * Math.asinh(Math.sqrt(-l2 / a));
    if (lam < 0) beta = -beta;
    R[R_TOF] = -a * Math.sqrt(-a) * (beta - Math.sinh(beta) - (alfa - Math.sinh(alfa))) * 0.5;
    return;
  }
  const E = x * x - 1;
  const z = Math.sqrt(1 + l2 * E);
  const rho = E < 0 ? -E : E;
  if (dist < BATTIN) {
    const eta = z - lam * x;
    const s1 = 0.5 * (1 - lam - x * eta);
    // Battin's hypergeometric function 2F1(3, 1; 5/2; s1) by its series (Izzo 2015, eq. 20).
    let sj = 1;
    let cj = 1;
    for (let j = 0; j < 200; j++) {
      cj = ((cj * (3 + j) * (1 + j)) / (2.5 + j)) * (s1 / (j + 1));
      sj += cj;
      if (!((cj > 0 ? cj : -cj) > 1e-11)) break;
    }
    let t = 0.5 * (eta * eta * eta * (4 / 3) * sj + 4 * lam * eta);
    if (N > 0) t += (N * PI) / (rho * Math.sqrt(rho));
    R[R_TOF] = t;
    return;
  }
  // Lancaster
  const y = Math.sqrt(rho);
  const g = x * z - lam * E;
  const d = E < 0 ? N * PI + Math.acos(g) : Math.log(y * (z - lam * x) + g);
  R[R_TOF] = (x - lam * z - d / y) / E;
}

/**
 * Householder (3rd-order) iterations on T(x) = T for N revolutions, from R[R_X] with T = R[R_T],
 * λ = R[R_LAM], tolerance R[R_EPS] (stop once the residual before a step is below eps·T). The
 * root goes to R[R_X], the iteration count to `hhIters`.
 * Source: Izzo 2015, §3 (eq. 22 derivatives, Householder update).
 */
function householder(N: number): void {
  const T = R[R_T] as number;
  const lam = R[R_LAM] as number;
  const epsT = (R[R_EPS] as number) * T;
  let x = R[R_X] as number;
  const l2 = lam * lam;
  const l3 = l2 * lam;
  const a2 = 2 * l3;
  const b2 = 2 * (1 - l2) * l3;
  const c6 = 6 * (1 - l2) * l2 * l3;
  let it = 0;
  while (it < MAX_IT) {
    const umx2 = 1 - x * x;
    const y = Math.sqrt(1 - l2 * umx2);
    const dist = x > 1 ? x - 1 : 1 - x;
    let tof: number;
    if (dist >= LAGRANGE) {
      // Lancaster's expression inline (the common case), sharing y = √(1 + λ²E) with the derivatives.
      const E = -umx2;
      const rho = umx2 > 0 ? umx2 : E;
      const sr = Math.sqrt(rho);
      const g = x * y - lam * E;
      const d = E < 0 ? N * PI + Math.acos(g) : Math.log(sr * (y - lam * x) + g);
      tof = (x - lam * y - d / sr) / E;
    } else {
      R[R_TX] = x;
      x2tof(N);
      tof = R[R_TOF] as number;
    }
    if (umx2 < 1e-6 && umx2 > -1e-6 && x > 0 && N === 0) {
      // Within ~5e-7 of the parabola x = 1 the closed-form derivatives are 0/0 (single
      // revolution; for N ≥ 1, T → ∞ there instead): take a Newton step with a central
      // difference of Battin's series (rare; derivative accurate to ~1e-8).
      const delta0 = tof - T;
      if (delta0 === 0) {
        it++;
        break;
      }
      R[R_TX] = x + 1e-4;
      x2tof(N);
      const tPlus = R[R_TOF] as number;
      R[R_TX] = x - 1e-4;
      x2tof(N);
      const dT0 = (tPlus - (R[R_TOF] as number)) * 5e3;
      x -= delta0 / dT0;
      it++;
      if (!((delta0 > 0 ? delta0 : -delta0) > epsT)) break;
      continue;
    }
    const iy = 1 / y;
    const iy3 = iy * iy * iy;
    const inv = 1 / umx2;
    const dT = inv * (3 * tof * x - 2 + a2 * x * iy);
    const ddT = inv * (3 * tof + 5 * x * dT + b2 * iy3);
    const dddT = inv * (7 * x * ddT + 8 * dT - c6 * x * iy3 * iy * iy);
    const delta = tof - T;
    const dT2 = dT * dT;
    x -= (delta * (dT2 - 0.5 * delta * ddT)) / (dT * (dT2 - delta * ddT) + (dddT * delta * delta) / 6);
    it++;
    // Stop once the residual before this step was below eps·T: the cubic step leaves ~eps³.
    if (!((delta > 0 ? delta : -delta) > epsT)) break;
  }
  hhIters = it;
  R[R_X] = x;
}

/** 2^27 + 1: Dekker's splitting constant for IEEE double. */
const SPLIT = 134217729;

/**
 * a·b − c·d with the products formed exactly (Dekker's TwoProduct, T. J. Dekker, "A
 * floating-point technique for extending the available precision", Numer. Math. 18, 1971) and
 * the difference compensated: accurate even when a·b ≈ c·d. Used only for nearly collinear r1, r2.
 */
function crossComponent(a: number, b: number, c: number, d: number): number {
  const p = a * b;
  let t = SPLIT * a;
  const ah = t - (t - a);
  const al = a - ah;
  t = SPLIT * b;
  const bh = t - (t - b);
  const bl = b - bh;
  const ep = al * bl - (((p - ah * bh) - al * bh) - ah * bl);
  const q = c * d;
  t = SPLIT * c;
  const ch = t - (t - c);
  const cl = c - ch;
  t = SPLIT * d;
  const dh = t - (t - d);
  const dl = d - dh;
  const eq = cl * dl - (((q - ch * dh) - cl * dh) - ch * dl);
  return p - q + (ep - eq);
}

/** Reads component k of a vector argument (tuple or Float64Array) as a number (undefined → NaN). */
function comp(v: Vec3Like, k: number): number {
  return +(v[k] as number);
}

/**
 * The shared core: validates, solves, writes [v1x,v1y,v1z,v2x,v2y,v2z] per solution into `out`
 * (single first, then for N = 1…: left, right) and the iteration counts into `itersScratch`.
 * `strictOut`: require out.length ≥ 6·(2·maxRevs + 1) (the lambertInto contract); otherwise
 * only enough room for the solutions that exist.
 */
function solveCore(
  out: Float64Array,
  r1: Vec3Like,
  r2: Vec3Like,
  tof: number,
  mu: number,
  prograde: boolean,
  maxRevs: number,
  strictOut: boolean,
): number {
  const x1 = comp(r1, 0);
  const y1 = comp(r1, 1);
  const z1 = comp(r1, 2);
  const x2 = comp(r2, 0);
  const y2 = comp(r2, 1);
  const z2 = comp(r2, 2);
  // x − x === 0 is false for NaN, ±Infinity (and undefined → NaN).
  if (!(x1 - x1 === 0 && y1 - y1 === 0 && z1 - z1 === 0)) {
    throw new RangeError("lambert: r1 must be a vector of three finite numbers (km)");
  }
  if (!(x2 - x2 === 0 && y2 - y2 === 0 && z2 - z2 === 0)) {
    throw new RangeError("lambert: r2 must be a vector of three finite numbers (km)");
  }
  if (!(tof > 0 && tof < Infinity)) {
    throw new RangeError(`lambert: tof must be a finite number > 0 s (got ${tof})`);
  }
  if (!(mu > 0 && mu < Infinity)) {
    throw new RangeError(`lambert: mu must be a finite number > 0 km³/s² (got ${mu})`);
  }
  if (prograde !== true && prograde !== false) {
    throw new RangeError(`lambert: prograde must be true or false (got ${String(prograde)})`);
  }
  if (!(maxRevs >= 0 && Number.isInteger(maxRevs))) {
    throw new RangeError(`lambert: maxRevs must be an integer ≥ 0 (got ${maxRevs})`);
  }
  if (strictOut && out.length < 6 * (2 * maxRevs + 1)) {
    throw new RangeError(
      `lambert: out must have length ≥ 6·(2·maxRevs + 1) = ${6 * (2 * maxRevs + 1)} (got ${out.length})`,
    );
  }
  const r1n = Math.sqrt(x1 * x1 + y1 * y1 + z1 * z1);
  const r2n = Math.sqrt(x2 * x2 + y2 * y2 + z2 * z2);
  if (r1n === 0) throw new RangeError("lambert: r1 has zero length (radius must be > 0 km)");
  if (r2n === 0) throw new RangeError("lambert: r2 has zero length (radius must be > 0 km)");
  const dx = x2 - x1;
  const dy = y2 - y1;
  const dz = z2 - z1;
  const c = Math.sqrt(dx * dx + dy * dy + dz * dz);
  const s = 0.5 * (r1n + r2n + c);
  const ir1 = 1 / r1n;
  const ir2 = 1 / r2n;
  const i1x = x1 * ir1;
  const i1y = y1 * ir1;
  const i1z = z1 * ir1;
  const i2x = x2 * ir2;
  const i2y = y2 * ir2;
  const i2z = z2 * ir2;
  let hx = i1y * i2z - i1z * i2y;
  let hy = i1z * i2x - i1x * i2z;
  let hz = i1x * i2y - i1y * i2x;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  if (hn === 0) {
    throw new RangeError(
      "lambert: r1 and r2 are collinear (r1 × r2 = 0), the transfer plane is undefined",
    );
  }
  let sinTheta = hn;
  if (hn < 1e-4) {
    // Nearly collinear (sin θ < 1e-4): the cross product of the rounded unit vectors has a
    // relative error ~1e-16/sin θ, which tilts the transfer plane. Recompute r1 × r2 from the
    // raw components with exact products (Dekker's TwoProduct) and a compensated difference.
    hx = crossComponent(y1, z2, z1, y2);
    hy = crossComponent(z1, x2, x1, z2);
    hz = crossComponent(x1, y2, y1, x2);
    const hr = Math.sqrt(hx * hx + hy * hy + hz * hz);
    if (hr === 0) {
      throw new RangeError(
        "lambert: r1 and r2 are collinear (r1 × r2 = 0), the transfer plane is undefined",
      );
    }
    hx /= hr;
    hy /= hr;
    hz /= hr;
    sinTheta = hr / (r1n * r2n);
  } else {
    const ihn = 1 / hn;
    hx *= ihn;
    hy *= ihn;
    hz *= ihn;
  }
  const omL2 = c / s; // 1 − λ², kept separately for accuracy
  // λ² = 1 − c/s = r1·r2·(1 + cos θ)/(2s²); near 180° take 1 + cos θ = sin²θ/(1 − cos θ)
  // so that λ keeps full relative accuracy (1 − c/s would cancel).
  const cth = i1x * i2x + i1y * i2y + i1z * i2z;
  const sin2 = sinTheta * sinTheta;
  const opc = cth < 0 ? sin2 / (1 - cth) : 1 + cth;
  let l2 = (r1n * r2n * opc) / (2 * s * s);
  if (l2 > 1) l2 = 1;
  let lam = Math.sqrt(l2);
  // Tangential unit vectors t = ĥ_transfer × î (direction of motion).
  let t1x: number;
  let t1y: number;
  let t1z: number;
  let t2x: number;
  let t2y: number;
  let t2z: number;
  let sgn = 1;
  if (hz < 0) {
    lam = -lam;
    sgn = -1;
  }
  if (!prograde) {
    lam = -lam;
    sgn = -sgn;
  }
  // sgn·ĥ is the transfer's angular momentum direction.
  t1x = sgn * (hy * i1z - hz * i1y);
  t1y = sgn * (hz * i1x - hx * i1z);
  t1z = sgn * (hx * i1y - hy * i1x);
  t2x = sgn * (hy * i2z - hz * i2y);
  t2y = sgn * (hz * i2x - hx * i2z);
  t2z = sgn * (hx * i2y - hy * i2x);

  const l3 = l2 * lam;
  const T = Math.sqrt((2 * mu) / (s * s * s)) * tof;
  R[R_T] = T;
  R[R_LAM] = lam;

  // Number of revolutions that can exist (Izzo 2015, §3).
  let nMax = Math.floor(T / PI);
  const t00 = Math.acos(lam) + lam * Math.sqrt(1 - l2);
  if (maxRevs < nMax) {
    nMax = maxRevs;
  } else if (nMax > 0) {
    const t0 = t00 + nMax * PI;
    if (T < t0) {
      // Halley iterations on dT/dx = 0 from x = 0 (where T = t0) for the minimum tof.
      let xOld = 0;
      let tMin = t0;
      for (let it = 0; it < 13; it++) {
        const umx2 = 1 - xOld * xOld;
        const y = Math.sqrt(1 - l2 * umx2);
        const iy = 1 / y;
        const iy3 = iy * iy * iy;
        const inv = 1 / umx2;
        const dT = inv * (3 * tMin * xOld - 2 + 2 * l3 * xOld * iy);
        const ddT = inv * (3 * tMin + 5 * xOld * dT + 2 * (1 - l2) * l3 * iy3);
        const dddT = inv * (7 * xOld * ddT + 8 * dT - 6 * (1 - l2) * l2 * l3 * xOld * iy3 * iy * iy);
        let xNew = xOld;
        if (dT !== 0) xNew = xOld - (dT * ddT) / (ddT * ddT - 0.5 * dT * dddT);
        const err = xOld > xNew ? xOld - xNew : xNew - xOld;
        if (err < 1e-13) break;
        R[R_TX] = xNew;
        x2tof(nMax);
        tMin = R[R_TOF] as number;
        xOld = xNew;
      }
      if (tMin > T) nMax -= 1;
    }
  }
  const count = 2 * nMax + 1;
  if (out.length < 6 * count) {
    throw new RangeError(`lambert: out is too short for ${count} solutions (need length ≥ ${6 * count})`);
  }
  if (itersScratch.length < count) {
    itersScratch = new Int32Array(2 * count);
    slotScratch = new Int32Array(2 * count);
  }

  // Velocity reconstruction constants (Izzo 2015, Algorithm 1).
  const gamma = Math.sqrt(0.5 * mu * s);
  const rho = (r1n - r2n) / c;
  const sigma = Math.sqrt(1 - rho * rho);

  let n = 0;
  for (let k = 0; k < count; k++) {
    let x: number;
    if (k === 0) {
      // Single revolution: initial guess (Izzo 2015, eq. 30).
      const t1 = (2 / 3) * (1 - l3);
      let x0: number;
      if (T >= t00) x0 = (t00 - T) / (T - t00 + 4);
      else if (T <= t1) x0 = (t1 * (t1 - T)) / (0.4 * (1 - l2 * l3) * T) + 1;
      else x0 = Math.exp((LN2 * Math.log(T / t00)) / Math.log(t1 / t00)) - 1;
      R[R_X] = x0;
      R[R_EPS] = EPS_SINGLE;
      householder(0);
    } else {
      const N = (k + 1) >> 1;
      let q: number;
      if (k & 1) {
        // left branch (x below the x of minimum tof)
        const b = ((N + 1) * PI) / (8 * T);
        q = Math.cbrt(b * b);
      } else {
        // right branch
        const b = (8 * T) / (N * PI);
        q = Math.cbrt(b * b);
      }
      R[R_X] = (q - 1) / (q + 1);
      R[R_EPS] = EPS_MULTI;
      householder(N);
    }
    x = R[R_X] as number;
    if (!(x - x === 0)) continue; // numerical failure: no solution on this branch
    const y = Math.sqrt(omL2 + l2 * x * x);
    const ly = lam * y;
    // A = λy − x, B = λy + x, A·B = (1−λ²)(λ² − x²(1+λ²)): compute the one without
    // cancellation directly and the other from the product (near-rectilinear arcs).
    const lx = lam * x;
    const P = omL2 * (l2 - x * x * (1 + l2));
    let A: number;
    let B: number;
    let yl: number; // y + λx = (1−λ²)/(y − λx)
    if (lx >= 0) {
      B = ly + x;
      A = B !== 0 ? P / B : ly - x; // B = 0 only when λ = 0 and x = 0
      yl = y + lx;
    } else {
      A = ly - x;
      B = P / A;
      yl = omL2 / (y - lx);
    }
    const vr1 = (gamma * (A - rho * B)) * ir1;
    const vr2 = (-gamma * (A + rho * B)) * ir2;
    const vt = gamma * sigma * yl;
    const vt1 = vt * ir1;
    const vt2 = vt * ir2;
    const o = 6 * n;
    out[o] = vr1 * i1x + vt1 * t1x;
    out[o + 1] = vr1 * i1y + vt1 * t1y;
    out[o + 2] = vr1 * i1z + vt1 * t1z;
    out[o + 3] = vr2 * i2x + vt2 * t2x;
    out[o + 4] = vr2 * i2y + vt2 * t2y;
    out[o + 5] = vr2 * i2z + vt2 * t2z;
    itersScratch[n] = hhIters;
    slotScratch[n] = k;
    n++;
  }
  return n;
}

/**
 * Izzo's Lambert solver, allocation-free form.
 *
 * Writes `[v1x, v1y, v1z, v2x, v2y, v2z]` (km/s, frame of the inputs) for each solution into
 * `out`, in the order: single revolution, then for N = 1 … maxRevs the 'left' then the 'right'
 * branch, and returns how many were written (0 when there is none).
 *
 * @param out Float64Array of length ≥ 6·(2·maxRevs + 1).
 * @param r1 departure position, km, any inertial frame (tuple or Float64Array), |r1| > 0.
 * @param r2 arrival position, km, same frame, |r2| > 0, not collinear with r1.
 * @param tof time of flight, s (a duration; TDB for Gybe's legs), finite, > 0.
 * @param mu gravitational parameter of the central body, km³/s², finite, > 0.
 * @param prograde true: transfer angular momentum h_z > 0 in the frame of the inputs.
 * @param maxRevs largest number of complete revolutions to look for, integer ≥ 0.
 * @throws RangeError on non-finite inputs, zero radius, tof ≤ 0, mu ≤ 0, bad maxRevs, short
 *   `out`, or exactly collinear r1, r2.
 * Source: D. Izzo, Celest. Mech. Dyn. Astr. 121 (2015), "Revisiting Lambert's problem".
 */
export function lambertInto(
  out: Float64Array,
  r1: Vec3Like,
  r2: Vec3Like,
  tof: number,
  mu: number,
  prograde: boolean,
  maxRevs: number,
): number {
  return solveCore(out, r1, r2, tof, mu, prograde, maxRevs, true);
}

/**
 * Izzo's Lambert solver.
 *
 * Returns every solution (km/s, frame of the inputs) ordered by `revs`, then 'left' before
 * 'right'; `branch` is 'single' for revs = 0. For N ≥ 1, both branches exist only when tof is
 * above the N-revolution minimum time of flight (none below). No solution → `[]`.
 * `iterations` is the number of Householder iterations spent on that root.
 *
 * @param r1 departure position, km, any inertial frame (tuple or Float64Array), |r1| > 0.
 * @param r2 arrival position, km, same frame, |r2| > 0, not collinear with r1.
 * @param tof time of flight, s (a duration; TDB for Gybe's legs), finite, > 0.
 * @param mu gravitational parameter, km³/s², finite, > 0.
 * @param options.prograde (default true) transfer angular momentum h_z > 0 in the inputs' frame.
 * @param options.maxRevs (default 0) largest number of complete revolutions, integer ≥ 0
 *   (at most 100,000 feasible revolutions are listed; lambertInto has no such limit).
 * @throws RangeError on bad inputs or exactly collinear r1, r2.
 * Source: D. Izzo, Celest. Mech. Dyn. Astr. 121 (2015), "Revisiting Lambert's problem".
 */
export function lambert(
  r1: Vec3Like,
  r2: Vec3Like,
  tof: number,
  mu: number,
  options: { prograde?: boolean; maxRevs?: number } = {},
): LambertSolution[] {
  const prograde = options.prograde ?? true;
  const maxRevs = options.maxRevs ?? 0;
  // Room for the solutions that can exist: N ≤ min(maxRevs, floor(T/π)) with T the
  // non-dimensional tof (one spare). Bad inputs give cap 0 here and the core throws.
  let cap = 0;
  if (typeof maxRevs === "number" && maxRevs > 0 && Number.isInteger(maxRevs)) {
    const a = comp(r1, 0), b = comp(r1, 1), cc = comp(r1, 2);
    const d = comp(r2, 0), e = comp(r2, 1), f = comp(r2, 2);
    const s = 0.5 * (Math.hypot(a, b, cc) + Math.hypot(d, e, f) + Math.hypot(d - a, e - b, f - cc));
    const bound = Math.floor((Math.sqrt((2 * mu) / (s * s * s)) * tof) / PI) + 1;
    cap = bound < maxRevs ? bound : maxRevs;
    if (!(cap >= 0)) cap = 0;
    if (cap > MAX_LIST_REVS) {
      throw new RangeError(
        `lambert: maxRevs = ${maxRevs} with this tof allows ${cap} revolutions; lambert() lists at most ${MAX_LIST_REVS} (use lambertInto with your own buffer)`,
      );
    }
  }
  const out = new Float64Array(6 * (2 * cap + 1));
  const n = solveCore(out, r1, r2, tof, mu, prograde, maxRevs, false);
  const sols: LambertSolution[] = [];
  // Labels come from the core's slot scratch (a root that fails numerically is skipped).
  for (let i = 0; i < n; i++) {
    const slot = slotScratch[i] ?? i;
    const o = 6 * i;
    const revs = (slot + 1) >> 1;
    sols.push({
      v1: [out[o] as number, out[o + 1] as number, out[o + 2] as number] as Vec3,
      v2: [out[o + 3] as number, out[o + 4] as number, out[o + 5] as number] as Vec3,
      revs,
      branch: slot === 0 ? "single" : slot & 1 ? "left" : "right",
      iterations: itersScratch[i] ?? 0,
    });
  }
  return sols;
}
