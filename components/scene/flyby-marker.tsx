"use client";
/**
 * A node of a tour (launch, flyby, arrival) where the spacecraft met the body: a ring of constant
 * screen size that always faces the camera, at the body's position at the node epoch. Clickable;
 * the selected node is drawn larger and thicker with its label shown.
 */
import { useMemo, useRef, useState } from "react";
import { useFrame } from "@react-three/fiber";
import { Billboard } from "@react-three/drei";
import { SceneLabel } from "./scene-label";
import type { Group } from "three";
import type { BodyId } from "@/lib/astro/types";
import { useSceneFrame, worldPerPixel } from "./scene-frame";
import { toSceneInto } from "./scale";

export interface FlybyMarkerProps {
  body: BodyId;
  /** Node epoch, TDB s past J2000. */
  epoch: number;
  label: string;
  color: string;
  selected?: boolean;
  /** Diameter on screen, px (default 18). */
  sizePx?: number;
  onSelect?(): void;
  testId?: string;
}

export function FlybyMarker({ body, epoch, label, color, selected = false, sizePx = 18, onSelect }: FlybyMarkerProps) {
  const frame = useSceneFrame();
  const ref = useRef<Group>(null);
  const [hover, setHover] = useState(false);
  const km = useMemo(() => {
    try {
      const r = frame.ephemeris.state(body, epoch).r;
      return [r[0], r[1], r[2]];
    } catch {
      return null;
    }
  }, [frame.ephemeris, body, epoch]);
  const p = useRef([0, 0, 0]);
  useFrame(({ camera, size }) => {
    const g = ref.current;
    if (!g || !km) return;
    toSceneInto(p.current, 0, km[0]!, km[1]!, km[2]!, frame.originKm, frame.mode);
    g.position.set(p.current[0]!, p.current[1]!, p.current[2]!);
    const fov = (camera as { fov?: number }).fov ?? 50;
    const px = selected || hover ? sizePx * 1.35 : sizePx;
    g.scale.setScalar((worldPerPixel(camera.position.distanceTo(g.position), fov, size.height) * px) / 2);
  });
  if (!km) return null;
  return (
    <group ref={ref}>
      <Billboard>
        <mesh
          onClick={(e) => {
            e.stopPropagation();
            onSelect?.();
          }}
          onPointerOver={(e) => {
            e.stopPropagation();
            setHover(true);
            document.body.style.cursor = onSelect ? "pointer" : "";
          }}
          onPointerOut={() => {
            setHover(false);
            document.body.style.cursor = "";
          }}
        >
          <ringGeometry args={[selected ? 0.62 : 0.72, 1, 32]} />
          <meshBasicMaterial color={color} transparent opacity={selected || hover ? 1 : 0.8} depthWrite={false} />
        </mesh>
      </Billboard>
      {selected || hover ? (
        <SceneLabel text={label} front className="rounded bg-canvas/85 px-1.5 py-1 text-ink" offsetPx={[0, -(sizePx + 16)]} />
      ) : null}
    </group>
  );
}
