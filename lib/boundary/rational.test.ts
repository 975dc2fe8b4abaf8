import fc from "fast-check";
import { add, compare, fraction, multiply, subtract, type Fraction } from "mathjs";
import { describe, expect, it } from "vitest";

import {
  addRational,
  compareRational,
  divideRational,
  formatRational,
  isIntegerRational,
  isNegativeRational,
  isZeroRational,
  multiplyRational,
  negateRational,
  parseRational,
  rational,
  rationalToNumber,
  subtractRational,
  type Rational,
} from "./rational";

/** mathjs's Fraction (fraction.js) is the reference library for exact arithmetic. */
function toMathjs(a: Rational): Fraction {
  return fraction(formatRational(a));
}

function fromMathjs(f: Fraction): string {
  const sign = f.s < 0n && f.n !== 0n ? "-" : "";
  return f.d === 1n ? `${sign}${f.n.toString()}` : `${sign}${f.n.toString()}/${f.d.toString()}`;
}

/** Checks a binary operation against the mathjs (fraction.js) reference on random inputs. */
function expectAgreesWithMathjs(
  operation: (a: Rational, b: Rational) => Rational,
  reference: (a: Fraction, b: Fraction) => unknown,
): void {
  fc.assert(
    fc.property(smallRational, smallRational, (a, b) => {
      expect(formatRational(operation(a, b))).toBe(fromMathjs(reference(toMathjs(a), toMathjs(b)) as Fraction));
    }),
  );
}

const smallRational = fc
  .tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: 1, max: 1000 }), fc.boolean())
  .map(([num, den, flip]) => rational(num, flip ? -den : den));

describe("rational", () => {
  it("normalises sign and common factors", () => {
    expect(rational(2, -4)).toEqual({ num: -1n, den: 2n }); // hand-checked: 2/-4 = -1/2
    expect(rational(-6n, -9n)).toEqual({ num: 2n, den: 3n }); // hand-checked
  });

  it("defaults the denominator to 1", () => {
    expect(rational(7)).toEqual({ num: 7n, den: 1n });
  });

  it("keeps huge values exact", () => {
    const big = 10n ** 40n;
    expect(rational(big * 3n, big * 6n)).toEqual({ num: 1n, den: 2n }); // hand-checked
  });

  it("always returns a normalised value (gcd 1, positive denominator)", () => {
    fc.assert(
      fc.property(smallRational, (a) => {
        expect(a.den > 0n).toBe(true);
        // mathjs Fraction normalises the same way (reference library).
        expect(formatRational(a)).toBe(fromMathjs(toMathjs(a)));
      }),
    );
  });
});

describe("parseRational", () => {
  it("reads signed fractions and integers", () => {
    expect(parseRational("-1/2")).toEqual({ num: -1n, den: 2n });
    expect(parseRational("+4/6")).toEqual({ num: 2n, den: 3n }); // hand-checked
    expect(parseRational(" 3 ")).toEqual({ num: 3n, den: 1n });
  });

  it("round-trips formatRational", () => {
    fc.assert(
      fc.property(smallRational, (a) => {
        expect(parseRational(formatRational(a))).toEqual(a);
      }),
    );
  });
});

describe("addRational", () => {
  it("adds exactly", () => {
    expect(formatRational(addRational(rational(1, 2), rational(1, 3)))).toBe("5/6"); // hand-checked
  });

  it("agrees with mathjs fractions", () => expectAgreesWithMathjs(addRational, add));
});

describe("subtractRational", () => {
  it("subtracts exactly", () => {
    expect(formatRational(subtractRational(rational(1, 2), rational(1, 3)))).toBe("1/6"); // hand-checked
  });

  it("agrees with mathjs fractions", () => expectAgreesWithMathjs(subtractRational, subtract));
});

describe("multiplyRational", () => {
  it("multiplies exactly", () => {
    expect(formatRational(multiplyRational(rational(-2, 3), rational(3, 4)))).toBe("-1/2"); // hand-checked
  });

  it("agrees with mathjs fractions", () => expectAgreesWithMathjs(multiplyRational, multiply));
});

describe("divideRational", () => {
  it("divides exactly", () => {
    expect(formatRational(divideRational(rational(1, 2), rational(-3)))).toBe("-1/6"); // hand-checked
  });

  it("inverts multiplication", () => {
    fc.assert(
      fc.property(smallRational, smallRational, (a, b) => {
        fc.pre(!isZeroRational(b));
        expect(divideRational(multiplyRational(a, b), b)).toEqual(a);
      }),
    );
  });
});

