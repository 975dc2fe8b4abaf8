import { describe, expect, it } from "vitest";
import type { SceneStack } from "./scene";
import { buildCompactScene } from "./compact-scene";

const viewport = { scale: 10, originX: 200, originY: 150 };
const point: SceneStack = {
  id: "a",
  shape: { kind: "point", x: 1, y: 0 },
  screen: { x: 210, y: 150 },
  colour: "#2f6f9f",
  anti: false,
  selected: true,
  count: 1,
  label: "a",
  labelAt: { x: 0, y: 0 },
};

describe("buildCompactScene", () => {
  it("draws a circle along the horizontal axis as a strip with seams every 2 pi R and faint images", () => {
    const radius = 2;
    const scene = buildCompactScene({
      document: { compact: { "9": radius } },
      axes: { horizontal: 9, vertical: 8 },
      viewport,
      width: 400,
      height: 300,
      stacks: [point],
    });
    expect(scene.strips).toHaveLength(1);
    const strip = scene.strips[0]!;
    expect(strip.from).toBe(200);
    expect(strip.to).toBeCloseTo(200 + 2 * Math.PI * radius * 10, 9);
    // The view spans x in [-20, 20]: seams at 0 and +-4 pi ~ +-12.57.
    expect(strip.seams.map((x) => Math.round(x))).toEqual([74, 200, 326]);
    const imageXs = scene.images.map((image) => Math.round(image.screen.x)).sort((x, y) => x - y);
    expect(imageXs).toEqual([84, 336]);
    expect(scene.images.every((image) => !image.selected)).toBe(true);
  });

  it("draws nothing for non-compact display axes, and no images of a stack that wraps the circle", () => {
    expect(buildCompactScene({ document: {}, axes: { horizontal: 9, vertical: 8 }, viewport, width: 400, height: 300, stacks: [point] })).toEqual({
      strips: [],
      images: [],
    });
    const line: SceneStack = { ...point, shape: { kind: "horizontal-line", y: 0 } };
    const scene = buildCompactScene({ document: { compact: { "9": 2 } }, axes: { horizontal: 9, vertical: 8 }, viewport, width: 400, height: 300, stacks: [line] });
    expect(scene.images).toEqual([]);
  });
});

describe("buildCompactScene on two circles", () => {
  it("repeats a point along both circles and diagonally", () => {
    const scene = buildCompactScene({
      document: { compact: { "9": 2, "8": 1 } },
      axes: { horizontal: 9, vertical: 8 },
      viewport,
      width: 400,
      height: 300,
      stacks: [point],
    });
    expect(scene.strips.map((strip) => strip.direction)).toEqual(["horizontal", "vertical"]);
    const keys = new Set(scene.images.map((image) => image.id));
    expect(keys.has("a@h1")).toBe(true);
    expect(keys.has("a@v1")).toBe(true);
    expect(keys.has("a@h1v1")).toBe(true);
  });
});
