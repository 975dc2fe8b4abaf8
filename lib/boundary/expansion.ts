/**
 * Mode expansions of the open string on each spatial axis (physics.md, "Mode expansions").
 *
 * The string runs over sigma in [0, pi] from stack a (sigma = 0) to stack b (sigma = pi).
 * In the LaTeX, alpha' is kept as the symbol \alpha' so the formulas read as in the literature;
 * its value is 1 in the engine's units, and the substituted endpoint positions are numbers in
 * units of sqrt(alpha'). The four forms are the standard ones (Polchinski vol. 1, section 8.6 and
 * vol. 2, section 13.4, from memory):
 * - NN: X = x + 2 alpha' p tau + i sqrt(2 alpha') sum_{n != 0} (alpha_n / n) e^{-i n tau} cos(n sigma)
 * - DD: X = x_a + (x_b - x_a) sigma / pi + sqrt(2 alpha') sum_{n != 0} (alpha_n / n) e^{-i n tau} sin(n sigma)
 * - ND: X = x_b + i sqrt(2 alpha') sum_{r in Z + 1/2} (alpha_r / r) e^{-i r tau} cos(r sigma)
 * - DN: X = x_a + sqrt(2 alpha') sum_{r in Z + 1/2} (alpha_r / r) e^{-i r tau} sin(r sigma)
 *
 * Worldsheet fermions (type II), boundary-sign convention: at sigma = 0, psi = +psi~ on a Neumann
 * end and psi = -psi~ on a Dirichlet end; at sigma = pi the same sign times +1 in the R sector and
 * -1 in the NS sector (Polchinski vol. 2, sections 10.1 and 13.4, from memory). With
 * psi(tau, sigma) = sum_r psi_r e^{-i r (tau - sigma)} the boundary conditions fix
 * psi~(tau, sigma) = eta_0 sum_r psi_r e^{-i r (tau + sigma)}, eta_0 = +1 (N at sigma = 0) or -1 (D),
 * and e^{2 pi i r} = (sign at sigma = pi) eta_0, which gives r in Z + 1/2 in NS and r in Z in R on NN
 * and DD axes, and the other way on ND and DN axes. Normalisations are left out.
 *
 * Light-cone axis: the counting pairs time with one spatial axis of the pair, x^(+-) = x^0 +- x^k.
 * The engine takes the lowest NN axis, else the lowest DD axis (with no common Neumann axis the
 * light-cone gauge is formal and the counts are trace counts); a bosonic pair whose axes are all ND
 * has none (it is counted covariantly).
 */

import type { AxisClassification, PairClassification } from "./classify";
import { formatDecimal } from "./format";
import type { AxisExpansion, AxisType, Moding, Theory } from "./types";



/**
 * Moding of the boson X on an axis: integer on NN and DD, half-integer on ND and DN.
 *
 * @param type - The axis type of the ordered pair.
 * @returns "integer" or "half-integer".
 * @example
 * bosonModing("ND") // => "half-integer"
 */
export function bosonModing(type: AxisType): Moding {
  return type === "NN" || type === "DD" ? "integer" : "half-integer";
}

/**
 * Moding of the worldsheet fermion psi on an axis, per sector: on NN and DD axes half-integer
 * in NS and integer in R; on ND and DN axes the two swap.
 *
 * @param type - The axis type of the ordered pair.
 * @returns The moding in the NS and in the R sector.
 * @example
 * fermionModing("DD") // => { NS: "half-integer", R: "integer" }
 * fermionModing("DN") // => { NS: "integer", R: "half-integer" }
 */
export function fermionModing(type: AxisType): { NS: Moding; R: Moding } {
  return bosonModing(type) === "integer" ? { NS: "half-integer", R: "integer" } : { NS: "integer", R: "half-integer" };
}

