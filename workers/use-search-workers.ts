"use client";
/**
 * Client hook for window scans and tour searches in Web Workers (comlink).
 *
 * A pool of max(2, navigator.hardwareConcurrency) search workers is created on first use,
 * reused between runs, and terminated on unmount. A scan splits its departure rows into one
 * contiguous block per worker (arrays come back transferred); a search runs one island per
 * worker (seed + k, budget split, merged in island order: same seed and worker count → same
 * answer). `cancel()` terminates every worker at once (the pool is rebuilt on the next run)
 * and resolves the pending run with what was found so far.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import { proxy, wrap, type Remote } from "comlink";
import type { SearchApi, ScanBlock } from "./search-api";
import { candidateValue, mergeCandidates, type SearchProgress } from "@/lib/astro/search";
import { evaluateTour } from "@/lib/astro/tour";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import type {
  EphemerisSpec,
  PorkchopGrid,
  PorkchopResult,
  SearchBounds,
  SearchCandidate,
  SearchOptions,
  TourSpec,
} from "@/lib/astro/types";

interface PoolWorker {
  worker: Worker;
  api: Remote<SearchApi>;
}

/** Live progress of a run, for the progress bar and the convergence plot. */
export interface RunProgress {
  kind: "scan" | "search";
  /** Cells (scan) or objective evaluations (search) done, and the total planned. */
  done: number;
  total: number;
  /** Best objective so far, km/s (search); least C3 so far is not tracked for scans. */
  best: number;
  /** Wall-clock seconds since the start; estimated seconds left (null until known). */
  elapsedS: number;
  etaS: number | null;
  /** Convergence history (search): best value after `evaluations` (summed over islands). */
  history: { evaluations: number; best: number }[];
}

export interface ScanOutcome extends PorkchopResult {
  rows: number;
  cols: number;
  cancelled: boolean;
  elapsedS: number;
}

export interface SearchRequest {
  spec: TourSpec;
  bounds: SearchBounds;
  ephemeris: EphemerisSpec;
  seed: number;
  budget: number;
  objective?: SearchOptions["objective"];
  caps?: SearchOptions["caps"];
}

export interface SearchOutcome {
  candidates: SearchCandidate[];
  evaluations: number;
  cancelled: boolean;
  elapsedS: number;
  workers: number;
}

export function workerCount(): number {
  const hc = typeof navigator !== "undefined" ? navigator.hardwareConcurrency : 2;
  return Math.max(2, Math.min(16, Number.isFinite(hc) && hc > 0 ? hc : 2));
}

