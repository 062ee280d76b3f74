"use client";

import { useState } from "react";
import { Card, CardHeader } from "@/components/ui/card";

export interface FilesCardProps {
  tourId: number;
}

/**
 * Files out: the saved tour as JSON (importable), its node table as CSV, and its trajectory
 * sampled at a chosen step as a CCSDS Orbit Ephemeris Message. Exports the saved version.
 */
export function FilesCard({ tourId }: FilesCardProps) {
  const [step, setStep] = useState("1");
  const valid = /^\d+(\.\d+)?$/.test(step) && Number(step) >= 0.01 && Number(step) <= 365;
  const base = `/api/tours/${tourId}/export`;
  return (
    <Card data-testid="files-card">
      <CardHeader title="Files" description="Exports of the saved version." className="py-3" />
      <div className="flex flex-wrap items-end gap-2 px-5 pb-4 text-sm">
        <a className="rounded-md border border-line px-2.5 py-1.5 text-ink hover:bg-raised" href={`${base}?format=json`} download>
          Tour JSON
        </a>
        <a className="rounded-md border border-line px-2.5 py-1.5 text-ink hover:bg-raised" href={`${base}?format=csv`} download>
          Node table CSV
        </a>
        <span className="flex items-end gap-1.5">
          <label className="flex flex-col text-xs text-muted">
            OEM step (d)
            <input
              value={step}
              onChange={(e) => setStep(e.target.value)}
              inputMode="decimal"
              aria-label="OEM step in days"
              className="num mt-1 h-8 w-16 rounded-md border border-line bg-sunken px-2 text-sm text-ink"
            />
          </label>
          <a
            className={`rounded-md border border-line px-2.5 py-1.5 text-ink hover:bg-raised ${valid ? "" : "pointer-events-none opacity-50"}`}
            href={valid ? `${base}?format=oem&step=${step}` : undefined}
            aria-disabled={!valid}
            download
          >
            CCSDS OEM
          </a>
        </span>
      </div>
    </Card>
  );
}
