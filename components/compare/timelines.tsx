import { scaleUtc } from "d3-scale";
import type { CompareItem } from "@/lib/tours/compare";
import { tdbSecondsToIso } from "@/lib/astro/time";
import { bodyLabel, dateOf } from "@/lib/format";
import { tagOf } from "./tour-tag";

const W = 880;
const LABEL_W = 200;
const RIGHT = 24;
const ROW_H = 66;
const TOP = 30;

const dateOfTdb = (t: number) => new Date(tdbSecondsToIso(t));

function Marker({ role, cx, cy }: { role: "launch" | "flyby" | "arrival"; cx: number; cy: number }) {
  if (role === "launch") return <path d={`M${cx - 6} ${cy + 5} L${cx} ${cy - 6} L${cx + 6} ${cy + 5} Z`} className="fill-surface stroke-ink" strokeWidth={1.5} />;
  if (role === "arrival") return <rect x={cx - 5} y={cy - 5} width={10} height={10} className="fill-ink stroke-ink" strokeWidth={1.5} />;
  return <circle cx={cx} cy={cy} r={5} className="fill-accent stroke-canvas" strokeWidth={1.2} />;
}

/** Each tour a row on one common date axis, nodes marked by shape (launch ▲, flyby ●, arrival ■) and labelled by body. */
export function Timelines({ items }: { items: CompareItem[] }) {
  const all = items.flatMap((i) => i.nodes.map((n) => n.epoch)).filter(Number.isFinite);
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const x = scaleUtc().domain([dateOfTdb(lo), dateOfTdb(hi)]).nice().range([LABEL_W, W - RIGHT]);
  const ticks = x.ticks(8);
  const H = TOP + items.length * ROW_H;
  const yearly = ticks.every((t) => t.getUTCMonth() === 0 && t.getUTCDate() === 1);
  return (
    <figure className="space-y-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full max-w-[1000px]" role="img" aria-labelledby="tl-title tl-desc">
        <title id="tl-title">Tour timelines on a common date axis</title>
        <desc id="tl-desc">
          {items.map((i, k) => `${tagOf(k)} ${i.name}: ${i.nodes.map((n) => `${bodyLabel(n.body)} ${dateOf(n.epoch)}`).join(", ")}.`).join(" ")}
        </desc>
        {ticks.map((t) => (
          <g key={t.toISOString()}>
            <line x1={x(t)} x2={x(t)} y1={TOP - 8} y2={H - 4} className="stroke-line" strokeWidth={1} />
            <text x={x(t)} y={TOP - 14} textAnchor="middle" className="fill-muted font-mono text-[11px]">
              {yearly ? t.getUTCFullYear() : t.toISOString().slice(0, 7)}
            </text>
          </g>
        ))}
        {items.map((i, k) => {
          const y = TOP + k * ROW_H + 34;
          const xs = i.nodes.map((n) => x(dateOfTdb(n.epoch)));
          return (
            <g key={i.id} data-tour-id={i.id}>
              <text x={0} y={y + 4} className="fill-ink font-mono text-[12px] font-semibold">{tagOf(k)}</text>
              <text x={18} y={y + 4} className="fill-ink text-[12px]">{i.name.length > 28 ? `${i.name.slice(0, 27)}…` : i.name}</text>
              <line x1={xs[0]} x2={xs[xs.length - 1]} y1={y} y2={y} className="stroke-accent" strokeWidth={2} />
              {i.nodes.map((n, j) => {
                const above = j % 2 === 0;
                return (
                  <g key={n.id}>
                    <Marker role={n.role} cx={xs[j]!} cy={y} />
                    <text x={xs[j]} y={above ? y - 11 : y + 20} textAnchor="middle" className="fill-ink text-[11px]">
                      {bodyLabel(n.body)}
                    </text>
                    <title>{`${n.role}: ${bodyLabel(n.body)}, ${dateOf(n.epoch)}`}</title>
                  </g>
                );
              })}
            </g>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-muted">
        <span className="flex items-center gap-1.5"><svg width="14" height="14" aria-hidden><path d="M1 12 L7 1 L13 12 Z" className="fill-surface stroke-ink" strokeWidth={1.5} /></svg>launch</span>
        <span className="flex items-center gap-1.5"><svg width="14" height="14" aria-hidden><circle cx="7" cy="7" r="5" className="fill-accent" /></svg>flyby</span>
        <span className="flex items-center gap-1.5"><svg width="14" height="14" aria-hidden><rect x="2" y="2" width="10" height="10" className="fill-ink" /></svg>arrival</span>
        <span>Dates UTC; hover a marker for its date.</span>
      </figcaption>
    </figure>
  );
}
