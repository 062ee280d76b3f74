/**
 * The object the search Web Worker exposes through comlink: row blocks of a window scan and
 * one island of a tour search. Everything that crosses is structured-cloneable; the worker
 * builds its Ephemeris from an EphemerisSpec ('vsop' always through the Hermite cache) and
 * keeps it between calls so its tables are reused. Scan arrays come back transferred, not copied.
 */
import { transfer } from "comlink";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { porkchop, runIsland, type IslandTask, type SearchProgress } from "@/lib/astro/search";
import type { EphemerisSpec, FastEphemeris, PorkchopGrid, SearchCandidate } from "@/lib/astro/types";

/** One worker's share of a window scan: departures[rowStart … rowEnd) of the full grid. */
export interface ScanTask {
  grid: PorkchopGrid;
  ephemeris: EphemerisSpec;
  rowStart: number;
  rowEnd: number;
}

/** Rows rowStart … rowEnd − 1 of the scan, row-major; see PorkchopResult for units. */
export interface ScanBlock {
  rowStart: number;
  rowEnd: number;
  c3: Float64Array;
  vinfDep: Float64Array;
  vinfArr: Float64Array;
  dv: Float64Array;
}

let cachedKey = "";
let cachedEph: FastEphemeris | null = null;

function ephemerisFor(spec: EphemerisSpec): FastEphemeris {
  const s: EphemerisSpec = { ...spec, cached: spec.kind === "vsop" ? true : spec.cached };
  const key = JSON.stringify(s);
  if (cachedEph === null || key !== cachedKey) {
    cachedEph = ephemerisFromSpec(s);
    cachedKey = key;
  }
  return cachedEph;
}

/** Rows per progress report of a scan block. */
const ROWS_PER_REPORT = 16;

export const searchApi = {
  /** Computes a block of scan rows; calls onRows(rowsDone) as it goes. */
  scanBlock(task: ScanTask, onRows?: (rowsDone: number) => void): ScanBlock {
    const eph = ephemerisFor(task.ephemeris);
    const deps = task.grid.departures.slice(task.rowStart, task.rowEnd);
    const cols = (task.grid.arrivals ?? task.grid.tofs ?? []).length;
    const n = deps.length * cols;
    const out = {
      c3: new Float64Array(n),
      vinfDep: new Float64Array(n),
      vinfArr: new Float64Array(n),
      dv: new Float64Array(n),
    };
    for (let r = 0; r < deps.length; r += ROWS_PER_REPORT) {
      const part = porkchop({ ...task.grid, departures: deps.slice(r, r + ROWS_PER_REPORT) }, eph);
      const o = r * cols;
      out.c3.set(part.c3, o);
      out.vinfDep.set(part.vinfDep, o);
      out.vinfArr.set(part.vinfArr, o);
      out.dv.set(part.dv, o);
      onRows?.(Math.min(deps.length, r + ROWS_PER_REPORT));
    }
    const block: ScanBlock = { rowStart: task.rowStart, rowEnd: task.rowEnd, ...out };
    return transfer(block, [out.c3.buffer, out.vinfDep.buffer, out.vinfArr.buffer, out.dv.buffer]);
  },

  /** Runs one island (seed + island, its share of the budget); progress every ~2048 evaluations. */
  async island(
    task: IslandTask,
    onProgress?: (p: SearchProgress) => void,
  ): Promise<{ candidates: SearchCandidate[]; evaluations: number }> {
    return runIsland(task, onProgress, undefined, ephemerisFor(task.ephemeris));
  },
};

export type SearchApi = typeof searchApi;
