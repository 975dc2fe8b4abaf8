import { describe, expect, it } from "vitest";
import { keptValueNote, readNumberInput } from "./number-input";

const count = { name: "N", integer: true, min: 1, max: 10_000 };

describe("readNumberInput", () => {
  it("accepts a number inside the rules", () => {
    expect(readNumberInput(" 3 ", count)).toEqual({ kind: "value", value: 3 });
    expect(readNumberInput("-1.5", { name: "x" })).toEqual({ kind: "value", value: -1.5 });
    expect(readNumberInput("1e16", { name: "M_s", min: 0 })).toEqual({ kind: "value", value: 1e16 });
  });

  it("says why N = 0, 100000 and 2.5 are refused", () => {
    expect(readNumberInput("0", count)).toEqual({ kind: "problem", message: "N must be at least 1: 0 is too small." });
    expect(readNumberInput("100000", count)).toEqual({ kind: "problem", message: "N can be at most 10000: 100000 is too large." });
    expect(readNumberInput("2.5", count)).toEqual({ kind: "problem", message: "N must be a whole number: 2.5 is not." });
  });

  it("names the unit in its messages", () => {
    expect(readNumberInput("0", { name: "The string scale", min: 1e-9, unit: "GeV" })).toEqual({
      kind: "problem",
      message: "The string scale must be at least 1e-9 GeV: 0 GeV is too small.",
    });
  });

  it("refuses zero and negative numbers where only a positive one makes sense", () => {
    const scale = { name: "The string scale", positive: true, unit: "GeV" };
    expect(readNumberInput("0", scale)).toEqual({ kind: "problem", message: "The string scale must be greater than 0: 0 GeV is not." });
    expect(readNumberInput("-5", scale)).toEqual({ kind: "problem", message: "The string scale must be greater than 0: -5 GeV is not." });
    expect(readNumberInput("2.4e15", scale)).toEqual({ kind: "value", value: 2.4e15 });
  });

  it("waits while a number is half typed", () => {
    for (const text of ["", "-", ".", "2e", "2e-"]) expect(readNumberInput(text, { name: "x" })).toEqual({ kind: "incomplete" });
  });

  describe("edge cases", () => {
    it("points out a decimal comma", () => {
      expect(readNumberInput("2,5", { name: "x" })).toEqual({ kind: "problem", message: "x uses a decimal point: write 2.5." });
    });
    it("refuses words", () => {
      expect(readNumberInput("two", count)).toEqual({ kind: "problem", message: "N must be a number: “two” is not." });
    });
    it("refuses what overflows a double", () => {
      expect(readNumberInput("1e400", { name: "x" })).toEqual({ kind: "problem", message: "x must be a finite number." });
    });
  });
});

describe("keptValueNote", () => {
  it("says which value stayed", () => {
    expect(keptValueNote({ name: "N" }, 3)).toBe("N stays 3.");
    expect(keptValueNote({ name: "M_s", unit: "GeV" }, 1000)).toBe("M_s stays 1000 GeV.");
  });
});
