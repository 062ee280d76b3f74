/**
 * Heliocentric ephemerides of the planets and of a team's small bodies.
 *
 * Every ephemeris returns position (km) and velocity (km/s), heliocentric, mean ecliptic and
 * equinox of J2000 (EclJ2000), for an epoch `t` in TDB seconds past J2000.0 (JD 2451545.0 TDB).
 *
 * - `vsopEphemeris()`: astronomy-engine (truncated VSOP87 series; Pluto by its own integration).
 *   The only astronomy-engine adapter of lib/astro (with frames.ts).
 * - `meanElementsEphemeris()`: the JPL SSD table of approximate planetary elements (1800–2050).
 * - `cachedEphemeris(base)`: lazily built cubic-Hermite tables of any base ephemeris.
 * - `ephemerisFromSpec(spec)`: builds one of the above from a structured-cloneable spec.
 *
 * Custom small bodies (`custom:<slug>`) are served by both base ephemerides identically, as
 * two-body conics about the Sun (MU_SUN) from their osculating elements at their epoch.
 */
import { AstroTime, Body, HelioState } from "astronomy-engine";
import { AU_KM, DAY_S, MU_SUN, PLANET_IDS } from "./constants";
import { COS_OBLIQUITY, SIN_OBLIQUITY } from "./frames";
import type {
  BodyId,
  CustomBodySpec,
  Ephemeris,
  EphemerisSpec,
  FastEphemeris,
  OrbitalElements,
  PlanetId,
  Vec3,
} from "./types";

export type { Ephemeris, FastEphemeris, EphemerisSpec } from "./types";

const TWO_PI = 2 * Math.PI;
const DEG = Math.PI / 180;
/** AU/day → km/s. */
const AU_PER_DAY_KM_S = AU_KM / DAY_S;
/** Seconds per Julian century (36525 d × 86400 s). */
const JULIAN_CENTURY_S = 36525 * DAY_S;

const PLANETS = PLANET_IDS;

function isPlanet(body: unknown): body is PlanetId {
  return typeof body === "string" && (PLANETS as readonly string[]).includes(body);
}

// ---------------------------------------------------------------------------------------------
// validation helpers

function checkEpoch(t: unknown, name = "t"): asserts t is number {
  if (typeof t !== "number" || !Number.isFinite(t)) {
    throw new RangeError(`${name} must be a finite number of TDB seconds past J2000 (got ${String(t)})`);
  }
}

function checkOut(out: unknown, offset: unknown): void {
  if (!(out instanceof Float64Array)) throw new RangeError("out must be a Float64Array");
  if (typeof offset !== "number" || !Number.isInteger(offset) || offset < 0) {
    throw new RangeError(`offset must be a non-negative integer (got ${String(offset)})`);
  }
  if (offset + 6 > out.length) {
    throw new RangeError(`out is too short: needs ${offset + 6} elements from offset ${offset}, has ${out.length}`);
  }
}

function unknownBody(body: unknown): RangeError {
  return new RangeError(
    `body: unknown body '${String(body)}' (expected mercury … pluto or a registered custom:<slug>)`,
  );
}

function toState(buf: Float64Array): { r: Vec3; v: Vec3 } {
  return {
    r: [buf[0] as number, buf[1] as number, buf[2] as number],
    v: [buf[3] as number, buf[4] as number, buf[5] as number],
  };
}

// ---------------------------------------------------------------------------------------------
// Kepler's equation (self-contained; kepler.ts offers the general propagator)

/** Solves E − e·sin E = M for an ellipse (0 ≤ e < 1), M in rad (any value), returns E in rad. */
function solveKeplerEllipse(M: number, e: number): number {
  // reduce M to [−π, π]
  let m = M - TWO_PI * Math.floor((M + Math.PI) / TWO_PI);
  if (m > Math.PI) m -= TWO_PI;
  let E = e < 0.8 ? m + e * Math.sin(m) : m >= 0 ? Math.PI : -Math.PI;
  for (let k = 0; k < 60; k++) {
    const f = E - e * Math.sin(E) - m;
    const d = f / (1 - e * Math.cos(E));
    E -= d;
    if (Math.abs(d) < 1e-15 * (1 + Math.abs(E))) break;
  }
  return E + (M - m);
}

/** Solves e·sinh H − H = M for a hyperbola (e > 1), returns H. */
function solveKeplerHyperbola(M: number, e: number): number {
  let H = Math.sign(M) * Math.log((2 * Math.abs(M)) / e + 1.8);
  for (let k = 0; k < 100; k++) {
    const f = e * Math.sinh(H) - H - M;
    const d = f / (e * Math.cosh(H) - 1);
    H -= d;
    if (Math.abs(d) < 1e-15 * (1 + Math.abs(H))) break;
  }
  return H;
}

