"use client";
/**
 * The Orrery's cell in the Workbench grid: adapts the Workbench state (draft nodes, worker
 * samples, selection) to the scene's props. The scene reads the replay time itself.
 */
import { useMemo } from "react";
import { Orrery } from "@/components/scene/orrery";
import { bodyLabel } from "@/lib/format";
import type { BodyId, EphemerisSpec, TourSamples } from "@/lib/astro/types";
import type { StoredTour } from "@/lib/validation/tour";

export interface OrreryCellProps {
  tourId: string;
  label: string;
  nodes: StoredTour["nodes"];
  samples: TourSamples | null;
  ephemeris: EphemerisSpec;
  selectedNodeId: string | null;
  onSelectNodeIndex(index: number): void;
  className?: string;
}

export function OrreryCell({ tourId, label, nodes, samples, ephemeris, selectedNodeId, onSelectNodeIndex, className }: OrreryCellProps) {
  const tours = useMemo(
    () => [
      {
        id: tourId,
        label,
        samples,
        primary: true,
        nodes: nodes.map((n, i) => ({ body: n.body as BodyId, epoch: n.epoch, label: `#${i + 1} ${bodyLabel(n.body)}` })),
      },
    ],
    [tourId, label, samples, nodes],
  );
  const selected = nodes.findIndex((n) => n.id === selectedNodeId);
  return (
    <Orrery
      className={className}
      tours={tours}
      ephemeris={ephemeris}
      selectedNode={selected >= 0 ? selected : null}
      onSelectNode={(id, index) => {
        if (id === tourId) onSelectNodeIndex(index);
      }}
    />
  );
}
