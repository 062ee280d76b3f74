/**
 * CCSDS Orbit Ephemeris Message (OEM), keyword = value notation (KVN), for a tour's
 * heliocentric trajectory. Layout from the CCSDS 502.0-B Orbit Data Messages standard (from
 * memory): a header (CCSDS_OEM_VERS, CREATION_DATE in UTC, ORIGINATOR), then one segment per
 * leg, each a META_START … META_STOP block (OBJECT_NAME, OBJECT_ID, CENTER_NAME, REF_FRAME,
 * TIME_SYSTEM, START_TIME, STOP_TIME) followed by data lines "epoch x y z x_dot y_dot z_dot"
 * in km and km/s. COMMENT lines are allowed at the top of the header, the metadata and the data.
 *
 * Frame: REF_FRAME = ECLIPJ2000, the mean ecliptic and equinox of J2000. From memory: the
 * version 2 standard's annex of frame names lists EME2000, ICRF, GCRF, ITRF…, TOD, TEME and
 * others but no ecliptic frame; later versions defer to the SANA frame registry, where we recall
 * the ecliptic J2000 frame as ECLIPJ2000 (the name SPICE uses too) — not verified against the
 * registry. Each file also states the frame in a COMMENT so no reader has to guess.
 *
 * Time: TIME_SYSTEM = TDB, so every epoch in the file (START_TIME, STOP_TIME, data lines) is a
 * TDB calendar date: J2000.0 = 2000-01-01T12:00:00 TDB plus the TDB seconds, no leap seconds.
 * CREATION_DATE is UTC, as the standard asks.
 *
 * Pure: no database, no DOM. Sampling uses two-body propagation about the Sun (kepler.propagate)
 * from the departure body's position and the leg's Lambert velocity, the same arc the tour's
 * evaluation assumes.
 */
import { MU_SUN } from "@/lib/astro/constants";
import { propagate } from "@/lib/astro/kepler";
import type { Ephemeris, TourResult, TourSpec, Vec3 } from "@/lib/astro/types";

export const OEM_REF_FRAME = "ECLIPJ2000";
export const OEM_VERSION = "2.0";
/** Limits on a sampled export: step in days and total data lines. */
export const OEM_MIN_STEP_DAYS = 0.01;
export const OEM_MAX_STEP_DAYS = 365;
export const OEM_MAX_LINES = 200_000;

const J2000_UNIX_MS = Date.UTC(2000, 0, 1, 12, 0, 0);

/** TDB seconds past J2000 → TDB calendar "YYYY-MM-DDThh:mm:ss.sss" (uniform seconds, no leap seconds). */
export function tdbCalendar(t: number): string {
  if (!Number.isFinite(t)) throw new RangeError(`epoch must be finite (got ${t})`);
  const ms = Math.round(t * 1000);
  return new Date(J2000_UNIX_MS + ms).toISOString().replace("Z", "");
}

/** TDB calendar string (as written by `tdbCalendar`, or with more or fewer decimals) → TDB seconds past J2000. */
export function parseTdbCalendar(s: string): number {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(\.\d+)?$/.exec(s.trim());
  if (!m) throw new RangeError(`"${s}" is not an epoch of the form YYYY-MM-DDThh:mm:ss[.sss]`);
  const whole = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]), Number(m[4]), Number(m[5]), Number(m[6]));
  return (whole - J2000_UNIX_MS) / 1000 + (m[7] ? Number(m[7]) : 0);
}

export interface OemState {
  /** TDB s past J2000. */
  t: number;
  /** km, heliocentric ecliptic J2000. */
  r: ArrayLike<number>;
  /** km/s, heliocentric ecliptic J2000. */
  v: ArrayLike<number>;
}

export interface OemSegment {
  /** Comment lines written after META_STOP, before the data. */
  comments?: string[];
  states: OemState[];
}

export interface OemHeader {
  objectName: string;
  objectId: string;
  originator: string;
  /** Wall-clock time of writing (UTC). */
  creationDate: Date;
  comments?: string[];
}

/** KVN values are single-line; keep them to printable ASCII-ish text without line breaks. */
function kvnValue(s: string): string {
  return s.replace(/[\r\n]+/g, " ").trim();
}

function fmt(x: number): string {
  return x.toExponential(13);
}