describe("negateRational", () => {
  it("flips the sign", () => {
    expect(formatRational(negateRational(rational(1, 48)))).toBe("-1/48");
  });

  it("is its own inverse", () => {
    fc.assert(
      fc.property(smallRational, (a) => {
        expect(negateRational(negateRational(a))).toEqual(a);
      }),
    );
  });
});

describe("compareRational", () => {
  it("orders rationals", () => {
    expect(compareRational(rational(1, 3), rational(1, 2))).toBe(-1);
    expect(compareRational(rational(-1, 2), rational(-2, 3))).toBe(1); // hand-checked: -1/2 > -2/3
    expect(compareRational(rational(2, 4), rational(1, 2))).toBe(0);
  });

  it("agrees with mathjs compare", () => {
    fc.assert(
      fc.property(smallRational, smallRational, (a, b) => {
        expect(compareRational(a, b)).toBe(Number(compare(toMathjs(a), toMathjs(b)))); // mathjs reference
      }),
    );
  });
});

describe("isNegativeRational", () => {
  it("is true only below zero", () => {
    expect(isNegativeRational(rational(-1, 2))).toBe(true);
    expect(isNegativeRational(rational(0))).toBe(false);
    expect(isNegativeRational(rational(1, 2))).toBe(false);
  });
});

describe("isZeroRational", () => {
  it("is true only for zero", () => {
    expect(isZeroRational(rational(0, 5))).toBe(true);
    expect(isZeroRational(rational(1, 5))).toBe(false);
  });
});

describe("isIntegerRational", () => {
  it("is true when the denominator normalises to 1", () => {
    expect(isIntegerRational(rational(4, 2))).toBe(true);
    expect(isIntegerRational(rational(3, 2))).toBe(false);
  });
});

describe("formatRational", () => {
  it("writes fractions, integers and zero", () => {
    expect(formatRational(rational(-3, 6))).toBe("-1/2");
    expect(formatRational(rational(3))).toBe("3");
    expect(formatRational(rational(0, 7))).toBe("0");
  });
});

describe("rationalToNumber", () => {
  it("converts small values", () => {
    expect(rationalToNumber(rational(-1, 2))).toBe(-0.5);
    expect(rationalToNumber(rational(1, 3))).toBeCloseTo(0.3333333333333333, 15);
  });

  it("stays accurate when numerator and denominator overflow doubles", () => {
    const huge = 10n ** 400n;
    expect(rationalToNumber(rational(huge + 1n, 3n * huge))).toBeCloseTo(1 / 3, 15); // hand-checked
    expect(rationalToNumber(rational(1n, huge))).toBe(0); // 1e-400 underflows a double
  });
});

describe("edge cases", () => {
  it("throws RangeError for a zero denominator", () => {
    expect(() => rational(1, 0)).toThrow(RangeError);
    expect(() => parseRational("3/0")).toThrow(RangeError);
    expect(() => divideRational(rational(1), rational(0))).toThrow(RangeError);
  });

  it("throws RangeError for non-integer or unsafe numbers", () => {
    expect(() => rational(0.5)).toThrow(RangeError);
    expect(() => rational(1, Number.NaN)).toThrow(RangeError);
    expect(() => rational(2 ** 60)).toThrow(RangeError);
  });

  it("throws SyntaxError for malformed text", () => {
    expect(() => parseRational("")).toThrow(SyntaxError);
    expect(() => parseRational("1/2/3")).toThrow(SyntaxError);
    expect(() => parseRational("0.5")).toThrow(SyntaxError);
    expect(() => parseRational("1/-2")).toThrow(SyntaxError);
  });

  it("represents zero as 0/1 whatever the input", () => {
    expect(rational(0, -5)).toEqual({ num: 0n, den: 1n });
    expect(negateRational(rational(0))).toEqual({ num: 0n, den: 1n });
  });

  it("does not mutate its inputs", () => {
    const a = rational(1, 2);
    const b = rational(-1, 3);
    addRational(a, b);
    multiplyRational(a, b);
    expect(a).toEqual({ num: 1n, den: 2n });
    expect(b).toEqual({ num: -1n, den: 3n });
  });
});
