/**
 * Supercharges preserved by a type II configuration of D-brane stacks, from explicit
 * 32 x 32 gamma matrices of SO(9,1).
 *
 * Conventions (stated once, used by every export below):
 * - Metric eta = diag(-1, +1, ..., +1), Clifford algebra {Gamma^mu, Gamma^nu} = 2 eta^{mu nu}
 *   (common practice).
 * - The gammas are built from tensor products of five Pauli matrices: with
 *   gamma^{2k-1} = Z x ... x Z x X x 1 x ... and gamma^{2k} = Z x ... x Z x Y x 1 x ...
 *   (k = 1..5, the X or Y in slot k) one gets ten Hermitian Euclidean gammas; then
 *   Gamma^j = gamma^j for j = 1..9 and Gamma^0 = i gamma^10. Every entry is 0, +-1 or +-i.
 * - Chirality Gamma_11 = Gamma^0 Gamma^1 ... Gamma^9; in this basis it is diagonal,
 *   Z x Z x Z x Z x Z, so a Weyl spinor is supported on 16 basis vectors.
 * - A stack along the spatial axes i1 < ... < ip imposes eps_L = Gamma_stack eps_R with
 *   Gamma_stack = Gamma^0 Gamma^{i1} ... Gamma^{ip} (axes in ascending order) for branes and
 *   minus that for antibranes (physics.md, "Stability and supersymmetry"). The ascending order
 *   fixes what "brane" means: relabelling axes so that the order of a stack's axes changes by an
 *   odd permutation turns that stack into its antibrane.
 * - eps_R is taken with positive chirality (Gamma_11 eps_R = +eps_R) unless the options say
 *   otherwise. The count does not depend on this choice for a configuration of one p-parity:
 *   every Gamma_1^{-1} Gamma_k is then an even product of spatial gammas and commutes with
 *   Gamma^0, which swaps the two chiralities.
 *
 * Every product of gammas is a monomial matrix (one non-zero entry per row, a power of i), so
 * the matrices are stored as a column index plus an exponent of i per row and multiplied
 * exactly in O(32).
 */

import type { Stack } from "./types";

/**
 * An exact square matrix with one non-zero entry per row, equal to a power of i: row r holds
 * i^phase[r] in column column[r]. Products of Pauli matrices and of gamma matrices have this form.
 */
export interface MonomialMatrix {
  /** Matrix size n. */
  size: number;
  /** Column of the non-zero entry of each row (a permutation of 0..n-1). */
  column: readonly number[];
  /** Exponent of i (0, 1, 2 or 3) of the non-zero entry of each row. */
  phase: readonly number[];
}

/** A Gaussian integer re + i im, the entry type of {@link toDenseMatrix}. */
export interface GaussianInteger {
  re: number;
  im: number;
}

/** Options of {@link countSupercharges}. */
export interface CountSuperchargesOptions {
  /**
   * Chirality of the Weyl space of eps_R: +1 (default) or -1, the eigenvalue of Gamma_11.
   * The count is the same for both when all stacks share one p-parity.
   */
  chirality?: 1 | -1;
}

/** Spacetime dimension of type II string theory, the range of gamma indices (0..9). */
export const typeTwoDimension = 10;

/** Size of the explicit Dirac matrices: 2^(10/2) = 32. */
export const spinorSize = 32;

/** Real supercharges of type II string theory in empty flat space (two Majorana-Weyl spinors of 16). */
export const maximalSupercharges = 32;

/**
 * The gamma matrix Gamma^mu of SO(9,1) in the Pauli-product basis of this module.
 *
 * @param mu - Spacetime index, 0 (time) to 9.
 * @returns The 32 x 32 matrix as a {@link MonomialMatrix} (shared, do not mutate).
 * @throws RangeError when mu is not an integer in 0..9.
 * @example
 * gammaMatrix(0).phase.every((k) => k % 2 === 1) // true: Gamma^0 = i gamma^10 has entries +-i
 */
export function gammaMatrix(mu: number): MonomialMatrix {
  if (!Number.isInteger(mu) || mu < 0 || mu >= typeTwoDimension) {
    throw new RangeError(`gamma index must be an integer from 0 to 9, got ${mu}`);
  }
  return getGammas().gammas[mu] as MonomialMatrix;
}

/**
 * The chirality matrix Gamma_11 = Gamma^0 Gamma^1 ... Gamma^9; it squares to 1 and is diagonal
 * in this basis.
 *
 * @returns The 32 x 32 matrix as a {@link MonomialMatrix} (shared, do not mutate).
 * @example
 * chiralityMatrix().column[5] // 5 (diagonal)
 */
