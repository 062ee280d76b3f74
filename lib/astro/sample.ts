/**
 * Sampling a tour's heliocentric arcs for display (3D scene, exports) and the spacecraft's
 * position at any epoch of the tour.
 *
 * Units: km, km/s, s. Frame: heliocentric ecliptic J2000 (EclJ2000). Epochs: TDB seconds past
 * J2000. Each leg is the two-body conic about the Sun (MU_SUN) that starts at the departure
 * body's position at the departure epoch with the leg's Lambert velocity v1, propagated with
 * universal variables (kepler.propagate) — never a straight line between the bodies.
 *
 * Sample spacing: per leg, `pointsPerLeg` epochs on a cosine ("Chebyshev–Lobatto") grid in
 * time, t_k = t0 + tof·(1 − cos(πk/(n−1)))/2, so samples are denser near both ends of a leg
 * (where the flybys are and where the scene zooms in) and the leg's first and last epochs
 * are exact node epochs. Interpolation between samples is cubic Hermite on position and
 * velocity, which is C¹ and accurate to a few hundred km at the coarsest default spacing.
 * Source: universal-variable propagation (Vallado Algorithm 8); cubic Hermite interpolation
 * (common practice).
 */
import { MU_SUN } from "./constants";
import { propagate } from "./kepler";
import type { Ephemeris, TourResult, TourSamples, TourSpec, Vec3 } from "./types";
import { assertFinite } from "./vec3";

export type { TourSamples } from "./types";

/** Default number of samples per leg (including both ends). */
export const DEFAULT_POINTS_PER_LEG = 192;

export interface SampleTourOptions {
  /** Samples per leg including both ends, integer in [2, 20000]; default DEFAULT_POINTS_PER_LEG. */
  pointsPerLeg?: number;
}

function finite3(v: ArrayLike<number> | undefined): v is ArrayLike<number> {
  return (
    v != null &&
    v.length >= 3 &&
    Number.isFinite(v[0]) &&
    Number.isFinite(v[1]) &&
    Number.isFinite(v[2])
  );
}

/**
 * Samples every leg of an evaluated tour.
 *
 * @param spec the tour's nodes (body, epoch TDB s past J2000), legs and bodies.
 * @param result `evaluateTour(spec, ephemeris)`: each leg's heliocentric v1 (km/s, EclJ2000).
 * @param ephemeris body states (km, km/s, EclJ2000, t TDB s).
 * @param opts.pointsPerLeg samples per leg including both ends (integer 2…20000, default 192).
 * @returns `TourSamples`: epochs (TDB s, non-decreasing; the boundary epoch between two legs
 *   appears twice, once as the end of one leg and once as the start of the next), positions
 *   (km, EclJ2000, xyz interleaved), velocities (km/s, EclJ2000, xyz interleaved), legStarts
 *   (sample index where each leg begins) and legOk (false where the leg had no Lambert
 *   solution: its samples are then pinned to the departure body's position for the first half
 *   and the arrival body's for the second, and the scene must not draw it as a trajectory).
 * @throws RangeError when spec has fewer than 2 nodes, epochs are not finite or not increasing,
 *   or pointsPerLeg is out of range.
 */
export function sampleTour(
  spec: TourSpec,
  result: TourResult,
  ephemeris: Ephemeris,
  opts: SampleTourOptions = {},
): TourSamples {
  if (spec == null || !Array.isArray(spec.nodes)) throw new RangeError("spec.nodes must be an array");
  const nodes = spec.nodes;
  if (nodes.length < 2) throw new RangeError(`a tour needs at least 2 nodes (got ${nodes.length})`);
  const n = opts.pointsPerLeg ?? DEFAULT_POINTS_PER_LEG;
  if (!Number.isInteger(n) || n < 2 || n > 20000) {
    throw new RangeError(`pointsPerLeg must be an integer in [2, 20000] (got ${String(n)})`);
  }
  for (let i = 0; i < nodes.length; i++) {
    assertFinite(`spec.nodes[${i}].epoch`, nodes[i]!.epoch);
    if (i > 0 && !(nodes[i]!.epoch > nodes[i - 1]!.epoch)) {
      throw new RangeError(`node epochs must increase (node ${i} is not after node ${i - 1})`);
    }
  }
  const legCount = nodes.length - 1;
  const total = legCount * n;
  const epochs = new Float64Array(total);
  const positions = new Float64Array(total * 3);
  const velocities = new Float64Array(total * 3);
  const legStarts: number[] = [];
  const legOk: boolean[] = [];
  for (let i = 0; i < legCount; i++) {
    const from = nodes[i]!;
    const to = nodes[i + 1]!;
    const t0 = from.epoch;
    const tof = to.epoch - t0;
    const base = i * n;
    legStarts.push(base);
    const s0 = ephemeris.state(from.body, t0);
    const v1 = result?.legs?.[i]?.v1;
    const ok = finite3(v1) && finite3(s0.r);
    legOk.push(ok);
    for (let k = 0; k < n; k++) {
      const frac = k === 0 ? 0 : k === n - 1 ? 1 : (1 - Math.cos((Math.PI * k) / (n - 1))) / 2;
      const dt = frac * tof;
      const j = base + k;
      epochs[j] = k === n - 1 ? to.epoch : t0 + dt;
      let r: ArrayLike<number>;
      let v: ArrayLike<number>;
      if (ok) {
        const st = propagate(s0.r, v1, dt, MU_SUN);
        r = st.r;
        v = st.v;
      } else {
        // No trajectory: pin the samples to the bodies (first half at the departure body, second
        // half at the arrival body) so that spacecraftAt stays finite; legOk tells the scene.
        const st = frac < 0.5 ? s0 : ephemeris.state(to.body, to.epoch);
        r = st.r;
        v = [0, 0, 0];
      }
      positions[3 * j] = r[0]!;
      positions[3 * j + 1] = r[1]!;
      positions[3 * j + 2] = r[2]!;
      velocities[3 * j] = v[0]!;
      velocities[3 * j + 1] = v[1]!;
      velocities[3 * j + 2] = v[2]!;
    }
  }
  return { epochs, positions, velocities, legStarts, legOk };
}

