"use client";
/**
 * Compare in 3D: every selected tour's arcs in one Orrery on one replay clock, so the lead sees
 * where and when the candidates differ. Arcs are evaluated and sampled in the browser (a few
 * tours: milliseconds) after mount, from the same core the server uses.
 */
import { useEffect, useMemo, useState } from "react";
import { Orrery, type OrreryProps } from "@/components/scene/orrery";
import { usePlaybackLoop, useTimeline } from "@/lib/client/timeline-store";
import { evaluateTour } from "@/lib/astro/tour";
import { sampleTour } from "@/lib/astro/sample";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { toTourSpec } from "@/lib/tours/evaluate";
import type { BodyId, CustomBodySpec, EphemerisSpec } from "@/lib/astro/types";
import type { StoredTour } from "@/lib/validation/tour";
import { bodyLabel, dateTimeOf } from "@/lib/format";
import { tagOf } from "./tour-tag";

export interface CompareOrreryProps {
  tours: { id: number; name: string; tour: StoredTour; customBodies: CustomBodySpec[] }[];
}

const SPEEDS = [5, 30, 100, 365];

export function CompareOrrery({ tours }: CompareOrreryProps) {
  const customBodies = useMemo(() => {
    const seen = new Map<string, CustomBodySpec>();
    for (const t of tours) for (const b of t.customBodies) seen.set(b.id, b);
    return [...seen.values()];
  }, [tours]);
  const ephemeris = useMemo<EphemerisSpec>(() => ({ kind: "vsop", cached: true, customBodies }), [customBodies]);
  const [sceneTours, setSceneTours] = useState<OrreryProps["tours"]>([]);

  useEffect(() => {
    const eph = ephemerisFromSpec(ephemeris);
    const list: OrreryProps["tours"] = tours.map((t, k) => {
      const spec = toTourSpec(t.tour, t.customBodies.map((b) => ({ id: b.id, mu: b.mu, radius: b.radius ?? 0, minFlybyAltitude: b.minFlybyAltitude ?? 0 })));
      let samples = null;
      try {
        samples = sampleTour(spec, evaluateTour(spec, eph), eph, { pointsPerLeg: 160 });
      } catch {
        samples = null; // a tour that cannot be evaluated is listed without arcs
      }
      return {
        id: String(t.id),
        label: `${tagOf(k)} · ${t.name}`,
        samples,
        primary: k === 0,
        nodes: t.tour.nodes.map((n) => ({ body: n.body as BodyId, epoch: n.epoch, label: `${tagOf(k)} ${bodyLabel(n.body)}` })),
      };
    });
    setSceneTours(list);
    const starts = tours.map((t) => t.tour.nodes[0]!.epoch);
    const ends = tours.map((t) => t.tour.nodes[t.tour.nodes.length - 1]!.epoch);
    const tl = useTimeline.getState();
    tl.pause();
    tl.setRange(Math.min(...starts), Math.max(...ends));
    tl.setTime(Math.min(...starts));
    return () => useTimeline.getState().pause();
  }, [tours, ephemeris]);

  return (
    <div className="space-y-3">
      <Orrery className="h-[460px]" tours={sceneTours} ephemeris={ephemeris} />
      <ReplayBar />
      <p className="text-xs text-muted">
        Tour {tagOf(0)} is drawn in the accent colour, the others dimmer; node labels carry each tour&apos;s letter.
      </p>
    </div>
  );
}

function ReplayBar() {
  const time = useTimeline((s) => s.time);
  const start = useTimeline((s) => s.start);
  const end = useTimeline((s) => s.end);
  const playing = useTimeline((s) => s.playing);
  const speed = useTimeline((s) => s.speedDaysPerSecond);
  const { play, pause, setTime, setSpeed } = useTimeline.getState();
  usePlaybackLoop();
  const span = end - start;
  return (
    <div className="flex flex-wrap items-center gap-3 text-sm" aria-label="Replay">
      <button
        type="button"
        onClick={() => (playing ? pause() : play())}
        disabled={span <= 0}
        className="rounded-md border border-line bg-raised px-3 py-1.5 text-ink hover:border-accent disabled:opacity-50"
        data-testid="compare-play"
      >
        {playing ? "Pause" : "Play"}
      </button>
      <label className="flex items-center gap-1.5 text-xs text-muted">
        Speed
        <select value={speed} onChange={(e) => setSpeed(Number(e.target.value))} className="h-8 rounded-md border border-line bg-sunken px-2 text-sm text-ink">
          {SPEEDS.map((s) => (
            <option key={s} value={s}>{s} d/s</option>
          ))}
        </select>
      </label>
      <input
        type="range"
        aria-label="Replay date"
        min={0}
        max={1000}
        value={span > 0 ? Math.round(((time - start) / span) * 1000) : 0}
        onChange={(e) => setTime(start + (Number(e.target.value) / 1000) * span)}
        className="min-w-[12rem] flex-1 accent-[var(--gy-accent)]"
      />
      <span className="num text-ink" data-testid="compare-date">{span > 0 ? dateTimeOf(time) : "—"}</span>
      <span className="text-xs text-muted">UTC</span>
    </div>
  );
}
