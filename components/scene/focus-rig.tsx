"use client";
/**
 * Keeps the camera on the focus: every frame it moves the rebase origin when the focused body has
 * drifted (or the scale changed), and moves the orbit-controls target onto the focus while keeping
 * the user's camera offset. A change of focus resets the camera distance to suit the new focus.
 */
import { useEffect, useRef } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import { Vector3 } from "three";
import { useTimeline } from "@/lib/client/timeline-store";
import { useSceneFrame } from "./scene-frame";
import { toSceneInto, SCENE_UNITS_PER_AU, type ScaleMode } from "./scale";
import { AU_KM } from "@/lib/astro/constants";
import type { BodyId } from "@/lib/astro/types";

export interface FocusRigProps {
  focus: BodyId | "sun";
  mode: ScaleMode;
}

/** Rebase when the focus has moved more than this from the origin, km. */
const REBASE_KM = 0.002 * AU_KM;

interface ControlsLike {
  target: Vector3;
  update(): void;
}

export function FocusRig({ focus, mode }: FocusRigProps) {
  const frame = useSceneFrame();
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as ControlsLike | null;
  const invalidate = useThree((s) => s.invalidate);
  const scratch = useRef({ km: new Float64Array(3), scene: [0, 0, 0], offset: new Vector3(), reset: true });

  useEffect(() => {
    scratch.current.reset = true;
    invalidate();
  }, [focus, mode, controls, invalidate]);

  useFrame(() => {
    const s = scratch.current;
    const t = useTimeline.getState().time;
    if (focus === "sun") {
      s.km[0] = 0;
      s.km[1] = 0;
      s.km[2] = 0;
    } else {
      try {
        const r = frame.ephemeris.state(focus, t).r;
        s.km[0] = r[0];
        s.km[1] = r[1];
        s.km[2] = r[2];
      } catch {
        // keep the last position
      }
    }
    const o = frame.originKm;
    const drift = Math.hypot(s.km[0]! - o[0]!, s.km[1]! - o[1]!, s.km[2]! - o[2]!);
    if (frame.mode !== mode || drift > REBASE_KM) {
      o.set(s.km);
      frame.mode = mode;
      frame.version++;
    }
    toSceneInto(s.scene, 0, s.km[0]!, s.km[1]!, s.km[2]!, o, mode);
    if (!controls) return;
    if (s.reset) {
      const dist = focus === "sun" ? (mode === "log" ? 5.4 : 14) * SCENE_UNITS_PER_AU : 0.45 * SCENE_UNITS_PER_AU;
      s.offset.set(0, -0.6, 0.8).normalize().multiplyScalar(dist);
      s.reset = false;
    } else {
      s.offset.copy(camera.position).sub(controls.target);
    }
    controls.target.set(s.scene[0]!, s.scene[1]!, s.scene[2]!);
    camera.position.copy(controls.target).add(s.offset);
    controls.update();
  }, -1);

  return null;
}
