/**
 * Constants and conventions of the spectrum engine.
 *
 * Conventions, stated once for the whole engine:
 * - alpha' = 1; lengths (positions, separations y) in units of sqrt(alpha').
 * - Masses as alpha' M^2 = (y / 2 pi)^2 + N + a, with N the oscillator level (integer or
 *   half-integer) and a the zero-point energy of the sector (exact rational).
 * - Level series use t = q^(1/2): index k of a coefficient array is the level N = k / 2.
 * - Zero-point energies are regularised with the Riemann and Hurwitz zeta functions:
 *   sum_{n >= 1} n = zeta(-1) = -1/12 and sum_{n >= 0} (n + 1/2) = zeta(-1, 1/2) = 1/24.
 */

import type { Moding } from "./types";
import { rational, type Rational } from "./rational";

/**
 * Version stamped on every spectrum result; bump the minor version when numbers may change and the
 * patch version when only the presentation does.
 *
 * - 1.0.1: warnings in stack-id order.
 * - 1.1.0: `levels` is a mass cap, N + a <= levels at zero separation, in every sector (NS, R and
 *   bosonic rows stop at the same alpha' M^2; before, each sector stopped at oscillator level N =
 *   levels). New fields: `worldvolumes` (gauge and flavour groups, light matter, defects and the
 *   supersymmetry of each worldvolume), `Sector.multiplet` (the W-boson multiplet of separated
 *   identical stacks); the worldsheet fermion expansions and the light-cone axis come from
 *   `fermionExpansionLatex` and `lightConeAxis` (they need only the axis types). Bosonic pairs with every spatial
 *   axis ND are counted covariantly instead of listing no levels. Notes and massless descriptions
 *   for nu = 8 (string creation), D0 and D1 content; a D7 caution; conventions state M_s.
 * - 1.2.0 (file format 2), two additions in one version. Orientifold planes: image stacks and their
 *   sectors, the orientifold projection (`LevelRow.projected`, `Sector.orientifold`), SO and USp
 *   groups, the RR tadpole balance (`SpectrumResult.orientifold`); a plane counts in the
 *   supercharges. Results of configurations without planes are unchanged.
 *   Compact axes and Wilson lines: `Sector.compactAxes`, `Sector.tower` (momentum
 *   and winding states up to the mass cap) and `Sector.towerTruncated`; separations on circles are
 *   those of the nearest image, and Wilson lines shift the lightest momenta. Format 1 results are unchanged.
 * - 1.3.0: `AxisExpansion` stores the Dirichlet positions of the two ends (`positionA`, `positionB`)
 *   instead of the boson's LaTeX, which `bosonExpansionLatex` writes when it is shown: the same
 *   physics in results about a sixth smaller. Stored results of older engines are upgraded on read.
 *   V(y) (not stored) is computed one pair at a time (`interactionPairs`, `interactionCurve`) and,
 *   on circles, at the separation of the nearest image, as the pair's sector has it.
 *
 * @example
 * ENGINE_VERSION // => "1.3.0"
 */
export const ENGINE_VERSION = "1.3.0";

/**
 * Critical dimension of the bosonic string (Lorentz invariance of the light-cone quantisation
 * requires D - 2 = 24 transverse directions; Polchinski vol. 1, section 1.3, from memory).
 *
 * @example
 * bosonicCriticalDimension // => 26
 */
export const bosonicCriticalDimension = 26;

/**
 * Critical dimension of the type II superstrings (8 transverse directions; Polchinski vol. 2,
 * section 10.2, from memory).
 *
 * @example
 * superstringCriticalDimension // => 10
 */
export const superstringCriticalDimension = 10;

/**
 * Riemann zeta(-1) = -1/12, the regularised value of sum_{n >= 1} n (DLMF 25.6.3 with B_2 = 1/6).
 *
 * @example
 * formatRational(zetaMinusOne) // => "-1/12"
 */
export const zetaMinusOne: Rational = rational(-1, 12);

/**
 * Hurwitz zeta(-1, 1/2) = 1/24, the regularised value of sum_{n >= 0} (n + 1/2):
 * zeta(-1, x) = -B_2(x) / 2 (DLMF 25.11.14) with B_2(x) = x^2 - x + 1/6 (DLMF 24.2.5),
 * so zeta(-1, 1/2) = -(1/4 - 1/2 + 1/6) / 2 = 1/24.
 *
 * @example
 * formatRational(hurwitzZetaMinusOneHalf) // => "1/24"
 */
export const hurwitzZetaMinusOneHalf: Rational = rational(1, 24);

/**
 * Zero-point energy contributed by one transverse direction, by field and moding.
 *
 * A boson mode of frequency w contributes +w/2 and a fermion mode -w/2, so per direction:
 * - integer-moded boson: (1/2) zeta(-1) = -1/24
 * - half-integer-moded boson: (1/2) zeta(-1, 1/2) = +1/48
 * - integer-moded fermion: -(1/2) zeta(-1) = +1/24
 * - half-integer-moded fermion: -(1/2) zeta(-1, 1/2) = -1/48
 * (Polchinski vol. 2, section 13.4, from memory; derived from `zetaMinusOne` and
 * `hurwitzZetaMinusOneHalf`, and checked against them in `zero-point.test.ts`.)
 *
 * @example
 * formatRational(zeroPointPerDirection.boson.integer) // => "-1/24"
 */
export const zeroPointPerDirection: Readonly<Record<"boson" | "fermion", Readonly<Record<Moding, Rational>>>> = {
  boson: { integer: rational(-1, 24), "half-integer": rational(1, 48) },
  fermion: { integer: rational(1, 24), "half-integer": rational(-1, 48) },
};

/**
 * The conventions paragraph shown with every result and export, with a caution for authors.
 *
 * @example
 * CONVENTIONS_TEXT.startsWith("Conventions: alpha' = 1") // => true
 */
export const CONVENTIONS_TEXT =
  "Conventions: alpha' = 1; lengths (positions and separations y) are in units of sqrt(alpha'), " +
  "the string length. Masses are given as alpha' M^2 = (y / 2 pi)^2 + N + a, where N is the " +
  "oscillator level (integer or half-integer) and a the zero-point energy of the sector, from " +
  "zeta(-1) = -1/12 and zeta(-1, 1/2) = 1/24 (bosonic: a = -(D - 2)/24 + nu/16; NS: a = -1/2 + nu/8; " +
  "R: a = 0, with nu the number of ND/DN axes), and as M sqrt(alpha'); with a string scale " +
  "M_s = 1/sqrt(alpha') given in GeV, M in GeV is M sqrt(alpha') times M_s. Every sector lists its " +
  "states up to the same mass cap, N + a <= levels (alpha' M^2 at y = 0). Degeneracies are " +
  "light-cone trace counts of oscillator states after the GSO projection, per oriented string and " +
  "per Chan-Paton label (x^0 is paired with the lowest common Neumann axis, else the lowest common " +
  "Dirichlet axis, where the gauge is formal); bosonic pairs with every spatial axis ND are counted " +
  "covariantly. Worldsheet fermions: psi = +psi~ at a Neumann end and -psi~ at a Dirichlet end of " +
  "sigma = 0, the same times +1 (R) or -1 (NS) at sigma = pi. Continuous momentum along the common " +
  "Neumann directions is not included. " +
  "Caution: these are machine-computed results; anyone publishing them should check them independently.";
