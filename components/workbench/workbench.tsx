"use client";
/**
 * Workbench: the one-tour screen. Wires the editor store (draft, undo/redo, selection), the astro
 * worker (evaluation + sampling on every edit), the replay clock, and saving with optimistic
 * locking. The server decides the permissions; this component only hides what a role cannot do.
 */
import { useCallback, useEffect, useMemo, useState } from "react";
import { useStore } from "zustand";
import { PageHeader } from "@/components/ui/page-header";
import { Badge, StatusBadge } from "@/components/ui/badge";
import { Button, LinkButton } from "@/components/ui/button";
import { CautionBanner } from "@/components/ui/caution-banner";
import { cn } from "@/components/ui/cn";
import { bodyLabel } from "@/lib/format";
import { ApiError, sendJson } from "@/lib/client/fetcher";
import { useTimeline } from "@/lib/client/timeline-store";
import { createWorkbenchStore, WorkbenchStoreContext } from "@/lib/client/workbench-store";
import { setEphemerisKind } from "@/lib/client/workbench-edits";
import { progressAt } from "@/lib/client/workbench-derive";
import { toTourSpec, type TeamBody } from "@/lib/tours/evaluate";
import { PLANETS, type StoredTour } from "@/lib/validation/tour";
import type { CustomBodySpec, EphemerisSpec, TourResult } from "@/lib/astro/types";
import type { TourDetail } from "@/lib/db/queries/tours";
import { useTourComputation } from "@/workers/use-astro-worker";
import { ChainPanel } from "./chain-panel";
import { EncounterCard } from "./encounter-card";
import { BudgetCard, FlagsCard } from "./budget-card";
import { TimelineStrip } from "./timeline";
import { ConflictDialog } from "./conflict-dialog";
import { GLYPHS, Glyph } from "./controls";
import { OrreryCell } from "./orrery-cell";
import { FilesCard } from "./files-card";
import { ReviewPanel } from "@/components/review/review-panel";
import { TourSubnav } from "@/components/review/tour-subnav";
import type { Role } from "@/lib/auth/roles";

export interface WorkbenchProps {
  detail: TourDetail;
  /** lead/designer on a tour that is not baselined. */
  canEditChain: boolean;
  /** lead/designer/analyst on a tour that is not baselined (aim points, rpMin). */
  canEditAim: boolean;
  /** lead/designer: Window scan and Tour search. */
  canSearch: boolean;
  /** The signed-in user's role (the Review panel offers the transitions it allows). */
  role: Role;
  /** The signed-in user owns the tour. */
  isOwner: boolean;
}

interface Conflict {
  message: string;
  current: TourDetail;
  canOverwrite: boolean;
}

function teamBodiesOf(custom: CustomBodySpec[], options: { id: string; name: string }[]): TeamBody[] {
  return custom.map((b) => ({
    ...b,
    name: options.find((o) => o.id === b.id)?.name ?? bodyLabel(b.id),
    radius: b.radius ?? 0,
    minFlybyAltitude: b.minFlybyAltitude ?? 0,
  }));
}

export function Workbench(props: WorkbenchProps) {
  const { detail } = props;
  const [store] = useState(() => {
    const firstFlyby = detail.tour.nodes.length > 2 ? detail.tour.nodes[1]!.id : (detail.tour.nodes[0]?.id ?? null);
    return createWorkbenchStore(detail.tour, detail.version, firstFlyby);
  });
  return (
    <WorkbenchStoreContext.Provider value={store}>
      <WorkbenchInner {...props} store={store} />
    </WorkbenchStoreContext.Provider>
  );
}

