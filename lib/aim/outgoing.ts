/**
 * Aim board logic (pure TypeScript, no React/DOM): from an aim point in the B-plane of one
 * flyby to the outgoing v∞, the outgoing heliocentric arc, and its closest approach to the next
 * body of the chain.
 *
 * Units: km, s, km/s, km³/s², rad. Frames: B-plane vectors are planet-centred in heliocentric
 * ecliptic J2000 axes; positions heliocentric ecliptic J2000. Epochs: TDB seconds past J2000.
 *
 * Model (patched conic): the incoming v∞ is fixed by the planned inbound leg (Lambert v2 minus
 * the body's velocity). An aim point (B·T, B·R) fixes the incoming hyperbola: rp solves
 * |B|² = rp² + 2μ·rp/v∞in². If the planned flyby is powered (|v∞out| ≠ |v∞in|), the planned
 * periapsis burn is kept: the outgoing hyperbola has the planned |v∞out| and the same rp, and
 * the turn is δ = asin(1/e_in) + asin(1/e_out) (e = 1 + rp·v∞²/μ); for an unpowered flyby this is
 * δ = 2·asin(1/e). The outgoing direction is v̂out = Ŝ·cos δ − B̂·sin δ (the path bends toward the
 * body). At the planned aim point this reproduces the planned outgoing v∞ exactly.
 * The spacecraft then leaves from the body's position with body velocity + v∞out and is
 * propagated about the Sun (two-body, MU_SUN, universal variables).
 * Sources: Curtis ch. 8 (hyperbola relations, powered flyby); Kizner (1961) B-plane;
 * Vallado Algorithm 8 (propagation).
 */
import { MU_SUN, BODIES } from "@/lib/astro/constants";
import { propagate } from "@/lib/astro/kepler";
import { bPlaneFromVinf, captureRadius, ECLIPTIC_POLE } from "@/lib/astro/bplane";
import type { BodyId, BodyPhysical, Ephemeris, PlanetId, TourResult, TourSpec, Vec3 } from "@/lib/astro/types";

export type AimPole = "ecliptic" | "spin";

/** Everything the drag update needs about one flyby; built once per board. */
export interface AimContext {
  /** Index of the flyby node in spec.nodes (1 … nodes − 2). */
  nodeIndex: number;
  body: BodyId;
  /** Flyby epoch, TDB s past J2000. */
  epoch: number;
  /** GM km³/s², equatorial radius km, minimum periapsis radius km. */
  mu: number;
  radius: number;
  rpMin: number;
  /** Incoming v∞, km/s, planet-relative, EclJ2000 axes; its magnitude. */
  vinfIn: Vec3;
  vinfInMag: number;
  /** Planned outgoing v∞ (km/s, EclJ2000) and its magnitude (kept for a powered flyby). */
  vinfOutPlanned: Vec3;
  vinfOutMag: number;
  /** Body state at the flyby epoch, km and km/s, heliocentric EclJ2000. */
  bodyR: Vec3;
  bodyV: Vec3;
  /** B-plane triad (unit vectors, EclJ2000 axes) for the chosen pole. */
  S: Vec3;
  T: Vec3;
  R: Vec3;
  pole: Vec3;
  poleKind: AimPole;
  /** The aim point that the planned next leg needs, km; rp km; turn angle rad. */
  planned: { bT: number; bR: number; rp: number; turnAngle: number };
  /** Impact radius and minimum-altitude radius in the B-plane, km (captureRadius). */
  impactRadius: number;
  minAltRadius: number;
  /** The next node: body, planned encounter epoch (TDB s), index in spec.nodes. */
  next: { body: BodyId; epoch: number; index: number };
  ephemeris: Ephemeris;
  /** Outgoing arc epochs (TDB s): arcPoints uniform samples over [epoch, next.epoch + 0.5·tof]. */
  arcEpochs: Float64Array;
  /** First arc sample considered for the closest approach (skips the departure from the body). */
  searchFrom: number;
}

export interface BuildAimContextInput {
  spec: TourSpec;
  result: TourResult;
  /** Index of the flyby in spec.nodes (must be an intermediate node). */
  nodeIndex: number;
  ephemeris: Ephemeris;
  /** B-plane reference pole (default ecliptic); 'spin' needs `spinPole`. */
  pole?: AimPole;
  /** Unit spin-pole vector in EclJ2000 (e.g. frames.spinPole(body, epoch)), used when pole = 'spin'. */
  spinPole?: Vec3;
  /** Samples of the outgoing arc (default 160, integer 16…4000). */
  arcPoints?: number;
}

