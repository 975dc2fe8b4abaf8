/**
 * UI state of the designer: the draft being edited with its undo history, the selection,
 * display axes, tool, zoom/pan and snapping. Server data (the saved configuration) stays in
 * react-query; this store only holds the working copy until it is saved.
 *
 * The draft changes only through the store's named commands (`addStack`, `moveStacks`,
 * `setCount`, ...). Each wraps one pure edit of `lib/designer/document.ts` and decides what the
 * components should not: which edits merge into one undo step, what becomes selected, and how
 * snapping applies.
 */
import { create } from "zustand";
import type { Configuration, OrientifoldType, Theory } from "@/lib/boundary/types";
import type { DisplayAxes } from "@/lib/canvas/projection";
import { defaultGridStep } from "@/lib/canvas/snap";
import type { Viewport } from "@/lib/canvas/viewport";
import { normaliseDisplayAxes, suggestDisplayAxes } from "@/lib/designer/display-axes";
import * as compactEdits from "@/lib/designer/compact-edits";
import * as edits from "@/lib/designer/document";
import * as planeEdits from "@/lib/designer/orientifold-document";
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

/** Options of the `addStack` command. */
export interface AddStackCommandOptions extends edits.AddStackOptions {
  /** Select the new stack (and only it). */
  select?: boolean;
}

/** Options of the `duplicateStacks` command. */
export interface DuplicateStacksCommandOptions extends edits.DuplicateStacksOptions {
  /** Select the copies (and only them). */
  select?: boolean;
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
  /**
   * Key of the gesture the last edit belonged to. Edits of one gesture (a drag, typing into one
   * field) merge into one undo step until `endGesture` or an edit of another kind.
   */
  lastGesture: string | null;
  /** The document as it was when the current gesture began: a drag's offsets are measured from it. */
  gestureStart: Configuration | null;
  /** Why the last command was refused ("at most 64 stacks"), until it is dismissed or an edit succeeds. */
  notice: string | null;
  /** The last T-duality, while it is the latest edit: the designer offers to fork the dual configuration. */
  lastDuality: { axis: number; radiusBefore: number; radiusAfter: number; theoryBefore: Theory; theoryAfter: Theory } | null;

  load: (document: Configuration, options: LoadOptions) => void;
  endGesture: () => void;

