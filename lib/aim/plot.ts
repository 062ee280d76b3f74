/**
 * Pure helpers of the Aim board's B-plane plot (no React/DOM): axis ticks, the plot extent and
 * re-expressing an aim point when the B-plane reference pole changes.
 * Units: km in the B-plane; vectors unit-less directions in EclJ2000 axes.
 */
import type { Vec3 } from "@/lib/astro/types";

/** A "nice" tick step (1, 2 or 5 × 10^k km) close to span/targetTicks. span km > 0. */
export function niceStep(span: number, targetTicks = 4): number {
  if (!(span > 0) || !Number.isFinite(span)) throw new RangeError(`span must be finite and > 0 km (got ${span})`);
  const raw = span / Math.max(1, targetTicks);
  const p = Math.pow(10, Math.floor(Math.log10(raw)));
  const f = raw / p;
  return (f < 1.5 ? 1 : f < 3.5 ? 2 : f < 7.5 ? 5 : 10) * p;
}

/** Tick positions (km) in [−half, half], symmetric about 0, multiples of niceStep(half). */
export function symmetricTicks(half: number, targetTicks = 4): number[] {
  const step = niceStep(half, targetTicks);
  const n = Math.floor(half / step + 1e-9);
  const out: number[] = [];
  for (let i = -n; i <= n; i++) out.push(i * step);
  return out;
}

/**
 * Half-width (km) of a square plot that shows the given points and circles with a margin:
 * max of |points| and radii, times `pad` (default 1.35), at least 1 km.
 */
export function plotExtent(points: { x: number; y: number }[], radii: number[], pad = 1.35): number {
  let m = 1;
  for (const p of points) if (Number.isFinite(p.x) && Number.isFinite(p.y)) m = Math.max(m, Math.abs(p.x), Math.abs(p.y));
  for (const r of radii) if (Number.isFinite(r)) m = Math.max(m, r);
  return m * pad;
}

/**
 * The same B vector in another B-plane triad: B = bT·T₁ + bR·R₁, returned as (B·T₂, B·R₂) km.
 * Both triads share Ŝ (the incoming asymptote), so |B| is preserved.
 */
export function reexpressAim(bT: number, bR: number, from: { T: Vec3; R: Vec3 }, to: { T: Vec3; R: Vec3 }): { bT: number; bR: number } {
  const x = bT * from.T[0] + bR * from.R[0];
  const y = bT * from.T[1] + bR * from.R[1];
  const z = bT * from.T[2] + bR * from.R[2];
  return { bT: x * to.T[0] + y * to.T[1] + z * to.T[2], bR: x * to.R[0] + y * to.R[1] + z * to.R[2] };
}
