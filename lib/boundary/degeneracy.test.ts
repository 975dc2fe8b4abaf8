import { combinations } from "mathjs";
import { describe, expect, it } from "vitest";

import { oscillatorDegeneracies, projectedDegeneracies, type OrientedCounts } from "./degeneracy";

/** The projected rows as a map from twice the level to the row. */
function byTwiceLevel(rows: readonly OrientedCounts[]): Map<number, OrientedCounts> {
  return new Map(rows.map((row) => [row.twiceLevel, row]));
}

/** Binomial coefficient from mathjs (the reference library), as a BigInt. */
function choose(n: number, k: number): bigint {
  return BigInt(combinations(n, k));
}

const typeIINus = [0, 2, 4, 6, 8] as const;

/**
 * Coefficient of q^n in prod_{k>=1} (1 - q^k)^-24 (OEIS A005758), by a route independent of the
 * engine's series products: the logarithmic derivative of the product gives
 * n a_n = 24 sum_{j=1..n} sigma(j) a_{n-j}, with sigma the divisor sum (common practice, from
 * memory; with 1 in place of 24 it is the divisor-sum recurrence of the partition numbers). The
 * test below also checks it on the OEIS values.
 */
function partitionsInto24Kinds(n: number): bigint {
  const sigma = Array.from({ length: n + 1 }, (_, j) => {
    let sum = 0n;
    for (let d = 1; d <= j; d += 1) if (j % d === 0) sum += BigInt(d);
    return sum;
  });
  const a: bigint[] = [1n];
  for (let m = 1; m <= n; m += 1) {
    let total = 0n;
    for (let j = 1; j <= m; j += 1) total += (sigma[j] ?? 0n) * (a[m - j] ?? 0n);
    a.push((24n * total) / BigInt(m));
  }
  return a[n] ?? 0n;
}

describe("oscillatorDegeneracies", () => {
  it("counts 1, 24, 324, 3200, 25650, 176256 states in the critical bosonic string", () => {
    const counts = oscillatorDegeneracies("bosonic", { dimension: 26, nu: 0, maxLevel: 5 });
    // OEIS A005758 (partitions into parts of 24 kinds), at levels 0..5.
    expect(counts.filter((_, index) => index % 2 === 0)).toEqual([1n, 24n, 324n, 3200n, 25650n, 176256n]);
    // No half-integer levels without ND axes: every boson is integer-moded (Polchinski vol. 2, section 13.4, from memory).
    expect(counts.filter((_, index) => index % 2 === 1).every((count) => count === 0n)).toBe(true);
  });

  it("has 24 massless vector states at level 1 of the critical bosonic string", () => {
    // alpha_{-1}^i |0> with i over the 24 transverse directions (Polchinski vol. 1, section 1.3, from memory).
    expect(oscillatorDegeneracies("bosonic", { dimension: 26, nu: 0, maxLevel: 1 })[2]).toBe(24n);
  });

  it("matches the oscillator-by-oscillator count at levels 1-3 for every bosonic dimension", () => {
    for (let dimension = 3; dimension <= 30; dimension += 1) {
      const d = dimension - 2;
      const counts = oscillatorDegeneracies("bosonic", { dimension, nu: 0, maxLevel: 3 });
      // Level 1: alpha_{-1}; level 2: alpha_{-2} or a symmetric pair of alpha_{-1};
      // level 3: alpha_{-3}, alpha_{-2} alpha_{-1}, or a symmetric triple (common practice; mathjs binomials).
      expect(counts[2]).toBe(BigInt(d));
      expect(counts[4]).toBe(BigInt(d) + choose(d + 1, 2));
      expect(counts[6]).toBe(BigInt(d) + BigInt(d * d) + choose(d + 2, 3));
    }
  });

  it("has half-integer levels in the bosonic string when nu > 0", () => {
    const counts = oscillatorDegeneracies("bosonic", { dimension: 26, nu: 8, maxLevel: 1 });
    // Level 1/2: alpha_{-1/2} on the 8 ND axes; level 1: 16 alpha_{-1} plus C(9, 2) = 36
    // symmetric pairs of alpha_{-1/2} (counting oscillators, common practice; mathjs binomial).
    expect(counts[1]).toBe(8n);
    expect(counts[2]).toBe(16n + choose(9, 2));
  });

  it("counts NS states before GSO oscillator by oscillator", () => {
    const counts = oscillatorDegeneracies("NS", { dimension: 10, nu: 0, maxLevel: 1.5 });
    // Level 0: the vacuum; 1/2: psi_{-1/2} (8); 1: alpha_{-1} (8) or two psi_{-1/2} (C(8, 2));
    // 3/2: psi_{-3/2}, psi_{-1/2} alpha_{-1}, three psi_{-1/2} (common practice; mathjs binomials).
    expect(counts).toEqual([1n, 8n, 8n + choose(8, 2), 8n + 64n + choose(8, 3)]);
  });

  it("has 16 R ground states from the 8 fermion zero modes at nu = 0", () => {
    // 2^(8/2) = 16: the 8_s + 8_c of Spin(8) before GSO (Polchinski vol. 2, 10.2, from memory).
    expect(oscillatorDegeneracies("R", { dimension: 10, nu: 0, maxLevel: 0 })).toEqual([16n]);
  });

  it("has a single R ground state and no zero modes at nu = 8", () => {
    const counts = oscillatorDegeneracies("R", { dimension: 10, nu: 8, maxLevel: 0.5 });
    // All eight R fermions are half-integer-moded on ND axes, so no zero modes and one ground state; level 1/2:
    // alpha_{-1/2} and psi_{-1/2} (8 + 8) (Polchinski vol. 2, section 13.4, from memory; common practice).
    expect(counts).toEqual([1n, 16n]);
  });

  it("computes the exact count at level 200, far beyond exact doubles", () => {
    const counts = oscillatorDegeneracies("bosonic", { dimension: 26, nu: 0, maxLevel: 200 });
    const top = counts[400] ?? 0n;
    expect(counts).toHaveLength(401);
    // The reference recurrence reproduces OEIS A005758 at levels 0..5 before it is trusted at 200.
    expect([0, 1, 2, 3, 4, 5].map(partitionsInto24Kinds)).toEqual([1n, 24n, 324n, 3200n, 25650n, 176256n]);
    expect(top).toBe(partitionsInto24Kinds(200));
    expect(top > 2n ** 53n).toBe(true); // Hardy-Ramanujan growth
  });
});

