/**
 * Window scans and tour search (pure TypeScript: runs in Web Workers and in Node).
 *
 * - `porkchop(grid, ephemeris)`: one leg on a departure × arrival (or departure × time-of-flight)
 *   grid; per cell the launch C3 (km²/s²), departure and arrival v∞ (km/s) and the departure
 *   v∞ + arrival Δv of the chosen arrival kind (km/s), best (least Δv) over 0 … maxRevs
 *   revolutions and both multi-revolution branches. Row-major [departure][arrival]; NaN where
 *   there is no solution (time of flight ≤ 0, collinear geometry, no N-rev solution).
 * - `optimizeTour(spec, bounds, ephemeris, options)`: global search over the launch epoch and one
 *   time of flight per leg (decision vector x = [t0 TDB s past J2000, T1 … Tn s]); seeded and
 *   reproducible (mulberry32 PRNG, no clock in the arithmetic). Method:
 *     1. a pruned per-leg grid ("beam"): coarse grids of t0 × T1, then T2, … each extending the
 *        best partial chains (launch v∞ + flyby Δv so far); grids of legs that return to the
 *        same planet include near-resonant flight times k·P (k = 1 … 6, P the planet's period),
 *        the narrow basins plain random restarts seldom land in;
 *     2. differential evolution (self-adaptive jDE, Brest et al. 2006, DE/rand/1/bin with a
 *        share of DE/current-to-best/1) with restarts seeded from the beam;
 *     3. each run's best is polished with a bounded Nelder–Mead simplex and then improved by
 *        monotonic basin hopping (perturb, polish, keep if better; Leary 2000);
 *     4. distinct local optima go to an archive; the archive, best first, is the answer.
 * - Objective (km/s) of a decision vector:
 *     'vinf+dv' (default): launch v∞ + Σ flyby periapsis Δv + arrival Δv (= launch.vinf + totalDv);
 *     'dv': Σ flyby Δv + arrival Δv (= totalDv);
 *   plus penalties (all km/s):
 *     flyby below its minimum periapsis radius: 0.01 km/s per km short (0.001 when rpMin ≥ 100,000 km);
 *     caps.c3 (km²/s²): 0.1 km/s per km²/s² of launch C3 above the cap;
 *     caps.arrivalVinf (km/s): 10 km/s per km/s of arrival v∞ above the cap;
 *     caps.totalTof (s): 0.1 km/s per day of total flight time above the cap;
 *   Infinity where a leg has no Lambert solution.
 * - `mergeCandidates(lists)`: islands' candidate lists merged in island order (stable sort by
 *   value, duplicates dropped), so the same seed and island count give the same answer.
 * - `runIsland(task)`: one island of a multi-worker search, from structured-cloneable input
 *   (the EphemerisSpec is built here); used by the Web Workers and by the Node benchmark.
 *
 * Units: km, s, km/s, km³/s²; epochs TDB seconds past J2000; heliocentric ecliptic J2000.
 * Sources: Izzo (2015) Lambert solver (lambert.ts); Brest, Greiner, Bošković, Mernik, Žumer,
 * "Self-adapting control parameters in differential evolution", IEEE TEC 10(6) 2006; Nelder &
 * Mead, Computer Journal 7 (1965); Leary, "Global optimization on funneling landscapes",
 * J. Global Optim. 18 (2000) (monotonic basin hopping); objective and penalty as in the GTOP
 * benchmark definitions (Vinkó & Izzo, 2008).
 */
import { BODIES, DAY_S, MU_SUN } from "./constants";
import { asFast, ephemerisFromSpec } from "./ephemeris";
import { lambertInto } from "./lambert";
import { poweredFlybyRp } from "./flyby";
import { evaluateTour } from "./tour";
import type {
  BodyId,
  BodyPhysical,
  Ephemeris,
  EphemerisSpec,
  FastEphemeris,
  PorkchopGrid,
  PorkchopResult,
  SearchBounds,
  SearchCandidate,
  SearchOptions,
  TourResult,
  TourSpec,
} from "./types";

// ---------------------------------------------------------------------------------------------
// shared helpers

/** Penalty of a flyby below its minimum radius, km/s per km (0.001 when rpMin ≥ 100,000 km). */
export const RP_PENALTY_KM_S_PER_KM = 0.01;
export const RP_PENALTY_LARGE_KM_S_PER_KM = 0.001;
/** rpMin (km) at and above which the smaller penalty coefficient applies. */
export const RP_PENALTY_LARGE_RP_KM = 100_000;
/** Cap penalties: km/s per km²/s² of C3 over the cap; per km/s of arrival v∞; per day of flight time. */
export const C3_CAP_PENALTY = 0.1;
export const ARRIVAL_VINF_CAP_PENALTY = 10;
export const TOF_CAP_PENALTY_PER_DAY = 0.1;

/** Largest number of revolutions a scan or a leg may ask for. */
const MAX_REVS_LIMIT = 5;

/** mulberry32 PRNG (common practice): a deterministic uniform [0, 1) stream from a 32-bit seed. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function physicalOf(body: BodyId, bodies: TourSpec["bodies"]): BodyPhysical {
  const p = (BODIES as Record<string, BodyPhysical | undefined>)[body] ?? bodies?.[body];
  if (!p) throw new RangeError(`unknown body '${String(body)}': not a planet and not in spec.bodies`);
  return p;
}

function checkArrival(arrival: TourSpec["arrival"]): void {
  if (arrival === undefined) return;
  if (arrival === null || typeof arrival !== "object") throw new RangeError("arrival must be an object with a kind");
  if (arrival.kind === "capture") {
    if (!(Number.isFinite(arrival.rp) && arrival.rp > 0)) throw new RangeError("arrival.rp must be a finite radius > 0 km");
    if (!(Number.isFinite(arrival.e) && arrival.e >= 0 && arrival.e < 1)) throw new RangeError("arrival.e must be in [0, 1)");
  } else if (arrival.kind !== "flyby" && arrival.kind !== "rendezvous") {
    throw new RangeError(`arrival.kind must be flyby, rendezvous or capture (got ${String((arrival as { kind?: unknown }).kind)})`);
  }
}

/**
 * Arrival Δv (km/s) for an arrival v∞ (km/s): flyby 0; rendezvous v∞; capture into (rp km, e)
 * with the burn at periapsis |√(v∞² + 2μ/rp) − √(μ(1 + e)/rp)|. Source: Curtis ch. 8
 * (hyperbolic arrival, capture burn at periapsis); GTOP benchmark insertion model.
 */
