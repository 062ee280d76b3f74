"use client";
/**
 * Window scan screen: pick a leg, departure and arrival (or flight-time) ranges and steps, run
 * the scan across the search workers, read the contour plot, hover for numbers, click a cell and
 * adopt it into the tour (lead/designer only).
 */
import Link from "next/link";
import { useMemo, useState } from "react";
import type { TourDetail } from "@/lib/db/queries/tours";
import type { PorkchopGrid } from "@/lib/astro/types";
import { bodyLabel, dateOf } from "@/lib/format";
import { PageHeader } from "@/components/ui/page-header";
import { CautionBanner } from "@/components/ui/caution-banner";
import { Card, CardHeader } from "@/components/ui/card";
import { Button, LinkButton } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { Num } from "@/components/ui/num";
import { useSearchWorkers, type ScanOutcome } from "@/workers/use-search-workers";
import { AdoptPanel, DAY, RunProgressBar, ephemerisSpecOf, legLabel, specOf, tdbOfDate, useAdopt, type DetailWithBodies } from "@/components/search/shared";
import { ContourPlot, type Cell } from "./contour-plot";

type Quantity = "c3" | "vinfDep" | "vinfArr" | "dv";
const QUANTITIES: Record<Quantity, { label: string; unit: string }> = {
  c3: { label: "Launch C3", unit: "km²/s²" },
  vinfDep: { label: "Departure v∞", unit: "km/s" },
  vinfArr: { label: "Arrival v∞", unit: "km/s" },
  dv: { label: "Departure v∞ + arrival Δv", unit: "km/s" },
};
/** Largest grid the screen accepts (cells). */
const MAX_CELLS = 1_000_000;

interface Form {
  leg: number;
  depFrom: string;
  depTo: string;
  depStep: string;
  mode: "arrival" | "tof";
  arrFrom: string;
  arrTo: string;
  tofFrom: string;
  tofTo: string;
  colStep: string;
  maxRevs: string;
  ephemeris: "vsop" | "mean";
}

function defaultsFor(detail: TourDetail, leg: number, ephemeris: "vsop" | "mean"): Form {
  const n = detail.tour.nodes;
  const a = n[leg]!;
  const b = n[leg + 1]!;
  const depStart = a.window?.start ?? a.epoch - 90 * DAY;
  const depEnd = a.window?.end ?? a.epoch + 90 * DAY;
  const arrStart = b.window?.start ?? b.epoch - 120 * DAY;
  const arrEnd = b.window?.end ?? b.epoch + 120 * DAY;
  const tof = (b.epoch - a.epoch) / DAY;
  return {
    leg,
    depFrom: dateOf(depStart),
    depTo: dateOf(depEnd),
    depStep: "2",
    mode: "arrival",
    arrFrom: dateOf(arrStart),
    arrTo: dateOf(arrEnd),
    tofFrom: String(Math.max(10, Math.round(tof * 0.6))),
    tofTo: String(Math.round(tof * 1.4 + 10)),
    colStep: "2",
    maxRevs: "0",
    ephemeris,
  };
}

function steps(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let t = from; t <= to + 1e-6; t += step) out.push(t);
  return out;
}

