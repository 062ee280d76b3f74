import { describe, expect, it } from "vitest";
import type { StoredTour } from "@/lib/validation/tour";
import type { TourFlybyResult } from "@/lib/astro/types";
import { flybyFlag, marginThresholdKm, progressAt, progressText, tourChanges } from "@/lib/client/workbench-derive";

const DAY = 86400;
const nodes = [
  { body: "earth", epoch: 0 },
  { body: "venus", epoch: 100 * DAY },
  { body: "jupiter", epoch: 1000 * DAY },
];

function flyby(rp: number, feasible = true): TourFlybyResult {
  return { body: "venus", epoch: 0, vinfIn: 5, vinfOut: 5, turnAngle: 0.5, rp, altitude: rp - 6051.8, dv: 0, bT: 1, bR: 1, feasible };
}

describe("replay progress", () => {
  it("names the leg in progress and the days to the next body", () => {
    const p = progressAt(nodes, 40 * DAY);
    expect(p).toMatchObject({ phase: "leg", leg: 0, legCount: 2, nextBody: "venus" });
    expect(p.daysToNext).toBeCloseTo(60, 9);
    expect(progressText(p)).toBe("Leg 1 of 2 · 60 d to Venus");
    expect(progressAt(nodes, 100 * DAY)).toMatchObject({ phase: "leg", leg: 1, nextBody: "jupiter" });
    expect(progressAt(nodes, -5 * DAY).phase).toBe("before");
    expect(progressText(progressAt(nodes, 1000 * DAY))).toBe("Arrived · 1000 d after launch");
    expect(progressAt([], 0).legCount).toBe(0);
    expect(progressAt(nodes, Number.NaN).phase).toBe("before");
  });
});

describe("flyby flags", () => {
  it("ok / margin / violated around the minimum radius", () => {
    const rpMin = 6351.8;
    expect(marginThresholdKm(rpMin)).toBeCloseTo(317.59, 6);
    expect(flybyFlag(flyby(rpMin + 1000), rpMin).level).toBe("ok");
    expect(flybyFlag(flyby(rpMin + 100), rpMin).level).toBe("margin");
    // Optimal tours sit on the bound: a flyby exactly at rpMin is not a violation.
    expect(flybyFlag(flyby(rpMin), rpMin).level).toBe("margin");
    expect(flybyFlag(flyby(rpMin - 500, false), rpMin)).toMatchObject({ level: "violated", text: "500 km below minimum" });
    expect(flybyFlag(flyby(Number.NaN, false), rpMin).level).toBe("violated");
  });
});

describe("what changed between two versions", () => {
  const base: StoredTour = {
    formatVersion: 1,
    ephemeris: { kind: "vsop", cached: true },
    nodes: [
      { id: "a", body: "earth", epoch: 0 },
      { id: "b", body: "venus", epoch: 100 * DAY },
      { id: "c", body: "jupiter", epoch: 1000 * DAY },
    ],
    legs: [],
    arrival: { kind: "flyby" },
    rpMin: {},
    aim: {},
  };

  it("lists nothing for identical tours", () => {
    expect(tourChanges(base, structuredClone(base))).toEqual([]);
  });

  it("lists epochs (with the shift), bodies, added nodes, arrival and rpMin", () => {
    const theirs = structuredClone(base);
    theirs.nodes[1]!.epoch += 10 * DAY;
    theirs.nodes[2]!.body = "saturn";
    theirs.nodes.splice(2, 0, { id: "x", body: "earth", epoch: 400 * DAY });
    theirs.arrival = { kind: "capture", rp: 100000, e: 0.9 };
    theirs.rpMin = { venus: 6500 };
    const lines = tourChanges(base, theirs);
    const what = lines.map((l) => l.what);
    expect(what).toContain("Node #2 Venus epoch");
    expect(lines.find((l) => l.what === "Node #2 Venus epoch")!.theirs).toMatch(/\(\+10\.0 d\)$/);
    expect(what).toContain("Node #3 Earth"); // theirs added it
    expect(what).toContain("Node #3 Jupiter body");
    expect(what).toContain("Node #3 Jupiter position");
    expect(lines.find((l) => l.what === "Arrival")).toEqual({ what: "Arrival", mine: "flyby", theirs: "capture rp 100,000 km, e 0.9" });
    expect(lines.find((l) => l.what === "Minimum rp at Venus")).toEqual({ what: "Minimum rp at Venus", mine: "default", theirs: "6,500 km" });
  });
});
