/**
 * Tour files: the export (a stored tour with its name, importable back) and what an import
 * accepts — `{ name?, tour }`, the exported file itself (which has that shape), or a bare stored
 * tour. Validation is the one stored-tour schema (`storedTourSchema`), like every other input.
 */
import * as v from "valibot";
import { storedTourSchema, tourNameSchema, type StoredTour } from "@/lib/validation/tour";

export const TOUR_FILE_KIND = "gybe-tour";
/** Upload limit for a tour file, bytes. */
export const TOUR_FILE_MAX_BYTES = 512 * 1024;

export interface TourFile {
  kind: typeof TOUR_FILE_KIND;
  formatVersion: 1;
  name: string;
  exportedAt: string;
  caution: string;
  tour: StoredTour;
}

export function tourFileOf(name: string, tour: StoredTour, now: Date): TourFile {
  return {
    kind: TOUR_FILE_KIND,
    formatVersion: 1,
    name,
    exportedAt: now.toISOString(),
    caution: "Preliminary patched-conic design, not for operations: verify with high-fidelity navigation software and the project's flight-dynamics authority.",
    tour,
  };
}

/** `{ name?, tour }` — the export file matches this (its other keys are ignored). */
export const tourImportWrappedSchema = v.object({
  name: v.optional(tourNameSchema),
  tour: storedTourSchema,
});

/** Which schema an uploaded value should be read with: wrapped when it has a `tour` key, else a bare stored tour. */
export function tourImportSchemaFor(body: unknown): typeof tourImportWrappedSchema | typeof storedTourSchema {
  return body !== null && typeof body === "object" && !Array.isArray(body) && "tour" in body ? tourImportWrappedSchema : storedTourSchema;
}

/** A safe file name stem from a tour name: "Wren — Mars rendezvous" → "wren-mars-rendezvous". */
export function fileStem(name: string, id: number): string {
  const s = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/g, "");
  return `${s || "tour"}-${id}`;
}
