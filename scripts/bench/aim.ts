/**
 * Aim board benchmark section: the median wall time of one drag update (aim point → outgoing v∞
 * → outgoing heliocentric arc of 160 samples → closest approach to the next body, refined by
 * golden section), as the board runs it on every animation frame while dragging, plus the
 * dispersion probability (two circles). Invented Earth → Venus → Earth → Jupiter chain; the
 * legs are zero-revolution Lambert arcs. Target: < 4 ms per drag update in Node.
 */
import { performance } from "node:perf_hooks";
import { aimUpdate, buildAimContext } from "../../lib/aim/outgoing";
import { flybyRisk } from "../../lib/aim/probability";
import { lambert } from "../../lib/astro/lambert";
import { cachedEphemeris, meanElementsEphemeris, vsopEphemeris } from "../../lib/astro/ephemeris";
import type { BodyId, Ephemeris, TourResult, TourSpec } from "../../lib/astro/types";
import type { BenchRow } from "./types";

const DAY_S = 86400;
const MU_SUN = 1.32712440018e11;

function setup(eph: Ephemeris) {
  const spec: TourSpec = {
    nodes: [
      { body: "earth" as BodyId, epoch: 9000 * DAY_S },
      { body: "venus" as BodyId, epoch: 9160 * DAY_S },
      { body: "earth" as BodyId, epoch: 9580 * DAY_S },
      { body: "jupiter" as BodyId, epoch: 10580 * DAY_S },
    ],
  };
  const legs = spec.nodes.slice(1).map((b, i) => {
    const a = spec.nodes[i]!;
    const s = lambert(eph.state(a.body, a.epoch).r, eph.state(b.body, b.epoch).r, b.epoch - a.epoch, MU_SUN)[0]!;
    return { from: a.body, to: b.body, tof: b.epoch - a.epoch, v1: s.v1, v2: s.v2, revs: 0 };
  });
  const result: TourResult = { legs, launch: { vinf: 0, c3: 0, dla: 0, rla: 0 }, flybys: [], arrival: { vinf: 0, dv: 0 }, totalDv: 0, violations: [] };
  return buildAimContext({ spec, result, nodeIndex: 1, ephemeris: eph });
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function timeDrag(eph: Ephemeris, n: number): number {
  const ctx = setup(eph);
  const times: number[] = [];
  // A drag path: a spiral around the planned point, 20 km … 5,000 km out.
  for (let i = 0; i < n + 20; i++) {
    const a = i * 0.37;
    const rr = 20 + (i % 50) * 100;
    const t0 = performance.now();
    aimUpdate(ctx, ctx.planned.bT + rr * Math.cos(a), ctx.planned.bR + rr * Math.sin(a));
    const t1 = performance.now();
    if (i >= 20) times.push(t1 - t0); // first 20: warm-up (JIT, ephemeris cache blocks)
  }
  return median(times);
}

export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const cached = cachedEphemeris(vsopEphemeris());
  const tCached = timeDrag(cached, 400);
  rows.push({ name: "aim drag update (cached VSOP ephemeris)", value: tCached, unit: "ms (median)", target: "< 4", pass: tCached < 4, note: "160-sample arc + closest approach" });
  const tMean = timeDrag(meanElementsEphemeris(), 400);
  rows.push({ name: "aim drag update (mean-elements ephemeris)", value: tMean, unit: "ms (median)", target: "< 4", pass: tMean < 4 });
  const tVsop = timeDrag(vsopEphemeris(), 60);
  rows.push({ name: "aim drag update (uncached VSOP)", value: tVsop, unit: "ms (median)", note: "for comparison; the board uses the cached ephemeris" });
  const ctx = setup(meanElementsEphemeris());
  const d = { sigmaT: 400, sigmaR: 250, rho: 0.3 };
  const times: number[] = [];
  for (let i = 0; i < 220; i++) {
    const t0 = performance.now();
    flybyRisk(ctx.planned.bT + i, ctx.planned.bR, d, ctx);
    if (i >= 20) times.push(performance.now() - t0);
  }
  const tRisk = median(times);
  rows.push({ name: "dispersion probabilities (impact + min altitude)", value: tRisk, unit: "ms (median)", target: "< 4", pass: tRisk < 4, note: "2,048-direction quadrature per circle" });
  return rows;
}
