// Fixed locale and UTC so server and browser render the same text (no hydration mismatch).
const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const dateTimeFormat = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  year: "numeric",
  hour: "2-digit",
  minute: "2-digit",
  timeZone: "UTC",
});

/** "2 Dec 2026" (UTC). */
export function formatDate(value: Date | string): string {
  return dateFormat.format(new Date(value));
}

/** "2 Dec 2026, 14:05 UTC". */
export function formatDateTime(value: Date | string): string {
  return `${dateTimeFormat.format(new Date(value))} UTC`;
}
