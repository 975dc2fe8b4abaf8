import { describe, expect, it } from "vitest";
import { distinctTitle } from "./titles";

describe("distinctTitle", () => {
  it("keeps a free title", () => {
    expect(distinctTitle("Probe (fork)", new Set(["Probe"]), 200)).toBe("Probe (fork)");
  });

  it("numbers a repeat fork inside its bracket", () => {
    expect(distinctTitle("Probe (fork)", new Set(["Probe (fork)"]), 200)).toBe("Probe (fork 2)");
    expect(distinctTitle("Probe (fork)", new Set(["Probe (fork)", "Probe (fork 2)"]), 200)).toBe("Probe (fork 3)");
  });

  it("counts on from a number already there", () => {
    expect(distinctTitle("Probe (fork 2)", new Set(["Probe (fork 2)"]), 200)).toBe("Probe (fork 3)");
  });

  it("adds a bracketed number to a plain title", () => {
    expect(distinctTitle("Probe", new Set(["Probe", "Probe (2)"]), 200)).toBe("Probe (3)");
  });

  describe("edge cases", () => {
    it("shortens the stem so that the number fits the limit", () => {
      const long = "x".repeat(20);
      const result = distinctTitle(long, new Set([long]), 20);
      expect(result).toHaveLength(20);
      expect(result.endsWith(" (2)")).toBe(true);
    });
  });
});