export function useSearchWorkers() {
  const pool = useRef<PoolWorker[] | null>(null);
  const cancelRef = useRef<(() => void) | null>(null);
  const [running, setRunning] = useState(false);
  const [progress, setProgress] = useState<RunProgress | null>(null);
  const [error, setError] = useState<string | null>(null);

  const terminate = useCallback(() => {
    for (const w of pool.current ?? []) w.worker.terminate();
    pool.current = null;
  }, []);

  const getPool = useCallback((): PoolWorker[] => {
    if (pool.current) return pool.current;
    const n = workerCount();
    const ws: PoolWorker[] = [];
    for (let k = 0; k < n; k++) {
      const worker = new Worker(new URL("./search.worker.ts", import.meta.url), { type: "module" });
      ws.push({ worker, api: wrap<SearchApi>(worker) });
    }
    pool.current = ws;
    return ws;
  }, []);

  useEffect(() => {
    return () => {
      cancelRef.current?.();
      terminate();
    };
  }, [terminate]);

  /** Terminates every worker now; the pending run resolves with what it has. */
  const cancel = useCallback(() => {
    const c = cancelRef.current;
    terminate();
    c?.();
  }, [terminate]);

  const runScan = useCallback(
    async (grid: PorkchopGrid, ephemeris: EphemerisSpec): Promise<ScanOutcome> => {
      if (cancelRef.current) cancel();
      const rows = grid.departures.length;
      const cols = (grid.arrivals ?? grid.tofs ?? []).length;
      const total = rows * cols;
      const out: PorkchopResult = {
        c3: new Float64Array(total).fill(Number.NaN),
        vinfDep: new Float64Array(total).fill(Number.NaN),
        vinfArr: new Float64Array(total).fill(Number.NaN),
        dv: new Float64Array(total).fill(Number.NaN),
      };
      const t0 = performance.now();
      setError(null);
      setRunning(true);
      const workers = getPool();
      const n = Math.min(workers.length, Math.max(1, rows));
      const rowsDone = new Array<number>(n).fill(0);
      const tick = () => {
        const done = rowsDone.reduce((a, b) => a + b, 0) * cols;
        const elapsedS = (performance.now() - t0) / 1000;
        setProgress({ kind: "scan", done, total, best: Number.NaN, elapsedS, etaS: done > 0 ? (elapsedS * (total - done)) / done : null, history: [] });
      };
      tick();
      let cancelled = false;
      const stop = new Promise<"cancelled">((resolve) => {
        cancelRef.current = () => {
          cancelled = true;
          resolve("cancelled");
        };
      });
      try {
        const jobs = Array.from({ length: n }, (_, k) => {
          const rowStart = Math.floor((k * rows) / n);
          const rowEnd = Math.floor(((k + 1) * rows) / n);
          return workers[k]!.api
            .scanBlock(
              { grid, ephemeris, rowStart, rowEnd },
              proxy((r: number) => {
                rowsDone[k] = r;
                tick();
              }),
            )
            .then((b: ScanBlock) => {
              const o = b.rowStart * cols;
              out.c3.set(b.c3, o);
              out.vinfDep.set(b.vinfDep, o);
              out.vinfArr.set(b.vinfArr, o);
              out.dv.set(b.dv, o);
            });
        });
        await Promise.race([Promise.all(jobs), stop]);
      } catch (err) {
        if (!cancelled) setError(err instanceof Error ? err.message : String(err));
      } finally {
        cancelRef.current = null;
        setRunning(false);
      }
      return { ...out, rows, cols, cancelled, elapsedS: (performance.now() - t0) / 1000 };
    },
    [getPool, cancel],
  );

  const runSearch = useCallback(
    async (req: SearchRequest): Promise<SearchOutcome> => {
      if (cancelRef.current) cancel();
      const t0 = performance.now();
      setError(null);
      setRunning(true);
      const workers = getPool();
      const n = workers.length;
      const last: (SearchProgress | null)[] = new Array(n).fill(null);
      const history: { evaluations: number; best: number }[] = [];
      let lastBest = Infinity;
      let lastShown = 0;
      const tick = () => {
        let done = 0;
        let best = Infinity;
        for (const p of last) {
          if (!p) continue;
          done += p.evaluations;
          if (p.best < best) best = p.best;
        }
        if (best < lastBest || history.length === 0 || done - history[history.length - 1]!.evaluations > req.budget / 200) {
          history.push({ evaluations: done, best });
          lastBest = Math.min(lastBest, best);
        }
        const now = performance.now();
        if (now - lastShown < 80) return; // at most ~12 updates per second
        lastShown = now;
        const elapsedS = (now - t0) / 1000;
        setProgress({
          kind: "search",
          done,
          total: req.budget,
          best,
          elapsedS,
          etaS: done > 0 ? Math.max(0, (elapsedS * (req.budget - done)) / done) : null,
          history: history.slice(),
        });
      };
      setProgress({ kind: "search", done: 0, total: req.budget, best: Infinity, elapsedS: 0, etaS: null, history: [] });
      let cancelled = false;
      const stop = new Promise<"cancelled">((resolve) => {
        cancelRef.current = () => {
          cancelled = true;
          resolve("cancelled");
        };
      });
      let outcome: SearchOutcome = { candidates: [], evaluations: 0, cancelled: false, elapsedS: 0, workers: n };
      try {
        const jobs = workers.map((w, island) =>
          w.api.island(
            { spec: req.spec, bounds: req.bounds, ephemeris: req.ephemeris, seed: req.seed, budget: req.budget, island, islands: n, objective: req.objective, caps: req.caps },
            proxy((p: SearchProgress) => {
              last[island] = p;
              tick();
            }),
          ),
        );
        const res = await Promise.race([Promise.all(jobs), stop]);
        if (res === "cancelled") {
          outcome = { ...bestSoFar(req, last), cancelled: true, elapsedS: (performance.now() - t0) / 1000, workers: n };
        } else {
          const evaluations = res.reduce((s, r) => s + r.evaluations, 0);
          const best = res.reduce((b, r) => Math.min(b, r.candidates[0]?.value ?? Infinity), Infinity);
          if (best < Infinity) history.push({ evaluations, best });
          const elapsedS = (performance.now() - t0) / 1000;
          setProgress({ kind: "search", done: evaluations, total: req.budget, best, elapsedS, etaS: 0, history: history.slice() });
          outcome = {
            candidates: mergeCandidates(res.map((r) => r.candidates)),
            evaluations: res.reduce((s, r) => s + r.evaluations, 0),
            cancelled: false,
            elapsedS: (performance.now() - t0) / 1000,
            workers: n,
          };
        }
      } catch (err) {
        if (cancelled) outcome = { ...bestSoFar(req, last), cancelled: true, elapsedS: (performance.now() - t0) / 1000, workers: n };
        else setError(err instanceof Error ? err.message : String(err));
      } finally {
        cancelRef.current = null;
        setRunning(false);
      }
      return outcome;
    },
    [getPool, cancel],
  );

  return { running, progress, error, runScan, runSearch, cancel };
}

/** After a cancel: each island's last reported best, evaluated here (one tour each), merged in island order. */
function bestSoFar(req: SearchRequest, last: (SearchProgress | null)[]): { candidates: SearchCandidate[]; evaluations: number } {
  const eph = ephemerisFromSpec({ ...req.ephemeris, cached: false });
  const lists: SearchCandidate[][] = [];
  let evaluations = 0;
  for (const p of last) {
    if (!p) continue;
    evaluations += p.evaluations;
    if (!p.bestEpochs) continue;
    const spec: TourSpec = { ...req.spec, nodes: req.spec.nodes.map((nd, i) => ({ body: nd.body, epoch: p.bestEpochs![i]! })) };
    try {
      const result = evaluateTour(spec, eph, req.caps);
      lists.push([{ epochs: p.bestEpochs, value: candidateValue(spec, p.bestEpochs, result, req), result }]);
    } catch {
      // a tour that cannot be evaluated is not offered
    }
  }
  return { candidates: mergeCandidates(lists), evaluations };
}
