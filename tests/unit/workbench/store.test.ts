import { describe, expect, it } from "vitest";
import type { StoredTour } from "@/lib/validation/tour";
import {
  COALESCE_MS,
  HISTORY_LIMIT,
  applyEdit,
  initialEditorState,
  markSaved,
  redo,
  selectNode,
  undo,
} from "@/lib/client/workbench-store";
import { addNode, moveNode, removeNode, setNodeEpoch } from "@/lib/client/workbench-edits";

const DAY = 86400;

function tour(): StoredTour {
  return {
    formatVersion: 1,
    ephemeris: { kind: "vsop", cached: true },
    nodes: [
      { id: "a", body: "earth", epoch: 0 },
      { id: "b", body: "venus", epoch: 120 * DAY },
      { id: "c", body: "jupiter", epoch: 900 * DAY },
    ],
    legs: [],
    arrival: { kind: "flyby" },
    rpMin: {},
    aim: {},
  };
}

const ids = (s: { draft: StoredTour }) => s.draft.nodes.map((n) => n.id);

describe("workbench editor reducers", () => {
  it("an edit marks dirty; undo restores and clears dirty; redo re-applies", () => {
    let s = initialEditorState(tour(), 3);
    expect(s.dirty).toBe(false);
    s = applyEdit(s, (t) => setNodeEpoch(t, "b", 130 * DAY));
    expect(s.dirty).toBe(true);
    expect(s.draft.nodes[1]!.epoch).toBe(130 * DAY);
    s = undo(s);
    expect(s.draft.nodes[1]!.epoch).toBe(120 * DAY);
    expect(s.dirty).toBe(false);
    expect(s.future).toHaveLength(1);
    s = redo(s);
    expect(s.draft.nodes[1]!.epoch).toBe(130 * DAY);
    expect(s.dirty).toBe(true);
    expect(s.baseVersion).toBe(3);
  });

  it("a new edit after undo drops the redo stack; no-op edits add no step", () => {
    let s = initialEditorState(tour(), 1);
    s = applyEdit(s, (t) => setNodeEpoch(t, "b", 130 * DAY));
    s = undo(s);
    s = applyEdit(s, (t) => setNodeEpoch(t, "b", 140 * DAY));
    expect(s.future).toHaveLength(0);
    const same = applyEdit(s, (t) => t);
    expect(same).toBe(s);
    expect(redo(initialEditorState(tour(), 1)).draft).toEqual(tour());
    expect(undo(initialEditorState(tour(), 1)).past).toHaveLength(0);
  });

  it("edits of one field in quick succession coalesce into one undo step", () => {
    let s = initialEditorState(tour(), 1);
    s = applyEdit(s, (t) => setNodeEpoch(t, "b", 121 * DAY), "epoch:b", 1000);
    s = applyEdit(s, (t) => setNodeEpoch(t, "b", 122 * DAY), "epoch:b", 1000 + COALESCE_MS / 2);
    s = applyEdit(s, (t) => setNodeEpoch(t, "b", 123 * DAY), "epoch:b", 1000 + COALESCE_MS);
    expect(s.past).toHaveLength(1);
    expect(undo(s).draft.nodes[1]!.epoch).toBe(120 * DAY);
    // a different key, or a pause, starts a new step
    s = applyEdit(s, (t) => setNodeEpoch(t, "c", 901 * DAY), "epoch:c", 1000 + COALESCE_MS);
    s = applyEdit(s, (t) => setNodeEpoch(t, "c", 902 * DAY), "epoch:c", 1000 + 3 * COALESCE_MS);
    expect(s.past).toHaveLength(3);
  });

  it("add, remove and reorder are undoable and keep node ids", () => {
    let s = initialEditorState(tour(), 1);
    s = applyEdit(s, (t) => addNode(t, 2, "earth", "e-new"));
    s = applyEdit(s, (t) => moveNode(t, "e-new", -1));
    expect(ids(s)).toEqual(["a", "e-new", "b", "c"]);
    s = applyEdit(s, (t) => removeNode(t, "b"));
    expect(ids(s)).toEqual(["a", "e-new", "c"]);
    s = undo(s);
    expect(ids(s)).toEqual(["a", "e-new", "b", "c"]);
    s = undo(s);
    expect(ids(s)).toEqual(["a", "b", "e-new", "c"]);
    s = undo(s);
    expect(ids(s)).toEqual(["a", "b", "c"]);
    s = redo(redo(redo(s)));
    expect(ids(s)).toEqual(["a", "e-new", "c"]);
  });

  it("selection follows the node and is cleared when the node goes away", () => {
    let s = selectNode(initialEditorState(tour(), 1), "b");
    expect(s.selectedNodeId).toBe("b");
    expect(selectNode(s, "nope").selectedNodeId).toBeNull();
    s = applyEdit(s, (t) => moveNode(t, "b", 1));
    expect(s.selectedNodeId).toBe("b");
    s = applyEdit(s, (t) => removeNode(t, "b"));
    expect(s.selectedNodeId).toBeNull();
  });

  it("history is capped; markSaved keeps history but clears dirty", () => {
    let s = initialEditorState(tour(), 1);
    for (let k = 1; k <= HISTORY_LIMIT + 20; k++) s = applyEdit(s, (t) => setNodeEpoch(t, "b", (120 + k) * DAY));
    expect(s.past).toHaveLength(HISTORY_LIMIT);
    s = markSaved(s, s.draft, 2);
    expect(s.dirty).toBe(false);
    expect(s.baseVersion).toBe(2);
    expect(s.past).toHaveLength(HISTORY_LIMIT);
    expect(undo(s).dirty).toBe(true);
  });
});
