import { describe, expect, it } from "vitest";
import * as v from "valibot";
import { storedTourSchema, type StoredTour } from "@/lib/validation/tour";
import {
  DAY,
  addNode,
  freshNodeId,
  moveNode,
  parseNumberInput,
  removeNode,
  setArrival,
  setLeg,
  setNodeBody,
  setNodeEpoch,
  setRpMin,
  tdbToUtcInput,
  utcInputToTdb,
} from "@/lib/client/workbench-edits";
import { isoToTdbSeconds } from "@/lib/astro/time";

const t0 = isoToTdbSeconds("2031-03-20T00:00:00Z");

function tour(): StoredTour {
  return {
    formatVersion: 1,
    ephemeris: { kind: "vsop", cached: true },
    nodes: [
      { id: "launch", body: "earth", epoch: t0, window: { start: t0 - 30 * DAY, end: t0 + 30 * DAY } },
      { id: "venus", body: "venus", epoch: t0 + 112 * DAY },
      { id: "earth1", body: "earth", epoch: t0 + 469 * DAY },
      { id: "jupiter", body: "jupiter", epoch: t0 + 2128 * DAY },
    ],
    legs: [
      { revs: 0, prograde: true },
      { revs: 1, branch: "right", prograde: true },
      { revs: 0, prograde: false },
    ],
    arrival: { kind: "flyby" },
    rpMin: {},
    aim: { venus: { bT: 1, bR: 2, sigmaT: 3, sigmaR: 4, rho: 0, pole: "ecliptic" } },
  };
}

const ids = (t: StoredTour) => t.nodes.map((n) => n.id);
const valid = (t: StoredTour) => v.safeParse(storedTourSchema, t).success;

describe("node edits keep ids stable and the tour valid", () => {
  it("adds a node in the middle with a fresh id, midway epoch, and a default leg after it", () => {
    const before = tour();
    const after = addNode(before, 2, "mars", "mars-x1");
    expect(ids(after)).toEqual(["launch", "venus", "mars-x1", "earth1", "jupiter"]);
    expect(after.nodes[2]!.epoch).toBeCloseTo((before.nodes[1]!.epoch + before.nodes[2]!.epoch) / 2, 6);
    // leg 1 (venus → new) keeps the split leg's options; leg 2 (new → earth1) is a default leg
    expect(after.legs).toEqual([
      { revs: 0, prograde: true },
      { revs: 1, branch: "right", prograde: true },
      { revs: 0, prograde: true },
      { revs: 0, prograde: false },
    ]);
    expect(valid(after)).toBe(true);
    expect(ids(before)).toEqual(["launch", "venus", "earth1", "jupiter"]); // input untouched
  });

  it("appends and prepends 180 days out, one leg per pair of nodes", () => {
    const end = addNode(tour(), 4, "saturn", "sat");
    expect(end.nodes[4]!.epoch - end.nodes[3]!.epoch).toBe(180 * DAY);
    expect(end.legs).toHaveLength(4);
    expect(end.legs[3]).toEqual({ revs: 0, prograde: true });
    const start = addNode(tour(), 0, "mars", "m0");
    expect(start.nodes[1]!.epoch - start.nodes[0]!.epoch).toBe(180 * DAY);
    expect(start.legs[0]).toEqual({ revs: 0, prograde: true });
    expect(start.legs[1]).toEqual({ revs: 0, prograde: true });
    expect(start.legs[2]).toEqual({ revs: 1, branch: "right", prograde: true });
    expect(valid(end) && valid(start)).toBe(true);
  });

  it("refuses a duplicate id and the 13th node", () => {
    const t = tour();
    expect(addNode(t, 1, "mars", "venus")).toBe(t);
    let big = t;
    for (let k = 0; big.nodes.length < 12; k++) big = addNode(big, big.nodes.length, "mars", `m${k}`);
    expect(big.nodes).toHaveLength(12);
    expect(addNode(big, 1, "mars", "one-more")).toBe(big);
  });

  it("fresh ids are unique and schema-valid even when the random source repeats", () => {
    const t = tour();
    const a = freshNodeId(t, "custom:aldra", () => 0.5);
    expect(a).toMatch(/^aldra-[0-9a-z]{4}$/);
    const t2 = addNode(t, 1, "custom:aldra", a);
    const b = freshNodeId(t2, "custom:aldra", () => 0.5);
    expect(b).not.toBe(a);
    expect(valid(addNode(t2, 1, "custom:aldra", b))).toBe(true);
  });

  it("removes a middle node: the merged leg keeps the earlier options and its aim goes", () => {
    const after = removeNode(tour(), "venus");
    expect(ids(after)).toEqual(["launch", "earth1", "jupiter"]);
    expect(after.legs).toEqual([
      { revs: 0, prograde: true },
      { revs: 0, prograde: false },
    ]);
    expect(after.aim).toEqual({});
    expect(valid(after)).toBe(true);
  });

  it("removes the first and last nodes and never goes below two", () => {
    expect(removeNode(tour(), "launch").legs).toEqual([
      { revs: 1, branch: "right", prograde: true },
      { revs: 0, prograde: false },
    ]);
    expect(removeNode(tour(), "jupiter").legs).toEqual([
      { revs: 0, prograde: true },
      { revs: 1, branch: "right", prograde: true },
    ]);
    const two = removeNode(removeNode(tour(), "venus"), "earth1");
    expect(ids(two)).toEqual(["launch", "jupiter"]);
    expect(removeNode(two, "launch")).toBe(two);
  });

  it("moves a node: ids, bodies and aim travel, epochs stay in time order", () => {
    const before = tour();
    const after = moveNode(before, "earth1", -1);
    expect(ids(after)).toEqual(["launch", "earth1", "venus", "jupiter"]);
    expect(after.nodes.map((n) => n.body)).toEqual(["earth", "earth", "venus", "jupiter"]);
    expect(after.nodes.map((n) => n.epoch)).toEqual(before.nodes.map((n) => n.epoch));
    expect(after.aim.venus).toBeDefined();
    expect(moveNode(before, "launch", -1)).toBe(before);
    expect(moveNode(before, "jupiter", 1)).toBe(before);
    expect(valid(after)).toBe(true);
  });
});

