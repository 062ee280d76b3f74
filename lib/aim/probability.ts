/**
 * Delivery dispersion in the B-plane (pure TypeScript): the kσ ellipse of a bivariate normal
 * aim error and the probability that the delivered |B| falls inside a circle (the impact circle
 * or the minimum-altitude circle; |B| < b ⇔ rp < the circle's rp for a given v∞).
 *
 * Units: km in the B-plane (B·T, B·R), correlation ρ dimensionless in [−1, 1].
 * Model: (B·T, B·R) ~ N(mean = aim point, Σ = [[σT², ρσTσR], [ρσTσR, σR²]]).
 *
 * Method of `probabilityInsideCircle` ("ray integration"): write the error as x = mean + L·u with
 * L the Cholesky factor of Σ and u standard normal. Along each direction φ of u the radial mass of
 * a standard bivariate normal between radii s1 and s2 is exactly e^(−s1²/2) − e^(−s2²/2), and the
 * circle |x| < b cuts each ray in one interval [s1, s2] found from a quadratic. What remains is a
 * 1-D integral over φ, done by the midpoint rule (full circle, periodic integrand: spectrally
 * accurate) or, when the origin of u lies outside the circle's image, over the cone of directions
 * that hit it with nodes clustered at the tangent directions. Accurate to ~1e-9 absolute with
 * the default 2,048 directions, and it resolves tiny probabilities (1e-12) that sampling cannot.
 * A singular Σ (σ = 0 or |ρ| = 1) reduces to a 1-D normal along its principal axis (exact, erfc)
 * or to a point.
 * `probabilityInsideCircleMC` is the seeded Monte Carlo cross-check (N samples, standard error).
 * Sources: bivariate normal and its polar form (common practice; e.g. any probability text);
 * Rayleigh distribution P(|x| < b) = 1 − exp(−b²/2σ²) for the centred circular case.
 */

/** Aim delivery errors: σ(B·T), σ(B·R) km (≥ 0) and their correlation ρ ∈ [−1, 1]. */
export interface Dispersion {
  sigmaT: number;
  sigmaR: number;
  rho: number;
}

export function validateDispersion(d: Dispersion): void {
  if (d == null || typeof d !== "object") throw new RangeError("dispersion must be { sigmaT, sigmaR, rho }");
  if (!Number.isFinite(d.sigmaT) || d.sigmaT < 0) throw new RangeError(`σ(B·T) must be finite and ≥ 0 km (got ${d.sigmaT})`);
  if (!Number.isFinite(d.sigmaR) || d.sigmaR < 0) throw new RangeError(`σ(B·R) must be finite and ≥ 0 km (got ${d.sigmaR})`);
  if (!Number.isFinite(d.rho) || d.rho < -1 || d.rho > 1) throw new RangeError(`ρ must be in [−1, 1] (got ${d.rho})`);
}

/**
 * Principal axes of Σ: eigenvalues λ1 ≥ λ2 ≥ 0 (km²) and the angle (rad, from +T toward +R) of
 * the major axis.
 */
export function principalAxes(d: Dispersion): { l1: number; l2: number; angle: number } {
  validateDispersion(d);
  const a = d.sigmaT * d.sigmaT;
  const c = d.sigmaR * d.sigmaR;
  const b = d.rho * d.sigmaT * d.sigmaR;
  const m = (a + c) / 2;
  const q = Math.hypot((a - c) / 2, b);
  const angle = 0.5 * Math.atan2(2 * b, a - c);
  return { l1: m + q, l2: Math.max(0, m - q), angle };
}

/**
 * The kσ dispersion ellipse (Mahalanobis distance k): semi-axes km (major ≥ minor) and the
 * major axis angle (rad, from +T toward +R). A 2-D normal puts 1 − e^(−k²/2) of its mass inside:
 * 39.3 % at 1σ, 98.9 % at 3σ. k > 0.
 */
