/**
 * The mode expansions of a result as the interface shows them: the engine writes the classical
 * part of a Dirichlet end with the positions substituted as they are ("0 + (0 - 0)\frac{\sigma}{\pi}"),
 * and this reduces it exactly (decimal arithmetic on the written digits), so a string between
 * two ends at the origin reads as its oscillators alone and a stretched one as
 * "1 + 2.5\frac{\sigma}{\pi}". The text itself is written by `bosonExpansionLatex` (lib/boundary).
 *
 * Invalid-input policy: LaTeX that does not have the engine's shape is returned unchanged.
 */

const head = String.raw`^(X\^\{\d+\}\(\\tau,\\sigma\) = )`;
const number = String.raw`-?\d+(?:\.\d+)?(?:e[-+]?\d+)?`;
const maybeParenthesised = String.raw`(?:\((${number})\)|(${number}))`;
/** DD: x_a + (x_b - x_a) sigma / pi + oscillators. */
const stretched = new RegExp(`${head}(${number}) \\+ \\((${number}) - ${maybeParenthesised}\\)\\\\frac\\{\\\\sigma\\}\\{\\\\pi\\} \\+ (.*)$`, "s");
/** ND and DN: one end's position + oscillators. */
const fixedEnd = new RegExp(`${head}(${number}) \\+ ((?:i)?\\\\sqrt\\{2\\\\alpha'\\}.*)$`, "s");

/**
 * Simplifies the classical part of a boson's mode expansion.
 *
 * @param latex - A boson's expansion as `bosonExpansionLatex` writes it.
 * @returns The same expansion with zero terms dropped and x_b - x_a worked out exactly.
 * @example
 * simplifyExpansionLatex(String.raw`X^{9}(\tau,\sigma) = 0 + (0 - 0)\frac{\sigma}{\pi} + \sqrt{2\alpha'}\sum_{n\neq0}\frac{\alpha_n}{n}e^{-in\tau}\sin n\sigma`)
 * // => String.raw`X^{9}(\tau,\sigma) = \sqrt{2\alpha'}\sum_{n\neq0}\frac{\alpha_n}{n}e^{-in\tau}\sin n\sigma`
 */
export function simplifyExpansionLatex(latex: string): string {
  const dd = stretched.exec(latex);
  if (dd) {
    const [, lhs = "", xaText = "", xbText = "", xaAgainInParens, xaAgainBare, oscillators = ""] = dd;
    const xa = parseDecimal(xaText);
    const xb = parseDecimal(xbText);
    const xaAgain = parseDecimal(xaAgainInParens ?? xaAgainBare ?? "");
    if (!xa || !xb || !xaAgain || compareDecimal(xa, xaAgain) !== 0) return latex;
    const slope = subtractDecimal(xb, xa);
    const terms: Array<{ negative: boolean; text: string }> = [];
    if (xa.digits !== 0n) terms.push({ negative: xa.digits < 0n, text: printDecimal(absolute(xa)) });
    if (slope.digits !== 0n) {
      const magnitude = printDecimal(absolute(slope));
      terms.push({ negative: slope.digits < 0n, text: `${magnitude === "1" ? "" : magnitude}\\frac{\\sigma}{\\pi}` });
    }
    terms.push({ negative: false, text: oscillators });
    return lhs + terms.map((term, index) => (index === 0 ? `${term.negative ? "-" : ""}${term.text}` : ` ${term.negative ? "-" : "+"} ${term.text}`)).join("");
  }
  const end = fixedEnd.exec(latex);
  if (end) {
    const [, lhs = "", positionText = "", oscillators = ""] = end;
    const position = parseDecimal(positionText);
    if (position && position.digits === 0n) return `${lhs}${oscillators}`;
  }
  return latex;
}

/**
 * The Dirichlet positions of the two ends, read back from a boson's LaTeX as engines before 1.3.0
 * stored it (the upgrade step of stored results).
 *
 * @param type - The axis type the LaTeX was written for.
 * @param latex - The stored `X^{k}(\tau,\sigma) = ...` text.
 * @returns `{ positionA, positionB }` (null on a Neumann end), or null when the text does not have
 *   the engine's shape for that type.
 * @example
 * expansionEndPositions("DD", String.raw`X^{9}(\tau,\sigma) = 1 + (3.5 - 1)\frac{\sigma}{\pi} + \sqrt{2\alpha'}...`)
 * // => { positionA: 1, positionB: 3.5 }
 */
export function expansionEndPositions(
  type: "NN" | "DD" | "ND" | "DN",
  latex: string,
): { positionA: number | null; positionB: number | null } | null {
  if (type === "NN") return /^X\^\{\d+\}\(\\tau,\\sigma\) = x\^/.test(latex) ? { positionA: null, positionB: null } : null;
  if (type === "DD") {
    const dd = stretched.exec(latex);
    return dd ? { positionA: Number(dd[2]), positionB: Number(dd[3]) } : null;
  }
  const end = fixedEnd.exec(latex);
  if (!end) return null;
  const position = Number(end[2]);
  return type === "ND" ? { positionA: null, positionB: position } : { positionA: position, positionB: null };
}

/** digits x 10^-scale, exactly. */
interface Decimal {
  digits: bigint;
  scale: number;
}

function parseDecimal(text: string): Decimal | null {
  const match = /^(-?)(\d+)(?:\.(\d+))?(?:e([-+]?\d+))?$/.exec(text);
  if (!match) return null;
  const [, sign = "", whole = "", fraction = "", exponentText = "0"] = match;
  let digits = BigInt(`${whole}${fraction}`) * (sign === "-" ? -1n : 1n);
  let scale = fraction.length - Number(exponentText);
  if (scale < 0) {
    digits *= 10n ** BigInt(-scale);
    scale = 0;
  }
  return { digits, scale };
}

function align(a: Decimal, b: Decimal): [bigint, bigint, number] {
  const scale = Math.max(a.scale, b.scale);
  return [a.digits * 10n ** BigInt(scale - a.scale), b.digits * 10n ** BigInt(scale - b.scale), scale];
}

function subtractDecimal(a: Decimal, b: Decimal): Decimal {
  const [x, y, scale] = align(a, b);
  return { digits: x - y, scale };
}

function compareDecimal(a: Decimal, b: Decimal): number {
  const [x, y] = align(a, b);
  return x < y ? -1 : x > y ? 1 : 0;
}

function absolute(value: Decimal): Decimal {
  return { ...value, digits: value.digits < 0n ? -value.digits : value.digits };
}

function printDecimal({ digits, scale }: Decimal): string {
  const negative = digits < 0n;
  const text = (negative ? -digits : digits).toString().padStart(scale + 1, "0");
  const whole = text.slice(0, text.length - scale);
  const fraction = text.slice(text.length - scale).replace(/0+$/, "");
  return `${negative ? "-" : ""}${whole}${fraction ? `.${fraction}` : ""}`;
}
