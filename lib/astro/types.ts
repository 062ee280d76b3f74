/**
 * Shared types of the computation core (lib/astro).
 *
 * Units everywhere inside lib/astro: km, s, km/s, km³/s², radians.
 * Epochs: TDB seconds past J2000.0 (JD 2451545.0 TDB).
 * Heliocentric frame: mean ecliptic and equinox of J2000 (EclJ2000).
 */

/** A Cartesian vector `[x, y, z]`; the unit and frame are those of the quantity it carries. */
export type Vec3 = [number, number, number];

/** A vector argument: a plain tuple, a readonly tuple, or a Float64Array of length ≥ 3. */
export type Vec3Like = Readonly<Vec3> | Float64Array | readonly number[];

/** Epoch in TDB seconds past J2000.0 (documentation brand only; plain number at run time). */
export type TdbSeconds = number;

/** The planets Gybe knows, by lower-case id. */
export type PlanetId =
  | "mercury"
  | "venus"
  | "earth"
  | "mars"
  | "jupiter"
  | "saturn"
  | "uranus"
  | "neptune"
  | "pluto";

/** A body: one of the planets, or a team's own small body `custom:<slug>`. */
export type BodyId = PlanetId | `custom:${string}`;

/**
 * Classical orbital elements.
 * - `a` semi-major axis, km (a < 0 for a hyperbola; for a parabola see kepler.ts)
 * - `e` eccentricity (dimensionless)
 * - `i` inclination, rad, [0, π]
 * - `raan` right ascension (longitude) of the ascending node, rad, [0, 2π); 0 for an equatorial orbit
 * - `argp` argument of periapsis, rad, [0, 2π); 0 for a circular orbit
 * - `nu` true anomaly, rad; for a circular orbit the argument of latitude (or true longitude when also equatorial)
 */
export interface OrbitalElements {
  a: number;
  e: number;
  i: number;
  raan: number;
  argp: number;
  nu: number;
}

/** Position (km) and velocity (km/s) of a body or spacecraft in a stated frame. */
export interface StateVector {
  r: Vec3;
  v: Vec3;
}

/**
 * A source of heliocentric body states.
 * `state(body, t)`: position km and velocity km/s, heliocentric ecliptic J2000, t = TDB seconds past J2000.
 */
export interface Ephemeris {
  state(body: BodyId, t: number): { r: Vec3; v: Vec3 };
}

/**
 * An ephemeris with an allocation-free hot path (used by window scans and searches).
 * `stateInto(body, t, out, offset = 0)` writes rx, ry, rz (km), vx, vy, vz (km/s), heliocentric
 * ecliptic J2000, into `out[offset … offset+5]`; t = TDB seconds past J2000. Same values as `state`.
 * Build one from any Ephemeris with `asFast` (lib/astro/ephemeris.ts).
 */
export interface FastEphemeris extends Ephemeris {
  stateInto(body: BodyId, t: number, out: Float64Array, offset?: number): void;
}

/** A team's small body, served by both ephemerides as a two-body orbit about the Sun (MU_SUN). */
export interface CustomBodySpec {
  id: BodyId;
  /** Osculating heliocentric elements, mean ecliptic and equinox of J2000 (km, rad). */
  elements: OrbitalElements;
  /** Epoch of the elements, TDB seconds past J2000. */
  epoch: number;
  /** GM of the body, km³/s². */
  mu: number;
  /** Equatorial radius, km (optional for the ephemeris; used by flybys). */
  radius?: number;
  /** Minimum flyby altitude, km (optional). */
  minFlybyAltitude?: number;
}

/** What crosses into a worker (functions cannot be cloned): the worker builds the Ephemeris itself. */
export interface EphemerisSpec {
  kind: "vsop" | "mean";
  cached?: boolean;
  customBodies?: CustomBodySpec[];
}

/** Physical data of a body used by flybys: GM km³/s², equatorial radius km, minimum flyby altitude km. */
export interface BodyPhysical {
  mu: number;
  radius: number;
  minFlybyAltitude: number;
}

export interface LegOptions {
  /** Complete revolutions of the Lambert arc (default 0). */
  revs?: number;
  /** Izzo branch for revs > 0 (default 'left'). */
  branch?: "left" | "right";
  /** h_z > 0 in the heliocentric ecliptic frame (default true). */
  prograde?: boolean;
}

export type ArrivalSpec =
  | { kind: "flyby" }
  | { kind: "rendezvous" }
  /** Capture into an orbit of periapsis radius rp (km) and eccentricity e, burn at periapsis. */
  | { kind: "capture"; rp: number; e: number };

export interface TourSpec {
  /** TDB s past J2000; first = launch, last = arrival, others = flybys. */
  nodes: { body: BodyId; epoch: number }[];
  /** One entry per leg (nodes.length − 1); default 0 rev, prograde. */
  legs?: LegOptions[];
  /** Default `{ kind: 'flyby' }`. */
  arrival?: ArrivalSpec;
  /** Minimum periapsis radius per body, km; default radius + minFlybyAltitude. */
  rpMin?: Partial<Record<BodyId, number>>;
  /** A team's small bodies: GM km³/s², radius km, minimum flyby altitude km. */
  bodies?: Partial<Record<BodyId, BodyPhysical>>;
}

