/** One row of the benchmark table (scripts/bench.ts). */
export interface BenchRow {
  /** What was measured, e.g. "lambert single-rev solves". */
  name: string;
  /** The measured figure. */
  value: number;
  /** Unit of `value`, e.g. "solves/s". */
  unit: string;
  /** Target as text, e.g. "≥ 2,500,000". */
  target?: string;
  /** Whether the target was met (absent when there is no target). */
  pass?: boolean;
  /** Free text: conditions, caveats. */
  note?: string;
}

/** A benchmark section module: scripts/bench/<name>.ts exporting `run`. */
export interface BenchSection {
  run(): Promise<BenchRow[]>;
}
