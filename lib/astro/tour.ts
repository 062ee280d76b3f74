/**
 * Patched-conic evaluation of a gravity-assist tour: Lambert legs between the nodes' bodies,
 * powered flybys at the intermediate nodes, launch C3/DLA/RLA and arrival v∞/Δv.
 *
 * Units: km, s, km/s, km²/s² (C3), km³/s², rad. Frame: heliocentric ecliptic J2000 (EclJ2000)
 * for all vectors; DLA/RLA in the Earth mean equator and equinox of J2000 (EME2000).
 * Epochs: TDB seconds past J2000.0.
 * Sources: patched-conic method (Curtis, *Orbital Mechanics for Engineering Students*, ch. 8);
 * powered-flyby model and objective of the GTOP benchmarks (Vinkó & Izzo, 2008);
 * Izzo (2015) Lambert solver (lambert.ts).
 */
import type {
  ArrivalSpec,
  BodyId,
  BodyPhysical,
  Ephemeris,
  FastEphemeris,
  TourFlybyResult,
  TourLegResult,
  TourResult,
  TourSpec,
  TourViolation,
  Vec3,
} from "./types";
import { BODIES, MU_SUN, OBLIQUITY_J2000, isPlanetId } from "./constants";
import { poweredFlybyRp } from "./flyby";
import { lambert, lambertInto } from "./lambert";

const TWO_PI = 2 * Math.PI;
const COS_EPS = Math.cos(OBLIQUITY_J2000);
const SIN_EPS = Math.sin(OBLIQUITY_J2000);

/** Optional caps checked by {@link evaluateTour} (km²/s², km/s, s); a breach adds a violation. */
export interface TourCaps {
  c3?: number;
  arrivalVinf?: number;
  totalTof?: number;
}

// Scratch buffers (grown on demand; evaluateTour is synchronous so sharing them is safe).
let stateBuf = new Float64Array(6 * 8);
let lamBuf = new Float64Array(6 * 3);
let legBuf = new Float64Array(6 * 8); // per leg v1, v2
let legOk = new Uint8Array(8);
const bpScratch = new Float64Array(2);
const r1Scratch = new Float64Array(3);
const r2Scratch = new Float64Array(3);

function titleOf(body: BodyId): string {
  if (body.startsWith("custom:")) return body.slice(7);
  return body.charAt(0).toUpperCase() + body.slice(1);
}

/** km with thousands separators (no Intl: this runs inside searches). */
function fmtKm(x: number): string {
  if (!(Math.abs(x) >= 100)) return x.toFixed(1);
  const s = String(Math.round(Math.abs(x)));
  let out = "";
  for (let i = 0; i < s.length; i++) {
    if (i > 0 && (s.length - i) % 3 === 0) out += ",";
    out += s[i];
  }
  return (x < 0 ? "-" : "") + out;
}

/**
 * Physical data (GM km³/s², radius km, minimum flyby altitude km) of a body for a tour:
 * `spec.bodies[id]` when given (a team's small bodies, or an override), else BODIES for a planet.
 * Throws RangeError for an unknown body. Source: constants.ts (JPL GMs, IAU WGCCRE radii).
 */
export function bodyPhysical(spec: Pick<TourSpec, "bodies">, body: BodyId): BodyPhysical {
  const own = spec.bodies?.[body];
  if (own) return own;
  if (isPlanetId(body)) return BODIES[body];
  throw new RangeError(`body '${String(body)}' has no physical data: add it to spec.bodies (mu, radius, minFlybyAltitude)`);
}

/**
 * Minimum periapsis radius (km) of a flyby of `body` in a tour: spec.rpMin[body] when set,
 * otherwise radius + minFlybyAltitude (defaults: common practice, see constants.ts).
 */
export function rpMinFor(spec: Pick<TourSpec, "bodies" | "rpMin">, body: BodyId): number {
  const v = spec.rpMin?.[body];
  if (typeof v === "number" && Number.isFinite(v)) return v;
  const p = bodyPhysical(spec, body);
  return p.radius + p.minFlybyAltitude;
}

