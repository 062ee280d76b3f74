/** Pure parts of team work: the revision diff and the @-mention rule. */
import { describe, expect, it } from "vitest";
import { diffTours } from "@/lib/tours/diff";
import { findMentions } from "@/lib/team/mentions";
import { actionsFrom, wrongStateMessage } from "@/lib/tours/review-flow";
import type { StoredTour } from "@/lib/validation/tour";

const D = 86400;
function tour(nodes: [string, string, number][], extra: Partial<StoredTour> = {}): StoredTour {
  return {
    formatVersion: 1,
    ephemeris: { kind: "vsop", cached: true },
    nodes: nodes.map(([id, body, day]) => ({ id, body: body as StoredTour["nodes"][number]["body"], epoch: day * D })),
    legs: nodes.slice(1).map(() => ({ revs: 0, prograde: true })),
    arrival: { kind: "flyby" },
    rpMin: {},
    aim: {},
    ...extra,
  };
}

describe("diffTours", () => {
  const a = tour([["l", "earth", 0], ["v", "venus", 150], ["e", "earth", 500], ["j", "jupiter", 2000]]);

  it("finds added, removed and moved nodes, and the legs that appear and disappear with them", () => {
    const b = tour([["l", "earth", 0], ["e", "earth", 500], ["v", "venus", 150], ["m", "mars", 900]]); // swap v/e, add m, drop j
    const d = diffTours(a, b);
    expect(d.nodes.added.map((n) => n.id)).toEqual(["m"]);
    expect(d.nodes.removed.map((n) => n.id)).toEqual(["j"]);
    expect(d.nodes.moved.map((n) => n.id).sort()).toEqual(["e", "v"]);
    const legKeys = d.legs.map((l) => `${l.change}:${l.key}`).sort();
    expect(legKeys).toEqual(["added:e→v", "added:l→e", "added:v→m", "removed:e→j", "removed:l→v", "removed:v→e"].sort());
    expect(d.identical).toBe(false);
  });

  it("reports epochs in days, body swaps, leg options, rpMin, arrival, ephemeris and aim", () => {
    const b = structuredClone(a);
    b.nodes[1]!.epoch += 12.5 * D;
    b.nodes[2]!.body = "mars";
    b.legs[2] = { revs: 1, branch: "right", prograde: true };
    b.rpMin = { venus: 6400 };
    b.arrival = { kind: "capture", rp: 700000, e: 0.9 };
    b.ephemeris = { kind: "mean" };
    b.aim = { v: { bT: 1, bR: 2, sigmaT: 3, sigmaR: 4, rho: 0, pole: "ecliptic" } };
    const d = diffTours(a, b);
    expect(d.nodes.epochs).toEqual([{ id: "v", body: "venus", from: 150 * D, to: 162.5 * D, deltaDays: 12.5 }]);
    expect(d.nodes.bodyChanged).toEqual([{ id: "e", from: "earth", to: "mars" }]);
    expect(d.legs).toEqual([{ key: "e→j", fromNode: "e", toNode: "j", change: "changed", from: { revs: 0, branch: null, prograde: true }, to: { revs: 1, branch: "right", prograde: true } }]);
    expect(d.rpMin).toEqual([{ body: "venus", from: null, to: 6400 }]);
    expect(d.arrival).toEqual({ from: "flyby", to: "capture (rp 700000 km, e 0.9)" });
    expect(d.ephemeris).toEqual({ from: "vsop", to: "mean" });
    expect(d.aim.map((x) => `${x.change}:${x.nodeId}`)).toEqual(["added:v"]);
  });

  it("compares the stored key numbers, with flight time in days, and ignores rounding noise", () => {
    const d = diffTours(a, a, { c3Km2S2: 10, tofS: 100 * D, violationCount: 0, totalDvKmS: 1 }, { c3Km2S2: 12.5, tofS: 110 * D, violationCount: 1, totalDvKmS: 1 + 1e-13 });
    const by = Object.fromEntries(d.metrics.map((m) => [m.key, m]));
    expect(by.c3!.delta).toBeCloseTo(2.5, 12);
    expect(by.tof!.from).toBeCloseTo(100, 12);
    expect(by.tof!.delta).toBeCloseTo(10, 12);
    expect(d.changedMetrics.sort()).toEqual(["c3", "tof", "violations"]);
    expect(d.identical).toBe(false);
    expect(diffTours(a, structuredClone(a)).identical).toBe(true);
  });
});

describe("findMentions", () => {
  const members = [
    { id: 1, name: "Priya Raman", email: "analyst@meridian.example" },
    { id: 2, name: "Tomas Lindqvist", email: "tomas.l@meridian.example" },
    { id: 3, name: "Tomas Berg", email: "tb@meridian.example" },
  ];

  it("matches full name, a unique first name and the e-mail local part, case-insensitively", () => {
    expect(findMentions("@priya please look", members)).toEqual([1]);
    expect(findMentions("cc @PRIYA RAMAN.", members)).toEqual([1]);
    expect(findMentions("@analyst ok?", members)).toEqual([1]);
    expect(findMentions("@tomas.l and @Tomas Berg", members)).toEqual([2, 3]);
  });

  it("does not match an ambiguous first name, a longer word, or an e-mail address", () => {
    expect(findMentions("@Tomas what do you think", members)).toEqual([]);
    expect(findMentions("@priyanka", members)).toEqual([]);
    expect(findMentions("mail priya@analyst.example", members)).toEqual([]);
  });

  it("lists each member once, in order of first mention", () => {
    expect(findMentions("@tb @priya @tb @Priya Raman", members)).toEqual([3, 1]);
  });
});

describe("review flow table", () => {
  it("offers the transitions of DESIGN.md and explains a wrong state", () => {
    expect(actionsFrom("draft")).toEqual(["submit"]);
    expect(actionsFrom("returned")).toEqual(["submit"]);
    expect(actionsFrom("in_review").sort()).toEqual(["baseline", "return"]);
    expect(actionsFrom("baselined")).toEqual(["reopen"]);
    expect(wrongStateMessage("baseline", "draft")).toMatch(/draft.*in review/);
    expect(wrongStateMessage("submit", "returned")).toBeNull();
  });
});
