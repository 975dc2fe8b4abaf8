import { describe, expect, it } from "vitest";
import { classifyPair, dirichletPosition } from "./classify";

const wall = { worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } };
const probe = { worldvolume: [1, 2, 3, 4], position: { "5": 0, "6": 0, "7": 0, "8": 0, "9": 3.5 } };

describe("dirichletPosition", () => {
  it("reads the position keyed by the axis number and defaults to 0", () => {
    expect(dirichletPosition(probe, 9)).toBe(3.5);
    expect(dirichletPosition(wall, 5)).toBe(0);
  });
});

describe("classifyPair", () => {
  it("classifies a D4 probe against a D8 wall axis by axis (product.md example)", () => {
    const r = classifyPair(wall, probe, 10);
    expect(r.axes.map((axis) => axis.type).join(" ")).toBe("NN NN NN NN ND ND ND ND DD");
    expect(r.nn).toBe(4);
    expect(r.dd).toBe(1);
    expect(r.nd).toBe(4);
    expect(r.dn).toBe(0);
    // nu counts every axis that is N for one stack and D for the other (Polchinski vol. 2, section 13.4, from memory).
    expect(r.nu).toBe(4);
    expect(r.separationVector).toEqual([{ axis: 9, delta: 3.5 }]);
    expect(r.separation).toBe(3.5);
  });

  it("swaps ND and DN when the order of the pair is reversed", () => {
    const forward = classifyPair(wall, probe, 10);
    const backward = classifyPair(probe, wall, 10);
    expect(backward.nd).toBe(forward.dn);
    expect(backward.dn).toBe(forward.nd);
    expect(backward.axes[4]?.type).toBe("DN");
    expect(backward.separation).toBe(forward.separation);
    expect(backward.separationVector).toEqual([{ axis: 9, delta: -3.5 }]);
  });

  it("records the endpoint positions only on Dirichlet ends", () => {
    const r = classifyPair(wall, probe, 10);
    expect(r.axes[4]).toEqual({ axis: 5, type: "ND", positionA: null, positionB: 0 });
    expect(r.axes[8]).toEqual({ axis: 9, type: "DD", positionA: 0, positionB: 3.5 });
  });

  it("measures y over DD axes only, ignoring offsets along ND axes (the Neumann end slides freely: common practice)", () => {
    // A D0 at x1 = 5 and a D1 along axis 1: the D0 sits on the D1's line, so y = 0 despite the offset.
    const d0 = { worldvolume: [], position: { "1": 5, "2": 3, "3": 4 } };
    const d1 = { worldvolume: [1], position: {} };
    const r = classifyPair(d0, d1, 10);
    expect(r.dn).toBe(1);
    // 3-4-5 triangle on the DD axes 2 and 3 (Pythagoras).
    expect(r.separation).toBe(5);
    expect(r.separationSquared).toBe(25);
  });

  it("counts nn + dd + nu = D - 1 spatial axes in the bosonic theory", () => {
    const r = classifyPair({ worldvolume: [1, 2, 3], position: {} }, { worldvolume: [3, 4], position: {} }, 26);
    expect(r.nn + r.dd + r.nu).toBe(25);
    expect(r.nn).toBe(1);
    expect(r.nd).toBe(2);
    expect(r.dn).toBe(1);
  });

  describe("edge cases", () => {
    it("gives nu = 0 and y = 0 for a stack with itself", () => {
      const r = classifyPair(probe, probe, 10);
      expect(r.nu).toBe(0);
      expect(r.separation).toBe(0);
      expect(r.nn).toBe(4);
      expect(r.dd).toBe(5);
    });

    it("handles two D0s (no NN spatial axis) and two D9s (no DD axis)", () => {
      const d0 = classifyPair({ worldvolume: [], position: {} }, { worldvolume: [], position: { "4": 2 } }, 10);
      expect(d0.nn).toBe(0);
      expect(d0.dd).toBe(9);
      expect(d0.separation).toBe(2);
      const all = [1, 2, 3, 4, 5, 6, 7, 8, 9];
      const d9 = classifyPair({ worldvolume: all, position: {} }, { worldvolume: all, position: {} }, 10);
      expect(d9.nn).toBe(9);
      expect(d9.separationVector).toEqual([]);
    });

    it("does not mutate its inputs", () => {
      const a = { worldvolume: [1, 2], position: { "3": 1 } };
      const copy = structuredClone(a);
      classifyPair(a, probe, 10);
      expect(a).toEqual(copy);
    });
  });
});
