import { describe, expect, it } from "vitest";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import { createViewport, toScreen } from "@/lib/canvas/viewport";
import { rectsOverlap } from "@/lib/canvas/labels";
import { buildScene, curveLabelWidth, fitSceneViewport } from "./scene";

const document: Configuration = {
  format: 1,
  title: "Three stacks",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 2,
  stacks: [
    { id: "w", label: "wall", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
    { id: "p", label: "probe", count: 2, anti: false, worldvolume: [1, 2, 3, 4], position: { "9": 2 } },
    { id: "q", label: "", count: 1, anti: true, worldvolume: [1, 2, 3, 4], position: { "8": 1, "9": -1 } },
  ],
};

const result = {
  sectors: [
    {
      pair: ["p", "q"],
      tachyonic: true,
      criticalSeparation: 4.44,
      separation: 3.16,
      supersymmetric: false,
      nu: 0,
      levels: [{ sector: "NS", level: "0", massSquared: "-0.2467", mass: null, states: "1", withChanPaton: "4" }],
    },
  ],
} as unknown as SpectrumResult;

const viewport = createViewport(400, 300, 40);
const scene = buildScene({ document, result, axes: { horizontal: 8, vertical: 9 }, viewport, width: 400, height: 300, selection: ["p"], gridStep: 1 });

describe("buildScene", () => {
  it("projects each stack: the wall as a horizontal line, the probes as points", () => {
    expect(scene.stacks.map((s) => s.shape.kind)).toEqual(["horizontal-line", "point", "point"]);
    expect(scene.stacks[1]!.screen).toEqual({ x: 200, y: 70 });
    expect(scene.stacks[2]!.screen).toEqual({ x: 240, y: 190 });
  });

  it("labels stacks with name, Dp and N, using the id when the label is empty", () => {
    expect(scene.stacks[0]!.label).toBe("wall \u00b7 D8 \u00b7 N=1");
    expect(scene.stacks[2]!.label).toBe("q \u00b7 anti-D4 \u00b7 N=1");
  });

  it("marks the selection", () => {
    expect(scene.stacks.map((s) => s.selected)).toEqual([false, true, false]);
  });

  it("draws one curve per pair of distinct stacks, tachyonic ones labelled in words", () => {
    expect(scene.curves.map((c) => c.key)).toEqual(["p|w", "q|w", "p|q"]);
    const pq = scene.curves[2]!;
    expect(pq.tachyonic).toBe(true);
    expect(pq.label).toBe("\u03b1\u2032M\u00b2 = \u22120.2467  tachyon");
    expect(pq.points.slice(0, 2)).toEqual([200, 70]);
    expect(pq.points.slice(6, 8)).toEqual([240, 190]);
  });

  it("adds the mass in GeV to a curve label when the document has a string scale", () => {
    const massive = {
      sectors: [
        {
          ...result.sectors[0]!,
          tachyonic: false,
          levels: [{ sector: "NS", level: "0", massSquared: "0.25", mass: 0.5, states: "1", withChanPaton: "4" }],
        },
      ],
    } as unknown as SpectrumResult;
    const withScale = buildScene({
      document: { ...document, stringScaleGeV: 1000 },
      result: massive,
      axes: { horizontal: 8, vertical: 9 },
      viewport,
      width: 400,
      height: 300,
      selection: [],
      gridStep: 1,
    });
    // M = (M sqrt(alpha')) x M_s = 0.5 x 1000 GeV (M_s = 1/sqrt(alpha'), common practice).
    expect(withScale.curves[2]!.label).toBe("\u03b1\u2032M\u00b2 = 0.25 \u00b7 M = 500 GeV");
  });

  it("has no curve labels without a result", () => {
    const bare = buildScene({ document, result: null, axes: { horizontal: 8, vertical: 9 }, viewport, width: 400, height: 300, selection: [], gridStep: 1 });
    expect(bare.curves.every((c) => c.label === "" && !c.tachyonic)).toBe(true);
  });

  it("lists grid lines across the view with the origin flagged", () => {
    // 400 px at 40 px per unit shows x in [-5, 5]: 11 lines at step 1.
    expect(scene.verticalLines).toHaveLength(11);
    expect(scene.verticalLines.filter((l) => l.origin)).toEqual([{ x: 200, origin: true }]);
  });
});

describe("fitSceneViewport", () => {
  it("keeps the origin and every stack position inside the margin", () => {
    const vp = fitSceneViewport(document, { horizontal: 8, vertical: 9 }, 400, 300);
    for (const stack of scene.stacks) {
      if (stack.shape.kind !== "point") continue;
      const s = toScreen({ x: stack.shape.x, y: stack.shape.y }, vp);
      expect(s.x).toBeGreaterThanOrEqual(72 - 1e-9);
      expect(s.y).toBeGreaterThanOrEqual(72 - 1e-9);
      expect(s.x).toBeLessThanOrEqual(400 - 72 + 1e-9);
      expect(s.y).toBeLessThanOrEqual(300 - 72 + 1e-9);
    }
  });
});

describe("label placement", () => {
  it("keeps stack and curve labels from overlapping one another", () => {
    const boxes = [
      ...scene.stacks.map((s) => ({ ...s.labelAt, width: s.label.length * 12 * 0.6, height: 16 })),
      ...scene.curves.filter((c) => c.label).map((c) => ({ ...c.labelAt, width: curveLabelWidth(c.label), height: 18 })),
    ];
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) expect(rectsOverlap(boxes[i]!, boxes[j]!)).toBe(false);
    }
  });
});