/** Perifocal → EclJ2000 direction cosines of P̂ (toward periapsis) and Q̂, from Ω, i, ω (rad). */
function perifocalAxes(raan: number, inc: number, argp: number, out: Float64Array): void {
  const cO = Math.cos(raan);
  const sO = Math.sin(raan);
  const ci = Math.cos(inc);
  const si = Math.sin(inc);
  const cw = Math.cos(argp);
  const sw = Math.sin(argp);
  out[0] = cw * cO - sw * sO * ci;
  out[1] = cw * sO + sw * cO * ci;
  out[2] = sw * si;
  out[3] = -sw * cO - cw * sO * ci;
  out[4] = -sw * sO + cw * cO * ci;
  out[5] = cw * si;
}

/** Two-body conic about the Sun built from osculating elements (ellipse or hyperbola). */
class CustomOrbit {
  private readonly a: number;
  private readonly e: number;
  private readonly n: number;
  private readonly M0: number;
  private readonly epoch: number;
  private readonly axes = new Float64Array(6);

  constructor(spec: CustomBodySpec, index: number) {
    const where = `customBodies[${index}]`;
    if (spec == null || typeof spec !== "object") throw new RangeError(`${where} must be an object`);
    if (typeof spec.id !== "string" || !/^custom:.+/.test(spec.id)) {
      throw new RangeError(`${where}.id must be 'custom:<slug>' (got ${String(spec.id)})`);
    }
    checkEpoch(spec.epoch, `${where}.epoch`);
    if (typeof spec.mu !== "number" || !Number.isFinite(spec.mu) || spec.mu < 0) {
      throw new RangeError(`${where}.mu must be a finite GM ≥ 0 km³/s² (got ${String(spec.mu)})`);
    }
    const el = spec.elements;
    if (el == null || typeof el !== "object") throw new RangeError(`${where}.elements must be an object`);
    for (const k of ["a", "e", "i", "raan", "argp", "nu"] as const) {
      const x = el[k];
      if (typeof x !== "number" || !Number.isFinite(x)) {
        throw new RangeError(`${where}.elements.${k} must be a finite number (got ${String(x)})`);
      }
    }
    const { a, e, i, raan, argp, nu } = el;
    if (e < 0) throw new RangeError(`${where}.elements.e must be ≥ 0 (got ${e})`);
    if (Math.abs(e - 1) < 1e-9) {
      throw new RangeError(`${where}.elements.e = ${e}: parabolic orbits are not supported by the ephemeris`);
    }
    if (e < 1 && !(a > 0)) throw new RangeError(`${where}.elements.a must be > 0 km for an ellipse (got ${a})`);
    if (e > 1 && !(a < 0)) throw new RangeError(`${where}.elements.a must be < 0 km for a hyperbola (got ${a})`);
    if (i < 0 || i > Math.PI) throw new RangeError(`${where}.elements.i must be in [0, π] rad (got ${i})`);
    this.a = a;
    this.e = e;
    this.epoch = spec.epoch;
    this.n = Math.sqrt(MU_SUN / Math.abs(a * a * a));
    if (e < 1) {
      const E = 2 * Math.atan2(Math.sqrt(1 - e) * Math.sin(nu / 2), Math.sqrt(1 + e) * Math.cos(nu / 2));
      this.M0 = E - e * Math.sin(E);
    } else {
      const c = Math.cos(nu);
      if (!(1 + e * c > 0)) {
        throw new RangeError(`${where}.elements.nu = ${nu} rad lies beyond the asymptotes of the hyperbola (e = ${e})`);
      }
      const H = 2 * Math.atanh(Math.sqrt((e - 1) / (e + 1)) * Math.tan(nu / 2));
      this.M0 = e * Math.sinh(H) - H;
    }
    perifocalAxes(raan, i, argp, this.axes);
  }

  stateInto(t: number, out: Float64Array, o: number): void {
    const { a, e, axes } = this;
    const M = this.M0 + this.n * (t - this.epoch);
    let x: number, y: number, vx: number, vy: number;
    if (e < 1) {
      const E = solveKeplerEllipse(M, e);
      const cE = Math.cos(E);
      const sE = Math.sin(E);
      const b = Math.sqrt(1 - e * e);
      const r = a * (1 - e * cE);
      const k = Math.sqrt(MU_SUN * a) / r;
      x = a * (cE - e);
      y = a * b * sE;
      vx = -k * sE;
      vy = k * b * cE;
    } else {
      const H = solveKeplerHyperbola(M, e);
      const cH = Math.cosh(H);
      const sH = Math.sinh(H);
      const aa = -a;
      const b = Math.sqrt(e * e - 1);
      const r = aa * (e * cH - 1);
      const k = Math.sqrt(MU_SUN * aa) / r;
      x = aa * (e - cH);
      y = aa * b * sH;
      vx = -k * sH;
      vy = k * b * cH;
    }
    writeRotated(axes, x, y, vx, vy, out, o);
  }
}

