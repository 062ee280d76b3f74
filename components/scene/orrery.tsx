"use client";
/**
 * Orrery: the 3D view of the solar system and one or more tours. Hosts the R3F <Canvas> (imported
 * normally; `preserveDrawingBuffer` so that tests can read pixels), the Sun, planet orbits and
 * planets at the replay time (`useTimeline`), each tour's heliocentric arcs (warm accent for the
 * primary tour, dimmer for the others), flyby markers (clickable), a moving spacecraft, an optional
 * perturbed outgoing arc (dashed), orbit camera controls, a focus picker (Sun / each node body)
 * and a log/linear distance scale. km become scene units only in ./scale.ts; positions are rebased
 * near the focus (./focus-rig.tsx) to keep float32 precision.
 * Frames are drawn on demand (replay clock changes, camera moves, new data), not continuously:
 * software WebGL (headless, remote desktops) would otherwise spend the main thread redrawing an
 * unchanged scene.
 */
import { useMemo, useState } from "react";
import { Canvas } from "@react-three/fiber";
import { RedrawOnReplay } from "./redraw-on-replay";
import { OrbitControls } from "@react-three/drei";
import { ephemerisFromSpec, meanElementsEphemeris } from "@/lib/astro/ephemeris";
import { PLANET_IDS } from "@/lib/astro/constants";
import type { BodyId, Ephemeris, EphemerisSpec, TourSamples } from "@/lib/astro/types";
import { bodyLabel } from "@/lib/format";
import { cn } from "@/components/ui/cn";
import { SceneFrameContext, type SceneFrame } from "./scene-frame";
import type { ScaleMode } from "./scale";
import { FocusRig } from "./focus-rig";
import { Sun } from "./sun";
import { PlanetOrbit } from "./planet-orbit";
import { PlanetMarker, type PlanetShape } from "./planet-marker";
import { TrajectoryLine } from "./trajectory-line";
import { FlybyMarker } from "./flyby-marker";
import { Spacecraft } from "./spacecraft";
import { bodyColor, cssColor } from "./colors";

export interface OrreryTour {
  id: string;
  label: string;
  samples: TourSamples | null;
  nodes: { body: BodyId; epoch: number; label: string }[];
  /** A perturbed outgoing arc, km, heliocentric ecliptic J2000, xyz interleaved (drawn dashed). */
  perturbed?: Float64Array;
  primary?: boolean;
}

export interface OrreryProps {
  tours: OrreryTour[];
  ephemeris: EphemerisSpec;
  focus?: BodyId | "sun";
  onFocusChange?(f: BodyId | "sun"): void;
  /** Selected node index of the primary tour. */
  selectedNode?: number | null;
  onSelectNode?(tourId: string, index: number): void;
  className?: string;
}

/** Marker diameter (px) and shape per planet: size and shape, with the label, tell them apart. */
const LOOK: Record<string, { px: number; shape: PlanetShape }> = {
  mercury: { px: 6, shape: "sphere" },
  venus: { px: 8, shape: "sphere" },
  earth: { px: 8, shape: "sphere" },
  mars: { px: 7, shape: "sphere" },
  jupiter: { px: 13, shape: "sphere" },
  saturn: { px: 11, shape: "ringed" },
  uranus: { px: 10, shape: "sphere" },
  neptune: { px: 10, shape: "sphere" },
  pluto: { px: 6, shape: "faceted" },
};

let versionSeed = 1;

function buildEphemerides(spec: EphemerisSpec): { fast: Ephemeris; orbits: Ephemeris } | { error: string } {
  try {
    const fast = ephemerisFromSpec({ ...spec, cached: spec.kind === "vsop" ? true : spec.cached });
    // Orbit lines span decades per body: sample them from the mean-elements ephemeris (the JPL
    // table of approximate elements; a Kepler solve per point, ~100× cheaper than the series).
    // Its error (≤ ~600,000 km for Jupiter) is below a pixel at the scale of a whole orbit.
    const orbits = meanElementsEphemeris(spec.customBodies ? { customBodies: spec.customBodies } : {});
    return { fast, orbits };
  } catch (err) {
    return { error: err instanceof Error ? err.message : String(err) };
  }
}

