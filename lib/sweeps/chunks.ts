/**
 * How a sweep is cut into chunks (the unit of work on the queue) and in which order the chunks of
 * different accounts run.
 *
 * Fair scheduling is start-time fair queueing: every chunk gets a start tag and the queue serves
 * the smallest tag first. An account's new chunks are tagged from max(V, F) on, where V is the
 * smallest tag still waiting (the queue's virtual time) and F is one past the largest tag the
 * account already has waiting. Two accounts with waiting work therefore alternate chunk by chunk,
 * however big one of the sweeps is, and an idle queue serves a lone account at full speed.
 *
 * Invalid-input policy: sizes and tags are whole numbers; a chunk outside the sweep throws a RangeError.
 */
import { configurationCost } from "../boundary";
import type { Configuration } from "../boundary/types";

/** Chunking constants. */
export const chunkLimits = {
  /**
   * Engine work (sectors x (levels + 1), `configurationCost`) per chunk: about 0.3 s on one core,
   * so the queue's few round trips per chunk stay a few per cent of it, a sweep of a few thousand
   * points still splits over several workers, and a retried chunk loses little.
   */
  costPerChunk: 12_000,
  /** Most points in one chunk. */
  maxPointsPerChunk: 2_000,
  /** Most chunks of one sweep (bigger sweeps get bigger chunks). */
  maxChunks: 5_000,
} as const;

/**
 * Points per chunk for a sweep of `base` with `totalPoints` points.
 *
 * @example
 * chunkSizeFor(twoStacksAtLevel6, 10_000) // => 571   (12000 / 21, 21 = 3 sectors x 7 levels)
 */
export function chunkSizeFor(base: Pick<Configuration, "stacks" | "levels">, totalPoints: number): number {
  const byCost = Math.floor(chunkLimits.costPerChunk / Math.max(1, configurationCost(base)));
  const size = Math.min(chunkLimits.maxPointsPerChunk, Math.max(1, byCost));
  return Math.max(size, Math.ceil(totalPoints / chunkLimits.maxChunks));
}

/**
 * The number of chunks of a sweep.
 *
 * @example
 * chunkCount(1000, 95) // => 11
 */
export function chunkCount(totalPoints: number, chunkSize: number): number {
  return Math.ceil(totalPoints / chunkSize);
}

/**
 * The points [start, end) of chunk `chunk`.
 *
 * @example
 * chunkRange(10, 95, 1000) // => { start: 950, end: 1000 }
 */
export function chunkRange(chunk: number, chunkSize: number, totalPoints: number): { start: number; end: number } {
  const start = chunk * chunkSize;
  if (!Number.isInteger(chunk) || chunk < 0 || start >= totalPoints) throw new RangeError(`Chunk ${chunk} is outside the sweep`);
  return { start, end: Math.min(totalPoints, start + chunkSize) };
}

/**
 * The first start tag of an account's new chunks (see the module comment).
 *
 * @param smallestWaitingTag - The smallest tag of any chunk still waiting, or null when none waits.
 * @param accountLargestWaitingTag - The largest tag of this account's waiting chunks, or null.
 * @returns max(V, F), with V = 0 for an idle queue.
 * @example
 * firstFairTag(500, 999) // => 1000  (the account's own work comes first)
 * firstFairTag(500, null) // => 500  (a newcomer joins at the queue's current virtual time)
 */
export function firstFairTag(smallestWaitingTag: number | null, accountLargestWaitingTag: number | null): number {
  const virtualTime = smallestWaitingTag ?? 0;
  return accountLargestWaitingTag === null ? virtualTime : Math.max(virtualTime, accountLargestWaitingTag + 1);
}