export function chiralityMatrix(): MonomialMatrix {
  return getGammas().chirality;
}

/**
 * The product A B of two monomial matrices of the same size, exactly.
 *
 * @param a - Left factor.
 * @param b - Right factor.
 * @returns A new monomial matrix.
 * @throws RangeError when the sizes differ.
 * @example
 * multiplyMonomial(gammaMatrix(1), gammaMatrix(1)) // the 32 x 32 identity (phase 0 on the diagonal)
 */
export function multiplyMonomial(a: MonomialMatrix, b: MonomialMatrix): MonomialMatrix {
  if (a.size !== b.size) {
    throw new RangeError(`cannot multiply a ${a.size} x ${a.size} by a ${b.size} x ${b.size} matrix`);
  }
  const column: number[] = new Array<number>(a.size);
  const phase: number[] = new Array<number>(a.size);
  for (let r = 0; r < a.size; r++) {
    const k = a.column[r] as number;
    column[r] = b.column[k] as number;
    phase[r] = ((a.phase[r] as number) + (b.phase[k] as number)) & 3;
  }
  return { size: a.size, column, phase };
}

/**
 * The monomial matrix as a dense array of Gaussian integers (for checks and display).
 *
 * @param m - Any monomial matrix.
 * @returns m.size rows of m.size entries, each 0, +-1 or +-i.
 * @example
 * toDenseMatrix(gammaMatrix(1))[0] // 32 entries, a single { re: 1, im: 0 } among zeros
 */
export function toDenseMatrix(m: MonomialMatrix): GaussianInteger[][] {
  const rows: GaussianInteger[][] = [];
  for (let r = 0; r < m.size; r++) {
    const row = Array.from({ length: m.size }, (): GaussianInteger => ({ re: 0, im: 0 }));
    row[m.column[r] as number] = powerOfI(m.phase[r] as number);
    rows.push(row);
  }
  return rows;
}

/**
 * Gamma_stack = +-Gamma^0 Gamma^{i1} ... Gamma^{ip} of one stack (minus for an antibrane), the
 * matrix in the condition eps_L = Gamma_stack eps_R.
 *
 * @param stack - The stack's spatial Neumann axes (any order; the product uses ascending order)
 *   and its orientation.
 * @returns The 32 x 32 matrix (cached and shared for branes: do not mutate).
 * @throws RangeError when an axis is not an integer in 1..9 or appears twice.
 * @example
 * stackGamma({ worldvolume: [], anti: false }) // Gamma^0 (a D0-brane)
 */
export function stackGamma(stack: Pick<Stack, "worldvolume" | "anti">): MonomialMatrix {
  const product = braneProduct(axisMask(stack.worldvolume));
  return stack.anti ? { ...product, phase: product.phase.map((k) => (k + 2) & 3) } : product;
}

/**
 * Number of real supercharges preserved by a type II configuration: 32 with no stack, otherwise
 * dim { eps_R in the 16-dimensional Weyl space : Gamma_1^{-1} Gamma_k eps_R = eps_R for every k }
 * (eps_L is then fixed by eps_R). The complex dimension computed here equals the number of real
 * Majorana-Weyl solutions because the constraints commute with Majorana conjugation.
 *
 * Method: each row of Gamma_1^{-1} Gamma_k - 1 is a binomial x_r - i^s x_c, so Gaussian
 * elimination of the whole system merges unknowns with exact gains in {1, i, -1, -i}; an unknown
 * whose gains disagree around a cycle, or that lies outside the Weyl space, is forced to zero.
 * The dimension is the number of merged groups left free. Cost is O(32 x stacks).
 *
 * Positions, counts and labels do not matter (only worldvolume axes and orientation).
 * Mixing p-parities (not a type II configuration; validation rejects it) gives 0, because
 * Gamma_1 eps_R and Gamma_k eps_R then have opposite chirality and can only agree at zero.
 *
 * @param stacks - The stacks in any order; the first one is the reference Gamma_1.
 * @param options - {@link CountSuperchargesOptions}.
 * @returns 32, 16, 8, 4, 2, 1 or 0 in practice (any integer 0..16 when stacks are present).
 * @throws RangeError when an axis is not an integer in 1..9 or appears twice in one stack.
 * @example
 * countSupercharges([{ worldvolume: [1, 2, 3, 4], anti: false }]) // 16
 * countSupercharges([{ worldvolume: [], anti: false }, { worldvolume: [1, 2, 3, 4], anti: true }]) // 8
 * countSupercharges([{ worldvolume: [], anti: false }, { worldvolume: [1, 2], anti: false }]) // 0
 */