  /*
   * Document commands. Each applies one pure edit of lib/designer/document.ts to the draft and
   * records an undo step; an edit the helper refuses (it returns its input) changes nothing.
   */
  /** Adds a stack; returns its id, or null when refused (too many stacks, a taken id). */
  addStack: (options?: AddStackCommandOptions) => string | null;
  /** Copies stacks with fresh ids; returns the new ids. */
  duplicateStacks: (ids: readonly string[], options?: DuplicateStacksCommandOptions) => string[];
  deleteStacks: (ids: readonly string[]) => void;
  /** Moves stacks by `delta` (axis number -> offset) on their Dirichlet axes, snapping when snapping is on. */
  moveStacks: (ids: readonly string[], delta: Record<string, number>) => void;
  /**
   * One step of the drag `gesture`: moves stacks by `delta` measured from where the drag began,
   * snapping when snapping is on. The whole drag is one undo step.
   */
  dragStacks: (ids: readonly string[], delta: Record<string, number>, gesture: string) => void;
  toggleAxis: (id: string, axis: number) => void;
  /** Typing into one position field is one undo step. */
  setPosition: (id: string, axis: number, value: number) => void;
  /** Typing into one count field is one undo step. */
  setCount: (id: string, count: number) => void;
  setAnti: (id: string, anti: boolean) => void;
  /** Orientifold planes (format 2): add one parallel to the first stack, remove, and edit type, axes and positions. */
  addPlane: () => void;
  removePlane: (id: string) => void;
  setPlaneType: (id: string, type: OrientifoldType) => void;
  togglePlaneAxis: (id: string, axis: number) => void;
  /** Typing into one plane position field is one undo step. */
  setPlanePosition: (id: string, axis: number, value: number) => void;
  /** Typing into one label is one undo step. */
  setLabel: (id: string, label: string) => void;
  /** Dragging through the colour picker is one undo step. */
  setColour: (id: string, colour: string) => void;
  renameStack: (id: string, newId: string) => void;
  /** Typing into the title is one undo step. */
  setTitle: (title: string) => void;
  setTheory: (theory: Theory) => void;
  /** Typing into the levels field is one undo step. */
  setLevels: (levels: number) => void;
  /** Typing into the string scale field is one undo step. */
  setStringScale: (value: number | null) => void;
  /** Moves one worldvolume direction of a stack from one axis to another, keeping p. */
  moveWorldvolume: (id: string, from: number, to: number) => void;
  /** Makes an axis compact with a radius, or non-compact with null; typing into one radius field is one undo step. */
  setRadius: (axis: number, radius: number | null) => void;
  /** Typing into one Wilson line field is one undo step. */
  setWilsonLine: (id: string, axis: number, theta: number) => void;
  /** T-dualises a compact axis: one undo step. */
  tDualize: (axis: number) => void;
  /**
   * Makes `document` the draft on top of the stored `version` (a merge of the draft with a newer
   * save): one undo step, and the draft stays unsaved.
   */
  rebase: (document: Configuration, version: number) => void;
  dismissNotice: () => void;

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
export const useDesignerStore = create<DesignerState>()((set, get) => {
  /** Applies a pure edit to the draft and commits it; nothing happens when the edit is refused. */
  function apply(change: (document: Configuration, state: DesignerState) => Configuration, gesture?: string): void {
    const state = get();
    // A flip to Dirichlet or a change of theory can leave Wilson lines or radii without an axis.
    const next = compactEdits.tidyCompactAxes(change(state.history.present, state));
    if (next !== state.history.present) set(commit(state, next, { gesture }));
  }

  return {
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
    gestureStart: null,
    notice: null,
    lastDuality: null,

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
        gestureStart: null,
        notice: null,
        lastDuality: null,
      }),

    endGesture: () => set({ lastGesture: null, gestureStart: null }),

    addStack: (options = {}) => {
      const { select, ...stackOptions } = options;
      const state = get();
      const next = edits.addStack(state.history.present, stackOptions);
      if (next === state.history.present) {
        set({ notice: edits.addStackProblem(state.history.present) ?? "The stack could not be added." });
        return null;
      }
      // addStack appends the new stack.
      const id = next.stacks.at(-1)?.id ?? null;
      set(commit(state, next, { selection: select && id !== null ? [id] : undefined }));
      return id;
    },

    duplicateStacks: (ids, options = {}) => {
      const { select, ...duplicateOptions } = options;
      const state = get();
      const { config, newIds } = edits.duplicateStacks(state.history.present, ids, duplicateOptions);
      const full = newIds.length < new Set(ids).size ? edits.addStackProblem(config) : null;
      if (newIds.length === 0) {
        if (full) set({ notice: full });
        return [];
      }
      set({ ...commit(state, config, { selection: select ? newIds : undefined }), notice: full });
      return newIds;
    },

    deleteStacks: (ids) => apply((doc) => edits.deleteStacks(doc, ids)),

    moveStacks: (ids, delta) => apply((doc, state) => edits.moveStacks(doc, ids, delta, { snapStep: snapStepOf(state) })),

    dragStacks: (ids, delta, gesture) => {
      const state = get();
      const start = state.lastGesture === gesture && state.gestureStart !== null ? state.gestureStart : state.history.present;
      const next = edits.moveStacks(start, ids, delta, { snapStep: snapStepOf(state) });
      if (next === state.history.present) return;
      set(commit(state, next, { gesture }));
    },

    toggleAxis: (id, axis) => apply((doc) => edits.toggleAxis(doc, id, axis)),
    setPosition: (id, axis, value) => apply((doc) => edits.setPosition(doc, id, axis, value), `position:${id}:${axis}`),
    setCount: (id, count) => apply((doc) => edits.setCount(doc, id, count), `count:${id}`),
    setAnti: (id, anti) => apply((doc) => edits.setAnti(doc, id, anti)),
    addPlane: () => apply((doc) => planeEdits.addPlane(doc)),
    removePlane: (id) => apply((doc) => planeEdits.removePlane(doc, id)),
    setPlaneType: (id, type) => apply((doc) => planeEdits.setPlaneType(doc, id, type)),
    togglePlaneAxis: (id, axis) => apply((doc) => planeEdits.togglePlaneAxis(doc, id, axis)),
    setPlanePosition: (id, axis, value) => apply((doc) => planeEdits.setPlanePosition(doc, id, axis, value), `plane-position:${id}:${axis}`),
    setLabel: (id, label) => apply((doc) => edits.setLabel(doc, id, label), `label:${id}`),
    setColour: (id, colour) => apply((doc) => edits.setColour(doc, id, colour), `colour:${id}`),
    renameStack: (id, newId) => apply((doc) => edits.renameStack(doc, id, newId)),
    setTitle: (title) => apply((doc) => edits.setTitle(doc, title), "title"),
    setTheory: (theory) => apply((doc) => edits.setTheory(doc, theory)),
    setLevels: (levels) => apply((doc) => edits.setLevels(doc, levels), "levels"),
    setStringScale: (value) => apply((doc) => edits.setStringScale(doc, value), "string-scale"),
    moveWorldvolume: (id, from, to) => apply((doc) => edits.moveWorldvolume(doc, id, from, to)),
    setRadius: (axis, radius) => apply((doc) => compactEdits.setRadius(doc, axis, radius), `radius:${axis}`),
    setWilsonLine: (id, axis, theta) => apply((doc) => compactEdits.setWilsonLine(doc, id, axis, theta), `wilson:${id}:${axis}`),
    tDualize: (axis) => {
      const state = get();
      const before = state.history.present;
      const next = compactEdits.tDualizeAxis(before, axis);
      if (next === before) return;
      set({
        ...commit(state, next),
        lastDuality: {
          axis,
          radiusBefore: before.compact?.[String(axis)] ?? 0,
          radiusAfter: next.compact?.[String(axis)] ?? 0,
          theoryBefore: before.theory,
          theoryAfter: next.theory,
        },
      });
    },
    rebase: (document, version) => set((state) => ({ ...commit(state, document), baseVersion: version })),
    dismissNotice: () => set({ notice: null }),

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
        gestureStart: null,
      })),
  };
});

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

