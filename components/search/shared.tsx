"use client";
/**
 * Pieces shared by the Window scan and Tour search screens: the stored tour → TourSpec /
 * EphemerisSpec, calendar-date inputs (UTC dates ⇄ TDB seconds), adopting epochs into the tour
 * (PATCH /api/tours/[id] with the version, 409 shown), the run progress bar and the panel that
 * shows the server's numbers after an adoption.
 */
import Link from "next/link";
import { useState } from "react";
import type { TourDetail } from "@/lib/db/queries/tours";
import type { BodyId, CustomBodySpec, EphemerisSpec, TourSpec } from "@/lib/astro/types";
import { isoToTdbSeconds } from "@/lib/astro/time";
import { ApiError, sendJson } from "@/lib/client/fetcher";
import { bodyLabel, dateOf } from "@/lib/format";
import { Button } from "@/components/ui/button";
import { Num, formatNum } from "@/components/ui/num";
import type { RunProgress } from "@/workers/use-search-workers";

export type DetailWithBodies = TourDetail & { customBodies?: CustomBodySpec[] };

/** The TourSpec of a stored tour (planets from the constants; the team's bodies from customBodies). */
export function specOf(detail: DetailWithBodies): TourSpec {
  const t = detail.tour;
  const bodies: TourSpec["bodies"] = {};
  for (const b of detail.customBodies ?? []) {
    bodies[b.id] = { mu: b.mu, radius: b.radius ?? 0, minFlybyAltitude: b.minFlybyAltitude ?? 0 };
  }
  return {
    nodes: t.nodes.map((n) => ({ body: n.body as BodyId, epoch: n.epoch })),
    legs: t.legs.length ? t.legs : undefined,
    arrival: t.arrival,
    rpMin: t.rpMin as TourSpec["rpMin"],
    bodies,
  };
}

/** What the workers build their ephemeris from (astronomy-engine always through the cache). */
export function ephemerisSpecOf(detail: DetailWithBodies, kind: "vsop" | "mean"): EphemerisSpec {
  const custom = detail.customBodies ?? [];
  return { kind, cached: kind === "vsop", ...(custom.length ? { customBodies: custom } : {}) };
}

/** "YYYY-MM-DD" (UTC) → TDB s past J2000, or null when not a date. */
export function tdbOfDate(d: string): number | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(d)) return null;
  try {
    const t = isoToTdbSeconds(`${d}T00:00:00Z`);
    return Number.isFinite(t) ? t : null;
  } catch {
    return null;
  }
}

export const DAY = 86400;

export function legLabel(detail: TourDetail, i: number): string {
  const n = detail.tour.nodes;
  return `Leg ${i + 1}: ${bodyLabel(n[i]!.body)} → ${bodyLabel(n[i + 1]!.body)}`;
}

export interface AdoptState {
  detail: DetailWithBodies;
  saving: boolean;
  error: string | null;
  /** The server's tour after the last successful adoption. */
  adopted: DetailWithBodies | null;
  /** A newer version on the server (409), offered for reloading. */
  newer: DetailWithBodies | null;
}

/** Adopt new node epochs into the tour: PATCH with the version we edited; 409 → message + newer version. */
export function useAdopt(initial: DetailWithBodies) {
  const [state, setState] = useState<AdoptState>({ detail: initial, saving: false, error: null, adopted: null, newer: null });
  const adopt = async (epochs: (number | undefined)[]) => {
    const d = state.detail;
    const tour = { ...d.tour, nodes: d.tour.nodes.map((n, i) => (epochs[i] !== undefined ? { ...n, epoch: epochs[i]! } : n)) };
    setState((s) => ({ ...s, saving: true, error: null, newer: null }));
    try {
      const next = await sendJson<TourDetail>(`/api/tours/${d.id}`, "PATCH", { version: d.version, tour, note: "adopted from search" });
      const merged: DetailWithBodies = { ...next, customBodies: d.customBodies };
      setState({ detail: merged, saving: false, error: null, adopted: merged, newer: null });
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) {
        const current = err.body.current as TourDetail | undefined;
        setState((s) => ({
          ...s,
          saving: false,
          error: `${err.message} Someone saved version ${current?.version ?? "?"} after the one you opened; load it, then adopt again.`,
          newer: current ? { ...current, customBodies: d.customBodies } : null,
        }));
      } else {
        setState((s) => ({ ...s, saving: false, error: err instanceof Error ? err.message : String(err) }));
      }
    }
  };
  const loadNewer = () => setState((s) => (s.newer ? { ...s, detail: s.newer, newer: null, error: null } : s));
  return { ...state, adopt, loadNewer };
}