export function arrivalDv(vinf: number, arrival: TourSpec["arrival"], mu: number): number {
  if (arrival === undefined || arrival.kind === "flyby") return 0;
  if (arrival.kind === "rendezvous") return vinf;
  const rp = arrival.rp;
  return Math.abs(Math.sqrt(vinf * vinf + (2 * mu) / rp) - Math.sqrt((mu * (1 + arrival.e)) / rp));
}

function yieldNow(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

// ---------------------------------------------------------------------------------------------
// porkchop

function checkEpochList(name: string, xs: unknown, allowEmpty = false): number[] {
  if (!Array.isArray(xs) && !(xs instanceof Float64Array)) throw new RangeError(`${name} must be an array of numbers`);
  const arr = Array.from(xs as ArrayLike<number>);
  if (!allowEmpty && arr.length === 0) throw new RangeError(`${name} must not be empty`);
  arr.forEach((x, i) => {
    if (typeof x !== "number" || !Number.isFinite(x)) throw new RangeError(`${name}[${i}] must be a finite number of seconds`);
  });
  return arr;
}

/**
 * Window scan of one leg. For departure epoch d_i (TDB s past J2000) and arrival epoch a_j
 * (TDB s) — or time of flight T_j (s), arrival d_i + T_j — solves Lambert's problem (Izzo 2015)
 * between the heliocentric ecliptic J2000 positions of `from` at d_i and `to` at a_j, for
 * 0 … maxRevs revolutions (both branches), prograde (h_z > 0) unless `prograde: false`, and
 * keeps the solution with the least `dv`. Returns Float64Arrays of length
 * departures.length × (arrivals ?? tofs).length, row-major [departure][arrival]:
 * - `c3`: launch C3 = |v1 − v_from|², km²/s²;
 * - `vinfDep`: |v1 − v_from|, km/s; `vinfArr`: |v2 − v_to|, km/s;
 * - `dv`: vinfDep + the arrival Δv of `grid.arrival` (flyby 0, rendezvous v∞, capture burn), km/s.
 * NaN where the time of flight is ≤ 0 or there is no solution.
 * @throws RangeError for an empty or non-finite grid, both or neither of arrivals/tofs, a bad
 *   maxRevs (integer 0 … 5), an unknown body or a bad arrival spec.
 */
export function porkchop(grid: PorkchopGrid, ephemeris: Ephemeris): PorkchopResult {
  if (grid == null || typeof grid !== "object") throw new RangeError("grid must be a PorkchopGrid object");
  const eph: FastEphemeris = asFast(ephemeris);
  const deps = checkEpochList("grid.departures", grid.departures);
  const hasArr = grid.arrivals !== undefined;
  const hasTof = grid.tofs !== undefined;
  if (hasArr === hasTof) throw new RangeError("grid must give exactly one of arrivals (epochs) or tofs (times of flight)");
  const cols = hasArr ? checkEpochList("grid.arrivals", grid.arrivals) : checkEpochList("grid.tofs", grid.tofs);
  const maxRevs = grid.maxRevs ?? 0;
  if (!Number.isInteger(maxRevs) || maxRevs < 0 || maxRevs > MAX_REVS_LIMIT) {
    throw new RangeError(`grid.maxRevs must be a whole number 0 … ${MAX_REVS_LIMIT} (got ${String(maxRevs)})`);
  }
  const prograde = grid.prograde ?? true;
  if (typeof prograde !== "boolean") throw new RangeError("grid.prograde must be true or false");
  checkArrival(grid.arrival);
  physicalOf(grid.from, grid.bodies);
  const toPhys = physicalOf(grid.to, grid.bodies);
  const nD = deps.length;
  const nA = cols.length;
  const n = nD * nA;
  const c3 = new Float64Array(n).fill(Number.NaN);
  const vinfDep = new Float64Array(n).fill(Number.NaN);
  const vinfArr = new Float64Array(n).fill(Number.NaN);
  const dv = new Float64Array(n).fill(Number.NaN);
  const lam = new Float64Array(6 * (2 * maxRevs + 1));
  const sFrom = new Float64Array(6);
  const r1 = sFrom.subarray(0, 3);
  // Arrival states: precomputed once for an arrival-epoch grid, per cell for a tof grid.
  const arrStates = new Float64Array(hasArr ? 6 * nA : 6);
  if (hasArr) for (let j = 0; j < nA; j++) eph.stateInto(grid.to, cols[j]!, arrStates, 6 * j);
  const rViews: Float64Array[] = [];
  for (let j = 0; j < (hasArr ? nA : 1); j++) rViews.push(arrStates.subarray(6 * j, 6 * j + 3));
  const arrival = grid.arrival;
  const muTo = toPhys.mu;
  for (let i = 0; i < nD; i++) {
    const d = deps[i]!;
    eph.stateInto(grid.from, d, sFrom, 0);
    for (let j = 0; j < nA; j++) {
      const tof = hasArr ? cols[j]! - d : cols[j]!;
      if (!(tof > 0)) continue;
      let o = 0;
      let r2 = rViews[0]!;
      if (hasArr) {
        o = 6 * j;
        r2 = rViews[j]!;
      } else {
        eph.stateInto(grid.to, d + tof, arrStates, 0);
      }
      let count = 0;
      try {
        count = lambertInto(lam, r1, r2, tof, MU_SUN, prograde, maxRevs);
      } catch {
        count = 0; // collinear geometry: no transfer plane
      }
      let best = Infinity;
      let bVd = 0;
      let bVa = 0;
      for (let s = 0; s < count; s++) {
        const k = 6 * s;
        const ax = lam[k]! - sFrom[3]!, ay = lam[k + 1]! - sFrom[4]!, az = lam[k + 2]! - sFrom[5]!;
        const bx = lam[k + 3]! - arrStates[o + 3]!, by = lam[k + 4]! - arrStates[o + 4]!, bz = lam[k + 5]! - arrStates[o + 5]!;
        const vd = Math.sqrt(ax * ax + ay * ay + az * az);
        const va = Math.sqrt(bx * bx + by * by + bz * bz);
        const total = vd + arrivalDv(va, arrival, muTo);
        if (total < best) {
          best = total;
          bVd = vd;
          bVa = va;
        }
      }
      if (best < Infinity) {
        const c = i * nA + j;
        c3[c] = bVd * bVd;
        vinfDep[c] = bVd;
        vinfArr[c] = bVa;
        dv[c] = best;
      }
    }
  }
  return { c3, vinfDep, vinfArr, dv };
}

// ---------------------------------------------------------------------------------------------
// the fast objective

/** Objective settings shared by the fast evaluator and `candidateValue`. */
export interface ObjectiveSettings {
  objective?: SearchOptions["objective"];
  caps?: SearchOptions["caps"];
}

/**
 * The search objective of a tour, allocation-free: decision vector x = [t0 (TDB s past J2000),
 * T1 … Tn (s)] → km/s (see the module comment for the terms and penalties). Counts evaluations.
 * Not validated per call (hot path); the constructor validates the spec.
 */
export class TourObjective {
  readonly nodes: number;
  readonly legs: number;
  /** Objective evaluations so far (full and partial). */
  evaluations = 0;
  private readonly bodies: BodyId[];
  private readonly mu: Float64Array;
  private readonly rpMin: Float64Array;
  private readonly rpCoef: Float64Array;
  private readonly revs: Int32Array;
  private readonly solIndex: Int32Array;
  private readonly prograde: boolean[];
  private readonly st: Float64Array;
  private readonly rView: Float64Array[];
  private readonly lam: Float64Array;
  private readonly vel: Float64Array;
  private readonly countLaunch: boolean;
  private readonly c3Cap: number;
  private readonly vinfCap: number;
  private readonly tofCap: number;
  private readonly arrival: TourSpec["arrival"];

  constructor(
    readonly spec: TourSpec,
    private readonly eph: FastEphemeris,
    settings: ObjectiveSettings = {},
  ) {
    checkSpec(spec);
    const n = spec.nodes.length;
    this.nodes = n;
    this.legs = n - 1;
    this.bodies = spec.nodes.map((nd) => nd.body);
    this.mu = new Float64Array(n);
    this.rpMin = new Float64Array(n);
    this.rpCoef = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const p = physicalOf(this.bodies[i]!, spec.bodies);
      this.mu[i] = p.mu;
      const rpMin = spec.rpMin?.[this.bodies[i]!] ?? p.radius + p.minFlybyAltitude;
      this.rpMin[i] = rpMin;
      this.rpCoef[i] = rpMin >= RP_PENALTY_LARGE_RP_KM ? RP_PENALTY_LARGE_KM_S_PER_KM : RP_PENALTY_KM_S_PER_KM;
    }
    this.revs = new Int32Array(this.legs);
    this.solIndex = new Int32Array(this.legs);
    this.prograde = [];
    let maxRevs = 0;
    for (let i = 0; i < this.legs; i++) {
      const leg = spec.legs?.[i] ?? {};
      const r = leg.revs ?? 0;
      this.revs[i] = r;
      maxRevs = Math.max(maxRevs, r);
      this.solIndex[i] = r === 0 ? 0 : 1 + 2 * (r - 1) + (leg.branch === "right" ? 1 : 0);
      this.prograde.push(leg.prograde ?? true);
    }
    this.st = new Float64Array(6 * n);
    this.rView = [];
    for (let i = 0; i < n; i++) this.rView.push(this.st.subarray(6 * i, 6 * i + 3));
    this.lam = new Float64Array(6 * (2 * maxRevs + 1));
    this.vel = new Float64Array(6 * this.legs);
    const s = settings;
    if (s.objective !== undefined && s.objective !== "vinf+dv" && s.objective !== "dv") {
      throw new RangeError(`objective must be 'vinf+dv' or 'dv' (got ${String(s.objective)})`);
    }
    this.countLaunch = (s.objective ?? "vinf+dv") === "vinf+dv";
    const cap = (name: string, x: number | undefined) => {
      if (x === undefined) return Infinity;
      if (typeof x !== "number" || !Number.isFinite(x) || x <= 0) throw new RangeError(`caps.${name} must be a finite number > 0`);
      return x;
    };
    this.c3Cap = cap("c3", s.caps?.c3);
    this.vinfCap = cap("arrivalVinf", s.caps?.arrivalVinf);
    this.tofCap = cap("totalTof", s.caps?.totalTof);
    this.arrival = spec.arrival;
    // probe the ephemeris once so an unknown body fails here, not in the hot loop
    for (let i = 0; i < n; i++) eph.stateInto(this.bodies[i]!, spec.nodes[i]!.epoch, this.st, 6 * i);
  }

  /**
   * Objective (km/s) of x = [t0, T1 … Tn]; with `upTo` < legs, the partial cost of the first
   * `upTo` legs (launch v∞ and the Δv of the flybys between them; used by the pruned grid).
   */
  value(x: ArrayLike<number>, upTo: number = this.legs): number {
    this.evaluations++;
    const st = this.st;
    const vel = this.vel;
    const lam = this.lam;
    const eph = this.eph;
    let t = x[0]!;
    eph.stateInto(this.bodies[0]!, t, st, 0);
    let tofSum = 0;
    for (let i = 0; i < upTo; i++) {
      const T = x[i + 1]!;
      if (!(T > 0)) return Infinity;
      tofSum += T;
      t += T;
      eph.stateInto(this.bodies[i + 1]!, t, st, 6 * (i + 1));
      const r = this.revs[i]!;
      let count: number;
      try {
        count = lambertInto(lam, this.rView[i]!, this.rView[i + 1]!, T, MU_SUN, this.prograde[i]!, r);
      } catch {
        return Infinity;
      }
      const idx = this.solIndex[i]!;
      if (count <= idx) return Infinity;
      const k = 6 * idx;
      const o = 6 * i;
      for (let c = 0; c < 6; c++) vel[o + c] = lam[k + c]!;
    }
    let cost = 0;
    let pen = 0;
    // launch
    {
      const ax = vel[0]! - st[3]!, ay = vel[1]! - st[4]!, az = vel[2]! - st[5]!;
      const c3 = ax * ax + ay * ay + az * az;
      if (this.countLaunch) cost += Math.sqrt(c3);
      if (c3 > this.c3Cap) pen += C3_CAP_PENALTY * (c3 - this.c3Cap);
    }
    // flybys at nodes 1 … upTo−1
    for (let k = 1; k < upTo; k++) {
      const s = 6 * k;
      const px = st[s + 3]!, py = st[s + 4]!, pz = st[s + 5]!;
      const ix = vel[6 * (k - 1) + 3]! - px, iy = vel[6 * (k - 1) + 4]! - py, iz = vel[6 * (k - 1) + 5]! - pz;
      const ox = vel[6 * k]! - px, oy = vel[6 * k + 1]! - py, oz = vel[6 * k + 2]! - pz;
      const vin = Math.sqrt(ix * ix + iy * iy + iz * iz);
      const vout = Math.sqrt(ox * ox + oy * oy + oz * oz);
      const cx = iy * oz - iz * oy, cy = iz * ox - ix * oz, cz = ix * oy - iy * ox;
      const delta = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ix * ox + iy * oy + iz * oz);
      const mu = this.mu[k]!;
      const rp = poweredFlybyRp(vin, vout, delta, mu);
      let dv: number;
      if (rp === Infinity) dv = Math.abs(vout - vin);
      else if (rp === 0) return Infinity;
      else dv = Math.abs(Math.sqrt(vout * vout + (2 * mu) / rp) - Math.sqrt(vin * vin + (2 * mu) / rp));
      cost += dv;
      const rpMin = this.rpMin[k]!;
      if (rp < rpMin) pen += this.rpCoef[k]! * (rpMin - rp);
    }
    if (upTo === this.legs) {
      const s = 6 * this.legs;
      const o = 6 * (this.legs - 1);
      const bx = vel[o + 3]! - st[s + 3]!, by = vel[o + 4]! - st[s + 4]!, bz = vel[o + 5]! - st[s + 5]!;
      const vinf = Math.sqrt(bx * bx + by * by + bz * bz);
      cost += arrivalDv(vinf, this.arrival, this.mu[this.legs]!);
      if (vinf > this.vinfCap) pen += ARRIVAL_VINF_CAP_PENALTY * (vinf - this.vinfCap);
      if (tofSum > this.tofCap) pen += (TOF_CAP_PENALTY_PER_DAY * (tofSum - this.tofCap)) / DAY_S;
    }
    const v = cost + pen;
    return v === v ? v : Infinity;
  }
}

