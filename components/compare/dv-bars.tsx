import { scaleLinear } from "d3-scale";
import type { CompareItem } from "@/lib/tours/compare";
import { formatNum } from "@/components/ui/num";
import { tagOf } from "./tour-tag";

const W = 880;
const LABEL_W = 200;
const RIGHT = 250;
const ROW_H = 58;
const TOP = 34;

/**
 * Δv budget bars on one common scale (km/s): per tour the spacecraft's Δv stacked as flybys
 * (solid) + arrival (hatched), and beneath it the launch v∞ (outlined, the launcher's share) —
 * shape and text carry the meaning, never colour alone.
 */
export function DvBars({ items }: { items: CompareItem[] }) {
  const finite = (x: number | null) => (x !== null && Number.isFinite(x) ? x : 0);
  const max = Math.max(1, ...items.map((i) => Math.max(finite(i.dv.flybyDvKmS) + finite(i.dv.arrivalDvKmS), finite(i.dv.launchVinfKmS))));
  const x = scaleLinear().domain([0, max]).nice().range([LABEL_W, W - RIGHT]);
  const ticks = x.ticks(6);
  const H = TOP + items.length * ROW_H + 8;
  return (
    <figure className="space-y-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full max-w-[1000px]" role="img" aria-labelledby="dv-bars-title dv-bars-desc">
        <title id="dv-bars-title">Δv budget per tour, km/s, common scale</title>
        <desc id="dv-bars-desc">
          {items.map((i, k) => `${tagOf(k)} ${i.name}: flybys ${formatNum(i.dv.flybyDvKmS, 3)} km/s, arrival ${formatNum(i.dv.arrivalDvKmS, 3)} km/s, launch v∞ ${formatNum(i.dv.launchVinfKmS, 3)} km/s.`).join(" ")}
        </desc>
        <defs>
          <pattern id="dv-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="6" height="6" className="fill-accent-soft" />
            <line x1="0" y1="0" x2="0" y2="6" className="stroke-accent" strokeWidth="2.2" />
          </pattern>
        </defs>
        {ticks.map((t) => (
          <g key={t}>
            <line x1={x(t)} x2={x(t)} y1={TOP - 6} y2={H - 6} className="stroke-line" strokeWidth={1} />
            <text x={x(t)} y={TOP - 12} textAnchor="middle" className="fill-muted font-mono text-[11px]">{t}</text>
          </g>
        ))}
        <text x={W - RIGHT + 22} y={TOP - 12} className="fill-faint text-[11px]">km/s</text>
        {items.map((i, k) => {
          const y = TOP + k * ROW_H + 6;
          const fly = i.dv.flybyDvKmS;
          const arr = i.dv.arrivalDvKmS;
          const lv = i.dv.launchVinfKmS;
          const ok = fly !== null && arr !== null;
          const x0 = x(0);
          const x1 = ok ? x(fly) : x0;
          const x2 = ok ? x(fly + arr) : x0;
          return (
            <g key={i.id} data-tour-id={i.id}>
              <text x={0} y={y + 13} className="fill-ink font-mono text-[12px] font-semibold">{tagOf(k)}</text>
              <text x={18} y={y + 13} className="fill-ink text-[12px]">{i.name.length > 28 ? `${i.name.slice(0, 27)}…` : i.name}</text>
              <text x={18} y={y + 38} className="fill-muted text-[11px]">launch v∞</text>
              {ok ? (
                <>
                  {x1 > x0 ? <rect x={x0} y={y} width={x1 - x0} height={20} className="fill-accent" rx={2} /> : null}
                  {x2 > x1 ? <rect x={x1} y={y} width={x2 - x1} height={20} fill="url(#dv-hatch)" className="stroke-accent" strokeWidth={1} rx={2} /> : null}
                  <text x={Math.max(x2, x0) + 8} y={y + 14} className="fill-ink font-mono text-[11px]">
                    {formatNum(fly, 3)} + {formatNum(arr, 3)} = {formatNum(fly + arr, 3)} km/s
                  </text>
                </>
              ) : (
                <text x={x0 + 8} y={y + 14} className="fill-bad text-[11px]">no solution: a leg has no transfer</text>
              )}
              {lv !== null ? (
                <>
                  <rect x={x0} y={y + 28} width={Math.max(1, x(lv) - x0)} height={12} className="fill-none stroke-muted" strokeDasharray="4 3" strokeWidth={1.2} rx={2} />
                  <text x={x(lv) + 8} y={y + 38} className="fill-muted font-mono text-[11px]">{formatNum(lv, 3)} km/s (C3 {formatNum(i.c3Km2S2, 2)} km²/s²)</text>
                </>
              ) : (
                <text x={x0 + 8} y={y + 38} className="fill-bad text-[11px]">—</text>
              )}
            </g>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-muted">
        <span className="flex items-center gap-1.5"><svg width="18" height="10" aria-hidden><rect width="18" height="10" rx="2" className="fill-accent" /></svg>flyby Δv (powered flybys)</span>
        <span className="flex items-center gap-1.5"><svg width="18" height="10" aria-hidden><rect width="18" height="10" rx="2" fill="url(#dv-hatch)" className="stroke-accent" /></svg>arrival Δv (hatched)</span>
        <span className="flex items-center gap-1.5"><svg width="18" height="10" aria-hidden><rect x="0.6" y="0.6" width="16.8" height="8.8" rx="2" className="fill-none stroke-muted" strokeDasharray="4 3" /></svg>launch v∞ (dashed outline; paid by the launcher, not in the total)</span>
      </figcaption>
    </figure>
  );
}