const finite3 = (v: ArrayLike<number> | undefined): v is ArrayLike<number> =>
  v != null && v.length >= 3 && Number.isFinite(v[0]) && Number.isFinite(v[1]) && Number.isFinite(v[2]);

function physical(body: BodyId, spec: TourSpec): BodyPhysical | undefined {
  return (BODIES as Record<string, BodyPhysical>)[body as PlanetId] ?? spec.bodies?.[body];
}

function triad(S: Vec3, k: ArrayLike<number>): [Vec3, Vec3] {
  let tx = S[1] * k[2]! - S[2] * k[1]!;
  let ty = S[2] * k[0]! - S[0] * k[2]!;
  let tz = S[0] * k[1]! - S[1] * k[0]!;
  const tn = Math.hypot(tx, ty, tz);
  if (!(tn > 1e-12)) throw new RangeError("the incoming v∞ is parallel to the pole: the B-plane T axis is undefined");
  tx /= tn;
  ty /= tn;
  tz /= tn;
  return [
    [tx, ty, tz],
    [S[1] * tz - S[2] * ty, S[2] * tx - S[0] * tz, S[0] * ty - S[1] * tx],
  ];
}

/**
 * Builds the context of one flyby's Aim board from an evaluated tour.
 * @throws RangeError when nodeIndex is not a flyby of the tour, a leg around it has no solution,
 *   the body's physical data is unknown, or the geometry is degenerate.
 */
export function buildAimContext(input: BuildAimContextInput): AimContext {
  const { spec, result, nodeIndex, ephemeris } = input;
  const nodes = spec?.nodes;
  if (!Array.isArray(nodes)) throw new RangeError("spec.nodes must be an array");
  if (!Number.isInteger(nodeIndex) || nodeIndex < 1 || nodeIndex > nodes.length - 2) {
    throw new RangeError(`node ${nodeIndex} is not a flyby of this tour (flybys are nodes 1 … ${nodes.length - 2})`);
  }
  const arcPoints = input.arcPoints ?? 160;
  if (!Number.isInteger(arcPoints) || arcPoints < 16 || arcPoints > 4000) {
    throw new RangeError(`arcPoints must be an integer in [16, 4000] (got ${String(arcPoints)})`);
  }
  const node = nodes[nodeIndex]!;
  const nextNode = nodes[nodeIndex + 1]!;
  const inLeg = result?.legs?.[nodeIndex - 1];
  const outLeg = result?.legs?.[nodeIndex];
  if (!inLeg || !outLeg || !finite3(inLeg.v2) || !finite3(outLeg.v1)) {
    throw new RangeError("the legs around this flyby have no solution: there is no planned flyby to aim");
  }
  const phys = physical(node.body, spec);
  if (!phys) throw new RangeError(`no physical data (GM, radius) for body ${node.body}`);
  const rpMin = spec.rpMin?.[node.body] ?? phys.radius + phys.minFlybyAltitude;
  const st = ephemeris.state(node.body, node.epoch);
  const bodyR: Vec3 = [st.r[0], st.r[1], st.r[2]];
  const bodyV: Vec3 = [st.v[0], st.v[1], st.v[2]];
  const vinfIn: Vec3 = [inLeg.v2[0] - bodyV[0], inLeg.v2[1] - bodyV[1], inLeg.v2[2] - bodyV[2]];
  const vinfOutPlanned: Vec3 = [outLeg.v1[0] - bodyV[0], outLeg.v1[1] - bodyV[1], outLeg.v1[2] - bodyV[2]];
  const vinfInMag = Math.hypot(...vinfIn);
  const vinfOutMag = Math.hypot(...vinfOutPlanned);
  if (!(vinfInMag > 0) || !(vinfOutMag > 0)) throw new RangeError("zero v∞ at this flyby");
  const poleKind = input.pole ?? "ecliptic";
  let pole: Vec3 = [ECLIPTIC_POLE[0], ECLIPTIC_POLE[1], ECLIPTIC_POLE[2]];
  if (poleKind === "spin") {
    if (!finite3(input.spinPole)) throw new RangeError("pole 'spin' needs a finite spinPole vector");
    pole = [input.spinPole[0], input.spinPole[1], input.spinPole[2]];
  }
  const S: Vec3 = [vinfIn[0] / vinfInMag, vinfIn[1] / vinfInMag, vinfIn[2] / vinfInMag];
  const [T, R] = triad(S, pole);
  const bp = bPlaneFromVinf(vinfIn, vinfOutPlanned, phys.mu, pole);
  const tof = nextNode.epoch - node.epoch;
  if (!(tof > 0)) throw new RangeError("the next node is not after the flyby");
  const arcEpochs = new Float64Array(arcPoints);
  const span = tof * 1.5;
  for (let k = 0; k < arcPoints; k++) arcEpochs[k] = node.epoch + (span * k) / (arcPoints - 1);
  const skip = nextNode.body === node.body ? 0.3 : 0.05;
  const searchFrom = Math.min(arcPoints - 2, Math.ceil((skip / 1.5) * (arcPoints - 1)));
  return {
    nodeIndex,
    body: node.body,
    epoch: node.epoch,
    mu: phys.mu,
    radius: phys.radius,
    rpMin,
    vinfIn,
    vinfInMag,
    vinfOutPlanned,
    vinfOutMag,
    bodyR,
    bodyV,
    S,
    T,
    R,
    pole,
    poleKind,
    planned: { bT: bp.bT, bR: bp.bR, rp: bp.rp, turnAngle: bp.turnAngle },
    impactRadius: captureRadius(phys.radius, vinfInMag, phys.mu),
    minAltRadius: captureRadius(rpMin, vinfInMag, phys.mu),
    next: { body: nextNode.body, epoch: nextNode.epoch, index: nodeIndex + 1 },
    ephemeris,
    arcEpochs,
    searchFrom,
  };
}

