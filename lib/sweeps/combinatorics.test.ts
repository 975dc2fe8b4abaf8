import * as mathjs from "mathjs";
import { bignumber, combinations, factorial } from "mathjs";
import { describe, expect, it } from "vitest";
import { binomial, multisetCount, rankMultiset, unrankMultiset } from "./combinatorics";

// mathjs ships combinationsWithRep (multisets of size k from n kinds) without a type declaration.
const { combinationsWithRep } = mathjs as unknown as { combinationsWithRep: (n: number, k: number) => number };

/** Every sequence in {0..n-1}^k (n^k of them). */
function allSequences(n: number, k: number): number[][] {
  const out: number[][] = [];
  const walk = (prefix: number[]) => {
    if (prefix.length === k) out.push(prefix);
    else for (let c = 0; c < n; c += 1) walk([...prefix, c]);
  };
  walk([]);
  return out;
}

/** Every permutation of 0..k-1. */
function permutations(k: number): number[][] {
  if (k === 0) return [[]];
  return permutations(k - 1).flatMap((p) => Array.from({ length: k }, (_u, i) => [...p.slice(0, i), k - 1, ...p.slice(i)]));
}

function cycleCount(permutation: number[]): number {
  const seen = new Set<number>();
  let cycles = 0;
  for (let start = 0; start < permutation.length; start += 1) {
    if (seen.has(start)) continue;
    cycles += 1;
    for (let i = start; !seen.has(i); i = permutation[i] ?? i) seen.add(i);
  }
  return cycles;
}

describe("binomial", () => {
  it("agrees with Pascal's rule and with mathjs", () => {
    for (let n = 0; n <= 20; n += 1) {
      for (let k = 1; k <= n; k += 1) {
        expect(binomial(BigInt(n), BigInt(k))).toBe(binomial(BigInt(n - 1), BigInt(k - 1)) + binomial(BigInt(n - 1), BigInt(k)));
      }
    }
    // mathjs as the reference library, in BigNumber arithmetic since C(60, 30) exceeds 2^53.
    expect(binomial(60n, 30n).toString()).toBe(combinations(bignumber(60), bignumber(30)).toFixed());
  });

  describe("edge cases", () => {
    it("is 0 outside 0 <= k <= n and 1 at the ends", () => {
      expect(binomial(3n, 5n)).toBe(0n);
      expect(binomial(3n, -1n)).toBe(0n);
      expect(binomial(7n, 0n)).toBe(1n);
      expect(binomial(7n, 7n)).toBe(1n);
    });
  });
});

describe("multisetCount", () => {
  it("is the multiset coefficient C(n + k - 1, k), checked against mathjs combinationsWithRep", () => {
    // mathjs combinationsWithRep(n, k) is the number of multisets of size k from n kinds.
    for (let s = 1; s <= 4; s += 1) {
      for (let k = 1; k <= 6; k += 1) {
        const n = 2 ** s;
        expect(multisetCount(BigInt(n), BigInt(k))).toBe(BigInt(combinationsWithRep(n, k)));
      }
    }
  });

  it("gives the tetrahedral numbers for two stacks (four columns): OEIS A000292", () => {
    // Two stacks give 2^2 = 4 column types; C(k + 3, k) for k = 1..6 is A000292: 4, 10, 20, 35, 56, 84.
    expect([1n, 2n, 3n, 4n, 5n, 6n].map((k) => multisetCount(4n, k))).toEqual([4n, 10n, 20n, 35n, 56n, 84n]);
  });

  it("counts the orbits of N/D tables under relabelling the axes, by brute force and by Burnside's lemma", () => {
    for (const [s, k] of [
      [1, 1],
      [1, 4],
      [2, 2],
      [2, 3],
      [3, 2],
      [2, 4],
      [3, 3],
    ] as const) {
      const n = 2 ** s;
      // Brute force: a table is its k columns; relabelling axes permutes them, so sort to canonicalise.
      const orbits = new Set(allSequences(n, k).map((columns) => [...columns].sort((a, b) => a - b).join(",")));
      // Burnside (any algebra text, e.g. Stanley vol. 1, section 7.24, from memory): the mean over
      // permutations of the tables each fixes, n^(number of cycles).
      const fixed = permutations(k).reduce((sum, p) => sum + n ** cycleCount(p), 0);
      const burnside = fixed / Number(factorial(k));
      expect(BigInt(orbits.size)).toBe(multisetCount(BigInt(n), BigInt(k)));
      expect(burnside).toBe(orbits.size);
    }
  });

  describe("edge cases", () => {
    it("counts one empty multiset and none from no kinds", () => {
      expect(multisetCount(4n, 0n)).toBe(1n);
      expect(multisetCount(0n, 3n)).toBe(0n);
    });
  });
});

describe("unrankMultiset", () => {
  it("lists every non-decreasing sequence exactly once, and rankMultiset inverts it", () => {
    for (const [n, k] of [
      [2, 3],
      [4, 3],
      [8, 2],
      [16, 3],
    ] as const) {
      const count = Number(multisetCount(BigInt(n), BigInt(k)));
      const seen = new Set<string>();
      for (let rank = 0; rank < count; rank += 1) {
        const sequence = unrankMultiset(rank, n, k);
        expect(sequence).toHaveLength(k);
        sequence.forEach((value, t) => {
          expect(value).toBeGreaterThanOrEqual(t === 0 ? 0 : (sequence[t - 1] ?? 0));
          expect(value).toBeLessThan(n);
        });
        expect(rankMultiset(sequence)).toBe(rank);
        seen.add(sequence.join(","));
      }
      expect(seen.size).toBe(count);
    }
  });

  it("reaches the first and last sequences", () => {
    expect(unrankMultiset(0, 4, 2)).toEqual([0, 0]);
    expect(unrankMultiset(9, 4, 2)).toEqual([3, 3]);
  });

  describe("edge cases", () => {
    it("refuses a rank outside the count", () => {
      expect(() => unrankMultiset(10, 4, 2)).toThrow(RangeError);
      expect(() => unrankMultiset(-1, 4, 2)).toThrow(RangeError);
      expect(() => unrankMultiset(0.5, 4, 2)).toThrow(RangeError);
    });
  });
});
