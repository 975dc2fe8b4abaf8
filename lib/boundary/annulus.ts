/**
 * The interaction energy of two parallel stacks from the one-loop annulus (cylinder) amplitude.
 *
 * Formula (alpha' = 1), per unit worldvolume of the pair's common p + 1 dimensions:
 *   V(y) = -(1/2) N_a N_b  integral_0^inf dt/t (8 pi^2 t)^(-(nn+1)/2) exp(-t y^2 / 2 pi) Z(t),
 * where nn is the number of common Neumann spatial axes (p for parallel Dp stacks) and Z(t) is the
 * GSO-projected open-string trace of (-1)^(spacetime fermion number) q^(N + a), q = e^(-2 pi t), summed
 * over both orientations of the string and taken per Chan-Paton label:
 *   Z = NS - R - s delta_{nu,0} NS_F,   s = +1 for the same orientation, -1 for brane-antibrane,
 * NS, R the traces before the projection and NS_F the NS trace with (-1)^F (physics.md, "GSO
 * projection"; the momentum integral over the nn + 1 common directions gives (8 pi^2 t)^(-(nn+1)/2)).
 *
 * Sign conventions: V < 0 is attraction (it falls as the stacks approach), V > 0 repulsion; the
 * energy is per unit (p+1)-volume, in string units (alpha' = 1).
 *
 * Evaluation. With f1 = eta, f2 = sqrt 2 q^(1/24) prod (1 + q^n), f3 = q^(-1/48) prod (1 + q^(n-1/2)),
 * f4 = q^(-1/48) prod (1 - q^(n-1/2)):
 *   NS = f3^(8-nu) f2^nu / (f1^(8-nu) f4^nu),  R = f2^(8-nu) f3^nu / (f1^(8-nu) f4^nu),  NS_F = f4^8 / f1^8.
 * - Open channel (t >= 1): Z as the level series of the engine's exact GSO-projected counts.
 * - Closed channel (t < 1): the modular transformation f1(t) = t^(-1/2) f1(1/t), f2 <-> f4, f3 <-> f3
 *   (Polchinski vol. 1, section 7.4 and vol. 2, section 13.4, from memory) gives
 *   Z(t) = t^((8-nu)/2) sum_{m >= 0} C_m e^(-2 pi m / t), with
 *   C_m = 2^(1 - nu/2) A_(2m+1) - s delta_{nu,0} 16 B_(2m), where A and B are exact integer series in
 *   x = e^(-pi / t): A = prod (1 + x^(2n-1))^(8-nu) (1 - x^(2n-1))^nu / [(1 - x^(2n))^(8-nu) (1 + x^(2n))^nu],
 *   B = prod ((1 + x^(2n)) / (1 - x^(2n)))^8. The difference of NS and R is taken in exact integers, so
 *   the cancellations of supersymmetric pairs are exact and nothing is lost to rounding at small t.
 * - The massless closed-string term C_0 t^((8-nu)/2) is integrated exactly over all t:
 *   integral_0^inf dt t^((dd-2)/2 - 1) e^(-t y^2 / 2 pi) = Gamma((dd - 2)/2) (2 pi / y^2)^((dd-2)/2),
 *   with dd = 9 - nn - nu common Dirichlet axes: the supergravity exchange, falling as y^-(dd-2).
 * - The rest is integrated with the trapezoidal rule in u = ln t on a fixed grid (step 1/8, u from
 *   -4 to 60): after the subtraction the integrand decays double-exponentially at both ends (as
 *   e^(-2 pi / t) for t -> 0 and e^(-t (y^2 - y_c^2) / 2 pi) for t -> inf), where the trapezoidal rule
 *   converges exponentially in 1/step (Trefethen and Weideman, SIAM Review 56 (2014), section 5, from memory).
 *   At y = y_c the tail falls only as a power of t, which the grid up to t = e^60 still covers.
 *
 * Limits: the integral diverges for y < y_c (the open-string tachyon: an instability, not a
 * potential), and for dd <= 2 with C_0 != 0 (closed strings spreading in two or fewer transverse
 * dimensions give V ~ log y or |y| up to an infinite constant): then no value is returned. The
 * bosonic string is not covered (its closed-string tachyon makes the amplitude diverge at small t).
 *
 * Invalid-input policy: RangeError for nu outside {0, 2, 4, 6, 8}, nn + nu > 9, or a negative or
 * non-finite separation.
 */

import { projectedDegeneracies } from "./degeneracy";
import { modeFactors, seriesProduct, type SeriesFactor } from "./series";