export function dispersionEllipse(d: Dispersion, k: number): { major: number; minor: number; angle: number } {
  if (!(k > 0) || !Number.isFinite(k)) throw new RangeError(`k must be finite and > 0 (got ${k})`);
  const { l1, l2, angle } = principalAxes(d);
  return { major: k * Math.sqrt(l1), minor: k * Math.sqrt(l2), angle };
}

/**
 * Complementary error function, |relative error| < 1.2e-7 (Chebyshev fit; Numerical Recipes
 * "erfcc", from memory).
 */
export function erfc(x: number): number {
  const z = Math.abs(x);
  const t = 1 / (1 + 0.5 * z);
  const r =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? r : 2 - r;
}

/** Standard normal CDF. */
export function normalCdf(x: number): number {
  return 0.5 * erfc(-x / Math.SQRT2);
}

/**
 * Probability that the delivered aim point lies inside the circle |B| < radius (km), for an aim
 * error N(mean, Σ(d)). Method: ray integration (see the module comment).
 * @param meanT, meanR the aimed point, km. @param radius circle radius, km ≥ 0.
 * @param opts.directions quadrature directions (default 2048, integer 64 … 1e6).
 */
export function probabilityInsideCircle(
  meanT: number,
  meanR: number,
  d: Dispersion,
  radius: number,
  opts: { directions?: number } = {},
): number {
  if (!Number.isFinite(meanT) || !Number.isFinite(meanR)) throw new RangeError("the aim point must be finite km");
  if (!Number.isFinite(radius) || radius < 0) throw new RangeError(`radius must be finite and ≥ 0 km (got ${radius})`);
  validateDispersion(d);
  const nDir = opts.directions ?? 2048;
  if (!Number.isInteger(nDir) || nDir < 64 || nDir > 1e6) throw new RangeError(`directions must be an integer in [64, 1e6]`);
  if (radius === 0) return 0;
  const r2 = radius * radius;
  const m2 = meanT * meanT + meanR * meanR;
  const { l1, l2, angle } = principalAxes(d);
  // Singular covariance: a point or a 1-D normal along the major axis.
  if (l1 === 0) return m2 < r2 ? 1 : 0;
  if (l2 <= 1e-14 * l1) {
    const ex = Math.cos(angle), ey = Math.sin(angle);
    // |mean + t·e|² < r² ⇔ t² + 2t(mean·e) + m2 − r2 < 0, t ~ N(0, l1)
    const p = meanT * ex + meanR * ey;
    const disc = p * p - (m2 - r2);
    if (disc <= 0) return 0;
    const sq = Math.sqrt(disc);
    const s = Math.sqrt(l1);
    return Math.max(0, normalCdf((-p + sq) / s) - normalCdf((-p - sq) / s));
  }
  // Cholesky factor L = [[a, 0], [b, c]].
  const la = d.sigmaT;
  const lb = d.rho * d.sigmaR;
  const lc = d.sigmaR * Math.sqrt(Math.max(0, 1 - d.rho * d.rho));
  // Mass along direction φ: intersection of the ray s·(L·dir) + mean with the disk.
  const rayMass = (phi: number): number => {
    const ux = Math.cos(phi), uy = Math.sin(phi);
    const wx = la * ux;
    const wy = lb * ux + lc * uy;
    const w2 = wx * wx + wy * wy;
    const mw = meanT * wx + meanR * wy;
    const disc = mw * mw - w2 * (m2 - r2);
    if (disc <= 0) return 0;
    const sq = Math.sqrt(disc);
    const s2 = (-mw + sq) / w2;
    if (s2 <= 0) return 0;
    const s1 = Math.max(0, (-mw - sq) / w2);
    return Math.exp(-0.5 * s1 * s1) - Math.exp(-0.5 * s2 * s2);
  };
  if (m2 < r2) {
    // The origin of u is inside: every ray hits; periodic midpoint rule over the full circle.
    let sum = 0;
    for (let i = 0; i < nDir; i++) sum += rayMass(((i + 0.5) * 2 * Math.PI) / nDir);
    return Math.min(1, sum / nDir);
  }
  // Outside: find the cone of directions that hit the disk image, around the centre direction.
  // Centre of the disk image in u: L⁻¹(−mean).
  const cx = -meanT / la;
  const cy = (-meanR - lb * cx) / lc;
  const phiC = Math.atan2(cy, cx);
  const hits = (phi: number) => rayMass(phi) > 0;
  if (!hits(phiC)) return 0; // the disk image is too thin to hit even at its centre (underflow)
  const edge = (sign: 1 | -1): number => {
    let lo = 0;
    let hi = Math.PI;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (hits(phiC + sign * mid)) lo = mid;
      else hi = mid;
    }
    return lo;
  };
  const a0 = phiC - edge(-1);
  const a1 = phiC + edge(1);
  const half = (a1 - a0) / 2;
  const mid = (a0 + a1) / 2;
  // φ = mid − half·cos(πτ): nodes cluster at the tangent directions (√-type endpoint behaviour).
  let sum = 0;
  for (let i = 0; i < nDir; i++) {
    const tau = (i + 0.5) / nDir;
    sum += rayMass(mid - half * Math.cos(Math.PI * tau)) * Math.sin(Math.PI * tau);
  }
  const integral = (sum / nDir) * half * Math.PI;
  return Math.min(1, Math.max(0, integral / (2 * Math.PI)));
}

