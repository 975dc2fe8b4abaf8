import { zeta } from "mathjs";
import { describe, expect, it } from "vitest";

import {
  bosonicCriticalDimension,
  hurwitzZetaMinusOneHalf,
  superstringCriticalDimension,
  zeroPointPerDirection,
  zetaMinusOne,
} from "./constants";
import {
  addRational,
  formatRational,
  multiplyRational,
  negateRational,
  rational,
  rationalToNumber,
  subtractRational,
  type Rational,
} from "./rational";
import { zeroPointContributions, zeroPointEnergy } from "./zero-point";

const half = rational(1, 2);

/** Bernoulli polynomial B_2(x) = x^2 - x + 1/6 (DLMF 24.2.5), evaluated exactly. */
function bernoulliB2(x: Rational): Rational {
  return addRational(subtractRational(multiplyRational(x, x), x), rational(1, 6));
}

/** Hurwitz zeta(-1, x) = -B_2(x) / 2 (DLMF 25.11.14 with n = 1). */
function hurwitzZetaMinusOne(x: Rational): Rational {
  return multiplyRational(negateRational(bernoulliB2(x)), half);
}

describe("zeta values behind the constants", () => {
  it("has zeta(-1) = -1/12, as mathjs computes it", () => {
    // mathjs `zeta` is the reference library.
    expect(rationalToNumber(zetaMinusOne)).toBeCloseTo(zeta(-1), 10);
    expect(formatRational(zetaMinusOne)).toBe("-1/12"); // DLMF 25.6.3 with B_2 = 1/6
  });

  it("has zeta(-1, 1) = zeta(-1) from the Bernoulli polynomial", () => {
    // The Hurwitz function at x = 1 is the Riemann function (DLMF 25.11.2).
    expect(hurwitzZetaMinusOne(rational(1))).toEqual(zetaMinusOne);
  });

  it("has zeta(-1, 1/2) = 1/24 from B_2(1/2) = -1/12", () => {
    // DLMF 25.11.14 with 24.2.5.
    expect(hurwitzZetaMinusOne(half)).toEqual(hurwitzZetaMinusOneHalf);
    expect(formatRational(hurwitzZetaMinusOneHalf)).toBe("1/24");
  });

  it("derives every per-direction constant from the two zeta values", () => {
    // A boson mode of frequency w adds w/2 to the vacuum energy, a fermion mode -w/2 (common practice).
    expect(zeroPointPerDirection.boson.integer).toEqual(multiplyRational(zetaMinusOne, half));
    expect(zeroPointPerDirection.boson["half-integer"]).toEqual(multiplyRational(hurwitzZetaMinusOneHalf, half));
    expect(zeroPointPerDirection.fermion.integer).toEqual(negateRational(multiplyRational(zetaMinusOne, half)));
    expect(zeroPointPerDirection.fermion["half-integer"]).toEqual(
      negateRational(multiplyRational(hurwitzZetaMinusOneHalf, half)),
    );
    // Values quoted in physics.md: -1/24, +1/48, +1/24, -1/48 (Polchinski vol. 2, 13.4, from memory).
    expect(formatRational(zeroPointPerDirection.boson.integer)).toBe("-1/24");
    expect(formatRational(zeroPointPerDirection.boson["half-integer"])).toBe("1/48");
    expect(formatRational(zeroPointPerDirection.fermion.integer)).toBe("1/24");
    expect(formatRational(zeroPointPerDirection.fermion["half-integer"])).toBe("-1/48");
  });
});

describe("zeroPointEnergy", () => {
  it("gives a = -1 for the critical bosonic string", () => {
    // Bosonic open-string tachyon alpha' M^2 = -1 (Polchinski vol. 1, section 1.3, from memory).
    expect(formatRational(zeroPointEnergy("bosonic", { dimension: bosonicCriticalDimension, nu: 0 }))).toBe("-1");
  });

  it("gives a = -1/2 in NS and 0 in R at nu = 0", () => {
    // NS tachyon at alpha' M^2 = -1/2 before GSO, massless R ground state (Green, Schwarz and Witten vol. 1,
    // chapter 4, from memory; Polchinski vol. 2, section 10.2, from memory).
    expect(formatRational(zeroPointEnergy("NS", { dimension: 10, nu: 0 }))).toBe("-1/2");
    expect(formatRational(zeroPointEnergy("R", { dimension: 10, nu: 0 }))).toBe("0");
  });

  it("matches the closed bosonic formula a = -(D - 2)/24 + nu/16 for every D and nu", () => {
    // nu/16 = nu (1/48 + 1/24) per ND direction on top of -(D - 2)/24 (Polchinski vol. 2, section 13.4, from memory).
    for (let dimension = 2; dimension <= 30; dimension += 1) {
      for (let nu = 0; nu <= dimension - 2; nu += 1) {
        const closed = addRational(rational(-(dimension - 2), 24), rational(nu, 16));
        expect(zeroPointEnergy("bosonic", { dimension, nu })).toEqual(closed);
      }
    }
  });

  it("matches a = -1/2 + nu/8 (NS) and a = 0 (R) for every nu", () => {
    // Polchinski vol. 2, section 13.4, from memory.
    for (let nu = 0; nu <= 8; nu += 1) {
      const options = { dimension: superstringCriticalDimension, nu };
      expect(zeroPointEnergy("NS", options)).toEqual(addRational(rational(-1, 2), rational(nu, 8)));
      expect(zeroPointEnergy("R", options)).toEqual(rational(0));
    }
  });

  it("makes the NS sector massless at nu = 4 and gives 1/2 at nu = 8", () => {
    // nu = 4 is the supersymmetric D(p)-D(p+4) system (Polchinski vol. 2, 13.4, from memory).
    expect(formatRational(zeroPointEnergy("NS", { dimension: 10, nu: 4 }))).toBe("0");
    expect(formatRational(zeroPointEnergy("NS", { dimension: 10, nu: 8 }))).toBe("1/2");
  });

  it("gives a = -1/2 for a critical bosonic pair at nu = 8", () => {
    // -(24)/24 + 8/16 = -1/2 by the closed formula above (Polchinski vol. 2, section 13.4, from memory).
    expect(formatRational(zeroPointEnergy("bosonic", { dimension: 26, nu: 8 }))).toBe("-1/2");
  });
});

