import { beforeEach, describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { addStack, deleteStacks, moveStacks, setLabel, toggleAxis } from "@/lib/designer/document";
import { designerHistoryLimit, selectCanRedo, selectCanUndo, selectDocument, useDesignerStore } from "./designer-store";

const start: Configuration = {
  format: 1,
  title: "Two points",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 3,
  stacks: [
    { id: "a", label: "a", count: 1, anti: false, worldvolume: [], position: {} },
    { id: "b", label: "b", count: 1, anti: false, worldvolume: [], position: { "9": 2 } },
  ],
};

const store = () => useDesignerStore.getState();

beforeEach(() => {
  store().load(start, { configurationId: "c1", baseVersion: 4 });
});

describe("load", () => {
  it("resets history, selection and the dirty flag and suggests display axes", () => {
    expect(selectDocument(store())).toBe(start);
    expect(store().dirty).toBe(false);
    expect(store().baseVersion).toBe(4);
    expect(store().displayAxes.vertical).toBe(9);
    expect(selectCanUndo(store())).toBe(false);
  });
});

describe("edit", () => {
  it("applies a reducer, marks the draft dirty and records an undo step", () => {
    store().edit((doc) => addStack(doc));
    expect(selectDocument(store()).stacks).toHaveLength(3);
    expect(store().dirty).toBe(true);
    expect(selectCanUndo(store())).toBe(true);
  });

  it("ignores a refused edit (same reference): no undo step, not dirty", () => {
    store().edit((doc) => toggleAxis(doc, "a", 0));
    expect(store().dirty).toBe(false);
    expect(selectCanUndo(store())).toBe(false);
  });

  it("merges edits of one gesture into a single undo step", () => {
    for (let i = 0; i < 5; i++) store().edit((doc) => moveStacks(doc, ["a"], { "9": 0.5 }), { gesture: "drag-1" });
    store().endGesture();
    expect(selectDocument(store()).stacks[0]!.position).toEqual({ "9": 2.5 });
    store().undo();
    expect(selectDocument(store())).toBe(start);
  });

  it("keeps at most the history limit of undo steps", () => {
    for (let i = 0; i < designerHistoryLimit + 20; i++) store().edit((doc) => setLabel(doc, "a", `a${i}`));
    expect(store().history.past).toHaveLength(designerHistoryLimit);
  });
});

describe("undo and redo", () => {
  it("walk the history and drop selected stacks that no longer exist", () => {
    store().edit((doc) => addStack(doc, { id: "c" }));
    store().select(["c", "a"]);
    store().undo();
    expect(store().selection).toEqual(["a"]);
    expect(selectCanRedo(store())).toBe(true);
    store().redo();
    expect(selectDocument(store()).stacks.map((s) => s.id)).toEqual(["a", "b", "c"]);
  });
});

describe("select", () => {
  it("replaces, adds and toggles, ignoring unknown ids", () => {
    store().select(["a", "ghost"]);
    expect(store().selection).toEqual(["a"]);
    store().select(["b"], "add");
    expect(store().selection).toEqual(["a", "b"]);
    store().select(["a"], "toggle");
    expect(store().selection).toEqual(["b"]);
  });

  it("loses deleted stacks from the selection", () => {
    store().select(["a", "b"]);
    store().edit((doc) => deleteStacks(doc, ["a"]));
    expect(store().selection).toEqual(["b"]);
  });
});

describe("markSaved", () => {
  it("clears the dirty flag and records the new version", () => {
    store().edit((doc) => addStack(doc));
    store().markSaved(5, selectDocument(store()));
    expect(store()).toMatchObject({ dirty: false, baseVersion: 5, configurationId: "c1" });
  });

  it("stays dirty when the draft changed while the save was in flight", () => {
    store().edit((doc) => addStack(doc));
    const sent = selectDocument(store());
    store().edit((doc) => setLabel(doc, "a", "edited meanwhile"));
    store().markSaved(5, sent);
    expect(store()).toMatchObject({ dirty: true, baseVersion: 5 });
  });
});

describe("setDisplayAxes", () => {
  it("refuses two equal axes", () => {
    store().setDisplayAxes({ horizontal: 3, vertical: 4 });
    expect(store().displayAxes).toEqual({ horizontal: 3, vertical: 4 });
    store().setDisplayAxes({ horizontal: 4, vertical: 4 });
    expect(store().displayAxes).not.toEqual({ horizontal: 4, vertical: 4 });
  });
});