/** Write an OEM in KVN form. Segments must each hold at least one state, in increasing time. */
export function writeOem(header: OemHeader, segments: OemSegment[]): string {
  if (segments.length === 0) throw new RangeError("an OEM needs at least one segment");
  const out: string[] = [];
  out.push(`CCSDS_OEM_VERS = ${OEM_VERSION}`);
  for (const c of header.comments ?? []) out.push(`COMMENT ${kvnValue(c)}`);
  out.push(`CREATION_DATE = ${header.creationDate.toISOString().replace("Z", "")}`);
  out.push(`ORIGINATOR = ${kvnValue(header.originator)}`);
  for (const seg of segments) {
    if (seg.states.length === 0) throw new RangeError("an OEM segment needs at least one state");
    const first = seg.states[0]!;
    const last = seg.states[seg.states.length - 1]!;
    out.push("");
    out.push("META_START");
    out.push(`OBJECT_NAME = ${kvnValue(header.objectName)}`);
    out.push(`OBJECT_ID = ${kvnValue(header.objectId)}`);
    out.push("CENTER_NAME = SUN");
    out.push(`REF_FRAME = ${OEM_REF_FRAME}`);
    out.push("TIME_SYSTEM = TDB");
    out.push(`START_TIME = ${tdbCalendar(first.t)}`);
    out.push(`STOP_TIME = ${tdbCalendar(last.t)}`);
    out.push("META_STOP");
    out.push("");
    for (const c of seg.comments ?? []) out.push(`COMMENT ${kvnValue(c)}`);
    for (const s of seg.states) {
      out.push([tdbCalendar(s.t), fmt(s.r[0]!), fmt(s.r[1]!), fmt(s.r[2]!), fmt(s.v[0]!), fmt(s.v[1]!), fmt(s.v[2]!)].join(" "));
    }
  }
  return out.join("\n") + "\n";
}

/** Epochs of one leg sampled every `stepS` from t0, always ending exactly at t1. */
export function legEpochs(t0: number, t1: number, stepS: number): number[] {
  const out: number[] = [];
  const n = Math.floor((t1 - t0) / stepS);
  for (let j = 0; j <= n; j++) {
    const t = t0 + j * stepS;
    if (t1 - t > 1e-3) out.push(t); // drop a sample within 1 ms of the end: the end is added below
  }
  out.push(t1);
  return out;
}

/** How many data lines `sampleTourForOem` would write (to refuse an oversize request early). */
export function oemLineCount(spec: Pick<TourSpec, "nodes">, stepS: number): number {
  let n = 0;
  for (let k = 0; k + 1 < spec.nodes.length; k++) {
    const tof = spec.nodes[k + 1]!.epoch - spec.nodes[k]!.epoch;
    if (tof > 0) n += Math.floor(tof / stepS) + 2;
  }
  return n;
}

/**
 * One OEM segment per leg that has a Lambert solution: states every `stepS` seconds from the
 * departure epoch to the arrival epoch (both included). Legs without a solution are left out
 * and listed in `skipped` (leg index) so the caller can say so.
 */
export function sampleTourForOem(
  spec: TourSpec,
  result: TourResult,
  ephemeris: Ephemeris,
  stepS: number,
  bodyName: (id: string) => string = (id) => id,
): { segments: OemSegment[]; skipped: number[] } {
  if (!(stepS > 0) || !Number.isFinite(stepS)) throw new RangeError(`step must be a positive number of seconds (got ${stepS})`);
  const segments: OemSegment[] = [];
  const skipped: number[] = [];
  for (let k = 0; k + 1 < spec.nodes.length; k++) {
    const a = spec.nodes[k]!;
    const b = spec.nodes[k + 1]!;
    const leg = result.legs[k];
    const v1 = leg?.v1;
    if (!leg || !v1 || !v1.every(Number.isFinite) || !(b.epoch > a.epoch)) {
      skipped.push(k);
      continue;
    }
    const r0 = ephemeris.state(a.body, a.epoch).r as Vec3;
    const states: OemState[] = legEpochs(a.epoch, b.epoch, stepS).map((t) => {
      if (t === a.epoch) return { t, r: r0, v: v1 };
      const s = propagate(r0, v1, t - a.epoch, MU_SUN);
      return { t, r: s.r, v: s.v };
    });
    segments.push({
      comments: [`Leg ${k + 1}: ${bodyName(a.body)} to ${bodyName(b.body)}${leg.revs ? `, ${leg.revs} revolution(s)` : ""}; heliocentric two-body arc (patched conics)`],
      states,
    });
  }
  return { segments, skipped };
}