function OverlayButton({ active, onClick, children, testId }: { active: boolean; onClick(): void; children: React.ReactNode; testId?: string }) {
  return (
    <button
      type="button"
      aria-pressed={active}
      data-testid={testId}
      onClick={onClick}
      className={cn(
        "h-7 rounded px-2 text-xs font-medium transition-colors focus-visible:outline-2 focus-visible:outline-accent",
        active ? "bg-raised text-ink ring-1 ring-line-strong" : "text-muted hover:bg-raised/70 hover:text-ink",
      )}
    >
      {children}
    </button>
  );
}

export function Orrery({ tours, ephemeris, focus, onFocusChange, selectedNode = null, onSelectNode, className }: OrreryProps) {
  const specKey = JSON.stringify(ephemeris ?? null);
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const ephs = useMemo(() => buildEphemerides(ephemeris), [specKey]);
  const [innerFocus, setInnerFocus] = useState<BodyId | "sun">(focus ?? "sun");
  const currentFocus = focus ?? innerFocus;
  const [mode, setMode] = useState<ScaleMode>("log");

  const frame = useMemo<SceneFrame | null>(
    () => ("fast" in ephs ? { originKm: new Float64Array(3), mode: "log", version: versionSeed++ * 1000, ephemeris: ephs.fast } : null),
    [ephs],
  );

  const nodeBodies = useMemo(() => {
    const seen = new Set<BodyId>();
    for (const t of tours) for (const n of t.nodes) seen.add(n.body);
    return [...seen];
  }, [tours]);
  const bodies = useMemo(() => {
    const list: BodyId[] = PLANET_IDS.filter((p) => p !== "pluto");
    for (const b of nodeBodies) if (!list.includes(b)) list.push(b);
    return list;
  }, [nodeBodies]);
  const orbitEpoch = tours[0]?.nodes[0]?.epoch ?? 0;

  const accent = cssColor("--gy-accent", "#f0a24a");
  const dim = cssColor("--gy-muted", "#a3abbd");
  const background = cssColor("--gy-sunken", "#0c1019");

  const chooseFocus = (f: BodyId | "sun") => {
    setInnerFocus(f);
    onFocusChange?.(f);
  };

  return (
    <div data-testid="orrery" className={cn("relative min-h-[240px] overflow-hidden rounded-panel border border-line bg-sunken", className)}>
      {"error" in ephs || !frame ? (
        <p className="p-4 text-sm text-bad">The scene cannot load its ephemeris: {"error" in ephs ? ephs.error : "unknown"}</p>
      ) : (
        <Canvas
          gl={{ preserveDrawingBuffer: true, antialias: true }}
          frameloop="demand"
          dpr={[1, 2]}
          camera={{ fov: 45, near: 0.0005, far: 5000, up: [0, 0, 1], position: [0, -30, 26] }}
          fallback={<p className="p-4 text-sm text-muted">This browser cannot draw the 3D scene (WebGL is unavailable).</p>}
          className="!absolute inset-0"
        >
          <color attach="background" args={[background]} />
          <RedrawOnReplay />
          <SceneFrameContext.Provider value={frame}>
            <FocusRig focus={currentFocus} mode={mode} />
            <Sun />
            {bodies.map((b) => (
              <PlanetOrbit key={`orbit-${b}`} body={b} ephemeris={ephs.orbits} epoch={orbitEpoch} color={bodyColor(b)} opacity={0.4} />
            ))}
            {bodies.map((b) => (
              <PlanetMarker
                key={`planet-${b}`}
                body={b}
                label={bodyLabel(b)}
                color={bodyColor(b)}
                sizePx={LOOK[b]?.px ?? 6}
                shape={LOOK[b]?.shape ?? "faceted"}
                emphasis={nodeBodies.includes(b)}
                onClick={nodeBodies.includes(b) ? () => chooseFocus(b) : undefined}
              />
            ))}
            {tours.map((t) => {
              const color = t.primary ? accent : dim;
              const opacity = t.primary ? 1 : 0.45;
              const s = t.samples;
              const total = s ? s.epochs.length : 0;
              return (
                <group key={`tour-${t.id}`}>
                  {s
                    ? s.legStarts.map((start, i) =>
                        s.legOk?.[i] === false ? null : (
                          <TrajectoryLine
                            key={`leg-${i}`}
                            positionsKm={s.positions}
                            from={start}
                            count={(s.legStarts[i + 1] ?? total) - start}
                            color={color}
                            opacity={opacity}
                          />
                        ),
                      )
                    : null}
                  {t.perturbed && t.perturbed.length >= 6 ? (
                    <TrajectoryLine positionsKm={t.perturbed} color={accent} opacity={0.95} dashed />
                  ) : null}
                  {t.nodes.map((n, i) => (
                    <FlybyMarker
                      key={`node-${i}`}
                      body={n.body}
                      epoch={n.epoch}
                      label={n.label}
                      color={color}
                      selected={!!t.primary && selectedNode === i}
                      onSelect={onSelectNode ? () => onSelectNode(t.id, i) : undefined}
                    />
                  ))}
                  {s && total > 0 ? <Spacecraft samples={s} color={color} opacity={t.primary ? 1 : 0.6} /> : null}
                </group>
              );
            })}
          </SceneFrameContext.Provider>
          <OrbitControls makeDefault enableDamping={false} minDistance={0.01} maxDistance={600} />
        </Canvas>
      )}
      <div className="pointer-events-none absolute inset-x-0 top-0 z-10 flex flex-wrap items-start justify-between gap-2 p-2">
        <div className="pointer-events-auto flex flex-wrap items-center gap-1 rounded-md border border-line bg-canvas/85 p-1" role="group" aria-label="Focus">
          <span className="px-1.5 text-[11px] uppercase tracking-wide text-faint">Focus</span>
          <OverlayButton active={currentFocus === "sun"} onClick={() => chooseFocus("sun")} testId="orrery-focus-sun">
            Sun
          </OverlayButton>
          {nodeBodies.map((b) => (
            <OverlayButton key={b} active={currentFocus === b} onClick={() => chooseFocus(b)} testId={`orrery-focus-${b}`}>
              {bodyLabel(b)}
            </OverlayButton>
          ))}
        </div>
        <div className="pointer-events-auto flex items-center gap-1 rounded-md border border-line bg-canvas/85 p-1" role="group" aria-label="Distance scale">
          <span className="px-1.5 text-[11px] uppercase tracking-wide text-faint">Scale</span>
          <OverlayButton active={mode === "log"} onClick={() => setMode("log")} testId="orrery-scale-log">
            Log
          </OverlayButton>
          <OverlayButton active={mode === "linear"} onClick={() => setMode("linear")} testId="orrery-scale-linear">
            Linear
          </OverlayButton>
        </div>
      </div>
      <div className="pointer-events-none absolute bottom-2 left-2 z-10 flex flex-wrap items-center gap-3 rounded-md border border-line bg-canvas/85 px-2 py-1 text-[11px] text-muted">
        <span className="flex items-center gap-1">
          <svg width="10" height="10" viewBox="0 0 10 10" aria-hidden>
            <path d="M5 0 10 5 5 10 0 5Z" fill="var(--gy-accent)" />
          </svg>
          spacecraft
        </span>
        <span className="flex items-center gap-1">
          <svg width="18" height="6" viewBox="0 0 18 6" aria-hidden>
            <path d="M0 3H18" stroke="var(--gy-accent)" strokeWidth="2" />
          </svg>
          planned arc
        </span>
        {tours.some((t) => t.perturbed) ? (
          <span className="flex items-center gap-1">
            <svg width="18" height="6" viewBox="0 0 18 6" aria-hidden>
              <path d="M0 3H18" stroke="var(--gy-accent)" strokeWidth="2" strokeDasharray="4 3" />
            </svg>
            outgoing arc from the aim point
          </span>
        ) : null}
        <span className="flex items-center gap-1">
          <svg width="10" height="10" viewBox="0 0 10 10" aria-hidden>
            <circle cx="5" cy="5" r="3.8" fill="none" stroke="var(--gy-accent)" strokeWidth="1.6" />
          </svg>
          node (click)
        </span>
        <span>{mode === "log" ? "log distance scale" : "true distances"}</span>
      </div>
    </div>
  );
}
