/**
 * A bounded undo/redo history of immutable values.
 */

/** Past and future snapshots around the present value. */
export interface History<T> {
  past: T[];
  present: T;
  future: T[];
}

/** Default number of undo steps kept. */
export const defaultHistoryLimit = 100;

/** A history holding only `present`. */
export function createHistory<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

/**
 * Records a new present value. The redo branch is dropped and the oldest entries beyond
 * `limit` are forgotten. Pushing the same reference is a no-op.
 */
export function pushHistory<T>(history: History<T>, next: T, limit = defaultHistoryLimit): History<T> {
  if (next === history.present) return history;
  const past = [...history.past, history.present];
  return { past: past.length > limit ? past.slice(past.length - limit) : past, present: next, future: [] };
}

/** Replaces the present value without recording a step (for continuous gestures). */
export function replacePresent<T>(history: History<T>, next: T): History<T> {
  return next === history.present ? history : { ...history, present: next, future: [] };
}

/** Steps back; a no-op with nothing to undo. */
export function undoHistory<T>(history: History<T>): History<T> {
  const previous = history.past[history.past.length - 1];
  if (history.past.length === 0 || previous === undefined) return history;
  return { past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future] };
}

/** Steps forward; a no-op with nothing to redo. */
export function redoHistory<T>(history: History<T>): History<T> {
  const [next, ...rest] = history.future;
  if (next === undefined) return history;
  return { past: [...history.past, history.present], present: next, future: rest };
}
