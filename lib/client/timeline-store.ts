"use client";
/**
 * The replay clock shared by the Timeline strip, the Orrery and the Encounter card.
 * `time` is TDB seconds past J2000. The scene reads it every frame with
 * `useTimeline.getState()` (no React re-render per frame); widgets that show the date
 * subscribe with a selector.
 */
import { useEffect } from "react";
import { create } from "zustand";

export interface TimelineState {
  /** Current replay epoch, TDB s past J2000. */
  time: number;
  /** Bounds of the replay, TDB s past J2000 (launch and arrival of the tour). */
  start: number;
  end: number;
  playing: boolean;
  /** Replay speed, days of mission time per second of wall time. */
  speedDaysPerSecond: number;
  setRange(start: number, end: number): void;
  setTime(t: number): void;
  play(): void;
  pause(): void;
  setSpeed(daysPerSecond: number): void;
  /** Advance by a wall-clock step (s) at the current speed; stops at the end. */
  tick(wallSeconds: number): void;
}

export const useTimeline = create<TimelineState>((set, get) => ({
  time: 0,
  start: 0,
  end: 0,
  playing: false,
  speedDaysPerSecond: 30,
  setRange: (start, end) => set({ start, end, time: Math.min(Math.max(get().time, start), end) }),
  setTime: (t) => set({ time: Math.min(Math.max(t, get().start), get().end) }),
  play: () => set((s) => ({ playing: true, time: s.time >= s.end ? s.start : s.time })),
  pause: () => set({ playing: false }),
  setSpeed: (d) => set({ speedDaysPerSecond: Math.max(0.1, Math.min(3650, d)) }),
  tick: (wall) => {
    const s = get();
    if (!s.playing) return;
    const next = s.time + wall * s.speedDaysPerSecond * 86400;
    if (next >= s.end) set({ time: s.end, playing: false });
    else set({ time: next });
  },
}));

/** Runs the replay clock while it plays: one tick per animation frame, wall-clock scaled. */
export function usePlaybackLoop(): void {
  const playing = useTimeline((s) => s.playing);
  useEffect(() => {
    if (!playing) return;
    let raf = 0;
    let last = performance.now();
    const step = (now: number) => {
      // Clamp long gaps (background tab) so the replay does not leap ahead.
      const dt = Math.min(0.25, Math.max(0, (now - last) / 1000));
      last = now;
      useTimeline.getState().tick(dt);
      if (useTimeline.getState().playing) raf = requestAnimationFrame(step);
    };
    raf = requestAnimationFrame(step);
    return () => cancelAnimationFrame(raf);
  }, [playing]);
}