function checkSpec(spec: TourSpec): void {
  if (spec == null || typeof spec !== "object" || !Array.isArray(spec.nodes)) {
    throw new RangeError("spec must be a TourSpec with a nodes array");
  }
  if (spec.nodes.length < 2) throw new RangeError("spec.nodes needs at least two nodes (launch and arrival)");
  spec.nodes.forEach((nd, i) => {
    if (nd == null || typeof nd.body !== "string") throw new RangeError(`spec.nodes[${i}].body must be a body id`);
    if (typeof nd.epoch !== "number" || !Number.isFinite(nd.epoch)) {
      throw new RangeError(`spec.nodes[${i}].epoch must be a finite number (TDB s past J2000)`);
    }
  });
  if (spec.legs !== undefined) {
    if (!Array.isArray(spec.legs)) throw new RangeError("spec.legs must be an array");
    spec.legs.forEach((leg, i) => {
      const r = leg?.revs ?? 0;
      if (!Number.isInteger(r) || r < 0 || r > MAX_REVS_LIMIT) {
        throw new RangeError(`spec.legs[${i}].revs must be a whole number 0 … ${MAX_REVS_LIMIT}`);
      }
    });
  }
  checkArrival(spec.arrival);
}

/**
 * The search value (km/s) of an evaluated tour, from its TourResult: the same terms and
 * penalties as the fast objective (used to check the two agree).
 */