describe("projectedDegeneracies", () => {
  it("gives 8, 128, 1152 NS and R states at alpha' M^2 = 0, 1, 2 for nu = 0 brane-brane", () => {
    const ns = byTwiceLevel(projectedDegeneracies("NS", { nu: 0, sameOrientation: true, maxLevel: 2.5 }));
    const r = byTwiceLevel(projectedDegeneracies("R", { nu: 0, sameOrientation: true, maxLevel: 2 }));
    // NS levels 1/2, 3/2, 5/2 and R levels 0, 1, 2 give alpha' M^2 = 0, 1, 2 (a_NS = -1/2, a_R = 0).
    // Green, Schwarz and Witten vol. 1, chapter 4 (from memory): 8, 128, 1152 in each sector.
    expect([1, 3, 5].map((k) => ns.get(k)?.ab)).toEqual([8n, 128n, 1152n]);
    expect([0, 2, 4].map((k) => r.get(k)?.ab)).toEqual([8n, 128n, 1152n]);
    expect([1, 3, 5].map((k) => ns.get(k)?.ba)).toEqual([8n, 128n, 1152n]);
  });

  it("makes NS and R agree at every mass level to level 200 for nu = 0 brane-brane", () => {
    // Jacobi's identity theta_3^4 = theta_2^4 + theta_4^4 (Green, Schwarz and Witten vol. 1, chapter 4, from memory):
    // NS level N + 1/2 and R level N have the same alpha' M^2 = N.
    const ns = projectedDegeneracies("NS", { nu: 0, sameOrientation: true, maxLevel: 200.5 });
    const r = projectedDegeneracies("R", { nu: 0, sameOrientation: true, maxLevel: 200 });
    expect(ns).toHaveLength(201);
    expect(ns.map((row) => ({ ...row, twiceLevel: row.twiceLevel - 1 }))).toEqual(r);
  });

  it("removes the NS tachyon and keeps 8 massless states for nu = 0 brane-brane", () => {
    const rows = projectedDegeneracies("NS", { nu: 0, sameOrientation: true, maxLevel: 10 });
    // Odd fermion number only means half-integer NS levels (GSO projection: Green, Schwarz and Witten vol. 1,
    // chapter 4, from memory; Polchinski vol. 2, section 10.2, from memory).
    expect(rows.every((row) => row.twiceLevel % 2 === 1)).toBe(true);
    expect(rows[0]).toEqual({ twiceLevel: 1, ab: 8n, ba: 8n });
  });

  it("keeps the tachyon and removes the massless vector for nu = 0 brane-antibrane", () => {
    const rows = byTwiceLevel(projectedDegeneracies("NS", { nu: 0, sameOrientation: false, maxLevel: 10 }));
    // Tachyon at alpha' M^2 = -1/2 kept, massless vector removed (Banks and Susskind 1995, hep-th/9511194, from memory).
    expect(rows.get(0)).toEqual({ twiceLevel: 0, ab: 1n, ba: 1n });
    expect(rows.has(1)).toBe(false);
    // Level 1: alpha_{-1} (8) and pairs psi_{-1/2} psi_{-1/2} (C(8, 2)) have even F (counting oscillators,
    // common practice; mathjs binomial).
    expect(rows.get(2)?.ab).toBe(8n + choose(8, 2));
    expect([...rows.keys()].every((twiceLevel) => twiceLevel % 2 === 0)).toBe(true);
  });

  it("keeps half of each level in sectors with fermion zero modes, in both orientations", () => {
    // NS with nu >= 2 and R with nu <= 6 have fermion zero modes, on which Tr (-1)^F vanishes, so (-1)^F splits
    // each level in half (common practice; Polchinski vol. 2, section 13.4, from memory).
    const cases: Array<["NS" | "R", number]> = [
      ["NS", 2], ["NS", 4], ["NS", 6], ["NS", 8], ["R", 0], ["R", 2], ["R", 4], ["R", 6],
    ];
    for (const [sector, nu] of cases) {
      const full = oscillatorDegeneracies(sector, { dimension: 10, nu, maxLevel: 20 });
      for (const sameOrientation of [true, false]) {
        const rows = projectedDegeneracies(sector, { nu, sameOrientation, maxLevel: 20 });
        for (const row of rows) {
          const total = full[row.twiceLevel] ?? 0n;
          expect(row.ab).toBe(total / 2n);
          expect(row.ba).toBe(total / 2n);
          expect(row.ab + row.ba).toBe(total);
        }
        expect(rows).toHaveLength(full.filter((count) => count !== 0n).length);
      }
    }
  });

  it("makes NS and R agree level by level at nu = 4", () => {
    // a_NS = a_R = 0 and the D(p)-D(p+4) system is supersymmetric (Polchinski vol. 2, 13.4, from memory).
    for (const sameOrientation of [true, false]) {
      const ns = projectedDegeneracies("NS", { nu: 4, sameOrientation, maxLevel: 200 });
      const r = projectedDegeneracies("R", { nu: 4, sameOrientation, maxLevel: 200 });
      expect(ns).toHaveLength(401);
      expect(ns).toEqual(r);
    }
  });

  it("makes NS and R agree at nu = 8 except for one R ground state", () => {
    // a_NS = 1/2, a_R = 0, so NS level N meets R level N + 1/2 (Polchinski vol. 2, 13.4, from memory).
    for (const sameOrientation of [true, false]) {
      const ns = projectedDegeneracies("NS", { nu: 8, sameOrientation, maxLevel: 100 });
      const r = projectedDegeneracies("R", { nu: 8, sameOrientation, maxLevel: 100.5 });
      const [ground, ...excited] = r;
      expect(excited).toEqual(ns.map((row) => ({ ...row, twiceLevel: row.twiceLevel + 1 })));
      // Our documented convention: the R ground state is in "ab" for equal orientations, "ba" otherwise.
      expect(ground).toEqual(
        sameOrientation ? { twiceLevel: 0, ab: 1n, ba: 0n } : { twiceLevel: 0, ab: 0n, ba: 1n },
      );
    }
  });

  it("adds up to the unprojected count over both orientations at R nu = 8", () => {
    const full = oscillatorDegeneracies("R", { dimension: 10, nu: 8, maxLevel: 30 });
    for (const row of projectedDegeneracies("R", { nu: 8, sameOrientation: true, maxLevel: 30 })) {
      // (f + f_F)/2 + (f - f_F)/2 = f: the two orientations keep opposite halves (common practice).
      expect(row.ab + row.ba).toBe(full[row.twiceLevel]);
    }
  });

  it("differs from the q^(1/2) -> -q^(1/2) shortcut except in NS at nu = 0", () => {
    // The shortcut keeps whole integer (or half-integer) levels; that is the (-1)^F projection only for NS at
    // nu = 0, where F is the number of psi_{-r} and fixes the level's parity (common practice).
    const nsFull = oscillatorDegeneracies("NS", { dimension: 10, nu: 0, maxLevel: 10 });
    const nsShortcut = nsFull.map((count, index) => (index % 2 === 1 ? count : 0n));
    const ns = projectedDegeneracies("NS", { nu: 0, sameOrientation: true, maxLevel: 10 });
    expect(ns.map((row) => row.ab)).toEqual(nsShortcut.filter((count) => count !== 0n));

    const rFull = oscillatorDegeneracies("R", { dimension: 10, nu: 4, maxLevel: 10 });
    const r = byTwiceLevel(projectedDegeneracies("R", { nu: 4, sameOrientation: true, maxLevel: 10 }));
    expect(r.get(1)?.ab).toBe((rFull[1] ?? 0n) / 2n); // half of level 1/2 survives, not all or none
    expect(r.get(1)?.ab).not.toBe(rFull[1]);
  });

  it("returns an exact count at level 200", () => {
    const rows = projectedDegeneracies("R", { nu: 0, sameOrientation: true, maxLevel: 200 });
    const top = rows.at(-1);
    expect(top?.twiceLevel).toBe(400);
    expect((top?.ab ?? 0n) > 2n ** 53n).toBe(true);
    // Exactness: f is even at every level (each orientation gets an integer half).
    expect(top?.ab).toBe(top?.ba);
  });
});