export function countSupercharges(
  stacks: readonly Pick<Stack, "worldvolume" | "anti">[],
  options?: CountSuperchargesOptions,
): number {
  if (stacks.length === 0) return maximalSupercharges;
  const solution = solveKillingSpinors(stacks, options?.chirality ?? 1);
  return solution.classes.length;
}

/** Supercharges of a worldvolume theory, with their split by worldvolume chirality in 2d and 6d. */
export interface WorldvolumeSupersymmetry {
  /** Real supercharges preserved (as {@link countSupercharges}). */
  supercharges: number;
  /**
   * How many of them have worldvolume chirality +1 and -1 under Gamma_wv = Gamma^0 Gamma^{i1} ... Gamma^{ip}
   * (ascending axes), for a 2- or 6-dimensional worldvolume (p = 1 or 5, where Gamma_wv squares to 1);
   * null in other dimensions and when Gamma_wv does not map the preserved spinors to themselves.
   */
  chirality: { positive: number; negative: number } | null;
}

/**
 * The supersymmetry of a worldvolume theory: the supercharges preserved by `stacks` (those of the
 * worldvolume and every stack whose strings to it fill it), and in 2d and 6d their split by the
 * worldvolume chirality operator restricted to the preserved spinors.
 *
 * Method: the preserved eps_R form the merged groups of {@link countSupercharges}; each free group C
 * gives the solution e_C (x_v = i^gain for v in C, 0 elsewhere), and distinct groups have disjoint
 * supports, so they are orthogonal. Gamma_wv commutes with every constraint Gamma_1^{-1} Gamma_k (checked
 * exactly), so it maps the solutions to themselves and its trace there is
 * sum_C <e_C, Gamma_wv e_C> / |C|; the +1 and -1 eigenspaces have (n + trace) / 2 and (n - trace) / 2
 * dimensions. The sign convention: positive means Gamma^0 Gamma^{i1} ... Gamma^{ip} eps = +eps with the axes
 * in ascending order, the same order that defines a brane (see the module conventions).
 *
 * @param stacks - The stacks whose conditions count, in any order (at least one).
 * @param worldvolume - Spatial Neumann axes of the worldvolume (1..9, any order); p = its length.
 * @param options - {@link CountSuperchargesOptions}.
 * @returns The count and, for p = 1 or 5, the chirality split.
 * @throws RangeError for invalid axes (as {@link countSupercharges}) or an empty `stacks`.
 * @example
 * worldvolumeSupersymmetry([{ worldvolume: [1], anti: false }, { worldvolume: [1, 2, 3, 4, 5], anti: false }], [1])
 * // => { supercharges: 8, chirality: { positive: 4, negative: 4 } }   (D1-D5: 2d (4,4))
 * worldvolumeSupersymmetry([{ worldvolume: [1], anti: false }, { worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9], anti: false }], [1])
 * // => { supercharges: 8, chirality: { positive: 8, negative: 0 } }   (D1-D9: chiral)
 */
export function worldvolumeSupersymmetry(
  stacks: readonly Pick<Stack, "worldvolume" | "anti">[],
  worldvolume: readonly number[],
  options?: CountSuperchargesOptions,
): WorldvolumeSupersymmetry {
  if (stacks.length === 0) throw new RangeError("worldvolumeSupersymmetry needs at least one stack");
  const operator = braneProduct(axisMask(worldvolume));
  const solution = solveKillingSpinors(stacks, options?.chirality ?? 1);
  const supercharges = solution.classes.length;
  const p = worldvolume.length;
  if (p !== 1 && p !== 5) return { supercharges, chirality: null };
  const first = stacks[0] as Pick<Stack, "worldvolume" | "anti">;
  const firstInverse = invertMonomial(braneProduct(axisMask(first.worldvolume)));
  for (const stack of stacks) {
    const constraint = multiplyMonomial(firstInverse, braneProduct(axisMask(stack.worldvolume)));
    if (!commutes(operator, constraint)) return { supercharges, chirality: null };
  }
  // Twice the trace, in units where each term is a power of i: sum over the groups of <e_C, G e_C> / |C|.
  let trace = 0;
  for (const members of solution.classes) {
    let re = 0;
    let im = 0;
    for (const r of members) {
      const c = operator.column[r] as number;
      if (solution.root[c] !== solution.root[r]) continue;
      const power = powerOfI((operator.phase[r] as number) + (solution.gain[c] as number) - (solution.gain[r] as number) + 8);
      re += power.re;
      im += power.im;
    }
    if (im !== 0 || re % members.length !== 0) throw new Error("worldvolume chirality is not diagonal on the preserved spinors");
    trace += re / members.length;
  }
  const positive = (supercharges + trace) / 2;
  if (!Number.isInteger(positive)) throw new Error("worldvolume chirality split is not integral");
  return { supercharges, chirality: { positive, negative: supercharges - positive } };
}

