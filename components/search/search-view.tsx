"use client";
/**
 * Tour search screen: bounds for the launch date and each leg's flight time, objective, caps,
 * evaluation budget, seed and ephemeris; run across the search workers (one island each) with
 * live progress, cancel and a convergence plot; the ranked candidates, each adoptable into
 * the tour by a lead or designer.
 */
import Link from "next/link";
import { useState } from "react";
import type { TourDetail } from "@/lib/db/queries/tours";
import type { SearchBounds, SearchOptions } from "@/lib/astro/types";
import { bodyLabel, dateOf } from "@/lib/format";
import { PageHeader } from "@/components/ui/page-header";
import { CautionBanner } from "@/components/ui/caution-banner";
import { Card, CardHeader } from "@/components/ui/card";
import { Badge } from "@/components/ui/badge";
import { Button, LinkButton } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { Num } from "@/components/ui/num";
import { useSearchWorkers, type SearchOutcome } from "@/workers/use-search-workers";
import { AdoptPanel, DAY, RunProgressBar, ephemerisSpecOf, specOf, tdbOfDate, useAdopt, type DetailWithBodies } from "./shared";
import { ConvergencePlot } from "./convergence-plot";

interface Form {
  launchFrom: string;
  launchTo: string;
  tof: { min: string; max: string }[];
  objective: NonNullable<SearchOptions["objective"]>;
  c3Cap: string;
  vinfCap: string;
  tofCap: string;
  budget: string;
  seed: string;
  ephemeris: "vsop" | "mean";
}

function defaultsFor(detail: TourDetail): Form {
  const n = detail.tour.nodes;
  const first = n[0]!;
  const tof = n.slice(1).map((b, i) => {
    const a = n[i]!;
    const lo = b.window && a.window ? Math.max(1, (b.window.start - a.window.end) / DAY) : ((b.epoch - a.epoch) / DAY) * 0.7;
    const hi = b.window && a.window ? Math.max(lo + 1, (b.window.end - a.window.start) / DAY) : ((b.epoch - a.epoch) / DAY) * 1.3 + 10;
    return { min: String(Math.max(1, Math.round(lo))), max: String(Math.round(hi)) };
  });
  return {
    launchFrom: dateOf(first.window?.start ?? first.epoch - 120 * DAY),
    launchTo: dateOf(first.window?.end ?? first.epoch + 120 * DAY),
    tof,
    objective: "vinf+dv",
    c3Cap: "",
    vinfCap: "",
    tofCap: "",
    budget: "200000",
    seed: "1",
    ephemeris: detail.tour.ephemeris.kind,
  };
}