function WorkbenchInner({ detail: initial, canEditChain, canEditAim, canSearch, role, isOwner, store }: WorkbenchProps & { store: ReturnType<typeof createWorkbenchStore> }) {
  const draft = useStore(store, (s) => s.draft);
  const dirty = useStore(store, (s) => s.dirty);
  const canUndo = useStore(store, (s) => s.past.length > 0);
  const canRedo = useStore(store, (s) => s.future.length > 0);
  const baseVersion = useStore(store, (s) => s.baseVersion);
  const selectedNodeId = useStore(store, (s) => s.selectedNodeId);
  const { undo, redo, select, edit, load, markSaved } = store.getState();

  // What the server last told us about the tour (name, status, owner, version, result).
  const [detail, setDetail] = useState<TourDetail>(initial);
  const customBodies = useMemo(() => detail.customBodies ?? [], [detail.customBodies]);
  const bodyOptions = useMemo(
    () => (detail.bodyOptions?.length ? detail.bodyOptions : PLANETS.map((p) => ({ id: p, name: bodyLabel(p) }))),
    [detail.bodyOptions],
  );
  const teamBodies = useMemo(() => teamBodiesOf(customBodies, bodyOptions), [customBodies, bodyOptions]);
  const spec = useMemo(() => toTourSpec(draft, teamBodies), [draft, teamBodies]);
  const ephemerisKind = draft.ephemeris.kind;
  const ephemeris = useMemo<EphemerisSpec>(
    () => ({ kind: ephemerisKind, cached: ephemerisKind === "vsop", customBodies }),
    [ephemerisKind, customBodies],
  );
  const computation = useTourComputation(spec, ephemeris, { initialResult: initial.result });
  const result: TourResult | null = computation.result;

  /* ---------- replay clock ---------- */
  const first = draft.nodes[0]?.epoch ?? 0;
  const last = draft.nodes[draft.nodes.length - 1]?.epoch ?? 0;
  useEffect(() => {
    // Edits of the launch or arrival epoch stretch the replay range (the clock stays inside it).
    useTimeline.getState().setRange(Math.min(first, last), Math.max(first, last));
  }, [first, last]);
  useEffect(() => {
    // A new tour starts at its launch, paused.
    const tl = useTimeline.getState();
    tl.pause();
    tl.setRange(Math.min(first, last), Math.max(first, last));
    tl.setTime(Math.min(first, last));
    return () => {
      useTimeline.getState().pause();
      useTimeline.getState().setRange(0, 0);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [initial.id]);
  const nowTime = useTimeline((s) => s.time);
  const progress = progressAt(draft.nodes, nowTime);
  const activeLeg = progress.phase === "leg" ? progress.leg : null;

  /* ---------- undo / redo keys ---------- */
  useEffect(() => {
    if (!canEditAim) return;
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey) return;
      const k = e.key.toLowerCase();
      if (k !== "z" && k !== "y") return;
      const el = e.target as HTMLElement | null;
      // Text fields keep their own undo.
      if (el && (el.tagName === "TEXTAREA" || (el.tagName === "INPUT" && (el as HTMLInputElement).type === "text"))) return;
      e.preventDefault();
      if (k === "y" || e.shiftKey) store.getState().redo();
      else store.getState().undo();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [canEditAim, store]);

  /* ---------- unsaved changes guard ---------- */
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => window.removeEventListener("beforeunload", onBeforeUnload);
  }, [dirty]);

  /* ---------- save ---------- */
  const [saving, setSaving] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [savedAt, setSavedAt] = useState<string | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);

  const save = useCallback(
    async (opts: { overwrite?: boolean } = {}) => {
      const s = store.getState();
      const sent: StoredTour = s.draft;
      setSaving(true);
      setSaveError(null);
      try {
        const next = await sendJson<TourDetail>(`/api/tours/${detail.id}`, "PATCH", {
          version: s.baseVersion,
          tour: sent,
          ...(opts.overwrite ? { overwrite: true } : {}),
        });
        setDetail(next);
        markSaved(sent, next.version);
        setConflict(null);
        setSavedAt(new Date().toISOString());
      } catch (err) {
        if (err instanceof ApiError && err.status === 409 && err.code === "stale_version" && err.body.current) {
          setConflict({ message: err.message, current: err.body.current as TourDetail, canOverwrite: Boolean(err.body.canOverwrite) });
        } else if (err instanceof ApiError) {
          const issues = err.issues.map((i) => `${i.path}: ${i.message}`).join("; ");
          setSaveError(issues ? `${err.message} (${issues})` : err.message);
        } else {
          setSaveError("The server could not be reached. Your changes are still here; try again.");
        }
      } finally {
        setSaving(false);
      }
    },
    [detail.id, markSaved, store],
  );

  const loadTheirs = useCallback(() => {
    if (!conflict) return;
    setDetail(conflict.current);
    load(conflict.current.tour, conflict.current.version);
    setConflict(null);
    setSaveError(null);
  }, [conflict, load]);

  const readOnlyReason =
    detail.status === "baselined"
      ? "Baselined: read-only for everyone. A lead can reopen it."
      : !canEditAim
        ? "Your role reads and replays tours; it does not edit them."
        : !canEditChain
          ? "Your role edits flyby options (minimum radius) and aim points only."
          : null;
  const mayEdit = canEditAim;

  return (
    <div className="space-y-4" data-testid="workbench">
      <PageHeader
        className="pb-2"
        eyebrow={
          <>
            <StatusBadge status={detail.status} />
            <span>
              owner {detail.ownerName} · version <span className="num" data-testid="tour-version">{baseVersion}</span>
            </span>
            {dirty ? (
              <Badge tone="warn" className="ml-1">
                <span data-testid="unsaved">Unsaved changes</span>
              </Badge>
            ) : savedAt ? (
              <span className="text-ok">Saved</span>
            ) : null}
          </>
        }
        title={detail.name}
        description={draft.nodes.map((n) => bodyLabel(n.body)).join(" → ")}
        actions={
          <>
            <EphemerisChoice
              kind={draft.ephemeris.kind}
              editable={canEditChain}
              onChange={(k) => edit((t) => setEphemerisKind(t, k))}
            />
            {canSearch ? (
              <>
                <LinkButton href={`/tours/${detail.id}/scan`} size="sm" variant="secondary">
                  Window scan
                </LinkButton>
                <LinkButton href={`/tours/${detail.id}/search`} size="sm" variant="secondary">
                  Tour search
                </LinkButton>
              </>
            ) : null}
            {mayEdit ? (
              <>
                <div className="flex items-center">
                  <Button size="sm" variant="ghost" onClick={undo} disabled={!canUndo} aria-label="Undo (Ctrl+Z)" title="Undo (Ctrl+Z)">
                    <Glyph d={GLYPHS.undo} /> Undo
                  </Button>
                  <Button size="sm" variant="ghost" onClick={redo} disabled={!canRedo} aria-label="Redo (Ctrl+Shift+Z)" title="Redo (Ctrl+Shift+Z)">
                    <Glyph d={GLYPHS.redo} /> Redo
                  </Button>
                </div>
                <Button size="sm" variant="primary" data-testid="save-button" onClick={() => save()} pending={saving} disabled={!dirty}>
                  Save
                </Button>
              </>
            ) : null}
          </>
        }
      />
      <TourSubnav tourId={detail.id} current="workbench" />
      <CautionBanner />
      {readOnlyReason ? (
        <p className="rounded-md border border-line bg-raised px-3 py-2 text-sm text-muted" data-testid="read-only-note">
          {readOnlyReason}
        </p>
      ) : null}
      {saveError ? (
        <p role="alert" data-testid="save-error" className="rounded-md border border-bad/50 bg-bad-soft px-3 py-2 text-sm text-bad">
          Not saved: {saveError}
        </p>
      ) : null}

      <div className="grid gap-4 xl:grid-cols-[360px_minmax(0,1fr)_330px] lg:grid-cols-[340px_minmax(0,1fr)]">
        <ChainPanel
          className="lg:row-span-2 xl:row-span-1 xl:max-h-[760px]"
          tourId={detail.id}
          canEditChain={canEditChain}
          canEditAim={canEditAim}
          bodyOptions={bodyOptions}
          result={result}
          spec={spec}
          activeLeg={activeLeg}
        />
        <OrreryCell
          className="min-h-[420px] xl:h-[760px]"
          tourId={String(detail.id)}
          label={detail.name}
          nodes={draft.nodes}
          samples={computation.samples}
          ephemeris={ephemeris}
          selectedNodeId={selectedNodeId}
          onSelectNodeIndex={(i) => {
            const id = store.getState().draft.nodes[i]?.id;
            if (id) select(id);
          }}
        />
        <div className={cn("space-y-4 lg:col-start-2 xl:col-start-3 xl:row-start-1")}>
          <EncounterCard tourId={detail.id} tour={draft} spec={spec} result={result} selectedNodeId={selectedNodeId} />
          <BudgetCard tour={draft} spec={spec} result={result} pending={computation.pending} error={computation.error} />
          <FlagsCard tour={draft} spec={spec} result={result} onSelectNode={select} />
          <ReviewPanel
            tourId={detail.id}
            status={detail.status}
            version={baseVersion}
            role={role}
            isOwner={isOwner}
            onChanged={(next) => {
              // A review transition makes a new version on the server: follow it unless there are unsaved edits
              // (those then meet the usual 409 dialog when saved).
              const fresh = next.tour as TourDetail | null;
              if (fresh && typeof fresh === "object" && "tour" in fresh) {
                setDetail(fresh);
                if (!store.getState().dirty) load(fresh.tour, fresh.version);
              }
            }}
          />
          <FilesCard tourId={detail.id} />
        </div>
      </div>

      <TimelineStrip nodes={draft.nodes} selectedNodeId={selectedNodeId} onJumpToNode={select} />

      {conflict ? (
        <ConflictDialog
          message={conflict.message}
          mine={draft}
          mineResult={result}
          theirs={{ tour: conflict.current.tour, result: conflict.current.result, version: conflict.current.version, ownerName: conflict.current.ownerName }}
          myVersion={baseVersion}
          canOverwrite={conflict.canOverwrite}
          pending={saving}
          onLoadTheirs={loadTheirs}
          onOverwrite={() => save({ overwrite: true })}
          onClose={() => setConflict(null)}
        />
      ) : null}
    </div>
  );
}

function EphemerisChoice({ kind, editable, onChange }: { kind: "vsop" | "mean"; editable: boolean; onChange(k: "vsop" | "mean"): void }) {
  const label = kind === "vsop" ? "VSOP87 (astronomy-engine)" : "Mean elements (JPL table)";
  if (!editable) {
    return (
      <span className="text-xs text-muted" data-testid="ephemeris-choice">
        Ephemeris: <span className="text-ink">{label}</span>
      </span>
    );
  }
  return (
    <label className="flex items-center gap-2 text-xs text-muted">
      Ephemeris
      <select
        value={kind}
        data-testid="ephemeris-choice"
        onChange={(e) => onChange(e.target.value as "vsop" | "mean")}
        className="h-8 rounded-md border border-line-strong bg-field px-2 text-sm text-ink"
      >
        <option value="vsop">VSOP87 (astronomy-engine)</option>
        <option value="mean">Mean elements (JPL table)</option>
      </select>
    </label>
  );
}
