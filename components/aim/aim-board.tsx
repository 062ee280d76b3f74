"use client";
/**
 * Aim board: the B-plane of one flyby with the aim point the next leg needs and the analyst's
 * own draggable aim point, live readouts (each animation frame while dragging), the outgoing
 * leg's closest approach to the next body, a dispersion ellipse with the probability of a flyby
 * below the minimum altitude, a small Orrery with the perturbed outgoing arc, saving the aim
 * point onto the tour (PATCH with the version; 409 handled) and a PNG export.
 * The tour is re-evaluated here with the same ephemeris as the drag update, so that the aim point
 * the next leg needs gives a miss of ~0 km.
 */
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { evaluateTour } from "@/lib/astro/tour";
import { sampleTour } from "@/lib/astro/sample";
import { spinPole } from "@/lib/astro/frames";
import { BODIES, isPlanetId } from "@/lib/astro/constants";
import type { BodyId, CustomBodySpec, EphemerisSpec, TourSpec } from "@/lib/astro/types";
import { aimUpdate, buildAimContext, type AimContext, type AimPole, type AimReadout } from "@/lib/aim/outgoing";
import { dispersionEllipse, flybyRisk, type Dispersion, type FlybyRisk } from "@/lib/aim/probability";
import { plotExtent, reexpressAim } from "@/lib/aim/plot";
import type { StoredTour } from "@/lib/validation/tour";
import { ApiError, sendJson } from "@/lib/client/fetcher";
import { useTimeline } from "@/lib/client/timeline-store";
import { bodyLabel, dateOf, dateTimeOf } from "@/lib/format";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Button, LinkButton } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { CautionBanner } from "@/components/ui/caution-banner";
import { StatusBadge, type TourStatus } from "@/components/ui/badge";
import { formatNum } from "@/components/ui/num";
import { Orrery } from "@/components/scene/orrery";
import { cssColor } from "@/components/scene/colors";
import { BPlanePlot, type PlotColors } from "./bplane-plot";
import { AimReadouts } from "./aim-readouts";
import { DispersionPanel, formatProbability, type DispersionDraft, type DispersionErrors } from "./dispersion-panel";
import { exportBoardPng } from "./export-png";

export interface AimBoardProps {
  tourId: number;
  name: string;
  status: TourStatus;
  version: number;
  stored: StoredTour;
  customBodies: CustomBodySpec[];
  /** Index of the flyby node in stored.nodes. */
  nodeIndex: number;
  /** The role may edit aim points and the tour is not baselined. */
  canEdit: boolean;
  readOnlyReason: "role" | "baselined" | null;
}

type Setup =
  | { ok: true; ephSpec: EphemerisSpec; spec: TourSpec; ctx: Partial<Record<AimPole, AimContext>>; samples: ReturnType<typeof sampleTour> | null }
  | { ok: false; error: string };

function toSpec(stored: StoredTour, custom: CustomBodySpec[]): TourSpec {
  const bodies: TourSpec["bodies"] = {};
  for (const b of custom) {
    bodies[b.id] = { mu: b.mu, radius: b.radius ?? 1, minFlybyAltitude: b.minFlybyAltitude ?? 0 };
  }
  return {
    nodes: stored.nodes.map((n) => ({ body: n.body as BodyId, epoch: n.epoch })),
    legs: stored.legs.length ? stored.legs : undefined,
    arrival: stored.arrival,
    rpMin: stored.rpMin as TourSpec["rpMin"],
    bodies,
  };
}

function buildSetup(stored: StoredTour, custom: CustomBodySpec[], nodeIndex: number): Setup {
  try {
    const ephSpec: EphemerisSpec = { kind: stored.ephemeris.kind, cached: stored.ephemeris.kind === "vsop", customBodies: custom };
    const eph = ephemerisFromSpec(ephSpec);
    const spec = toSpec(stored, custom);
    const result = evaluateTour(spec, eph);
    let samples: ReturnType<typeof sampleTour> | null = null;
    try {
      samples = sampleTour(spec, result, eph, { pointsPerLeg: 160 });
    } catch {
      samples = null;
    }
    const node = spec.nodes[nodeIndex]!;
    const ctx: Partial<Record<AimPole, AimContext>> = {};
    ctx.ecliptic = buildAimContext({ spec, result, nodeIndex, ephemeris: eph, pole: "ecliptic" });
    if (isPlanetId(node.body)) {
      try {
        ctx.spin = buildAimContext({ spec, result, nodeIndex, ephemeris: eph, pole: "spin", spinPole: spinPole(node.body, node.epoch) });
      } catch {
        // v∞ parallel to the spin pole: only the ecliptic frame is offered
      }
    }
    return { ok: true, ephSpec, spec, ctx, samples };
  } catch (err) {
    return { ok: false, error: err instanceof Error ? err.message : String(err) };
  }
}

