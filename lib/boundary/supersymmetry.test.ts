import fc from "fast-check";
import * as math from "mathjs";
import { describe, expect, it } from "vitest";
import {
  chiralityMatrix,
  countSupercharges,
  gammaMatrix,
  multiplyMonomial,
  pairPreservesSupersymmetry,
  stackGamma,
  toDenseMatrix,
  type GaussianInteger,
} from "./supersymmetry";
import type { Stack } from "./types";

type Brane = Pick<Stack, "worldvolume" | "anti">;

const brane = (...worldvolume: number[]): Brane => ({ worldvolume, anti: false });
const antibrane = (...worldvolume: number[]): Brane => ({ worldvolume, anti: true });

// Dense complex-integer matrices, multiplied here independently of `multiplyMonomial`.
type Dense = GaussianInteger[][];

function denseMultiply(a: Dense, b: Dense): Dense {
  const n = a.length;
  const out: Dense = [];
  for (let r = 0; r < n; r++) {
    const row: GaussianInteger[] = [];
    for (let c = 0; c < n; c++) {
      let re = 0;
      let im = 0;
      for (let k = 0; k < n; k++) {
        const x = a[r]![k]!;
        const y = b[k]![c]!;
        re += x.re * y.re - x.im * y.im;
        im += x.re * y.im + x.im * y.re;
      }
      row.push({ re, im });
    }
    out.push(row);
  }
  return out;
}

function denseAdd(a: Dense, b: Dense, sign = 1): Dense {
  return a.map((row, r) => row.map((x, c) => ({ re: x.re + sign * b[r]![c]!.re, im: x.im + sign * b[r]![c]!.im })));
}

function scaledIdentity(n: number, value: number): Dense {
  return Array.from({ length: n }, (_, r) =>
    Array.from({ length: n }, (_, c) => ({ re: r === c ? value : 0, im: 0 })),
  );
}

const denseGamma = (mu: number): Dense => toDenseMatrix(gammaMatrix(mu));

/** Gamma_stack built from dense gammas, independently of `stackGamma`. */
function denseStackGamma(stack: Brane): Dense {
  let product = denseGamma(0);
  for (const axis of [...stack.worldvolume].sort((x, y) => x - y)) product = denseMultiply(product, denseGamma(axis));
  return stack.anti ? product.map((row) => row.map((x) => ({ re: 0 - x.re, im: 0 - x.im }))) : product;
}

// Exact Gaussian rationals (re + i im) / den with BigInt parts, for a reference rank.
interface GaussianRational {
  re: bigint;
  im: bigint;
  den: bigint;
}

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function normalise(z: GaussianRational): GaussianRational {
  const g = gcd(gcd(z.re, z.im), z.den);
  if (g === 0n || g === 1n) return z;
  return { re: z.re / g, im: z.im / g, den: z.den / g };
}

const isZero = (z: GaussianRational): boolean => z.re === 0n && z.im === 0n;
const multiply = (a: GaussianRational, b: GaussianRational): GaussianRational =>
  normalise({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re, den: a.den * b.den });
const subtract = (a: GaussianRational, b: GaussianRational): GaussianRational =>
  normalise({ re: a.re * b.den - b.re * a.den, im: a.im * b.den - b.im * a.den, den: a.den * b.den });
function divide(a: GaussianRational, b: GaussianRational): GaussianRational {
  // 1 / ((x + i y) / d) = d (x - i y) / (x^2 + y^2)
  const norm = b.re * b.re + b.im * b.im;
  return multiply(a, normalise({ re: b.den * b.re, im: -b.den * b.im, den: norm }));
}

/** Rank by plain Gaussian elimination over Q(i), exact. */
function exactRank(rows: GaussianRational[][]): number {
  const m = rows.map((row) => [...row]);
  const columns = m[0]?.length ?? 0;
  let rank = 0;
  for (let c = 0; c < columns && rank < m.length; c++) {
    const pivotRow = m.findIndex((row, r) => r >= rank && !isZero(row[c]!));
    if (pivotRow < 0) continue;
    [m[rank], m[pivotRow]] = [m[pivotRow]!, m[rank]!];
    const pivot = m[rank]!;
    for (let r = rank + 1; r < m.length; r++) {
      const row = m[r]!;
      if (isZero(row[c]!)) continue;
      const factor = divide(row[c]!, pivot[c]!);
      for (let k = c; k < columns; k++) row[k] = subtract(row[k]!, multiply(factor, pivot[k]!));
    }
    rank++;
  }
  return rank;
}

