/**
 * Zero-point energies a of the open-string sectors, summed direction by direction.
 *
 * Light-cone gauge: D - 2 transverse directions, of which `nu` are ND/DN (half-integer-moded
 * bosons) and D - 2 - nu are NN/DD (integer-moded bosons). Worldsheet fermions (type II only)
 * are half-integer-moded on NN/DD axes in NS and integer-moded in R; on ND/DN axes the modings
 * swap (physics.md, "Mode expansions"). Each direction contributes `zeroPointPerDirection`.
 *
 * Bosonic pairs with every spatial axis ND (nu = D - 1, e.g. a D25 with a D0) have no axis left
 * for the light-cone gauge; they are counted covariantly: the integer-moded X^0 with the b, c ghosts,
 * which cancel two integer-moded bosons, and nu half-integer-moded bosons. That is the light-cone
 * formula with D - 2 - nu = -1 integer-moded directions, so a = -(D - 2)/24 + nu/16 still holds
 * (-1 + 25/16 = 9/16 at D = 26; Polchinski vol. 1, section 4.4, from memory).
 *
 * Invalid-input policy (RangeError): `dimension` must be an integer >= 2; `nu` an integer with
 * 0 <= nu <= D - 2, or nu = D - 1 in the bosonic sector; the NS and R sectors need D = 10
 * (`superstringCriticalDimension`).
 */

import { superstringCriticalDimension, zeroPointPerDirection } from "./constants";
import { addRational, multiplyRational, rational, type Rational } from "./rational";
import type { Moding, SectorKind } from "./types";

/** Options of `zeroPointEnergy` and `zeroPointContributions`. */
export interface ZeroPointOptions {
  /** Spacetime dimension D (26 for the critical bosonic string, 10 for type II). */
  dimension: number;
  /** Number of ND/DN spatial axes of the pair (0 for a stack with itself). */
  nu: number;
}

/** The zero-point share of one group of transverse directions with the same field and moding. */
export interface ZeroPointContribution {
  /**
   * Worldsheet field: the boson X, the fermion psi, or (covariant bosonic count only) the b, c
   * ghosts, whose two towers contribute like minus two integer-moded bosons.
   */
  field: "boson" | "fermion" | "ghost";
  /** Moding of the field in these directions. */
  moding: Moding;
  /** Number of transverse directions in the group (always > 0). */
  directions: number;
  /** Contribution of one direction (e.g. -1/24 for an integer-moded boson). */
  perDirection: Rational;
  /** directions * perDirection. */
  total: Rational;
}

/**
 * Lists where the zero-point energy of a sector comes from: one row per field and moding.
 *
 * @param sector - "bosonic", "NS" or "R".
 * @param options - `dimension` D and `nu` (number of ND/DN axes).
 * @returns Boson rows first (integer, then half-integer), then fermion rows (NS and R only);
 *   groups with no directions are left out, so the bosonic D = 26, nu = 0 case has one row. For a
 *   bosonic pair with nu = D - 1 (covariant count) the rows are X^0 (one integer-moded boson), the
 *   nu half-integer-moded bosons and the ghosts (2 directions of +1/24 each).
 * @throws RangeError for an invalid dimension or nu (see the module policy).
 * @example
 * zeroPointContributions("NS", { dimension: 10, nu: 0 }).map((row) => [row.field, row.moding, row.directions, formatRational(row.total)])
 * // => [["boson", "integer", 8, "-1/3"], ["fermion", "half-integer", 8, "-1/6"]]
 */
export function zeroPointContributions(sector: SectorKind, options: ZeroPointOptions): ZeroPointContribution[] {
  const { dimension, nu } = options;
  assertValidOptions(sector, dimension, nu);
  const transverse = dimension - 2;
  // NN/DD directions carry the "untwisted" modings; ND/DN directions the swapped ones.
  const groups: Array<[ZeroPointContribution["field"], Moding, number]> =
    nu === dimension - 1
      ? [
          ["boson", "integer", 1],
          ["boson", "half-integer", nu],
          ["ghost", "integer", 2],
        ]
      : [
          ["boson", "integer", transverse - nu],
          ["boson", "half-integer", nu],
        ];
  if (sector === "NS") {
    groups.push(["fermion", "integer", nu], ["fermion", "half-integer", transverse - nu]);
  } else if (sector === "R") {
    groups.push(["fermion", "integer", transverse - nu], ["fermion", "half-integer", nu]);
  }
  return groups
    .filter(([, , directions]) => directions > 0)
    .map(([field, moding, directions]) => {
      // A ghost tower cancels an integer-moded boson: -(-1/24) per direction.
      const perDirection =
        field === "ghost" ? multiplyRational(rational(-1), zeroPointPerDirection.boson.integer) : zeroPointPerDirection[field][moding];
      return { field, moding, directions, perDirection, total: multiplyRational(rational(directions), perDirection) };
    });
}

/**
 * Zero-point energy a of a sector, as the exact sum of its per-direction contributions.
 *
 * Agrees with the closed forms a = -(D - 2)/24 + nu/16 (bosonic, also at nu = D - 1 with the
 * covariant count), -1/2 + nu/8 (NS) and 0 (R) (Polchinski vol. 2, section 13.4, from memory);
 * `zero-point.test.ts` checks the agreement.
 *
 * @param sector - "bosonic", "NS" or "R".
 * @param options - `dimension` D and `nu` (number of ND/DN axes).
 * @returns a as a normalised rational (alpha' M^2 = (y / 2 pi)^2 + N + a).
 * @throws RangeError for an invalid dimension or nu (see the module policy).
 * @example
 * formatRational(zeroPointEnergy("bosonic", { dimension: 26, nu: 0 })) // => "-1"
 * formatRational(zeroPointEnergy("NS", { dimension: 10, nu: 0 }))      // => "-1/2"
 */
export function zeroPointEnergy(sector: SectorKind, options: ZeroPointOptions): Rational {
  return zeroPointContributions(sector, options).reduce<Rational>(
    (sum, row) => addRational(sum, row.total),
    rational(0),
  );
}

function assertValidOptions(sector: SectorKind, dimension: number, nu: number): void {
  if (!Number.isInteger(dimension) || dimension < 2) {
    throw new RangeError(`Dimension must be an integer of at least 2, got ${String(dimension)}`);
  }
  if (sector !== "bosonic" && dimension !== superstringCriticalDimension) {
    throw new RangeError(`The ${sector} sector needs D = ${superstringCriticalDimension}, got ${String(dimension)}`);
  }
  // Light-cone gauge uses two of the directions that are Neumann (or Dirichlet) at both ends;
  // a bosonic pair with every spatial axis ND is counted covariantly instead.
  const highest = sector === "bosonic" ? dimension - 1 : dimension - 2;
  if (!Number.isInteger(nu) || nu < 0 || nu > highest) {
    throw new RangeError(`nu must be an integer from 0 to ${sector === "bosonic" ? "D - 1" : "D - 2"} = ${highest}, got ${String(nu)}`);
  }
}
