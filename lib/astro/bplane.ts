/**
 * B-plane geometry of a hyperbolic encounter.
 *
 * Units: km, km/s, km³/s², rad, s. Vectors: planet-centred, in any inertial frame shared by
 * all inputs (heliocentric ecliptic J2000 for v∞ in Gybe's tours); the pole is a direction in
 * that same frame (default: ecliptic north [0, 0, 1]; a spin pole from frames.ts may be passed).
 * Frame: Ŝ = v̂∞in, T̂ = Ŝ×k̂/|Ŝ×k̂|, R̂ = Ŝ×T̂; B = Ŝ×h/v∞ (h the hyperbola's angular
 * momentum), so B·T and B·R have the sign of where the incoming asymptote crosses the B-plane.
 * Sources: Kizner, "A method of describing miss distances for lunar and interplanetary
 * trajectories" (1961); Curtis ch. 8 for |B| = rp·√(1 + 2μ/(rp·v∞²)) and δ = 2·asin(1/e).
 */
import type { Vec3, Vec3Like } from "./types";
import { poweredFlybyRp } from "./flyby";
import { assertFinite, assertNonZeroVec3, assertPositive, assertVec3 } from "./vec3";

/** Ecliptic north in the heliocentric ecliptic J2000 frame (the default B-plane pole). */
export const ECLIPTIC_POLE: Readonly<Vec3> = [0, 0, 1];

/** B-plane aim point and the encounter it implies. */
export interface BPlaneResult {
  /** B·T, B·R, km. */
  bT: number;
  bR: number;
  /** |B|, km. */
  b: number;
  /** atan2(B·R, B·T), rad in (−π, π]. */
  theta: number;
  /** Periapsis radius, km. */
  rp: number;
  /** Angle between v∞in and v∞out, rad. */
  turnAngle: number;
}

/** The B-plane triad for an incoming direction; throws when Ŝ is parallel to the pole. */
function triad(sx: number, sy: number, sz: number, pole: Vec3Like): [Vec3, Vec3] {
  const kx = pole[0]!, ky = pole[1]!, kz = pole[2]!;
  // T = Ŝ × k̂
  let tx = sy * kz - sz * ky;
  let ty = sz * kx - sx * kz;
  let tz = sx * ky - sy * kx;
  const kn = Math.sqrt(kx * kx + ky * ky + kz * kz);
  const tn = Math.sqrt(tx * tx + ty * ty + tz * tz);
  if (!(tn > 1e-12 * kn)) {
    throw new RangeError("vinfIn is parallel to the pole: the B-plane T axis is undefined (choose another pole)");
  }
  tx /= tn;
  ty /= tn;
  tz /= tn;
  // R = Ŝ × T
  const rx = sy * tz - sz * ty;
  const ry = sz * tx - sx * tz;
  const rz = sx * ty - sy * tx;
  return [
    [tx, ty, tz],
    [rx, ry, rz],
  ];
}

function normTheta(bR: number, bT: number): number {
  const th = Math.atan2(bR, bT);
  return th <= -Math.PI ? Math.PI : th;
}

/**
 * B-plane aim point of a flyby from its incoming and outgoing v∞ vectors (km/s, planet-relative,
 * same frame as `pole`). For a powered flyby (|v∞in| ≠ |v∞out|) the point is that of the incoming
 * hyperbola with the periapsis radius of the powered solution (see flyby.ts). mu km³/s² > 0.
 * Returns B·T, B·R, |B| (km), θ = atan2(B·R, B·T) (rad, (−π, π]), rp (km), turn angle (rad).
 * Throws RangeError for invalid input, zero v∞, v∞in ∥ v∞out (no finite aim point / undefined
 * plane) or v∞in ∥ pole.
 * Source: Kizner (1961) B-plane; Curtis ch. 8 (|B| = rp·√(1 + 2μ/(rp·v∞²))).
 */