/** Index k such that epochs[k] ≤ t < epochs[k+1] (binary search; caller has clamped t). */
function bracket(epochs: Float64Array, t: number): number {
  let lo = 0;
  let hi = epochs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (epochs[mid]! <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Spacecraft position at epoch t, written into `out` (no allocation; for per-frame use).
 * Same contract as `spacecraftAt`. Returns `out`.
 */
export function spacecraftAtInto<T extends Vec3 | Float64Array>(samples: TourSamples, t: number, out: T): T {
  const { epochs, positions } = samples;
  const m = epochs.length;
  if (m === 0) throw new RangeError("samples are empty");
  if (!Number.isFinite(t)) throw new RangeError(`t must be a finite number (got ${String(t)})`);
  let k: number;
  if (t <= epochs[0]!) k = -1;
  else if (t >= epochs[m - 1]!) k = m - 1;
  else k = bracket(epochs, t);
  if (k < 0 || k >= m - 1) {
    const j = k < 0 ? 0 : m - 1;
    out[0] = positions[3 * j]!;
    out[1] = positions[3 * j + 1]!;
    out[2] = positions[3 * j + 2]!;
    return out;
  }
  const ta = epochs[k]!;
  const tb = epochs[k + 1]!;
  const h = tb - ta;
  if (!(h > 0)) {
    // The duplicated boundary epoch between two legs: take the start of the next leg.
    out[0] = positions[3 * k + 3]!;
    out[1] = positions[3 * k + 4]!;
    out[2] = positions[3 * k + 5]!;
    return out;
  }
  const s = (t - ta) / h;
  const vel = samples.velocities;
  if (vel && vel.length === positions.length) {
    // Cubic Hermite basis on [0, 1]; velocities scaled by the interval length.
    const s2 = s * s;
    const s3 = s2 * s;
    const h00 = 2 * s3 - 3 * s2 + 1;
    const h10 = s3 - 2 * s2 + s;
    const h01 = -2 * s3 + 3 * s2;
    const h11 = s3 - s2;
    for (let c = 0; c < 3; c++) {
      out[c] =
        h00 * positions[3 * k + c]! +
        h10 * h * vel[3 * k + c]! +
        h01 * positions[3 * k + 3 + c]! +
        h11 * h * vel[3 * k + 3 + c]!;
    }
  } else {
    for (let c = 0; c < 3; c++) {
      out[c] = positions[3 * k + c]! + s * (positions[3 * k + 3 + c]! - positions[3 * k + c]!);
    }
  }
  return out;
}

/**
 * Spacecraft position (km, heliocentric EclJ2000) at epoch t (TDB s past J2000), interpolated
 * from the samples with cubic Hermite on positions and velocities (linear when the samples carry
 * no velocities). Epochs before the first sample or after the last are clamped to the ends.
 * At the boundary epoch between two legs, the start of the later leg is returned.
 * @throws RangeError for empty samples or a non-finite t.
 */
export function spacecraftAt(samples: TourSamples, t: number): Vec3 {
  return spacecraftAtInto(samples, t, [0, 0, 0] as Vec3);
}

/** Index of the leg flown at epoch t (TDB s), clamped to [0, legs − 1]. */
export function legAt(samples: TourSamples, t: number): number {
  const { legStarts, epochs } = samples;
  let leg = 0;
  for (let i = 1; i < legStarts.length; i++) {
    if (t >= epochs[legStarts[i]!]!) leg = i;
  }
  return leg;
}