function writeRotated(
  ax: Float64Array,
  x: number,
  y: number,
  vx: number,
  vy: number,
  out: Float64Array,
  o: number,
): void {
  const px = ax[0] as number;
  const py = ax[1] as number;
  const pz = ax[2] as number;
  const qx = ax[3] as number;
  const qy = ax[4] as number;
  const qz = ax[5] as number;
  out[o] = px * x + qx * y;
  out[o + 1] = py * x + qy * y;
  out[o + 2] = pz * x + qz * y;
  out[o + 3] = px * vx + qx * vy;
  out[o + 4] = py * vx + qy * vy;
  out[o + 5] = pz * vx + qz * vy;
}

function buildCustom(customBodies: unknown): Map<string, CustomOrbit> {
  const map = new Map<string, CustomOrbit>();
  if (customBodies === undefined) return map;
  if (!Array.isArray(customBodies)) throw new RangeError("customBodies must be an array");
  customBodies.forEach((spec: CustomBodySpec, i) => {
    const orbit = new CustomOrbit(spec, i);
    if (map.has(spec.id)) throw new RangeError(`customBodies[${i}].id '${spec.id}' is listed twice`);
    map.set(spec.id, orbit);
  });
  return map;
}

/** Options shared by the base ephemerides. */
export interface EphemerisOptions {
  /** A team's small bodies, served as two-body conics about the Sun (MU_SUN). */
  customBodies?: CustomBodySpec[];
}

function checkOptions(opts: unknown): EphemerisOptions {
  if (opts === undefined || opts === null) return {};
  if (typeof opts !== "object") throw new RangeError("opts must be an object");
  return opts as EphemerisOptions;
}

// ---------------------------------------------------------------------------------------------
// astronomy-engine adapter

const AE_BODY: Record<PlanetId, Body> = {
  mercury: Body.Mercury,
  venus: Body.Venus,
  earth: Body.Earth, // the planet, not the Earth–Moon barycentre
  mars: Body.Mars,
  jupiter: Body.Jupiter,
  saturn: Body.Saturn,
  uranus: Body.Uranus,
  neptune: Body.Neptune,
  pluto: Body.Pluto,
};

/**
 * The planet ephemeris of astronomy-engine (truncated VSOP87; Pluto by its built-in integration).
 * `state(body, t)`: heliocentric EclJ2000 position km and velocity km/s; t = TDB seconds past J2000,
 * passed to astronomy-engine as Terrestrial Time (TDB ≈ TT within 2 ms). `'earth'` is the planet
 * (Body.Earth), not the Earth–Moon barycentre. States come from astronomy-engine in EQJ, AU and
 * AU/day and are rotated with Rotation_EQJ_ECL (ε = 84381.406″), then scaled with AU_KM and DAY_S.
 * Valid range: any finite epoch; the series are accurate to about an arcsecond over several
 * millennia around J2000. Custom bodies: two-body conics about MU_SUN from their elements.
 * Source: astronomy-engine 2.1 (Cosinekitty), VSOP87 (Bretagnon & Francou 1988).
 * @throws RangeError for a bad custom body spec; `state` throws for an unknown body or non-finite t.
 */
export function vsopEphemeris(opts?: EphemerisOptions): FastEphemeris {
  const custom = buildCustom(checkOptions(opts).customBodies);
  const k = AU_PER_DAY_KM_S;
  const c = COS_OBLIQUITY;
  const s = SIN_OBLIQUITY;
  const write = (body: BodyId, t: number, out: Float64Array, o: number): void => {
    checkEpoch(t);
    if (isPlanet(body)) {
      const st = HelioState(AE_BODY[body], AstroTime.FromTerrestrialTime(t / DAY_S));
      out[o] = st.x * AU_KM;
      out[o + 1] = (c * st.y + s * st.z) * AU_KM;
      out[o + 2] = (-s * st.y + c * st.z) * AU_KM;
      out[o + 3] = st.vx * k;
      out[o + 4] = (c * st.vy + s * st.vz) * k;
      out[o + 5] = (-s * st.vy + c * st.vz) * k;
      return;
    }
    const orbit = typeof body === "string" ? custom.get(body) : undefined;
    if (orbit === undefined) throw unknownBody(body);
    orbit.stateInto(t, out, o);
  };
  return makeEphemeris(write, custom);
}

