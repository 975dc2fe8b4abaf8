import { bignumber, combinations } from "mathjs";
import { describe, expect, it } from "vitest";

import {
  addSeries,
  divideSeriesExactly,
  evaluateSeries,
  maxSeriesIndex,
  modeFactors,
  multiplySeries,
  powerOfFactor,
  scaleSeries,
  seriesProduct,
  subtractSeries,
  type SeriesFactor,
} from "./series";

/** Coefficients of q^0..q^n of a series in t = q^(1/2) that only has integer levels. */
function integerLevels(series: readonly bigint[]): bigint[] {
  return series.filter((_, index) => index % 2 === 0);
}

/** prod_{n>=1} (1 - q^n)^exponent to level maxLevel, as a series in t. */
function eulerPower(exponent: number, maxLevel: number): bigint[] {
  return seriesProduct(modeFactors("integer", -1, exponent, 2 * maxLevel), 2 * maxLevel);
}

/** Theta functions from their sum forms (DLMF 20.2.2-20.2.4 at z = 0), in floating point. */
function thetaSums(q: number): { theta2: number; theta3: number; theta4: number } {
  let theta2 = 0;
  let theta3 = 1;
  let theta4 = 1;
  for (let n = 0; n < 400; n += 1) {
    theta2 += 2 * q ** ((n + 0.5) ** 2);
    if (n > 0) {
      theta3 += 2 * q ** (n * n);
      theta4 += 2 * (n % 2 === 0 ? 1 : -1) * q ** (n * n);
    }
  }
  return { theta2, theta3, theta4 };
}

describe("powerOfFactor", () => {
  it("expands (1 - t)^-24 into binomials C(23 + j, j), as mathjs computes them", () => {
    const series = powerOfFactor(1, -1, -24, 40);
    for (let j = 0; j <= 40; j += 1) {
      // mathjs `combinations` on BigNumbers is the reference library.
      expect(series[j]).toBe(BigInt(combinations(bignumber(23 + j), bignumber(j)).toFixed()));
    }
  });

  it("expands (1 + t^3)^8 into C(8, j) at t^(3j), as mathjs computes them", () => {
    const series = powerOfFactor(3, 1, 8, 30);
    for (let k = 0; k <= 30; k += 1) {
      const expected = k % 3 === 0 && k / 3 <= 8 ? BigInt(combinations(8, k / 3)) : 0n; // mathjs reference
      expect(series[k]).toBe(expected);
    }
  });

  it("alternates signs for (1 - t^2)^5", () => {
    // Binomial theorem: 1 - 5t^2 + 10t^4 - 10t^6 + 5t^8 - t^10 (hand-checked).
    expect(powerOfFactor(2, -1, 5, 12)).toEqual([1n, 0n, -5n, 0n, 10n, 0n, -10n, 0n, 5n, 0n, -1n, 0n, 0n]);
  });

  it("gives inverse series for opposite exponents", () => {
    const product = multiplySeries(powerOfFactor(1, 1, -7, 50), powerOfFactor(1, 1, 7, 50));
    expect(product).toEqual([1n, ...new Array<bigint>(50).fill(0n)]);
  });
});

