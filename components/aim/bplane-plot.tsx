"use client";
/**
 * The B-plane of one flyby in SVG: T to the right, R downward (R̂ = Ŝ×T̂), km ticks, the impact
 * circle, the minimum-altitude circle, the aim point the next leg needs, the 1σ/3σ dispersion
 * ellipses and the analyst's draggable aim point (mouse and touch through pointer events; arrow
 * keys on the focusable handle, Shift for 10× steps). Colours are resolved hex values so that the
 * serialized SVG renders the same when exported as PNG.
 */
import { forwardRef, useCallback, useRef, type KeyboardEvent, type PointerEvent } from "react";
import { symmetricTicks } from "@/lib/aim/plot";
import { formatNum } from "@/components/ui/num";

export interface PlotColors {
  background: string;
  grid: string;
  axis: string;
  text: string;
  faint: string;
  accent: string;
  impact: string;
  minAlt: string;
  planned: string;
}

export interface BPlanePlotProps {
  /** Half-width of the plot, km. */
  extent: number;
  aim: { bT: number; bR: number };
  planned: { bT: number; bR: number };
  impactRadius: number;
  minAltRadius: number;
  /** Minimum altitude above the surface, km (for the label). */
  minAltitude: number;
  /** kσ ellipses around the aim point, km and rad (from +T toward +R). */
  ellipses: { k: number; major: number; minor: number; angle: number }[];
  editable: boolean;
  /** Label of the aim point (default "your aim"). */
  aimLabel?: string;
  colors: PlotColors;
  onAim?(bT: number, bR: number): void;
  /** Called when a drag starts / ends (for the parent's state). */
  onDragState?(dragging: boolean): void;
  size?: number;
}

const MARGIN = 46;