/** Live readouts of one aim point. */
export interface AimReadout {
  /** The aim point, km; |B| km; θ = atan2(B·R, B·T) rad in (−π, π]. */
  bT: number;
  bR: number;
  b: number;
  theta: number;
  /** Periapsis radius and altitude above the equatorial radius, km. */
  rp: number;
  altitude: number;
  /** Turn angle between v∞in and v∞out, rad. */
  turnAngle: number;
  /** Outgoing v∞, km/s, planet-relative, EclJ2000; and its magnitude km/s. */
  vinfOut: Vec3;
  vinfOutMag: number;
  /** rp below the body radius (impact) / below the minimum periapsis radius. */
  impact: boolean;
  belowMin: boolean;
  /** Closest approach to the next body: distance km, epoch TDB s; onEdge when the minimum sits at
   * an end of the searched window (the true closest approach may lie outside it). */
  closest: { distance: number; epoch: number; onEdge: boolean };
  /** Distance km to the next body at its planned encounter epoch. */
  missAtPlanned: number;
  /** Closest-approach epoch minus the planned encounter epoch, s. */
  dtVsPlanned: number;
  /** Outgoing arc, km, heliocentric EclJ2000, xyz interleaved, at ctx.arcEpochs. */
  arc: Float64Array;
}

/**
 * Outgoing v∞ (km/s, EclJ2000 axes) for an aim point, with rp (km) and turn angle (rad); see the
 * module comment for the model. Writes into `out`.
 */
export function vinfOutForAim(ctx: AimContext, bT: number, bR: number, out: Vec3 = [0, 0, 0]): { vinfOut: Vec3; rp: number; turnAngle: number } {
  if (!Number.isFinite(bT) || !Number.isFinite(bR)) throw new RangeError(`aim point must be finite km (got ${bT}, ${bR})`);
  const vin = ctx.vinfInMag;
  const vout = ctx.vinfOutMag;
  const mu = ctx.mu;
  const b = Math.hypot(bT, bR);
  const k = mu / (vin * vin);
  const rp = (b * b) / (k + Math.sqrt(k * k + b * b));
  let delta: number;
  if (b === 0) {
    delta = Math.PI;
    out[0] = -ctx.S[0] * vout;
    out[1] = -ctx.S[1] * vout;
    out[2] = -ctx.S[2] * vout;
    return { vinfOut: out, rp, turnAngle: delta };
  }
  const eIn = 1 + (rp * vin * vin) / mu;
  const eOut = 1 + (rp * vout * vout) / mu;
  delta = Math.asin(1 / eIn) + Math.asin(1 / eOut);
  const bx = (bT * ctx.T[0] + bR * ctx.R[0]) / b;
  const by = (bT * ctx.T[1] + bR * ctx.R[1]) / b;
  const bz = (bT * ctx.T[2] + bR * ctx.R[2]) / b;
  const c = Math.cos(delta), s = Math.sin(delta);
  out[0] = vout * (c * ctx.S[0] - s * bx);
  out[1] = vout * (c * ctx.S[1] - s * by);
  out[2] = vout * (c * ctx.S[2] - s * bz);
  return { vinfOut: out, rp, turnAngle: delta };
}