function validateSpec(spec: TourSpec): void {
  if (spec == null || typeof spec !== "object") throw new RangeError("spec must be a TourSpec object");
  const nodes = spec.nodes;
  if (!Array.isArray(nodes) || nodes.length < 2) {
    throw new RangeError("spec.nodes must list at least two nodes (launch and arrival)");
  }
  for (let k = 0; k < nodes.length; k++) {
    const n = nodes[k];
    if (n == null || typeof n.body !== "string") throw new RangeError(`spec.nodes[${k}].body must be a body id`);
    if (typeof n.epoch !== "number" || !Number.isFinite(n.epoch)) {
      throw new RangeError(`spec.nodes[${k}].epoch must be a finite number of TDB seconds past J2000`);
    }
    if (k > 0) bodyPhysical(spec, n.body); // flyby / arrival bodies need physical data
  }
  if (spec.legs !== undefined) {
    if (!Array.isArray(spec.legs)) throw new RangeError("spec.legs must be an array");
    for (let k = 0; k < spec.legs.length; k++) {
      const l = spec.legs[k];
      if (l == null) continue;
      if (l.revs !== undefined && !(Number.isInteger(l.revs) && l.revs >= 0)) {
        throw new RangeError(`spec.legs[${k}].revs must be an integer ≥ 0`);
      }
      if (l.branch !== undefined && l.branch !== "left" && l.branch !== "right") {
        throw new RangeError(`spec.legs[${k}].branch must be 'left' or 'right'`);
      }
    }
  }
  const arr = spec.arrival;
  if (arr !== undefined) {
    if (arr.kind === "capture") {
      if (!(typeof arr.rp === "number" && Number.isFinite(arr.rp) && arr.rp > 0)) {
        throw new RangeError("spec.arrival.rp must be a positive periapsis radius in km");
      }
      if (!(typeof arr.e === "number" && arr.e >= 0 && arr.e < 1)) {
        throw new RangeError("spec.arrival.e must be in [0, 1) for a capture orbit");
      }
    } else if (arr.kind !== "flyby" && arr.kind !== "rendezvous") {
      throw new RangeError(`spec.arrival.kind must be 'flyby', 'rendezvous' or 'capture'`);
    }
  }
}

/** B·T, B·R (km, ecliptic pole) of the incoming hyperbola; NaN when undefined. Writes bpScratch. */
function bPlaneInline(
  ix: number, iy: number, iz: number, ox: number, oy: number, oz: number, rp: number, mu: number,
): void {
  const vin = Math.sqrt(ix * ix + iy * iy + iz * iz);
  let hx = iy * oz - iz * oy, hy = iz * ox - ix * oz, hz = ix * oy - iy * ox;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  const sx = ix / vin, sy = iy / vin, sz = iz / vin;
  // T = Ŝ × ẑ = (sy, −sx, 0)/|…|
  const tn = Math.sqrt(sx * sx + sy * sy);
  if (!(hn > 0) || !(tn > 1e-12) || !Number.isFinite(rp) || !(rp > 0)) {
    bpScratch[0] = NaN;
    bpScratch[1] = NaN;
    return;
  }
  hx /= hn;
  hy /= hn;
  hz /= hn;
  const b = rp * Math.sqrt(1 + (2 * mu) / (rp * vin * vin));
  const bx = sy * hz - sz * hy, by = sz * hx - sx * hz, bz = sx * hy - sy * hx; // B̂ = Ŝ × ĥ
  const tx = sy / tn, ty = -sx / tn; // tz = 0
  // R = Ŝ × T
  const rx = -sz * ty, ry = sz * tx, rz = sx * ty - sy * tx;
  bpScratch[0] = b * (bx * tx + by * ty);
  bpScratch[1] = b * (bx * rx + by * ry + bz * rz);
}

function arrivalDv(arr: ArrivalSpec, vinf: number, mu: number): number {
  if (arr.kind === "flyby") return 0;
  if (arr.kind === "rendezvous") return vinf;
  // periapsis burn from the arrival hyperbola into an orbit (rp, e): Curtis ch. 8 (capture)
  return Math.sqrt(vinf * vinf + (2 * mu) / arr.rp) - Math.sqrt((mu * (1 + arr.e)) / arr.rp);
}