function parseDraft(d: DispersionDraft): { value: Dispersion | null; threshold: number | null; errors: DispersionErrors } {
  const errors: DispersionErrors = {};
  const num = (s: string) => (s.trim() === "" ? NaN : Number(s.replace(/\u2212/g, "-")));
  const sT = num(d.sigmaT);
  const sR = num(d.sigmaR);
  const rho = num(d.rho);
  const th = num(d.threshold);
  if (!Number.isFinite(sT) || sT < 0) errors.sigmaT = "a number ≥ 0 km";
  else if (sT > 1e7) errors.sigmaT = "at most 10,000,000 km";
  if (!Number.isFinite(sR) || sR < 0) errors.sigmaR = "a number ≥ 0 km";
  else if (sR > 1e7) errors.sigmaR = "at most 10,000,000 km";
  if (!Number.isFinite(rho) || rho < -1 || rho > 1) errors.rho = "between −1 and 1";
  if (!Number.isFinite(th) || th <= 0 || th >= 1) errors.threshold = "between 0 and 1, e.g. 1e-3";
  const value = errors.sigmaT || errors.sigmaR || errors.rho ? null : { sigmaT: sT, sigmaR: sR, rho };
  return { value, threshold: errors.threshold ? null : th, errors };
}

const FALLBACK_COLORS: PlotColors = {
  background: "#0c1019",
  grid: "#2a3142",
  axis: "#a3abbd",
  text: "#e8ecf3",
  faint: "#7b8396",
  accent: "#f0a24a",
  impact: "#e8766b",
  minAlt: "#e9d37a",
  planned: "#8fb4e6",
};

function plotColors(): PlotColors {
  return {
    background: cssColor("--gy-sunken", "#0c1019"),
    grid: cssColor("--gy-line", "#2a3142"),
    axis: cssColor("--gy-muted", "#a3abbd"),
    text: cssColor("--gy-ink", "#e8ecf3"),
    faint: cssColor("--gy-faint", "#7b8396"),
    accent: cssColor("--gy-accent", "#f0a24a"),
    impact: cssColor("--gy-bad", "#e8766b"),
    minAlt: cssColor("--gy-warn", "#e9d37a"),
    planned: cssColor("--gy-info", "#8fb4e6"),
  };
}

