"use client";
/**
 * Δv budget (launch C3 and v∞, each flyby's powered Δv, arrival Δv, total) and the constraint
 * flags of the tour in plain language (TourResult.violations plus flybys close to their minimum).
 */
import { Card, CardHeader } from "@/components/ui/card";
import { FlagBadge } from "@/components/ui/badge";
import { Num } from "@/components/ui/num";
import { Spinner } from "@/components/ui/spinner";
import { bodyLabel } from "@/lib/format";
import { flybyFlag, safeRpMin } from "@/lib/client/workbench-derive";
import type { TourResult, TourSpec } from "@/lib/astro/types";
import type { StoredTour } from "@/lib/validation/tour";

export interface BudgetCardProps {
  tour: StoredTour;
  spec: TourSpec;
  result: TourResult | null;
  pending: boolean;
  error: string | null;
  onSelectNode?(nodeId: string): void;
  className?: string;
}

export function BudgetCard({ tour, result, pending, error, className }: BudgetCardProps) {
  const n = tour.nodes.length;
  return (
    <Card className={className} aria-label="Δv budget" data-testid="budget-card">
      <CardHeader
        title="Δv budget"
        className="py-3"
        actions={pending ? <span className="flex items-center gap-1.5 text-xs text-muted"><Spinner size={12} /> computing</span> : null}
      />
      {error ? <p className="px-5 pt-3 text-sm text-bad">The tour could not be evaluated: {error}</p> : null}
      <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1.5 px-5 py-3 text-sm" aria-busy={pending || undefined}>
        <dt className="text-muted">Launch C3</dt>
        <dd className="text-right" data-testid="budget-c3"><Num value={result?.launch.c3} unit="km²/s²" /></dd>
        <dt className="text-muted">Launch v∞</dt>
        <dd className="text-right"><Num value={result?.launch.vinf} unit="km/s" digits={3} /></dd>
        {tour.nodes.slice(1, -1).map((node, k) => (
          <FlybyRow key={node.id} label={`Flyby #${k + 2} ${bodyLabel(node.body)}`} dv={result?.flybys[k]?.dv} />
        ))}
        <dt className="text-muted">Arrival Δv <span className="text-faint">({tour.arrival.kind}, {bodyLabel(tour.nodes[n - 1]?.body ?? "")})</span></dt>
        <dd className="text-right"><Num value={result?.arrival.dv} unit="km/s" digits={3} /></dd>
        <dt className="border-t border-line pt-1.5 font-semibold text-ink">Total Δv</dt>
        <dd className="border-t border-line pt-1.5 text-right font-semibold" data-testid="budget-total">
          <Num value={result?.totalDv} unit="km/s" digits={3} />
        </dd>
        <dd className="col-span-2 text-xs text-faint">Flyby and arrival Δv; the launch vehicle supplies the launch v∞.</dd>
      </dl>
    </Card>
  );
}

function FlybyRow({ label, dv }: { label: string; dv: number | undefined }) {
  return (
    <>
      <dt className="text-muted">{label}</dt>
      <dd className="text-right"><Num value={dv} unit="km/s" digits={3} /></dd>
    </>
  );
}

export interface FlagsCardProps {
  tour: StoredTour;
  spec: TourSpec;
  result: TourResult | null;
  onSelectNode?(nodeId: string): void;
  className?: string;
}

export function FlagsCard({ tour, spec, result, onSelectNode, className }: FlagsCardProps) {
  const n = tour.nodes.length;
  const margins = result
    ? tour.nodes.slice(1, -1).flatMap((node, k) => {
        const f = result.flybys[k];
        if (!f) return [];
        const flag = flybyFlag(f, safeRpMin(spec, f.body));
        return flag.level === "margin" ? [{ node, index: k + 1, flag }] : [];
      })
    : [];
  const violations = result?.violations ?? [];
  return (
    <Card className={className} aria-label="Constraint flags" data-testid="flags-card">
      <CardHeader title="Constraints" className="py-3" />
      <ul className="space-y-2 px-5 py-3 text-sm">
        {!result ? <li className="text-muted">No result yet.</li> : null}
        {result && violations.length === 0 && margins.length === 0 ? (
          <li className="flex items-center gap-2">
            <FlagBadge level="ok">All met</FlagBadge>
            <span className="text-muted">Every leg solves; every flyby clears its minimum radius.</span>
          </li>
        ) : null}
        {violations.map((v, k) => {
          const node = tour.nodes[v.node];
          return (
            <li key={`v${k}`} className="flex items-start gap-2" data-testid="violation">
              <FlagBadge level="violated" className="shrink-0" />
              <span className="text-ink">
                {node ? (
                  <button type="button" className="mr-1 font-medium text-accent hover:underline" onClick={() => onSelectNode?.(node.id)}>
                    #{v.node + 1} {bodyLabel(node.body)}:
                  </button>
                ) : null}
                {v.message}
              </span>
            </li>
          );
        })}
        {margins.map(({ node, index, flag }) => (
          <li key={`m${node.id}`} className="flex items-start gap-2">
            <FlagBadge level="margin" className="shrink-0" />
            <span className="text-ink">
              <button type="button" className="mr-1 font-medium text-accent hover:underline" onClick={() => onSelectNode?.(node.id)}>
                #{index + 1} {bodyLabel(node.body)}:
              </button>
              flyby only {flag.text} (min. rp <Num value={flag.rpMin} unit="km" digits={0} />).
            </span>
          </li>
        ))}
        {n > 0 && result ? (
          <li className="pt-1 text-xs text-faint">“Margin” means less than max(200 km, 5 % of the minimum radius) to spare.</li>
        ) : null}
      </ul>
    </Card>
  );
}
