import { describe, expect, it } from "vitest";
import {
  baseScale,
  clampScale,
  createViewport,
  fitToPoints,
  maxScale,
  minScale,
  panBy,
  toScreen,
  toWorld,
  visibleWorldRect,
  zoomAt,
} from "./viewport";

describe("toScreen", () => {
  it("puts the world origin at the viewport origin", () => {
    const vp = createViewport(800, 600);
    expect(toScreen({ x: 0, y: 0 }, vp)).toEqual({ x: 400, y: 300 });
  });

  it("draws larger world y higher on screen (screen y grows downwards)", () => {
    const vp = createViewport(800, 600, 40);
    expect(toScreen({ x: 1, y: 2 }, vp)).toEqual({ x: 440, y: 220 });
  });
});

describe("toWorld", () => {
  it("inverts toScreen", () => {
    const vp = { scale: 37, originX: 12.5, originY: -80 };
    for (const p of [
      { x: 0, y: 0 },
      { x: 3.5, y: -2.25 },
      { x: -100, y: 44 },
    ]) {
      const back = toWorld(toScreen(p, vp), vp);
      expect(back.x).toBeCloseTo(p.x, 10);
      expect(back.y).toBeCloseTo(p.y, 10);
    }
  });
});

describe("zoomAt", () => {
  it("keeps the world point under the anchor fixed", () => {
    const vp = createViewport(800, 600);
    const anchor = { x: 610, y: 95 };
    const before = toWorld(anchor, vp);
    const zoomed = zoomAt(vp, 1.7, anchor);
    const after = toWorld(anchor, zoomed);
    expect(zoomed.scale).toBeCloseTo(baseScale * 1.7, 10);
    expect(after.x).toBeCloseTo(before.x, 10);
    expect(after.y).toBeCloseTo(before.y, 10);
  });

  it("clamps the scale to its limits", () => {
    const vp = createViewport(800, 600);
    expect(zoomAt(vp, 1000, { x: 0, y: 0 }).scale).toBe(maxScale);
    expect(zoomAt(vp, 0.0001, { x: 0, y: 0 }).scale).toBe(minScale);
  });

  it("does not mutate its input", () => {
    const vp = createViewport(800, 600);
    const copy = { ...vp };
    zoomAt(vp, 2, { x: 10, y: 10 });
    expect(vp).toEqual(copy);
  });
});

describe("panBy", () => {
  it("shifts the origin by the pixel offset", () => {
    expect(panBy({ scale: 10, originX: 1, originY: 2 }, 5, -7)).toEqual({ scale: 10, originX: 6, originY: -5 });
  });
});

describe("visibleWorldRect", () => {
  it("spans the stage divided by the scale, centred on the origin", () => {
    const rect = visibleWorldRect(createViewport(800, 600, 40), 800, 600);
    expect(rect).toEqual({ x: -10, y: -7.5, width: 20, height: 15 });
  });
});

describe("fitToPoints", () => {
  it("shows every point inside the stage with the margin", () => {
    const points = [
      { x: -3, y: 1 },
      { x: 9, y: -4 },
      { x: 2, y: 6 },
    ];
    const vp = fitToPoints(points, 600, 400, 40);
    for (const p of points) {
      const s = toScreen(p, vp);
      expect(s.x).toBeGreaterThanOrEqual(40 - 1e-9);
      expect(s.x).toBeLessThanOrEqual(560 + 1e-9);
      expect(s.y).toBeGreaterThanOrEqual(40 - 1e-9);
      expect(s.y).toBeLessThanOrEqual(360 + 1e-9);
    }
  });

  describe("edge cases", () => {
    it("centres the origin at the base scale with no points", () => {
      expect(fitToPoints([], 200, 100)).toEqual({ scale: baseScale, originX: 100, originY: 50 });
    });

    it("centres a single point without dividing by zero", () => {
      const vp = fitToPoints([{ x: 5, y: 5 }], 200, 100);
      expect(toScreen({ x: 5, y: 5 }, vp)).toEqual({ x: 100, y: 50 });
    });
  });
});

describe("clampScale", () => {
  it("replaces a non-finite scale by the base scale", () => {
    expect(clampScale(Number.NaN)).toBe(baseScale);
    expect(clampScale(Number.POSITIVE_INFINITY)).toBe(baseScale);
  });
});