export function AimBoard(props: AimBoardProps) {
  const { tourId, name, status, nodeIndex, canEdit, readOnlyReason, customBodies } = props;
  const router = useRouter();
  const [stored, setStored] = useState(props.stored);
  const [version, setVersion] = useState(props.version);
  const node = stored.nodes[nodeIndex]!;
  const nodeId = node.id;
  const saved = stored.aim[nodeId];

  // The computation runs in the browser only (after mount): the server render shows a placeholder,
  // so that floating-point digits never differ between the server and the client.
  const [mounted, setMounted] = useState(false);
  useEffect(() => setMounted(true), []);
  const setup = useMemo<Setup>(
    () => (mounted ? buildSetup(stored, customBodies, nodeIndex) : { ok: false, error: "pending" }),
    [mounted, stored, customBodies, nodeIndex],
  );
  const [pole, setPole] = useState<AimPole>(saved?.pole ?? "ecliptic");
  const ctx = setup.ok ? (setup.ctx[pole] ?? setup.ctx.ecliptic ?? null) : null;

  const [aim, setAim] = useState<{ bT: number; bR: number } | null>(() => {
    if (saved) return { bT: saved.bT, bR: saved.bR };
    return null;
  });
  const current = aim ?? (ctx ? { bT: ctx.planned.bT, bR: ctx.planned.bR } : { bT: 0, bR: 0 });

  const [draft, setDraft] = useState<DispersionDraft>({
    sigmaT: String(saved?.sigmaT ?? 20),
    sigmaR: String(saved?.sigmaR ?? 20),
    rho: String(saved?.rho ?? 0),
    threshold: "1e-3",
  });
  const parsed = useMemo(() => parseDraft(draft), [draft]);
  const lastDispersion = useRef<Dispersion>({ sigmaT: 20, sigmaR: 20, rho: 0 });
  if (parsed.value) lastDispersion.current = parsed.value;
  const dispersion = lastDispersion.current;
  const threshold = parsed.threshold ?? 1e-3;

  const [dirty, setDirty] = useState(false);

  // ---- live readout, throttled to one update per animation frame ----
  const [readout, setReadout] = useState<AimReadout | null>(null);
  const [risk, setRisk] = useState<FlybyRisk | null>(null);
  const [calcError, setCalcError] = useState<string | null>(null);
  const pending = useRef<{ bT: number; bR: number } | null>(null);
  const raf = useRef<number | null>(null);

  const compute = useCallback(
    (bT: number, bR: number) => {
      if (!ctx) return;
      try {
        setReadout(aimUpdate(ctx, bT, bR));
        setCalcError(null);
      } catch (err) {
        setCalcError(err instanceof Error ? err.message : String(err));
      }
    },
    [ctx],
  );

  useEffect(() => {
    compute(current.bT, current.bR);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [compute]);

  useEffect(() => {
    if (!ctx) return;
    try {
      setRisk(flybyRisk(current.bT, current.bR, dispersion, ctx));
    } catch {
      setRisk(null);
    }
  }, [ctx, current.bT, current.bR, dispersion]);

  const onAim = useCallback(
    (bT: number, bR: number) => {
      if (!Number.isFinite(bT) || !Number.isFinite(bR)) return;
      pending.current = { bT, bR };
      if (raf.current !== null) return;
      raf.current = requestAnimationFrame(() => {
        raf.current = null;
        const p = pending.current;
        if (!p) return;
        setAim(p);
        compute(p.bT, p.bR);
        setDirty(true);
      });
    },
    [compute],
  );
  useEffect(() => () => {
    if (raf.current !== null) cancelAnimationFrame(raf.current);
  }, []);

  const moveTo = (bT: number, bR: number, dirtyAfter: boolean) => {
    setAim({ bT, bR });
    compute(bT, bR);
    setDirty(dirtyAfter);
  };

  const changePole = (next: AimPole) => {
    if (!setup.ok || next === pole) return;
    const from = setup.ctx[pole];
    const to = setup.ctx[next];
    if (!from || !to) return;
    if (aim) setAim(reexpressAim(aim.bT, aim.bR, from, to));
    setPole(next);
    setDirty(true);
  };

  // ---- replay clock: show the scene at the flyby ----
  useEffect(() => {
    const first = stored.nodes[0]!.epoch;
    const last = stored.nodes[stored.nodes.length - 1]!.epoch;
    const tl = useTimeline.getState();
    tl.pause();
    tl.setRange(first, last);
    tl.setTime(node.epoch);
  }, [stored, node.epoch]);

  // ---- plot extent: fixed while dragging; zoom buttons ----
  const baseExtent = useMemo(() => {
    if (!ctx) return 10000;
    return plotExtent(
      [
        { x: ctx.planned.bT, y: ctx.planned.bR },
        ...(saved ? [{ x: saved.bT, y: saved.bR }] : []),
      ],
      [ctx.minAltRadius],
      1.35,
    );
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [ctx]);
  const [zoom, setZoom] = useState(1);
  const extent = baseExtent / zoom;

  const ellipses = useMemo(() => {
    try {
      return [1, 3].map((k) => ({ k, ...dispersionEllipse(dispersion, k) }));
    } catch {
      return [];
    }
  }, [dispersion]);

  // ---- save ----
  const [saving, setSaving] = useState(false);
  const [message, setMessage] = useState<{ kind: "ok" | "error" | "conflict"; text: string } | null>(null);
  const conflict = useRef<{ version: number; tour: StoredTour } | null>(null);

  const save = async () => {
    if (!canEdit || !parsed.value) return;
    setSaving(true);
    setMessage(null);
    const entry = { bT: current.bT, bR: current.bR, sigmaT: parsed.value.sigmaT, sigmaR: parsed.value.sigmaR, rho: parsed.value.rho, pole };
    const tour: StoredTour = { ...stored, aim: { ...stored.aim, [nodeId]: entry } };
    try {
      const res = await sendJson<{ version: number; tour: StoredTour }>(`/api/tours/${tourId}`, "PATCH", { version, tour });
      setVersion(res.version);
      setStored(res.tour);
      setDirty(false);
      setMessage({ kind: "ok", text: `Saved as version ${res.version}.` });
    } catch (err) {
      if (err instanceof ApiError && err.status === 409 && err.code === "stale_version") {
        const cur = err.body.current as { version: number; tour: StoredTour } | undefined;
        conflict.current = cur ?? null;
        setMessage({ kind: "conflict", text: err.message });
      } else if (err instanceof ApiError) {
        setMessage({ kind: "error", text: err.message });
      } else {
        setMessage({ kind: "error", text: "The aim point could not be saved (network error). Try again." });
      }
    } finally {
      setSaving(false);
    }
  };

  const adoptNewer = () => {
    const cur = conflict.current;
    if (!cur) return;
    conflict.current = null;
    setStored(cur.tour);
    setVersion(cur.version);
    setMessage({ kind: "ok", text: `Loaded version ${cur.version}. Your aim point is kept on the board: save again to apply it.` });
  };

  // ---- export ----
  const svgRef = useRef<SVGSVGElement | null>(null);
  // Resolved after mount: the server render and the first client render use the same fallbacks.
  // The plot renders only after mount, with colours resolved from the theme (no SSR mismatch).
  const [colors, setColors] = useState<PlotColors | null>(null);
  useEffect(() => setColors(plotColors()), []);
  const [exportError, setExportError] = useState<string | null>(null);
  const exportPng = async () => {
    if (!svgRef.current) return;
    setExportError(null);
    const r = readout;
    const lines = [
      `B·T ${formatNum(current.bT, 1)} km   B·R ${formatNum(current.bR, 1)} km   |B| ${formatNum(Math.hypot(current.bT, current.bR), 1)} km   pole ${pole}`,
      r ? `rp ${formatNum(r.rp, 1)} km   altitude ${formatNum(r.altitude, 1)} km   turn ${formatNum((r.turnAngle * 180) / Math.PI, 3)}°   v∞ out ${formatNum(r.vinfOutMag, 3)} km/s` : "",
      r ? `closest approach to ${bodyLabel(ctx?.next.body ?? "")} ${formatNum(r.closest.distance, 0)} km on ${dateTimeOf(r.closest.epoch)} UTC; miss at the planned epoch ${formatNum(r.missAtPlanned, 0)} km` : "",
      `σ(B·T) ${formatNum(dispersion.sigmaT, 1)} km   σ(B·R) ${formatNum(dispersion.sigmaR, 1)} km   ρ ${formatNum(dispersion.rho, 2)}`,
      risk ? `P(below min altitude) ${formatProbability(risk.pBelowMin)}   P(impact) ${formatProbability(risk.pImpact)}` : "",
      "Preliminary patched-conic design - not for operations.",
    ].filter(Boolean);
    try {
      await exportBoardPng(svgRef.current, {
        title: `${name} · ${bodyLabel(node.body)} flyby ${dateOf(node.epoch)} · Aim board`,
        lines,
        background: (colors ?? FALLBACK_COLORS).background,
        text: (colors ?? FALLBACK_COLORS).text,
        fileName: `aim-board-${tourId}-${nodeId}.png`,
      });
    } catch (err) {
      setExportError(err instanceof Error ? err.message : String(err));
    }
  };

  // ---- the small Orrery ----
  // The outgoing arc reaches the 3D scene at most every 120 ms while dragging (a WebGL frame is
  // much dearer than the B-plane readouts, above all with software rendering).
  const [orreryArc, setOrreryArc] = useState<Float64Array | undefined>(undefined);
  const arcTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const arcLatest = useRef<Float64Array | undefined>(undefined);
  arcLatest.current = readout?.arc;
  useEffect(() => {
    if (arcTimer.current !== null) return;
    arcTimer.current = setTimeout(() => {
      arcTimer.current = null;
      setOrreryArc(arcLatest.current);
    }, 120);
  }, [readout?.arc]);
  useEffect(
    () => () => {
      if (arcTimer.current !== null) clearTimeout(arcTimer.current);
      arcTimer.current = null;
    },
    [],
  );
  const orreryTours = useMemo(
    () =>
      setup.ok
        ? [
            {
              id: String(tourId),
              label: name,
              samples: setup.samples,
              nodes: stored.nodes.map((n, i) => ({
                body: n.body as BodyId,
                epoch: n.epoch,
                label: `${i === 0 ? "Launch" : i === stored.nodes.length - 1 ? "Arrival" : "Flyby"} · ${bodyLabel(n.body)} · ${dateOf(n.epoch)}`,
              })),
              perturbed: orreryArc,
              primary: true,
            },
          ]
        : [],
    [setup, tourId, name, stored.nodes, orreryArc],
  );

  // The same element between arc updates: React skips re-rendering the scene on every drag frame.
  const ephSpec = setup.ok ? setup.ephSpec : null;
  const orreryElement = useMemo(
    () =>
      ephSpec ? (
        <Orrery
          tours={orreryTours}
          ephemeris={ephSpec}
          selectedNode={nodeIndex}
          // A click on another flyby's marker opens that flyby's Aim board.
          onSelectNode={(_tourId, i) => {
            const target = stored.nodes[i];
            if (target && i > 0 && i < stored.nodes.length - 1 && i !== nodeIndex) {
              router.push(`/tours/${tourId}/aim/${encodeURIComponent(target.id)}`);
            }
          }}
          className="h-[380px]"
        />
      ) : null,
    [orreryTours, ephSpec, nodeIndex, stored.nodes, router, tourId],
  );

  const phys = isPlanetId(node.body) ? BODIES[node.body] : undefined;
  const minAltitude = ctx ? ctx.rpMin - ctx.radius : (phys?.minFlybyAltitude ?? 0);
  const nextLabel = ctx ? `${bodyLabel(ctx.next.body)} (${ctx.next.index === stored.nodes.length - 1 ? "arrival" : "next flyby"})` : "";

  return (
    <div className="space-y-4">
      <PageHeader
        eyebrow={
          <>
            <StatusBadge status={status} />
            <Link href={`/tours/${tourId}`} className="hover:text-ink">
              {name}
            </Link>
            <span>· version {version}</span>
          </>
        }
        title={`Aim board · ${bodyLabel(node.body)} flyby`}
        description={`Node ${nodeIndex + 1} of ${stored.nodes.length}, ${dateTimeOf(node.epoch)} UTC. ${
          canEdit ? "Drag your aim point in the B-plane and watch where the outgoing leg goes." : "The aim point in the B-plane and where the outgoing leg goes."
        }`}
        actions={
          <>
            <LinkButton href={`/tours/${tourId}`} variant="ghost" size="sm">
              Back to the Workbench
            </LinkButton>
            <Button size="sm" onClick={exportPng} data-testid="export-png">
              Export PNG
            </Button>
            {canEdit ? (
              <Button size="sm" variant="primary" onClick={save} pending={saving} disabled={!parsed.value || !ctx} data-testid="save-aim">
                Save aim point
              </Button>
            ) : null}
          </>
        }
      />
      <CautionBanner />
      {readOnlyReason ? (
        <p className="rounded-md border border-line bg-raised/50 px-3 py-2 text-sm text-muted" data-testid="read-only-note">
          {readOnlyReason === "baselined"
            ? "This tour is baselined and read-only: the aim point and dispersions are shown as saved."
            : "Your role can read aim points but not change them."}
        </p>
      ) : null}
      {message ? (
        <div
          role="status"
          data-testid="save-message"
          className={
            "flex flex-wrap items-center gap-3 rounded-md border px-3 py-2 text-sm " +
            (message.kind === "ok" ? "border-ok/40 bg-ok-soft text-ink" : "border-bad/40 bg-bad-soft text-ink")
          }
        >
          <span>{message.text}</span>
          {message.kind === "conflict" && conflict.current ? (
            <Button size="sm" onClick={adoptNewer}>
              Load version {conflict.current.version} and keep my aim point
            </Button>
          ) : null}
        </div>
      ) : null}
      {exportError ? <p className="text-sm text-bad">Export failed: {exportError}</p> : null}

      {!mounted ? (
        <Card>
          <CardBody>
            <p className="text-sm text-muted">Computing the flyby…</p>
          </CardBody>
        </Card>
      ) : !setup.ok || !ctx ? (
        <Card>
          <CardBody>
            <p className="text-sm text-bad" data-testid="aim-unavailable">
              This flyby cannot be aimed: {setup.ok ? "the B-plane is undefined for this geometry" : setup.error}.
            </p>
          </CardBody>
        </Card>
      ) : (
        <>
          <div className="grid gap-4 xl:grid-cols-[minmax(0,600px)_minmax(0,1fr)]">
            <Card>
              <CardHeader
                title="B-plane"
                description={`T to the right, R downward; ${pole === "ecliptic" ? "T̂ in the ecliptic (pole: ecliptic north)" : `T̂ in ${bodyLabel(node.body)}'s equator (pole: spin axis)`}.`}
                actions={
                  <div className="flex items-center gap-1">
                    <Button size="sm" variant="ghost" onClick={() => setZoom((z) => Math.min(z * 2, 1024))} aria-label="Zoom in">
                      +
                    </Button>
                    <Button size="sm" variant="ghost" onClick={() => setZoom((z) => Math.max(z / 2, 1 / 64))} aria-label="Zoom out">
                      −
                    </Button>
                    <Button size="sm" variant="ghost" onClick={() => setZoom(1)}>
                      Fit
                    </Button>
                  </div>
                }
              />
              <div className="p-3">
                {colors ? (
                <BPlanePlot
                  ref={svgRef}
                  extent={extent}
                  aim={current}
                  planned={ctx.planned}
                  impactRadius={ctx.impactRadius}
                  minAltRadius={ctx.minAltRadius}
                  minAltitude={minAltitude}
                  ellipses={ellipses}
                  editable={canEdit}
                  aimLabel={canEdit ? "your aim" : saved ? "saved aim" : "aim"}
                  colors={colors}
                  onAim={onAim}
                />
                ) : (
                  <div className="aspect-square w-full max-w-[560px] rounded bg-sunken" aria-hidden />
                )}
              </div>
              <div className="flex flex-wrap items-center gap-2 border-t border-line px-4 py-3 text-sm">
                <span className="text-xs uppercase tracking-wide text-faint">Pole</span>
                {!canEdit ? <span className="text-sm text-muted">{pole === "ecliptic" ? "ecliptic north" : "spin axis"}</span> : null}
                {canEdit ? (
                  <>
                    <Button
                      size="sm"
                      variant={pole === "ecliptic" ? "secondary" : "ghost"}
                      aria-pressed={pole === "ecliptic"}
                      onClick={() => changePole("ecliptic")}
                    >
                      Ecliptic
                    </Button>
                    <Button
                      size="sm"
                      variant={pole === "spin" ? "secondary" : "ghost"}
                      aria-pressed={pole === "spin"}
                      onClick={() => changePole("spin")}
                      disabled={!setup.ctx.spin}
                    >
                      Spin axis
                    </Button>
                    <span className="mx-1 h-4 w-px bg-line" />
                    <Button size="sm" variant="ghost" data-testid="aim-reset-needed" onClick={() => moveTo(ctx.planned.bT, ctx.planned.bR, true)}>
                      Back to the needed point
                    </Button>
                    {saved ? (
                      <Button size="sm" variant="ghost" onClick={() => moveTo(saved.bT, saved.bR, false)}>
                        Back to the saved point
                      </Button>
                    ) : null}
                  </>
                ) : null}
                {dirty && canEdit ? <span className="ml-auto text-xs text-warn">unsaved changes</span> : null}
              </div>
            </Card>
            <Card>
              <CardHeader title="Readouts" description={`Incoming v∞ ${formatNum(ctx.vinfInMag, 3)} km/s; the next leg needs the square.`} />
              <CardBody>
                {calcError ? <p className="mb-2 text-sm text-bad">This aim point cannot be propagated: {calcError}</p> : null}
                <AimReadouts
                  readout={readout}
                  planned={ctx.planned}
                  radius={ctx.radius}
                  rpMin={ctx.rpMin}
                  vinfIn={ctx.vinfInMag}
                  nextLabel={nextLabel}
                  nextEpoch={ctx.next.epoch}
                  aimTitle={canEdit ? "your aim" : "aim point"}
                />
              </CardBody>
            </Card>
          </div>
          <div className="grid gap-4 xl:grid-cols-[minmax(0,600px)_minmax(0,1fr)]">
            <Card>
              <CardHeader title="Delivery dispersion" description="1σ and 3σ ellipses about your aim point; probabilities of a low or impacting flyby." />
              <CardBody>
                <DispersionPanel
                  draft={draft}
                  errors={parsed.errors}
                  editable={canEdit}
                  onChange={(d) => {
                    setDraft(d);
                    setDirty(true);
                  }}
                  risk={risk}
                  threshold={threshold}
                  bodyLabel={bodyLabel(node.body)}
                />
              </CardBody>
            </Card>
            <Card>
              <CardHeader title="Orrery" description="The planned arcs (solid) and the outgoing arc from your aim point (dashed)." />
              <div className="p-3">
                {orreryElement}
              </div>
            </Card>
          </div>
        </>
      )}
    </div>
  );
}
