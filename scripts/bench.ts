/**
 * Benchmark runner: `npm run bench` (all sections) or `npm run bench -- lambert` (one or more
 * sections by name). Runs the section modules listed below in order, prints a table and writes
 * bench/results.json (date, Node version, CPU count, all rows). A missing section module or one
 * that throws is reported and skipped. Figures are wall-clock on a shared machine: noisy.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { BenchRow } from "./bench/types";

/** Sections in run order; each is scripts/bench/<name>.ts exporting `run(): Promise<BenchRow[]>`. */
const SECTIONS = ["lambert", "ephemeris", "tour", "search", "aim"] as const;

interface SectionResult {
  section: string;
  ok: boolean;
  error?: string;
  rows: BenchRow[];
}

function fmt(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  if (Math.abs(v) >= 1000) return Math.round(v).toLocaleString("en-US");
  return Number(v.toPrecision(4)).toString();
}

function printTable(results: SectionResult[]): void {
  const lines: string[][] = [["section", "name", "value", "unit", "target", "pass", "note"]];
  for (const r of results) {
    if (!r.ok) {
      lines.push([r.section, "(section failed)", "", "", "", "", r.error ?? ""]);
      continue;
    }
    for (const row of r.rows) {
      lines.push([
        r.section,
        row.name,
        fmt(row.value),
        row.unit,
        row.target ?? "",
        row.pass === undefined ? "" : row.pass ? "yes" : "NO",
        row.note ?? "",
      ]);
    }
  }
  const widths = lines[0]!.map((_, c) => Math.max(...lines.map((l) => (l[c] ?? "").length)));
  for (const [i, l] of lines.entries()) {
    console.log(l.map((cell, c) => cell.padEnd(widths[c] ?? 0)).join("  ").trimEnd());
    if (i === 0) console.log(widths.map((w) => "-".repeat(w)).join("  "));
  }
}

async function main(): Promise<void> {
  const filter = process.argv.slice(2).filter((a) => !a.startsWith("-"));
  const unknown = filter.filter((f) => !(SECTIONS as readonly string[]).includes(f));
  if (unknown.length > 0) {
    console.error(`unknown section(s): ${unknown.join(", ")}; known: ${SECTIONS.join(", ")}`);
    process.exitCode = 2;
    return;
  }
  const chosen = filter.length > 0 ? SECTIONS.filter((s) => filter.includes(s)) : [...SECTIONS];
  const results: SectionResult[] = [];
  for (const section of chosen) {
    console.error(`[bench] ${section} …`);
    try {
      const mod = (await import(`./bench/${section}.ts`)) as { run?: () => Promise<BenchRow[]> };
      if (typeof mod.run !== "function") throw new Error(`scripts/bench/${section}.ts has no run()`);
      const rows = await mod.run();
      results.push({ section, ok: true, rows });
    } catch (err) {
      const msg = err instanceof Error ? err.message : String(err);
      console.error(`[bench] section ${section} failed: ${msg}`);
      results.push({ section, ok: false, error: msg.split("\n")[0], rows: [] });
    }
  }
  printTable(results);
  const outDir = path.resolve(process.cwd(), "bench");
  mkdirSync(outDir, { recursive: true });
  const report = {
    date: new Date().toISOString(),
    node: process.version,
    cpus: os.cpus().length,
    cpuModel: os.cpus()[0]?.model ?? "unknown",
    sections: chosen,
    results,
    rows: results.flatMap((r) => r.rows.map((row) => ({ section: r.section, ...row }))),
  };
  writeFileSync(path.join(outDir, "results.json"), JSON.stringify(report, null, 2) + "\n");
  console.error(`[bench] wrote ${path.join(outDir, "results.json")}`);
}

void main();
