/**
 * Physical constants of the computation core.
 *
 * Units: km, s, km/s, km³/s². Values name their published source beside them.
 */
import type { BodyPhysical, PlanetId } from "./types";

/**
 * Gravitational parameter of the Sun, km³/s² (TDB-compatible).
 * Source: IAU 2009 system of astronomical constants / JPL DE405 value.
 */
export const MU_SUN = 1.32712440018e11;

/**
 * Astronomical unit, km (exact by definition).
 * Source: IAU 2012 Resolution B2.
 */
export const AU_KM = 149597870.7;

/** Seconds per day (SI day of 86400 s). Source: definition of the day in the SI/IAU system. */
export const DAY_S = 86400;

/** Julian century in days (36525 d). Source: IAU definition of the Julian century. */
export const JULIAN_CENTURY_DAYS = 36525;

/** Julian date of the J2000.0 epoch (TDB). Source: IAU 1976 / definition of J2000.0. */
export const JD_J2000 = 2451545.0;

/**
 * Obliquity of the ecliptic at J2000.0, rad (84381.406″).
 * Source: IAU 2006 precession (Capitaine et al. 2003), as used by astronomy-engine's Rotation_EQJ_ECL.
 */
export const OBLIQUITY_J2000 = (84381.406 / 3600) * (Math.PI / 180);

/** Standard gravity g0, km/s² (9.80665 m/s²). Source: CGPM 1901 (3rd CGPM), exact. */
export const G0_KM_S2 = 9.80665e-3;

/** The planets Gybe knows, in order from the Sun. */
export const PLANET_IDS: readonly PlanetId[] = [
  "mercury",
  "venus",
  "earth",
  "mars",
  "jupiter",
  "saturn",
  "uranus",
  "neptune",
  "pluto",
] as const;

/**
 * Physical data of the planets used by flybys:
 * - `mu`: planet-only GM, km³/s² (not system GM: moons excluded).
 *   Source: JPL planetary constants (Horizons headers); Mercury, Uranus, Neptune, Pluto from memory.
 * - `radius`: equatorial radius, km. Source: JPL SSD "Planets: physical characteristics"
 *   (IAU WGCCRE); Mercury, Uranus, Neptune, Pluto from memory.
 * - `minFlybyAltitude`: default minimum flyby altitude above `radius`, km — common practice
 *   (no published source; every tour can override through `rpMin`).
 */
export const BODIES: Readonly<Record<PlanetId, Readonly<BodyPhysical>>> = {
  // GM: JPL planetary constants (from memory); radius: JPL SSD / IAU WGCCRE (from memory); alt: common practice
  mercury: { mu: 22031.868551, radius: 2440.53, minFlybyAltitude: 200 },
  // GM: JPL planetary constants; radius: JPL SSD / IAU WGCCRE; alt 300 km (atmosphere): common practice
  venus: { mu: 324858.592, radius: 6051.8, minFlybyAltitude: 300 },
  // GM: JPL planetary constants; radius: JPL SSD / IAU WGCCRE; alt 300 km: common practice
  earth: { mu: 398600.4418, radius: 6378.1366, minFlybyAltitude: 300 },
  // GM: JPL planetary constants; radius: JPL SSD / IAU WGCCRE; alt 300 km: common practice
  mars: { mu: 42828.375214, radius: 3396.19, minFlybyAltitude: 300 },
  // GM planet only: JPL planetary constants; radius: JPL SSD / IAU WGCCRE;
  // alt 528,508 km (periapsis radius 600,000 km, radiation belts): common practice
  jupiter: { mu: 126686534, radius: 71492, minFlybyAltitude: 528508 },
  // GM planet only: JPL planetary constants; radius: JPL SSD / IAU WGCCRE;
  // alt 19,732 km (periapsis radius 80,000 km, rings): common practice
  saturn: { mu: 37931187, radius: 60268, minFlybyAltitude: 19732 },
  // GM planet only: JPL planetary constants (from memory); radius: JPL SSD (from memory); alt: common practice
  uranus: { mu: 5793951.3, radius: 25559, minFlybyAltitude: 1000 },
  // GM planet only: JPL planetary constants (from memory); radius: JPL SSD (from memory); alt: common practice
  neptune: { mu: 6835100, radius: 24764, minFlybyAltitude: 1000 },
  // GM planet only: JPL planetary constants (from memory); radius: JPL SSD (from memory); alt: common practice
  pluto: { mu: 869.6, radius: 1188.3, minFlybyAltitude: 100 },
};

/** True when `id` is one of the planet ids in {@link PLANET_IDS}. */
export function isPlanetId(id: string): id is PlanetId {
  return Object.prototype.hasOwnProperty.call(BODIES, id);
}

/**
 * Default minimum periapsis radius of a planet, km: radius + minFlybyAltitude.
 * Source: BODIES (JPL SSD radii; altitudes common practice). Throws RangeError for an unknown id.
 */
export function defaultRpMin(id: PlanetId): number {
  const b = BODIES[id];
  if (!b) throw new RangeError(`defaultRpMin: unknown planet id "${String(id)}"`);
  return b.radius + b.minFlybyAltitude;
}