/** Seeded 32-bit generator (mulberry32, common practice) → uniform in [0, 1). */
export function mulberry32(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Monte Carlo estimate of the same probability: n seeded normal samples (Box–Muller over
 * mulberry32). Returns the fraction inside and its standard error √(p(1−p)/n).
 */
export function probabilityInsideCircleMC(
  meanT: number,
  meanR: number,
  d: Dispersion,
  radius: number,
  n: number,
  seed = 1,
): { p: number; stderr: number } {
  validateDispersion(d);
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`n must be a positive integer (got ${n})`);
  if (!Number.isFinite(radius) || radius < 0) throw new RangeError("radius must be finite and ≥ 0 km");
  const rnd = mulberry32(seed);
  const la = d.sigmaT;
  const lb = d.rho * d.sigmaR;
  const lc = d.sigmaR * Math.sqrt(Math.max(0, 1 - d.rho * d.rho));
  const r2 = radius * radius;
  let inside = 0;
  for (let i = 0; i < n; i++) {
    const u1 = 1 - rnd();
    const u2 = rnd();
    const rr = Math.sqrt(-2 * Math.log(u1));
    const z1 = rr * Math.cos(2 * Math.PI * u2);
    const z2 = rr * Math.sin(2 * Math.PI * u2);
    const x = meanT + la * z1;
    const y = meanR + lb * z1 + lc * z2;
    if (x * x + y * y < r2) inside++;
  }
  const p = inside / n;
  return { p, stderr: Math.sqrt((p * (1 - p)) / n) };
}

/** The risk figures of an aim point under a dispersion. */
export interface FlybyRisk {
  /** P(rp < body radius): the delivered flyby hits the body. */
  pImpact: number;
  /** P(rp < minimum periapsis radius), impact included. */
  pBelowMin: number;
  /** Human-readable method statement for the screen. */
  method: string;
}

/**
 * Impact and below-minimum-altitude probabilities for an aim point (km) under a dispersion, given
 * the impact radius and the minimum-altitude radius in the B-plane (km, from captureRadius).
 */
export function flybyRisk(
  meanT: number,
  meanR: number,
  d: Dispersion,
  circles: { impactRadius: number; minAltRadius: number },
  directions = 2048,
): FlybyRisk {
  return {
    pImpact: probabilityInsideCircle(meanT, meanR, d, circles.impactRadius, { directions }),
    pBelowMin: probabilityInsideCircle(meanT, meanR, d, circles.minAltRadius, { directions }),
    method: `bivariate normal in (B·T, B·R); exact radial integral with a ${directions.toLocaleString("en-US")}-direction quadrature (deterministic)`,
  };
}