// ---------------------------------------------------------------------------------------------
// JPL approximate elements

/**
 * One row of the JPL table: [a AU, e, I deg, L deg, ϖ deg, Ω deg] at J2000 and their rates per
 * Julian century (TDB).
 */
export interface ApproxElementsRow {
  readonly value: readonly [number, number, number, number, number, number];
  readonly rate: readonly [number, number, number, number, number, number];
}

/**
 * JPL SSD, "Keplerian Elements for Approximate Positions of the Major Planets" (E. M. Standish),
 * Table 1, valid 1800 AD – 2050 AD; mean ecliptic and equinox of J2000; typed in from memory and
 * checked against the table's own J2000 positions of Mars and Jupiter (CHECKS.md).
 * Columns: a (AU), e, I (deg), L (deg), ϖ long. of perihelion (deg), Ω long. of asc. node (deg);
 * `rate` per Julian century. `earth` is the table's Earth–Moon barycentre row.
 */
export const JPL_APPROX_ELEMENTS_1800_2050: Readonly<Record<PlanetId, ApproxElementsRow>> = {
  mercury: {
    value: [0.38709927, 0.20563593, 7.00497902, 252.2503235, 77.45779628, 48.33076593],
    rate: [0.00000037, 0.00001906, -0.00594749, 149472.67411175, 0.16047689, -0.12534081],
  },
  venus: {
    value: [0.72333566, 0.00677672, 3.39467605, 181.9790995, 131.60246718, 76.67984255],
    rate: [0.0000039, -0.00004107, -0.0007889, 58517.81538729, 0.00268329, -0.27769418],
  },
  earth: {
    // EM Bary row
    value: [1.00000261, 0.01671123, -0.00001531, 100.46457166, 102.93768193, 0.0],
    rate: [0.00000562, -0.00004392, -0.01294668, 35999.37244981, 0.32327364, 0.0],
  },
  mars: {
    value: [1.52371034, 0.0933941, 1.84969142, -4.55343205, -23.94362959, 49.55953891],
    rate: [0.00001847, 0.00007882, -0.00813131, 19140.30268499, 0.44441088, -0.29257343],
  },
  jupiter: {
    value: [5.202887, 0.04838624, 1.30439695, 34.39644051, 14.72847983, 100.47390909],
    rate: [-0.00011607, -0.00013253, -0.00183714, 3034.74612775, 0.21252668, 0.20469106],
  },
  saturn: {
    value: [9.53667594, 0.05386179, 2.48599187, 49.95424423, 92.59887831, 113.66242448],
    rate: [-0.0012506, -0.00050991, 0.00193609, 1222.49362201, -0.41897216, -0.28867794],
  },
  uranus: {
    value: [19.18916464, 0.04725744, 0.77263783, 313.23810451, 170.9542763, 74.01692503],
    rate: [-0.00196176, -0.00004397, -0.00242939, 428.48202785, 0.40805281, 0.04240589],
  },
  neptune: {
    value: [30.06992276, 0.00859048, 1.77004347, -55.12002969, 44.96476227, 131.78422574],
    rate: [0.00026291, 0.00005105, 0.00035372, 218.45945325, -0.32241464, -0.00508664],
  },
  pluto: {
    value: [39.48211675, 0.2488273, 17.14001206, 238.92903833, 224.06891629, 110.30393684],
    rate: [-0.00031596, 0.0000517, 0.00004818, 145.20780515, -0.04062942, -0.01183482],
  },
};

/** Planet elements at T (Julian centuries from J2000 TDB): a km, e, I, Ω, ω, M rad. */
interface PlanetElementsNow {
  a: number;
  e: number;
  inc: number;
  raan: number;
  argp: number;
  M: number;
}

function planetElementsAt(body: PlanetId, t: number): PlanetElementsNow {
  const row = JPL_APPROX_ELEMENTS_1800_2050[body];
  const T = t / JULIAN_CENTURY_S;
  const v = row.value;
  const r = row.rate;
  const a = (v[0] + r[0] * T) * AU_KM;
  const e = v[1] + r[1] * T;
  const inc = (v[2] + r[2] * T) * DEG;
  const L = v[3] + r[3] * T;
  const varpi = v[4] + r[4] * T;
  const raan = (v[5] + r[5] * T) * DEG;
  return { a, e, inc, raan, argp: varpi * DEG - raan, M: (L - varpi) * DEG };
}