export function candidateValue(spec: TourSpec, epochs: number[], result: TourResult, settings: ObjectiveSettings = {}): number {
  if (!Number.isFinite(result.totalDv)) return Infinity;
  let v = ((settings.objective ?? "vinf+dv") === "vinf+dv" ? result.launch.vinf : 0) + result.totalDv;
  for (const f of result.flybys) {
    const p = physicalOf(f.body, spec.bodies);
    const rpMin = spec.rpMin?.[f.body] ?? p.radius + p.minFlybyAltitude;
    if (f.rp < rpMin) v += (rpMin >= RP_PENALTY_LARGE_RP_KM ? RP_PENALTY_LARGE_KM_S_PER_KM : RP_PENALTY_KM_S_PER_KM) * (rpMin - f.rp);
  }
  const caps = settings.caps ?? {};
  if (caps.c3 !== undefined && result.launch.c3 > caps.c3) v += C3_CAP_PENALTY * (result.launch.c3 - caps.c3);
  if (caps.arrivalVinf !== undefined && result.arrival.vinf > caps.arrivalVinf) {
    v += ARRIVAL_VINF_CAP_PENALTY * (result.arrival.vinf - caps.arrivalVinf);
  }
  const tof = epochs[epochs.length - 1]! - epochs[0]!;
  if (caps.totalTof !== undefined && tof > caps.totalTof) v += (TOF_CAP_PENALTY_PER_DAY * (tof - caps.totalTof)) / DAY_S;
  return v;
}