export function bPlaneFromVinf(
  vinfIn: Vec3Like,
  vinfOut: Vec3Like,
  mu: number,
  pole: Vec3Like = ECLIPTIC_POLE,
): BPlaneResult {
  assertNonZeroVec3("vinfIn", vinfIn);
  assertNonZeroVec3("vinfOut", vinfOut);
  assertPositive("mu", mu);
  assertNonZeroVec3("pole", pole);
  const ix = vinfIn[0]!, iy = vinfIn[1]!, iz = vinfIn[2]!;
  const ox = vinfOut[0]!, oy = vinfOut[1]!, oz = vinfOut[2]!;
  const vin = Math.sqrt(ix * ix + iy * iy + iz * iz);
  const vout = Math.sqrt(ox * ox + oy * oy + oz * oz);
  const sx = ix / vin, sy = iy / vin, sz = iz / vin;
  // ĥ ∝ v∞in × v∞out
  let hx = iy * oz - iz * oy, hy = iz * ox - ix * oz, hz = ix * oy - iy * ox;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  const delta = Math.atan2(hn, ix * ox + iy * oy + iz * oz);
  if (!(hn > 1e-15 * vin * vout)) {
    throw new RangeError("vinfIn and vinfOut are parallel or opposite: the flyby plane and aim point are undefined");
  }
  hx /= hn;
  hy /= hn;
  hz /= hn;
  const rp = poweredFlybyRp(vin, vout, delta, mu);
  const b = rp * Math.sqrt(1 + (2 * mu) / (rp * vin * vin));
  // B̂ = Ŝ × ĥ
  const bx = sy * hz - sz * hy, by = sz * hx - sx * hz, bz = sx * hy - sy * hx;
  const [T, R] = triad(sx, sy, sz, pole);
  const bT = b * (bx * T[0] + by * T[1] + bz * T[2]);
  const bR = b * (bx * R[0] + by * R[1] + bz * R[2]);
  return { bT, bR, b, theta: normTheta(bR, bT), rp, turnAngle: delta };
}

/**
 * Outgoing v∞ (km/s, same frame) of an unpowered flyby aimed at (B·T, B·R) (km) with incoming
 * v∞ `vinfIn` (km/s, non-zero); |v∞out| = |v∞in|. rp solves |B|² = rp² + 2μ·rp/v∞²;
 * δ = 2·asin(1/e), e = 1 + rp·v∞²/μ; v̂out = Ŝ·cos δ − B̂·sin δ (the path bends toward the
 * body, away from B). |B| = 0 is a head-on approach (rp = 0, δ = π). mu km³/s² > 0.
 * Source: Kizner (1961) B-plane; Curtis ch. 8 (hyperbola relations).
 */
export function vinfOutFromAim(
  vinfIn: Vec3Like,
  bT: number,
  bR: number,
  mu: number,
  pole: Vec3Like = ECLIPTIC_POLE,
): { vinfOut: Vec3; rp: number; turnAngle: number } {
  assertNonZeroVec3("vinfIn", vinfIn);
  assertFinite("bT", bT);
  assertFinite("bR", bR);
  assertPositive("mu", mu);
  assertNonZeroVec3("pole", pole);
  const ix = vinfIn[0]!, iy = vinfIn[1]!, iz = vinfIn[2]!;
  const v = Math.sqrt(ix * ix + iy * iy + iz * iz);
  const sx = ix / v, sy = iy / v, sz = iz / v;
  const [T, R] = triad(sx, sy, sz, pole);
  const b = Math.hypot(bT, bR);
  const k = mu / (v * v);
  // rp = −k + √(k² + b²), written without cancellation: rp = b² / (k + √(k² + b²))
  const rp = (b * b) / (k + Math.sqrt(k * k + b * b));
  const e = 1 + rp / k;
  const delta = 2 * Math.asin(1 / e);
  let out: Vec3;
  if (b === 0) {
    out = [-ix, -iy, -iz];
  } else {
    const bx = (bT * T[0] + bR * R[0]) / b;
    const by = (bT * T[1] + bR * R[1]) / b;
    const bz = (bT * T[2] + bR * R[2]) / b;
    const c = Math.cos(delta), s = Math.sin(delta);
    out = [v * (c * sx - s * bx), v * (c * sy - s * by), v * (c * sz - s * bz)];
  }
  return { vinfOut: out, rp, turnAngle: delta };
}

/**
 * B-plane quantities of a planet-centred hyperbolic state (r km, v km/s, same frame as
 * `pole`; energy v²/2 − μ/r must be > 0). Ŝ is the incoming asymptote of the osculating
 * hyperbola, B = Ŝ×h/v∞; the turn angle is that between its two asymptotes, rp = p/(1 + e).
 * Same shape as {@link bPlaneFromVinf}. Throws RangeError for a bound or rectilinear orbit.
 * Source: Kizner (1961); Curtis ch. 8 (asymptote true anomaly ν∞ = acos(−1/e)).
 */
export function bPlaneFromState(r: Vec3Like, v: Vec3Like, mu: number, pole: Vec3Like = ECLIPTIC_POLE): BPlaneResult {
  assertNonZeroVec3("r", r);
  assertVec3("v", v);
  assertPositive("mu", mu);
  assertNonZeroVec3("pole", pole);
  const g = hyperbolaGeometry(r, v, mu);
  const [T, R] = triad(g.S[0], g.S[1], g.S[2], pole);
  const bT = g.b * (g.B[0] * T[0] + g.B[1] * T[1] + g.B[2] * T[2]);
  const bR = g.b * (g.B[0] * R[0] + g.B[1] * R[1] + g.B[2] * R[2]);
  return { bT, bR, b: g.b, theta: normTheta(bR, bT), rp: g.rp, turnAngle: g.delta };
}