/**
 * Evaluate a tour: per leg the Lambert arc (heliocentric, MU_SUN), per flyby v∞ in/out, turn
 * angle, periapsis radius of the powered flyby, altitude, periapsis Δv and B-plane point
 * (ecliptic pole); launch v∞, C3 = v∞², DLA/RLA (EME2000, RLA in [0, 2π)); arrival v∞ and Δv
 * (flyby 0; rendezvous v∞; capture into rp, e: √(v∞² + 2μ/rp) − √(μ(1 + e)/rp)); totalDv =
 * Σ flyby Δv + arrival Δv (launch excluded); constraint violations.
 *
 * Conventions (DESIGN.md): default arrival flyby; legs default to 0 revs, prograde; revs > 0
 * without a branch takes 'left'. A leg without a Lambert solution (none, collinear r1/r2, or
 * epochs not increasing) adds a violation, its v1/v2 are NaN and totalDv becomes Infinity;
 * never throws for that. A flyby below its minimum radius adds 'below_min_radius'.
 * `caps` (optional, an extension of the contract) add 'c3_cap', 'arrival_vinf_cap', 'tof_cap'.
 *
 * Inputs: spec (epochs TDB s past J2000; planets or spec.bodies entries), ephemeris (km, km/s,
 * EclJ2000; `stateInto` is used when present). Throws RangeError for a malformed spec.
 * Source: Curtis ch. 8 (patched conics); GTOP model (Vinkó & Izzo, 2008).
 */