// ---------------------------------------------------------------------------------------------
// the optimiser

/** Progress of a search: evaluations so far, best value (km/s) and its epochs (TDB s per node). */
export interface SearchProgress {
  evaluations: number;
  best: number;
  bestEpochs?: number[];
}

/** Search options plus extras used by the workers (a richer progress callback, candidate count). */
export interface OptimizeOptions extends Omit<SearchOptions, "onProgress"> {
  onProgress?: (p: SearchProgress) => void;
  /** Evaluations between progress reports (default 2048). */
  progressEvery?: number;
  /** How many distinct candidates to return (default 20). */
  maxCandidates?: number;
}

/** Two candidates are the same tour when every node epoch differs by at most this (s): 2 days. */
export const DISTINCT_EPOCH_S = 2 * DAY_S;

function sameTour(a: ArrayLike<number>, b: ArrayLike<number>): boolean {
  for (let i = 0; i < a.length; i++) if (Math.abs(a[i]! - b[i]!) > DISTINCT_EPOCH_S) return false;
  return true;
}

/** Decision vector x = [t0, T1 … Tn] → node epochs (TDB s past J2000). */
export function epochsOf(x: ArrayLike<number>): number[] {
  const out: number[] = [x[0]!];
  for (let i = 1; i < x.length; i++) out.push(out[i - 1]! + x[i]!);
  return out;
}

function checkBounds(bounds: SearchBounds, legs: number): void {
  if (bounds == null || typeof bounds !== "object") throw new RangeError("bounds must be a SearchBounds object");
  const pair = (name: string, p: unknown, positive: boolean) => {
    if (!Array.isArray(p) || p.length !== 2) throw new RangeError(`${name} must be a [lower, upper] pair`);
    const [lo, hi] = p as number[];
    if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new RangeError(`${name} must be finite numbers`);
    if (!(hi! >= lo!)) throw new RangeError(`${name}: upper bound must not be below the lower bound`);
    if (positive && !(lo! > 0)) throw new RangeError(`${name}: times of flight must be > 0 s`);
  };
  pair("bounds.launch", bounds.launch, false);
  if (!Array.isArray(bounds.tof) || bounds.tof.length !== legs) {
    throw new RangeError(`bounds.tof must have one [min, max] pair per leg (${legs})`);
  }
  bounds.tof.forEach((p, i) => pair(`bounds.tof[${i}]`, p, true));
}

interface Archived {
  x: Float64Array;
  value: number;
}

/**
 * Global search of a tour's epochs (see the module comment for the method). `spec` gives the
 * bodies, leg options, arrival and rpMin (its epochs are replaced); `bounds` the launch window
 * (TDB s past J2000) and per-leg time-of-flight ranges (s). Options: `seed` (default 1),
 * `budget` objective evaluations (default 200,000), `objective`, `caps`, `onProgress`
 * (every ~2048 evaluations), `signal` (cancelling resolves with what was found so far).
 * Returns distinct candidates best first (value km/s including penalties; epochs TDB s per node;
 * result = evaluateTour at those epochs) and the number of objective evaluations spent.
 * @throws RangeError for a bad spec, bounds or options.
 */