/** What the annulus depends on: the relative boundary conditions and orientations of the pair. */
export interface AnnulusShape {
  /** ND/DN axes of the pair: 0, 2, 4, 6 or 8. */
  nu: number;
  /** Common Neumann spatial axes (the momentum integral covers nn + 1 directions). */
  nn: number;
  /** True for brane-brane (or antibrane-antibrane), false for brane-antibrane. */
  sameOrientation: boolean;
}

/** The annulus integrand of one shape, prepared once for any number of separations. */
export interface AnnulusCurve {
  shape: AnnulusShape;
  /** Common Dirichlet axes, 9 - nn - nu: the closed strings spread in these. */
  dd: number;
  /** Critical separation 2 pi sqrt(-(N + a)) of the lightest surviving open-string state, or null. */
  criticalSeparation: number | null;
  /** Coefficient C_0 of the massless closed-string exchange (0 for supersymmetric pairs). */
  exchange: number;
  /** True when Z(t) vanishes identically (all coefficients of both channels are zero). */
  vanishes: boolean;
  /** Why V(y) is not a finite function for this shape, or null when it is (for y >= y_c). */
  undefinedReason: string | null;
  /**
   * V(y) per unit worldvolume for one Chan-Paton pair (multiply by N_a N_b); null below y_c or when
   * `undefinedReason` is set.
   */
  potential(y: number): number | null;
  /** Z(t) per Chan-Paton label, both orientations, from the open (t >= 1) or closed (t < 1) channel. */
  partition(t: number, channel?: "open" | "closed"): number;
}

/** Oscillator level to which both channel series are kept: terms beyond are below 1e-30 at t = 1. */
const seriesLevel = 14;
const gridStep = 1 / 8;
const gridStart = -4;
const gridEnd = 60;

/**
 * Prepares the annulus of a pair shape: exact series coefficients of both channels and the
 * quadrature nodes, so that each separation then costs one pass over the grid.
 *
 * @param shape - `nu` (0, 2, 4, 6, 8), `nn` (0..9 - nu) and `sameOrientation`.
 * @returns The curve; `potential(y)` in units of 1/alpha'^((p+1)/2) per Chan-Paton pair, V < 0 attractive.
 * @throws RangeError for an invalid shape (module policy).
 * @example
 * const curve = annulusCurve({ nu: 0, nn: 3, sameOrientation: false });
 * curve.criticalSeparation // => 4.442882938158366  (pi sqrt 2)
 * curve.potential(30)      // close to -1 / (pi^2 30^4), the supergravity attraction of a D3 and an anti-D3
 */