/**
 * Osculating-style elements of a planet from the JPL approximate table at epoch t
 * (a km, e, i rad, raan rad, argp rad, nu rad true anomaly), EclJ2000; t = TDB s past J2000.
 * Valid 1800–2050 (computed outside, accuracy not guaranteed). `earth` is the EM barycentre.
 * i is returned in [0, π] (a negative table I is folded into Ω + π, ω + π).
 * Useful to draw planet orbits. Source: JPL SSD approximate elements, Table 1 (from memory).
 * @throws RangeError for a non-planet id or non-finite t.
 */
export function planetMeanElements(body: PlanetId, t: number): OrbitalElements {
  if (!isPlanet(body)) throw new RangeError(`body: '${String(body)}' is not a planet id (mercury … pluto)`);
  checkEpoch(t);
  const el = planetElementsAt(body, t);
  const E = solveKeplerEllipse(el.M, el.e);
  const nu = 2 * Math.atan2(Math.sqrt(1 + el.e) * Math.sin(E / 2), Math.sqrt(1 - el.e) * Math.cos(E / 2));
  const wrap = (x: number) => x - TWO_PI * Math.floor(x / TWO_PI);
  // The EM-barycentre row has I < 0 near J2000: (−I, Ω, ω) is the same orbit as (I, Ω + π, ω + π).
  if (el.inc < 0) {
    return { a: el.a, e: el.e, i: -el.inc, raan: wrap(el.raan + Math.PI), argp: wrap(el.argp + Math.PI), nu: wrap(nu) };
  }
  return { a: el.a, e: el.e, i: el.inc, raan: wrap(el.raan), argp: wrap(el.argp), nu: wrap(nu) };
}

/**
 * The JPL SSD approximate-elements ephemeris of the planets (Table 1, 1800–2050).
 * `state(body, t)`: heliocentric EclJ2000 position km and velocity km/s, t = TDB s past J2000.
 * Positions from the table's elements at t (ω = ϖ − Ω, M = L − ϖ, Kepler's equation solved to
 * 1e-15); velocities are the two-body velocities of the osculating ellipse with MU_SUN,
 * v = √(μa)/r·(−sin E, √(1−e²)·cos E) in the perifocal frame — NOT the time derivative of the
 * positions (the table's rates make them differ slightly). `'earth'` is the table's Earth–Moon
 * barycentre. Outside 1800–2050 states are still computed but their accuracy is not guaranteed.
 * Stated table errors 1800–2050 (RA″/Dec″/r 1000 km): e.g. Mars 40/2/25, Jupiter 400/10/600.
 * Custom bodies: two-body conics about MU_SUN from their elements (identical to vsopEphemeris).
 * Source: JPL SSD "Keplerian Elements for Approximate Positions of the Major Planets", Table 1.
 * @throws RangeError for a bad custom body spec; `state` throws for an unknown body or non-finite t.
 */
export function meanElementsEphemeris(opts?: EphemerisOptions): FastEphemeris {
  const custom = buildCustom(checkOptions(opts).customBodies);
  const axes = new Float64Array(6);
  const write = (body: BodyId, t: number, out: Float64Array, o: number): void => {
    checkEpoch(t);
    if (isPlanet(body)) {
      const el = planetElementsAt(body, t);
      const { a, e } = el;
      const E = solveKeplerEllipse(el.M, e);
      const cE = Math.cos(E);
      const sE = Math.sin(E);
      const b = Math.sqrt(1 - e * e);
      const r = a * (1 - e * cE);
      const k = Math.sqrt(MU_SUN * a) / r;
      perifocalAxes(el.raan, el.inc, el.argp, axes);
      writeRotated(axes, a * (cE - e), a * b * sE, -k * sE, k * b * cE, out, o);
      return;
    }
    const orbit = typeof body === "string" ? custom.get(body) : undefined;
    if (orbit === undefined) throw unknownBody(body);
    orbit.stateInto(t, out, o);
  };
  return makeEphemeris(write, custom);
}

/** Marks our own ephemerides so that the cache can tell which custom bodies are cheap to serve. */
const CUSTOM_IDS = Symbol("gybe.customBodyIds");

function makeEphemeris(
  write: (body: BodyId, t: number, out: Float64Array, o: number) => void,
  custom: Map<string, CustomOrbit>,
): FastEphemeris {
  const buf = new Float64Array(6);
  const eph: FastEphemeris & { [CUSTOM_IDS]?: ReadonlySet<string> } = {
    state(body: BodyId, t: number) {
      write(body, t, buf, 0);
      return toState(buf);
    },
    stateInto(body: BodyId, t: number, out: Float64Array, offset = 0) {
      checkOut(out, offset);
      write(body, t, out, offset);
    },
  };
  eph[CUSTOM_IDS] = new Set(custom.keys());
  return eph;
}

// ---------------------------------------------------------------------------------------------
// fast wrapper