describe("edge cases", () => {
  it("returns only the ground level for maxLevel 0", () => {
    expect(oscillatorDegeneracies("bosonic", { dimension: 26, nu: 0, maxLevel: 0 })).toEqual([1n]);
    expect(projectedDegeneracies("NS", { nu: 0, sameOrientation: true, maxLevel: 0 })).toEqual([]);
    expect(projectedDegeneracies("R", { nu: 0, sameOrientation: false, maxLevel: 0 })).toEqual([
      { twiceLevel: 0, ab: 8n, ba: 8n }, // half of the 16 R ground states, 8_s or 8_c (GSW vol. 1, chapter 4, from memory)
    ]);
  });

  it("has one state at every level when D = 2 has no transverse directions", () => {
    expect(oscillatorDegeneracies("bosonic", { dimension: 2, nu: 0, maxLevel: 1 })).toEqual([1n, 0n, 0n]);
  });

  it("rejects nu outside the allowed type II values", () => {
    for (const nu of [-2, 1, 3, 10, 2.5]) {
      expect(() => projectedDegeneracies("NS", { nu, sameOrientation: true, maxLevel: 1 })).toThrow(RangeError);
      expect(() => oscillatorDegeneracies("R", { dimension: 10, nu, maxLevel: 1 })).toThrow(RangeError);
    }
  });

  it("rejects NS and R outside ten dimensions, and bosonic nu beyond D - 1", () => {
    expect(() => oscillatorDegeneracies("NS", { dimension: 26, nu: 0, maxLevel: 1 })).toThrow(RangeError);
    expect(() => oscillatorDegeneracies("bosonic", { dimension: 26, nu: 26, maxLevel: 1 })).toThrow(RangeError);
    expect(() => oscillatorDegeneracies("NS", { dimension: 10, nu: 9, maxLevel: 1 })).toThrow(RangeError);
    expect(() => oscillatorDegeneracies("bosonic", { dimension: 1, nu: 0, maxLevel: 1 })).toThrow(RangeError);
  });

  it("rejects a maxLevel that is not a multiple of 1/2 in range", () => {
    for (const maxLevel of [-0.5, 0.25, 1000.5, Number.NaN]) {
      expect(() => oscillatorDegeneracies("bosonic", { dimension: 26, nu: 0, maxLevel })).toThrow(RangeError);
      expect(() => projectedDegeneracies("R", { nu: 0, sameOrientation: true, maxLevel })).toThrow(RangeError);
    }
  });

  it("rejects the bosonic sector in the GSO projection", () => {
    const bosonic = "bosonic" as "NS";
    expect(() => projectedDegeneracies(bosonic, { nu: 0, sameOrientation: true, maxLevel: 1 })).toThrow(RangeError);
  });

  it("only swaps the orientations when the orientation flag flips, except NS at nu = 0", () => {
    // An antibrane flips the sign of the GSO projection in the ab strings: it changes which half survives, not
    // how many (Polchinski vol. 2, section 13.4, from memory).
    for (const sector of ["NS", "R"] as const) {
      for (const nu of typeIINus) {
        if (sector === "NS" && nu === 0) continue;
        const same = projectedDegeneracies(sector, { nu, sameOrientation: true, maxLevel: 5 });
        const opposite = projectedDegeneracies(sector, { nu, sameOrientation: false, maxLevel: 5 });
        expect(opposite).toEqual(same.map((row) => ({ twiceLevel: row.twiceLevel, ab: row.ba, ba: row.ab })));
      }
    }
  });
});
