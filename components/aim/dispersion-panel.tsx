"use client";
/**
 * Delivery dispersion inputs (σ(B·T), σ(B·R), ρ, warning threshold) and the resulting
 * probabilities of a flyby below the minimum altitude or into the body, with the method named
 * and a plain warning above the threshold.
 */
import { Field } from "@/components/ui/field";
import { formatNum } from "@/components/ui/num";
import type { FlybyRisk } from "@/lib/aim/probability";

export interface DispersionDraft {
  sigmaT: string;
  sigmaR: string;
  rho: string;
  threshold: string;
}

export interface DispersionErrors {
  sigmaT?: string;
  sigmaR?: string;
  rho?: string;
  threshold?: string;
}

export interface DispersionPanelProps {
  draft: DispersionDraft;
  errors: DispersionErrors;
  editable: boolean;
  onChange(d: DispersionDraft): void;
  risk: FlybyRisk | null;
  threshold: number;
  bodyLabel: string;
}

/** Probability as text: "< 1e-12", "3.2e-4", "0.0412". */
export function formatProbability(p: number): string {
  if (!Number.isFinite(p)) return "—";
  if (p < 1e-12) return "< 1e-12";
  if (p < 0.01) return p.toExponential(1);
  if (p > 1 - 1e-6) return "≈ 1";
  return formatNum(p, 4);
}

export function DispersionPanel({ draft, errors, editable, onChange, risk, threshold, bodyLabel }: DispersionPanelProps) {
  const set = (k: keyof DispersionDraft) => (e: React.ChangeEvent<HTMLInputElement>) => onChange({ ...draft, [k]: e.target.value });
  const over = risk ? risk.pBelowMin > threshold : false;
  return (
    <div className="space-y-4">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Field label="σ(B·T)" unit="km" inputMode="decimal" value={draft.sigmaT} onChange={set("sigmaT")} error={errors.sigmaT} readOnly={!editable} data-testid="sigma-t" />
        <Field label="σ(B·R)" unit="km" inputMode="decimal" value={draft.sigmaR} onChange={set("sigmaR")} error={errors.sigmaR} readOnly={!editable} data-testid="sigma-r" />
        <Field label="correlation ρ" inputMode="decimal" value={draft.rho} onChange={set("rho")} error={errors.rho} readOnly={!editable} data-testid="sigma-rho" />
        <Field label="warn above" hint="probability" inputMode="decimal" value={draft.threshold} onChange={set("threshold")} error={errors.threshold} data-testid="risk-threshold" />
      </div>
      {risk ? (
        <div className="space-y-2 text-sm">
          <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1.5">
            <dt className="text-muted">P(periapsis below the minimum altitude, impact included)</dt>
            <dd className="num text-right text-ink" data-testid="p-below-min">{formatProbability(risk.pBelowMin)}</dd>
            <dt className="text-muted">P(impact on {bodyLabel})</dt>
            <dd className="num text-right text-ink" data-testid="p-impact">{formatProbability(risk.pImpact)}</dd>
          </dl>
          <p className="text-xs text-faint">
            Method: {risk.method}. The shaded ellipses about your aim point hold 39.3 % (1σ) and 98.9 % (3σ) of the delivered points.
          </p>
          {over ? (
            <p role="alert" data-testid="risk-warning" className="rounded-md border border-bad/50 bg-bad-soft px-3 py-2 text-sm text-ink">
              Warning: with these dispersions the flyby passes below the minimum altitude with probability {formatProbability(risk.pBelowMin)}, above
              your threshold of {formatProbability(threshold)}. Move the aim point away from the circles or tighten the delivery.
            </p>
          ) : null}
        </div>
      ) : (
        <p className="text-sm text-muted">Enter valid dispersions to see the probabilities.</p>
      )}
    </div>
  );
}