describe("field edits", () => {
  it("sets body and epoch; the window follows an epoch moved outside it", () => {
    const t = setNodeBody(tour(), "venus", "mars");
    expect(t.nodes[1]!.body).toBe("mars");
    const moved = setNodeEpoch(tour(), "launch", t0 + 45 * DAY);
    expect(moved.nodes[0]!.window).toEqual({ start: t0 + 15 * DAY, end: t0 + 75 * DAY });
    const inside = setNodeEpoch(tour(), "launch", t0 + 10 * DAY);
    expect(inside.nodes[0]!.window).toEqual({ start: t0 - 30 * DAY, end: t0 + 30 * DAY });
    const same = tour();
    expect(setNodeEpoch(same, "launch", Number.NaN)).toBe(same);
  });

  it("leg options: a branch only with revolutions; default legs are materialised", () => {
    const t = setLeg(tour(), 1, { revs: 0 });
    expect(t.legs[1]).toEqual({ revs: 0, prograde: true });
    const r = setLeg({ ...tour(), legs: [] }, 2, { revs: 2 });
    expect(r.legs).toHaveLength(3);
    expect(r.legs[2]).toEqual({ revs: 2, branch: "left", prograde: true });
    expect(valid(r)).toBe(true);
  });

  it("rpMin override set and cleared; arrival kind", () => {
    const t = setRpMin(tour(), "venus", 6400);
    expect(t.rpMin).toEqual({ venus: 6400 });
    expect(setRpMin(t, "venus", null).rpMin).toEqual({});
    expect(setRpMin(t, "venus", -5).rpMin).toEqual({});
    const c = setArrival(tour(), { kind: "capture", rp: 700000, e: 0.9 });
    expect(valid(c)).toBe(true);
  });
});

describe("UTC field conversions", () => {
  // Source: IERS Bulletin C (TAI−UTC = 37 s since 2017-01-01) and TT = TAI + 32.184 s, so
  // 2031-03-20T00:00Z is 69.184 s after the UTC label in TDB seconds past J2000.
  it("round-trips a datetime-local value read as UTC", () => {
    const t = utcInputToTdb("2031-03-20T06:30");
    expect(t).not.toBeNull();
    expect(tdbToUtcInput(t!)).toBe("2031-03-20T06:30");
    expect(utcInputToTdb("2031-03-20")).toBeCloseTo(isoToTdbSeconds("2031-03-20T00:00:00Z"), 6);
    const label = (Date.UTC(2031, 2, 20) - Date.UTC(2000, 0, 1, 12)) / 1000;
    expect(utcInputToTdb("2031-03-20T00:00")! - label).toBeCloseTo(69.184, 6);
  });

  it("rejects bad input without throwing", () => {
    for (const bad of ["", "2031-13-01T00:00", "2031-02-30", "tomorrow", "2031-3-1"]) {
      expect(utcInputToTdb(bad)).toBeNull();
    }
    expect(tdbToUtcInput(Number.NaN)).toBe("");
    expect(parseNumberInput(" 12.5 ")).toBe(12.5);
    expect(parseNumberInput("\u22123")).toBe(-3);
    expect(parseNumberInput("abc")).toBeNull();
    expect(parseNumberInput("")).toBeNull();
  });
});
