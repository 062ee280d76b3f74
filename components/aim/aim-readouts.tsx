"use client";
/** Live readouts of the analyst's aim point beside the planned values, with constraint flags. */
import { Num } from "@/components/ui/num";
import { FlagBadge } from "@/components/ui/badge";
import { dateTimeOf } from "@/lib/format";
import type { AimReadout } from "@/lib/aim/outgoing";

export interface AimReadoutsProps {
  readout: AimReadout | null;
  planned: { bT: number; bR: number; rp: number; turnAngle: number };
  radius: number;
  rpMin: number;
  vinfIn: number;
  nextLabel: string;
  nextEpoch: number;
  /** Column title of the aim point (default "your aim"). */
  aimTitle?: string;
}

const DEG = 180 / Math.PI;

function Row({ label, children, planned, testId }: { label: string; children: React.ReactNode; planned?: React.ReactNode; testId?: string }) {
  return (
    <tr className="border-b border-line/60 last:border-0">
      <th scope="row" className="py-1.5 pr-3 text-left text-xs font-normal text-muted">
        {label}
      </th>
      <td className="py-1.5 text-right text-sm text-ink" data-testid={testId}>
        {children}
      </td>
      <td className="py-1.5 pl-3 text-right text-xs text-faint">{planned ?? ""}</td>
    </tr>
  );
}

export function AimReadouts({ readout: r, planned, radius, rpMin, vinfIn, nextLabel, nextEpoch, aimTitle = "your aim" }: AimReadoutsProps) {
  const altLevel = !r ? null : r.impact || r.belowMin ? "violated" : r.rp - rpMin < 0.1 * (rpMin - radius) + 50 ? "margin" : "ok";
  return (
    <div className="space-y-3">
      <table className="w-full">
        <thead>
          <tr className="text-[11px] uppercase tracking-wide text-faint">
            <th className="pb-1 text-left font-normal">quantity</th>
            <th className="pb-1 text-right font-normal">{aimTitle}</th>
            <th className="pb-1 pl-3 text-right font-normal">needed</th>
          </tr>
        </thead>
        <tbody>
          <Row label="B·T" testId="readout-bt" planned={<Num value={planned.bT} unit="km" digits={1} />}>
            <Num value={r?.bT} unit="km" digits={1} />
          </Row>
          <Row label="B·R" testId="readout-br" planned={<Num value={planned.bR} unit="km" digits={1} />}>
            <Num value={r?.bR} unit="km" digits={1} />
          </Row>
          <Row label="|B|" testId="readout-b" planned={<Num value={Math.hypot(planned.bT, planned.bR)} unit="km" digits={1} />}>
            <Num value={r?.b} unit="km" digits={1} />
          </Row>
          <Row label="θ" testId="readout-theta" planned={<Num value={Math.atan2(planned.bR, planned.bT) * DEG} unit="°" digits={2} />}>
            <Num value={r ? r.theta * DEG : null} unit="°" digits={2} />
          </Row>
          <Row label="periapsis radius rp" testId="readout-rp" planned={<Num value={planned.rp} unit="km" digits={1} />}>
            <Num value={r?.rp} unit="km" digits={1} />
          </Row>
          <Row label="altitude" testId="readout-alt" planned={<Num value={planned.rp - radius} unit="km" digits={1} />}>
            <Num value={r?.altitude} unit="km" digits={1} />
          </Row>
          <Row label="turn angle" testId="readout-turn" planned={<Num value={planned.turnAngle * DEG} unit="°" digits={3} />}>
            <Num value={r ? r.turnAngle * DEG : null} unit="°" digits={3} />
          </Row>
          <Row label="v∞ in / out" testId="readout-vinf">
            <Num value={vinfIn} digits={3} /> / <Num value={r?.vinfOutMag} unit="km/s" digits={3} />
          </Row>
        </tbody>
      </table>
      <div className="flex flex-wrap gap-2">
        {altLevel ? (
          <FlagBadge level={altLevel}>
            {r?.impact ? "hits the body" : r?.belowMin ? "below minimum altitude" : altLevel === "margin" ? "altitude near the minimum" : "altitude above the minimum"}
          </FlagBadge>
        ) : null}
        {r?.closest.onEdge ? <FlagBadge level="margin">closest approach at the edge of the searched window</FlagBadge> : null}
      </div>
      <div className="rounded-md border border-line bg-raised/40 p-3">
        <p className="mb-2 text-xs font-medium uppercase tracking-wide text-faint">Where the outgoing leg goes — {nextLabel}</p>
        <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-1.5 text-sm">
          <dt className="text-muted">closest approach</dt>
          <dd className="text-right" data-testid="readout-closest">
            <Num value={r?.closest.distance} unit="km" digits={0} group />
          </dd>
          <dt className="text-muted">on (UTC)</dt>
          <dd className="num text-right">{r ? dateTimeOf(r.closest.epoch) : "—"}</dd>
          <dt className="text-muted">versus planned encounter</dt>
          <dd className="text-right">
            <Num value={r ? r.dtVsPlanned / 3600 : null} unit="h" digits={1} signed />
          </dd>
          <dt className="text-muted">miss at the planned epoch ({dateTimeOf(nextEpoch)})</dt>
          <dd className="text-right" data-testid="readout-miss">
            <Num value={r?.missAtPlanned} unit="km" digits={0} group />
          </dd>
        </dl>
      </div>
    </div>
  );
}
