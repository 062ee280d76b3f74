"use client";
/**
 * The window-scan contour plot: departure dates across, arrival dates (or flight time in days)
 * up; filled bands and labelled contour lines (d3-contour) of one quantity, the minimum
 * marked with a ring-and-cross and its value, hover crosshair, click to pick a cell.
 * Low values are the light bands (the window), so the shape reads without a colour key.
 */
import { useMemo, useRef, useState } from "react";
import { contours } from "d3-contour";
import { scaleLinear, scaleUtc } from "d3-scale";
import { isoToTdbSeconds, tdbSecondsToIso } from "@/lib/astro/time";
import { formatNum } from "@/components/ui/num";

export interface Cell {
  i: number; // departure index
  j: number; // arrival / tof index
}

export interface ContourPlotProps {
  departures: number[]; // TDB s
  cols: number[]; // TDB s (arrival) or s (tof)
  mode: "arrival" | "tof";
  values: Float64Array; // row-major [departure][col]
  unit: string;
  label: string;
  minCell: Cell | null;
  picked: Cell | null;
  onHover: (c: Cell | null) => void;
  onPick: (c: Cell) => void;
}

const W = 720;
const H = 440;
const M = { top: 12, right: 16, bottom: 44, left: 96 };
const fmtDate = (d: Date) => d.toISOString().slice(0, 10);

function dateOfTdb(t: number): Date {
  return new Date(tdbSecondsToIso(t));
}