/**
 * The usual name of the supersymmetry of a theory in `dimension` spacetime dimensions with
 * `supercharges` real supercharges: complex counting in 1d (N = Q/2), (p, q) in 2d (real supercharges
 * of each chirality), 3d N = Q/2, 4d N = Q/4, 5d N = Q/8, 6d (p, q) in units of 8, and N = Q/16 in 7d
 * to 10d (common practice, from memory: the minimal spinors have 2, 1, 2, 4, 8, 8 and 16 real
 * components in 1d, 2d (per chirality), 3d, 4d, 5d, 6d (per chirality) and 7d-10d).
 *
 * @param dimension - Spacetime dimension of the theory, 1 to 10.
 * @param supersymmetry - The count and, in 2d and 6d, the chirality split (see {@link worldvolumeSupersymmetry}).
 * @returns E.g. "4d N=2", "2d (4,4)", "6d (1,0)", "no supersymmetry"; when the count does not fit the
 *   minimal spinor of the dimension (or the split is missing in 2d or 6d), "Dd, Q supercharges".
 * @example
 * nameSupersymmetry(4, { supercharges: 8, chirality: null })                           // => "4d N=2"
 * nameSupersymmetry(1, { supercharges: 16, chirality: null })                          // => "1d N=8"
 * nameSupersymmetry(2, { supercharges: 8, chirality: { positive: 4, negative: 4 } })   // => "2d (4,4)"
 */
export function nameSupersymmetry(dimension: number, supersymmetry: WorldvolumeSupersymmetry): string {
  const { supercharges, chirality } = supersymmetry;
  if (supercharges === 0) return "no supersymmetry";
  const plain = `${dimension}d, ${supercharges} supercharges`;
  if (dimension === 2 || dimension === 6) {
    if (chirality === null) return plain;
    const unit = dimension === 2 ? 1 : 8;
    if (chirality.positive % unit !== 0 || chirality.negative % unit !== 0) return plain;
    return `${dimension}d (${chirality.positive / unit},${chirality.negative / unit})`;
  }
  const unit = minimalSpinor[dimension];
  if (unit === undefined || supercharges % unit !== 0) return plain;
  return `${dimension}d N=${supercharges / unit}`;
}

/** Real supercharges counted as one unit of N, by dimension (2d and 6d use (p, q) instead). */
const minimalSpinor: Readonly<Record<number, number>> = { 1: 2, 3: 2, 4: 4, 5: 8, 7: 16, 8: 16, 9: 16, 10: 16 };

/**
 * Whether two stacks together preserve some supersymmetry (their {@link countSupercharges} > 0).
 * By physics.md: nu = 0 with the same orientation (16), nu = 4 or 8 in either orientation (8);
 * nu = 2 or 6, and a brane with an antibrane at nu = 0, preserve none.
 *
 * @param a - First stack (worldvolume axes and orientation).
 * @param b - Second stack.
 * @returns True when some supercharge survives.
 * @throws RangeError as {@link countSupercharges}.
 * @example
 * pairPreservesSupersymmetry({ worldvolume: [], anti: false }, { worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], anti: true }) // true
 */
export function pairPreservesSupersymmetry(
  a: Pick<Stack, "worldvolume" | "anti">,
  b: Pick<Stack, "worldvolume" | "anti">,
): boolean {
  return countSupercharges([a, b]) > 0;
}

/** The preserved eps_R as merged groups of basis vectors (see {@link countSupercharges}). */
interface KillingSpinorSolution {
  /** Members of each free group: one preserved spinor per group. */
  classes: number[][];
  /** Root of every basis vector's group. */
  root: Int8Array;
  /** x_v = i^gain[v] x_root[v]. */
  gain: Int8Array;
}

