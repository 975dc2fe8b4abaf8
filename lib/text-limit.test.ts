import { describe, expect, it } from "vitest";
import { limitText } from "./text-limit";

describe("limitText", () => {
  it("keeps text within the limit and says nothing", () => {
    expect(limitText("Probe", 200, "Titles")).toEqual({ text: "Probe", note: null });
    expect(limitText("abcd", 4, "Titles")).toEqual({ text: "abcd", note: null });
  });

  it("cuts longer text and says how much went", () => {
    expect(limitText("abcdef", 4, "Titles")).toEqual({ text: "abcd", note: "Titles hold at most 4 characters; the last 2 were left out." });
    expect(limitText("abcde", 4, "Labels").note).toBe("Labels hold at most 4 characters; the last one was left out.");
  });

  describe("edge cases", () => {
    it("treats a negative limit as zero", () => {
      expect(limitText("a", -1, "Titles")).toEqual({ text: "", note: "Titles hold at most 0 characters; the last one was left out." });
    });
  });
});
