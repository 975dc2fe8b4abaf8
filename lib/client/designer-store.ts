/**
 * UI state of the designer: the draft being edited with its undo history, the selection,
 * display axes, tool, zoom/pan and snapping. Server data (the saved configuration) stays in
 * react-query; this store only holds the working copy until it is saved.
 */
import { create } from "zustand";
import type { Configuration } from "@/lib/boundary/types";
import type { DisplayAxes } from "@/lib/canvas/projection";
import { defaultGridStep } from "@/lib/canvas/snap";
import type { Viewport } from "@/lib/canvas/viewport";
import { normaliseDisplayAxes, suggestDisplayAxes } from "@/lib/designer/display-axes";
import {
  createHistory,
  pushHistory,
  redoHistory,
  replacePresent,
  undoHistory,
  type History,
} from "@/lib/designer/history";

/** The canvas tool: select/drag stacks, or pan the view by dragging. */
export type DesignerTool = "select" | "pan";

/** How a selection change combines with the current selection. */
export type SelectionMode = "replace" | "add" | "toggle";

/** Options of `edit`. */
export interface EditOptions {
  /**
   * Edits with the same gesture key as the previous edit merge into one undo step
   * (a drag, typing into one field).
   */
  gesture?: string;
}

/** Options of `load`. */
export interface LoadOptions {
  configurationId: string | null;
  baseVersion: number | null;
  /** True when the loaded document is a recovered, unsaved draft. */
  dirty?: boolean;
}

export interface DesignerState {
  configurationId: string | null;
  baseVersion: number | null;
  history: History<Configuration>;
  dirty: boolean;
  selection: string[];
  displayAxes: DisplayAxes;
  tool: DesignerTool;
  viewport: Viewport | null;
  snapping: boolean;
  gridStep: number;
  lastGesture: string | null;

  load: (document: Configuration, options: LoadOptions) => void;
  edit: (change: (document: Configuration) => Configuration, options?: EditOptions) => void;
  endGesture: () => void;
  undo: () => void;
  redo: () => void;
  select: (ids: readonly string[], mode?: SelectionMode) => void;
  setDisplayAxes: (axes: DisplayAxes) => void;
  setTool: (tool: DesignerTool) => void;
  setViewport: (viewport: Viewport | null) => void;
  setSnapping: (on: boolean) => void;
  /**
   * Records a successful save of `savedDocument` as `version`. The draft stays dirty when it
   * changed while the save was in flight.
   */
  markSaved: (version: number, savedDocument: Configuration) => void;
}

/** Undo steps kept by the designer. */
export const designerHistoryLimit = 100;

const emptyDocument: Configuration = {
  format: 1,
  title: "Untitled configuration",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 4,
  stacks: [],
};

/** The designer store (one per browser tab; the designer page loads its document into it). */
export const useDesignerStore = create<DesignerState>()((set, get) => ({
  configurationId: null,
  baseVersion: null,
  history: createHistory(emptyDocument),
  dirty: false,
  selection: [],
  displayAxes: suggestDisplayAxes(emptyDocument),
  tool: "select",
  viewport: null,
  snapping: true,
  gridStep: defaultGridStep,
  lastGesture: null,

  load: (document, options) =>
    set({
      configurationId: options.configurationId,
      baseVersion: options.baseVersion,
      history: createHistory(document),
      dirty: options.dirty ?? false,
      selection: [],
      displayAxes: suggestDisplayAxes(document),
      viewport: null,
      lastGesture: null,
    }),

  edit: (change, options = {}) => {
    const state = get();
    const next = change(state.history.present);
    if (next === state.history.present) return;
    const merge = options.gesture !== undefined && options.gesture === state.lastGesture;
    const history = merge
      ? replacePresent(state.history, next)
      : pushHistory(state.history, next, designerHistoryLimit);
    set({
      history,
      dirty: true,
      lastGesture: options.gesture ?? null,
      selection: pruneSelection(state.selection, next),
      displayAxes: normaliseDisplayAxes(state.displayAxes, next),
    });
  },

  endGesture: () => set({ lastGesture: null }),

  undo: () => set((state) => stepTo(state, undoHistory(state.history))),

  redo: () => set((state) => stepTo(state, redoHistory(state.history))),

  select: (ids, mode = "replace") => {
    const existing = new Set(get().history.present.stacks.map((s) => s.id));
    const wanted = ids.filter((id) => existing.has(id));
    const current = get().selection;
    let selection: string[];
    if (mode === "replace") selection = [...new Set(wanted)];
    else if (mode === "add") selection = [...new Set([...current, ...wanted])];
    else {
      const toggled = new Set(current);
      for (const id of wanted) {
        if (toggled.has(id)) toggled.delete(id);
        else toggled.add(id);
      }
      selection = [...toggled];
    }
    set({ selection });
  },

  setDisplayAxes: (axes) => set({ displayAxes: normaliseDisplayAxes(axes, get().history.present) }),
  setTool: (tool) => set({ tool }),
  setViewport: (viewport) => set({ viewport }),
  setSnapping: (on) => set({ snapping: on }),
  markSaved: (version, savedDocument) =>
    set((state) => ({
      baseVersion: version,
      dirty: state.history.present !== savedDocument,
      lastGesture: null,
    })),
}));

/** The draft document. */
export function selectDocument(state: DesignerState): Configuration {
  return state.history.present;
}

/** True when there is something to undo / redo. */
export function selectCanUndo(state: DesignerState): boolean {
  return state.history.past.length > 0;
}
export function selectCanRedo(state: DesignerState): boolean {
  return state.history.future.length > 0;
}

/** The state change for moving to another point of the history (undo/redo); none when it did not move. */
function stepTo(state: DesignerState, history: History<Configuration>): Partial<DesignerState> {
  if (history === state.history) return {};
  return {
    history,
    dirty: true,
    lastGesture: null,
    selection: pruneSelection(state.selection, history.present),
    displayAxes: normaliseDisplayAxes(state.displayAxes, history.present),
  };
}

function pruneSelection(selection: string[], document: Configuration): string[] {
  const ids = new Set(document.stacks.map((s) => s.id));
  const kept = selection.filter((id) => ids.has(id));
  return kept.length === selection.length ? selection : kept;
}
