/**
 * Reference frames of the computation core and the rotations between them.
 *
 * - `EclJ2000`: mean ecliptic and equinox of J2000 — the heliocentric working frame of lib/astro.
 * - `EqJ2000`: mean equator and equinox of J2000 (EME2000 / ICRF-aligned to the precision used here).
 *
 * The ecliptic is astronomy-engine's: a rotation about +x by the J2000 obliquity 84381.406″
 * (IAU 2006 precession, Capitaine et al. 2003), exactly as its `Rotation_EQJ_ECL` matrix.
 * astronomy-engine may be imported only here and in ephemeris.ts.
 */
import { AstroTime, Body, RotationAxis, Rotation_EQJ_ECL } from "astronomy-engine";
import { OBLIQUITY_J2000 } from "./constants";
import { assertVec3 } from "./vec3";
import type { PlanetId, Vec3, Vec3Like } from "./types";

/** Identifier of a reference frame used in lib/astro. */
export type FrameId = "EclJ2000" | "EqJ2000";

/** The heliocentric working frame of lib/astro: mean ecliptic and equinox of J2000. */
export const WORKING_FRAME: FrameId = "EclJ2000";

/** All frame ids known to lib/astro. */
export const FRAME_IDS: readonly FrameId[] = ["EclJ2000", "EqJ2000"] as const;

const AE_EQJ_ECL = Rotation_EQJ_ECL().rot;

/**
 * cos ε of the J2000 obliquity ε = 84381.406″ (dimensionless), taken from astronomy-engine's
 * Rotation_EQJ_ECL matrix itself so that our ecliptic is bit-for-bit its ecliptic (its hard-coded
 * ε = 0.40909260059599012 rad differs from 84381.406″ by 5e-12 rad, 0.02 km at Pluto's distance;
 * OBLIQUITY_J2000 in constants.ts is the published value).
 * Source: IAU 2006 precession (Capitaine et al. 2003) via astronomy-engine's Rotation_EQJ_ECL.
 */
export const COS_OBLIQUITY: number = AE_EQJ_ECL[1]?.[1] ?? Math.cos(OBLIQUITY_J2000);
/** sin ε, ε = 84381.406″ (see COS_OBLIQUITY); from astronomy-engine's Rotation_EQJ_ECL. */
export const SIN_OBLIQUITY: number = AE_EQJ_ECL[2]?.[1] ?? Math.sin(OBLIQUITY_J2000);

/**
 * Rotates a vector from the J2000 mean equator (EqJ2000) to the J2000 mean ecliptic (EclJ2000).
 * Any unit (the rotation is unit-free); valid for any finite vector; time-independent.
 * Source: rotation about +x by ε = 84381.406″, as astronomy-engine's Rotation_EQJ_ECL.
 * @throws RangeError if `v` is not a finite 3-vector.
 */
export function eqj2000ToEclJ2000(v: Vec3Like): Vec3 {
  assertVec3("v", v);
  const x = v[0] as number;
  const y = v[1] as number;
  const z = v[2] as number;
  return [x, COS_OBLIQUITY * y + SIN_OBLIQUITY * z, -SIN_OBLIQUITY * y + COS_OBLIQUITY * z];
}

/**
 * Rotates a vector from the J2000 mean ecliptic (EclJ2000) to the J2000 mean equator (EqJ2000).
 * Any unit; valid for any finite vector; time-independent. Inverse (transpose) of eqj2000ToEclJ2000.
 * Source: rotation about +x by −ε, ε = 84381.406″ (astronomy-engine's Rotation_ECL_EQJ).
 * @throws RangeError if `v` is not a finite 3-vector.
 */
export function eclJ2000ToEqj2000(v: Vec3Like): Vec3 {
  assertVec3("v", v);
  const x = v[0] as number;
  const y = v[1] as number;
  const z = v[2] as number;
  return [x, COS_OBLIQUITY * y - SIN_OBLIQUITY * z, SIN_OBLIQUITY * y + COS_OBLIQUITY * z];
}

/**
 * Rotates a vector between two frames of lib/astro (identity when `from === to`).
 * Any unit; time-independent. Source: as eqj2000ToEclJ2000 / eclJ2000ToEqj2000.
 * @throws RangeError for an unknown frame id or a non-finite vector.
 */
export function rotateFrame(v: Vec3Like, from: FrameId, to: FrameId): Vec3 {
  if (!FRAME_IDS.includes(from)) throw new RangeError(`from: unknown frame '${String(from)}'`);
  if (!FRAME_IDS.includes(to)) throw new RangeError(`to: unknown frame '${String(to)}'`);
  if (from === to) {
    assertVec3("v", v);
    return [v[0] as number, v[1] as number, v[2] as number];
  }
  return from === "EqJ2000" ? eqj2000ToEclJ2000(v) : eclJ2000ToEqj2000(v);
}

const AE_BODY: Record<PlanetId, Body> = {
  mercury: Body.Mercury,
  venus: Body.Venus,
  earth: Body.Earth,
  mars: Body.Mars,
  jupiter: Body.Jupiter,
  saturn: Body.Saturn,
  uranus: Body.Uranus,
  neptune: Body.Neptune,
  pluto: Body.Pluto,
};

/**
 * North spin pole of a planet as a unit vector in EclJ2000 (dimensionless), for B-plane poles.
 * `t`: TDB seconds past J2000 (passed to astronomy-engine as TT, TDB ≈ TT within 2 ms); any finite
 * epoch, the IAU pole models being meant for a few centuries around J2000.
 * Source: IAU WGCCRE 2015 rotational elements via astronomy-engine's RotationAxis.
 * @throws RangeError for an unknown planet id or a non-finite `t`.
 */
export function spinPole(body: PlanetId, t: number): Vec3 {
  if (typeof body !== "string" || !Object.prototype.hasOwnProperty.call(AE_BODY, body)) {
    throw new RangeError(`body: '${String(body)}' is not a planet id (mercury … pluto)`);
  }
  if (typeof t !== "number" || !Number.isFinite(t)) {
    throw new RangeError(`t must be a finite number of TDB seconds past J2000 (got ${String(t)})`);
  }
  const axis = RotationAxis(AE_BODY[body], AstroTime.FromTerrestrialTime(t / 86400));
  const p = eqj2000ToEclJ2000([axis.north.x, axis.north.y, axis.north.z]);
  const n = Math.hypot(p[0], p[1], p[2]);
  return [p[0] / n, p[1] / n, p[2] / n];
}
