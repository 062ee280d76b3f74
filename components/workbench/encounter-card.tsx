"use client";
/**
 * Encounter card: the numbers of the selected node. For a flyby: v∞ in/out, turn angle,
 * periapsis radius and altitude, powered Δv, the B-plane point (B·T, B·R, θ), epoch, time since
 * launch and its feasibility flag. For the launch and the arrival: their own numbers.
 */
import Link from "next/link";
import { PinnedComments } from "@/components/comments/comments-panel";
import type { ReactNode } from "react";
import { Card, CardHeader } from "@/components/ui/card";
import { FlagBadge } from "@/components/ui/badge";
import { Num } from "@/components/ui/num";
import { cn } from "@/components/ui/cn";
import { bodyLabel, dateTimeOf, days } from "@/lib/format";
import { flybyFlag, flybyOfNode, safeRpMin } from "@/lib/client/workbench-derive";
import type { TourResult, TourSpec } from "@/lib/astro/types";
import type { StoredTour } from "@/lib/validation/tour";

const DEG = 180 / Math.PI;
/** Rounded to 1e-9° so server and browser render the same text (their atan2 may differ in the last bit). */
const roundDeg = (x: number) => Math.round(x * 1e9) / 1e9;

export interface EncounterCardProps {
  tourId: number;
  tour: StoredTour;
  spec: TourSpec;
  result: TourResult | null;
  selectedNodeId: string | null;
  className?: string;
}

function Row({ label, children, testid }: { label: ReactNode; children: ReactNode; testid?: string }) {
  return (
    <>
      <dt className="text-muted">{label}</dt>
      <dd className="text-right text-ink" data-testid={testid}>
        {children}
      </dd>
    </>
  );
}

export function EncounterCard({ tourId, tour, spec, result, selectedNodeId, className }: EncounterCardProps) {
  const n = tour.nodes.length;
  const index = tour.nodes.findIndex((x) => x.id === selectedNodeId);
  const node = index >= 0 ? tour.nodes[index]! : null;
  const launch = tour.nodes[0];
  if (!node || !launch) {
    return (
      <Card className={className} aria-label="Encounter card" data-testid="encounter-card">
        <CardHeader title="Encounter" className="py-3" />
        <p className="px-5 py-4 text-sm text-muted">Select a node in the Chain, or a flyby marker in the Orrery, to read its numbers.</p>
      </Card>
    );
  }
  const since = days(node.epoch - launch.epoch);
  const title = (
    <span>
      Encounter · <span className="text-accent">{bodyLabel(node.body)}</span>{" "}
      <span className="font-normal text-muted">#{index + 1}</span>
    </span>
  );
  let body: ReactNode;
  let badge: ReactNode = null;
  if (index === 0) {
    body = (
      <>
        <Row label="Role">Launch</Row>
        <Row label="Launch C3"><Num value={result?.launch.c3} unit="km²/s²" digits={2} /></Row>
        <Row label="Launch v∞"><Num value={result?.launch.vinf} unit="km/s" digits={3} /></Row>
        <Row label="DLA"><Num value={result ? result.launch.dla * DEG : null} unit="°" digits={2} /></Row>
        <Row label="RLA"><Num value={result ? result.launch.rla * DEG : null} unit="°" digits={2} /></Row>
      </>
    );
  } else if (index === n - 1) {
    const a = tour.arrival;
    body = (
      <>
        <Row label="Role">Arrival ({a.kind})</Row>
        <Row label="Arrival v∞"><Num value={result?.arrival.vinf} unit="km/s" digits={3} /></Row>
        <Row label="Arrival Δv"><Num value={result?.arrival.dv} unit="km/s" digits={3} /></Row>
        {a.kind === "capture" ? (
          <>
            <Row label="Capture rp"><Num value={a.rp} unit="km" digits={0} /></Row>
            <Row label="Capture e"><Num value={a.e} digits={3} /></Row>
          </>
        ) : null}
      </>
    );
  } else {
    const f = flybyOfNode(result, index, n);
    const rpMin = safeRpMin(spec, node.body as TourSpec["nodes"][number]["body"]);
    const flag = f ? flybyFlag(f, rpMin) : null;
    badge = flag ? (
      <FlagBadge level={flag.level} title={flag.text}>
        {flag.level === "violated" ? "Infeasible" : flag.level === "margin" ? "Near minimum" : "Feasible"}
      </FlagBadge>
    ) : null;
    body = (
      <>
        <Row label="v∞ in" testid="enc-vinf-in"><Num value={f?.vinfIn} unit="km/s" digits={3} /></Row>
        <Row label="v∞ out"><Num value={f?.vinfOut} unit="km/s" digits={3} /></Row>
        <Row label="Turn angle"><Num value={f ? f.turnAngle * DEG : null} unit="°" digits={2} /></Row>
        <Row label="Periapsis rp"><Num value={f?.rp} unit="km" digits={0} /></Row>
        <Row label="Altitude"><Num value={f?.altitude} unit="km" digits={0} /></Row>
        <Row label="Minimum rp"><Num value={rpMin} unit="km" digits={0} /></Row>
        <Row label="Powered Δv"><Num value={f?.dv} unit="km/s" digits={3} /></Row>
        <Row label="B·T"><Num value={f?.bT} unit="km" digits={0} /></Row>
        <Row label="B·R"><Num value={f?.bR} unit="km" digits={0} /></Row>
        <Row label="θ"><Num value={f ? roundDeg(Math.atan2(f.bR, f.bT) * DEG) : null} unit="°" digits={2} /></Row>
      </>
    );
    if (flag) {
      body = (
        <>
          {body}
          <dd className="col-span-2 pt-1 text-xs text-muted">{flag.text} (min. rp <Num value={rpMin} unit="km" digits={0} />)</dd>
        </>
      );
    }
  }
  return (
    <Card className={cn(className)} aria-label="Encounter card" data-testid="encounter-card">
      <CardHeader title={title} actions={badge} className="py-3" />
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 px-5 py-3 text-sm">
        {body}
        <Row label="Epoch"><span className="num">{dateTimeOf(node.epoch)}</span> <span className="text-[0.85em] text-muted">UTC</span></Row>
        <Row label="Since launch"><Num value={since} unit="d" digits={1} /></Row>
      </dl>
      {index > 0 && index < n - 1 ? (
        <div className="border-t border-line px-5 py-2.5">
          <Link href={`/tours/${tourId}/aim/${encodeURIComponent(node.id)}`} className="text-sm font-medium text-accent underline-offset-2 hover:underline">
            Open the Aim board for this flyby →
          </Link>
        </div>
      ) : null}
      <PinnedComments tourId={tourId} nodeId={node.id} className="border-t border-line px-5 py-3" />
    </Card>
  );
}
