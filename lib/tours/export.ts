/**
 * Files out of a tour (tour JSON, node table CSV, CCSDS OEM), built from the server's own
 * evaluation (TourDetail). Pure of the database and of Next: the export route wraps these.
 */
import type { TourDetail } from "@/lib/db/queries/tours";
import type { BodyId } from "@/lib/astro/types";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { physicalOf, toTourSpec } from "@/lib/tours/evaluate";
import { writeNodeCsv } from "@/lib/files/node-csv";
import { oemLineCount, sampleTourForOem, writeOem, OEM_MAX_LINES } from "@/lib/files/oem";
import { fileStem, tourFileOf } from "@/lib/files/tour-json";
import { bodyLabel } from "@/lib/format";

export type ExportFormat = "json" | "csv" | "oem";

export interface ExportFile {
  filename: string;
  contentType: string;
  body: string;
}

export class ExportError extends Error {
  constructor(
    readonly kind: "too_many_lines" | "no_trajectory",
    message: string,
  ) {
    super(message);
  }
}

function bodyName(d: TourDetail, id: string): string {
  return d.bodyOptions.find((b) => b.id === id)?.name ?? bodyLabel(id);
}

export function exportTour(d: TourDetail, format: ExportFormat, opts: { stepDays?: number; now?: Date } = {}): ExportFile {
  const now = opts.now ?? new Date();
  const stem = fileStem(d.name, d.id);
  if (format === "json") {
    return { filename: `${stem}.tour.json`, contentType: "application/json; charset=utf-8", body: JSON.stringify(tourFileOf(d.name, d.tour, now), null, 2) + "\n" };
  }
  const spec = toTourSpec(d.tour, d.customBodies.map((b) => ({ id: b.id, mu: b.mu, radius: b.radius ?? 0, minFlybyAltitude: b.minFlybyAltitude ?? 0 })));
  if (format === "csv") {
    if (!d.result) throw new ExportError("no_trajectory", "This tour could not be evaluated, so it has no node table to export.");
    const body = writeNodeCsv({
      nodes: d.tour.nodes,
      result: d.result,
      rpMin: (b) => {
        const over = spec.rpMin?.[b as BodyId];
        if (over !== undefined) return over;
        const p = physicalOf(b as BodyId, spec);
        return p ? p.radius + p.minFlybyAltitude : undefined;
      },
    });
    return { filename: `${stem}.nodes.csv`, contentType: "text/csv; charset=utf-8", body };
  }
  const stepDays = opts.stepDays ?? 1;
  const stepS = stepDays * 86400;
  const lines = oemLineCount(spec, stepS);
  if (lines > OEM_MAX_LINES) {
    const minStep = Math.ceil(((stepDays * lines) / OEM_MAX_LINES) * 100) / 100;
    throw new ExportError("too_many_lines", `A ${stepDays}-day step gives ${lines} states; the limit is ${OEM_MAX_LINES}. Choose a step of at least ${minStep} days.`);
  }
  if (!d.result) throw new ExportError("no_trajectory", "This tour could not be evaluated, so it has no trajectory to export.");
  const eph = ephemerisFromSpec({ kind: d.tour.ephemeris.kind, cached: false, customBodies: d.customBodies });
  const { segments, skipped } = sampleTourForOem(spec, d.result, eph, stepS, (id) => bodyName(d, id));
  if (segments.length === 0) throw new ExportError("no_trajectory", "No leg of this tour has a transfer solution, so there is no trajectory to export.");
  const comments = [
    `Gybe tour "${d.name}" (tour ${d.id}): ${d.chain.map((b) => bodyName(d, b)).join(" - ")}`,
    "Frame: heliocentric, mean ecliptic and equinox of J2000 (ECLIPJ2000); units km and km/s; epochs TDB.",
    `Patched-conic preliminary design, ${d.tour.ephemeris.kind === "vsop" ? "VSOP87 planetary theory" : "approximate mean elements"} ephemeris; not for operations.`,
    `Sampled every ${stepDays} day(s); each leg is its own segment and ends exactly at the next node.`,
  ];
  if (skipped.length) comments.push(`Left out (no transfer solution): leg(s) ${skipped.map((k) => k + 1).join(", ")}.`);
  const body = writeOem(
    { objectName: d.name, objectId: `GYBE-TOUR-${d.id}`, originator: "GYBE", creationDate: now, comments },
    segments,
  );
  return { filename: `${stem}.oem`, contentType: "text/plain; charset=utf-8", body };
}
