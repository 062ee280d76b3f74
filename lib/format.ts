/** Display helpers (edges only: the core keeps TDB seconds, km, km/s). */
import { tdbSecondsToIso } from "@/lib/astro/time";

/** TDB seconds → "YYYY-MM-DD" (UTC calendar date). */
export function dateOf(t: number | null | undefined): string {
  if (t === null || t === undefined || !Number.isFinite(t)) return "—";
  return tdbSecondsToIso(t).slice(0, 10);
}

/** TDB seconds → "YYYY-MM-DD HH:MM" (UTC). */
export function dateTimeOf(t: number | null | undefined): string {
  if (t === null || t === undefined || !Number.isFinite(t)) return "—";
  const iso = tdbSecondsToIso(t);
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)}`;
}

export function days(seconds: number | null | undefined): number | null {
  return seconds === null || seconds === undefined || !Number.isFinite(seconds) ? null : seconds / 86400;
}

export function bodyLabel(id: string): string {
  if (id.startsWith("custom:")) return id.slice(7).replace(/(^|-)([a-z])/g, (_m, d: string, c: string) => (d ? " " : "") + c.toUpperCase());
  return id.charAt(0).toUpperCase() + id.slice(1);
}

/** A wall-clock timestamp (ISO string) → "YYYY-MM-DD HH:MM UTC". */
export function stamp(iso: string): string {
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}