/**
 * Returns `eph` itself when it already has `stateInto`, otherwise a wrapper whose `stateInto`
 * copies `eph.state(body, t)` into `out` (km, km/s, the frame and time scale of `eph`).
 * Source: none needed (adapter).
 * @throws RangeError if `eph` has no `state` function; the wrapper's stateInto throws for a bad `out`.
 */
export function asFast(eph: Ephemeris): FastEphemeris {
  if (eph == null || typeof (eph as { state?: unknown }).state !== "function") {
    throw new RangeError("eph must be an Ephemeris with a state(body, t) function");
  }
  if (typeof (eph as Partial<FastEphemeris>).stateInto === "function") return eph as FastEphemeris;
  const wrapped: FastEphemeris & { [CUSTOM_IDS]?: ReadonlySet<string> } = {
    state: (body, t) => eph.state(body, t),
    stateInto(body, t, out, offset = 0) {
      checkOut(out, offset);
      const s = eph.state(body, t);
      out[offset] = s.r[0];
      out[offset + 1] = s.r[1];
      out[offset + 2] = s.r[2];
      out[offset + 3] = s.v[0];
      out[offset + 4] = s.v[1];
      out[offset + 5] = s.v[2];
    },
  };
  const ids = (eph as { [CUSTOM_IDS]?: ReadonlySet<string> })[CUSTOM_IDS];
  if (ids) wrapped[CUSTOM_IDS] = ids;
  return wrapped;
}

// ---------------------------------------------------------------------------------------------
// Hermite cache

/** Nodes per lazily allocated block of a body table. */
const BLOCK_NODES = 64;

/**
 * Default cache steps per body, seconds: Mercury 2 h; Venus, Earth, Mars 12 h; Jupiter and beyond 2 d.
 * Source: CHECKS.md (cubic Hermite under 0.05 km of astronomy-engine at these steps; measured in tests).
 */
export const DEFAULT_CACHE_STEP_S: Readonly<Record<PlanetId, number>> = {
  mercury: 2 * 3600,
  venus: 12 * 3600,
  earth: 12 * 3600,
  mars: 12 * 3600,
  jupiter: 2 * DAY_S,
  saturn: 2 * DAY_S,
  uranus: 2 * DAY_S,
  neptune: 2 * DAY_S,
  pluto: 2 * DAY_S,
};

/** Fallback step for a custom body of a foreign base ephemeris, s (1 h: safe down to ~0.1 AU perihelia). */
const FOREIGN_CUSTOM_STEP_S = 3600;

/**
 * astronomy-engine integrates Pluto and serves it by blending two constant-acceleration
 * extrapolations over fixed 146-day intervals starting at TT −730000 d (a multiple of 146 d):
 * within each interval its position is a cubic (plus the smooth solar offset) and its velocity a
 * quadratic, but the position is only C0 at the interval ends and the velocity is not the
 * derivative of the position (≈ 2e-4 km/s apart). A Hermite table would be ~4 km off there, so
 * Pluto is tabulated with nodes aligned on these intervals and interpolated with 4-point
 * Lagrange cubics kept inside one interval, positions and velocities separately.
 * Source: astronomy-engine 2.1 source (CalcPluto, PLUTO_DT = 146 d).
 */
const PLUTO_INTERVAL_S = 146 * DAY_S;

class BodyTable {
  readonly h: number;
  readonly invH: number;
  /** Nodes per block (block b holds nodes b·n … b·n + n, the last shared with the next block). */
  readonly blockNodes: number;
  /** 4-point Lagrange inside blocks (Pluto) instead of cubic Hermite. */
  readonly lagrange: boolean;
  readonly blocks = new Map<number, Float64Array>();
  lastIndex = Number.NaN;
  lastBlock: Float64Array = new Float64Array(0);
  filled = 0;

  constructor(
    readonly body: BodyId,
    step: number,
  ) {
    if (body === "pluto") {
      const n = Math.max(3, Math.round(PLUTO_INTERVAL_S / step));
      this.h = PLUTO_INTERVAL_S / n;
      this.blockNodes = n;
      this.lagrange = true;
    } else {
      this.h = step;
      this.blockNodes = BLOCK_NODES;
      this.lagrange = false;
    }
    this.invH = 1 / this.h;
  }
}

/** Options of `cachedEphemeris`. */
export interface CachedEphemerisOptions {
  /** Node spacing in seconds for every body (overrides the per-body defaults); > 0, finite. */
  step?: number;
}

/** Memory and fill statistics of a cached ephemeris (per tabulated body). */
export interface CacheInfo {
  body: BodyId;
  /** Node spacing, s. */
  step: number;
  /** Allocated blocks (each of 65 nodes × 6 float64; Pluto: one block per 146-day interval). */
  blocks: number;
  /** Nodes computed from the base ephemeris. */
  nodes: number;
}

