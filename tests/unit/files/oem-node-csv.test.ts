/**
 * The OEM writer (layout: CCSDS 502.0-B Orbit Data Messages, KVN form, from memory) and the node
 * table CSV. A small OEM reader of our own reads the file back; its states are checked against
 * the tour's own evaluation (Lambert arcs) and the ephemeris.
 */
import { describe, expect, it } from "vitest";
import { evaluateTour } from "@/lib/astro/tour";
import { meanElementsEphemeris } from "@/lib/astro/ephemeris";
import { isoToTdbSeconds, tdbSecondsToIso } from "@/lib/astro/time";
import { BODIES } from "@/lib/astro/constants";
import type { TourSpec } from "@/lib/astro/types";
import { legEpochs, oemLineCount, parseTdbCalendar, sampleTourForOem, tdbCalendar, writeOem, OEM_REF_FRAME } from "@/lib/files/oem";
import { NODE_CSV_COLUMNS, writeNodeCsv } from "@/lib/files/node-csv";
import { parseOemForTest } from "../../support/oem-reader";

const DAY = 86400;
const eph = meanElementsEphemeris();
const spec: TourSpec = {
  nodes: [
    { body: "earth", epoch: isoToTdbSeconds("2031-04-01T00:00:00Z") },
    { body: "venus", epoch: isoToTdbSeconds("2031-09-10T00:00:00Z") },
    { body: "earth", epoch: isoToTdbSeconds("2032-08-20T00:00:00Z") },
  ],
  arrival: { kind: "rendezvous" },
};
const result = evaluateTour(spec, eph);
const dist = (a: ArrayLike<number>, b: ArrayLike<number>) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);

describe("TDB calendar epochs", () => {
  it("J2000.0 is 2000-01-01T12:00:00 TDB and round-trips", () => {
    expect(tdbCalendar(0)).toBe("2000-01-01T12:00:00.000");
    expect(parseTdbCalendar("2000-01-02T12:00:00")).toBe(DAY);
    const t = 987654321.125;
    expect(parseTdbCalendar(tdbCalendar(t))).toBeCloseTo(t, 6);
    // TDB ≈ UTC + 69.184 s in 2031 (37 leap seconds + 32.184 s)
    const utc = isoToTdbSeconds("2031-04-01T00:00:00Z");
    expect(tdbCalendar(utc)).toBe("2031-04-01T00:01:09.184");
  });
});

describe("legEpochs", () => {
  it("steps from the start and always ends exactly at the end", () => {
    expect(legEpochs(0, 10, 4)).toEqual([0, 4, 8, 10]);
    expect(legEpochs(0, 8, 4)).toEqual([0, 4, 8]);
    expect(oemLineCount({ nodes: [{ epoch: 0 }, { epoch: 8 }, { epoch: 10 }] as TourSpec["nodes"] }, 4)).toBe(4 + 2);
  });
});

