"use client";
/**
 * Chain: the ordered nodes of the tour (launch, flybys, arrival) with their bodies, epochs and
 * options, the legs between them and the arrival. Editors (lead/designer) change everything;
 * an analyst changes only the flyby minimum radius; a viewer reads.
 */
import Link from "next/link";
import { Card, CardHeader } from "@/components/ui/card";
import { FlagBadge } from "@/components/ui/badge";
import { Num } from "@/components/ui/num";
import { cn } from "@/components/ui/cn";
import { bodyLabel, dateTimeOf, days } from "@/lib/format";
import {
  MAX_NODES,
  MIN_NODES,
  addNode,
  moveNode,
  removeNode,
  setArrival,
  setLeg,
  setNodeBody,
  setNodeEpoch,
  setNodeWindow,
  setRpMin,
} from "@/lib/client/workbench-edits";
import { useWorkbench } from "@/lib/client/workbench-store";
import { flybyFlag, flybyOfNode, safeRpMin, violationsAt } from "@/lib/client/workbench-derive";
import type { StoredTour } from "@/lib/validation/tour";
import type { TourResult, TourSpec } from "@/lib/astro/types";
import { EpochInput, GLYPHS, Glyph, IconButton, MiniSelect, NumberInput } from "./controls";

type BodyId = StoredTour["nodes"][number]["body"];

export interface ChainPanelProps {
  tourId: number;
  canEditChain: boolean;
  canEditAim: boolean;
  bodyOptions: { id: string; name: string }[];
  result: TourResult | null;
  spec: TourSpec;
  /** Leg in progress on the Timeline (highlighted), or null. */
  activeLeg: number | null;
  className?: string;
}

function roleOf(i: number, n: number): string {
  return i === 0 ? "Launch" : i === n - 1 ? "Arrival" : "Flyby";
}