/**
 * Reference count straight from the definition: eps_R in the positive Weyl space with
 * Gamma_k eps_R = Gamma_1 eps_R, i.e. the null space of the stacked (Gamma_k - Gamma_1)
 * restricted to the Weyl columns, by dense exact elimination.
 */
function referenceCount(stacks: Brane[]): number {
  if (stacks.length === 0) return 32;
  const chirality = toDenseMatrix(chiralityMatrix());
  const weyl = chirality.map((_, r) => r).filter((r) => chirality[r]![r]!.re === 1);
  const first = denseStackGamma(stacks[0]!);
  const rows: GaussianRational[][] = [];
  for (const stack of stacks.slice(1)) {
    const difference = denseAdd(denseStackGamma(stack), first, -1);
    for (const row of difference) {
      const restricted = weyl.map((c) => ({ re: BigInt(row[c]!.re), im: BigInt(row[c]!.im), den: 1n }));
      if (restricted.some((z) => !isZero(z))) rows.push(restricted);
    }
  }
  return weyl.length - (rows.length === 0 ? 0 : exactRank(rows));
}

/** Stacks of one p-parity (type II): a subset of axes 1..9, toggling axis 9 to fix the parity. */
function stacksOfParity(parity: 0 | 1, maxLength: number, minLength = 1): fc.Arbitrary<Brane[]> {
  const oneStack = fc
    .record({ axes: fc.subarray([1, 2, 3, 4, 5, 6, 7, 8, 9]), anti: fc.boolean() })
    .map(({ axes, anti }): Brane => {
      if (axes.length % 2 === parity) return { worldvolume: axes, anti };
      const toggled = axes.includes(9) ? axes.filter((a) => a !== 9) : [...axes, 9];
      return { worldvolume: toggled, anti };
    });
  return fc.array(oneStack, { minLength, maxLength });
}

const typeTwoStacks = (maxLength: number): fc.Arbitrary<Brane[]> =>
  fc.constantFrom<0 | 1>(0, 1).chain((parity) => stacksOfParity(parity, maxLength));

function inversions(values: number[]): number {
  let count = 0;
  for (let i = 0; i < values.length; i++) {
    for (let j = i + 1; j < values.length; j++) if (values[i]! > values[j]!) count++;
  }
  return count;
}

/**
 * Relabels spatial axis a as image[a - 1], keeping each stack's orientation: the stack stays a
 * brane when the relabelled axes, taken in the original ascending order, are an even permutation
 * of their sorted order, and becomes its antibrane otherwise.
 */
function relabelAxes(stacks: Brane[], image: number[]): Brane[] {
  return stacks.map((stack) => {
    const moved = [...stack.worldvolume].sort((x, y) => x - y).map((a) => image[a - 1]!);
    const odd = inversions(moved) % 2 === 1;
    return { worldvolume: [...moved].sort((x, y) => x - y), anti: stack.anti !== odd };
  });
}

describe("gammaMatrix", () => {
  it("has only entries 0, +-1 and +-i (one non-zero per row)", () => {
    for (let mu = 0; mu < 10; mu++) {
      const dense = denseGamma(mu);
      expect(dense.length).toBe(32);
      for (const row of dense) {
        const nonZero = row.filter((z) => z.re !== 0 || z.im !== 0);
        expect(nonZero.length).toBe(1);
        expect(Math.abs(nonZero[0]!.re) + Math.abs(nonZero[0]!.im)).toBe(1);
      }
    }
  });

  it("satisfies the Clifford algebra {Gamma^mu, Gamma^nu} = 2 eta^{mu nu}, eta = diag(-1, 1, ..., 1)", () => {
    // Definition of the Clifford algebra of SO(9,1), mostly-plus metric (common practice).
    for (let mu = 0; mu < 10; mu++) {
      for (let nu = 0; nu < 10; nu++) {
        const a = denseGamma(mu);
        const b = denseGamma(nu);
        const anticommutator = denseAdd(denseMultiply(a, b), denseMultiply(b, a));
        const eta = mu !== nu ? 0 : mu === 0 ? -1 : 1;
        expect(anticommutator).toEqual(scaledIdentity(32, 2 * eta));
      }
    }
  });

  it("agrees with mathjs matrix products on sample anticommutators", () => {
    // mathjs as reference library: {Gamma^0, Gamma^0} = -2, {Gamma^3, Gamma^8} = 0, {Gamma^9, Gamma^9} = 2.
    const toMath = (d: Dense): math.Matrix => math.matrix(d.map((row) => row.map((z) => math.complex(z.re, z.im))));
    const cases: [number, number, number][] = [
      [0, 0, -2],
      [3, 8, 0],
      [9, 9, 2],
    ];
    for (const [mu, nu, expected] of cases) {
      const a = toMath(denseGamma(mu));
      const b = toMath(denseGamma(nu));
      const sum = math.add(math.multiply(a, b), math.multiply(b, a)) as math.Matrix;
      const expectedMatrix = math.multiply(math.identity(32), expected) as math.Matrix;
      expect(math.deepEqual(sum, expectedMatrix)).toBe(true);
    }
  });

  describe("edge cases", () => {
    it("rejects indices outside 0..9", () => {
      expect(() => gammaMatrix(10)).toThrow(RangeError);
      expect(() => gammaMatrix(-1)).toThrow(RangeError);
      expect(() => gammaMatrix(1.5)).toThrow(RangeError);
    });
  });
});