/** A cached ephemeris: a FastEphemeris plus `cacheInfo()` for diagnostics. */
export interface CachedEphemeris extends FastEphemeris {
  cacheInfo(): CacheInfo[];
}

/**
 * Wraps `base` with per-body cubic-Hermite tables of its states (positions and velocities at
 * nodes t_k = k·step), built lazily for any epoch: nodes are computed on first use, in blocks of
 * 64 allocated on demand (a Map keyed by block index), so a decade-long search only pays for the
 * epochs it touches. Same units, frame and time scale as `base` (km, km/s, EclJ2000, TDB s).
 * Default step per body: Mercury 2 h; Venus, Earth, Mars 12 h; Jupiter … Pluto 2 d; `opts.step`
 * (s) overrides for all tabulated bodies. Error against astronomy-engine ≤ 0.05 km and 1e-6 km/s
 * at the default steps (measured per body in tests/unit/astro/ephemeris.test.ts).
 * Custom bodies of vsopEphemeris/meanElementsEphemeris are NOT tabulated: their two-body
 * conics are exact and about as cheap as an interpolation, and a small-perihelion orbit would need
 * a tiny step; they are passed straight to `base`. Custom bodies of a foreign base are tabulated
 * with a 1 h step unless `opts.step` is given.
 * The base must be smooth (velocities the derivative of positions): do not cache
 * meanElementsEphemeris (its velocities are two-body, not the derivative of its positions).
 * Memory: 48 bytes per node (Mercury over a decade ≈ 2 MB); tables are never evicted.
 * Source: cubic Hermite interpolation (e.g. Burden & Faires, Numerical Analysis, §3.4).
 * @throws RangeError for a bad base or step; `state` throws for an unknown body or non-finite t.
 */
