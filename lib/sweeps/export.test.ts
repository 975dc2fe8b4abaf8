import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { exportCaution } from "../export/caution";
import { sweepToCsv, sweepToJson } from "./export";
import { computeSweepPoint } from "./point-summary";
import { toPointColumns, toPointRows, type StoredSweepPoint } from "./point-rows";
import { braneAntibraneAtOrigin as base } from "./test-configurations";
import type { SweepDefinition } from "./types";

const definition: SweepDefinition = {
  format: 1,
  dimensions: [
    { kind: "boundary", stacks: ["a"], axes: [5], symmetry: "all" },
    { kind: "position", stack: "b", axis: 9, values: { kind: "list", values: [0, 6] } },
  ],
};
// Stored out of order, as workers finish chunks in any order.
const points: StoredSweepPoint[] = [3, 0, 2, 1].map((index) => ({ index, ...computeSweepPoint(base, definition, index) }));
const rows = toPointRows(definition, toPointColumns(points));
const source = { title: "Pull apart, with a, b", base, definition, rows };

describe("toPointRows", () => {
  it("round-trips the stored outcomes through the column payload", () => {
    expect(rows.map((row) => row.index)).toEqual([3, 0, 2, 1]);
    const zero = rows.find((row) => row.index === 0);
    expect(zero).toMatchObject({ labels: ["a D", "0"], verdict: "tachyonic", lightestMassSquared: -0.5, problem: null });
    expect(rows.find((row) => row.index === 2)).toMatchObject({ labels: ["a N", "0"], verdict: "invalid", supercharges: null });
  });
});

describe("sweepToCsv", () => {
  it("writes one rectangular table: a header, points in order, conventions and caution in the last column of the first row", () => {
    const csv = sweepToCsv(source);
    // Read back with papaparse, as a reader would, without options for comments.
    const parsed = Papa.parse<string[]>(csv.trimEnd(), { newline: "\r\n" });
    expect(parsed.errors).toEqual([]);
    const [header, ...data] = parsed.data;
    expect(header).toEqual([
      "point", "N/D of a on x5", "b x9", "verdict", "supercharges", "tachyonic_sectors",
      "lightest_alpha_prime_mass_squared", "massless_states", "gauge_group", "problem", "conventions",
    ]);
    expect(data.every((record) => record.length === header?.length)).toBe(true);
    expect(data.map((record) => record[0])).toEqual(["0", "1", "2", "3"]);
    expect(data[0]?.slice(0, 6)).toEqual(["0", "a D", "0", "tachyonic", "0", "1"]);
    expect(data[0]?.at(-1)).toMatch(/^Pull apart, with a, b\. alpha' = 1;.*Theory IIA, D = 10\./);
    expect(data[0]?.at(-1)).toContain(exportCaution);
    expect(data.slice(1).map((record) => record.at(-1))).toEqual(["", "", ""]);
    expect(csv.startsWith("#")).toBe(false);
    expect(csv.endsWith("\r\n")).toBe(true);
  });
});

describe("sweepToJson", () => {
  it("carries the definition, the base and one object per point", () => {
    const parsed = JSON.parse(sweepToJson(source)) as { caution: string; definition: unknown; points: { point: number; values: Record<string, string>; verdict: string }[] };
    expect(parsed.caution).toBe(exportCaution);
    expect(parsed.definition).toEqual(definition);
    expect(parsed.points.map((point) => point.point)).toEqual([0, 1, 2, 3]);
    expect(parsed.points[1]).toMatchObject({ values: { "N/D of a on x5": "a D", "b x9": "6" }, verdict: "neither" });
  });
});