describe("writeOem + sampleTourForOem", () => {
  const { segments, skipped } = sampleTourForOem(spec, result, eph, 2 * DAY);
  const text = writeOem(
    { objectName: "Test probe (invented)", objectId: "GYBE-TEST-1", originator: "GYBE", creationDate: new Date("2026-01-02T03:04:05Z"), comments: ["Frame: mean ecliptic and equinox of J2000"] },
    segments,
  );
  const oem = parseOemForTest(text);

  it("writes the KVN header and one segment per leg with the metadata the standard asks for", () => {
    expect(skipped).toEqual([]);
    expect(text.startsWith("CCSDS_OEM_VERS = 2.0\n")).toBe(true);
    expect(oem.header.CREATION_DATE).toBe("2026-01-02T03:04:05.000");
    expect(oem.header.ORIGINATOR).toBe("GYBE");
    expect(oem.segments).toHaveLength(2);
    for (const [k, s] of oem.segments.entries()) {
      expect(s.meta).toMatchObject({ OBJECT_NAME: "Test probe (invented)", OBJECT_ID: "GYBE-TEST-1", CENTER_NAME: "SUN", REF_FRAME: OEM_REF_FRAME, TIME_SYSTEM: "TDB" });
      expect(parseTdbCalendar(s.meta.START_TIME!)).toBeCloseTo(spec.nodes[k]!.epoch, 3);
      expect(parseTdbCalendar(s.meta.STOP_TIME!)).toBeCloseTo(spec.nodes[k + 1]!.epoch, 3);
      expect(s.states[0]!.t).toBeCloseTo(spec.nodes[k]!.epoch, 3);
      expect(s.states.at(-1)!.t).toBeCloseTo(spec.nodes[k + 1]!.epoch, 3);
    }
  });

  it("starts and ends each leg at the bodies' positions with the Lambert velocities", () => {
    for (const [k, s] of oem.segments.entries()) {
      const a = eph.state(spec.nodes[k]!.body, spec.nodes[k]!.epoch);
      const b = eph.state(spec.nodes[k + 1]!.body, spec.nodes[k + 1]!.epoch);
      const first = s.states[0]!;
      const last = s.states.at(-1)!;
      // 14 significant digits in the file: ~1e-5 km at 1.5e8 km.
      expect(dist(first.r, a.r)).toBeLessThan(1e-3);
      expect(dist(first.v, result.legs[k]!.v1)).toBeLessThan(1e-9);
      // Propagation of the Lambert arc lands on the arrival body (Lambert solver tolerance).
      expect(dist(last.r, b.r)).toBeLessThan(1);
      expect(dist(last.v, result.legs[k]!.v2)).toBeLessThan(1e-6);
    }
  });

  it("keeps the two-body energy constant along each leg", () => {
    const MU = 1.32712440018e11;
    for (const s of oem.segments) {
      const en = s.states.map((x) => Math.hypot(...x.v) ** 2 / 2 - MU / Math.hypot(...x.r));
      for (const e of en) expect(Math.abs(e - en[0]!) / Math.abs(en[0]!)).toBeLessThan(1e-9);
    }
  });

  it("samples at the requested step", () => {
    const s = oem.segments[0]!;
    expect(s.states[1]!.t - s.states[0]!.t).toBeCloseTo(2 * DAY, 3);
    expect(oem.segments.reduce((n, x) => n + x.states.length, 0)).toBeLessThanOrEqual(oemLineCount(spec, 2 * DAY));
  });

  it("leaves out a leg without a solution and says which", () => {
    const broken = { ...result, legs: [{ ...result.legs[0]!, v1: [NaN, NaN, NaN] as [number, number, number] }, result.legs[1]!] };
    const r = sampleTourForOem(spec, broken, eph, 10 * DAY);
    expect(r.skipped).toEqual([0]);
    expect(r.segments).toHaveLength(1);
  });
});

describe("writeNodeCsv", () => {
  it("writes one row per node with units in the header and the evaluation's numbers", () => {
    const nodes = spec.nodes.map((n, k) => ({ id: `n${k + 1}`, body: n.body, epoch: n.epoch }));
    const csv = writeNodeCsv({ nodes, result, rpMin: (b) => { const p = BODIES[b as "venus"]; return p ? p.radius + p.minFlybyAltitude : undefined; } });
    const lines = csv.trimEnd().split("\r\n").map((l) => l.split(","));
    expect(lines[0]).toEqual([...NODE_CSV_COLUMNS]);
    expect(lines).toHaveLength(4);
    const col = (name: string) => NODE_CSV_COLUMNS.indexOf(name as (typeof NODE_CSV_COLUMNS)[number]);
    expect(lines[1]![col("role")]).toBe("launch");
    expect(Number(lines[1]![col("c3_km2_s2")])).toBeCloseTo(result.launch.c3, 3);
    expect(lines[1]![col("epoch_utc")]).toBe(tdbSecondsToIso(spec.nodes[0]!.epoch));
    const f = result.flybys[0]!;
    expect(lines[2]![col("role")]).toBe("flyby");
    expect(Number(lines[2]![col("leg_tof_d")])).toBeCloseTo((spec.nodes[1]!.epoch - spec.nodes[0]!.epoch) / DAY, 3);
    expect(Number(lines[2]![col("turn_angle_deg")])).toBeCloseTo((f.turnAngle * 180) / Math.PI, 3);
    expect(Number(lines[2]![col("rp_km")])).toBeCloseTo(f.rp, 1);
    expect(Number(lines[2]![col("margin_km")])).toBeCloseTo(f.rp - (6051.8 + 300), 1);
    expect(lines[2]![col("feasible")]).toBe(f.feasible ? "yes" : "no");
    expect(lines[3]![col("role")]).toBe("arrival");
    expect(Number(lines[3]![col("dv_km_s")])).toBeCloseTo(result.arrival.dv, 4);
    expect(lines[3]![col("c3_km2_s2")]).toBe("");
  });
});