export function AdoptPanel({ a }: { a: ReturnType<typeof useAdopt> }) {
  if (!a.error && !a.adopted) return null;
  const r = a.adopted?.result;
  return (
    <div className="rounded-md border border-line bg-raised px-4 py-3 text-sm" data-testid="adopt-panel" aria-live="polite">
      {a.error ? (
        <div className="flex flex-wrap items-center gap-3 text-bad">
          <span role="alert">{a.error}</span>
          {a.newer ? (
            <Button size="sm" onClick={a.loadNewer}>
              Load version {a.newer.version}
            </Button>
          ) : null}
        </div>
      ) : null}
      {a.adopted && !a.error ? (
        <div className="space-y-2">
          <p className="text-ink">
            Saved as version <span className="num">{a.adopted.version}</span>. The server&apos;s numbers for the tour now:
          </p>
          <dl className="grid grid-cols-2 gap-x-6 gap-y-1 sm:grid-cols-3 lg:grid-cols-6" data-testid="adopted-numbers">
            <Stat label="Launch">{dateOf(a.adopted.tour.nodes[0]?.epoch)}</Stat>
            <Stat label="Launch C3"><Num value={r?.launch.c3} unit="km²/s²" /></Stat>
            <Stat label="Launch v∞"><Num value={r?.launch.vinf} unit="km/s" digits={3} /></Stat>
            <Stat label="Total Δv"><span data-testid="adopted-total-dv"><Num value={r?.totalDv} unit="km/s" digits={3} /></span></Stat>
            <Stat label="Arrival v∞"><Num value={r?.arrival.vinf} unit="km/s" digits={3} /></Stat>
            <Stat label="Violations"><span className="num">{r?.violations.length ?? "—"}</span></Stat>
          </dl>
          <Link className="text-accent underline-offset-2 hover:underline" href={`/tours/${a.adopted.id}`}>
            Open it in the Workbench →
          </Link>
        </div>
      ) : null}
    </div>
  );
}

function Stat({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="text-xs text-muted">{label}</dt>
      <dd>{children}</dd>
    </div>
  );
}

function clock(s: number | null): string {
  if (s === null || !Number.isFinite(s)) return "—";
  if (s < 60) return `${s.toFixed(1)} s`;
  const m = Math.floor(s / 60);
  return `${m} min ${Math.round(s - 60 * m)} s`;
}

/** Progress bar: work done, best so far, elapsed, estimated time left, and the cancel button. */
export function RunProgressBar({ progress, running, onCancel, unitLabel }: { progress: RunProgress | null; running: boolean; onCancel: () => void; unitLabel: string }) {
  if (!progress) return null;
  const frac = progress.total > 0 ? Math.min(1, progress.done / progress.total) : 0;
  return (
    <div className="space-y-2" data-testid="run-progress">
      <div className="flex flex-wrap items-center justify-between gap-3 text-sm">
        <div className="flex flex-wrap gap-x-5 gap-y-1 text-muted">
          <span>
            <span className="num text-ink" data-testid="progress-done">{progress.done.toLocaleString("en-US")}</span> /{" "}
            <span className="num">{progress.total.toLocaleString("en-US")}</span> {unitLabel}
          </span>
          {progress.kind === "search" ? (
            <span>
              best so far <span className="num text-ink" data-testid="progress-best">{formatNum(progress.best, 4)}</span> km/s
            </span>
          ) : null}
          <span>elapsed <span className="num text-ink">{clock(progress.elapsedS)}</span></span>
          <span>left ≈ <span className="num text-ink">{running ? clock(progress.etaS) : "—"}</span></span>
        </div>
        {running ? (
          <Button size="sm" variant="danger" onClick={onCancel} data-testid="cancel-run">
            Cancel
          </Button>
        ) : null}
      </div>
      <div
        className="h-2 overflow-hidden rounded-full bg-sunken"
        role="progressbar"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(frac * 100)}
        aria-label="Run progress"
      >
        <div className="h-full bg-accent transition-[width] duration-150" style={{ width: `${(frac * 100).toFixed(1)}%` }} />
      </div>
    </div>
  );
}