describe("seriesProduct", () => {
  it("gives Ramanujan's tau from prod (1 - q^n)^24", () => {
    // q prod (1 - q^n)^24 = sum tau(n) q^n: 1, -24, 252, -1472, 4830, -6048, -16744 (OEIS A000594).
    expect(integerLevels(eulerPower(24, 6))).toEqual([1n, -24n, 252n, -1472n, 4830n, -6048n, -16744n]);
  });

  it("gives partitions into parts of 24 kinds from prod (1 - q^n)^-24", () => {
    // OEIS A005758: 1, 24, 324, 3200, 25650, 176256.
    expect(integerLevels(eulerPower(-24, 5))).toEqual([1n, 24n, 324n, 3200n, 25650n, 176256n]);
  });

  it("gives the partition numbers from prod (1 - q^n)^-1", () => {
    const partitions = integerLevels(eulerPower(-1, 200));
    // OEIS A000041: p(0..10) = 1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42.
    expect(partitions.slice(0, 11)).toEqual([1n, 1n, 2n, 3n, 5n, 7n, 11n, 15n, 22n, 30n, 42n]);
    expect(partitions[100]).toBe(190569292n); // p(100), OEIS A000041 (from memory)
    expect(partitions[200]).toBe(3972999029388n); // p(200), OEIS A000041 (from memory)
  });

  it("agrees with multiplying the factors one by one", () => {
    const factors: SeriesFactor[] = [
      { power: 1, sign: 1, exponent: 8 },
      { power: 2, sign: -1, exponent: -8 },
      { power: 3, sign: -1, exponent: 3 },
      { power: 4, sign: 1, exponent: -2 },
      { power: 4, sign: -1, exponent: 5 },
    ];
    const oneByOne = factors.reduce(
      (series, factor) => multiplySeries(series, powerOfFactor(factor.power, factor.sign, factor.exponent, 60)),
      powerOfFactor(1, 1, 0, 60),
    );
    expect(seriesProduct(factors, 60)).toEqual(oneByOne);
  });

  it("reproduces the theta-function sums numerically from their product forms", () => {
    // Jacobi triple product (DLMF 20.5.3, 20.5.5): theta_3 = prod (1 - t^2n)(1 + t^(2n-1))^2,
    // theta_4 = prod (1 - t^2n)(1 - t^(2n-1))^2 with nome t.
    const maxIndex = 400;
    const theta3 = seriesProduct(
      [...modeFactors("integer", -1, 1, maxIndex), ...modeFactors("half-integer", 1, 2, maxIndex)],
      maxIndex,
    );
    const theta4 = seriesProduct(
      [...modeFactors("integer", -1, 1, maxIndex), ...modeFactors("half-integer", -1, 2, maxIndex)],
      maxIndex,
    );
    for (const t of [0.1, 0.3, 0.6]) {
      expect(evaluateSeries(theta3, t)).toBeCloseTo(thetaSums(t).theta3, 10);
      expect(evaluateSeries(theta4, t)).toBeCloseTo(thetaSums(t).theta4, 10);
    }
  });

  it("satisfies Jacobi's identity theta_3^4 = theta_2^4 + theta_4^4 exactly to order t^400", () => {
    // Divided by prod (1 - t^2n)^4: prod (1 + t^(2n-1))^8 - prod (1 - t^(2n-1))^8 = 16 t prod (1 + t^2n)^8
    // (Whittaker and Watson 21.36; Green, Schwarz and Witten vol. 1, chapter 4; both from memory).
    const maxIndex = 400;
    const theta3Part = seriesProduct(modeFactors("half-integer", 1, 8, maxIndex), maxIndex);
    const theta4Part = seriesProduct(modeFactors("half-integer", -1, 8, maxIndex), maxIndex);
    const theta2Part = scaleSeries([0n, ...seriesProduct(modeFactors("integer", 1, 8, maxIndex - 1), maxIndex - 1)], 16n);
    expect(subtractSeries(theta3Part, theta4Part)).toEqual(theta2Part);
    expect(theta2Part[1]).toBe(16n); // leading term of theta_2^4 = 16 q + ... (DLMF 20.2.2)
  });
});

describe("Jacobi's identity (floating point)", () => {
  it("holds for the theta sums at several q", () => {
    // theta_3^4 = theta_2^4 + theta_4^4 (DLMF 20.7.1).
    for (const q of [0.05, 0.3, 0.6, 0.9]) {
      const { theta2, theta3, theta4 } = thetaSums(q);
      expect(theta3 ** 4).toBeCloseTo(theta2 ** 4 + theta4 ** 4, 8);
    }
  });
});

describe("modeFactors", () => {
  it("lists even powers for integer modes and odd powers for half-integer modes", () => {
    expect(modeFactors("integer", -1, -24, 6).map((factor) => factor.power)).toEqual([2, 4, 6]);
    expect(modeFactors("half-integer", 1, 8, 6).map((factor) => factor.power)).toEqual([1, 3, 5]);
  });

  it("returns no factors for exponent 0", () => {
    expect(modeFactors("integer", 1, 0, 10)).toEqual([]);
  });
});

