"use client";
/**
 * A body at the replay time: a marker of constant screen size whose size and shape tell the
 * bodies apart together with its label (never colour alone): small spheres for the terrestrial
 * planets, large spheres for the giants, a ring for the ringed giant, a faceted solid for small
 * bodies. Its position is read every frame from the cached ephemeris at `useTimeline` time.
 */
import { useRef } from "react";
import { useFrame } from "@react-three/fiber";
import { SceneLabel } from "./scene-label";
import { DoubleSide, type Group } from "three";
import { useTimeline } from "@/lib/client/timeline-store";
import type { BodyId } from "@/lib/astro/types";
import { useSceneFrame, worldPerPixel } from "./scene-frame";
import { toSceneInto } from "./scale";

export type PlanetShape = "sphere" | "ringed" | "faceted";

export interface PlanetMarkerProps {
  body: BodyId;
  label: string;
  color: string;
  /** Diameter on screen, px. */
  sizePx: number;
  shape?: PlanetShape;
  /** Emphasised label (e.g. a body of the tour). */
  emphasis?: boolean;
  onClick?(): void;
}

export function PlanetMarker({ body, label, color, sizePx, shape = "sphere", emphasis = false, onClick }: PlanetMarkerProps) {
  const frame = useSceneFrame();
  const ref = useRef<Group>(null);
  const p = useRef([0, 0, 0]);
  useFrame(({ camera, size }) => {
    const g = ref.current;
    if (!g) return;
    let r: ArrayLike<number>;
    try {
      r = frame.ephemeris.state(body, useTimeline.getState().time).r;
    } catch {
      g.visible = false;
      return;
    }
    g.visible = true;
    toSceneInto(p.current, 0, r[0]!, r[1]!, r[2]!, frame.originKm, frame.mode);
    g.position.set(p.current[0]!, p.current[1]!, p.current[2]!);
    const fov = (camera as { fov?: number }).fov ?? 50;
    g.scale.setScalar((worldPerPixel(camera.position.distanceTo(g.position), fov, size.height) * sizePx) / 2);
  });
  return (
    <group ref={ref}>
      <mesh
        onClick={
          onClick
            ? (e) => {
                e.stopPropagation();
                onClick();
              }
            : undefined
        }
      >
        {shape === "faceted" ? <dodecahedronGeometry args={[1, 0]} /> : <sphereGeometry args={[1, 20, 14]} />}
        <meshBasicMaterial color={color} />
      </mesh>
      {shape === "ringed" ? (
        <mesh rotation={[0.45, 0, 0]}>
          <ringGeometry args={[1.45, 2.1, 40]} />
          <meshBasicMaterial color={color} side={DoubleSide} transparent opacity={0.7} />
        </mesh>
      ) : null}
      <SceneLabel text={label} className={emphasis ? "font-semibold text-ink" : "text-muted"} offsetPx={[0, sizePx / 2 + 4]} />
    </group>
  );
}