/**
 * Mode expansion of one spatial axis of an ordered pair, with the endpoint positions substituted.
 *
 * @param axis - The classified axis (from `classifyPair`); positions in units of sqrt(alpha').
 * @param theory - Fermion modings and fermion zero modes are given for IIA/IIB only.
 * @returns Axis type, boson moding, fermion moding per sector (type II), the zero modes present
 *   ("x" and "p" on NN axes; for type II also the fermion zero modes "psi_0 (R)" on NN/DD axes or
 *   "psi_0 (NS)" on ND/DN axes), and the Dirichlet positions of the two ends. The LaTeX of
 *   X^axis(tau, sigma) comes from `bosonExpansionLatex`, the fermions' from `fermionExpansionLatex`.
 * @example
 * expandAxis({ axis: 5, type: "DD", positionA: 0, positionB: 3.5 }, "bosonic")
 * // => { axis: 5, type: "DD", bosonModing: "integer", zeroModes: [], positionA: 0, positionB: 3.5 }
 */
export function expandAxis(axis: AxisClassification, theory: Theory): AxisExpansion {
  const { type } = axis;
  const superstring = theory !== "bosonic";
  const zeroModes = type === "NN" ? ["x", "p"] : [];
  if (superstring) zeroModes.push(bosonModing(type) === "integer" ? "psi_0 (R)" : "psi_0 (NS)");
  const expansion: AxisExpansion = {
    axis: axis.axis,
    type,
    bosonModing: bosonModing(type),
    zeroModes,
    positionA: axis.positionA,
    positionB: axis.positionB,
  };
  if (superstring) expansion.fermionModing = fermionModing(type);
  return expansion;
}

/**
 * The worldsheet fermions psi and psi~ on one axis as LaTeX, per sector, in the boundary-sign
 * convention of the module doc (type II; normalisations left out).
 *
 * @param axis - The axis number and its type for the ordered pair (an `AxisExpansion` will do).
 * @returns LaTeX for the NS and the R sector; the same strings for every call with the same axis and type.
 * @example
 * fermionExpansionLatex({ axis: 5, type: "DD" }).NS
 * // => "\\psi^{5}(\\tau,\\sigma) = \\sum_{r\\in\\mathbb{Z}+1/2}\\psi^{5}_{r}e^{-ir(\\tau-\\sigma)},\\quad \\tilde\\psi^{5}(\\tau,\\sigma) = -\\sum_{r\\in\\mathbb{Z}+1/2}\\psi^{5}_{r}e^{-ir(\\tau+\\sigma)}"
 */
export function fermionExpansionLatex(axis: Pick<AxisClassification, "axis" | "type">): { NS: string; R: string } {
  const key = `${axis.axis}${axis.type}`;
  let cached = fermionCache.get(key);
  if (!cached) {
    const modings = fermionModing(axis.type);
    cached = { NS: fermionLatex(axis, modings.NS), R: fermionLatex(axis, modings.R) };
    fermionCache.set(key, cached);
  }
  // A copy, so that a caller changing one cannot change another.
  return { NS: cached.NS, R: cached.R };
}

/**
 * The light-cone partner of time for a classified pair: the lowest NN axis, else the lowest DD axis,
 * else none (every spatial axis ND: counted covariantly).
 *
 * @param classification - From `classifyPair(a, b, D)`, or a sector's `axes` as `{ axes }`.
 * @returns The axis number, or null.
 * @example
 * lightConeAxis(classifyPair(d3, d7, 10)) // => 1
 * lightConeAxis(classifyPair(d0, d0, 10)) // => 1 (a DD axis: the light-cone gauge is formal)
 */
export function lightConeAxis(classification: { axes: ReadonlyArray<Pick<AxisClassification, "axis" | "type">> }): number | null {
  const nn = classification.axes.find((axis) => axis.type === "NN");
  if (nn) return nn.axis;
  return classification.axes.find((axis) => axis.type === "DD")?.axis ?? null;
}

/**
 * Mode expansions of every spatial axis of a classified pair, in axis order.
 *
 * @param classification - From `classifyPair(a, b, D)`.
 * @param theory - The configuration's theory.
 * @returns One `AxisExpansion` per spatial axis 1..D-1.
 * @example
 * expandPair(classifyPair(a, a, 10), "IIB").length // => 9
 */
