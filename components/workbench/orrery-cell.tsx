"use client";
/**
 * The Orrery's cell in the Workbench grid: adapts the Workbench state to the scene's props.
 * Until the 3D scene lands, a plain placeholder keeps the layout.
 */
import { cn } from "@/components/ui/cn";
import { bodyLabel } from "@/lib/format";
import type { EphemerisSpec, TourSamples } from "@/lib/astro/types";
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

export function OrreryCell({ nodes, samples, className }: OrreryCellProps) {
  return (
    <div
      data-testid="orrery-cell"
      className={cn("flex items-center justify-center rounded-panel border border-dashed border-line-strong bg-sunken text-sm text-muted", className)}
    >
      <div className="text-center">
        <p>Orrery</p>
        <p className="mt-1 text-xs text-faint">
          {nodes.map((n) => bodyLabel(n.body)).join(" → ")} · {samples ? `${samples.epochs.length} samples` : "sampling…"}
        </p>
      </div>
    </div>
  );
}
