/**
 * The demo tours (an invented scenario) must evaluate without violations and tell a plausible
 * story: epochs in order, launch C3 in the range launch vehicles commonly deliver (common
 * practice: up to ~30 km²/s² for such missions), flybys above their minimum altitudes.
 */
import { describe, expect, it } from "vitest";
import { demoTours, DEMO_BODIES } from "@/lib/db/seed";
import { evaluateStoredTour } from "@/lib/tours/evaluate";
import { isoToTdbSeconds } from "@/lib/astro/time";
import { AU_KM } from "@/lib/astro/constants";

const deg = Math.PI / 180;
const bodies = DEMO_BODIES.map((b) => ({
  id: `custom:${b.slug}` as const,
  name: b.name,
  elements: { a: b.aAu * AU_KM, e: b.e, i: b.iDeg * deg, raan: b.raanDeg * deg, argp: b.argpDeg * deg, nu: b.nuDeg * deg },
  epoch: isoToTdbSeconds(b.epochIso),
  mu: b.mu,
  radius: b.radius,
  minFlybyAltitude: b.minAlt,
}));

describe("demo tours", () => {
  for (const t of demoTours()) {
    it(`${t.name} evaluates cleanly under its own ephemeris`, () => {
      const { result, summary } = evaluateStoredTour(t.tour, bodies);
      expect(result.violations).toEqual([]);
      expect(summary.c3Km2S2).toBeGreaterThan(0);
      expect(summary.c3Km2S2).toBeLessThan(30);
      expect(summary.totalDvKmS).toBeLessThan(4);
      for (const f of result.flybys) {
        expect(f.feasible).toBe(true);
        expect(f.altitude).toBeGreaterThan(0);
      }
      const epochs = t.tour.nodes.map((n) => n.epoch);
      expect([...epochs].sort((a, b) => a - b)).toEqual(epochs);
    });
  }
});