export async function optimizeTour(
  spec: TourSpec,
  bounds: SearchBounds,
  ephemeris: Ephemeris,
  options: OptimizeOptions = {},
): Promise<{ candidates: SearchCandidate[]; evaluations: number }> {
  const eph = asFast(ephemeris);
  const fo = new TourObjective(spec, eph, options);
  checkBounds(bounds, fo.legs);
  const seed = options.seed ?? 1;
  if (!Number.isInteger(seed)) throw new RangeError("seed must be an integer");
  const budget = options.budget ?? 200_000;
  if (!(Number.isFinite(budget) && budget >= 1)) throw new RangeError("budget must be a number of evaluations ≥ 1");
  const maxCand = options.maxCandidates ?? 20;
  const progressEvery = options.progressEvery ?? 2048;
  const signal = options.signal;

  const D = fo.legs + 1;
  const lo = new Float64Array(D);
  const span = new Float64Array(D);
  lo[0] = bounds.launch[0];
  span[0] = bounds.launch[1] - bounds.launch[0];
  for (let i = 0; i < fo.legs; i++) {
    lo[i + 1] = bounds.tof[i]![0];
    span[i + 1] = bounds.tof[i]![1] - bounds.tof[i]![0];
  }
  const rnd = mulberry32(seed);
  const xs = new Float64Array(D);

  // --- bookkeeping: best so far, archive, progress, stop
  let best = Infinity;
  let bestX = new Float64Array(D);
  let nextReport = progressEvery;
  const archive: Archived[] = [];
  const report = () => {
    if (options.onProgress) {
      options.onProgress({ evaluations: fo.evaluations, best, bestEpochs: best < Infinity ? epochsOf(bestX) : undefined });
    }
  };
  const stopped = () => fo.evaluations >= budget || signal?.aborted === true;
  /** f of a normalised point u ∈ [0, 1]^D (clamped). */
  const f = (u: Float64Array): number => {
    for (let d = 0; d < D; d++) {
      const c = u[d]! < 0 ? 0 : u[d]! > 1 ? 1 : u[d]!;
      xs[d] = lo[d]! + c * span[d]!;
    }
    const v = fo.value(xs);
    if (v < best) {
      best = v;
      bestX = Float64Array.from(xs);
    }
    if (fo.evaluations >= nextReport) {
      nextReport = fo.evaluations + progressEvery;
      report();
    }
    return v;
  };
  const addArchive = (u: Float64Array, v: number) => {
    if (!(v < Infinity)) return;
    const x = new Float64Array(D);
    for (let d = 0; d < D; d++) x[d] = lo[d]! + Math.min(1, Math.max(0, u[d]!)) * span[d]!;
    const ex = epochsOf(x);
    for (const a of archive) {
      if (sameTour(epochsOf(a.x), ex)) {
        if (v < a.value) {
          a.x = x;
          a.value = v;
        }
        return;
      }
    }
    archive.push({ x, value: v });
    archive.sort((p, q) => p.value - q.value);
    if (archive.length > 4 * maxCand) archive.length = 4 * maxCand;
  };
  let lastYield = Date.now();
  const checkpoint = async () => {
    if (Date.now() - lastYield > 40) {
      await yieldNow();
      lastYield = Date.now();
    }
  };

  // --- 1. pruned per-leg grid
  const seeds = beamSeeds(fo, spec, eph, lo, span, D, Math.min(Math.floor(budget * 0.08), 40_000), stopped);
  for (const s of seeds.slice(0, 3)) addArchive(s.u, f(s.u));
  await checkpoint();

  // --- 2–3. DE restarts, each polished and improved by basin hopping
  let seedCursor = 0;
  let run = 0;
  while (!stopped()) {
    const NP = Math.max(24, 8 * D);
    const pop: Float64Array[] = [];
    const fit = new Float64Array(NP);
    const Fs = new Float64Array(NP).fill(0.5);
    const CRs = new Float64Array(NP).fill(0.9);
    for (let p = 0; p < NP; p++) {
      const u = new Float64Array(D);
      const s = p < NP / 3 && seeds.length > 0 ? seeds[seedCursor++ % seeds.length] : undefined;
      if (s) {
        for (let d = 0; d < D; d++) u[d] = clamp01(s.u[d]! + (run > 0 ? 0.01 * (rnd() - 0.5) : 0));
      } else {
        for (let d = 0; d < D; d++) u[d] = rnd();
      }
      pop.push(u);
      fit[p] = f(u);
      if (stopped()) break;
    }
    let bestIdx = argmin(fit);
    let lastImprove = 0;
    let lastBest = fit[bestIdx]!;
    const trial = new Float64Array(D);
    const runCap = fo.evaluations + Math.max(20_000, Math.floor(budget * 0.15));
    for (let gen = 0; !stopped() && fo.evaluations < runCap; gen++) {
      for (let p = 0; p < NP && !stopped(); p++) {
        // jDE self-adaptation (Brest et al. 2006): τ1 = τ2 = 0.1
        const F = rnd() < 0.1 ? 0.1 + 0.9 * rnd() : Fs[p]!;
        const CR = rnd() < 0.1 ? rnd() : CRs[p]!;
        let a: number, b: number, c: number;
        do a = Math.floor(rnd() * NP); while (a === p);
        do b = Math.floor(rnd() * NP); while (b === p || b === a);
        do c = Math.floor(rnd() * NP); while (c === p || c === a || c === b);
        const jr = Math.floor(rnd() * D);
        const toBest = rnd() < 0.3;
        const xp = pop[p]!, xa = pop[a]!, xb = pop[b]!, xc = pop[c]!, xbest = pop[bestIdx]!;
        for (let d = 0; d < D; d++) {
          if (d === jr || rnd() < CR) {
            let v = toBest ? xp[d]! + F * (xbest[d]! - xp[d]!) + F * (xb[d]! - xc[d]!) : xa[d]! + F * (xb[d]! - xc[d]!);
            // bounce back into [0, 1]
            if (v < 0) v = rnd() * xp[d]!;
            else if (v > 1) v = xp[d]! + rnd() * (1 - xp[d]!);
            trial[d] = v;
          } else trial[d] = xp[d]!;
        }
        const ft = f(trial);
        if (ft <= fit[p]!) {
          xp.set(trial);
          fit[p] = ft;
          Fs[p] = F;
          CRs[p] = CR;
          if (ft < fit[bestIdx]!) bestIdx = p;
        }
      }
      const fb = fit[bestIdx]!;
      if (fb < lastBest - 1e-6) {
        lastBest = fb;
        lastImprove = gen;
      }
      let worst = -Infinity;
      for (let p = 0; p < NP; p++) if (fit[p]! > worst) worst = fit[p]!;
      if (gen - lastImprove > 60 || worst - fb < 1e-5) break;
      await checkpoint();
    }
    // polish and hop
    let u: Float64Array = Float64Array.from(pop[bestIdx]!);
    let fu = fit[bestIdx]!;
    if (fu < Infinity && !stopped()) {
      ({ u, fu } = nelderMead(f, u, fu, D, 0.02, Math.min(1500, 250 * D), stopped));
      addArchive(u, fu);
      await checkpoint();
      ({ u, fu } = await basinHop(f, u, fu, D, rnd, stopped, checkpoint));
      addArchive(u, fu);
    }
    // also archive the best distinct members of the final population
    const order = Array.from(fit.keys()).sort((p, q) => fit[p]! - fit[q]!);
    for (const p of order.slice(0, 5)) addArchive(pop[p]!, fit[p]!);
    run++;
    await checkpoint();
  }
  report();

  // --- 4. the answer: distinct candidates best first, each evaluated in full
  if (best < Infinity) {
    const bu = new Float64Array(D);
    for (let d = 0; d < D; d++) bu[d] = span[d]! > 0 ? (bestX[d]! - lo[d]!) / span[d]! : 0;
    const evals = fo.evaluations;
    addArchive(bu, best);
    fo.evaluations = evals;
  }
  const candidates: SearchCandidate[] = archive.slice(0, maxCand).map((a) => {
    const epochs = epochsOf(a.x);
    const tourSpec: TourSpec = { ...spec, nodes: spec.nodes.map((nd, i) => ({ body: nd.body, epoch: epochs[i]! })) };
    return { epochs, value: a.value, result: evaluateTour(tourSpec, eph, options.caps) };
  });
  return { candidates, evaluations: fo.evaluations };
}

function clamp01(v: number): number {
  return v < 0 ? 0 : v > 1 ? 1 : v;
}

