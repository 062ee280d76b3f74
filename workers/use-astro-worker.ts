"use client";
/**
 * Client hooks for the astro Web Worker. `useAstroWorker` creates the worker in an effect,
 * wraps it with comlink and terminates it on unmount. `useTourComputation` re-evaluates and
 * re-samples a tour whenever its spec changes: rapid edits are debounced and a result that
 * arrives after a newer request is dropped.
 */
import { useEffect, useMemo, useRef, useState } from "react";
import { wrap, type Remote } from "comlink";
import type { AstroApi } from "./astro-api";
import type { EphemerisSpec, TourResult, TourSamples, TourSpec } from "@/lib/astro/types";

export function useAstroWorker(): Remote<AstroApi> | null {
  const [api, setApi] = useState<Remote<AstroApi> | null>(null);
  useEffect(() => {
    let worker: Worker;
    try {
      worker = new Worker(new URL("./astro.worker.ts", import.meta.url), { type: "module" });
    } catch (err) {
      console.error("[gybe] the astro worker could not start", err);
      return;
    }
    setApi(() => wrap<AstroApi>(worker));
    return () => {
      worker.terminate();
      setApi(null);
    };
  }, []);
  return api;
}

export interface TourComputation {
  result: TourResult | null;
  samples: TourSamples | null;
  /** True from an edit until its result arrives. */
  pending: boolean;
  /** Plain-language error of the last evaluation, if it threw. */
  error: string | null;
  /** The spec key the current result belongs to. */
  resultKey: string | null;
}

export interface TourComputationOptions {
  pointsPerLeg?: number;
  debounceMs?: number;
  /** Result known before the worker answers (e.g. the server's evaluation of the saved tour). */
  initialResult?: TourResult | null;
}

function messageOf(err: unknown): string {
  const m = err instanceof Error ? err.message : String(err);
  return m.length > 300 ? `${m.slice(0, 300)}…` : m;
}

export function useTourComputation(
  spec: TourSpec | null,
  ephemeris: EphemerisSpec,
  { pointsPerLeg = 160, debounceMs = 120, initialResult = null }: TourComputationOptions = {},
): TourComputation {
  const api = useAstroWorker();
  const key = useMemo(() => (spec ? JSON.stringify([spec, ephemeris]) : null), [spec, ephemeris]);
  const [state, setState] = useState<TourComputation>({
    result: initialResult,
    samples: null,
    pending: true,
    error: null,
    resultKey: null,
  });
  const seq = useRef(0);
  const specRef = useRef(spec);
  const ephRef = useRef(ephemeris);
  specRef.current = spec;
  ephRef.current = ephemeris;

  useEffect(() => {
    if (!api || !key) return;
    const mine = ++seq.current;
    const s = specRef.current!;
    const e = ephRef.current;
    setState((p) => (p.pending ? p : { ...p, pending: true }));
    const timer = setTimeout(async () => {
      try {
        const result = await api.evaluate(s, e);
        if (mine !== seq.current) return;
        setState((p) => ({ ...p, result, error: null, resultKey: key }));
        let samples: TourSamples | null = null;
        try {
          samples = await api.sample(s, e, pointsPerLeg);
        } catch {
          // e.g. epochs not increasing: the numbers and their violations stand, no arcs to draw
        }
        if (mine !== seq.current) return;
        setState((p) => ({ ...p, samples, pending: false }));
      } catch (err) {
        if (mine !== seq.current) return;
        setState((p) => ({ ...p, result: null, samples: null, pending: false, error: messageOf(err), resultKey: key }));
      }
    }, debounceMs);
    return () => clearTimeout(timer);
  }, [api, key, pointsPerLeg, debounceMs]);

  return state;
}
