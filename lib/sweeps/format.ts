/**
 * Text of a sweep's progress: rates and durations as the sweep page shows them.
 *
 * Invalid-input policy: null, negative or non-finite values read as unknown ("—").
 */

/**
 * A duration in seconds as "2 h 5 min", "3 min 20 s" or "12 s".
 *
 * @example
 * formatDuration(200) // => "3 min 20 s"
 * formatDuration(0.4) // => "under 1 s"
 */
export function formatDuration(seconds: number | null): string {
  if (seconds === null || !Number.isFinite(seconds) || seconds < 0) return "—";
  if (seconds < 1) return "under 1 s";
  const whole = Math.round(seconds);
  const hours = Math.floor(whole / 3600);
  const minutes = Math.floor((whole % 3600) / 60);
  const rest = whole % 60;
  if (hours > 0) return `${hours} h ${minutes} min`;
  if (minutes > 0) return `${minutes} min ${rest} s`;
  return `${rest} s`;
}

/**
 * A rate of points per second, with three significant digits.
 *
 * @example
 * formatRate(1234.5) // => "1,230 points/s"
 * formatRate(0.25)   // => "0.25 points/s"
 */
export function formatRate(pointsPerSecond: number | null): string {
  if (pointsPerSecond === null || !Number.isFinite(pointsPerSecond) || pointsPerSecond < 0) return "—";
  const rounded = Number(pointsPerSecond.toPrecision(3));
  return `${rounded.toLocaleString("en-US")} points/s`;
}