describe("zeroPointContributions", () => {
  it("lists the 24 integer-moded bosons of the critical bosonic string", () => {
    const rows = zeroPointContributions("bosonic", { dimension: 26, nu: 0 });
    expect(rows).toHaveLength(1);
    expect(rows[0]?.directions).toBe(24);
    expect(formatRational(rows[0]?.total ?? rational(0))).toBe("-1"); // 24 * (-1/24)
  });

  it("swaps the fermion moding on ND axes in NS", () => {
    const rows = zeroPointContributions("NS", { dimension: 10, nu: 2 });
    const summary = rows.map((row) => [row.field, row.moding, row.directions, formatRational(row.total)]);
    // 6 NN/DD + 2 ND directions; NS fermions integer-moded on ND axes (Polchinski vol. 2, section 13.4, from memory).
    // Totals: 6 (-1/24), 2 (1/48), 2 (1/24), 6 (-1/48), from the per-direction values checked above.
    expect(summary).toEqual([
      ["boson", "integer", 6, "-1/4"],
      ["boson", "half-integer", 2, "1/24"],
      ["fermion", "integer", 2, "1/12"],
      ["fermion", "half-integer", 6, "-1/8"],
    ]);
  });

  it("gives R fermions the same moding as the bosons in every direction", () => {
    for (let nu = 0; nu <= 8; nu += 2) {
      const rows = zeroPointContributions("R", { dimension: 10, nu });
      const bosons = rows.filter((row) => row.field === "boson").map((row) => [row.moding, row.directions]);
      const fermions = rows.filter((row) => row.field === "fermion").map((row) => [row.moding, row.directions]);
      // Worldsheet supersymmetry in R: psi and X have the same moding (common practice).
      expect(fermions).toEqual(bosons);
    }
  });

  it("counts D - 2 transverse directions per field", () => {
    for (const sector of ["NS", "R"] as const) {
      for (let nu = 0; nu <= 8; nu += 1) {
        const rows = zeroPointContributions(sector, { dimension: 10, nu });
        const count = (field: string) =>
          rows.filter((row) => row.field === field).reduce((sum, row) => sum + row.directions, 0);
        // D - 2 = 8 light-cone directions in ten dimensions (common practice).
        expect(count("boson")).toBe(8);
        expect(count("fermion")).toBe(8);
      }
    }
  });
});

describe("edge cases", () => {
  it("rejects a non-integer or too small dimension", () => {
    expect(() => zeroPointEnergy("bosonic", { dimension: 1, nu: 0 })).toThrow(RangeError);
    expect(() => zeroPointEnergy("bosonic", { dimension: 25.5, nu: 0 })).toThrow(RangeError);
  });

  it("rejects nu outside 0..D-2 (0..D-1 for bosonic, whose nu = D - 1 is counted covariantly)", () => {
    expect(() => zeroPointEnergy("bosonic", { dimension: 26, nu: 26 })).toThrow(RangeError);
    expect(() => zeroPointEnergy("NS", { dimension: 10, nu: 9 })).toThrow(RangeError);
    expect(() => zeroPointEnergy("bosonic", { dimension: 26, nu: -1 })).toThrow(RangeError);
    expect(() => zeroPointEnergy("NS", { dimension: 10, nu: 1.5 })).toThrow(RangeError);
  });

  it("rejects NS and R outside ten dimensions", () => {
    expect(() => zeroPointEnergy("NS", { dimension: 26, nu: 0 })).toThrow(RangeError);
    expect(() => zeroPointContributions("R", { dimension: 11, nu: 0 })).toThrow(RangeError);
  });

  it("has no transverse directions at D = 2, so a = 0", () => {
    expect(zeroPointContributions("bosonic", { dimension: 2, nu: 0 })).toEqual([]);
    expect(formatRational(zeroPointEnergy("bosonic", { dimension: 2, nu: 0 }))).toBe("0");
  });
});