export function expandPair(classification: Pick<PairClassification, "axes">, theory: Theory): AxisExpansion[] {
  return classification.axes.map((axis) => expandAxis(axis, theory));
}

/**
 * The mode expansion X(tau, sigma) of one axis as LaTeX, with the endpoint positions substituted
 * (12 significant digits, trailing zeros trimmed; a negative one in parentheses when subtracted).
 * Results store the axis type and positions only (engine 1.3.0 on): the text is written here when
 * it is shown, as the fermions' is by `fermionExpansionLatex`.
 *
 * @param axis - An `AxisExpansion` (or a classified axis): its number, type and Dirichlet positions
 *   (a missing position reads as 0).
 * @returns The LaTeX of X^axis(tau, sigma).
 * @example
 * bosonExpansionLatex({ axis: 5, type: "DD", positionA: 0, positionB: 3.5 })
 * // => "X^{5}(\\tau,\\sigma) = 0 + (3.5 - 0)\\frac{\\sigma}{\\pi} + \\sqrt{2\\alpha'}\\sum_{n\\neq0}\\frac{\\alpha_n}{n}e^{-in\\tau}\\sin n\\sigma"
 */
export function bosonExpansionLatex(axis: Pick<AxisExpansion, "axis" | "type" | "positionA" | "positionB">): string {
  const lhs = `X^{${axis.axis}}(\\tau,\\sigma)`;
  const xa = formatDecimal(axis.positionA ?? 0);
  const xb = formatDecimal(axis.positionB ?? 0);
  switch (axis.type) {
    case "NN":
      return `${lhs} = x^{${axis.axis}} + 2\\alpha' p^{${axis.axis}}\\tau + i\\sqrt{2\\alpha'}\\sum_{n\\neq0}\\frac{\\alpha_n}{n}e^{-in\\tau}\\cos n\\sigma`;
    case "DD":
      return `${lhs} = ${xa} + (${xb} - ${parenthesiseNegative(xa)})\\frac{\\sigma}{\\pi} + \\sqrt{2\\alpha'}\\sum_{n\\neq0}\\frac{\\alpha_n}{n}e^{-in\\tau}\\sin n\\sigma`;
    case "ND":
      return `${lhs} = ${xb} + i\\sqrt{2\\alpha'}\\sum_{r\\in\\mathbb{Z}+1/2}\\frac{\\alpha_r}{r}e^{-ir\\tau}\\cos r\\sigma`;
    case "DN":
      return `${lhs} = ${xa} + \\sqrt{2\\alpha'}\\sum_{r\\in\\mathbb{Z}+1/2}\\frac{\\alpha_r}{r}e^{-ir\\tau}\\sin r\\sigma`;
  }
}

/** Fermion expansions depend only on the axis number and type (no positions): built once each. */
const fermionCache = new Map<string, { NS: string; R: string }>();

/** psi and psi~ on one axis in one sector (module doc: boundary-sign convention). */
function fermionLatex(axis: Pick<AxisClassification, "axis" | "type">, moding: Moding): string {
  const index = moding === "integer" ? "n" : "r";
  const range = moding === "integer" ? "\\mathbb{Z}" : "\\mathbb{Z}+1/2";
  const sum = `\\sum_{${index}\\in${range}}\\psi^{${axis.axis}}_{${index}}`;
  // eta_0: + for a Neumann end at sigma = 0, - for a Dirichlet end.
  const sign = axis.type === "NN" || axis.type === "ND" ? "" : "-";
  return (
    `\\psi^{${axis.axis}}(\\tau,\\sigma) = ${sum}e^{-i${index}(\\tau-\\sigma)},\\quad ` +
    `\\tilde\\psi^{${axis.axis}}(\\tau,\\sigma) = ${sign}${sum}e^{-i${index}(\\tau+\\sigma)}`
  );
}

function parenthesiseNegative(text: string): string {
  return text.startsWith("-") ? `(${text})` : text;
}