describe("curves with shared ends", () => {
  it("bend differently when two sectors join the same two screen points", () => {
    const twins: Configuration = {
      ...document,
      stacks: [
        { id: "x", label: "x", count: 1, anti: false, worldvolume: [], position: { "9": 2 } },
        { id: "y", label: "y", count: 1, anti: false, worldvolume: [], position: {} },
        { id: "z", label: "z", count: 1, anti: false, worldvolume: [1], position: {} },
      ],
    };
    const twinScene = buildScene({ document: twins, result: null, axes: { horizontal: 8, vertical: 9 }, viewport, width: 400, height: 300, selection: [], gridStep: 1 });
    const [xy, xz] = twinScene.curves;
    expect(xy!.points.slice(0, 2)).toEqual(xz!.points.slice(0, 2));
    expect(xy!.points.slice(6, 8)).toEqual(xz!.points.slice(6, 8));
    expect(xy!.points.slice(2, 6)).not.toEqual(xz!.points.slice(2, 6));
  });
});

describe("buildScene with an orientifold plane", () => {
  const withPlane: Configuration = {
    ...document,
    format: 2,
    orientifolds: [{ id: "o", type: "O-", worldvolume: [1, 2, 3, 4], position: { "9": 0.5 } }],
  };
  const draw = (doc: Configuration) =>
    buildScene({ document: doc, result: null, axes: { horizontal: 8, vertical: 9 }, viewport, width: 400, height: 300, selection: [], gridStep: 1 });
  it("draws the plane and a faint image of every stack off it at the reflected position", () => {
    const planeScene = draw(withPlane);
    expect(planeScene.planes[0]?.shape).toEqual({ kind: "point", x: 0, y: 0.5 });
    const image = planeScene.images.find((entry) => entry.id === "p'");
    expect(image?.shape).toEqual({ kind: "point", x: 0, y: -1 });
    // Images are never hit-tested: only the stacks are.
    expect(planeScene.hitEntries.map((entry) => entry.id)).toEqual(["w", "p", "q"]);
  });
  it("keeps the image in step when the stack moves (every drag step rebuilds the scene from the document)", () => {
    const moved: Configuration = {
      ...withPlane,
      stacks: withPlane.stacks.map((stack) => (stack.id === "p" ? { ...stack, position: { "9": 3.5 } } : stack)),
    };
    expect(draw(moved).images.find((entry) => entry.id === "p'")?.shape).toEqual({ kind: "point", x: 0, y: -2.5 });
  });
});
