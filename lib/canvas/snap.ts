/**
 * Snapping positions to a grid. Steps are in units of sqrt(alpha').
 */

/** Default grid step in units of sqrt(alpha'). */
export const defaultGridStep = 0.5;

/**
 * Rounds `value` to the nearest multiple of `step`. A non-positive or non-finite step
 * leaves the value unchanged. The result avoids negative zero and float noise
 * (0.1 + 0.2 style) by rounding to 10 decimals.
 */
export function snapValue(value: number, step: number = defaultGridStep): number {
  if (!(step > 0) || !Number.isFinite(step) || !Number.isFinite(value)) return value;
  const snapped = Math.round(value / step) * step;
  return cleanNumber(snapped);
}

/** Removes negative zero and float noise beyond 10 decimals. */
export function cleanNumber(value: number): number {
  const rounded = Math.round(value * 1e10) / 1e10;
  return rounded === 0 ? 0 : rounded;
}

/**
 * Grid line positions between `from` and `to` (inclusive) at multiples of `step`,
 * thinned so that no more than `maxLines` lines are returned.
 */
export function gridLines(from: number, to: number, step: number, maxLines = 200): number[] {
  if (!(step > 0) || !(to >= from)) return [];
  let effective = step;
  while ((to - from) / effective > maxLines) effective *= 2;
  const first = Math.ceil(from / effective) * effective;
  const lines: number[] = [];
  for (let v = first; v <= to + 1e-9; v += effective) lines.push(cleanNumber(v));
  return lines;
}