/**
 * The drag update: aim point (B·T, B·R km) → outgoing v∞ → outgoing heliocentric arc → closest
 * approach to the next body (coarse scan of the arc samples, then golden-section refinement to
 * about a second). Allocates one arc buffer per call.
 * @throws RangeError for a non-finite aim point.
 */
export function aimUpdate(ctx: AimContext, bT: number, bR: number): AimReadout {
  const { vinfOut, rp, turnAngle } = vinfOutForAim(ctx, bT, bR, [0, 0, 0]);
  const r0 = ctx.bodyR;
  const v0: Vec3 = [ctx.bodyV[0] + vinfOut[0], ctx.bodyV[1] + vinfOut[1], ctx.bodyV[2] + vinfOut[2]];
  const eph = ctx.ephemeris;
  const next = ctx.next.body;
  const epochs = ctx.arcEpochs;
  const n = epochs.length;
  const arc = new Float64Array(3 * n);
  const dist = (t: number, write?: number): number => {
    const p = propagate(r0, v0, t - ctx.epoch, MU_SUN).r;
    if (write !== undefined) {
      arc[3 * write] = p[0];
      arc[3 * write + 1] = p[1];
      arc[3 * write + 2] = p[2];
    }
    const q = eph.state(next, t).r;
    return Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
  };
  let best = -1;
  let bestD = Infinity;
  arc[0] = r0[0];
  arc[1] = r0[1];
  arc[2] = r0[2];
  for (let k = 1; k < n; k++) {
    if (k < ctx.searchFrom) {
      const p = propagate(r0, v0, epochs[k]! - ctx.epoch, MU_SUN).r;
      arc[3 * k] = p[0];
      arc[3 * k + 1] = p[1];
      arc[3 * k + 2] = p[2];
      continue;
    }
    const d = dist(epochs[k]!, k);
    if (d < bestD) {
      bestD = d;
      best = k;
    }
  }
  // Golden-section refinement on [t(k−1), t(k+1)] (clamped to the searched window).
  const lo0 = Math.max(best - 1, ctx.searchFrom);
  const hi0 = Math.min(best + 1, n - 1);
  let ga = epochs[lo0]!;
  let gb = epochs[hi0]!;
  const g = (Math.sqrt(5) - 1) / 2;
  let c = gb - g * (gb - ga);
  let d = ga + g * (gb - ga);
  let fc = dist(c);
  let fd = dist(d);
  for (let it = 0; it < 48 && gb - ga > 0.5; it++) {
    if (fc < fd) {
      gb = d;
      d = c;
      fd = fc;
      c = gb - g * (gb - ga);
      fc = dist(c);
    } else {
      ga = c;
      c = d;
      fc = fd;
      d = ga + g * (gb - ga);
      fd = dist(d);
    }
  }
  let tBest = fc < fd ? c : d;
  let dBest = Math.min(fc, fd);
  if (bestD < dBest) {
    dBest = bestD;
    tBest = epochs[best]!;
  }
  const onEdge = best === ctx.searchFrom || best === n - 1;
  const missAtPlanned = dist(ctx.next.epoch);
  const b = Math.hypot(bT, bR);
  let theta = Math.atan2(bR, bT);
  if (theta <= -Math.PI) theta = Math.PI;
  return {
    bT,
    bR,
    b,
    theta,
    rp,
    altitude: rp - ctx.radius,
    turnAngle,
    vinfOut,
    vinfOutMag: ctx.vinfOutMag,
    impact: rp < ctx.radius,
    belowMin: rp < ctx.rpMin,
    closest: { distance: dBest, epoch: tBest, onEdge },
    missAtPlanned,
    dtVsPlanned: tBest - ctx.next.epoch,
    arc,
  };
}