/**
 * Solves Gamma_1^{-1} Gamma_k eps_R = eps_R for every k on the chosen Weyl space. Each row of
 * Gamma_1^{-1} Gamma_k - 1 is a binomial x_r - i^s x_c, so Gaussian elimination merges unknowns with
 * exact gains in {1, i, -1, -i}; an unknown whose gains disagree around a cycle, or that lies outside
 * the Weyl space, is forced to zero.
 */
function solveKillingSpinors(stacks: readonly Pick<Stack, "worldvolume" | "anti">[], chirality: 1 | -1): KillingSpinorSolution {
  const { weylDiagonal } = getGammas();
  const first = stacks[0] as Pick<Stack, "worldvolume" | "anti">;
  // (-A)^{-1} = -(A^{-1}): an antibrane's sign is carried as an extra i^2.
  const firstInverse = invertMonomial(braneProduct(axisMask(first.worldvolume)));
  const firstSign = first.anti ? 2 : 0;

  const parent = new Int8Array(spinorSize);
  // gain[v]: x_v = i^gain[v] x_parent[v]
  const gain = new Int8Array(spinorSize);
  const zero = new Uint8Array(spinorSize);
  for (let v = 0; v < spinorSize; v++) {
    parent[v] = v;
    // Outside the chosen Weyl space the component of eps_R vanishes.
    if (weylDiagonal[v] !== chirality) zero[v] = 1;
  }

  const find = (v: number): number => {
    let root = v;
    let offset = 0;
    while (parent[root] !== root) {
      offset += gain[root] as number;
      root = parent[root] as number;
    }
    // Path compression, keeping x_v = i^gain[v] x_root.
    let node = v;
    let remaining = offset;
    while (parent[node] !== node) {
      const next = parent[node] as number;
      const step = gain[node] as number;
      parent[node] = root;
      gain[node] = remaining & 3;
      remaining -= step;
      node = next;
    }
    return root;
  };

  for (let k = 1; k < stacks.length; k++) {
    const stack = stacks[k] as Pick<Stack, "worldvolume" | "anti">;
    const brane = braneProduct(axisMask(stack.worldvolume));
    const sign = firstSign + (stack.anti ? 2 : 0);
    for (let r = 0; r < spinorSize; r++) {
      // Row r of (M - 1) x = 0, M = Gamma_1^{-1} Gamma_k, reads x_r = i^w x_c.
      const middle = firstInverse.column[r] as number;
      const c = brane.column[middle] as number;
      const w = ((firstInverse.phase[r] as number) + (brane.phase[middle] as number) + sign) & 3;
      const ra = find(r);
      const rb = find(c);
      const oa = ra === r ? 0 : (gain[r] as number);
      const ob = rb === c ? 0 : (gain[c] as number);
      // x_ra = i^(w + ob - oa) x_rb
      const link = (w + ob - oa + 8) & 3;
      if (ra === rb) {
        if (link !== 0) zero[ra] = 1;
      } else {
        parent[ra] = rb;
        gain[ra] = link;
        if (zero[ra] === 1) zero[rb] = 1;
      }
    }
  }

  const root = new Int8Array(spinorSize);
  const members = new Map<number, number[]>();
  for (let v = 0; v < spinorSize; v++) {
    const r = find(v);
    root[v] = r;
    if (zero[r] === 1) continue;
    const list = members.get(r);
    if (list) list.push(v);
    else members.set(r, [v]);
  }
  return { classes: [...members.values()], root, gain };
}

/** Whether two monomial matrices commute (exactly). */
function commutes(a: MonomialMatrix, b: MonomialMatrix): boolean {
  const ab = multiplyMonomial(a, b);
  const ba = multiplyMonomial(b, a);
  for (let r = 0; r < a.size; r++) {
    if (ab.column[r] !== ba.column[r] || ab.phase[r] !== ba.phase[r]) return false;
  }
  return true;
}

interface GammaTable {
  gammas: MonomialMatrix[];
  chirality: MonomialMatrix;
  /** Diagonal of Gamma_11 (+1 or -1 per basis vector). */
  weylDiagonal: Int8Array;
}

let gammaTable: GammaTable | undefined;