export function ContourPlot(p: ContourPlotProps) {
  const nx = p.departures.length;
  const ny = p.cols.length;
  const svgRef = useRef<SVGSVGElement>(null);
  const [hover, setHover] = useState<Cell | null>(null);

  const geo = useMemo(() => {
    const finite: number[] = [];
    for (const v of p.values) if (Number.isFinite(v)) finite.push(v);
    if (finite.length === 0) return null;
    finite.sort((a, b) => a - b);
    const min = finite[0]!;
    // Show the window: levels from the minimum up to the 60th percentile of the grid.
    const top = Math.max(finite[Math.floor(finite.length * 0.6)]!, min + 1e-6);
    let levels = scaleLinear().domain([min, top]).nice(10).ticks(10).filter((l) => l > min);
    if (levels.length < 3) levels = scaleLinear().domain([min, finite[finite.length - 1]!]).ticks(8).filter((l) => l > min);
    const fillHigh = (finite[finite.length - 1]! + 1) * 10;
    const grid = new Float64Array(nx * ny);
    for (let i = 0; i < nx; i++) {
      for (let j = 0; j < ny; j++) {
        const v = p.values[i * ny + j]!;
        grid[i + j * nx] = Number.isFinite(v) ? v : fillHigh;
      }
    }
    const cs = contours().size([nx, ny]).thresholds(levels)(Array.from(grid));
    const sx = (gx: number) => (gx / nx) * W;
    const sy = (gy: number) => H - (gy / ny) * H;
    const paths = cs.map((c) => {
      let d = "";
      let longest: [number, number][] = [];
      for (const poly of c.coordinates) {
        for (const ring of poly) {
          if (ring.length > longest.length) longest = ring as [number, number][];
          d += ring.map((pt, k) => `${k ? "L" : "M"}${sx(pt[0]!).toFixed(1)},${sy(pt[1]!).toFixed(1)}`).join("") + "Z";
        }
      }
      // label at a ring point away from the plot's edges
      let lab: [number, number] | null = null;
      for (let k = 0; k < longest.length; k++) {
        const pt = longest[(k + Math.floor(longest.length / 3)) % longest.length]!;
        const x = sx(pt[0]), y = sy(pt[1]);
        if (x > 24 && x < W - 24 && y > 14 && y < H - 14) {
          lab = [x, y];
          break;
        }
      }
      return { value: c.value, d, lab };
    });
    const shade = scaleLinear<string>().domain([0, Math.max(1, levels.length)]).range(["#2f4a5c", "#0f1622"]);
    return { min, levels, paths, shade };
  }, [p.values, nx, ny]);

  const xScale = useMemo(() => {
    const d0 = dateOfTdb(p.departures[0]!);
    const d1 = dateOfTdb(p.departures[nx - 1]!);
    return scaleUtc().domain([d0, d1]);
  }, [p.departures, nx]);

  const cellX = (i: number) => ((i + 0.5) / nx) * W;
  const cellY = (j: number) => H - ((j + 0.5) / ny) * H;
  const tX = (t: number) => {
    const step = nx > 1 ? (p.departures[nx - 1]! - p.departures[0]!) / (nx - 1) : 1;
    return cellX((t - p.departures[0]!) / step);
  };
  const yStep = ny > 1 ? (p.cols[ny - 1]! - p.cols[0]!) / (ny - 1) : 1;
  const tY = (v: number) => cellY((v - p.cols[0]!) / yStep);

  const xTicks = xScale.ticks(6).map((d) => ({ x: tX(isoToTdbSeconds(d.toISOString())), label: fmtDate(d) }));
  const yTicks =
    p.mode === "arrival"
      ? scaleUtc()
          .domain([dateOfTdb(p.cols[0]!), dateOfTdb(p.cols[ny - 1]!)])
          .ticks(6)
          .map((d) => ({ y: tY(isoToTdbSeconds(d.toISOString())), label: fmtDate(d) }))
      : scaleLinear()
          .domain([p.cols[0]! / 86400, p.cols[ny - 1]! / 86400])
          .ticks(6)
          .map((v) => ({ y: tY(v * 86400), label: `${v} d` }));

  const cellAt = (ev: React.MouseEvent<SVGRectElement>): Cell | null => {
    const r = (ev.currentTarget as SVGRectElement).getBoundingClientRect();
    const fx = (ev.clientX - r.left) / r.width;
    const fy = 1 - (ev.clientY - r.top) / r.height;
    const i = Math.floor(fx * nx);
    const j = Math.floor(fy * ny);
    if (i < 0 || j < 0 || i >= nx || j >= ny) return null;
    return { i, j };
  };

  return (
    <svg
      ref={svgRef}
      viewBox={`0 0 ${W + M.left + M.right} ${H + M.top + M.bottom}`}
      className="w-full select-none"
      role="img"
      aria-label={`Contour plot of ${p.label} over departure and ${p.mode === "arrival" ? "arrival date" : "flight time"}`}
      data-testid="contour-plot"
    >
      <g transform={`translate(${M.left},${M.top})`}>
        <rect width={W} height={H} fill="#3d6075" />
        {geo
          ? geo.paths.map((c, k) => <path key={`f${k}`} d={c.d} fill={geo.shade(k + 1)} fillRule="evenodd" stroke="none" />)
          : null}
        {geo
          ? geo.paths.map((c, k) => (
              <path key={`l${k}`} d={c.d} fill="none" stroke="#c9d4de" strokeOpacity={0.55} strokeWidth={k % 2 === 0 ? 1.1 : 0.6} />
            ))
          : null}
        {geo
          ? geo.paths.map((c, k) =>
              c.lab && k % 1 === 0 ? (
                <g key={`t${k}`} transform={`translate(${c.lab[0]},${c.lab[1]})`} pointerEvents="none">
                  <rect x={-17} y={-8} width={34} height={15} rx={3} fill="#0f1622" fillOpacity={0.8} />
                  <text textAnchor="middle" dy={4} fontSize={10} className="num" fill="#e6edf3">
                    {formatNum(c.value, c.value < 10 ? 1 : 0)}
                  </text>
                </g>
              ) : null,
            )
          : null}
        {p.minCell ? (
          <g transform={`translate(${cellX(p.minCell.i)},${cellY(p.minCell.j)})`} pointerEvents="none" data-testid="scan-minimum">
            <circle r={7} fill="none" stroke="#ffb347" strokeWidth={2} />
            <path d="M-11,0H11M0,-11V11" stroke="#ffb347" strokeWidth={1.4} />
            <text x={12} y={-10} fontSize={11} fill="#ffd9a0" className="num">
              min {formatNum(geo?.min, 2)} {p.unit}
            </text>
          </g>
        ) : null}
        {p.picked ? (
          <rect
            x={cellX(p.picked.i) - 5}
            y={cellY(p.picked.j) - 5}
            width={10}
            height={10}
            fill="none"
            stroke="#ffffff"
            strokeWidth={1.6}
            pointerEvents="none"
          />
        ) : null}
        {hover ? (
          <g pointerEvents="none" stroke="#ffffff" strokeOpacity={0.45} strokeDasharray="3 3">
            <line x1={cellX(hover.i)} x2={cellX(hover.i)} y1={0} y2={H} />
            <line x1={0} x2={W} y1={cellY(hover.j)} y2={cellY(hover.j)} />
          </g>
        ) : null}
        <rect
          width={W}
          height={H}
          fill="transparent"
          style={{ cursor: "crosshair" }}
          data-testid="contour-hit"
          onMouseMove={(e) => {
            const c = cellAt(e);
            setHover(c);
            p.onHover(c);
          }}
          onMouseLeave={() => {
            setHover(null);
            p.onHover(null);
          }}
          onClick={(e) => {
            const c = cellAt(e);
            if (c) p.onPick(c);
          }}
        />
        {/* axes */}
        <g transform={`translate(0,${H})`} fontSize={11} fill="currentColor">
          <line x1={0} x2={W} stroke="#536170" />
          {xTicks
            .filter((t) => t.x >= 0 && t.x <= W)
            .map((t) => (
              <g key={t.label} transform={`translate(${t.x},0)`}>
                <line y2={5} stroke="#536170" />
                <text y={18} textAnchor="middle" className="num" fill="currentColor">
                  {t.label}
                </text>
              </g>
            ))}
          <text x={W / 2} y={38} textAnchor="middle" className="text-ink" fill="currentColor">
            Departure (UTC)
          </text>
        </g>
        <g fontSize={11} className="text-muted" fill="currentColor">
          <line y1={0} y2={H} stroke="#536170" />
          {yTicks
            .filter((t) => t.y >= 0 && t.y <= H)
            .map((t) => (
              <g key={t.label} transform={`translate(0,${t.y})`}>
                <line x2={-5} stroke="#536170" />
                <text x={-8} dy={4} textAnchor="end" className="num" fill="currentColor">
                  {t.label}
                </text>
              </g>
            ))}
          <text transform={`translate(${-M.left + 12},${H / 2}) rotate(-90)`} textAnchor="middle" className="text-ink" fill="currentColor">
            {p.mode === "arrival" ? "Arrival (UTC)" : "Flight time"}
          </text>
        </g>
      </g>
    </svg>
  );
}
