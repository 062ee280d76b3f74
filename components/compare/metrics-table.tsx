import Link from "next/link";
import type { ReactNode } from "react";
import { Badge, StatusBadge } from "@/components/ui/badge";
import { Num } from "@/components/ui/num";
import { bestIds, type CompareItem, type CompareMetric } from "@/lib/tours/compare";
import { bodyLabel, dateOf, days } from "@/lib/format";
import { ExportLinks } from "./export-links";
import { TourTag } from "./tour-tag";

function BestMark() {
  return (
    <Badge tone="accent" className="ml-2 h-5 px-1.5" icon={
      <svg viewBox="0 0 12 12" width="11" height="11" aria-hidden className="shrink-0">
        <path d="M6 1.2 7.4 4.2l3.3.4-2.4 2.3.6 3.3L6 8.6 3.1 10.2l.6-3.3L1.3 4.6l3.3-.4z" fill="currentColor" />
      </svg>
    }>
      best
    </Badge>
  );
}

interface Row {
  metric: CompareMetric;
  label: string;
  hint?: string;
  cell: (i: CompareItem) => ReactNode;
  /** Shown under the value (and under the best badge). */
  detail?: (i: CompareItem) => ReactNode;
}

const ROWS: Row[] = [
  { metric: "launch", label: "Launch (UTC)", cell: (i) => <span className="num">{dateOf(i.launchTdbS)}</span> },
  { metric: "arrival", label: "Arrival (UTC)", hint: "earliest is best", cell: (i) => <span className="num">{dateOf(i.arrivalTdbS)}</span> },
  { metric: "c3", label: "Launch C3", hint: "lowest is best", cell: (i) => <Num value={i.c3Km2S2} unit="km²/s²" digits={2} /> },
  { metric: "launchVinf", label: "Launch v∞", hint: "lowest is best", cell: (i) => <Num value={i.launchVinfKmS} unit="km/s" digits={3} /> },
  { metric: "totalDv", label: "Total Δv (flybys + arrival)", hint: "lowest is best", cell: (i) => <Num value={i.totalDvKmS} unit="km/s" digits={3} /> },
  { metric: "tof", label: "Flight time", hint: "shortest is best", cell: (i) => <Num value={days(i.tofS)} unit="d" digits={0} /> },
  { metric: "arrivalVinf", label: "Arrival v∞", hint: "lowest is best", cell: (i) => <Num value={i.arrivalVinfKmS} unit="km/s" digits={3} /> },
  {
    metric: "margin",
    label: "Smallest flyby margin",
    hint: "largest is best",
    cell: (i) =>
      i.flybys.length === 0 ? (
        <span className="text-xs text-faint">no flybys</span>
      ) : (
        <Num value={i.minFlybyMarginKm} unit="km" digits={0} group className={i.minFlybyMarginKm !== null && i.minFlybyMarginKm < 0 ? "text-bad" : undefined} />
      ),
    detail: (i) =>
      i.flybys.length === 0 ? null : (
        <ul className="mt-1 space-y-0.5 text-xs text-muted" aria-label={`Flyby margins of ${i.name}`}>
          {i.flybys.map((f) => (
            <li key={f.nodeId} className="whitespace-nowrap">
              {bodyLabel(f.body)} <Num value={f.marginKm} unit="km" digits={0} group />
              {f.marginKm !== null && f.marginKm < 0 ? <span className="ml-1 font-medium text-bad">below limit</span> : null}
            </li>
          ))}
        </ul>
      ),
  },
  {
    metric: "violations",
    label: "Constraint violations",
    hint: "fewest is best",
    cell: (i) => (
      <span title={i.violations.map((x) => x.message).join("\n") || undefined}>
        <Num value={i.violationCount} digits={0} />
        {i.violationCount > 0 ? <span className="ml-1 text-xs text-bad">({[...new Set(i.violations.map((x) => x.kind.replace(/_/g, " ")))].join(", ")})</span> : null}
      </span>
    ),
  },
  { metric: "status", label: "Review status", cell: (i) => <StatusBadge status={i.status} /> },
];

/** The metrics table: one column per tour, the best value of each row marked with a text badge. */
export function MetricsTable({ items }: { items: CompareItem[] }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line">
      <table className="w-full text-sm" style={{ minWidth: 220 + items.length * 190 }} aria-label="Tour metrics side by side">
        <thead className="bg-raised align-top">
          <tr>
            <th className="w-56 px-4 py-3 text-left text-xs font-medium uppercase tracking-wide text-muted">Metric</th>
            {items.map((i, k) => (
              <th key={i.id} scope="col" className="px-4 py-3 text-left font-normal" data-tour-id={i.id}>
                <div className="flex items-start gap-2">
                  <TourTag index={k} className="mt-0.5" />
                  <div className="min-w-0">
                    <Link href={`/tours/${i.id}`} className="font-semibold text-ink hover:text-accent">{i.name}</Link>
                    <div className="mt-0.5 text-xs text-muted">{i.chain.map(bodyLabel).join(" → ")}</div>
                    <div className="mt-0.5 text-xs text-faint">{i.ownerName}</div>
                    <div className="mt-1.5"><ExportLinks id={i.id} name={i.name} /></div>
                  </div>
                </div>
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-line bg-surface">
          {ROWS.map((r) => {
            const best = bestIds(items, r.metric);
            return (
              <tr key={r.metric} data-metric={r.metric}>
                <th scope="row" className="px-4 py-2.5 text-left align-top font-medium text-ink">
                  {r.label}
                  {r.hint ? <div className="text-xs font-normal text-faint">{r.hint}</div> : null}
                </th>
                {items.map((i) => (
                  <td key={i.id} className="px-4 py-2.5 align-top" data-best={best.includes(i.id) ? "true" : undefined}>
                    <div className="flex flex-wrap items-center gap-y-1">
                      {r.cell(i)}
                      {best.includes(i.id) ? <BestMark /> : null}
                    </div>
                    {r.detail?.(i)}
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
