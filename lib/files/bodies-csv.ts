/**
 * The small-body CSV (DESIGN.md "Files in and out"):
 *
 *   name,epoch_utc,a_au,e,i_deg,raan_deg,argp_deg,m_deg,mu_km3_s2,radius_km,min_alt_km
 *
 * Osculating heliocentric elements, mean ecliptic and equinox of J2000; epoch an ISO UTC date;
 * `a_km` may replace `a_au`; columns in any order; a UTF-8 BOM, CRLF line ends, quoted fields
 * and blank lines are accepted. Every row is checked with the same schema as the form
 * (`bodyInputSchema`); every bad row is reported with its line number in the file (the header
 * is line 1) and every reason. Pure: no database (the caller checks names already in the catalog).
 */
import Papa from "papaparse";
import * as v from "valibot";
import { bodyInputSchema, bodyRecordOf, bodyInputOf, type BodyRecord } from "@/lib/validation/body";

export const BODY_CSV_COLUMNS = ["name", "epoch_utc", "a_au", "e", "i_deg", "raan_deg", "argp_deg", "m_deg", "mu_km3_s2", "radius_km", "min_alt_km"] as const;
const REQUIRED = BODY_CSV_COLUMNS.filter((c) => c !== "a_au");
const KNOWN = new Set<string>([...BODY_CSV_COLUMNS, "a_km"]);

/** Upload limits: the route answers 413 above MAX_BYTES and 400 above MAX_ROWS. */
export const BODY_CSV_MAX_BYTES = 256 * 1024;
export const BODY_CSV_MAX_ROWS = 500;

/** Input field → CSV column, so messages name what the user wrote. */
const COLUMN_OF: Record<string, string> = {
  name: "name",
  epochUtc: "epoch_utc",
  aAu: "a_au",
  aKm: "a_km",
  e: "e",
  iDeg: "i_deg",
  raanDeg: "raan_deg",
  argpDeg: "argp_deg",
  mDeg: "m_deg",
  muKm3S2: "mu_km3_s2",
  radiusKm: "radius_km",
  minAltKm: "min_alt_km",
};
const FIELD_OF: Record<string, string> = Object.fromEntries(Object.entries(COLUMN_OF).map(([f, c]) => [c, f]));

export interface CsvRowError {
  /** Line number in the file (the header is line 1). */
  line: number;
  /** Every reason this row is bad, each prefixed with its column. */
  reasons: string[];
}

export interface ParsedBodyRow {
  line: number;
  record: BodyRecord;
}

export type BodiesCsvResult =
  | { ok: true; rows: ParsedBodyRow[] }
  | { ok: false; rows: ParsedBodyRow[]; errors: CsvRowError[]; message: string; tooManyRows?: boolean };

const NUMBER_RE = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function cell(raw: string | undefined): string {
  return (raw ?? "").trim();
}

/** Count "\n" in text[from, to). */
function newlines(text: string, from: number, to: number): number {
  let n = 0;
  for (let i = text.indexOf("\n", from); i !== -1 && i < to; i = text.indexOf("\n", i + 1)) n++;
  return n;
}

export function summarizeErrors(errors: CsvRowError[]): string {
  const shown = errors.slice(0, 3).map((e) => `line ${e.line}: ${e.reasons.join("; ")}`);
  const more = errors.length > 3 ? ` (and ${errors.length - 3} more)` : "";
  return `${errors.length === 1 ? "1 row is" : `${errors.length} rows are`} invalid, nothing was imported — ${shown.join(" · ")}${more}`;
}

/**
 * Parse and validate a bodies CSV. `ok: false` lists every bad line; `rows` holds the valid
 * rows either way (the caller must import nothing unless `ok`). Duplicate names inside the file
 * (the same derived body id) are errors on the later line.
 */