export function SearchView({ detail: initial, canEdit }: { detail: DetailWithBodies; canEdit: boolean }) {
  const adopt = useAdopt(initial);
  const detail = adopt.detail;
  const nodes = detail.tour.nodes;
  const [form, setForm] = useState<Form>(() => defaultsFor(initial));
  const [formError, setFormError] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<SearchOutcome | null>(null);
  const w = useSearchWorkers();
  const set = <K extends keyof Form>(k: K, v: Form[K]) => setForm((f) => ({ ...f, [k]: v }));

  const run = async () => {
    const l0 = tdbOfDate(form.launchFrom);
    const l1 = tdbOfDate(form.launchTo);
    if (l0 === null || l1 === null) return setFormError("Enter the launch window as YYYY-MM-DD dates.");
    if (!(l1 >= l0)) return setFormError("The launch window ends before it starts.");
    const tof: [number, number][] = [];
    for (const [i, t] of form.tof.entries()) {
      const a = Number(t.min);
      const b = Number(t.max);
      if (!(a > 0) || !(b >= a)) return setFormError(`Leg ${i + 1}: flight times must be positive days, the maximum not below the minimum.`);
      tof.push([a * DAY, b * DAY]);
    }
    const budget = Number(form.budget);
    if (!Number.isInteger(budget) || budget < 1000 || budget > 50_000_000) return setFormError("Budget: a whole number of evaluations from 1,000 to 50,000,000.");
    const seed = Number(form.seed);
    if (!Number.isInteger(seed) || Math.abs(seed) > 2 ** 31) return setFormError("Seed: a whole number.");
    const caps: NonNullable<SearchOptions["caps"]> = {};
    const cap = (s: string, name: string, scale = 1): number | undefined | false => {
      if (s.trim() === "") return undefined;
      const v = Number(s);
      if (!(v > 0) || !Number.isFinite(v)) {
        setFormError(`${name} must be a positive number or empty.`);
        return false;
      }
      return v * scale;
    };
    const c3 = cap(form.c3Cap, "C3 cap");
    const vinf = cap(form.vinfCap, "Arrival v∞ cap");
    const tt = cap(form.tofCap, "Flight-time cap", DAY);
    if (c3 === false || vinf === false || tt === false) return;
    if (c3 !== undefined) caps.c3 = c3;
    if (vinf !== undefined) caps.arrivalVinf = vinf;
    if (tt !== undefined) caps.totalTof = tt;
    setFormError(null);
    const bounds: SearchBounds = { launch: [l0, l1], tof };
    const res = await w.runSearch({ spec: specOf(detail), bounds, ephemeris: ephemerisSpecOf(detail, form.ephemeris), seed, budget, objective: form.objective, caps });
    setOutcome(res);
  };

  const adoptCandidate = (epochs: number[]) => void adopt.adopt(epochs);

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
        title="Tour search"
        description={`Every epoch of ${nodes.map((n) => bodyLabel(n.body)).join(" → ")} searched at once within your bounds.`}
        actions={
          <>
            <LinkButton href={`/tours/${detail.id}`} size="sm" variant="ghost">
              Workbench
            </LinkButton>
            <LinkButton href={`/tours/${detail.id}/scan`} size="sm" variant="secondary">
              Window scan
            </LinkButton>
          </>
        }
      />
      <CautionBanner />
      <div className="grid gap-4 xl:grid-cols-[380px_minmax(0,1fr)]">
        <Card>
          <CardHeader title="Bounds and objective" description="Dates are UTC calendar days; flight times in days." />
          <form
            className="space-y-3 px-5 py-4"
            onSubmit={(e) => {
              e.preventDefault();
              void run();
            }}
          >
            <div className="grid grid-cols-2 gap-2">
              <Field label={`Launch (${bodyLabel(nodes[0]!.body)}) from`} type="date" value={form.launchFrom} onChange={(e) => set("launchFrom", e.target.value)} data-testid="search-launch-from" />
              <Field label="to" type="date" value={form.launchTo} onChange={(e) => set("launchTo", e.target.value)} data-testid="search-launch-to" />
            </div>
            {form.tof.map((t, i) => (
              <div key={i} className="grid grid-cols-2 gap-2">
                <Field
                  label={`${bodyLabel(nodes[i]!.body)} → ${bodyLabel(nodes[i + 1]!.body)} min`}
                  unit="d"
                  inputMode="decimal"
                  value={t.min}
                  onChange={(e) => set("tof", form.tof.map((x, k) => (k === i ? { ...x, min: e.target.value } : x)))}
                />
                <Field
                  label="max"
                  unit="d"
                  inputMode="decimal"
                  value={t.max}
                  onChange={(e) => set("tof", form.tof.map((x, k) => (k === i ? { ...x, max: e.target.value } : x)))}
                />
              </div>
            ))}
            <SelectField label="Objective" value={form.objective} onChange={(e) => set("objective", e.target.value as Form["objective"])}>
              <option value="vinf+dv">Launch v∞ + spacecraft Δv</option>
              <option value="dv">Spacecraft Δv only</option>
            </SelectField>
            <div className="grid grid-cols-3 gap-2">
              <Field label="C3 cap" unit="km²/s²" inputMode="decimal" placeholder="none" value={form.c3Cap} onChange={(e) => set("c3Cap", e.target.value)} />
              <Field label="Arr. v∞ cap" unit="km/s" inputMode="decimal" placeholder="none" value={form.vinfCap} onChange={(e) => set("vinfCap", e.target.value)} />
              <Field label="Flight cap" unit="d" inputMode="decimal" placeholder="none" value={form.tofCap} onChange={(e) => set("tofCap", e.target.value)} />
            </div>
            <div className="grid grid-cols-2 gap-2">
              <Field label="Budget" unit="evaluations" inputMode="numeric" value={form.budget} onChange={(e) => set("budget", e.target.value)} data-testid="search-budget" />
              <Field label="Seed" inputMode="numeric" value={form.seed} onChange={(e) => set("seed", e.target.value)} data-testid="search-seed" />
            </div>
            <SelectField label="Ephemeris" value={form.ephemeris} onChange={(e) => set("ephemeris", e.target.value as Form["ephemeris"])} data-testid="search-ephemeris">
              <option value="vsop">Planetary series (cached)</option>
              <option value="mean">Mean elements</option>
            </SelectField>
            <p className="text-xs text-muted">
              Caps add penalties: 0.1 km/s per km²/s² of C3 over, 10 km/s per km/s of arrival v∞ over, 0.1 km/s per day over; a flyby below its minimum radius
              costs 0.01 km/s per km (0.001 when the minimum is 100,000 km or more). Runs on one worker per processor core (at least two).
            </p>
            {formError ? (
              <p className="text-sm text-bad" role="alert">
                {formError}
              </p>
            ) : null}
            {canEdit ? (
              <Button type="submit" variant="primary" className="w-full" pending={w.running} data-testid="run-search">
                Run search
              </Button>
            ) : (
              <p className="text-sm text-muted">Only a lead or a designer can run searches on this tour.</p>
            )}
          </form>
        </Card>
        <div className="space-y-4">
          <Card>
            <CardHeader title="Progress" description="Best value so far against evaluations, all workers together." />
            <div className="space-y-3 px-5 py-4">
              <RunProgressBar progress={w.progress} running={w.running} onCancel={w.cancel} unitLabel="evaluations" />
              {w.error ? <p className="text-sm text-bad" role="alert">The search failed: {w.error}</p> : null}
              <ConvergencePlot history={w.progress?.kind === "search" ? w.progress.history : []} total={w.progress?.total ?? 1} />
            </div>
          </Card>
          <AdoptPanel a={adopt} />
          <Card>
            <CardHeader
              title="Candidates"
              description={
                outcome
                  ? `${outcome.candidates.length} distinct tours from ${outcome.evaluations.toLocaleString("en-US")} evaluations on ${outcome.workers} workers in ${outcome.elapsedS.toFixed(1)} s${outcome.cancelled ? " — cancelled, best so far" : ""}.`
                  : "Ranked by objective value, best first."
              }
            />
            {outcome && outcome.candidates.length > 0 ? (
              <div className="overflow-x-auto">
                <table className="w-full text-sm" data-testid="candidates">
                  <thead className="bg-raised text-left text-xs tracking-wide text-muted uppercase">
                    <tr>
                      <th className="px-3 py-2">#</th>
                      <th className="px-3 py-2 text-right">Value</th>
                      <th className="px-3 py-2">Launch</th>
                      <th className="px-3 py-2">Arrival</th>
                      <th className="px-3 py-2 text-right">Flight</th>
                      <th className="px-3 py-2 text-right">C3</th>
                      <th className="px-3 py-2 text-right">Total Δv</th>
                      <th className="px-3 py-2 text-right">Arr. v∞</th>
                      <th className="px-3 py-2">Flags</th>
                      {canEdit ? <th className="px-3 py-2" /> : null}
                    </tr>
                  </thead>
                  <tbody className="divide-y divide-line">
                    {outcome.candidates.map((c, k) => {
                      const e = c.epochs;
                      return (
                        <tr key={k} data-testid="candidate-row">
                          <td className="px-3 py-2 text-muted">{k + 1}</td>
                          <td className="px-3 py-2 text-right font-medium"><Num value={c.value} unit="km/s" digits={4} /></td>
                          <td className="num px-3 py-2">{dateOf(e[0])}</td>
                          <td className="num px-3 py-2">{dateOf(e[e.length - 1])}</td>
                          <td className="px-3 py-2 text-right"><Num value={(e[e.length - 1]! - e[0]!) / DAY} unit="d" digits={0} /></td>
                          <td className="px-3 py-2 text-right"><Num value={c.result.launch.c3} unit="km²/s²" /></td>
                          <td className="px-3 py-2 text-right"><Num value={c.result.totalDv} unit="km/s" digits={3} /></td>
                          <td className="px-3 py-2 text-right"><Num value={c.result.arrival.vinf} unit="km/s" digits={3} /></td>
                          <td className="px-3 py-2">
                            {c.result.violations.length === 0 ? (
                              <Badge tone="ok">ok</Badge>
                            ) : (
                              <Badge tone="bad" title={c.result.violations.map((v) => v.message).join("\n")}>
                                {c.result.violations.length} violated
                              </Badge>
                            )}
                          </td>
                          {canEdit ? (
                            <td className="px-3 py-2 text-right">
                              <Button size="sm" pending={adopt.saving} onClick={() => adoptCandidate(c.epochs)} data-testid="adopt-candidate">
                                Adopt
                              </Button>
                            </td>
                          ) : null}
                        </tr>
                      );
                    })}
                  </tbody>
                </table>
              </div>
            ) : (
              <p className="px-5 py-6 text-sm text-muted">{outcome ? "No tour with a solution was found in these bounds." : "No search yet."}</p>
            )}
          </Card>
        </div>
      </div>
    </div>
  );
}