interface CommitOptions {
  /** The gesture the edit belongs to: it merges into the undo step of the previous edit of the same gesture. */
  gesture?: string;
  /** The new selection (default: the current one, less stacks that no longer exist). */
  selection?: string[];
}

/** The state change that makes `next` the draft, as a new undo step or merged into the current gesture's. */
function commit(state: DesignerState, next: Configuration, options: CommitOptions = {}): Partial<DesignerState> {
  const gesture = options.gesture ?? null;
  const merge = gesture !== null && gesture === state.lastGesture;
  return {
    history: merge ? replacePresent(state.history, next) : pushHistory(state.history, next, designerHistoryLimit),
    dirty: true,
    notice: null,
    lastDuality: null,
    lastGesture: gesture,
    gestureStart: gesture === null ? null : merge ? state.gestureStart : state.history.present,
    selection: pruneSelection(options.selection ?? state.selection, next),
    displayAxes: normaliseDisplayAxes(state.displayAxes, next),
  };
}

/** The grid step moves snap to, or undefined while snapping is off. */
function snapStepOf(state: DesignerState): number | undefined {
  return state.snapping ? state.gridStep : undefined;
}

/** The state change for moving to another point of the history (undo/redo); none when it did not move. */
function stepTo(state: DesignerState, history: History<Configuration>): Partial<DesignerState> {
  if (history === state.history) return {};
  return {
    history,
    dirty: true,
    lastGesture: null,
    gestureStart: null,
    lastDuality: null,
    selection: pruneSelection(state.selection, history.present),
    displayAxes: normaliseDisplayAxes(state.displayAxes, history.present),
  };
}

function pruneSelection(selection: string[], document: Configuration): string[] {
  const ids = new Set(document.stacks.map((s) => s.id));
  const kept = selection.filter((id) => ids.has(id));
  return kept.length === selection.length ? selection : kept;
}
