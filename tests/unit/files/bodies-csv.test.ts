import { describe, expect, it } from "vitest";
import { parseBodiesCsv, writeBodiesCsv, BODY_CSV_COLUMNS } from "@/lib/files/bodies-csv";
import { slugify, bodyRecordOf, bodyInputOf } from "@/lib/validation/body";
import { AU_KM } from "@/lib/astro/constants";
import { isoToTdbSeconds } from "@/lib/astro/time";
import { trueToMeanAnomaly } from "@/lib/astro/anomaly";

const HEADER = BODY_CSV_COLUMNS.join(",");
const GOOD = "Brisa (invented),2031-03-01T00:00:00Z,2.1,0.15,4.5,80,30,45,0.8,6.5,40";
const GOOD2 = "Calder (invented),2031-03-01T00:00:00Z,1.9,0.05,1.5,10,300,200,0.1,3,10";

describe("slugify", () => {
  it("keeps lower-case letters, digits and single dashes", () => {
    expect(slugify("Aldra (invented)")).toBe("aldra-invented");
    expect(slugify("  Éole 2031 / B ")).toBe("eole-2031-b");
    expect(slugify("()")).toBe("");
  });
});

describe("parseBodiesCsv", () => {
  it("reads good rows, converts AU → km, degrees → rad and the mean anomaly → true anomaly", () => {
    const r = parseBodiesCsv(`${HEADER}\n${GOOD}\n${GOOD2}\n`);
    expect(r.ok).toBe(true);
    expect(r.rows).toHaveLength(2);
    const b = r.rows[0]!.record;
    expect(r.rows[0]!.line).toBe(2);
    expect(b.slug).toBe("brisa-invented");
    expect(b.aKm).toBeCloseTo(2.1 * AU_KM, 3);
    expect(b.iRad).toBeCloseTo((4.5 * Math.PI) / 180, 14);
    expect(b.epochTdbS).toBe(isoToTdbSeconds("2031-03-01T00:00:00Z"));
    // ν > M on the way out from perihelion (e > 0, 0 < M < π); and it maps back to 45°.
    expect(b.nuRad).toBeGreaterThan((45 * Math.PI) / 180);
    expect((trueToMeanAnomaly(b.nuRad, b.e) * 180) / Math.PI).toBeCloseTo(45, 10);
  });

  it("accepts a_km instead of a_au, any column order, CRLF, a BOM, quotes and blank lines", () => {
    const cols = ["a_km", ...BODY_CSV_COLUMNS.filter((c) => c !== "a_au")].join(",");
    const text = `\uFEFF${cols}\r\n\r\n${3e8},"Dune, the second (invented)",2031-03-01T00:00:00Z,0.15,4.5,80,30,45,0.8,6.5,40\r\n`;
    const r = parseBodiesCsv(text);
    expect(r.ok).toBe(true);
    expect(r.rows[0]!.record.aKm).toBe(3e8);
    expect(r.rows[0]!.record.name).toBe("Dune, the second (invented)");
    expect(r.rows[0]!.line).toBe(3);
  });

  it("reports every bad row by its line number in the file, with every reason, and returns ok: false", () => {
    const text = [
      HEADER,
      GOOD, // line 2
      "", // line 3 (blank)
      "Bad e (invented),2031-03-01T00:00:00Z,2.1,1.2,4.5,80,30,45,0.8,6.5,40", // line 4
      GOOD2, // line 5
      "Bad many (invented),not-a-date,-1,0.1,200,80,30,abc,0,6.5,-5", // line 6
      "Short (invented),2031-03-01T00:00:00Z,2.1", // line 7
      "Brisa (invented),2031-03-01T00:00:00Z,2.1,0.15,4.5,80,30,45,0.8,6.5,40", // line 8: duplicate of line 2
    ].join("\n");
    const r = parseBodiesCsv(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => e.line)).toEqual([4, 6, 7, 8]);
    expect(r.errors[0]!.reasons.join(" ")).toMatch(/^e: e must be < 1/);
    const many = r.errors[1]!.reasons.join(" | ");
    expect(many).toMatch(/epoch_utc/);
    expect(many).toMatch(/a_au: a must be > 0 AU/);
    expect(many).toMatch(/i_deg/);
    expect(many).toMatch(/m_deg: "abc" is not a number/);
    expect(many).toMatch(/mu_km3_s2/);
    expect(many).toMatch(/min_alt_km/);
    expect(r.errors[2]!.reasons[0]).toMatch(/expected 11 values, found 3/);
    expect(r.errors[3]!.reasons[0]).toMatch(/already used on line 2/);
    expect(r.message).toMatch(/4 rows are invalid/);
    expect(r.message).toMatch(/line 4/);
  });

  it("rejects a bad header on line 1", () => {
    const r = parseBodiesCsv("name,epoch,a_au\nX,2030-01-01,1\n");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[0]!.line).toBe(1);
    expect(r.errors[0]!.reasons.join(" ")).toMatch(/unknown column "epoch"/);
    expect(r.errors[0]!.reasons.join(" ")).toMatch(/missing column "epoch_utc"/);
    const both = parseBodiesCsv(`${HEADER},a_km\n`);
    expect(both.ok).toBe(false);
    if (!both.ok) expect(both.errors[0]!.reasons.join(" ")).toMatch(/exactly one of the columns "a_au" or "a_km"/);
  });

  it("rejects an empty file, a header without rows, and too many rows", () => {
    expect(parseBodiesCsv("").ok).toBe(false);
    const noRows = parseBodiesCsv(`${HEADER}\n`);
    expect(noRows.ok).toBe(false);
    if (!noRows.ok) expect(noRows.errors[0]!.reasons[0]).toMatch(/no bodies/);
    const rows = Array.from({ length: 4 }, (_, k) => GOOD.replace("Brisa", `Brisa${k}`));
    const many = parseBodiesCsv([HEADER, ...rows].join("\n"), { maxRows: 3 });
    expect(many.ok).toBe(false);
    if (!many.ok) {
      expect(many.tooManyRows).toBe(true);
      expect(many.errors[0]!.reasons[0]).toMatch(/at most 3 bodies/);
    }
  });

  it("rejects a perihelion inside the Sun and a semi-major axis given in km under a_au", () => {
    const r = parseBodiesCsv(`${HEADER}\nSungrazer (invented),2031-03-01T00:00:00Z,1,0.999,0,0,0,0,1,1,0\nKm (invented),2031-03-01T00:00:00Z,314000000,0.1,0,0,0,0,1,1,0\n`);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[0]!.reasons.join(" ")).toMatch(/perihelion/);
    expect(r.errors[1]!.reasons.join(" ")).toMatch(/use a_km/);
  });

  it("writeBodiesCsv round-trips through parseBodiesCsv", () => {
    const first = parseBodiesCsv(`${HEADER}\n${GOOD}\n${GOOD2}\n`);
    expect(first.ok).toBe(true);
    const again = parseBodiesCsv(writeBodiesCsv(first.rows.map((r) => r.record)));
    expect(again.ok).toBe(true);
    for (let k = 0; k < 2; k++) {
      const a = first.rows[k]!.record;
      const b = again.rows[k]!.record;
      expect(b.slug).toBe(a.slug);
      expect(b.aKm).toBeCloseTo(a.aKm, 1);
      expect(b.nuRad).toBeCloseTo(a.nuRad, 9);
      expect(b.epochTdbS).toBeCloseTo(a.epochTdbS, 3);
    }
  });

  it("bodyInputOf inverts bodyRecordOf", () => {
    const rec = parseBodiesCsv(`${HEADER}\n${GOOD}\n`).rows[0]!.record;
    const back = bodyRecordOf(bodyInputOf(rec));
    expect(back.nuRad).toBeCloseTo(rec.nuRad, 10);
    expect(back.raanRad).toBeCloseTo(rec.raanRad, 12);
  });
});
