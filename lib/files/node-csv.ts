/**
 * A tour's node table as CSV: one row per node (launch, flybys, arrival), numbers in the units
 * named in each column header, epochs as ISO UTC dates, angles in degrees. Empty cells where a
 * value does not apply to the node (no C3 at a flyby) or does not exist (a leg without a
 * Lambert solution). Pure: no database.
 */
import { tdbSecondsToIso } from "@/lib/astro/time";
import type { TourResult } from "@/lib/astro/types";

export const NODE_CSV_COLUMNS = [
  "node",
  "node_id",
  "role",
  "body",
  "epoch_utc",
  "leg_tof_d",
  "vinf_in_km_s",
  "vinf_out_km_s",
  "turn_angle_deg",
  "rp_km",
  "altitude_km",
  "rp_min_km",
  "margin_km",
  "dv_km_s",
  "c3_km2_s2",
  "feasible",
] as const;

export interface NodeCsvInput {
  nodes: { id: string; body: string; epoch: number }[];
  result: TourResult;
  /** Minimum periapsis radius of a flyby body, km (tour override or radius + default altitude). */
  rpMin: (body: string) => number | undefined;
}

function num(x: number | undefined | null, digits: number): string {
  return x === undefined || x === null || !Number.isFinite(x) ? "" : x.toFixed(digits);
}

function cell(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

const DEG = 180 / Math.PI;

/** Rows of the node table (header first), as arrays of strings. */
export function nodeTableRows({ nodes, result, rpMin }: NodeCsvInput): string[][] {
  const rows: string[][] = [[...NODE_CSV_COLUMNS]];
  const last = nodes.length - 1;
  nodes.forEach((n, k) => {
    const tof = k > 0 ? (n.epoch - nodes[k - 1]!.epoch) / 86400 : undefined;
    const base = [String(k), n.id, k === 0 ? "launch" : k === last ? "arrival" : "flyby", n.body, tdbSecondsToIso(n.epoch), num(tof, 3)];
    if (k === 0) {
      rows.push([...base, "", num(result.launch.vinf, 4), "", "", "", "", "", "", num(result.launch.c3, 4), ""]);
    } else if (k === last) {
      rows.push([...base, num(result.arrival.vinf, 4), "", "", "", "", "", "", num(result.arrival.dv, 4), "", ""]);
    } else {
      const f = result.flybys[k - 1];
      const min = rpMin(n.body);
      const margin = f && min !== undefined ? f.rp - min : undefined;
      rows.push([
        ...base,
        num(f?.vinfIn, 4),
        num(f?.vinfOut, 4),
        num(f ? f.turnAngle * DEG : undefined, 3),
        num(f?.rp, 1),
        num(f?.altitude, 1),
        num(min, 1),
        num(margin, 1),
        num(f?.dv, 4),
        "",
        f ? (f.feasible ? "yes" : "no") : "",
      ]);
    }
  });
  return rows;
}

/** The node table as CSV text (CRLF line ends, RFC 4180 quoting). */
export function writeNodeCsv(input: NodeCsvInput): string {
  return nodeTableRows(input).map((r) => r.map(cell).join(",")).join("\r\n") + "\r\n";
}
