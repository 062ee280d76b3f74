"use client";
/**
 * The spacecraft at the replay time: a small diamond (octahedron) of constant screen size at
 * `spacecraftAt(samples, time)`, mutated every frame from `useTimeline.getState().time`.
 */
import { useRef } from "react";
import { useFrame } from "@react-three/fiber";
import type { Mesh } from "three";
import { useTimeline } from "@/lib/client/timeline-store";
import { spacecraftAtInto } from "@/lib/astro/sample";
import type { TourSamples } from "@/lib/astro/types";
import { useSceneFrame, worldPerPixel } from "./scene-frame";
import { toSceneInto } from "./scale";

export interface SpacecraftProps {
  samples: TourSamples;
  color: string;
  /** Diameter on screen, px (default 12). */
  sizePx?: number;
  opacity?: number;
}

export function Spacecraft({ samples, color, sizePx = 12, opacity = 1 }: SpacecraftProps) {
  const frame = useSceneFrame();
  const ref = useRef<Mesh>(null);
  const scratch = useRef({ km: new Float64Array(3), p: [0, 0, 0] });
  useFrame(({ camera, size }) => {
    const m = ref.current;
    if (!m || samples.epochs.length === 0) return;
    const s = scratch.current;
    spacecraftAtInto(samples, useTimeline.getState().time, s.km);
    toSceneInto(s.p, 0, s.km[0]!, s.km[1]!, s.km[2]!, frame.originKm, frame.mode);
    m.position.set(s.p[0]!, s.p[1]!, s.p[2]!);
    const fov = (camera as { fov?: number }).fov ?? 50;
    m.scale.setScalar((worldPerPixel(camera.position.distanceTo(m.position), fov, size.height) * sizePx) / 2);
  });
  return (
    <mesh ref={ref}>
      <octahedronGeometry args={[1, 0]} />
      <meshBasicMaterial color={color} transparent={opacity < 1} opacity={opacity} />
    </mesh>
  );
}
