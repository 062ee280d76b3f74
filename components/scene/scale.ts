/**
 * The one place where kilometres become scene units (and back).
 *
 * Input positions are heliocentric ecliptic J2000, km. Scene axes: x, y, z = ecliptic X, Y, Z
 * (three.js camera "up" is set to +z by the Orrery). One astronomical unit is SCENE_UNITS_PER_AU
 * scene units in linear mode.
 *
 * Two scales:
 * - `linear`: s(r) = r · SCENE_UNITS_PER_AU / AU_KM (true geometry).
 * - `log`: the heliocentric distance is compressed, the direction kept:
 *   s(r) = r̂ · SCENE_UNITS_PER_AU · ln(1 + |r|/LOG_KNEE_KM) / ln(1 + AU_KM/LOG_KNEE_KM),
 *   so 1 AU still maps to SCENE_UNITS_PER_AU, Mercury (0.39 AU) to ≈ 0.6 of that and Neptune
 *   (30 AU) to ≈ 2.8 of it: both read on one screen.
 *
 * Precision: the scene is rebased on the focus: `toScene(p, focus) = s(p) − s(focus)`, computed
 * in float64 before three.js stores float32, so that positions near the focused body keep
 * sub-km-to-metre resolution instead of the ~10 km steps of float32 at Jupiter's distance.
 */
import { AU_KM } from "@/lib/astro/constants";

export type ScaleMode = "log" | "linear";

/** Scene units per astronomical unit (linear mode; also the log mode's value at 1 AU). */
export const SCENE_UNITS_PER_AU = 10;

/** Knee of the log scale, km (0.2 AU): distances well below it are nearly linear. */
export const LOG_KNEE_KM = 0.2 * AU_KM;

const LIN = SCENE_UNITS_PER_AU / AU_KM;
const LOG_NORM = SCENE_UNITS_PER_AU / Math.log1p(AU_KM / LOG_KNEE_KM);

/** Scene radius (units from the Sun, before rebasing) of a heliocentric distance d (km ≥ 0). */
export function sceneRadius(dKm: number, mode: ScaleMode): number {
  if (!(dKm >= 0) || !Number.isFinite(dKm)) throw new RangeError(`distance must be finite and ≥ 0 km (got ${dKm})`);
  return mode === "linear" ? dKm * LIN : LOG_NORM * Math.log1p(dKm / LOG_KNEE_KM);
}

/** Inverse of sceneRadius: heliocentric distance (km) of a scene radius (units ≥ 0). */
export function kmFromSceneRadius(u: number, mode: ScaleMode): number {
  if (!(u >= 0) || !Number.isFinite(u)) throw new RangeError(`scene radius must be finite and ≥ 0 (got ${u})`);
  return mode === "linear" ? u / LIN : LOG_KNEE_KM * Math.expm1(u / LOG_NORM);
}

/** Un-rebased scene position of (x, y, z) km written to out[o…o+2]. */
function absInto(out: { [i: number]: number }, o: number, x: number, y: number, z: number, mode: ScaleMode): void {
  if (mode === "linear") {
    out[o] = x * LIN;
    out[o + 1] = y * LIN;
    out[o + 2] = z * LIN;
    return;
  }
  const d = Math.sqrt(x * x + y * y + z * z);
  if (d === 0) {
    out[o] = 0;
    out[o + 1] = 0;
    out[o + 2] = 0;
    return;
  }
  const k = (LOG_NORM * Math.log1p(d / LOG_KNEE_KM)) / d;
  out[o] = x * k;
  out[o + 1] = y * k;
  out[o + 2] = z * k;
}

const fa = new Float64Array(3);

/**
 * Scene position of a heliocentric point, rebased on the focus.
 * @param km point, km, heliocentric ecliptic J2000.
 * @param focusKm the focus (e.g. the focused body's position, or [0, 0, 0] for the Sun), km, same frame.
 * @param mode 'log' or 'linear' (see the module comment).
 * @returns [x, y, z] scene units; the focus itself maps to [0, 0, 0].
 * @throws RangeError for non-finite coordinates or an unknown mode.
 */
export function toScene(km: ArrayLike<number>, focusKm: ArrayLike<number>, mode: ScaleMode): [number, number, number] {
  const out: [number, number, number] = [0, 0, 0];
  toSceneInto(out, 0, km[0]!, km[1]!, km[2]!, focusKm, mode);
  return out;
}

/**
 * Allocation-free form of toScene for per-frame work and for filling line buffers:
 * writes the rebased scene position of (x, y, z) km into out[o], out[o+1], out[o+2].
 */
export function toSceneInto(
  out: { [i: number]: number },
  o: number,
  x: number,
  y: number,
  z: number,
  focusKm: ArrayLike<number>,
  mode: ScaleMode,
): void {
  if (mode !== "log" && mode !== "linear") throw new RangeError(`mode must be 'log' or 'linear' (got ${String(mode)})`);
  if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) {
    throw new RangeError(`position must be finite km (got ${x}, ${y}, ${z})`);
  }
  const fx = focusKm[0]!, fy = focusKm[1]!, fz = focusKm[2]!;
  if (!Number.isFinite(fx) || !Number.isFinite(fy) || !Number.isFinite(fz)) {
    throw new RangeError("focus must be finite km");
  }
  absInto(fa, 0, fx, fy, fz, mode);
  absInto(out, o, x, y, z, mode);
  out[o] = out[o]! - fa[0]!;
  out[o + 1] = out[o + 1]! - fa[1]!;
  out[o + 2] = out[o + 2]! - fa[2]!;
}

/**
 * Inverse of toScene: heliocentric km (ecliptic J2000) of a rebased scene position.
 */
export function fromScene(scene: ArrayLike<number>, focusKm: ArrayLike<number>, mode: ScaleMode): [number, number, number] {
  absInto(fa, 0, focusKm[0]!, focusKm[1]!, focusKm[2]!, mode);
  const ax = scene[0]! + fa[0]!, ay = scene[1]! + fa[1]!, az = scene[2]! + fa[2]!;
  if (mode === "linear") return [ax / LIN, ay / LIN, az / LIN];
  const u = Math.sqrt(ax * ax + ay * ay + az * az);
  if (u === 0) return [0, 0, 0];
  const d = kmFromSceneRadius(u, mode);
  return [(ax * d) / u, (ay * d) / u, (az * d) / u];
}

/**
 * Fills `out` (Float32Array, 3 per point) with the rebased scene positions of `km` (xyz
 * interleaved, km) — the float64 → float32 step happens after rebasing. Returns `out`.
 */
export function fillScene(out: Float32Array, km: ArrayLike<number>, focusKm: ArrayLike<number>, mode: ScaleMode): Float32Array {
  const n = Math.min(out.length, km.length) / 3;
  const tmp = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    toSceneInto(tmp, 0, km[3 * i]!, km[3 * i + 1]!, km[3 * i + 2]!, focusKm, mode);
    out[3 * i] = tmp[0]!;
    out[3 * i + 1] = tmp[1]!;
    out[3 * i + 2] = tmp[2]!;
  }
  return out;
}
