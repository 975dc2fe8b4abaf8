import * as math from "mathjs";
import { describe, expect, it } from "vitest";
import { countSupercharges, gammaMatrix, nameSupersymmetry, toDenseMatrix, worldvolumeSupersymmetry } from "./supersymmetry";
import type { Stack } from "./types";

type Brane = Pick<Stack, "worldvolume" | "anti">;

const brane = (...worldvolume: number[]): Brane => ({ worldvolume, anti: false });
const antibrane = (...worldvolume: number[]): Brane => ({ worldvolume, anti: true });
const axes = (from: number, to: number): number[] => Array.from({ length: to - from + 1 }, (_, i) => from + i);

// mathjs as the reference library: dense complex matrices, products, inverses and traces.
const gamma = (mu: number): math.Matrix => math.matrix(toDenseMatrix(gammaMatrix(mu)).map((row) => row.map((z) => math.complex(z.re, z.im))));
const identity = math.identity(32) as math.Matrix;

function product(indices: readonly number[]): math.Matrix {
  return indices.reduce<math.Matrix>((acc, mu) => math.multiply(acc, gamma(mu)) as math.Matrix, identity);
}

function stackMatrix(stack: Brane): math.Matrix {
  const m = product([0, ...[...stack.worldvolume].sort((x, y) => x - y)]);
  return stack.anti ? (math.multiply(m, -1) as math.Matrix) : m;
}

const half = (m: math.Matrix): math.Matrix => math.multiply(math.add(identity, m), 0.5) as math.Matrix;
const traceOf = (m: math.Matrix): number => (math.complex(math.trace(m) as math.Complex | number) as math.Complex).re;

/**
 * Reference split: with commuting constraints, the preserved eps_R span the image of
 * P = (1 + Gamma_11)/2 prod_k (1 + Gamma_1^{-1} Gamma_k)/2, of dimension tr P; the positive worldvolume
 * chirality ones span the image of P (1 + Gamma_wv)/2. Independent of the engine's elimination.
 */