function argmin(a: Float64Array): number {
  let k = 0;
  for (let i = 1; i < a.length; i++) if (a[i]! < a[k]!) k = i;
  return k;
}

/**
 * Bounded Nelder–Mead in normalised coordinates (points clamped to [0, 1]).
 * Source: Nelder & Mead (1965); standard coefficients 1, 2, 0.5, 0.5.
 */
function nelderMead(
  f: (u: Float64Array) => number,
  u0: Float64Array,
  f0: number,
  D: number,
  step: number,
  maxEvals: number,
  stopped: () => boolean,
): { u: Float64Array; fu: number } {
  const pts: Float64Array[] = [Float64Array.from(u0)];
  const fv: number[] = [f0];
  let used = 0;
  for (let d = 0; d < D; d++) {
    const p = Float64Array.from(u0);
    p[d] = p[d]! + (p[d]! + step <= 1 ? step : -step);
    pts.push(p);
    fv.push(f(p));
    used++;
  }
  const cen = new Float64Array(D);
  const xr = new Float64Array(D);
  const xe = new Float64Array(D);
  const xc = new Float64Array(D);
  const idx = Array.from({ length: D + 1 }, (_, i) => i);
  while (used < maxEvals && !stopped()) {
    idx.sort((a, b) => fv[a]! - fv[b]!);
    const bI = idx[0]!, wI = idx[D]!, sI = idx[D - 1]!;
    if (Math.abs(fv[wI]! - fv[bI]!) < 1e-10 * (1 + Math.abs(fv[bI]!))) {
      let size = 0;
      for (let d = 0; d < D; d++) size = Math.max(size, Math.abs(pts[wI]![d]! - pts[bI]![d]!));
      if (size < 1e-7 || fv[bI] === Infinity) break;
    }
    cen.fill(0);
    for (let k = 0; k < D; k++) {
      const p = pts[idx[k]!]!;
      for (let d = 0; d < D; d++) cen[d] = cen[d]! + p[d]! / D;
    }
    const w = pts[wI]!;
    for (let d = 0; d < D; d++) xr[d] = clamp01(cen[d]! + (cen[d]! - w[d]!));
    const fr = f(xr);
    used++;
    if (fr < fv[bI]!) {
      for (let d = 0; d < D; d++) xe[d] = clamp01(cen[d]! + 2 * (cen[d]! - w[d]!));
      const fe = f(xe);
      used++;
      if (fe < fr) {
        w.set(xe);
        fv[wI] = fe;
      } else {
        w.set(xr);
        fv[wI] = fr;
      }
    } else if (fr < fv[sI]!) {
      w.set(xr);
      fv[wI] = fr;
    } else {
      const outside = fr < fv[wI]!;
      for (let d = 0; d < D; d++) xc[d] = outside ? cen[d]! + 0.5 * (xr[d]! - cen[d]!) : cen[d]! + 0.5 * (w[d]! - cen[d]!);
      const fc = f(xc);
      used++;
      if (fc < (outside ? fr : fv[wI]!)) {
        w.set(xc);
        fv[wI] = fc;
      } else {
        const b = pts[bI]!;
        for (let k = 1; k <= D && used < maxEvals; k++) {
          const p = pts[idx[k]!]!;
          for (let d = 0; d < D; d++) p[d] = b[d]! + 0.5 * (p[d]! - b[d]!);
          fv[idx[k]!] = f(p);
          used++;
        }
      }
    }
  }
  const k = fv.indexOf(Math.min(...fv));
  return { u: Float64Array.from(pts[k]!), fu: fv[k]! };
}

/**
 * Monotonic basin hopping (Leary 2000): perturb every coordinate by up to ±r (normalised),
 * polish with Nelder–Mead, keep the new point when it is better; stop after `maxFail`
 * failures in a row. Two radii alternate (wide hops and close ones).
 */
async function basinHop(
  f: (u: Float64Array) => number,
  u0: Float64Array,
  f0: number,
  D: number,
  rnd: () => number,
  stopped: () => boolean,
  checkpoint: () => Promise<void>,
): Promise<{ u: Float64Array; fu: number }> {
  let u = u0;
  let fu = f0;
  const trial = new Float64Array(D);
  let fails = 0;
  const maxFail = 40;
  for (let it = 0; fails < maxFail && !stopped(); it++) {
    const r = it % 3 === 0 ? 0.1 : it % 3 === 1 ? 0.03 : 0.008;
    for (let d = 0; d < D; d++) trial[d] = clamp01(u[d]! + r * (2 * rnd() - 1));
    const ft = f(trial);
    if (!(ft < fu + 2)) {
      fails++;
      continue; // far worse start: not worth a polish
    }
    const res = nelderMead(f, trial, ft, D, r / 4, 120 * D, stopped);
    if (res.fu < fu - 1e-9) {
      u = res.u;
      fu = res.fu;
      fails = 0;
    } else fails++;
    await checkpoint();
  }
  return { u, fu };
}

interface Seed {
  u: Float64Array;
  cost: number;
}

/**
 * The pruned per-leg grid: t0 × T1 on a coarse grid, keep the best partial chains (launch v∞,
 * plus caps), then extend leg by leg (T_k grid, plus near-resonant values k·P for a leg that
 * returns to the same planet), keeping the `beam` best distinct partial chains each time.
 * Returns full normalised vectors, best first. Deterministic (no randomness).
 */