describe("chiralityMatrix", () => {
  it("equals Gamma^0 Gamma^1 ... Gamma^9 and squares to 1", () => {
    // (Gamma^0 ... Gamma^9)^2 = (-1)^45 (Gamma^0)^2 = +1 in signature (9,1) (common practice).
    let product = denseGamma(0);
    for (let mu = 1; mu < 10; mu++) product = denseMultiply(product, denseGamma(mu));
    const chirality = toDenseMatrix(chiralityMatrix());
    expect(chirality).toEqual(product);
    expect(denseMultiply(chirality, chirality)).toEqual(scaledIdentity(32, 1));
  });

  it("anticommutes with every Gamma^mu and splits 32 into two Weyl spaces of 16", () => {
    // Gamma_11 anticommutes with each Gamma^mu in even dimension; Weyl spinors of SO(9,1) have 16 components (common practice).
    const chirality = toDenseMatrix(chiralityMatrix());
    for (let mu = 0; mu < 10; mu++) {
      const g = denseGamma(mu);
      expect(denseAdd(denseMultiply(chirality, g), denseMultiply(g, chirality))).toEqual(scaledIdentity(32, 0));
    }
    const diagonal = chirality.map((row, r) => row[r]!.re);
    expect(diagonal.filter((x) => x === 1).length).toBe(16);
    expect(diagonal.filter((x) => x === -1).length).toBe(16);
  });
});

describe("multiplyMonomial", () => {
  it("matches dense matrix multiplication", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 9 }), (mu, nu) => {
        const product = multiplyMonomial(gammaMatrix(mu), gammaMatrix(nu));
        expect(toDenseMatrix(product)).toEqual(denseMultiply(denseGamma(mu), denseGamma(nu)));
      }),
      { numRuns: 20 },
    );
  });
});

describe("stackGamma", () => {
  it("is Gamma^0 Gamma^{i1} ... Gamma^{ip} in ascending axis order, negated for an antibrane", () => {
    // physics.md convention, built here from the dense gammas.
    expect(toDenseMatrix(stackGamma(brane(4, 1, 2)))).toEqual(denseStackGamma(brane(1, 2, 4)));
    expect(toDenseMatrix(stackGamma(antibrane(3)))).toEqual(denseStackGamma(antibrane(3)));
  });

  describe("edge cases", () => {
    it("rejects axes outside 1..9 and repeated axes", () => {
      expect(() => stackGamma(brane(0))).toThrow(RangeError);
      expect(() => stackGamma(brane(10))).toThrow(RangeError);
      expect(() => stackGamma(brane(2, 2))).toThrow(RangeError);
    });
  });
});

