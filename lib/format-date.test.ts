import { describe, expect, it } from "vitest";
import { formatDate, formatDateTime } from "@/lib/format-date";

describe("formatDate", () => {
  it("writes day, short month and year in UTC", () => {
    expect(formatDate(new Date(Date.UTC(2026, 11 /* Dec */, 2, 23, 59)))).toBe("2 Dec 2026");
  });

  it("accepts ISO strings (as JSON delivers dates)", () => {
    expect(formatDate("2026-01-31T00:30:00+02:00")).toBe("30 Jan 2026");
  });
});

describe("formatDateTime", () => {
  it("adds the 24-hour UTC time", () => {
    expect(formatDateTime(new Date(Date.UTC(2026, 5 /* Jun */, 15, 18, 5)))).toBe("15 Jun 2026, 18:05 UTC");
  });
});
