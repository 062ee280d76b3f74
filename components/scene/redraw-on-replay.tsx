"use client";
/**
 * Asks for a new frame whenever the replay clock's time changes (the Orrery draws on demand).
 * Subscribes to the zustand store outside React rendering: no re-render per tick.
 */
import { useEffect } from "react";
import { useThree } from "@react-three/fiber";
import { useTimeline } from "@/lib/client/timeline-store";

export type RedrawOnReplayProps = Record<string, never>;

export function RedrawOnReplay(_props: RedrawOnReplayProps) {
  const invalidate = useThree((s) => s.invalidate);
  useEffect(
    () =>
      useTimeline.subscribe((s, prev) => {
        if (s.time !== prev.time) invalidate();
      }),
    [invalidate],
  );
  return null;
}