function beamSeeds(
  fo: TourObjective,
  spec: TourSpec,
  eph: FastEphemeris,
  lo: Float64Array,
  span: Float64Array,
  D: number,
  budget: number,
  stopped: () => boolean,
): Seed[] {
  const legs = D - 1;
  const beam = Math.max(8, Math.min(60, Math.floor(budget / (legs * 40 + 1) / 1)));
  const G = Math.max(8, Math.min(48, Math.floor(Math.sqrt(budget / (legs + 1)))));
  const grid = (leg: number): number[] => {
    const vals: number[] = [];
    for (let k = 0; k < G; k++) vals.push((k + 0.5) / G);
    if (leg > 0) {
      const from = spec.nodes[leg - 1]!.body;
      const to = spec.nodes[leg]!.body;
      if (from === to) {
        const P = periodOf(eph, from, spec.nodes[0]!.epoch);
        if (P > 0) {
          for (let k = 1; k <= 6; k++) {
            for (const e of [-0.01, -0.004, 0, 0.004, 0.01]) {
              const u = (k * P * (1 + e) - lo[leg]!) / (span[leg]! || 1);
              if (u >= 0 && u <= 1) vals.push(u);
            }
          }
        }
      }
    }
    return vals;
  };
  const x = new Float64Array(D);
  const toX = (u: Float64Array) => {
    for (let d = 0; d < D; d++) x[d] = lo[d]! + u[d]! * span[d]!;
  };
  const g0 = grid(0);
  const g1 = grid(1);
  let level: Seed[] = [];
  for (const a of g0) {
    for (const b of g1) {
      if (stopped()) return level;
      const u = new Float64Array(D).fill(0.5);
      u[0] = a;
      u[1] = b;
      toX(u);
      const c = fo.value(x, 1);
      if (c < Infinity) level.push({ u, cost: c });
    }
  }
  level = prune(level, beam, 2);
  for (let leg = 2; leg <= legs; leg++) {
    const gk = grid(leg);
    const next: Seed[] = [];
    for (const s of level) {
      for (const v of gk) {
        if (stopped()) return prune(next.length ? next : level, beam, leg);
        const u = Float64Array.from(s.u);
        u[leg] = v;
        toX(u);
        const c = fo.value(x, leg);
        if (c < Infinity) next.push({ u, cost: c });
      }
    }
    level = prune(next, beam, leg + 1);
  }
  return level;
}

function prune(list: Seed[], beam: number, dims: number): Seed[] {
  list.sort((a, b) => a.cost - b.cost);
  const out: Seed[] = [];
  for (const s of list) {
    let dup = false;
    for (const o of out) {
      let m = 0;
      for (let d = 0; d < dims; d++) m = Math.max(m, Math.abs(o.u[d]! - s.u[d]!));
      if (m < 0.015) {
        dup = true;
        break;
      }
    }
    if (!dup) out.push(s);
    if (out.length >= beam) break;
  }
  return out;
}

/** Orbital period (s) of a body about the Sun from its state at epoch t (two-body, MU_SUN); 0 if unbound. */
function periodOf(eph: FastEphemeris, body: BodyId, t: number): number {
  const s = new Float64Array(6);
  eph.stateInto(body, t, s, 0);
  const r = Math.hypot(s[0]!, s[1]!, s[2]!);
  const v2 = s[3]! * s[3]! + s[4]! * s[4]! + s[5]! * s[5]!;
  const a = 1 / (2 / r - v2 / MU_SUN);
  return a > 0 ? 2 * Math.PI * Math.sqrt((a * a * a) / MU_SUN) : 0;
}

// ---------------------------------------------------------------------------------------------
// islands

/**
 * Merges islands' candidate lists in island order: concatenated, stably sorted by value,
 * duplicates (every node epoch within 2 days of a better one) dropped, at most `max` kept.
 */
export function mergeCandidates(lists: SearchCandidate[][], max = 20): SearchCandidate[] {
  if (!Array.isArray(lists)) throw new RangeError("lists must be an array of candidate lists");
  const all = lists.flat().map((c, i) => ({ c, i }));
  all.sort((a, b) => a.c.value - b.c.value || a.i - b.i);
  const out: SearchCandidate[] = [];
  for (const { c } of all) {
    if (out.some((o) => sameTour(o.epochs, c.epochs))) continue;
    out.push(c);
    if (out.length >= max) break;
  }
  return out;
}

/** The evaluation budget of island k of n: budget split as evenly as possible. */
export function islandBudget(budget: number, k: number, n: number): number {
  const base = Math.floor(budget / n);
  return base + (k < budget - base * n ? 1 : 0);
}

/** Structured-cloneable input of one island (what crosses into a Web Worker). */
export interface IslandTask {
  spec: TourSpec;
  bounds: SearchBounds;
  /** The worker builds the ephemeris; 'vsop' is always used through the Hermite cache here. */
  ephemeris: EphemerisSpec;
  seed: number;
  /** Total budget of the whole search (all islands), objective evaluations. */
  budget: number;
  island: number;
  islands: number;
  objective?: SearchOptions["objective"];
  caps?: SearchOptions["caps"];
  maxCandidates?: number;
}

/**
 * Runs island `task.island` of `task.islands`: seed = task.seed + island, budget = its share of
 * task.budget. The ephemeris is built from the spec (vsop → cachedEphemeris, mean → direct)
 * unless the caller passes one built from the same spec (a worker keeps its cache between runs).
 */
export async function runIsland(
  task: IslandTask,
  onProgress?: (p: SearchProgress) => void,
  signal?: AbortSignal,
  ephemeris?: Ephemeris,
): Promise<{ candidates: SearchCandidate[]; evaluations: number }> {
  if (task == null || typeof task !== "object") throw new RangeError("task must be an IslandTask object");
  const { island, islands } = task;
  if (!Number.isInteger(islands) || islands < 1) throw new RangeError("islands must be a whole number ≥ 1");
  if (!Number.isInteger(island) || island < 0 || island >= islands) throw new RangeError("island must be in 0 … islands − 1");
  const eph = ephemeris ?? ephemerisFromSpec({ ...task.ephemeris, cached: task.ephemeris.kind === "vsop" ? true : task.ephemeris.cached });
  return optimizeTour(task.spec, task.bounds, eph, {
    seed: task.seed + island,
    budget: islandBudget(task.budget, island, islands),
    objective: task.objective,
    caps: task.caps,
    maxCandidates: task.maxCandidates,
    onProgress,
    signal,
  });
}