describe("countSupercharges", () => {
  it("gives 32 in empty space", () => {
    // Type II: two Majorana-Weyl supercharges of 16 components (common practice).
    expect(countSupercharges([])).toBe(32);
  });

  it("gives 16 for a single stack of any dimension and orientation", () => {
    // A single D-brane is half-BPS (Polchinski vol. 2, section 13.4, from memory).
    expect(countSupercharges([brane()])).toBe(16);
    expect(countSupercharges([brane(1, 2, 3, 4)])).toBe(16);
    expect(countSupercharges([antibrane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(16);
    expect(countSupercharges([brane(2, 5, 7)])).toBe(16);
  });

  it("gives 8 for a pair with nu = 4, whatever the orientations", () => {
    // nu = 4 preserves a quarter of the supersymmetry (Polchinski vol. 2, section 13.4, from memory).
    expect(countSupercharges([brane(), brane(1, 2, 3, 4)])).toBe(8); // D0-D4
    expect(countSupercharges([brane(), antibrane(1, 2, 3, 4)])).toBe(8); // D0-anti-D4
    expect(countSupercharges([brane(1, 2), brane(1, 2, 3, 4, 5, 6)])).toBe(8); // D2-D6
    expect(countSupercharges([brane(1, 2, 3, 4), antibrane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(8); // D4-anti-D8
    expect(countSupercharges([brane(1), brane(1, 2, 3, 4, 5)])).toBe(8); // D1-D5 in IIB (common practice: 1/4 BPS)
    expect(countSupercharges([brane(1, 2, 3, 4), brane(3, 4, 5, 6)])).toBe(8); // D4s sharing axes 3, 4
    expect(countSupercharges([brane(1, 2, 3), antibrane(1, 4, 5)])).toBe(8); // D3s sharing axis 1
  });

  it("gives 8 for a pair with nu = 8, whatever the orientations", () => {
    // nu = 8 is supersymmetric as well (Polchinski vol. 2, section 13.4, from memory).
    expect(countSupercharges([brane(), brane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(8); // D0-D8
    expect(countSupercharges([brane(), antibrane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(8); // D0-anti-D8
    expect(countSupercharges([brane(9), brane(1, 2, 3, 4, 5, 6, 7, 8, 9)])).toBe(8); // D1-D9
    expect(countSupercharges([brane(1, 2, 3, 4), antibrane(5, 6, 7, 8)])).toBe(8); // orthogonal D4s
  });

  it("gives 0 for a pair with nu = 2 or 6", () => {
    // nu = 2 or 6 breaks all supersymmetry (Polchinski vol. 2, section 13.4, from memory).
    expect(countSupercharges([brane(), brane(1, 2)])).toBe(0); // D0-D2
    expect(countSupercharges([brane(), brane(1, 2, 3, 4, 5, 6)])).toBe(0); // D0-D6
    expect(countSupercharges([brane(1, 2, 3, 4), brane(1, 2, 3, 5)])).toBe(0); // D4s at nu = 2
    expect(countSupercharges([brane(1), antibrane(1, 2, 3)])).toBe(0); // D1-anti-D3
    expect(countSupercharges([brane(1, 2), brane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(0); // D2-D8, nu = 6
  });

  it("gives 16 for parallel stacks of the same orientation and 0 for a brane with its antibrane", () => {
    // No force between parallel BPS branes; brane-antibrane breaks everything (common practice).
    const near: Stack = { id: "a", label: "a", count: 2, anti: false, worldvolume: [1, 2, 3, 4], position: {} };
    const far: Stack = { ...near, id: "b", count: 5, position: { "5": 3.5, "9": -2 } };
    expect(countSupercharges([near, far])).toBe(16);
    expect(countSupercharges([near, { ...far, anti: true }])).toBe(0);
    expect(countSupercharges([brane(), antibrane()])).toBe(0); // D0-anti-D0
  });

  it("gives 4 for D0 + D4 + D8 with the D4 inside the D8", () => {
    // By hand: the constraints are Gamma^{1234} eps = eps and Gamma^{1...8} eps = eps; they commute,
    // square to 1 and are traceless on the Weyl space, so each halves 16: 4 (common practice: 1/8 BPS).
    expect(countSupercharges([brane(), brane(1, 2, 3, 4), brane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(4);
    expect(countSupercharges([brane(), antibrane(1, 2, 3, 4), brane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(4);
  });

  it("counts the whole configuration, not pair by pair", () => {
    // By hand: D0, D4 along 1234, D4 along 5678 impose Gamma^{1234} = 1 and Gamma^{5678} = 1, hence
    // Gamma^{1...8} = Gamma^{1234} Gamma^{5678} = 1. A D8 agrees (4 remain); an anti-D8 demands
    // Gamma^{1...8} = -1, so nothing survives although every pair is supersymmetric.
    const base = [brane(), brane(1, 2, 3, 4), brane(5, 6, 7, 8)];
    expect(countSupercharges([...base, brane(1, 2, 3, 4, 5, 6, 7, 8)])).toBe(4);
    const withAnti = [...base, antibrane(1, 2, 3, 4, 5, 6, 7, 8)];
    expect(countSupercharges(withAnti)).toBe(0);
    for (const a of withAnti) for (const b of withAnti) expect(pairPreservesSupersymmetry(a, b)).toBe(true);
  });

  it("agrees with dense exact Gaussian elimination over Q(i)", () => {
    fc.assert(
      fc.property(typeTwoStacks(4), (stacks) => {
        expect(countSupercharges(stacks)).toBe(referenceCount(stacks));
      }),
      { numRuns: 40 },
    );
  });

  it("does not depend on the order of the stacks (nor on which comes first)", () => {
    fc.assert(
      fc.property(
        typeTwoStacks(7).chain((stacks) =>
          fc.tuple(fc.constant(stacks), fc.shuffledSubarray(stacks, { minLength: stacks.length, maxLength: stacks.length })),
        ),
        ([stacks, shuffled]) => {
          expect(countSupercharges(shuffled)).toBe(countSupercharges(stacks));
        },
      ),
    );
  });

  it("does not depend on relabelling the spatial axes when each stack keeps its orientation", () => {
    const allAxes = [1, 2, 3, 4, 5, 6, 7, 8, 9];
    fc.assert(
      fc.property(typeTwoStacks(7), fc.shuffledSubarray(allAxes, { minLength: 9, maxLength: 9 }), (stacks, image) => {
        expect(countSupercharges(relabelAxes(stacks, image))).toBe(countSupercharges(stacks));
      }),
    );
  });

  it("does not depend on the chirality chosen for eps_R, nor on flipping every orientation", () => {
    fc.assert(
      fc.property(typeTwoStacks(7), (stacks) => {
        const count = countSupercharges(stacks);
        expect(countSupercharges(stacks, { chirality: -1 })).toBe(count);
        expect(countSupercharges(stacks.map((s) => ({ ...s, anti: !s.anti })))).toBe(count);
      }),
    );
  });

  it("never grows when a stack is added, and is unchanged by a copy of an existing stack", () => {
    fc.assert(
      fc.property(typeTwoStacks(6), fc.nat(), (stacks, pick) => {
        const count = countSupercharges(stacks);
        const copy = stacks[pick % stacks.length]!;
        expect(countSupercharges([...stacks, { ...copy }])).toBe(count);
        expect(count).toBeLessThanOrEqual(countSupercharges(stacks.slice(0, -1)));
      }),
    );
  });

  it("does not mutate its input", () => {
    const stacks = [brane(3, 1, 2), antibrane(5)];
    const before = JSON.stringify(stacks);
    countSupercharges(stacks);
    expect(JSON.stringify(stacks)).toBe(before);
  });

  describe("edge cases", () => {
    it("gives 0 when p-parities are mixed, since Gamma_1 eps and Gamma_k eps differ in chirality", () => {
      // Not a type II configuration (validation rejects it); documented policy of the function.
      expect(countSupercharges([brane(), brane(1)])).toBe(0);
    });

    it("relabelling axes without carrying orientation can change the count", () => {
      // By hand: swapping axes 4 and 5 turns the D8 along 1..8 into Gamma^0 Gamma^{12354678} = -Gamma_D8,
      // so keeping it a brane (sorted axes, anti false) changes the configuration: 4 becomes 0.
      const stacks = [brane(), brane(1, 2, 3, 4), brane(5, 6, 7, 8), brane(1, 2, 3, 4, 5, 6, 7, 8)];
      const naive = [brane(), brane(1, 2, 3, 5), brane(4, 6, 7, 8), brane(1, 2, 3, 4, 5, 6, 7, 8)];
      expect(countSupercharges(stacks)).toBe(4);
      expect(countSupercharges(naive)).toBe(0);
      expect(countSupercharges(relabelAxes(stacks, [1, 2, 3, 5, 4, 6, 7, 8, 9]))).toBe(4);
    });

    it("rejects invalid axes", () => {
      expect(() => countSupercharges([brane(), brane(11)])).toThrow(RangeError);
    });
  });
});

describe("pairPreservesSupersymmetry", () => {
  it("follows the nu rule for pairs", () => {
    // nu = 0 same orientation, 4, 8: yes; nu = 2, 6 or brane-antibrane at nu = 0: no
    // (Polchinski vol. 2, section 13.4, from memory).
    expect(pairPreservesSupersymmetry(brane(1, 2), brane(1, 2))).toBe(true);
    expect(pairPreservesSupersymmetry(brane(), antibrane(1, 2, 3, 4))).toBe(true);
    expect(pairPreservesSupersymmetry(antibrane(), brane(1, 2, 3, 4, 5, 6, 7, 8))).toBe(true);
    expect(pairPreservesSupersymmetry(brane(1, 2), antibrane(1, 2))).toBe(false);
    expect(pairPreservesSupersymmetry(brane(), brane(7, 8))).toBe(false);
    expect(pairPreservesSupersymmetry(brane(1), brane(1, 2, 3, 4, 5, 6, 7))).toBe(false);
  });

  it("is symmetric in its arguments", () => {
    fc.assert(
      fc.property(fc.constantFrom<0 | 1>(0, 1).chain((parity) => stacksOfParity(parity, 2, 2)), ([a, b]) => {
        if (!a || !b) throw new Error("two stacks expected");
        expect(pairPreservesSupersymmetry(a, b)).toBe(pairPreservesSupersymmetry(b, a));
      }),
    );
  });
});