export function evaluateTour(spec: TourSpec, ephemeris: Ephemeris, caps?: TourCaps): TourResult {
  validateSpec(spec);
  if (ephemeris == null || typeof ephemeris.state !== "function") {
    throw new RangeError("ephemeris must provide state(body, t)");
  }
  const nodes = spec.nodes;
  const nn = nodes.length;
  const nl = nn - 1;
  if (stateBuf.length < 6 * nn) stateBuf = new Float64Array(6 * nn);
  if (legBuf.length < 6 * nl) {
    legBuf = new Float64Array(6 * nl);
    legOk = new Uint8Array(nl);
  }
  const fast = typeof (ephemeris as Partial<FastEphemeris>).stateInto === "function" ? (ephemeris as FastEphemeris) : null;
  for (let k = 0; k < nn; k++) {
    const n = nodes[k]!;
    if (fast) fast.stateInto(n.body, n.epoch, stateBuf, 6 * k);
    else {
      const s = ephemeris.state(n.body, n.epoch);
      stateBuf.set(s.r, 6 * k);
      stateBuf.set(s.v, 6 * k + 3);
    }
  }
  const violations: TourViolation[] = [];
  const legs: TourLegResult[] = new Array(nl);
  const MU = MU_SUN;
  let anyFail = false;
  for (let k = 0; k < nl; k++) {
    const a = nodes[k]!;
    const b = nodes[k + 1]!;
    const opt = spec.legs?.[k];
    const revs = opt?.revs ?? 0;
    const prograde = opt?.prograde ?? true;
    const branch = opt?.branch ?? "left";
    const tof = b.epoch - a.epoch;
    let ok = false;
    const o = 6 * k;
    if (!(tof > 0)) {
      violations.push({
        node: k + 1,
        kind: "epochs_not_increasing",
        message: `${titleOf(b.body)} (node ${k + 1}) is not after ${titleOf(a.body)} (node ${k}): epochs must increase along the chain.`,
      });
    } else {
      const r1 = r1Scratch;
      const r2 = r2Scratch;
      r1[0] = stateBuf[6 * k]!;
      r1[1] = stateBuf[6 * k + 1]!;
      r1[2] = stateBuf[6 * k + 2]!;
      r2[0] = stateBuf[6 * k + 6]!;
      r2[1] = stateBuf[6 * k + 7]!;
      r2[2] = stateBuf[6 * k + 8]!;
      try {
        const need = 6 * (2 * revs + 1);
        if (lamBuf.length < need) lamBuf = new Float64Array(need);
        const cnt = lambertInto(lamBuf, r1, r2, tof, MU, prograde, revs);
        let idx = -1;
        if (revs === 0) idx = cnt >= 1 ? 0 : -1;
        else if (cnt === 2 * revs + 1) idx = branch === "left" ? 2 * revs - 1 : 2 * revs;
        else if (cnt > 0) {
          // some roots missing: use the labelled solutions
          const sols = lambert(r1, r2, tof, MU, { prograde, maxRevs: revs });
          const s = sols.find((x) => x.revs === revs && x.branch === branch);
          if (s) {
            legBuf.set(s.v1, o);
            legBuf.set(s.v2, o + 3);
            ok = true;
          }
        }
        if (idx >= 0) {
          for (let j = 0; j < 6; j++) legBuf[o + j] = lamBuf[6 * idx + j]!;
          ok = true;
        }
      } catch (err) {
        if (!(err instanceof RangeError)) throw err;
        ok = false;
      }
      if (!ok) {
        violations.push({
          node: k + 1,
          kind: "no_solution",
          message: `No ${revs > 0 ? `${revs}-revolution ${branch}-branch ` : ""}${prograde ? "prograde" : "retrograde"} transfer from ${titleOf(a.body)} to ${titleOf(b.body)} exists for this time of flight.`,
        });
      }
    }
    legOk[k] = ok ? 1 : 0;
    if (!ok) anyFail = true;
    legs[k] = {
      from: a.body,
      to: b.body,
      tof,
      v1: ok ? [legBuf[o]!, legBuf[o + 1]!, legBuf[o + 2]!] : [NaN, NaN, NaN],
      v2: ok ? [legBuf[o + 3]!, legBuf[o + 4]!, legBuf[o + 5]!] : [NaN, NaN, NaN],
      revs,
    };
  }

  // Launch
  let launch: TourResult["launch"];
  if (legOk[0]) {
    const x = legBuf[0]! - stateBuf[3]!, y = legBuf[1]! - stateBuf[4]!, z = legBuf[2]! - stateBuf[5]!;
    const c3 = x * x + y * y + z * z;
    const vinf = Math.sqrt(c3);
    // ecliptic → EME2000: rotation about x by −ε
    const ye = COS_EPS * y - SIN_EPS * z;
    const ze = SIN_EPS * y + COS_EPS * z;
    let rla = Math.atan2(ye, x);
    if (rla < 0) rla += TWO_PI;
    if (rla >= TWO_PI) rla = 0;
    const dla = vinf > 0 ? Math.asin(Math.max(-1, Math.min(1, ze / vinf))) : 0;
    launch = { vinf, c3, dla, rla };
  } else {
    launch = { vinf: Infinity, c3: Infinity, dla: NaN, rla: NaN };
  }

  // Flybys
  const flybys: TourFlybyResult[] = new Array(Math.max(0, nn - 2));
  let sumDv = 0;
  for (let k = 1; k < nn - 1; k++) {
    const node = nodes[k]!;
    const phys = bodyPhysical(spec, node.body);
    const rpMin = rpMinFor(spec, node.body);
    const s = 6 * k;
    if (!legOk[k - 1] || !legOk[k]) {
      flybys[k - 1] = {
        body: node.body, epoch: node.epoch, vinfIn: NaN, vinfOut: NaN, turnAngle: NaN, rp: NaN,
        altitude: NaN, dv: Infinity, bT: NaN, bR: NaN, feasible: false,
      };
      sumDv = Infinity;
      continue;
    }
    const pi = 6 * (k - 1) + 3; // v2 of the incoming leg
    const po = 6 * k; // v1 of the outgoing leg
    const ix = legBuf[pi]! - stateBuf[s + 3]!, iy = legBuf[pi + 1]! - stateBuf[s + 4]!, iz = legBuf[pi + 2]! - stateBuf[s + 5]!;
    const ox = legBuf[po]! - stateBuf[s + 3]!, oy = legBuf[po + 1]! - stateBuf[s + 4]!, oz = legBuf[po + 2]! - stateBuf[s + 5]!;
    const vin = Math.sqrt(ix * ix + iy * iy + iz * iz);
    const vout = Math.sqrt(ox * ox + oy * oy + oz * oz);
    const cx = iy * oz - iz * oy, cy = iz * ox - ix * oz, cz = ix * oy - iy * ox;
    const delta = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ix * ox + iy * oy + iz * oz);
    const mu = phys.mu;
    let rp: number;
    let dv: number;
    if (!(vin > 0) || !(vout > 0)) {
      rp = NaN;
      dv = Math.abs(vout - vin);
    } else {
      rp = poweredFlybyRp(vin, vout, delta, mu);
      if (rp === Infinity) dv = Math.abs(vout - vin);
      else if (rp === 0) dv = Infinity;
      else dv = Math.abs(Math.sqrt(vout * vout + (2 * mu) / rp) - Math.sqrt(vin * vin + (2 * mu) / rp));
    }
    bPlaneInline(ix, iy, iz, ox, oy, oz, rp, mu);
    const feasible = rp >= rpMin;
    if (!feasible) {
      violations.push({
        node: k,
        kind: "below_min_radius",
        message: Number.isFinite(rp)
          ? `The ${titleOf(node.body)} flyby (node ${k}) needs periapsis ${fmtKm(rp)} km, ${fmtKm(rpMin - rp)} km below its minimum of ${fmtKm(rpMin)} km.`
          : `The ${titleOf(node.body)} flyby (node ${k}) cannot make the turn above its minimum periapsis of ${fmtKm(rpMin)} km.`,
      });
    }
    sumDv += dv;
    flybys[k - 1] = {
      body: node.body,
      epoch: node.epoch,
      vinfIn: vin,
      vinfOut: vout,
      turnAngle: delta,
      rp,
      altitude: rp - phys.radius,
      dv,
      bT: bpScratch[0]!,
      bR: bpScratch[1]!,
      feasible,
    };
  }

  // Arrival
  const last = nodes[nn - 1]!;
  const arrSpec: ArrivalSpec = spec.arrival ?? { kind: "flyby" };
  let arrival: TourResult["arrival"];
  if (legOk[nl - 1]) {
    const s = 6 * (nn - 1);
    const p = 6 * (nl - 1) + 3;
    const x = legBuf[p]! - stateBuf[s + 3]!, y = legBuf[p + 1]! - stateBuf[s + 4]!, z = legBuf[p + 2]! - stateBuf[s + 5]!;
    const vinf = Math.sqrt(x * x + y * y + z * z);
    arrival = { vinf, dv: arrivalDv(arrSpec, vinf, bodyPhysical(spec, last.body).mu) };
  } else {
    arrival = { vinf: Infinity, dv: Infinity };
  }
  const totalDv = anyFail ? Infinity : sumDv + arrival.dv;

  if (caps) {
    if (caps.c3 !== undefined && launch.c3 > caps.c3) {
      violations.push({
        node: 0,
        kind: "c3_cap",
        message: `Launch C3 ${launch.c3.toFixed(2)} km²/s² exceeds the cap of ${caps.c3} km²/s².`,
      });
    }
    if (caps.arrivalVinf !== undefined && arrival.vinf > caps.arrivalVinf) {
      violations.push({
        node: nn - 1,
        kind: "arrival_vinf_cap",
        message: `Arrival v∞ ${arrival.vinf.toFixed(3)} km/s exceeds the cap of ${caps.arrivalVinf} km/s.`,
      });
    }
    const total = last.epoch - nodes[0]!.epoch;
    if (caps.totalTof !== undefined && total > caps.totalTof) {
      violations.push({
        node: nn - 1,
        kind: "tof_cap",
        message: `Total flight time ${(total / 86400).toFixed(1)} days exceeds the cap of ${(caps.totalTof / 86400).toFixed(1)} days.`,
      });
    }
  }
  violations.sort((p, q) => p.node - q.node);
  return { legs, launch, flybys, arrival, totalDv, violations };
}