export function annulusCurve(shape: AnnulusShape): AnnulusCurve {
  const { nu, nn, sameOrientation } = shape;
  if (!Number.isInteger(nu) || nu < 0 || nu > 8 || nu % 2 !== 0) throw new RangeError(`nu must be 0, 2, 4, 6 or 8, got ${String(nu)}`);
  if (!Number.isInteger(nn) || nn < 0 || nn + nu > 9) throw new RangeError(`nn must be a whole number from 0 to ${9 - nu}, got ${String(nn)}`);
  const dd = 9 - nn - nu;
  const beta = (8 - nu) / 2;
  const open = openTerms(nu, sameOrientation);
  const closed = closedCoefficients(nu, sameOrientation);
  const exchange = closed[0] ?? 0;
  const vanishes = open.terms.length === 0 && closed.every((value) => value === 0);
  const lowest = open.lowest;
  const criticalSeparation = lowest < 0 ? 2 * Math.PI * Math.sqrt(-lowest) : null;
  const undefinedReason =
    exchange !== 0 && dd <= 2
      ? `The stacks share ${dd} Dirichlet ${dd === 1 ? "axis" : "axes"}: closed strings spreading in ${dd} transverse ` +
        `${dd === 1 ? "dimension" : "dimensions"} give V(y) ~ ${dd === 2 ? "log y" : "|y|"} up to an infinite constant, so only its changes (the force) are finite.`
      : null;

  const momentumPower = -(nn + 1) / 2;
  const nodes: { t: number; weight: number; closedRest: number; openNormalised: number; subtracted: number }[] = [];
  for (let u = gridStart; u <= gridEnd + 1e-9; u += gridStep) {
    const t = Math.exp(u);
    const weight = gridStep * Math.pow(8 * Math.PI * Math.PI * t, momentumPower);
    if (t < 1) {
      nodes.push({ t, weight, closedRest: closedRest(closed, beta, t), openNormalised: 0, subtracted: 0 });
    } else {
      nodes.push({ t, weight, closedRest: 0, openNormalised: openNormalised(open.terms, lowest, t), subtracted: exchange * Math.pow(t, beta) });
    }
  }

  function potential(y: number): number | null {
    if (!Number.isFinite(y) || y < 0) throw new RangeError(`The separation must be a finite number of at least 0, got ${String(y)}`);
    if (undefinedReason !== null) return null;
    if (vanishes) return 0;
    if (criticalSeparation !== null && y < criticalSeparation * (1 - 1e-12)) return null;
    if (y === 0 && exchange !== 0) return null;
    const stretch = (y * y) / (2 * Math.PI);
    // Clamped at 0 so that y = y_c, rounded a hair below, still takes the power-law tail.
    const rate = Math.max(stretch + 2 * Math.PI * lowest, 0);
    let sum = 0;
    for (const node of nodes) {
      const { t } = node;
      if (t < 1) {
        sum += node.weight * node.closedRest * Math.exp(-t * stretch);
      } else {
        if (t * rate > 800 && t * stretch > 800) break;
        sum += node.weight * (node.openNormalised * Math.exp(-t * rate) - node.subtracted * Math.exp(-t * stretch));
      }
    }
    if (exchange !== 0) {
      const a = (dd - 2) / 2;
      sum += exchange * Math.pow(8 * Math.PI * Math.PI, momentumPower) * gammaOfHalfInteger(a) * Math.pow((2 * Math.PI) / (y * y), a);
    }
    return -0.5 * sum;
  }

  function partition(t: number, channel?: "open" | "closed"): number {
    const useOpen = channel ? channel === "open" : t >= 1;
    if (useOpen) return openNormalised(open.terms, lowest, t) * Math.exp(-2 * Math.PI * t * lowest);
    return closedRest(closed, beta, t) + exchange * Math.pow(t, beta);
  }

  return { shape, dd, criticalSeparation, exchange, vanishes, undefinedReason, potential, partition };
}

/**
 * A memo of annulus curves by shape, for one computation over many pairs (pairs of the same
 * shape share one curve).
 *
 * @returns A function from shape to its (cached) curve.
 * @example
 * const curveOf = createAnnulusCache();
 * curveOf({ nu: 4, nn: 0, sameOrientation: true }).vanishes // => true
 */
export function createAnnulusCache(): (shape: AnnulusShape) => AnnulusCurve {
  const memo = new Map<string, AnnulusCurve>();
  return (shape) => {
    const key = `${shape.nu}|${shape.nn}|${shape.sameOrientation}`;
    let curve = memo.get(key);
    if (!curve) {
      curve = annulusCurve(shape);
      memo.set(key, curve);
    }
    return curve;
  };
}

/**
 * The supergravity value of the brane-antibrane potential at large separation, written as closed
 * string exchange: NS-NS attraction and R-R attraction (for an antibrane) each give
 * 2 kappa^2 tau_p^2 G_(9-p)(y), with tau_p^2 = (pi / kappa^2) (4 pi^2 alpha')^(3-p) and the Green's
 * function G_d(y) = Gamma((d-2)/2) / (4 pi^(d/2) y^(d-2)) (Polchinski vol. 1, section 8.7 and vol. 2,
 * section 13.3-13.4, from memory). Hence
 *   V(y) = -2 * 2 kappa^2 tau_p^2 G_(9-p)(y) = -pi (4 pi^2)^(3-p) Gamma((7-p)/2) pi^(-(9-p)/2) y^-(7-p),
 * per unit worldvolume for one brane and one antibrane (alpha' = 1), which the annulus reproduces up to
 * terms falling exponentially in y.
 *
 * @param p - Dimension of both stacks, 0..6 (p = 7, 8 have no fall-off).
 * @param y - Separation, > 0.
 * @returns V(y), negative (attraction).
 * @throws RangeError for p outside 0..6 or y <= 0.
 * @example
 * braneAntibraneSupergravity(3, 10) // => -1 / (pi^2 10^4)
 */
export function braneAntibraneSupergravity(p: number, y: number): number {
  if (!Number.isInteger(p) || p < 0 || p > 6) throw new RangeError(`p must be 0..6, got ${String(p)}`);
  if (!(y > 0)) throw new RangeError(`y must be positive, got ${String(y)}`);
  const d = 9 - p;
  const kappaSquaredTauSquared = Math.PI * Math.pow(4 * Math.PI * Math.PI, 3 - p);
  const green = gammaOfHalfInteger((d - 2) / 2) / (4 * Math.pow(Math.PI, d / 2) * Math.pow(y, d - 2));
  return -2 * 2 * kappaSquaredTauSquared * green;
}