describe("multiplySeries", () => {
  it("multiplies polynomials", () => {
    expect(multiplySeries([1n, 1n, 0n], [1n, -1n, 0n])).toEqual([1n, 0n, -1n]); // (1 + t)(1 - t)
  });

  it("is commutative", () => {
    const a = powerOfFactor(1, 1, -3, 20);
    const b = powerOfFactor(2, -1, 5, 20);
    expect(multiplySeries(a, b)).toEqual(multiplySeries(b, a));
  });
});

describe("scaleSeries", () => {
  it("multiplies every coefficient", () => {
    expect(scaleSeries([1n, -2n, 0n], 16n)).toEqual([16n, -32n, 0n]);
  });
});

describe("addSeries", () => {
  it("adds coefficientwise", () => {
    expect(addSeries([1n, 2n, 3n], [1n, -2n, 4n])).toEqual([2n, 0n, 7n]);
  });
});

describe("subtractSeries", () => {
  it("subtracts coefficientwise", () => {
    expect(subtractSeries([1n, 2n], [1n, -2n])).toEqual([0n, 4n]);
  });
});

describe("divideSeriesExactly", () => {
  it("halves even coefficients", () => {
    expect(divideSeriesExactly([2n, -4n, 0n], 2n)).toEqual([1n, -2n, 0n]);
  });
});

describe("evaluateSeries", () => {
  it("evaluates a polynomial", () => {
    expect(evaluateSeries([1n, 2n, 3n], 0.5)).toBeCloseTo(2.75, 15); // 1 + 1 + 0.75
  });
});

describe("edge cases", () => {
  it("returns the constant 1 for an empty product or maxIndex 0", () => {
    expect(seriesProduct([], 3)).toEqual([1n, 0n, 0n, 0n]);
    expect(seriesProduct(modeFactors("integer", -1, -24, 0), 0)).toEqual([1n]);
    expect(seriesProduct([{ power: 2, sign: 1, exponent: 0 }], 2)).toEqual([1n, 0n, 0n]);
  });

  it("truncates binary operations to the shorter series", () => {
    expect(addSeries([1n, 2n, 3n], [1n])).toEqual([2n]);
    expect(multiplySeries([1n, 1n], [1n, 1n, 1n])).toEqual([1n, 2n]);
  });

  it("rejects an invalid truncation index", () => {
    expect(() => seriesProduct([], -1)).toThrow(RangeError);
    expect(() => powerOfFactor(1, 1, 2, 2.5)).toThrow(RangeError);
    expect(() => seriesProduct([], maxSeriesIndex + 1)).toThrow(RangeError);
  });

  it("rejects invalid factors", () => {
    expect(() => powerOfFactor(0, 1, 2, 5)).toThrow(RangeError);
    expect(() => seriesProduct([{ power: 1.5, sign: 1, exponent: 1 }], 5)).toThrow(RangeError);
    expect(() => seriesProduct([{ power: 1, sign: 1, exponent: 0.5 }], 5)).toThrow(RangeError);
  });

  it("rejects an inexact division", () => {
    expect(() => divideSeriesExactly([2n, 3n], 2n)).toThrow(RangeError);
    expect(() => divideSeriesExactly([2n], 0n)).toThrow(RangeError);
  });

  it("does not mutate its inputs", () => {
    const a = [1n, 2n, 3n];
    const b = [4n, 5n, 6n];
    multiplySeries(a, b);
    addSeries(a, b);
    scaleSeries(a, 3n);
    expect(a).toEqual([1n, 2n, 3n]);
    expect(b).toEqual([4n, 5n, 6n]);
  });

  it("keeps level-200 coefficients exact beyond 2^53", () => {
    const coefficient = eulerPower(-24, 200)[400] ?? 0n;
    expect(coefficient > 2n ** 200n).toBe(true);
    // Exactness: the recurrence divides by k at every step; the result must stay an integer series
    // that inverts prod (1 - q^n)^24 (checked against the tau series above).
    const inverse = multiplySeries(eulerPower(-24, 200), eulerPower(24, 200));
    expect(inverse).toEqual([1n, ...new Array<bigint>(400).fill(0n)]);
  });
});
