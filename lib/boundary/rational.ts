/**
 * Exact rational arithmetic on BigInt, used for zero-point energies, levels and alpha' M^2.
 *
 * Normalisation: every `Rational` this module returns has `den > 0n` and `gcd(|num|, den) = 1`;
 * zero is `0/1`. Functions accept any `Rational` built by `rational` or `parseRational`.
 *
 * Invalid-input policy: a zero denominator (from `rational`, `parseRational` or a division by
 * zero) throws `RangeError`; a non-integer or unsafe JavaScript number throws `RangeError`;
 * text that is not of the form `[-+]digits[/digits]` throws `SyntaxError`.
 */

/** An exact rational number num/den, always normalised (den > 0, gcd(|num|, den) = 1). */
export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

/**
 * Builds a normalised rational from a numerator and an optional denominator.
 *
 * @param num - Numerator: a bigint or a safe integer number.
 * @param den - Denominator (default 1): a non-zero bigint or safe integer number; its sign moves to the numerator.
 * @returns The normalised rational num/den.
 * @throws RangeError when `den` is zero or either argument is a non-integer or unsafe number.
 * @example
 * rational(2, -4) // => { num: -1n, den: 2n }
 * rational(6n)    // => { num: 6n, den: 1n }
 */
export function rational(num: bigint | number, den: bigint | number = 1n): Rational {
  return normalise(toBigInt(num, "numerator"), toBigInt(den, "denominator"));
}

/**
 * Parses an exact rational from text such as "-1/2", "3" or "+4/6".
 *
 * @param text - Optional sign, decimal digits, optionally "/" and decimal digits; surrounding whitespace is ignored.
 * @returns The normalised rational.
 * @throws SyntaxError when the text has another form; RangeError when the denominator is zero.
 * @example
 * parseRational("-2/4") // => { num: -1n, den: 2n }
 * parseRational("3")    // => { num: 3n, den: 1n }
 */
export function parseRational(text: string): Rational {
  const match = /^\s*([+-]?\d+)(?:\s*\/\s*(\d+))?\s*$/.exec(text);
  if (!match || match[1] === undefined) {
    throw new SyntaxError(`Not a rational number: "${text}" (expected e.g. "-1/2" or "3")`);
  }
  return normalise(BigInt(match[1]), match[2] === undefined ? 1n : BigInt(match[2]));
}

/**
 * Adds two rationals exactly.
 *
 * @param a - First summand.
 * @param b - Second summand.
 * @returns a + b, normalised.
 * @example
 * formatRational(addRational(rational(1, 2), rational(1, 3))) // => "5/6"
 */
export function addRational(a: Rational, b: Rational): Rational {
  return normalise(a.num * b.den + b.num * a.den, a.den * b.den);
}

/**
 * Subtracts two rationals exactly.
 *
 * @param a - Minuend.
 * @param b - Subtrahend.
 * @returns a - b, normalised.
 * @example
 * formatRational(subtractRational(rational(1, 2), rational(1, 3))) // => "1/6"
 */
export function subtractRational(a: Rational, b: Rational): Rational {
  return normalise(a.num * b.den - b.num * a.den, a.den * b.den);
}

/**
 * Multiplies two rationals exactly.
 *
 * @param a - First factor.
 * @param b - Second factor.
 * @returns a * b, normalised.
 * @example
 * formatRational(multiplyRational(rational(-2, 3), rational(3, 4))) // => "-1/2"
 */
export function multiplyRational(a: Rational, b: Rational): Rational {
  return normalise(a.num * b.num, a.den * b.den);
}

/**
 * Divides two rationals exactly.
 *
 * @param a - Dividend.
 * @param b - Divisor (non-zero).
 * @returns a / b, normalised.
 * @throws RangeError when `b` is zero.
 * @example
 * formatRational(divideRational(rational(1, 2), rational(3))) // => "1/6"
 */
export function divideRational(a: Rational, b: Rational): Rational {
  if (b.num === 0n) throw new RangeError("Division of a rational by zero");
  return normalise(a.num * b.den, a.den * b.num);
}