function referenceSplit(stacks: Brane[], worldvolume: number[]): { supercharges: number; positive: number } {
  const firstInverse = math.inv(stackMatrix(stacks[0] as Brane)) as math.Matrix;
  const constraints = stacks.slice(1).map((stack) => math.multiply(firstInverse, stackMatrix(stack)) as math.Matrix);
  for (const a of constraints) for (const b of constraints) {
    // The projector product is a projector only when the constraints commute; the cases below are chosen so.
    expect(math.deepEqual(math.multiply(a, b), math.multiply(b, a))).toBe(true);
  }
  const chirality = product([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
  const projector = constraints.reduce<math.Matrix>((acc, m) => math.multiply(acc, half(m)) as math.Matrix, half(chirality));
  const operator = product([0, ...worldvolume]);
  return {
    supercharges: Math.round(traceOf(projector)),
    positive: Math.round(traceOf(math.multiply(projector, half(operator)) as math.Matrix)),
  };
}

describe("worldvolumeSupersymmetry", () => {
  const cases: Array<[string, Brane[], number[]]> = [
    ["D1", [brane(1)], [1]],
    ["D1-D5", [brane(1), brane(...axes(1, 5))], [1]],
    ["D1-D9", [brane(1), brane(...axes(1, 9))], [1]],
    ["D1-anti-D9", [brane(1), antibrane(...axes(1, 9))], [1]],
    ["D5", [brane(...axes(1, 5))], axes(1, 5)],
    ["D5-D9", [brane(...axes(1, 5)), brane(...axes(1, 9))], axes(1, 5)],
    ["D1-D5-D9", [brane(1), brane(...axes(1, 5)), brane(...axes(1, 9))], [1]],
    ["D1 and two D5s", [brane(1), brane(1, 2, 3, 4, 5), brane(1, 2, 3, 6, 7)], [1]],
  ];

  it.each(cases)("agrees with the mathjs projector trace for %s", (_name, stacks, worldvolume) => {
    const reference = referenceSplit(stacks, worldvolume);
    const computed = worldvolumeSupersymmetry(stacks, worldvolume);
    expect(computed.supercharges).toBe(reference.supercharges);
    expect(computed.chirality?.positive).toBe(reference.positive);
    expect(computed.chirality?.negative).toBe(reference.supercharges - reference.positive);
  });

  it("gives D1 (8,8), D1-D5 (4,4) and D1-D9 (8,0), the chirality flipping with the D9's orientation", () => {
    // D-string: 2d (8,8); D1-D5: (4,4) (Strominger and Vafa 1996); D1 in D9s: chiral, as the type I
    // D-string (Polchinski and Witten 1996); all from memory.
    expect(worldvolumeSupersymmetry([brane(1)], [1]).chirality).toEqual({ positive: 8, negative: 8 });
    expect(worldvolumeSupersymmetry([brane(1), brane(...axes(1, 5))], [1]).chirality).toEqual({ positive: 4, negative: 4 });
    expect(worldvolumeSupersymmetry([brane(1), brane(...axes(1, 9))], [1]).chirality).toEqual({ positive: 8, negative: 0 });
    expect(worldvolumeSupersymmetry([brane(1), antibrane(...axes(1, 9))], [1]).chirality).toEqual({ positive: 0, negative: 8 });
  });

  it("swaps the split when eps_R takes the other 10d chirality", () => {
    // By hand: Gamma^0 maps one Weyl space to the other, commutes with the (even) constraints and
    // anticommutes with Gamma^0 Gamma^1, so it exchanges the two worldvolume chiralities.
    for (const [, stacks, worldvolume] of cases) {
      const plus = worldvolumeSupersymmetry(stacks, worldvolume).chirality;
      const minus = worldvolumeSupersymmetry(stacks, worldvolume, { chirality: -1 }).chirality;
      expect(minus).toEqual(plus ? { positive: plus.negative, negative: plus.positive } : null);
    }
  });

  it("counts like countSupercharges and gives no split outside 2d and 6d", () => {
    const stacks = [brane(1, 2, 3), brane(...axes(1, 7))];
    expect(worldvolumeSupersymmetry(stacks, [1, 2, 3])).toEqual({ supercharges: countSupercharges(stacks), chirality: null });
  });

  describe("edge cases", () => {
    it("rejects an empty list of stacks and invalid axes", () => {
      expect(() => worldvolumeSupersymmetry([], [1])).toThrow(RangeError);
      expect(() => worldvolumeSupersymmetry([brane(1)], [10])).toThrow(RangeError);
    });

    it("gives no split when the worldvolume chirality does not map the preserved spinors to themselves", () => {
      // By hand: with a D3 along 2, 3, 4 the constraint Gamma_1^{-1} Gamma_k is +-Gamma^{1234}, which shares
      // one index with Gamma^0 Gamma^1 and so anticommutes with it (the D3 does not fill the D1's worldvolume).
      expect(worldvolumeSupersymmetry([brane(1), brane(2, 3, 4)], [1]).chirality).toBeNull();
    });
  });
});

describe("nameSupersymmetry", () => {
  it("names the supersymmetry in the usual way for each dimension", () => {
    // Common practice: minimal spinors of 2 (1d, complex counting), 1 per chirality (2d), 2 (3d), 4 (4d),
    // 8 (5d), 8 per chirality (6d) and 16 (7d-10d) real components.
    expect(nameSupersymmetry(1, { supercharges: 16, chirality: null })).toBe("1d N=8");
    expect(nameSupersymmetry(1, { supercharges: 8, chirality: null })).toBe("1d N=4");
    expect(nameSupersymmetry(2, { supercharges: 8, chirality: { positive: 4, negative: 4 } })).toBe("2d (4,4)");
    expect(nameSupersymmetry(3, { supercharges: 8, chirality: null })).toBe("3d N=4");
    expect(nameSupersymmetry(4, { supercharges: 16, chirality: null })).toBe("4d N=4");
    expect(nameSupersymmetry(4, { supercharges: 4, chirality: null })).toBe("4d N=1");
    expect(nameSupersymmetry(5, { supercharges: 8, chirality: null })).toBe("5d N=1");
    expect(nameSupersymmetry(6, { supercharges: 8, chirality: { positive: 8, negative: 0 } })).toBe("6d (1,0)");
    expect(nameSupersymmetry(7, { supercharges: 16, chirality: null })).toBe("7d N=1");
    expect(nameSupersymmetry(10, { supercharges: 16, chirality: null })).toBe("10d N=1");
    expect(nameSupersymmetry(4, { supercharges: 0, chirality: null })).toBe("no supersymmetry");
  });

  describe("edge cases", () => {
    it("falls back to the count when it does not fit the dimension's spinors or the split is missing", () => {
      expect(nameSupersymmetry(5, { supercharges: 4, chirality: null })).toBe("5d, 4 supercharges");
      expect(nameSupersymmetry(2, { supercharges: 8, chirality: null })).toBe("2d, 8 supercharges");
      expect(nameSupersymmetry(6, { supercharges: 4, chirality: { positive: 4, negative: 0 } })).toBe("6d, 4 supercharges");
    });
  });
});
