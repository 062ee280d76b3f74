"use client";
/**
 * Timeline: the replay strip under the Orrery. Play, pause, speed (days of mission time per
 * second), scrub from launch to arrival, jump to a node, and the current date (UTC). It drives
 * the shared replay clock (`useTimeline`) with a requestAnimationFrame loop while playing.
 * Replaying changes nothing in the tour, so every role may use it.
 */
import { usePlaybackLoop, useTimeline } from "@/lib/client/timeline-store";
import { cn } from "@/components/ui/cn";
import { bodyLabel, dateTimeOf } from "@/lib/format";
import { progressAt, progressText } from "@/lib/client/workbench-derive";
import { GLYPHS, Glyph } from "./controls";

export const SPEEDS_DAYS_PER_SECOND = [1, 5, 30, 100, 365] as const;

export interface TimelineStripProps {
  nodes: { id: string; body: string; epoch: number }[];
  selectedNodeId: string | null;
  onJumpToNode?(nodeId: string): void;
  className?: string;
}

export function TimelineStrip({ nodes, selectedNodeId, onJumpToNode, className }: TimelineStripProps) {
  usePlaybackLoop();
  const time = useTimeline((s) => s.time);
  const start = useTimeline((s) => s.start);
  const end = useTimeline((s) => s.end);
  const playing = useTimeline((s) => s.playing);
  const speed = useTimeline((s) => s.speedDaysPerSecond);
  const { play, pause, setTime, setSpeed } = useTimeline.getState();
  const span = end - start;
  const ready = span > 0;
  const progress = progressAt(nodes, time);
  const speeds: number[] = SPEEDS_DAYS_PER_SECOND.includes(speed as (typeof SPEEDS_DAYS_PER_SECOND)[number])
    ? [...SPEEDS_DAYS_PER_SECOND]
    : [...SPEEDS_DAYS_PER_SECOND, speed].sort((a, b) => a - b);

  return (
    <section
      aria-label="Timeline"
      data-testid="timeline"
      className={cn("rounded-panel border border-line bg-surface px-4 py-3 shadow-panel", className)}
    >
      <div className="flex flex-wrap items-center gap-3">
        <button
          type="button"
          data-testid="timeline-play"
          onClick={() => (playing ? pause() : play())}
          disabled={!ready}
          aria-label={playing ? "Pause replay" : "Play replay"}
          className="inline-flex h-9 items-center gap-2 rounded-md bg-accent px-3 text-sm font-medium text-accent-ink hover:bg-accent-strong disabled:opacity-50"
        >
          <Glyph d={playing ? GLYPHS.pause : GLYPHS.play} />
          {playing ? "Pause" : "Play"}
        </button>
        <button
          type="button"
          onClick={() => {
            pause();
            setTime(start);
          }}
          disabled={!ready}
          aria-label="Back to launch"
          title="Back to launch"
          className="inline-flex size-9 items-center justify-center rounded-md border border-line-strong text-muted hover:text-ink disabled:opacity-50"
        >
          <Glyph d={GLYPHS.toStart} />
        </button>
        <label className="flex items-center gap-2 text-sm text-muted">
          Speed
          <select
            value={speed}
            data-testid="timeline-speed"
            onChange={(e) => setSpeed(Number(e.target.value))}
            className="h-9 rounded-md border border-line-strong bg-field px-2 text-sm text-ink"
          >
            {speeds.map((d) => (
              <option key={d} value={d}>
                {d} d/s
              </option>
            ))}
          </select>
        </label>
        <div className="ml-auto flex min-w-0 flex-wrap items-baseline gap-x-4 gap-y-1">
          <span className="text-sm text-muted" data-testid="timeline-progress">
            {ready ? progressText(progress) : ""}
          </span>
          <span className="num text-base font-semibold text-ink" data-testid="timeline-date" aria-live="off">
            {ready ? dateTimeOf(time) : "—"} <span className="text-xs font-normal text-muted">UTC</span>
          </span>
        </div>
      </div>

      <div className="relative mt-3">
        <input
          type="range"
          aria-label="Replay time"
          data-testid="timeline-scrub"
          min={0}
          max={1000}
          step={1}
          disabled={!ready}
          value={ready ? Math.round(((time - start) / span) * 1000) : 0}
          onChange={(e) => {
            pause();
            setTime(start + (Number(e.target.value) / 1000) * span);
          }}
          className="w-full accent-[var(--gy-accent)]"
        />
      </div>

      <div className="mt-2 flex flex-wrap items-center gap-1.5" aria-label="Jump to a node">
        <span className="mr-1 text-xs text-faint">Jump to</span>
        {nodes.map((n, i) => (
          <button
            key={n.id}
            type="button"
            data-testid="timeline-jump"
            disabled={!ready}
            onClick={() => {
              pause();
              setTime(n.epoch);
              onJumpToNode?.(n.id);
            }}
            className={cn(
              "inline-flex h-7 items-center gap-1 rounded-full border px-2.5 text-xs transition-colors",
              selectedNodeId === n.id ? "border-accent/70 bg-accent-soft text-accent" : "border-line-strong text-muted hover:text-ink",
              progress.phase === "leg" && progress.leg + 1 === i ? "ring-1 ring-accent/50" : "",
            )}
          >
            <span className="num text-faint">#{i + 1}</span> {bodyLabel(n.body)}
          </button>
        ))}
      </div>
    </section>
  );
}
