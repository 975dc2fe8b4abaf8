import { beforeEach, describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import {
  maxStacks,
  renameStack,
  setAnti,
  setColour,
  setCount,
  setLabel,
  setLevels,
  setPosition,
  setStringScale,
  setTheory,
  setTitle,
  toggleAxis,
} from "@/lib/designer/document";
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

describe("document commands", () => {
  it("apply their edit, mark the draft dirty and record an undo step", () => {
    expect(store().addStack()).toBe("s1");
    expect(selectDocument(store()).stacks.map((s) => s.id)).toEqual(["a", "b", "s1"]);
    expect(store().dirty).toBe(true);
    expect(selectCanUndo(store())).toBe(true);
    store().undo();
    expect(selectDocument(store())).toBe(start);
  });

  it("ignore a refused edit (the same reference back): no undo step, not dirty", () => {
    store().toggleAxis("a", 0); // time is not a spatial axis
    store().setCount("a", 0);
    store().renameStack("a", "b"); // taken
    expect(store().addStack({ id: "a" })).toBeNull();
    expect(selectDocument(store())).toBe(start);
    expect(store().dirty).toBe(false);
    expect(selectCanUndo(store())).toBe(false);
  });

  it("give the same document as the pure edits of lib/designer/document.ts", () => {
    store().toggleAxis("a", 1);
    store().setPosition("b", 8, 1.5);
    store().setCount("a", 3);
    store().setAnti("b", true);
    store().setLabel("a", "probe");
    store().setColour("a", "#AABBCC");
    store().renameStack("b", "wall");
    store().setTitle("Renamed");
    store().setLevels(6);
    store().setStringScale(1e16);
    let expected = toggleAxis(start, "a", 1);
    expected = setPosition(expected, "b", 8, 1.5);
    expected = setCount(expected, "a", 3);
    expected = setAnti(expected, "b", true);
    expected = setLabel(expected, "a", "probe");
    expected = setColour(expected, "a", "#AABBCC");
    expected = renameStack(expected, "b", "wall");
    expected = setTitle(expected, "Renamed");
    expected = setLevels(expected, 6);
    expected = setStringScale(expected, 1e16);
    expect(selectDocument(store())).toEqual(expected);
    expect(store().history.past).toHaveLength(10);
  });

  it("switch the theory, dropping axes that no longer exist", () => {
    store().setTheory("bosonic");
    store().setPosition("a", 20, 1);
    store().setTheory("IIB");
    expect(selectDocument(store())).toEqual(setTheory(setPosition(setTheory(start, "bosonic"), "a", 20, 1), "IIB"));
    expect(selectDocument(store()).stacks[0]!.position).toEqual({});
  });

  it("select a new stack or new copies when asked, and keep the selection otherwise", () => {
    store().select(["a"]);
    store().addStack();
    expect(store().selection).toEqual(["a"]);
    const added = store().addStack({ position: { "9": 4 }, select: true });
    expect(store().selection).toEqual([added]);
    expect(selectDocument(store()).stacks.at(-1)!.position).toEqual({ "9": 4 });

    const copies = store().duplicateStacks(["a", "b"], { shift: { "9": 1 }, select: true });
    expect(copies).toHaveLength(2);
    expect(store().selection).toEqual(copies);
    const copyOfB = selectDocument(store()).stacks.find((s) => s.id === copies[1]);
    expect(copyOfB?.position).toEqual({ "9": 3 });
    expect(store().duplicateStacks(["ghost"])).toEqual([]);
  });

  it("delete stacks and drop them from the selection", () => {
    store().select(["a", "b"]);
    store().deleteStacks(["a"]);
    expect(selectDocument(store()).stacks.map((s) => s.id)).toEqual(["b"]);
    expect(store().selection).toEqual(["b"]);
  });

  it("move stacks by a step, snapped to the grid while snapping is on", () => {
    store().setSnapping(true);
    expect(store().gridStep).toBe(0.5);
    store().moveStacks(["b"], { "9": 0.6 });
    expect(selectDocument(store()).stacks[1]!.position).toEqual({ "9": 2.5 }); // 2 + 0.6, snapped to 0.5
    store().setSnapping(false);
    store().moveStacks(["a"], { "9": 0.123 });
    expect(selectDocument(store()).stacks[0]!.position).toEqual({ "9": 0.123 });
  });

  it("make one undo step of typing into one field, and a new one for another field", () => {
    for (const label of ["p", "pr", "pro"]) store().setLabel("a", label);
    store().setLabel("b", "wall");
    expect(store().history.past).toHaveLength(2);
    store().undo();
    expect(selectDocument(store()).stacks[0]!.label).toBe("pro");
    store().undo();
    expect(selectDocument(store())).toBe(start);
  });

  it("keep at most the history limit of undo steps", () => {
    for (let i = 0; i < designerHistoryLimit + 20; i++) store().setAnti("a", i % 2 === 0);
    expect(store().history.past).toHaveLength(designerHistoryLimit);
  });
});

describe("dragStacks", () => {
  it("measures each offset from where the drag began and makes the drag one undo step", () => {
    store().setSnapping(false);
    for (const offset of [0.5, 1, 1.5]) store().dragStacks(["b"], { "9": offset }, "drag-1");
    store().endGesture();
    expect(selectDocument(store()).stacks[1]!.position).toEqual({ "9": 3.5 });
    store().undo();
    expect(selectDocument(store())).toBe(start);
  });

  it("starts a new drag from the document as the previous drag left it", () => {
    store().setSnapping(false);
    store().dragStacks(["b"], { "9": 1 }, "drag-1");
    store().endGesture();
    store().dragStacks(["b"], { "9": 1 }, "drag-2");
    expect(selectDocument(store()).stacks[1]!.position).toEqual({ "9": 4 });
    expect(store().history.past).toHaveLength(2);
  });

  it("returns to the starting document when the offset comes back to zero", () => {
    store().dragStacks(["b"], { "9": 2 }, "drag-1");
    store().dragStacks(["b"], { "9": 0 }, "drag-1");
    expect(selectDocument(store())).toBe(start);
  });
});

describe("undo and redo", () => {
  it("walk the history and drop selected stacks that no longer exist", () => {
    store().addStack({ id: "c" });
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
    store().deleteStacks(["a"]);
    expect(store().selection).toEqual(["b"]);
  });
});

describe("markSaved", () => {
  it("clears the dirty flag and records the new version", () => {
    store().addStack();
    store().markSaved(5, selectDocument(store()));
    expect(store()).toMatchObject({ dirty: false, baseVersion: 5, configurationId: "c1" });
  });

  it("stays dirty when the draft changed while the save was in flight", () => {
    store().addStack();
    const sent = selectDocument(store());
    store().setLabel("a", "edited meanwhile");
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

describe("refusals", () => {
  it("say why a stack was not added, and forget it after the next edit", () => {
    for (let i = start.stacks.length; i < maxStacks; i++) store().addStack();
    expect(store().notice).toBeNull();
    expect(store().addStack()).toBeNull();
    expect(store().notice).toMatch(/at most 64 stacks/);
    expect(store().duplicateStacks(["a"])).toEqual([]);
    expect(store().notice).toMatch(/at most 64 stacks/);
    store().setCount("a", 2);
    expect(store().notice).toBeNull();
  });
});

describe("moveWorldvolume", () => {
  it("moves a worldvolume direction as one undo step", () => {
    store().toggleAxis("a", 1);
    store().toggleAxis("a", 2);
    store().moveWorldvolume("a", 2, 5);
    expect(selectDocument(store()).stacks[0]?.worldvolume).toEqual([1, 5]);
    store().undo();
    expect(selectDocument(store()).stacks[0]?.worldvolume).toEqual([1, 2]);
  });
});

describe("rebase", () => {
  it("puts a merged document on top of a newer version, unsaved and undoable", () => {
    const merged: Configuration = { ...start, title: "Merged" };
    store().rebase(merged, 6);
    expect(selectDocument(store())).toBe(merged);
    expect(store().baseVersion).toBe(6);
    expect(store().dirty).toBe(true);
    store().undo();
    expect(selectDocument(store())).toBe(start);
  });
});

describe("compact axes", () => {
  it("types a radius as one undo step and T-dualises in one more, undone in one", () => {
    store().setRadius(9, 1);
    store().setRadius(9, 2);
    expect(selectDocument(store()).compact).toEqual({ "9": 2 });
    store().tDualize(9);
    const dual = selectDocument(store());
    expect(dual.theory).toBe("IIB");
    expect(dual.compact).toEqual({ "9": 0.5 });
    expect(dual.stacks.map((stack) => stack.worldvolume)).toEqual([[9], [9]]);
    expect(store().lastDuality).toEqual({ axis: 9, radiusBefore: 2, radiusAfter: 0.5, theoryBefore: "IIA", theoryAfter: "IIB" });
    store().undo();
    expect(selectDocument(store()).theory).toBe("IIA");
    expect(store().lastDuality).toBeNull();
    store().undo();
    expect(selectDocument(store())).toBe(start);
  });

  it("drops a Wilson line when its axis is flipped to Dirichlet", () => {
    store().setRadius(9, 2);
    store().tDualize(9);
    const withWilson = selectDocument(store()).stacks[1]?.wilson;
    expect(withWilson?.["9"]).toBeCloseTo(1, 12);
    store().toggleAxis("b", 9);
    expect(selectDocument(store()).stacks[1]).not.toHaveProperty("wilson");
  });
});
