import { BODIES, PLANET_IDS } from "@/lib/astro/constants";
import { Card, CardHeader } from "@/components/ui/card";
import { Num } from "@/components/ui/num";
import { bodyLabel } from "@/lib/format";

/**
 * Where each planet's numbers come from (mirrors the comments in lib/astro/constants.ts, the one
 * place the values live). "From memory" marks values not re-checked against the publication.
 */
const SOURCES: Record<string, { gm: string; radius: string; alt: string }> = {
  mercury: { gm: "JPL planetary constants (from memory)", radius: "JPL SSD / IAU WGCCRE (from memory)", alt: "common practice" },
  venus: { gm: "JPL planetary constants", radius: "JPL SSD / IAU WGCCRE", alt: "common practice (atmosphere)" },
  earth: { gm: "JPL planetary constants", radius: "JPL SSD / IAU WGCCRE", alt: "common practice (atmosphere)" },
  mars: { gm: "JPL planetary constants", radius: "JPL SSD / IAU WGCCRE", alt: "common practice (atmosphere)" },
  jupiter: { gm: "JPL planetary constants, planet only", radius: "JPL SSD / IAU WGCCRE", alt: "common practice (radiation belts: rp 600,000 km)" },
  saturn: { gm: "JPL planetary constants, planet only", radius: "JPL SSD / IAU WGCCRE", alt: "common practice (rings: rp 80,000 km)" },
  uranus: { gm: "JPL planetary constants, planet only (from memory)", radius: "JPL SSD (from memory)", alt: "common practice" },
  neptune: { gm: "JPL planetary constants, planet only (from memory)", radius: "JPL SSD (from memory)", alt: "common practice" },
  pluto: { gm: "JPL planetary constants, planet only (from memory)", radius: "JPL SSD (from memory)", alt: "common practice" },
};

/** The planets, read-only: GM, equatorial radius, default minimum flyby altitude, and sources. */
export function PlanetsTable() {
  return (
    <Card aria-labelledby="planets-title">
      <CardHeader
        title={<span id="planets-title">Planets</span>}
        description="Read-only. A tour can raise or lower a flyby's minimum periapsis radius in the Workbench; these are the defaults."
      />
      <div className="overflow-x-auto">
        <table className="w-full min-w-[760px] text-sm">
          <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th className="px-4 py-2 font-medium">Planet</th>
              <th className="px-4 py-2 text-right font-medium">GM</th>
              <th className="px-4 py-2 text-right font-medium">Equatorial radius</th>
              <th className="px-4 py-2 text-right font-medium">Min flyby altitude</th>
              <th className="px-4 py-2 font-medium">Sources (GM · radius · altitude)</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {PLANET_IDS.map((id) => {
              const b = BODIES[id];
              const s = SOURCES[id]!;
              return (
                <tr key={id}>
                  <th scope="row" className="px-4 py-2 text-left font-medium text-ink">
                    {bodyLabel(id)}
                    <span className="ml-2 font-mono text-xs font-normal text-faint">{id}</span>
                  </th>
                  <td className="px-4 py-2 text-right"><Num value={b.mu} unit="km³/s²" digits={b.mu < 1000 ? 1 : 0} /></td>
                  <td className="px-4 py-2 text-right"><Num value={b.radius} unit="km" digits={1} /></td>
                  <td className="px-4 py-2 text-right"><Num value={b.minFlybyAltitude} unit="km" digits={0} /></td>
                  <td className="px-4 py-2 text-xs text-muted">{s.gm} · {s.radius} · {s.alt}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </Card>
  );
}
