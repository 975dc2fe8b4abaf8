/**
 * Counting and listing the N/D choices of a boundary dimension.
 *
 * Relabelling the k chosen axes permutes the columns of the (stack x axis) N/D table, so an orbit
 * is a multiset of k columns drawn from the 2^s possible columns of s stacks: there are
 * C(2^s + k - 1, k) of them (the multiset coefficient; Stanley, Enumerative Combinatorics vol. 1,
 * section 1.2, from memory). A multiset is listed as its non-decreasing column sequence, and the
 * sequences are numbered through stars and bars: c_0 <= ... <= c_{k-1} maps to the strictly
 * increasing d_t = c_t + t, a k-subset of {0, ..., 2^s + k - 2}, numbered in the combinatorial
 * number system (colexicographic order).
 *
 * Invalid-input policy: counts are exact BigInts for any size; the unranking functions expect a
 * rank inside the count and throw a RangeError otherwise.
 */

/**
 * The binomial coefficient C(n, k), exactly.
 *
 * @example
 * binomial(5n, 2n) // => 10n
 * binomial(3n, 5n) // => 0n
 */
export function binomial(n: bigint, k: bigint): bigint {
  if (k < 0n || n < 0n || k > n) return 0n;
  const r = k < n - k ? k : n - k;
  let value = 1n;
  for (let i = 1n; i <= r; i += 1n) value = (value * (n - r + i)) / i;
  return value;
}

/**
 * The multiset coefficient ((n k)) = C(n + k - 1, k): multisets of size k from n kinds.
 *
 * @example
 * multisetCount(4n, 3n) // => 20n
 * multisetCount(0n, 0n) // => 1n
 */
export function multisetCount(n: bigint, k: bigint): bigint {
  if (k === 0n) return 1n;
  if (n <= 0n) return 0n;
  return binomial(n + k - 1n, k);
}

/**
 * The non-decreasing sequence of `k` values in [0, n) with the given rank.
 *
 * @param rank - 0 <= rank < multisetCount(n, k).
 * @returns The sequence, each value below n.
 * @example
 * unrankMultiset(0, 4, 2) // => [0, 0]
 * unrankMultiset(9, 4, 2) // => [3, 3]
 */
export function unrankMultiset(rank: number, n: number, k: number): number[] {
  const count = multisetCount(BigInt(n), BigInt(k));
  if (!Number.isInteger(rank) || rank < 0 || BigInt(rank) >= count) {
    throw new RangeError(`Rank ${rank} is outside 0..${count - 1n}`);
  }
  // Combinatorial number system: the largest d with C(d, t) <= remaining, from t = k down to 1.
  // C(d, t) grows with d, so a binary search over t - 1 <= d < ceiling finds it; the binomials
  // are capped just above the rank, so plain numbers stay exact.
  const subset: number[] = new Array<number>(k);
  let remaining = rank;
  let ceiling = n + k - 1;
  for (let t = k; t >= 1; t -= 1) {
    let low = t - 1;
    let high = ceiling - 1;
    while (low < high) {
      const middle = Math.ceil((low + high) / 2);
      if (cappedBinomial(middle, t, remaining) <= remaining) low = middle;
      else high = middle - 1;
    }
    remaining -= cappedBinomial(low, t, remaining);
    subset[t - 1] = low;
    ceiling = low;
  }
  return subset.map((d, t) => d - t);
}

/**
 * The rank of a non-decreasing sequence, the inverse of {@link unrankMultiset}.
 *
 * @example
 * rankMultiset([3, 3]) // => 9
 */
export function rankMultiset(sequence: readonly number[]): number {
  let rank = 0n;
  sequence.forEach((value, t) => {
    rank += binomial(BigInt(value + t), BigInt(t + 1));
  });
  return Number(rank);
}

/** C(n, k) as a number, or Infinity once it exceeds `cap` (every partial product C(n - k + i, i) is whole). */
function cappedBinomial(n: number, k: number, cap: number): number {
  if (k < 0 || k > n) return 0;
  let value = 1;
  for (let i = 1; i <= k; i += 1) {
    value = (value * (n - k + i)) / i;
    if (value > cap) return Number.POSITIVE_INFINITY;
  }
  return value;
}
