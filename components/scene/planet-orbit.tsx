"use client";
/**
 * One body's orbit as a closed line: its heliocentric positions sampled from the ephemeris over
 * one orbital period (from the osculating semi-major axis at `epoch`). Muted tone, thin line.
 * The km samples are computed once per body/epoch; the float32 scene buffer is refilled only
 * when the scene's rebase origin or scale mode changes.
 */
import { useEffect, useMemo, useRef } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import { BufferAttribute, BufferGeometry, Line, LineBasicMaterial } from "three";
import { stateToElements } from "@/lib/astro/kepler";
import { MU_SUN } from "@/lib/astro/constants";
import type { BodyId, Ephemeris } from "@/lib/astro/types";
import { useSceneFrame } from "./scene-frame";
import { fillScene } from "./scale";

export interface PlanetOrbitProps {
  body: BodyId;
  /** Ephemeris used to sample the orbit (a cheap one is best: samples span decades). */
  ephemeris: Ephemeris;
  /** Start of the sampled period, TDB s past J2000. */
  epoch: number;
  color: string;
  opacity?: number;
  /** Samples over the period (default 256). */
  points?: number;
}

/** Orbit samples, km, xyz interleaved; empty when the ephemeris cannot serve the body. */
export function sampleOrbitKm(ephemeris: Ephemeris, body: BodyId, epoch: number, points: number): Float64Array {
  try {
    const s0 = ephemeris.state(body, epoch);
    const el = stateToElements(s0.r, s0.v, MU_SUN);
    if (!(el.a > 0) || !(el.e < 1)) return new Float64Array(0);
    const period = 2 * Math.PI * Math.sqrt((el.a * el.a * el.a) / MU_SUN);
    const out = new Float64Array(3 * (points + 1));
    for (let k = 0; k <= points; k++) {
      // Close the loop on the first point (the real orbit does not close exactly over one period).
      const r = k === points ? s0.r : ephemeris.state(body, epoch + (period * k) / points).r;
      out[3 * k] = r[0];
      out[3 * k + 1] = r[1];
      out[3 * k + 2] = r[2];
    }
    return out;
  } catch {
    return new Float64Array(0);
  }
}

export function PlanetOrbit({ body, ephemeris, epoch, color, opacity = 0.55, points = 256 }: PlanetOrbitProps) {
  const frame = useSceneFrame();
  const km = useMemo(() => sampleOrbitKm(ephemeris, body, epoch, points), [ephemeris, body, epoch, points]);
  const line = useMemo(() => {
    const g = new BufferGeometry();
    g.setAttribute("position", new BufferAttribute(new Float32Array(Math.max(3, km.length)), 3));
    g.setDrawRange(0, km.length / 3);
    const m = new LineBasicMaterial({ color, transparent: true, opacity, depthWrite: false });
    const l = new Line(g, m);
    l.frustumCulled = false;
    return l;
  }, [km, color, opacity]);
  const seen = useRef(-1);
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    seen.current = -1;
    invalidate();
    return () => {
      line.geometry.dispose();
      (line.material as LineBasicMaterial).dispose();
    };
  }, [line, invalidate]);
  useFrame(() => {
    if (seen.current === frame.version || km.length === 0) return;
    const attr = line.geometry.getAttribute("position") as BufferAttribute;
    fillScene(attr.array as Float32Array, km, frame.originKm, frame.mode);
    attr.needsUpdate = true;
    line.geometry.computeBoundingSphere();
    seen.current = frame.version;
  });
  return <primitive object={line} />;
}