/** Open-channel terms (exponent N + a, coefficient) of Z, and the lowest exponent with a non-zero coefficient. */
function openTerms(nu: number, sameOrientation: boolean): { terms: { exponent: number; coefficient: number }[]; lowest: number } {
  const byExponent = new Map<number, bigint>();
  const add = (kind: "NS" | "R", sign: bigint): void => {
    const zeroPoint = kind === "NS" ? -1 / 2 + nu / 8 : 0;
    for (const row of projectedDegeneracies(kind, { nu, sameOrientation, maxLevel: seriesLevel })) {
      const exponent = row.twiceLevel / 2 + zeroPoint;
      byExponent.set(exponent, (byExponent.get(exponent) ?? 0n) + sign * (row.ab + row.ba));
    }
  };
  add("NS", 1n);
  add("R", -1n);
  // NS and R are complete up to N + a = seriesLevel - 1/2 (a >= -1/2); beyond, one sector is cut.
  const terms = [...byExponent.entries()]
    .filter(([exponent, coefficient]) => coefficient !== 0n && exponent <= seriesLevel - 1 / 2)
    .map(([exponent, coefficient]) => ({ exponent, coefficient: Number(coefficient) }))
    .sort((x, y) => x.exponent - y.exponent);
  return { terms, lowest: terms[0]?.exponent ?? 0 };
}

/** Closed-channel coefficients C_0 .. C_seriesLevel (module doc), exact integers combined, then scaled. */
function closedCoefficients(nu: number, sameOrientation: boolean): number[] {
  const maxIndex = 2 * seriesLevel + 1;
  const aFactors: SeriesFactor[] = [
    ...modeFactors("half-integer", 1, 8 - nu, maxIndex),
    ...modeFactors("half-integer", -1, nu, maxIndex),
    ...modeFactors("integer", -1, -(8 - nu), maxIndex),
    ...modeFactors("integer", 1, -nu, maxIndex),
  ];
  const a = seriesProduct(aFactors, maxIndex);
  const b =
    nu === 0 ? seriesProduct([...modeFactors("integer", 1, 8, maxIndex), ...modeFactors("integer", -1, -8, maxIndex)], maxIndex) : null;
  const s = sameOrientation ? 1n : -1n;
  const coefficients: number[] = [];
  // 2^(1 - nu/2) A = 2 A / 2^(nu/2): combine 2 A_(2m+1) - s 16 2^(nu/2) B_(2m) exactly, then divide.
  const scale = 2 ** (nu / 2);
  for (let m = 0; m <= seriesLevel; m += 1) {
    const exact = 2n * (a[2 * m + 1] ?? 0n) - (b ? s * 16n * (b[2 * m] ?? 0n) : 0n);
    coefficients.push(Number(exact) / scale);
  }
  return coefficients;
}

/** t^beta sum_{m >= 1} C_m e^(-2 pi m / t): the closed channel less its massless term. */
function closedRest(coefficients: readonly number[], beta: number, t: number): number {
  const x = Math.exp((-2 * Math.PI) / t);
  let sum = 0;
  let power = x;
  for (let m = 1; m < coefficients.length; m += 1) {
    sum += (coefficients[m] ?? 0) * power;
    power *= x;
    if (power === 0) break;
  }
  return Math.pow(t, beta) * sum;
}

/** Z(t) e^(2 pi t lowest): the open channel divided by its leading exponential (bounded for t >= 1). */
function openNormalised(terms: readonly { exponent: number; coefficient: number }[], lowest: number, t: number): number {
  let sum = 0;
  for (const { exponent, coefficient } of terms) sum += coefficient * Math.exp(-2 * Math.PI * t * (exponent - lowest));
  return sum;
}

/** Gamma(a) for a positive multiple of 1/2, from Gamma(1/2) = sqrt(pi), Gamma(1) = 1 and Gamma(a + 1) = a Gamma(a). */
function gammaOfHalfInteger(a: number): number {
  let value = Number.isInteger(a) ? 1 : Math.sqrt(Math.PI);
  for (let x = Number.isInteger(a) ? 1 : 0.5; x < a - 1e-9; x += 1) value *= x;
  return value;
}