/**
 * Negates a rational.
 *
 * @param a - The rational.
 * @returns -a (zero stays 0/1, never a negative zero).
 * @example
 * formatRational(negateRational(rational(1, 48))) // => "-1/48"
 */
export function negateRational(a: Rational): Rational {
  return { num: -a.num, den: a.den };
}

/**
 * Compares two rationals.
 *
 * @param a - Left operand.
 * @param b - Right operand.
 * @returns -1 when a < b, 0 when equal, 1 when a > b (usable as an `Array.prototype.sort` comparator).
 * @example
 * compareRational(rational(1, 3), rational(1, 2)) // => -1
 */
export function compareRational(a: Rational, b: Rational): -1 | 0 | 1 {
  // Denominators are positive, so cross-multiplying keeps the order.
  const left = a.num * b.den;
  const right = b.num * a.den;
  return left < right ? -1 : left > right ? 1 : 0;
}

/**
 * Tells whether a rational is strictly negative.
 *
 * @param a - The rational.
 * @returns True when a < 0.
 * @example
 * isNegativeRational(rational(-1, 2)) // => true
 */
export function isNegativeRational(a: Rational): boolean {
  return a.num < 0n;
}

/**
 * Tells whether a rational is zero.
 *
 * @param a - The rational.
 * @returns True when a = 0.
 * @example
 * isZeroRational(rational(0, 5)) // => true
 */
export function isZeroRational(a: Rational): boolean {
  return a.num === 0n;
}

/**
 * Tells whether a rational is an integer.
 *
 * @param a - The rational.
 * @returns True when the (normalised) denominator is 1.
 * @example
 * isIntegerRational(rational(4, 2)) // => true
 */
export function isIntegerRational(a: Rational): boolean {
  return a.den === 1n;
}

/**
 * Formats a rational as text: "num/den", or just "num" for integers.
 *
 * @param a - The rational.
 * @returns E.g. "-1/2", "3", "0"; `parseRational` reads it back.
 * @example
 * formatRational(rational(-3, 6)) // => "-1/2"
 * formatRational(rational(0, 7))  // => "0"
 */
export function formatRational(a: Rational): string {
  return a.den === 1n ? a.num.toString() : `${a.num.toString()}/${a.den.toString()}`;
}

/**
 * Converts a rational to a double (correct to within a few ulps).
 *
 * @param a - The rational.
 * @returns num/den as a JavaScript number; stays finite and accurate even when num and den
 *   separately exceed the double range.
 * @example
 * rationalToNumber(rational(-1, 2)) // => -0.5
 */
export function rationalToNumber(a: Rational): number {
  const direct = Number(a.num) / Number(a.den);
  if (Number.isFinite(direct) && direct !== 0) return direct;
  if (a.num === 0n) return 0;
  // Huge numerator and denominator overflow to Infinity/Infinity (or tiny results underflow):
  // scale so that the integer quotient keeps about 20 significant digits, then rescale.
  const shift = BigInt(a.den.toString(2).length - absBigInt(a.num).toString(2).length + 70);
  const scaled = shift >= 0n ? (a.num << shift) / a.den : a.num / (a.den << -shift);
  return Number(scaled) * 2 ** -Number(shift);
}

function normalise(num: bigint, den: bigint): Rational {
  if (den === 0n) throw new RangeError("Rational with a zero denominator");
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  const divisor = gcd(absBigInt(num), den);
  return { num: num / divisor, den: den / divisor };
}

function toBigInt(value: bigint | number, role: string): bigint {
  if (typeof value === "bigint") return value;
  if (!Number.isSafeInteger(value)) {
    throw new RangeError(`Rational ${role} must be a safe integer, got ${String(value)}`);
  }
  return BigInt(value);
}

function absBigInt(value: bigint): bigint {
  return value < 0n ? -value : value;
}

function gcd(a: bigint, b: bigint): bigint {
  // gcd(0, den) = den, so zero normalises to 0/1.
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}