export function ChainPanel({ tourId, canEditChain, canEditAim, bodyOptions, result, spec, activeLeg, className }: ChainPanelProps) {
  const draft = useWorkbench((s) => s.draft);
  const selected = useWorkbench((s) => s.selectedNodeId);
  const edit = useWorkbench((s) => s.edit);
  const select = useWorkbench((s) => s.select);
  const n = draft.nodes.length;
  const options = bodyOptions;
  const knownIds = new Set(options.map((o) => o.id));

  const insertAt = (at: number) => {
    const near = draft.nodes[Math.max(0, at - 1)]?.body ?? "earth";
    edit((t) => addNode(t, at, near as BodyId));
  };

  return (
    <Card className={cn("flex min-h-0 flex-col", className)} aria-label="Chain">
      <CardHeader
        title="Chain"
        description={`${n} nodes · ${Math.max(0, n - 1)} legs`}
        className="py-3"
      />
      <ol className="min-h-0 flex-1 space-y-0 overflow-y-auto px-3 py-3" data-testid="chain-list">
        {draft.nodes.map((node, i) => {
          const flyby = flybyOfNode(result, i, n);
          const rpMin = safeRpMin(spec, node.body as TourSpec["nodes"][number]["body"]);
          const flag = flyby ? flybyFlag(flyby, rpMin) : null;
          const issues = violationsAt(result, i);
          const isSel = selected === node.id;
          const leg = i < n - 1 ? (draft.legs[i] ?? { revs: 0, prograde: true }) : null;
          const tof = i < n - 1 ? draft.nodes[i + 1]!.epoch - node.epoch : null;
          const isFlyby = i > 0 && i < n - 1;
          const override = (draft.rpMin as Record<string, number | undefined>)[node.body];
          const defaultRp = isFlyby ? safeRpMin({ ...spec, rpMin: {} }, node.body as TourSpec["nodes"][number]["body"]) : Number.NaN;
          return (
            <li key={node.id} className="relative">
              <div
                data-testid="chain-node"
                data-node-id={node.id}
                data-selected={isSel || undefined}
                className={cn(
                  "rounded-md border px-3 py-2.5 transition-colors",
                  isSel ? "border-accent/70 bg-accent-soft" : "border-line bg-raised/40 hover:border-line-strong",
                )}
              >
                <div className="flex items-center gap-2">
                  <button
                    type="button"
                    onClick={() => select(node.id)}
                    aria-pressed={isSel}
                    className="flex min-w-0 flex-1 items-baseline gap-2 rounded text-left focus-visible:outline-2 focus-visible:outline-accent"
                  >
                    <span className="num text-xs text-faint">#{i + 1}</span>
                    <span className="text-[11px] font-semibold tracking-wide text-muted uppercase">{roleOf(i, n)}</span>
                    <span className="truncate text-sm font-semibold text-ink">{bodyLabel(node.body)}</span>
                  </button>
                  {flag ? <FlagBadge level={flag.level} title={flag.text}>{flag.level === "ok" ? "OK" : flag.level === "margin" ? "Margin" : "Violated"}</FlagBadge> : null}
                  {canEditChain ? (
                    <div className="flex shrink-0 items-center">
                      <IconButton label={`Move ${bodyLabel(node.body)} (#${i + 1}) earlier`} disabled={i === 0} onClick={() => edit((t) => moveNode(t, node.id, -1))}>
                        <Glyph d={GLYPHS.up} />
                      </IconButton>
                      <IconButton label={`Move ${bodyLabel(node.body)} (#${i + 1}) later`} disabled={i === n - 1} onClick={() => edit((t) => moveNode(t, node.id, 1))}>
                        <Glyph d={GLYPHS.down} />
                      </IconButton>
                      <IconButton label={`Remove ${bodyLabel(node.body)} (#${i + 1})`} disabled={n <= MIN_NODES} onClick={() => edit((t) => removeNode(t, node.id))}>
                        <Glyph d={GLYPHS.remove} />
                      </IconButton>
                    </div>
                  ) : null}
                </div>

                {canEditChain ? (
                  <div className="mt-2 grid grid-cols-[minmax(0,0.8fr)_minmax(0,1.2fr)] gap-2">
                    <MiniSelect
                      label="Body"
                      value={node.body}
                      data-testid="body-select"
                      onChange={(e) => edit((t) => setNodeBody(t, node.id, e.target.value as BodyId))}
                    >
                      {!knownIds.has(node.body) ? <option value={node.body}>{bodyLabel(node.body)} (not in catalog)</option> : null}
                      {options.map((o) => (
                        <option key={o.id} value={o.id}>
                          {o.name}
                        </option>
                      ))}
                    </MiniSelect>
                    <EpochInput
                      label="Epoch"
                      value={node.epoch}
                      data-testid="epoch-input"
                      onCommit={(t) => edit((d) => setNodeEpoch(d, node.id, t), `epoch:${node.id}`)}
                    />
                  </div>
                ) : (
                  <p className="mt-1 text-sm text-muted">
                    <span className="num text-ink">{dateTimeOf(node.epoch)}</span> UTC
                  </p>
                )}
                <NodeWindow
                  nodeId={node.id}
                  epoch={node.epoch}
                  window={node.window ?? null}
                  editable={canEditChain}
                  onChange={(w, key) => edit((t) => setNodeWindow(t, node.id, w), key)}
                />

                {isFlyby ? (
                  <div className="mt-2 flex flex-wrap items-end gap-2">
                    {canEditAim ? (
                      <NumberInput
                        className="w-40"
                        label={`Min. rp at ${bodyLabel(node.body)}`}
                        unit="km"
                        value={override ?? null}
                        placeholder={Number.isFinite(defaultRp) ? `${Math.round(defaultRp)} (default)` : "default"}
                        allowEmpty
                        min={0}
                        minExclusive
                        data-testid="rpmin-input"
                        onCommit={(v) => edit((t) => setRpMin(t, node.body, v), `rpmin:${node.body}`)}
                      />
                    ) : (
                      <p className="text-xs text-muted">
                        Min. rp <Num value={rpMin} unit="km" digits={0} />
                        {override !== undefined ? " (override)" : ""}
                      </p>
                    )}
                    <Link
                      href={`/tours/${tourId}/aim/${encodeURIComponent(node.id)}`}
                      className="mb-1.5 text-xs font-medium text-accent underline-offset-2 hover:underline"
                    >
                      Aim board →
                    </Link>
                  </div>
                ) : null}

                {issues.length ? (
                  <ul className="mt-2 space-y-1" aria-label={`Constraint flags at #${i + 1}`}>
                    {issues.map((v, k) => (
                      <li key={k} className="flex items-start gap-2 text-xs text-ink">
                        <FlagBadge level="violated" className="shrink-0" />
                        <span>{v.message}</span>
                      </li>
                    ))}
                  </ul>
                ) : null}
              </div>

              {leg && tof !== null ? (
                <div
                  className={cn(
                    "relative my-1 ml-4 border-l-2 border-dashed py-2 pl-4",
                    activeLeg === i ? "border-accent" : "border-line-strong",
                  )}
                  data-testid="chain-leg"
                >
                  <div className="flex items-center justify-between gap-2 text-xs text-muted">
                    <span>
                      Leg {i + 1} · <Num value={days(tof)} unit="d" digits={1} />
                      {activeLeg === i ? <span className="ml-2 font-medium text-accent">in progress</span> : null}
                    </span>
                    {canEditChain && n < MAX_NODES ? (
                      <button
                        type="button"
                        onClick={() => insertAt(i + 1)}
                        className="inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs text-muted hover:bg-raised hover:text-ink"
                        aria-label={`Insert a node after #${i + 1}`}
                      >
                        <Glyph d={GLYPHS.add} size={12} /> Insert
                      </button>
                    ) : null}
                  </div>
                  {canEditChain ? (
                    <div className="mt-1.5 grid grid-cols-[3.5rem_minmax(0,1fr)_minmax(0,1.35fr)] gap-2">
                      <MiniSelect
                        label="Revs"
                        value={String(leg.revs ?? 0)}
                        onChange={(e) => edit((t) => setLeg(t, i, { revs: Number(e.target.value) }))}
                      >
                        {[0, 1, 2, 3, 4, 5].map((r) => (
                          <option key={r} value={r}>
                            {r}
                          </option>
                        ))}
                      </MiniSelect>
                      <MiniSelect
                        label="Branch"
                        value={leg.revs ? (leg.branch ?? "left") : "single"}
                        disabled={!leg.revs}
                        onChange={(e) => edit((t) => setLeg(t, i, { branch: e.target.value as "left" | "right" }))}
                      >
                        {leg.revs ? null : <option value="single">—</option>}
                        <option value="left">left</option>
                        <option value="right">right</option>
                      </MiniSelect>
                      <MiniSelect
                        label="Direction"
                        value={leg.prograde === false ? "retro" : "pro"}
                        onChange={(e) => edit((t) => setLeg(t, i, { prograde: e.target.value === "pro" }))}
                      >
                        <option value="pro">prograde</option>
                        <option value="retro">retrograde</option>
                      </MiniSelect>
                    </div>
                  ) : (
                    <p className="mt-0.5 text-xs text-faint">
                      {leg.revs ?? 0} rev{leg.revs ? ` (${leg.branch ?? "left"})` : ""} · {leg.prograde === false ? "retrograde" : "prograde"}
                    </p>
                  )}
                </div>
              ) : null}
            </li>
          );
        })}
      </ol>

      <div className="space-y-2 border-t border-line px-3 py-3">
        {canEditChain && n < MAX_NODES ? (
          <button
            type="button"
            onClick={() => insertAt(n)}
            className="inline-flex w-full items-center justify-center gap-1.5 rounded-md border border-dashed border-line-strong py-1.5 text-sm text-muted hover:border-muted hover:text-ink"
          >
            <Glyph d={GLYPHS.add} /> Add a node at the end
          </button>
        ) : null}
        <ArrivalEditor arrival={draft.arrival} editable={canEditChain} onChange={(a, key) => edit((t) => setArrival(t, a), key)} />
      </div>
    </Card>
  );
}

