import { describe, expect, it } from "vitest";
import { createHistory, pushHistory, redoHistory, replacePresent, undoHistory } from "./history";

describe("pushHistory", () => {
  it("records the previous value and clears redo", () => {
    let h = createHistory("a");
    h = pushHistory(h, "b");
    h = undoHistory(h);
    h = pushHistory(h, "c");
    expect(h).toEqual({ past: ["a"], present: "c", future: [] });
  });

  it("forgets the oldest steps beyond the limit", () => {
    let h = createHistory(0);
    for (let i = 1; i <= 10; i++) h = pushHistory(h, i, 3);
    expect(h.past).toEqual([7, 8, 9]);
  });

  it("ignores pushing the present reference again", () => {
    const h = createHistory({ v: 1 });
    expect(pushHistory(h, h.present)).toBe(h);
  });
});

describe("undoHistory and redoHistory", () => {
  it("walk back and forth", () => {
    let h = pushHistory(pushHistory(createHistory(1), 2), 3);
    h = undoHistory(undoHistory(h));
    expect(h.present).toBe(1);
    h = redoHistory(h);
    expect(h).toEqual({ past: [1], present: 2, future: [3] });
  });

  describe("edge cases", () => {
    it("are no-ops at the ends", () => {
      const h = createHistory("only");
      expect(undoHistory(h)).toBe(h);
      expect(redoHistory(h)).toBe(h);
    });
  });
});

describe("replacePresent", () => {
  it("changes the present without adding an undo step", () => {
    const h = replacePresent(pushHistory(createHistory(1), 2), 5);
    expect(h).toEqual({ past: [1], present: 5, future: [] });
  });
});