export type ViolationKind =
  | "no_solution"
  | "below_min_radius"
  | "epochs_not_increasing"
  | "c3_cap"
  | "arrival_vinf_cap"
  | "tof_cap";

export interface TourViolation {
  /** Index of the node (into spec.nodes) the violation belongs to. */
  node: number;
  kind: ViolationKind;
  message: string;
}

export interface TourLegResult {
  from: BodyId;
  to: BodyId;
  /** Time of flight, s. */
  tof: number;
  /** Heliocentric velocity at departure, km/s, EclJ2000. */
  v1: Vec3;
  /** Heliocentric velocity at arrival, km/s, EclJ2000. */
  v2: Vec3;
  revs: number;
}

export interface TourFlybyResult {
  body: BodyId;
  /** TDB s past J2000. */
  epoch: number;
  /** |v∞ in|, |v∞ out|, km/s. */
  vinfIn: number;
  vinfOut: number;
  /** Turn angle between v∞ in and v∞ out, rad. */
  turnAngle: number;
  /** Periapsis radius, km; altitude = rp − radius, km. */
  rp: number;
  altitude: number;
  /** Powered Δv at periapsis, km/s. */
  dv: number;
  /** B-plane aim point, km (ecliptic pole). */
  bT: number;
  bR: number;
  feasible: boolean;
}

export interface TourResult {
  legs: TourLegResult[];
  /** Launch: v∞ km/s, C3 km²/s², declination and right ascension of the launch asymptote (EME2000), rad. */
  launch: { vinf: number; c3: number; dla: number; rla: number };
  flybys: TourFlybyResult[];
  /** Arrival v∞ km/s and arrival Δv km/s for the chosen arrival kind. */
  arrival: { vinf: number; dv: number };
  /** Σ flyby dv + arrival dv, km/s: what the spacecraft pays (launch excluded). */
  totalDv: number;
  violations: TourViolation[];
}

/** One Lambert solution: velocities in the frame of the inputs, km/s. */
export interface LambertSolution {
  v1: Vec3;
  v2: Vec3;
  revs: number;
  branch: "single" | "left" | "right";
  iterations: number;
}

// ---- search (lib/astro/search.ts) ----

/** TDB s past J2000 for the launch window; seconds for each leg's time of flight. */
export interface SearchBounds {
  launch: [number, number];
  tof: [number, number][];
}

export interface SearchOptions {
  seed?: number;
  /** Objective evaluations. */
  budget?: number;
  /** Default 'vinf+dv' (launch v∞ counted). */
  objective?: "vinf+dv" | "dv";
  /** km²/s², km/s, s. */
  caps?: { c3?: number; arrivalVinf?: number; totalTof?: number };
  onProgress?: (p: { evaluations: number; best: number }) => void;
  signal?: AbortSignal;
}

export interface SearchCandidate {
  /** TDB s past J2000, one per node. */
  epochs: number[];
  /** Objective value incl. penalties, km/s. */
  value: number;
  result: TourResult;
}

export interface PorkchopGrid {
  from: BodyId;
  to: BodyId;
  /** TDB s past J2000. */
  departures: number[];
  /** One of the two: arrival epochs (TDB s) or times of flight (s). */
  arrivals?: number[];
  tofs?: number[];
  maxRevs?: number;
  prograde?: boolean;
  arrival?: TourSpec["arrival"];
  bodies?: TourSpec["bodies"];
}

/** Row-major [departure][arrival]; best over revs; NaN where there is no solution. */
export interface PorkchopResult {
  /** Launch C3, km²/s². */
  c3: Float64Array;
  /** Departure v∞, km/s. */
  vinfDep: Float64Array;
  /** Arrival v∞, km/s. */
  vinfArr: Float64Array;
  /** Departure v∞ + arrival Δv for the arrival kind, km/s. */
  dv: Float64Array;
}

// ---- sampled trajectory (lib/astro/sample.ts) ----

/**
 * A tour's heliocentric arcs sampled for display; built by `sampleTour` (lib/astro/sample.ts).
 * Leg i occupies samples legStarts[i] … legStarts[i+1] − 1 (the last leg runs to the end).
 */
export interface TourSamples {
  /** Sample epochs, TDB s past J2000, non-decreasing (a leg boundary epoch appears twice). */
  epochs: Float64Array;
  /** Positions, km, heliocentric ecliptic J2000, xyz interleaved (length 3·epochs.length). */
  positions: Float64Array;
  /** Index into `epochs` of each leg's first sample. */
  legStarts: number[];
  /** Velocities, km/s, heliocentric ecliptic J2000, xyz interleaved (for Hermite interpolation). */
  velocities?: Float64Array;
  /** Per leg: false when the leg had no Lambert solution (its samples are not a trajectory). */
  legOk?: boolean[];
}
