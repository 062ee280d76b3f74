"use client";
/** Best objective value (km/s) against objective evaluations (all islands summed), as a step line. */
import { scaleLinear } from "d3-scale";
import { formatNum } from "@/components/ui/num";

const W = 560;
const H = 200;
const M = { top: 10, right: 12, bottom: 34, left: 56 };

export function ConvergencePlot({ history, total }: { history: { evaluations: number; best: number }[]; total: number }) {
  const pts = history.filter((h) => Number.isFinite(h.best));
  if (pts.length === 0) {
    return (
      <div className="flex h-40 items-center justify-center rounded-md border border-dashed border-line text-sm text-muted" data-testid="convergence-plot">
        The best value so far appears here while the search runs.
      </div>
    );
  }
  const last = pts[pts.length - 1]!.best;
  // Cap the y range so the late, small improvements stay visible.
  const firstShown = Math.min(pts[0]!.best, last * 2 + 1);
  const x = scaleLinear().domain([0, Math.max(total, pts[pts.length - 1]!.evaluations)]).range([0, W]);
  const y = scaleLinear().domain([last - (firstShown - last) * 0.05 - 1e-3, firstShown]).nice().range([H, 0]);
  let d = "";
  for (let k = 0; k < pts.length; k++) {
    const px = x(pts[k]!.evaluations);
    const py = y(Math.min(pts[k]!.best, y.domain()[1]!));
    d += k === 0 ? `M${px.toFixed(1)},${py.toFixed(1)}` : `H${px.toFixed(1)}V${py.toFixed(1)}`;
  }
  return (
    <svg viewBox={`0 0 ${W + M.left + M.right} ${H + M.top + M.bottom}`} className="w-full" role="img" aria-label="Convergence: best value against evaluations" data-testid="convergence-plot">
      <g transform={`translate(${M.left},${M.top})`} fontSize={11} className="text-muted" fill="currentColor">
        <rect width={W} height={H} fill="#0f1622" />
        {y.ticks(5).map((t) => (
          <g key={t} transform={`translate(0,${y(t)})`}>
            <line x2={W} stroke="#263240" />
            <text x={-6} dy={4} textAnchor="end" className="num" fill="currentColor">
              {formatNum(t, 2)}
            </text>
          </g>
        ))}
        {x.ticks(5).map((t) => (
          <g key={t} transform={`translate(${x(t)},${H})`}>
            <line y2={4} stroke="#536170" />
            <text y={16} textAnchor="middle" className="num" fill="currentColor">
              {t >= 1e6 ? `${t / 1e6}M` : t >= 1e3 ? `${t / 1e3}k` : t}
            </text>
          </g>
        ))}
        <path d={d} fill="none" stroke="#ffb347" strokeWidth={1.8} />
        <text x={W / 2} y={H + 30} textAnchor="middle" className="text-ink" fill="currentColor">
          Objective evaluations
        </text>
        <text transform={`translate(${-44},${H / 2}) rotate(-90)`} textAnchor="middle" className="text-ink" fill="currentColor">
          Best (km/s)
        </text>
      </g>
    </svg>
  );
}