function ArrivalEditor({
  arrival,
  editable,
  onChange,
}: {
  arrival: StoredTour["arrival"];
  editable: boolean;
  onChange(a: StoredTour["arrival"], key?: string): void;
}) {
  if (!editable) {
    return (
      <p className="text-sm text-muted">
        Arrival:{" "}
        <span className="text-ink">
          {arrival.kind === "capture" ? (
            <>
              capture, rp <Num value={arrival.rp} unit="km" digits={0} />, e <Num value={arrival.e} digits={3} />
            </>
          ) : (
            arrival.kind
          )}
        </span>
      </p>
    );
  }
  return (
    <div className="grid grid-cols-3 gap-2">
      <MiniSelect
        label="Arrival"
        value={arrival.kind}
        data-testid="arrival-kind"
        onChange={(e) => {
          const k = e.target.value;
          if (k === "capture") onChange({ kind: "capture", rp: arrival.kind === "capture" ? arrival.rp : 100000, e: arrival.kind === "capture" ? arrival.e : 0.9 });
          else onChange({ kind: k as "flyby" | "rendezvous" });
        }}
      >
        <option value="flyby">flyby</option>
        <option value="rendezvous">rendezvous</option>
        <option value="capture">capture</option>
      </MiniSelect>
      {arrival.kind === "capture" ? (
        <>
          <NumberInput label="Capture rp" unit="km" value={arrival.rp} min={0} minExclusive onCommit={(v) => v !== null && onChange({ ...arrival, rp: v }, "capture:rp")} />
          <NumberInput label="Capture e" value={arrival.e} min={0} maxExclusive={1} onCommit={(v) => v !== null && onChange({ ...arrival, e: v }, "capture:e")} />
        </>
      ) : null}
    </div>
  );
}

