"use client";
/**
 * Shown when saving answers 409 stale_version: someone saved the tour after it was opened here.
 * Lists what differs (nodes, epochs, options) and the key numbers of both versions, and lets the
 * user load theirs (discarding the draft) or, for the lead and the tour's owner, overwrite.
 */
import { useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";
import { Num } from "@/components/ui/num";
import { keyNumbers, tourChanges } from "@/lib/client/workbench-derive";
import type { StoredTour } from "@/lib/validation/tour";
import type { TourResult } from "@/lib/astro/types";

export interface ConflictDialogProps {
  message: string;
  mine: StoredTour;
  mineResult: TourResult | null;
  theirs: { tour: StoredTour; result: TourResult | null; version: number; ownerName?: string };
  myVersion: number;
  canOverwrite: boolean;
  pending: boolean;
  onLoadTheirs(): void;
  onOverwrite(): void;
  onClose(): void;
}

export function ConflictDialog({ message, mine, mineResult, theirs, myVersion, canOverwrite, pending, onLoadTheirs, onOverwrite, onClose }: ConflictDialogProps) {
  const changes = tourChanges(mine, theirs.tour);
  const a = keyNumbers(mine, mineResult);
  const b = keyNumbers(theirs.tour, theirs.result);
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") onClose();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [onClose]);
  const rows: { label: string; unit: string; digits: number; x: number | null; y: number | null }[] = [
    { label: "Launch C3", unit: "km²/s²", digits: 2, x: a.c3, y: b.c3 },
    { label: "Launch v∞", unit: "km/s", digits: 3, x: a.launchVinf, y: b.launchVinf },
    { label: "Total Δv", unit: "km/s", digits: 3, x: a.totalDv, y: b.totalDv },
    { label: "Arrival v∞", unit: "km/s", digits: 3, x: a.arrivalVinf, y: b.arrivalVinf },
    { label: "Flight time", unit: "d", digits: 1, x: a.tofDays, y: b.tofDays },
    { label: "Violations", unit: "", digits: 0, x: a.violations, y: b.violations },
  ];
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-canvas/80 p-4 backdrop-blur-sm">
      <div
        ref={ref}
        tabIndex={-1}
        role="dialog"
        aria-modal="true"
        aria-labelledby="conflict-title"
        data-testid="conflict-dialog"
        className="max-h-[90dvh] w-full max-w-2xl overflow-y-auto rounded-panel border border-line-strong bg-surface shadow-panel focus:outline-none"
      >
        <div className="border-b border-line px-5 py-4">
          <h2 id="conflict-title" className="text-base font-semibold text-ink">This tour changed while you were editing</h2>
          <p className="mt-1 text-sm text-muted">{message}</p>
        </div>
        <div className="space-y-4 px-5 py-4">
          <table className="w-full text-sm">
            <thead className="text-left text-xs tracking-wide text-muted uppercase">
              <tr>
                <th className="py-1 font-medium">What</th>
                <th className="py-1 font-medium">Yours (from v{myVersion})</th>
                <th className="py-1 font-medium">Theirs (v{theirs.version})</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {changes.length === 0 ? (
                <tr>
                  <td colSpan={3} className="py-2 text-muted">The chains are the same; only the version moved on.</td>
                </tr>
              ) : (
                changes.map((c, k) => (
                  <tr key={k} data-testid="conflict-change">
                    <td className="py-1.5 pr-3 text-ink">{c.what}</td>
                    <td className="num py-1.5 pr-3">{c.mine}</td>
                    <td className="num py-1.5">{c.theirs}</td>
                  </tr>
                ))
              )}
              {rows.map((r) => (
                <tr key={r.label}>
                  <td className="py-1.5 pr-3 text-muted">{r.label}</td>
                  <td className="py-1.5 pr-3"><Num value={r.x} unit={r.unit || undefined} digits={r.digits} /></td>
                  <td className="py-1.5"><Num value={r.y} unit={r.unit || undefined} digits={r.digits} /></td>
                </tr>
              ))}
            </tbody>
          </table>
          {!canOverwrite ? (
            <p className="text-xs text-muted">Only the team lead and the tour&apos;s owner{theirs.ownerName ? ` (${theirs.ownerName})` : ""} may overwrite a newer version.</p>
          ) : null}
        </div>
        <div className="flex flex-wrap items-center justify-end gap-2 border-t border-line px-5 py-3">
          <Button variant="ghost" onClick={onClose} disabled={pending}>
            Keep editing
          </Button>
          <Button variant="secondary" onClick={onLoadTheirs} disabled={pending} data-testid="conflict-load-theirs">
            Load their version
          </Button>
          {canOverwrite ? (
            <Button variant="danger" onClick={onOverwrite} pending={pending} data-testid="conflict-overwrite">
              Overwrite with mine
            </Button>
          ) : null}
        </div>
      </div>
    </div>
  );
}
