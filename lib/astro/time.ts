/**
 * Time scales and epoch conversions.
 *
 * Epochs inside lib/astro are TDB seconds past J2000.0 (JD 2451545.0 TDB).
 * TDB is taken equal to TT (TT = TAI + 32.184 s); the periodic TDB−TT difference is below
 * 2 ms and is neglected. ISO dates are UTC: TAI−UTC comes from the IERS leap-second table.
 * Sources: IERS Bulletin C (leap seconds); IAU 1991 (TT = TAI + 32.184 s); IAU 2006 B3 (TDB).
 */
import { assertFinite } from "./vec3";

/** Julian date of J2000.0 (TDB). Source: definition of J2000.0. */
const JD_J2000 = 2451545.0;

/** TT − TAI, s. Source: IAU 1991 Resolution A4 (exact). */
export const TT_MINUS_TAI = 32.184;

/**
 * TAI−UTC (s) from each UTC date on which it changed (IERS Bulletin C, 1972-01-01 to 2017-01-01).
 * Before 1972-01-01 the value 10 s is used (UTC then had rubber seconds; approximation).
 * After the last entry the last value (37 s) holds until a new leap second is announced.
 */
export const LEAP_SECONDS: readonly { readonly date: string; readonly taiMinusUtc: number }[] = [
  { date: "1972-01-01", taiMinusUtc: 10 },
  { date: "1972-07-01", taiMinusUtc: 11 },
  { date: "1973-01-01", taiMinusUtc: 12 },
  { date: "1974-01-01", taiMinusUtc: 13 },
  { date: "1975-01-01", taiMinusUtc: 14 },
  { date: "1976-01-01", taiMinusUtc: 15 },
  { date: "1977-01-01", taiMinusUtc: 16 },
  { date: "1978-01-01", taiMinusUtc: 17 },
  { date: "1979-01-01", taiMinusUtc: 18 },
  { date: "1980-01-01", taiMinusUtc: 19 },
  { date: "1981-07-01", taiMinusUtc: 20 },
  { date: "1982-07-01", taiMinusUtc: 21 },
  { date: "1983-07-01", taiMinusUtc: 22 },
  { date: "1985-07-01", taiMinusUtc: 23 },
  { date: "1988-01-01", taiMinusUtc: 24 },
  { date: "1990-01-01", taiMinusUtc: 25 },
  { date: "1991-01-01", taiMinusUtc: 26 },
  { date: "1992-07-01", taiMinusUtc: 27 },
  { date: "1993-07-01", taiMinusUtc: 28 },
  { date: "1994-07-01", taiMinusUtc: 29 },
  { date: "1996-01-01", taiMinusUtc: 30 },
  { date: "1997-07-01", taiMinusUtc: 31 },
  { date: "1999-01-01", taiMinusUtc: 32 },
  { date: "2006-01-01", taiMinusUtc: 33 },
  { date: "2009-01-01", taiMinusUtc: 34 },
  { date: "2012-07-01", taiMinusUtc: 35 },
  { date: "2015-07-01", taiMinusUtc: 36 },
  { date: "2017-01-01", taiMinusUtc: 37 },
];

/** Unix ms of J2000.0 noon UTC label (2000-01-01T12:00:00Z). */
const UNIX_MS_2000_NOON = Date.UTC(2000, 0, 1, 12, 0, 0);

/** UTC seconds (past 2000-01-01T12:00:00 UTC label, no leap seconds counted) of each table entry. */
const LEAP_UTC_S: number[] = LEAP_SECONDS.map((e) => {
  const [y, m, d] = e.date.split("-").map(Number) as [number, number, number];
  return (Date.UTC(y, m - 1, d) - UNIX_MS_2000_NOON) / 1000;
});
/** The same instants as TAI seconds past the same origin (TAI = UTC + new offset). */
const LEAP_TAI_S: number[] = LEAP_SECONDS.map((e, k) => LEAP_UTC_S[k]! + e.taiMinusUtc);

