import { describe, expect, it } from "vitest";
import { formatDuration, formatRate } from "./format";

describe("formatDuration", () => {
  it("writes hours, minutes and seconds", () => {
    expect(formatDuration(200)).toBe("3 min 20 s");
    expect(formatDuration(7500)).toBe("2 h 5 min");
    expect(formatDuration(12.4)).toBe("12 s");
    expect(formatDuration(0.4)).toBe("under 1 s");
  });

  describe("edge cases", () => {
    it("reads unknown values as a dash", () => {
      expect(formatDuration(null)).toBe("—");
      expect(formatDuration(Number.NaN)).toBe("—");
      expect(formatDuration(-1)).toBe("—");
    });
  });
});

describe("formatRate", () => {
  it("keeps three significant digits", () => {
    expect(formatRate(1234.5)).toBe("1,230 points/s");
    expect(formatRate(0.25)).toBe("0.25 points/s");
    expect(formatRate(null)).toBe("—");
  });
});