/** Incoming asymptote Ŝ, unit B̂, |B|, v∞, rp, δ of an osculating hyperbola. */
function hyperbolaGeometry(
  r: Vec3Like,
  v: Vec3Like,
  mu: number,
): { S: Vec3; B: Vec3; b: number; vinf: number; rp: number; delta: number } {
  const rx = r[0]!, ry = r[1]!, rz = r[2]!;
  const vx = v[0]!, vy = v[1]!, vz = v[2]!;
  const rn = Math.sqrt(rx * rx + ry * ry + rz * rz);
  const v2 = vx * vx + vy * vy + vz * vz;
  const vinf2 = v2 - (2 * mu) / rn;
  if (!(vinf2 > 0)) throw new RangeError(`state is not hyperbolic (v² − 2μ/r = ${vinf2} km²/s² ≤ 0)`);
  const vinf = Math.sqrt(vinf2);
  const hx = ry * vz - rz * vy, hy = rz * vx - rx * vz, hz = rx * vy - ry * vx;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  if (!(hn > 1e-14 * rn * Math.sqrt(v2))) {
    throw new RangeError("r and v are parallel: a rectilinear approach has no B-plane");
  }
  const rdv = rx * vx + ry * vy + rz * vz;
  const c1 = v2 - mu / rn;
  const ex = (c1 * rx - rdv * vx) / mu, ey = (c1 * ry - rdv * vy) / mu, ez = (c1 * rz - rdv * vz) / mu;
  const e = Math.sqrt(ex * ex + ey * ey + ez * ez);
  const px = ex / e, py = ey / e, pz = ez / e;
  const ux = hx / hn, uy = hy / hn, uz = hz / hn;
  const qx = uy * pz - uz * py, qy = uz * px - ux * pz, qz = ux * py - uy * px; // Q̂ = ĥ × P̂
  // v̂∞in = (1/e)·P̂ + (√(e²−1)/e)·Q̂
  const c = 1 / e, s = Math.sqrt(e * e - 1) / e;
  const S: Vec3 = [c * px + s * qx, c * py + s * qy, c * pz + s * qz];
  // B̂ = Ŝ × ĥ
  const B: Vec3 = [S[1] * uz - S[2] * uy, S[2] * ux - S[0] * uz, S[0] * uy - S[1] * ux];
  const p = (hn * hn) / mu;
  return { S, B, b: hn / vinf, vinf, rp: p / (1 + e), delta: 2 * Math.asin(1 / e) };
}

/**
 * Capture (impact) radius in the B-plane, km: the |B| whose hyperbola grazes a sphere of
 * radius R: b = R·√(1 + 2μ/(R·v∞²)). radius km > 0, vinf km/s > 0, mu km³/s² > 0.
 * Source: Curtis ch. 8 (aiming radius); Kizner (1961).
 */
export function captureRadius(radius: number, vinf: number, mu: number): number {
  assertPositive("radius", radius);
  assertPositive("vinf", vinf);
  assertPositive("mu", mu);
  return radius * Math.sqrt(1 + (2 * mu) / (radius * vinf * vinf));
}

/**
 * Linearized time of flight (s): the time for straight-line motion at v∞ along the incoming
 * asymptote direction Ŝ of the osculating hyperbola to reach the B-plane (the plane through
 * the body centre normal to Ŝ): LTOF = −(r·Ŝ)/v∞. Positive before the crossing, negative after.
 * It is the conventional time-to-encounter of B-plane targeting; far from the body it differs from
 * the true time to periapsis only by the gravitational term ~ (μ/v∞³)·ln(r·v∞²/μ), small relative
 * to LTOF; with μ → 0 it is exact. Inputs: planet-centred hyperbolic state r km, v km/s, mu km³/s² > 0.
 * Source: B-plane targeting practice following Kizner (1961) (common practice).
 */
export function linearizedTimeOfFlight(r: Vec3Like, v: Vec3Like, mu: number): number {
  assertNonZeroVec3("r", r);
  assertVec3("v", v);
  assertPositive("mu", mu);
  const g = hyperbolaGeometry(r, v, mu);
  return -(r[0]! * g.S[0] + r[1]! * g.S[1] + r[2]! * g.S[2]) / g.vinf;
}