export function ScanView({ detail: initial, canEdit }: { detail: DetailWithBodies; canEdit: boolean }) {
  const adopt = useAdopt(initial);
  const detail = adopt.detail;
  const legs = detail.tour.nodes.length - 1;
  const [form, setForm] = useState<Form>(() => defaultsFor(initial, 0, initial.tour.ephemeris.kind));
  const [formError, setFormError] = useState<string | null>(null);
  const [quantity, setQuantity] = useState<Quantity>("c3");
  const [scan, setScan] = useState<{ out: ScanOutcome; grid: PorkchopGrid; leg: number; mode: "arrival" | "tof"; cols: number[] } | null>(null);
  const [hover, setHover] = useState<Cell | null>(null);
  const [picked, setPicked] = useState<Cell | null>(null);
  const w = useSearchWorkers();

  const set = <K extends keyof Form>(k: K, v: Form[K]) => setForm((f) => ({ ...f, [k]: v }));

  const run = async () => {
    const depFrom = tdbOfDate(form.depFrom);
    const depTo = tdbOfDate(form.depTo);
    const depStep = Number(form.depStep);
    const colStep = Number(form.colStep);
    const maxRevs = Number(form.maxRevs);
    if (depFrom === null || depTo === null) return setFormError("Enter departure dates as YYYY-MM-DD.");
    if (!(depTo >= depFrom)) return setFormError("The departure range ends before it starts.");
    if (!(depStep > 0) || !(colStep > 0)) return setFormError("Steps must be positive numbers of days.");
    const departures = steps(depFrom, depTo, depStep * DAY);
    let cols: number[];
    if (form.mode === "arrival") {
      const a0 = tdbOfDate(form.arrFrom);
      const a1 = tdbOfDate(form.arrTo);
      if (a0 === null || a1 === null) return setFormError("Enter arrival dates as YYYY-MM-DD.");
      if (!(a1 >= a0)) return setFormError("The arrival range ends before it starts.");
      cols = steps(a0, a1, colStep * DAY);
    } else {
      const t0 = Number(form.tofFrom);
      const t1 = Number(form.tofTo);
      if (!(t0 > 0) || !(t1 >= t0)) return setFormError("Flight times must be positive, the upper one not below the lower.");
      cols = steps(t0 * DAY, t1 * DAY, colStep * DAY);
    }
    if (departures.length < 2 || cols.length < 2) return setFormError("The grid needs at least 2 × 2 cells: widen a range or shorten a step.");
    if (departures.length * cols.length > MAX_CELLS) {
      return setFormError(`That grid has ${(departures.length * cols.length).toLocaleString("en-US")} cells; the limit is ${MAX_CELLS.toLocaleString("en-US")}. Use longer steps.`);
    }
    if (!Number.isInteger(maxRevs) || maxRevs < 0 || maxRevs > 3) return setFormError("Revolutions: 0 to 3.");
    setFormError(null);
    const spec = specOf(detail);
    const n = spec.nodes;
    const isLast = form.leg === n.length - 2;
    const grid: PorkchopGrid = {
      from: n[form.leg]!.body,
      to: n[form.leg + 1]!.body,
      departures,
      ...(form.mode === "arrival" ? { arrivals: cols } : { tofs: cols }),
      maxRevs,
      prograde: spec.legs?.[form.leg]?.prograde ?? true,
      arrival: isLast ? spec.arrival : { kind: "flyby" },
      bodies: spec.bodies,
    };
    setPicked(null);
    const out = await w.runScan(grid, ephemerisSpecOf(detail, form.ephemeris));
    setScan({ out, grid, leg: form.leg, mode: form.mode, cols });
  };

  const minCell = useMemo<Cell | null>(() => {
    if (!scan) return null;
    const v = scan.out[quantity];
    let k = -1;
    for (let c = 0; c < v.length; c++) if (Number.isFinite(v[c]!) && (k < 0 || v[c]! < v[k]!)) k = c;
    return k < 0 ? null : { i: Math.floor(k / scan.out.cols), j: k % scan.out.cols };
  }, [scan, quantity]);

  const readout = (c: Cell | null) => {
    if (!scan || !c) return null;
    const k = c.i * scan.out.cols + c.j;
    const dep = scan.grid.departures[c.i]!;
    const arr = scan.mode === "arrival" ? scan.cols[c.j]! : dep + scan.cols[c.j]!;
    return {
      dep,
      arr,
      tof: (arr - dep) / DAY,
      c3: scan.out.c3[k]!,
      vinfDep: scan.out.vinfDep[k]!,
      vinfArr: scan.out.vinfArr[k]!,
      dv: scan.out.dv[k]!,
    };
  };
  const shown = readout(hover ?? picked ?? minCell);
  const pickedR = readout(picked);

  const adoptCell = (c: Cell | null) => {
    const r = readout(c);
    if (!r || !scan) return;
    const epochs: (number | undefined)[] = detail.tour.nodes.map(() => undefined);
    epochs[scan.leg] = r.dep;
    epochs[scan.leg + 1] = r.arr;
    void adopt.adopt(epochs);
  };

  return (
    <div className="space-y-4">
      <PageHeader
        eyebrow={
          <>
            <Link href={`/tours/${detail.id}`} className="hover:text-ink">
              {detail.name}
            </Link>
            <span>· version {detail.version}</span>
          </>
        }
        title="Window scan"
        description="One leg on a grid of departure and arrival dates: where the launch energy and arrival speed are low."
        actions={
          <>
            <LinkButton href={`/tours/${detail.id}`} size="sm" variant="ghost">
              Workbench
            </LinkButton>
            <LinkButton href={`/tours/${detail.id}/search`} size="sm" variant="secondary">
              Tour search
            </LinkButton>
          </>
        }
      />
      <CautionBanner />
      <div className="grid gap-4 xl:grid-cols-[320px_minmax(0,1fr)]">
        <Card>
          <CardHeader title="Grid" description="Dates are UTC calendar days." />
          <form
            className="space-y-3 px-5 py-4"
            onSubmit={(e) => {
              e.preventDefault();
              void run();
            }}
          >
            <SelectField
              label="Leg"
              value={form.leg}
              onChange={(e) => setForm(defaultsFor(detail, Number(e.target.value), form.ephemeris))}
              data-testid="scan-leg"
            >
              {Array.from({ length: legs }, (_, i) => (
                <option key={i} value={i}>
                  {legLabel(detail, i)}
                </option>
              ))}
            </SelectField>
            <div className="grid grid-cols-2 gap-2">
              <Field label="Departure from" type="date" value={form.depFrom} onChange={(e) => set("depFrom", e.target.value)} data-testid="scan-dep-from" />
              <Field label="to" type="date" value={form.depTo} onChange={(e) => set("depTo", e.target.value)} data-testid="scan-dep-to" />
            </div>
            <Field label="Departure step" unit="d" inputMode="decimal" value={form.depStep} onChange={(e) => set("depStep", e.target.value)} data-testid="scan-dep-step" />
            <SelectField label="Second axis" value={form.mode} onChange={(e) => set("mode", e.target.value as Form["mode"])}>
              <option value="arrival">Arrival date</option>
              <option value="tof">Flight time</option>
            </SelectField>
            {form.mode === "arrival" ? (
              <div className="grid grid-cols-2 gap-2">
                <Field label="Arrival from" type="date" value={form.arrFrom} onChange={(e) => set("arrFrom", e.target.value)} data-testid="scan-arr-from" />
                <Field label="to" type="date" value={form.arrTo} onChange={(e) => set("arrTo", e.target.value)} data-testid="scan-arr-to" />
              </div>
            ) : (
              <div className="grid grid-cols-2 gap-2">
                <Field label="Flight time from" unit="d" inputMode="decimal" value={form.tofFrom} onChange={(e) => set("tofFrom", e.target.value)} />
                <Field label="to" unit="d" inputMode="decimal" value={form.tofTo} onChange={(e) => set("tofTo", e.target.value)} />
              </div>
            )}
            <Field label={form.mode === "arrival" ? "Arrival step" : "Flight-time step"} unit="d" inputMode="decimal" value={form.colStep} onChange={(e) => set("colStep", e.target.value)} data-testid="scan-col-step" />
            <div className="grid grid-cols-2 gap-2">
              <SelectField label="Revolutions up to" value={form.maxRevs} onChange={(e) => set("maxRevs", e.target.value)}>
                {[0, 1, 2, 3].map((r) => (
                  <option key={r} value={r}>
                    {r}
                  </option>
                ))}
              </SelectField>
              <SelectField label="Ephemeris" value={form.ephemeris} onChange={(e) => set("ephemeris", e.target.value as Form["ephemeris"])} data-testid="scan-ephemeris">
                <option value="vsop">Planetary series (cached)</option>
                <option value="mean">Mean elements</option>
              </SelectField>
            </div>
            {formError ? (
              <p className="text-sm text-bad" role="alert">
                {formError}
              </p>
            ) : null}
            {canEdit ? (
              <Button type="submit" variant="primary" className="w-full" pending={w.running} data-testid="run-scan">
                Run scan
              </Button>
            ) : (
              <p className="text-sm text-muted">Only a lead or a designer can run scans on this tour.</p>
            )}
          </form>
        </Card>
        <div className="space-y-4">
          <RunProgressBar progress={w.progress} running={w.running} onCancel={w.cancel} unitLabel="cells" />
          {w.error ? <p className="text-sm text-bad" role="alert">The scan failed: {w.error}</p> : null}
          <AdoptPanel a={adopt} />
          <Card>
            <CardHeader
              title={scan ? `${bodyLabel(scan.grid.from)} → ${bodyLabel(scan.grid.to)}` : "Contours"}
              description={
                scan
                  ? `${scan.out.rows} × ${scan.out.cols} cells in ${scan.out.elapsedS.toFixed(2)} s${scan.out.cancelled ? " (cancelled: partial)" : ""}`
                  : "Run a scan to see the window."
              }
              actions={
                <SelectField label="Show" value={quantity} onChange={(e) => setQuantity(e.target.value as Quantity)} data-testid="scan-quantity">
                  {(Object.keys(QUANTITIES) as Quantity[]).map((q) => (
                    <option key={q} value={q}>
                      {QUANTITIES[q].label} ({QUANTITIES[q].unit})
                    </option>
                  ))}
                </SelectField>
              }
            />
            <div className="grid gap-4 px-5 py-4 lg:grid-cols-[minmax(0,1fr)_220px]">
              {scan ? (
                <ContourPlot
                  departures={scan.grid.departures}
                  cols={scan.cols}
                  mode={scan.mode}
                  values={scan.out[quantity]}
                  unit={QUANTITIES[quantity].unit}
                  label={QUANTITIES[quantity].label}
                  minCell={minCell}
                  picked={picked}
                  onHover={setHover}
                  onPick={setPicked}
                />
              ) : (
                <div className="flex h-72 items-center justify-center rounded-md border border-dashed border-line text-sm text-muted">
                  No scan yet.
                </div>
              )}
              <div className="space-y-3 text-sm" data-testid="scan-readout">
                <h3 className="text-xs font-medium tracking-wide text-muted uppercase">
                  {hover ? "Under the cursor" : picked ? "Picked cell" : "Minimum"}
                </h3>
                {shown ? (
                  <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
                    <dt className="text-muted">Departure</dt>
                    <dd className="num text-right">{dateOf(shown.dep)}</dd>
                    <dt className="text-muted">Arrival</dt>
                    <dd className="num text-right">{dateOf(shown.arr)}</dd>
                    <dt className="text-muted">Flight time</dt>
                    <dd className="text-right"><Num value={shown.tof} unit="d" digits={0} /></dd>
                    <dt className="text-muted">Launch C3</dt>
                    <dd className="text-right" data-testid="readout-c3"><Num value={shown.c3} unit="km²/s²" /></dd>
                    <dt className="text-muted">Dep. v∞</dt>
                    <dd className="text-right"><Num value={shown.vinfDep} unit="km/s" digits={3} /></dd>
                    <dt className="text-muted">Arr. v∞</dt>
                    <dd className="text-right"><Num value={shown.vinfArr} unit="km/s" digits={3} /></dd>
                    <dt className="text-muted">v∞ + Δv</dt>
                    <dd className="text-right"><Num value={shown.dv} unit="km/s" digits={3} /></dd>
                  </dl>
                ) : (
                  <p className="text-muted">—</p>
                )}
                {scan && canEdit ? (
                  <div className="flex flex-col gap-2 pt-2">
                    <Button
                      size="sm"
                      variant="primary"
                      disabled={!pickedR || !Number.isFinite(pickedR.c3)}
                      pending={adopt.saving}
                      onClick={() => adoptCell(picked)}
                      data-testid="adopt-cell"
                    >
                      Adopt picked cell
                    </Button>
                    <Button size="sm" disabled={!minCell} pending={adopt.saving} onClick={() => adoptCell(minCell)} data-testid="adopt-minimum">
                      Adopt the minimum
                    </Button>
                    <p className="text-xs text-muted">
                      Adopting sets the epochs of nodes {scan.leg + 1} and {scan.leg + 2} and saves the tour.
                    </p>
                  </div>
                ) : null}
              </div>
            </div>
          </Card>
        </div>
      </div>
    </div>
  );
}