/** Builds the gammas once, on first use. */
function getGammas(): GammaTable {
  if (gammaTable) return gammaTable;
  const identity: MonomialMatrix = { size: 2, column: [0, 1], phase: [0, 0] };
  const pauliX: MonomialMatrix = { size: 2, column: [1, 0], phase: [0, 0] };
  // Y = [[0, -i], [i, 0]]
  const pauliY: MonomialMatrix = { size: 2, column: [1, 0], phase: [3, 1] };
  const pauliZ: MonomialMatrix = { size: 2, column: [0, 1], phase: [0, 2] };
  const qubits = 5;
  const euclidean = (slot: number, middle: MonomialMatrix): MonomialMatrix => {
    let product: MonomialMatrix = { size: 1, column: [0], phase: [0] };
    for (let q = 0; q < qubits; q++) {
      product = kronecker(product, q < slot ? pauliZ : q === slot ? middle : identity);
    }
    return product;
  };
  const gammas: MonomialMatrix[] = [];
  // gamma^10 = Z Z Z Z Y, so Gamma^0 = i gamma^10.
  const gamma10 = euclidean(qubits - 1, pauliY);
  gammas.push({ ...gamma10, phase: gamma10.phase.map((k) => (k + 1) & 3) });
  for (let j = 1; j <= 9; j++) {
    const slot = Math.floor((j - 1) / 2);
    gammas.push(euclidean(slot, j % 2 === 1 ? pauliX : pauliY));
  }
  let chirality = gammas[0] as MonomialMatrix;
  for (let j = 1; j <= 9; j++) chirality = multiplyMonomial(chirality, gammas[j] as MonomialMatrix);
  const weylDiagonal = new Int8Array(spinorSize);
  for (let r = 0; r < spinorSize; r++) {
    // Gamma_11 is diagonal with entries +-1 by construction; guard the assumption the Weyl split relies on.
    const p = chirality.phase[r] as number;
    if (chirality.column[r] !== r || p % 2 !== 0) throw new Error("chirality matrix is not diagonal +-1");
    weylDiagonal[r] = p === 0 ? 1 : -1;
  }
  gammaTable = { gammas, chirality, weylDiagonal };
  return gammaTable;
}

/** Kronecker product A (x) B; the row index of A is the more significant one. */
function kronecker(a: MonomialMatrix, b: MonomialMatrix): MonomialMatrix {
  const size = a.size * b.size;
  const column: number[] = new Array<number>(size);
  const phase: number[] = new Array<number>(size);
  for (let ra = 0; ra < a.size; ra++) {
    for (let rb = 0; rb < b.size; rb++) {
      const r = ra * b.size + rb;
      column[r] = (a.column[ra] as number) * b.size + (b.column[rb] as number);
      phase[r] = ((a.phase[ra] as number) + (b.phase[rb] as number)) & 3;
    }
  }
  return { size, column, phase };
}

/** Inverse of a monomial matrix: its conjugate transpose, since every entry has modulus 1. */
function invertMonomial(m: MonomialMatrix): MonomialMatrix {
  const column: number[] = new Array<number>(m.size);
  const phase: number[] = new Array<number>(m.size);
  for (let r = 0; r < m.size; r++) {
    const c = m.column[r] as number;
    column[c] = r;
    phase[c] = (4 - (m.phase[r] as number)) & 3;
  }
  return { size: m.size, column, phase };
}

function powerOfI(k: number): GaussianInteger {
  switch (k & 3) {
    case 0:
      return { re: 1, im: 0 };
    case 1:
      return { re: 0, im: 1 };
    case 2:
      return { re: -1, im: 0 };
    default:
      return { re: 0, im: -1 };
  }
}

const braneProducts = new Map<number, MonomialMatrix>();

/**
 * Gamma^0 Gamma^{i1} ... Gamma^{ip} (ascending axes) for the axis set `mask` (bit i for axis i),
 * cached: there are at most 512 of them and a configuration reuses few.
 */
function braneProduct(mask: number): MonomialMatrix {
  let product = braneProducts.get(mask);
  if (product) return product;
  const { gammas } = getGammas();
  product = gammas[0] as MonomialMatrix;
  for (let axis = 1; axis <= 9; axis++) {
    if (mask & (1 << axis)) product = multiplyMonomial(product, gammas[axis] as MonomialMatrix);
  }
  braneProducts.set(mask, product);
  return product;
}

/** Bit mask of the worldvolume axes; RangeError for an axis outside 1..9 or a repeated axis. */
function axisMask(worldvolume: readonly number[]): number {
  let mask = 0;
  for (const axis of worldvolume) {
    if (!Number.isInteger(axis) || axis < 1 || axis > 9) {
      throw new RangeError(`worldvolume axis must be an integer from 1 to 9, got ${axis}`);
    }
    const bit = 1 << axis;
    if (mask & bit) throw new RangeError(`worldvolume axis ${axis} is listed twice`);
    mask |= bit;
  }
  return mask;
}