/**
 * TAI−UTC, s, at a UTC instant given as "UTC label seconds" past 2000-01-01T12:00:00 (no leap
 * seconds counted). Valid for any date; 10 s before 1972. Source: IERS Bulletin C.
 */
export function taiMinusUtcAt(utcLabelSeconds: number): number {
  assertFinite("utcLabelSeconds", utcLabelSeconds);
  let off = 10;
  for (let k = 0; k < LEAP_UTC_S.length; k++) {
    if (utcLabelSeconds >= LEAP_UTC_S[k]!) off = LEAP_SECONDS[k]!.taiMinusUtc;
    else break;
  }
  return off;
}

const ISO_RE =
  /^([0-9]{4})-([0-9]{2})-([0-9]{2})(?:[T ]([0-9]{2}):([0-9]{2})(?::([0-9]{2})(?:\.([0-9]+))?)?)?(Z|[+-][0-9]{2}:?[0-9]{2})?$/;

function daysInMonth(y: number, m: number): number {
  return new Date(Date.UTC(y, m, 0)).getUTCDate();
}

/**
 * ISO 8601 date (UTC; `Z` or a ±hh:mm offset allowed, none means UTC; date-only means 00:00)
 * → TDB seconds past J2000.0. Adds TAI−UTC from the leap-second table and 32.184 s (TDB ≈ TT,
 * error < 2 ms). A leap second `23:59:60` is accepted on any day. Valid years 0001–9999
 * (before 1972, TAI−UTC is taken as 10 s). Throws RangeError for a malformed or impossible date.
 * Source: IERS Bulletin C; IAU 1991 (TT = TAI + 32.184 s).
 */
export function isoToTdbSeconds(iso: string): number {
  if (typeof iso !== "string") throw new RangeError(`iso must be a string (got ${typeof iso})`);
  const m = ISO_RE.exec(iso.trim());
  if (!m) throw new RangeError(`iso "${iso}" is not an ISO 8601 date such as 2026-01-01T00:00:00Z`);
  const y = Number(m[1]);
  const mo = Number(m[2]);
  const d = Number(m[3]);
  const hh = m[4] !== undefined ? Number(m[4]) : 0;
  const mi = m[5] !== undefined ? Number(m[5]) : 0;
  const ss = m[6] !== undefined ? Number(m[6]) : 0;
  const frac = m[7] !== undefined ? Number(`0.${m[7]}`) : 0;
  if (y < 1) throw new RangeError(`iso "${iso}": year must be 0001–9999`);
  if (mo < 1 || mo > 12) throw new RangeError(`iso "${iso}": month must be 01–12`);
  if (d < 1 || d > daysInMonth(y, mo)) throw new RangeError(`iso "${iso}": day out of range for the month`);
  if (hh > 23) throw new RangeError(`iso "${iso}": hour must be 00–23`);
  if (mi > 59) throw new RangeError(`iso "${iso}": minute must be 00–59`);
  if (ss > 60) throw new RangeError(`iso "${iso}": second must be 00–60`);
  let offsetMin = 0;
  const z = m[8];
  if (z !== undefined && z !== "Z") {
    const sign = z[0] === "-" ? -1 : 1;
    const digits = z.slice(1).replace(":", "");
    const oh = Number(digits.slice(0, 2));
    const om = Number(digits.slice(2, 4));
    if (oh > 23 || om > 59) throw new RangeError(`iso "${iso}": bad UTC offset`);
    offsetMin = sign * (oh * 60 + om);
  }
  // Date.UTC maps years 0–99 to 1900+; set the full year explicitly.
  const base = new Date(Date.UTC(2000, 0, 1));
  base.setUTCFullYear(y, mo - 1, d);
  base.setUTCHours(hh, mi, Math.min(ss, 59), 0);
  const labelS = (base.getTime() - UNIX_MS_2000_NOON) / 1000 - offsetMin * 60;
  // The leap-second offset is that in force at the labelled second (23:59:60 belongs to the old day).
  const dat = taiMinusUtcAt(labelS);
  return labelS + (ss === 60 ? 1 : 0) + frac + dat + TT_MINUS_TAI;
}