/**
 * Search objective of a tour result, km/s: (launch v∞ when objective is 'vinf+dv') + totalDv +
 * penalty for each flyby below its minimum radius: 0.01 km/s per km short, 0.001 km/s per km
 * when rpMin ≥ 100,000 km (DESIGN.md; GTOP benchmarks, Vinkó & Izzo 2008). Infinity when a leg
 * has no solution. `spec` supplies the minimum radii. Allocation-free.
 */
export function tourObjective(result: TourResult, spec: TourSpec, objective: "vinf+dv" | "dv" = "vinf+dv"): number {
  if (result == null || typeof result !== "object" || !Array.isArray(result.flybys)) {
    throw new RangeError("tourObjective: result must be a TourResult from evaluateTour");
  }
  if (objective !== "vinf+dv" && objective !== "dv") {
    throw new RangeError(`tourObjective: objective must be 'vinf+dv' or 'dv' (got ${String(objective)})`);
  }
  let v = result.totalDv + (objective === "vinf+dv" ? result.launch.vinf : 0);
  if (!(v < Infinity)) return Infinity;
  const fl = result.flybys;
  for (let k = 0; k < fl.length; k++) {
    const f = fl[k]!;
    if (f.feasible) continue;
    const rpMin = rpMinFor(spec, f.body);
    const rate = rpMin >= 100000 ? 0.001 : 0.01;
    const rp = Number.isFinite(f.rp) ? f.rp : 0;
    v += rate * Math.max(0, rpMin - rp);
  }
  return v;
}
