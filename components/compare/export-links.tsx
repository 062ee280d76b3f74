"use client";

import { useState } from "react";

const STEPS = [0.5, 1, 2, 5, 10];

/** Download links for one tour: tour JSON, node table CSV, and the trajectory as a CCSDS OEM at a chosen step. */
export function ExportLinks({ id, name }: { id: number; name: string }) {
  const [step, setStep] = useState(1);
  const link = "rounded px-1.5 py-0.5 text-xs font-medium text-accent underline-offset-2 hover:bg-accent-soft hover:underline";
  return (
    <div className="flex flex-wrap items-center gap-1" aria-label={`Downloads for ${name}`} role="group">
      <a className={link} href={`/api/tours/${id}/export?format=json`} download aria-label={`${name}: tour JSON`}>JSON</a>
      <a className={link} href={`/api/tours/${id}/export?format=csv`} download aria-label={`${name}: node table CSV`}>CSV</a>
      <a className={link} href={`/api/tours/${id}/export?format=oem&step=${step}`} download aria-label={`${name}: trajectory OEM, ${step}-day step`}>OEM</a>
      <label className="flex items-center gap-1 text-xs text-muted">
        <span className="sr-only">OEM step for {name}</span>
        <select value={step} onChange={(e) => setStep(Number(e.target.value))} className="h-6 rounded border border-line bg-sunken px-1 text-xs text-ink">
          {STEPS.map((s) => (
            <option key={s} value={s}>{s} d</option>
          ))}
        </select>
      </label>
    </div>
  );
}
