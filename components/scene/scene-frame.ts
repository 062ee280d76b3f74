"use client";
/**
 * Shared, mutable per-frame state of one Orrery (not React state): the rebase origin (km), the
 * scale mode and a version that bumps whenever either changes, so that line buffers refill only
 * then. Components read it inside useFrame through `useSceneFrame()`.
 */
import { createContext, useContext } from "react";
import type { ScaleMode } from "./scale";
import type { Ephemeris } from "@/lib/astro/types";

export interface SceneFrame {
  /** Rebase origin, km, heliocentric ecliptic J2000 (the focus, updated in steps). */
  originKm: Float64Array;
  mode: ScaleMode;
  /** Bumped when originKm or mode changes. */
  version: number;
  /** Fast (cached) ephemeris for per-frame body positions. */
  ephemeris: Ephemeris;
}

export const SceneFrameContext = createContext<SceneFrame | null>(null);

export function useSceneFrame(): SceneFrame {
  const f = useContext(SceneFrameContext);
  if (!f) throw new Error("useSceneFrame must be used inside <Orrery>");
  return f;
}

/** World units per screen pixel at distance d from a perspective camera of vertical fov (deg). */
export function worldPerPixel(d: number, fovDeg: number, heightPx: number): number {
  return (2 * d * Math.tan((fovDeg * Math.PI) / 360)) / Math.max(1, heightPx);
}
