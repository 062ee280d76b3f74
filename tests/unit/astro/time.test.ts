import { describe, expect, it } from "vitest";
import {
  isoToTdbSeconds,
  tdbSecondsToIso,
  jdToTdbSeconds,
  tdbSecondsToJd,
  mjd2000ToTdbSeconds,
  tdbSecondsToMjd2000,
  taiMinusUtcAt,
} from "@/lib/astro/time";

describe("time scales", () => {
  it("J2000.0 (JD 2451545.0 TT) is 2000-01-01T11:58:55.816Z UTC", () => {
    // Well-known: TT − UTC = 32 s (TAI−UTC, IERS Bulletin C) + 32.184 s = 64.184 s in 2000 (from memory).
    expect(isoToTdbSeconds("2000-01-01T11:58:55.816Z")).toBeCloseTo(0, 9);
    expect(tdbSecondsToIso(0)).toBe("2000-01-01T11:58:55.816Z");
    expect(isoToTdbSeconds("2000-01-01T12:00:00Z")).toBeCloseTo(64.184, 9);
  });

  it("uses TAI−UTC = 37 s since 2017-01-01 and 36 s before (IERS Bulletin C, from memory)", () => {
    const a = isoToTdbSeconds("2016-12-31T23:59:59Z");
    const b = isoToTdbSeconds("2017-01-01T00:00:00Z");
    // A leap second was inserted at the end of 2016: two UTC label-seconds apart in TDB.
    expect(b - a).toBeCloseTo(2, 9);
    expect(isoToTdbSeconds("2016-12-31T23:59:60Z") - a).toBeCloseTo(1, 9);
    expect(tdbSecondsToIso(a + 1)).toBe("2016-12-31T23:59:60.000Z");
    expect(tdbSecondsToIso(a + 1.5)).toBe("2016-12-31T23:59:60.500Z");
    expect(tdbSecondsToIso(b)).toBe("2017-01-01T00:00:00.000Z");
    const lbl = (Date.UTC(2026, 0, 1) - Date.UTC(2000, 0, 1, 12)) / 1000;
    expect(taiMinusUtcAt(lbl)).toBe(37);
  });

  it("leap-second table: 10 s on 1972-01-01, 33 s in 2006, 35 s in late 2012 (IERS Bulletin C, from memory)", () => {
    const at = (iso: string) => (Date.parse(iso) - Date.UTC(2000, 0, 1, 12)) / 1000;
    expect(taiMinusUtcAt(at("1972-01-01T00:00:00Z"))).toBe(10);
    expect(taiMinusUtcAt(at("1972-06-30T23:59:59Z"))).toBe(10);
    expect(taiMinusUtcAt(at("1972-07-01T00:00:00Z"))).toBe(11);
    expect(taiMinusUtcAt(at("2006-06-01T00:00:00Z"))).toBe(33);
    expect(taiMinusUtcAt(at("2012-12-01T00:00:00Z"))).toBe(35);
    expect(taiMinusUtcAt(at("2015-12-01T00:00:00Z"))).toBe(36);
  });

  it("round-trips ISO ↔ TDB seconds to the millisecond", () => {
    const samples = [
      "2026-01-01T00:00:00.000Z",
      "1997-10-15T08:43:00.000Z",
      "1980-02-29T23:59:59.999Z",
      "2049-12-31T12:34:56.789Z",
      "1972-07-01T00:00:00.000Z",
    ];
    for (const s of samples) expect(tdbSecondsToIso(isoToTdbSeconds(s))).toBe(s);
    let seed = 12345;
    const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (let k = 0; k < 2000; k++) {
      const t = (rnd() - 0.5) * 2 * 60 * 365.25 * 86400; // ±60 years around J2000
      const iso = tdbSecondsToIso(t);
      expect(Math.abs(isoToTdbSeconds(iso) - t)).toBeLessThanOrEqual(0.0005 + 1e-9);
    }
  });

  it("accepts date-only and offsets, treating no zone as UTC", () => {
    expect(isoToTdbSeconds("2026-01-01")).toBe(isoToTdbSeconds("2026-01-01T00:00:00Z"));
    expect(isoToTdbSeconds("2026-01-01T02:00:00+02:00")).toBe(isoToTdbSeconds("2026-01-01T00:00:00Z"));
    expect(isoToTdbSeconds("2026-01-01T00:00:00")).toBe(isoToTdbSeconds("2026-01-01T00:00:00Z"));
  });

  it("rejects invalid ISO strings with RangeError", () => {
    for (const bad of ["", "hello", "2026-13-01", "2026-02-30T00:00:00Z", "2026-01-01T24:00:00Z", "2026-1-1", "2026-01-01T00:61:00Z"]) {
      expect(() => isoToTdbSeconds(bad)).toThrow(RangeError);
    }
    expect(() => isoToTdbSeconds(42 as unknown as string)).toThrow(RangeError);
    expect(() => tdbSecondsToIso(Number.NaN)).toThrow(RangeError);
    expect(() => tdbSecondsToIso(1e15)).toThrow(RangeError);
  });

  it("JD and MJD2000 conversions (definitions: J2000.0 = JD 2451545.0, MJD2000 = JD − 2451544.5)", () => {
    expect(jdToTdbSeconds(2451545.0)).toBe(0);
    expect(jdToTdbSeconds(2451546.5)).toBe(1.5 * 86400);
    expect(tdbSecondsToJd(86400)).toBe(2451546.0);
    expect(mjd2000ToTdbSeconds(0)).toBe(-43200);
    expect(mjd2000ToTdbSeconds(0.5)).toBe(0);
    expect(tdbSecondsToMjd2000(mjd2000ToTdbSeconds(-789.8117))).toBeCloseTo(-789.8117, 10);
    expect(tdbSecondsToJd(jdToTdbSeconds(2460000.25))).toBeCloseTo(2460000.25, 8);
    // MJD2000 = JD − 2451544.5 for the same instant
    const jd = 2455197.5;
    expect(mjd2000ToTdbSeconds(jd - 2451544.5)).toBeCloseTo(jdToTdbSeconds(jd), 6);
    expect(() => jdToTdbSeconds(Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => mjd2000ToTdbSeconds(Number.NaN)).toThrow(RangeError);
  });
});
