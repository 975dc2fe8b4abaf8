import { describe, expect, it } from "vitest";
import { computeSweepPoint } from "./point-summary";
import { toPointColumns, toPointRows } from "./point-rows";
import { massPlotAxes, massPlotPoints, verdictMap } from "./plot-data";
import { braneAntibraneAtOrigin as base, stringAlongNine } from "./test-configurations";
import type { SweepDefinition } from "./types";

const definition: SweepDefinition = {
  format: 1,
  dimensions: [
    { kind: "position", stack: "b", axis: 9, values: { kind: "list", values: [0, 3, 6] } },
    { kind: "position", stack: "b", axis: 8, values: { kind: "list", values: [0, 4] } },
    { kind: "orientation", stack: "b" },
  ],
};
const rows = toPointRows(definition, toPointColumns(Array.from({ length: 12 }, (_u, index) => ({ index, ...computeSweepPoint(base, definition, index) }))));

describe("massPlotAxes", () => {
  it("offers the separation of pairs with a moved stack, then the numeric dimensions", () => {
    expect(massPlotAxes(base, definition).map((option) => option.label)).toEqual(["separation y of a–b (√α′)", "b x9", "b x8"]);
  });
});

describe("massPlotPoints", () => {
  it("puts each point at the pair's separation, sqrt(x9^2 + x8^2)", () => {
    const points = massPlotPoints(base, definition, rows, { kind: "separation", a: "a", b: "b" });
    expect(points).toHaveLength(12);
    // Point 2 = (x9 = 0, x8 = 4, brane): y = 4. Point 10 = (x9 = 6, x8 = 4, brane): y = sqrt(52).
    expect(points.find((point) => point.index === 2)?.x).toBe(4);
    expect(points.find((point) => point.index === 10)?.x).toBeCloseTo(Math.sqrt(52), 12);
    // With two branes of one orientation the lightest states are the massless vectors of the aa sectors (physics.md).
    expect(points.find((point) => point.index === 0)?.y).toBe(0);
  });

  it("reads a numeric dimension's own value", () => {
    expect(massPlotPoints(base, definition, rows, { kind: "dimension", dimension: 0 }).map((point) => point.x)).toEqual([0, 0, 0, 0, 3, 3, 3, 3, 6, 6, 6, 6]);
  });
});

describe("the mass plot over a radius", () => {
  it("offers the radius as an axis and puts each point at its radius", () => {
    const radii: SweepDefinition = { format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "list", values: [0.5, 1, 2] } }] };
    const radiusRows = toPointRows(radii, toPointColumns([0, 1, 2].map((index) => ({ index, ...computeSweepPoint(stringAlongNine, radii, index) }))));
    expect(massPlotAxes(stringAlongNine, radii)).toEqual([{ axis: { kind: "dimension", dimension: 0 }, label: "R9" }]);
    // The massless n = 0 states of the wrapped D1 are the lightest at every radius (common practice).
    expect(massPlotPoints(stringAlongNine, radii, radiusRows, { kind: "dimension", dimension: 0 }).map((point) => [point.x, point.y])).toEqual([
      [0.5, 0],
      [1, 0],
      [2, 0],
    ]);
  });
});

describe("verdictMap", () => {
  it("lays the points of two dimensions out as cells, the others held fixed", () => {
    // Held: orientation = antibrane (position 1). y = separation decides the tachyon (y_c = pi sqrt 2 ~ 4.44,
    // Banks and Susskind, from memory): y = 0, 3, 4, 5 are tachyonic; y = 6, sqrt(52) are not.
    const map = verdictMap(definition, rows, 0, 1, [0, 0, 1]);
    expect(map.columns).toEqual(["0", "3", "6"]);
    expect(map.rows).toEqual(["0", "4"]);
    expect(map.cells.map((cell) => cell.verdict)).toEqual(["tachyonic", "tachyonic", "neither", "tachyonic", "neither", "neither"]);
    expect(map.cells.map((cell) => cell.index)).toEqual([1, 5, 9, 3, 7, 11]);
  });

  it("leaves cells of points not yet stored empty", () => {
    const map = verdictMap(definition, rows.slice(0, 2), 0, 1, [0, 0, 0]);
    expect(map.cells.filter((cell) => cell.index !== null)).toHaveLength(1);
  });
});
