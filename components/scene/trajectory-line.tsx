"use client";
/**
 * A heliocentric trajectory polyline (one leg of a tour, or a perturbed outgoing arc) from km
 * samples. Solid or dashed. The float32 scene buffer is refilled when the scene's rebase origin or
 * scale changes, or when a new positions array is passed (e.g. while dragging an aim point).
 */
import { useEffect, useMemo, useRef } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import { BufferAttribute, BufferGeometry, Line, LineBasicMaterial, LineDashedMaterial } from "three";
import { useSceneFrame } from "./scene-frame";
import { toSceneInto } from "./scale";

export interface TrajectoryLineProps {
  /** Positions, km, heliocentric ecliptic J2000, xyz interleaved. */
  positionsKm: Float64Array;
  /** First point and number of points to draw (default: all). */
  from?: number;
  count?: number;
  color: string;
  opacity?: number;
  dashed?: boolean;
}

export function TrajectoryLine({ positionsKm, from = 0, count, color, opacity = 1, dashed = false }: TrajectoryLineProps) {
  const frame = useSceneFrame();
  const invalidate = useThree((s) => s.invalidate);
  const n = Math.max(0, Math.min(count ?? positionsKm.length / 3 - from, positionsKm.length / 3 - from));
  const capacity = useRef(0);
  const line = useMemo(() => {
    const g = new BufferGeometry();
    const m = dashed
      ? new LineDashedMaterial({ color, transparent: true, opacity, dashSize: 0.12, gapSize: 0.08, depthWrite: false })
      : new LineBasicMaterial({ color, transparent: opacity < 1, opacity, depthWrite: false });
    const l = new Line(g, m);
    l.frustumCulled = false;
    capacity.current = 0;
    return l;
  }, [color, opacity, dashed]);
  const seen = useRef({ version: -1, data: null as Float64Array | null, from: -1, n: -1 });
  const tmp = useRef([0, 0, 0]);
  useEffect(
    () => () => {
      line.geometry.dispose();
      (line.material as LineBasicMaterial).dispose();
    },
    [line],
  );
  // New data: draw a frame (the scene renders on demand).
  useEffect(() => invalidate(), [invalidate, positionsKm, from, n, line]);
  useFrame(() => {
    const s = seen.current;
    if (s.version === frame.version && s.data === positionsKm && s.from === from && s.n === n) return;
    const g = line.geometry;
    if (capacity.current < n) {
      capacity.current = Math.max(n, 2);
      g.setAttribute("position", new BufferAttribute(new Float32Array(3 * capacity.current), 3));
    }
    const attr = g.getAttribute("position") as BufferAttribute | undefined;
    if (!attr) return;
    const arr = attr.array as Float32Array;
    const p = tmp.current;
    let ok = 0;
    for (let i = 0; i < n; i++) {
      const j = 3 * (from + i);
      const x = positionsKm[j]!, y = positionsKm[j + 1]!, z = positionsKm[j + 2]!;
      if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) break;
      toSceneInto(p, 0, x, y, z, frame.originKm, frame.mode);
      arr[3 * i] = p[0]!;
      arr[3 * i + 1] = p[1]!;
      arr[3 * i + 2] = p[2]!;
      ok++;
    }
    g.setDrawRange(0, ok);
    attr.needsUpdate = true;
    g.computeBoundingSphere();
    if (dashed) line.computeLineDistances();
    s.version = frame.version;
    s.data = positionsKm;
    s.from = from;
    s.n = n;
  });
  return <primitive object={line} />;
}