export function parseBodiesCsv(input: string, opts: { maxRows?: number } = {}): BodiesCsvResult {
  const maxRows = opts.maxRows ?? BODY_CSV_MAX_ROWS;
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  const records: { line: number; fields: string[] }[] = [];
  const parseErrors = new Map<number, string[]>();
  let prevCursor = 0;
  let lineAt = 1; // line number of the character at prevCursor
  Papa.parse<string[]>(text, {
    header: false,
    skipEmptyLines: false,
    step: (res) => {
      // The record starts after the previous cursor; skip the line break that ended the previous record.
      let start = prevCursor;
      if (text[start] === "\r") start++;
      if (text[start] === "\n") start++;
      const line = lineAt + newlines(text, prevCursor, start);
      const end = res.meta.cursor;
      lineAt = line + newlines(text, start, end);
      prevCursor = end;
      const fields = res.data;
      if (res.errors.length) parseErrors.set(line, res.errors.map((e) => e.message));
      if (fields.length === 1 && fields[0]!.trim() === "") return; // blank line
      records.push({ line, fields });
    },
  });

  const fail = (errors: CsvRowError[], extra: { tooManyRows?: boolean } = {}): BodiesCsvResult => ({
    ok: false,
    rows: [],
    errors,
    message: summarizeErrors(errors),
    ...extra,
  });

  const header = records.shift();
  if (!header) return fail([{ line: 1, reasons: [`the file is empty: the first line must be the header ${BODY_CSV_COLUMNS.join(",")}`] }]);
  const cols = header.fields.map((h) => h.trim().toLowerCase());
  const headerReasons: string[] = [];
  const seenCols = new Set<string>();
  for (const c of cols) {
    if (!KNOWN.has(c)) headerReasons.push(`unknown column "${c}"`);
    else if (seenCols.has(c)) headerReasons.push(`column "${c}" appears twice`);
    seenCols.add(c);
  }
  for (const c of REQUIRED) if (!seenCols.has(c)) headerReasons.push(`missing column "${c}"`);
  if (seenCols.has("a_au") === seenCols.has("a_km")) headerReasons.push('give exactly one of the columns "a_au" or "a_km"');
  if (headerReasons.length) return fail([{ line: header.line, reasons: headerReasons }]);

  if (records.length === 0) return fail([{ line: header.line + 1, reasons: ["no bodies: the file has a header but no rows"] }]);
  if (records.length > maxRows) {
    return fail([{ line: records[maxRows]!.line, reasons: [`too many rows: at most ${maxRows} bodies per file (this file has ${records.length})`] }], { tooManyRows: true });
  }

  const errors: CsvRowError[] = [];
  const rows: ParsedBodyRow[] = [];
  const slugLine = new Map<string, number>();
  for (const rec of records) {
    const reasons: string[] = [...(parseErrors.get(rec.line) ?? [])];
    if (rec.fields.length !== cols.length) {
      reasons.push(`expected ${cols.length} values, found ${rec.fields.length}`);
      errors.push({ line: rec.line, reasons });
      continue;
    }
    const obj: Record<string, unknown> = {};
    cols.forEach((c, k) => {
      const field = FIELD_OF[c]!;
      const raw = cell(rec.fields[k]);
      if (c === "name" || c === "epoch_utc") obj[field] = raw;
      else if (raw === "") reasons.push(`${c}: a value is required`);
      else if (!NUMBER_RE.test(raw)) reasons.push(`${c}: "${raw.slice(0, 24)}" is not a number`);
      else obj[field] = Number(raw);
    });
    const r = v.safeParse(bodyInputSchema, obj);
    if (!r.success) {
      for (const issue of r.issues) {
        const path = v.getDotPath(issue);
        const col = path ? (COLUMN_OF[path] ?? path) : null;
        // A missing number was reported above already.
        if (col && obj[path!] === undefined && col !== "name" && col !== "epoch_utc") continue;
        reasons.push(col ? `${col}: ${issue.message}` : issue.message);
      }
    }
    if (reasons.length === 0 && r.success) {
      const record = bodyRecordOf(r.output);
      const first = slugLine.get(record.slug);
      if (first !== undefined) reasons.push(`name: "${record.name}" gives the body id custom:${record.slug}, already used on line ${first}`);
      else {
        slugLine.set(record.slug, rec.line);
        rows.push({ line: rec.line, record });
      }
    }
    if (reasons.length) errors.push({ line: rec.line, reasons });
  }
  if (errors.length) return { ok: false, rows, errors, message: summarizeErrors(errors) };
  return { ok: true, rows };
}

function csvCell(x: string | number): string {
  const s = String(x);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Write records as a bodies CSV (a_au, degrees, mean anomaly): what `parseBodiesCsv` reads back. */
export function writeBodiesCsv(records: Omit<BodyRecord, "slug">[]): string {
  const lines = [BODY_CSV_COLUMNS.join(",")];
  for (const r of records) {
    const b = bodyInputOf(r);
    lines.push(
      [b.name, b.epochUtc, b.aAu!, b.e, b.iDeg, b.raanDeg, b.argpDeg, b.mDeg, b.muKm3S2, b.radiusKm, b.minAltKm].map(csvCell).join(","),
    );
  }
  return lines.join("\r\n") + "\r\n";
}