function pad(n: number, w: number): string {
  return String(n).padStart(w, "0");
}

/**
 * TDB seconds past J2000.0 → ISO 8601 UTC string with milliseconds and `Z`,
 * e.g. "2026-01-01T00:00:00.000Z" (rounded to the nearest ms; a leap second prints as 23:59:60).
 * Valid for results in years 0001–9999; throws RangeError otherwise or for a non-finite t.
 * Source: IERS Bulletin C; IAU 1991 (TT = TAI + 32.184 s); TDB ≈ TT (< 2 ms).
 */
export function tdbSecondsToIso(t: number): string {
  assertFinite("t (TDB seconds past J2000)", t);
  // Work in integer milliseconds of TAI to avoid rounding drift.
  const taiMs = Math.round((t - TT_MINUS_TAI) * 1000);
  const taiS = taiMs / 1000;
  let off = 10;
  let inLeap = false;
  for (let k = 0; k < LEAP_TAI_S.length; k++) {
    const thr = LEAP_TAI_S[k]!;
    if (taiS >= thr) off = LEAP_SECONDS[k]!.taiMinusUtc;
    else {
      // The inserted second 23:59:60 is the last second before the new offset takes effect.
      if (taiS >= thr - 1) inLeap = true;
      break;
    }
  }
  let labelMs = taiMs - off * 1000;
  if (inLeap) labelMs -= 1000; // report as 23:59:59.xxx + 1 s → printed as :60 below
  const date = new Date(UNIX_MS_2000_NOON + labelMs);
  const y = date.getUTCFullYear();
  if (!(y >= 1 && y <= 9999)) throw new RangeError(`t = ${t} s maps to year ${y}, outside 0001–9999`);
  const sec = inLeap ? 60 : date.getUTCSeconds();
  return (
    `${pad(y, 4)}-${pad(date.getUTCMonth() + 1, 2)}-${pad(date.getUTCDate(), 2)}` +
    `T${pad(date.getUTCHours(), 2)}:${pad(date.getUTCMinutes(), 2)}:${pad(sec, 2)}` +
    `.${pad(date.getUTCMilliseconds(), 3)}Z`
  );
}

/**
 * Julian date in TDB → TDB seconds past J2000.0: (jd − 2451545.0)·86400.
 * Any finite jd; double precision gives ~40 µs resolution near the present. Source: definition of J2000.0.
 */
export function jdToTdbSeconds(jd: number): number {
  assertFinite("jd", jd);
  return (jd - JD_J2000) * 86400;
}

/** TDB seconds past J2000.0 → Julian date in TDB (t/86400 + 2451545.0). Source: definition of J2000.0. */
export function tdbSecondsToJd(t: number): number {
  assertFinite("t (TDB seconds past J2000)", t);
  return t / 86400 + JD_J2000;
}

/**
 * MJD2000 (= JD − 2451544.5, days in TDB, as used by the GTOP benchmarks) → TDB seconds past
 * J2000.0: (d − 0.5)·86400. Any finite d. Source: definition of MJD2000 (Vinkó & Izzo, 2008).
 */
export function mjd2000ToTdbSeconds(d: number): number {
  assertFinite("d (MJD2000 days)", d);
  return (d - 0.5) * 86400;
}

/** TDB seconds past J2000.0 → MJD2000 days (t/86400 + 0.5). Source: definition of MJD2000. */
export function tdbSecondsToMjd2000(t: number): number {
  assertFinite("t (TDB seconds past J2000)", t);
  return t / 86400 + 0.5;
}