const WINDOW_HALF_DAYS = 30;

/**
 * A node's search window (TDB s): the date range Tour search explores for this node. Editors set,
 * change or clear it; readers see it as text.
 */
function NodeWindow(props: {
  nodeId: string;
  epoch: number;
  window: { start: number; end: number } | null;
  editable: boolean;
  onChange(w: { start: number; end: number } | null, key?: string): void;
}) {
  const { window: w, editable, epoch, nodeId } = props;
  if (!editable) {
    return w ? (
      <p className="mt-1 text-xs text-muted" data-testid="window-text">
        Search window <span className="num text-ink">{dateTimeOf(w.start).slice(0, 10)}</span> –{" "}
        <span className="num text-ink">{dateTimeOf(w.end).slice(0, 10)}</span>
      </p>
    ) : null;
  }
  if (!w) {
    return (
      <button
        type="button"
        className="mt-1.5 text-xs text-muted underline-offset-2 hover:text-ink hover:underline"
        data-testid="window-add"
        onClick={() => props.onChange({ start: epoch - WINDOW_HALF_DAYS * 86400, end: epoch + WINDOW_HALF_DAYS * 86400 })}
      >
        + Search window (±{WINDOW_HALF_DAYS} d)
      </button>
    );
  }
  return (
    <div className="mt-2 grid grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] items-end gap-2" data-testid="window-fields">
      <EpochInput
        label="Window from"
        value={w.start}
        data-testid="window-start"
        onCommit={(t) => props.onChange({ start: t, end: Math.max(t, w.end) }, `wstart:${nodeId}`)}
      />
      <EpochInput
        label="Window to"
        value={w.end}
        data-testid="window-end"
        onCommit={(t) => props.onChange({ start: Math.min(t, w.start), end: t }, `wend:${nodeId}`)}
      />
      <IconButton label="Clear the search window" onClick={() => props.onChange(null)} className="mb-1">
        <Glyph d={GLYPHS.remove} size={12} />
      </IconButton>
    </div>
  );
}
