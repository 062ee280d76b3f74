"use client";
/** The Sun: a bright disc of constant screen size at the heliocentric origin, labelled. */
import { useRef } from "react";
import { useFrame } from "@react-three/fiber";
import { SceneLabel } from "./scene-label";
import type { Group } from "three";
import { useSceneFrame, worldPerPixel } from "./scene-frame";
import { toSceneInto } from "./scale";
import { cssColor } from "./colors";

export interface SunProps {
  /** Diameter on screen, px. */
  sizePx?: number;
}

const ZERO = [0, 0, 0];

export function Sun({ sizePx = 16 }: SunProps) {
  const frame = useSceneFrame();
  const ref = useRef<Group>(null);
  const p = useRef([0, 0, 0]);
  useFrame(({ camera, size }) => {
    const m = ref.current;
    if (!m) return;
    toSceneInto(p.current, 0, ZERO[0]!, ZERO[1]!, ZERO[2]!, frame.originKm, frame.mode);
    m.position.set(p.current[0]!, p.current[1]!, p.current[2]!);
    const fov = (camera as { fov?: number }).fov ?? 50;
    m.scale.setScalar((worldPerPixel(camera.position.distanceTo(m.position), fov, size.height) * sizePx) / 2);
  });
  return (
    <group ref={ref}>
      <mesh>
        <sphereGeometry args={[1, 24, 16]} />
        <meshBasicMaterial color={cssColor("--gy-sun", "#f3e3a6")} />
      </mesh>
      <SceneLabel text="Sun" className="text-muted" offsetPx={[0, sizePx / 2 + 4]} />
    </group>
  );
}
