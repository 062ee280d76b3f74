/**
 * The landing page's hero drawing: a tilted view of the inner solar system and Jupiter's
 * orbit, with an invented Earth → Venus → Earth → Jupiter tour drawn in the accent colour.
 * Purely decorative (aria-hidden); the page text says the same thing in words.
 */
const orbits = [
  { rx: 70, cls: "stroke-venus", planet: "fill-venus", t: 200 },
  { rx: 100, cls: "stroke-earth", planet: "fill-earth", t: 20 },
  { rx: 146, cls: "stroke-mars", planet: "fill-mars", t: 310 },
  { rx: 222, cls: "stroke-jupiter", planet: "fill-jupiter", t: 250 },
] as const;

const CX = 240;
const CY = 180;
const TILT = 0.5;

function at(rx: number, deg: number): [number, number] {
  const t = (deg * Math.PI) / 180;
  return [CX + rx * Math.cos(t), CY + rx * TILT * Math.sin(t)];
}

const stars: [number, number, number][] = [
  [22, 30, 0.9], [70, 92, 0.6], [118, 18, 0.7], [300, 24, 0.8], [410, 40, 0.6], [455, 110, 0.9],
  [438, 300, 0.7], [380, 338, 0.6], [60, 320, 0.8], [18, 210, 0.6], [160, 340, 0.5], [470, 220, 0.5],
  [340, 78, 0.5], [205, 12, 0.6], [96, 254, 0.5],
];

export function TourSketch({ className }: { className?: string }) {
  const launch = at(100, 104);
  const venus = at(70, 200);
  const earth2 = at(100, 20);
  const jupiter = at(222, 250);
  const f = (p: [number, number]) => `${p[0].toFixed(1)} ${p[1].toFixed(1)}`;
  return (
    <svg viewBox="0 0 480 360" className={className} fill="none" aria-hidden>
      <defs>
        <radialGradient id="gy-sun-glow">
          <stop offset="0" stopColor="var(--gy-sun)" stopOpacity="0.55" />
          <stop offset="1" stopColor="var(--gy-sun)" stopOpacity="0" />
        </radialGradient>
        <radialGradient id="gy-craft-glow">
          <stop offset="0" stopColor="var(--gy-accent)" stopOpacity="0.6" />
          <stop offset="1" stopColor="var(--gy-accent)" stopOpacity="0" />
        </radialGradient>
      </defs>

      {stars.map(([x, y, r], i) => (
        <circle key={i} cx={x} cy={y} r={r} className="fill-muted" opacity={0.55} />
      ))}

      {orbits.map((o) => (
        <ellipse
          key={o.rx}
          cx={CX}
          cy={CY}
          rx={o.rx}
          ry={o.rx * TILT}
          className={o.cls}
          strokeOpacity={0.45}
          strokeWidth={1}
        />
      ))}

      <circle cx={CX} cy={CY} r={26} fill="url(#gy-sun-glow)" />
      <circle cx={CX} cy={CY} r={7} className="fill-sun" />

      {/* the tour: launch → Venus → Earth → Jupiter */}
      <g className="stroke-accent" strokeWidth={2} strokeLinecap="round">
        <path d={`M${f(launch)} C 170 250, 150 200, ${f(venus)}`} />
        <path d={`M${f(venus)} C 185 118, 318 112, ${f(earth2)}`} />
        <path d={`M${f(earth2)} C 420 170, 330 40, ${f(jupiter)}`} strokeDasharray="0" />
      </g>

      {/* planets at the encounter epochs */}
      {orbits.map((o) => {
        const [x, y] = at(o.rx, o.t);
        return <circle key={o.rx} cx={x} cy={y} r={o.rx > 200 ? 7 : 4.5} className={o.planet} />;
      })}
      <circle cx={launch[0]} cy={launch[1]} r={4.5} className="fill-earth" opacity={0.6} />

      {/* flyby markers */}
      {[venus, earth2].map((p, i) => (
        <circle key={i} cx={p[0]} cy={p[1]} r={9} className="stroke-accent" strokeWidth={1.2} strokeDasharray="2 2.4" />
      ))}
      <circle cx={launch[0]} cy={launch[1]} r={9} className="stroke-line-strong" strokeWidth={1.2} />

      {/* spacecraft arriving at Jupiter */}
      <circle cx={jupiter[0] + 14} cy={jupiter[1] + 4} r={12} fill="url(#gy-craft-glow)" />
      <circle cx={jupiter[0] + 14} cy={jupiter[1] + 4} r={3.2} className="fill-accent" />

      <g className="fill-muted" fontSize="10" fontFamily="var(--font-mono)">
        <text x={launch[0] + 12} y={launch[1] + 14}>launch</text>
        <text x={venus[0] - 50} y={venus[1] + 3}>Venus</text>
        <text x={earth2[0] + 13} y={earth2[1] + 4}>Earth</text>
        <text x={jupiter[0] - 60} y={jupiter[1] - 10}>Jupiter</text>
      </g>
    </svg>
  );
}