export const BPlanePlot = forwardRef<SVGSVGElement, BPlanePlotProps>(function BPlanePlot(
  { extent, aim, planned, impactRadius, minAltRadius, minAltitude, ellipses, editable, aimLabel = "your aim", colors, onAim, onDragState, size = 560 },
  ref,
) {
  const W = size;
  const c = W / 2;
  const s = (W / 2 - MARGIN) / extent; // px per km
  const X = (bT: number) => c + bT * s;
  const Y = (bR: number) => c + bR * s;
  const ticks = symmetricTicks(extent, 4);
  const svgRef = useRef<SVGSVGElement | null>(null);
  const dragging = useRef(false);

  const setRefs = useCallback(
    (el: SVGSVGElement | null) => {
      svgRef.current = el;
      if (typeof ref === "function") ref(el);
      else if (ref) ref.current = el;
    },
    [ref],
  );

  // The aim point stays inside the drawn area (it can always be seen and grabbed again).
  const lim = extent * 1.08;
  const clamp = (v: number) => Math.max(-lim, Math.min(lim, v));
  const toKm = (e: PointerEvent<SVGElement>): { bT: number; bR: number } | null => {
    const svg = svgRef.current;
    const m = svg?.getScreenCTM();
    if (!svg || !m) return null;
    const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(m.inverse());
    return { bT: clamp((p.x - c) / s), bR: clamp((p.y - c) / s) };
  };

  const onDown = (e: PointerEvent<SVGSVGElement>) => {
    if (!editable || e.button !== 0) return;
    const k = toKm(e);
    if (!k) return;
    e.preventDefault();
    (e.currentTarget as Element).setPointerCapture?.(e.pointerId);
    dragging.current = true;
    onDragState?.(true);
    onAim?.(k.bT, k.bR);
    document.getElementById("aim-handle")?.focus({ preventScroll: true });
  };
  const onMove = (e: PointerEvent<SVGSVGElement>) => {
    if (!dragging.current) return;
    const k = toKm(e);
    if (k) onAim?.(k.bT, k.bR);
  };
  const onUp = (e: PointerEvent<SVGSVGElement>) => {
    if (!dragging.current) return;
    dragging.current = false;
    (e.currentTarget as Element).releasePointerCapture?.(e.pointerId);
    onDragState?.(false);
  };
  const onKey = (e: KeyboardEvent<SVGGElement>) => {
    if (!editable) return;
    const step = (extent / 100) * (e.shiftKey ? 10 : 1);
    let dT = 0;
    let dR = 0;
    if (e.key === "ArrowRight") dT = step;
    else if (e.key === "ArrowLeft") dT = -step;
    else if (e.key === "ArrowDown") dR = step;
    else if (e.key === "ArrowUp") dR = -step;
    else return;
    e.preventDefault();
    onAim?.(clamp(aim.bT + dT), clamp(aim.bR + dR));
  };

  const font = "ui-monospace, SFMono-Regular, Menlo, monospace";
  const ax = X(aim.bT);
  const ay = Y(aim.bR);
  const px = X(planned.bT);
  const py = Y(planned.bR);
  const inView = (x: number, y: number) => x > -20 && x < W + 20 && y > -20 && y < W + 20;

  return (
    <svg
      ref={setRefs}
      viewBox={`0 0 ${W} ${W}`}
      width="100%"
      role="img"
      aria-label="B-plane of the flyby: T axis to the right, R axis downward, kilometres"
      data-testid="bplane"
      className={editable ? "touch-none select-none cursor-crosshair" : "select-none"}
      style={{ maxWidth: W, aspectRatio: "1 / 1" }}
      onPointerDown={onDown}
      onPointerMove={onMove}
      onPointerUp={onUp}
      onPointerCancel={onUp}
    >
      <defs>
        <clipPath id="bplane-clip">
          <rect x={MARGIN - 6} y={MARGIN - 6} width={W - 2 * MARGIN + 12} height={W - 2 * MARGIN + 12} />
        </clipPath>
        <pattern id="impact-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" fill={colors.impact} fillOpacity="0.12" />
          <line x1="0" y1="0" x2="0" y2="6" stroke={colors.impact} strokeOpacity="0.55" strokeWidth="1.6" />
        </pattern>
      </defs>
      <rect x="0" y="0" width={W} height={W} fill={colors.background} />
      {/* grid and ticks */}
      {ticks.map((t) => (
        <g key={`g${t}`}>
          <line x1={X(t)} y1={MARGIN - 6} x2={X(t)} y2={W - MARGIN + 6} stroke={colors.grid} strokeWidth={t === 0 ? 0 : 1} />
          <line x1={MARGIN - 6} y1={Y(t)} x2={W - MARGIN + 6} y2={Y(t)} stroke={colors.grid} strokeWidth={t === 0 ? 0 : 1} />
          <text x={X(t)} y={W - MARGIN + 20} fill={colors.faint} fontSize="10" fontFamily={font} textAnchor="middle">
            {formatNum(t, 0)}
          </text>
          <text x={MARGIN - 10} y={Y(t) + 3} fill={colors.faint} fontSize="10" fontFamily={font} textAnchor="end">
            {formatNum(t, 0)}
          </text>
        </g>
      ))}
      {/* axes */}
      <line x1={MARGIN - 6} y1={c} x2={W - MARGIN + 10} y2={c} stroke={colors.axis} strokeWidth="1.2" />
      <path d={`M${W - MARGIN + 10} ${c} l-7 -3.5 v7z`} fill={colors.axis} />
      <line x1={c} y1={MARGIN - 6} x2={c} y2={W - MARGIN + 10} stroke={colors.axis} strokeWidth="1.2" />
      <path d={`M${c} ${W - MARGIN + 10} l-3.5 -7 h7z`} fill={colors.axis} />
      <text x={W - MARGIN + 12} y={c - 8} fill={colors.text} fontSize="12" fontFamily={font} textAnchor="end">
        +T
      </text>
      <text x={c + 8} y={W - MARGIN + 8} fill={colors.text} fontSize="12" fontFamily={font}>
        +R
      </text>
      <text x={W / 2} y={W - 8} fill={colors.faint} fontSize="11" fontFamily={font} textAnchor="middle">
        B·T (km)
      </text>
      <text x={12} y={W / 2} fill={colors.faint} fontSize="11" fontFamily={font} textAnchor="middle" transform={`rotate(-90 12 ${W / 2})`}>
        B·R (km)
      </text>
      <g clipPath="url(#bplane-clip)">
        {/* minimum-altitude circle (dashed) and impact circle (hatched) */}
        <circle cx={c} cy={c} r={minAltRadius * s} fill="none" stroke={colors.minAlt} strokeWidth="1.5" strokeDasharray="6 4" />
        <circle cx={c} cy={c} r={impactRadius * s} fill="url(#impact-hatch)" stroke={colors.impact} strokeWidth="1.5" />
        {/* dispersion ellipses about the aim point */}
        {ellipses.map((e) =>
          e.major > 0 ? (
            <ellipse
              key={`e${e.k}`}
              cx={ax}
              cy={ay}
              rx={Math.max(0.5, e.major * s)}
              ry={Math.max(0.5, e.minor * s)}
              transform={`rotate(${(e.angle * 180) / Math.PI} ${ax} ${ay})`}
              fill={colors.accent}
              fillOpacity={e.k === 1 ? 0.16 : 0.06}
              stroke={colors.accent}
              strokeWidth="1"
              strokeDasharray={e.k === 1 ? undefined : "3 3"}
            />
          ) : null,
        )}
        {/* the aim point that the next leg needs: a square */}
        <g data-testid="planned-aim">
          <rect x={px - 5} y={py - 5} width="10" height="10" fill="none" stroke={colors.planned} strokeWidth="1.6" />
          <line x1={px - 8} y1={py} x2={px + 8} y2={py} stroke={colors.planned} strokeWidth="1" />
          <line x1={px} y1={py - 8} x2={px} y2={py + 8} stroke={colors.planned} strokeWidth="1" />
        </g>
        <line x1={px} y1={py} x2={ax} y2={ay} stroke={colors.faint} strokeWidth="1" strokeDasharray="2 3" />
      </g>
      {/* labels outside the clip so they stay readable */}
      <text x={c + minAltRadius * s * 0.72 + 4} y={c - minAltRadius * s * 0.72 - 4} fill={colors.minAlt} fontSize="10.5" fontFamily={font}>
        min altitude {formatNum(minAltitude, 0)} km
      </text>
      <text x={c} y={c + 3.5} fill={colors.impact} fontSize="10.5" fontFamily={font} textAnchor="middle">
        impact
      </text>
      {inView(px, py) ? (
        <text x={px + 10} y={py + 16} fill={colors.planned} fontSize="10.5" fontFamily={font}>
          needed by next leg
        </text>
      ) : null}
      {/* the analyst's aim point: a ring with a dot; focusable for arrow keys */}
      <g
        id="aim-handle"
        data-testid="aim-handle"
        tabIndex={editable ? 0 : -1}
        role={editable ? "button" : undefined}
        aria-label={`${aimLabel}: B·T ${formatNum(aim.bT, 0)} km, B·R ${formatNum(aim.bR, 0)} km.${editable ? " Drag it, or use the arrow keys (Shift for larger steps)." : ""}`}
        onKeyDown={onKey}
        className={editable ? "cursor-grab outline-none focus-visible:[&>circle:first-child]:stroke-[3]" : "outline-none"}
      >
        <circle cx={ax} cy={ay} r="11" fill={colors.accent} fillOpacity="0.18" stroke={colors.accent} strokeWidth="2" />
        <circle cx={ax} cy={ay} r="3" fill={colors.accent} />
      </g>
      {inView(ax, ay) ? (
        <text x={ax + 14} y={ay - 12} fill={colors.accent} fontSize="11" fontWeight="600" fontFamily={font}>
          {aimLabel}
        </text>
      ) : null}
    </svg>
  );
});