export function cachedEphemeris(base: Ephemeris, opts?: CachedEphemerisOptions): CachedEphemeris {
  const fast = asFast(base);
  const o = checkOptions(opts) as CachedEphemerisOptions;
  const step = o.step;
  if (step !== undefined && (typeof step !== "number" || !Number.isFinite(step) || !(step > 0))) {
    throw new RangeError(`opts.step must be a finite number of seconds > 0 (got ${String(step)})`);
  }
  const ownCustom = (fast as { [CUSTOM_IDS]?: ReadonlySet<string> })[CUSTOM_IDS];
  const tables = new Map<string, BodyTable>();
  for (const p of PLANETS) tables.set(p, new BodyTable(p, step ?? DEFAULT_CACHE_STEP_S[p]));

  const tableFor = (body: BodyId): BodyTable | undefined => {
    if (typeof body !== "string") throw unknownBody(body);
    if (ownCustom?.has(body)) return undefined; // pass-through
    if (!body.startsWith("custom:")) throw unknownBody(body);
    if (ownCustom) throw unknownBody(body); // our own base does not know it
    // foreign base: probe it once (throws if it does not know the body), then tabulate
    const probe = new Float64Array(6);
    fast.stateInto(body, 0, probe, 0);
    const tab = new BodyTable(body, step ?? FOREIGN_CUSTOM_STEP_S);
    tables.set(body, tab);
    return tab;
  };

  const blockOf = (tab: BodyTable, b: number): Float64Array => {
    let blk = tab.blocks.get(b);
    if (blk === undefined) {
      blk = new Float64Array((tab.blockNodes + 1) * 6).fill(Number.NaN);
      tab.blocks.set(b, blk);
    }
    tab.lastIndex = b;
    tab.lastBlock = blk;
    return blk;
  };

  const node = (tab: BodyTable, blk: Float64Array, b: number, i: number): void => {
    const j = i * 6;
    if (blk[j] !== blk[j]) {
      fast.stateInto(tab.body, (b * tab.blockNodes + i) * tab.h, blk, j);
      tab.filled++;
    }
  };

  const interp = (tab: BodyTable, t: number, out: Float64Array, o: number): void => {
    const h = tab.h;
    const n = tab.blockNodes;
    const k = Math.floor(t * tab.invH);
    const b = Math.floor(k / n);
    const blk = b === tab.lastIndex ? tab.lastBlock : blockOf(tab, b);
    const i = k - b * n;
    if (tab.lagrange) {
      // 4-point Lagrange on nodes j … j+3 of this block, x = (t − t_j)/h ∈ [0, 3]
      const j = i < 1 ? 0 : i > n - 3 ? n - 3 : i - 1;
      for (let q = 0; q < 4; q++) node(tab, blk, b, j + q);
      const x = (t - (b * n + j) * h) * tab.invH;
      const x1 = x - 1;
      const x2 = x - 2;
      const x3 = x - 3;
      const w0 = (-x1 * x2 * x3) / 6;
      const w1 = (x * x2 * x3) / 2;
      const w2 = (-x * x1 * x3) / 2;
      const w3 = (x * x1 * x2) / 6;
      const j0 = j * 6;
      for (let c = 0; c < 6; c++) {
        out[o + c] =
          w0 * (blk[j0 + c] as number) +
          w1 * (blk[j0 + 6 + c] as number) +
          w2 * (blk[j0 + 12 + c] as number) +
          w3 * (blk[j0 + 18 + c] as number);
      }
      return;
    }
    const i0 = i * 6;
    const i1 = i0 + 6;
    if (blk[i0] !== blk[i0]) node(tab, blk, b, i);
    if (blk[i1] !== blk[i1]) node(tab, blk, b, i + 1);
    const s = (t - k * h) * tab.invH;
    const s2 = s * s;
    const s3 = s2 * s;
    // Hermite basis (h10, h11 scaled by h) and their time derivatives
    const h00 = 2 * s3 - 3 * s2 + 1;
    const h10 = (s3 - 2 * s2 + s) * h;
    const h01 = -2 * s3 + 3 * s2;
    const h11 = (s3 - s2) * h;
    const d00 = (6 * s2 - 6 * s) * tab.invH;
    const d10 = 3 * s2 - 4 * s + 1;
    const d01 = -d00;
    const d11 = 3 * s2 - 2 * s;
    for (let j = 0; j < 3; j++) {
      const p0 = blk[i0 + j] as number;
      const v0 = blk[i0 + 3 + j] as number;
      const p1 = blk[i1 + j] as number;
      const v1 = blk[i1 + 3 + j] as number;
      out[o + j] = h00 * p0 + h10 * v0 + h01 * p1 + h11 * v1;
      out[o + 3 + j] = d00 * p0 + d10 * v0 + d01 * p1 + d11 * v1;
    }
  };

  const write = (body: BodyId, t: number, out: Float64Array, o: number): void => {
    if (typeof t !== "number" || !Number.isFinite(t)) checkEpoch(t);
    const tab = tables.get(body) ?? tableFor(body);
    if (tab === undefined) fast.stateInto(body, t, out, o);
    else interp(tab, t, out, o);
  };

  const buf = new Float64Array(6);
  const eph: CachedEphemeris & { [CUSTOM_IDS]?: ReadonlySet<string> } = {
    state(body: BodyId, t: number) {
      write(body, t, buf, 0);
      return toState(buf);
    },
    stateInto(body: BodyId, t: number, out: Float64Array, offset = 0) {
      checkOut(out, offset);
      write(body, t, out, offset);
    },
    cacheInfo() {
      return [...tables.values()]
        .filter((tab) => tab.blocks.size > 0)
        .map((tab) => ({ body: tab.body, step: tab.h, blocks: tab.blocks.size, nodes: tab.filled }));
    },
  };
  if (ownCustom) eph[CUSTOM_IDS] = ownCustom;
  return eph;
}

// ---------------------------------------------------------------------------------------------
// from a spec

/**
 * Builds an ephemeris from a structured-cloneable spec (what crosses into a Web Worker).
 * `kind: 'vsop'` → vsopEphemeris, wrapped in cachedEphemeris when `cached` is true;
 * `kind: 'mean'` → meanElementsEphemeris, always direct: `cached` is ignored for it because its
 * velocities are two-body rather than the derivative of its positions (a Hermite table would be
 * off by tens of km) and it is already cheap. Units km, km/s, EclJ2000, t TDB s past J2000.
 * Source: DESIGN.md contract (adapter).
 * @throws RangeError for a missing/unknown kind or bad custom bodies.
 */
export function ephemerisFromSpec(spec: EphemerisSpec): FastEphemeris {
  if (spec == null || typeof spec !== "object") throw new RangeError("spec must be an EphemerisSpec object");
  if (spec.cached !== undefined && typeof spec.cached !== "boolean") {
    throw new RangeError(`spec.cached must be a boolean (got ${String(spec.cached)})`);
  }
  const opts: EphemerisOptions = spec.customBodies === undefined ? {} : { customBodies: spec.customBodies };
  if (spec.kind === "vsop") {
    const base = vsopEphemeris(opts);
    return spec.cached ? cachedEphemeris(base) : base;
  }
  if (spec.kind === "mean") return meanElementsEphemeris(opts);
  throw new RangeError(`spec.kind must be 'vsop' or 'mean' (got ${String((spec as { kind?: unknown }).kind)})`);
}
