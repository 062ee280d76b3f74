"use client";
/**
 * The Workbench's editing state: the draft StoredTour, undo/redo stacks, the selected node and
 * whether the draft differs from the last saved version. Small data only: the evaluation result
 * and the sampled trajectory (Float64Arrays) live in the worker hook, never here.
 *
 * The reducers are pure functions (`applyEdit`, `undo`, `redo`, `resetTo`) so they are tested
 * without React; `createWorkbenchStore` wraps them in a zustand store per Workbench.
 */
import { createContext, useContext } from "react";
import { createStore, useStore, type StoreApi } from "zustand";
import type { StoredTour } from "@/lib/validation/tour";

/** Undo depth; older steps are dropped. */
export const HISTORY_LIMIT = 100;
/** Edits with the same coalesce key within this many ms merge into one undo step (typing). */
export const COALESCE_MS = 800;

export interface EditorState {
  draft: StoredTour;
  past: StoredTour[];
  future: StoredTour[];
  /** JSON of the tour as last loaded or saved; `dirty` compares against it. */
  savedJson: string;
  /** The version the draft was based on (sent with PATCH). */
  baseVersion: number;
  dirty: boolean;
  selectedNodeId: string | null;
  /** Coalescing of rapid edits to one field. */
  lastKey: string | null;
  lastAt: number;
}

export function initialEditorState(tour: StoredTour, version: number, selectedNodeId: string | null = null): EditorState {
  return {
    draft: tour,
    past: [],
    future: [],
    savedJson: JSON.stringify(tour),
    baseVersion: version,
    dirty: false,
    selectedNodeId: selectedNodeId && tour.nodes.some((n) => n.id === selectedNodeId) ? selectedNodeId : null,
    lastKey: null,
    lastAt: 0,
  };
}

function keepSelection(tour: StoredTour, id: string | null): string | null {
  return id && tour.nodes.some((n) => n.id === id) ? id : null;
}

/**
 * Apply an edit. A no-op edit (same object back) changes nothing. With a `key`, a second edit of
 * the same key within COALESCE_MS replaces the previous step instead of adding one.
 */
export function applyEdit(
  s: EditorState,
  edit: (t: StoredTour) => StoredTour,
  key: string | null = null,
  now: number = Date.now(),
): EditorState {
  const next = edit(s.draft);
  if (next === s.draft) return s;
  const coalesce = key !== null && key === s.lastKey && now - s.lastAt < COALESCE_MS && s.past.length > 0;
  const past = coalesce ? s.past : [...s.past, s.draft].slice(-HISTORY_LIMIT);
  return {
    ...s,
    draft: next,
    past,
    future: [],
    dirty: JSON.stringify(next) !== s.savedJson,
    selectedNodeId: keepSelection(next, s.selectedNodeId),
    lastKey: key,
    lastAt: now,
  };
}

export function undo(s: EditorState): EditorState {
  const prev = s.past[s.past.length - 1];
  if (!prev) return s;
  return {
    ...s,
    draft: prev,
    past: s.past.slice(0, -1),
    future: [s.draft, ...s.future].slice(0, HISTORY_LIMIT),
    dirty: JSON.stringify(prev) !== s.savedJson,
    selectedNodeId: keepSelection(prev, s.selectedNodeId),
    lastKey: null,
  };
}

export function redo(s: EditorState): EditorState {
  const [next, ...rest] = s.future;
  if (!next) return s;
  return {
    ...s,
    draft: next,
    past: [...s.past, s.draft].slice(-HISTORY_LIMIT),
    future: rest,
    dirty: JSON.stringify(next) !== s.savedJson,
    selectedNodeId: keepSelection(next, s.selectedNodeId),
    lastKey: null,
  };
}

/** After a load or a save: the draft becomes `tour`, history is cleared. */
export function resetTo(s: EditorState, tour: StoredTour, version: number): EditorState {
  return initialEditorState(tour, version, s.selectedNodeId);
}

/** After a successful save of exactly the current draft: keep history, mark clean. */
export function markSaved(s: EditorState, saved: StoredTour, version: number): EditorState {
  const savedJson = JSON.stringify(saved);
  return { ...s, savedJson, baseVersion: version, dirty: JSON.stringify(s.draft) !== savedJson, lastKey: null };
}

export function selectNode(s: EditorState, nodeId: string | null): EditorState {
  const id = keepSelection(s.draft, nodeId);
  return id === s.selectedNodeId ? s : { ...s, selectedNodeId: id };
}

export interface WorkbenchStore extends EditorState {
  load(tour: StoredTour, version: number): void;
  edit(edit: (t: StoredTour) => StoredTour, key?: string): void;
  undo(): void;
  redo(): void;
  markSaved(saved: StoredTour, version: number): void;
  select(nodeId: string | null): void;
}

export type WorkbenchStoreApi = StoreApi<WorkbenchStore>;

/**
 * One store per mounted Workbench (created with the tour the server loaded), so nothing is
 * shared between requests during server rendering or between two open tours.
 */
export function createWorkbenchStore(tour: StoredTour, version: number, selectedNodeId: string | null = null): WorkbenchStoreApi {
  return createStore<WorkbenchStore>((set) => ({
    ...initialEditorState(tour, version, selectedNodeId),
    load: (t, v) => set((s) => resetTo(s, t, v)),
    edit: (fn, key) => set((s) => applyEdit(s, fn, key ?? null)),
    undo: () => set((s) => undo(s)),
    redo: () => set((s) => redo(s)),
    markSaved: (saved, v) => set((s) => markSaved(s, saved, v)),
    select: (nodeId) => set((s) => selectNode(s, nodeId)),
  }));
}

export const WorkbenchStoreContext = createContext<WorkbenchStoreApi | null>(null);

/** Read the Workbench store of the nearest <WorkbenchStoreContext.Provider> with a selector. */
export function useWorkbench<T>(selector: (s: WorkbenchStore) => T): T {
  const store = useContext(WorkbenchStoreContext);
  if (!store) throw new Error("useWorkbench must be used inside the Workbench");
  return useStore(store, selector);
}

/** The store itself (for event handlers that read state without subscribing). */
export function useWorkbenchApi(): WorkbenchStoreApi {
  const store = useContext(WorkbenchStoreContext);
  if (!store) throw new Error("useWorkbenchApi must be used inside the Workbench");
  return store;
}
