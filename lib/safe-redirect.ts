/**
 * A same-site path to go to after signing in, or `fallback`. Only paths that start with a single "/"
 * are accepted, so a crafted link cannot send the user to another site.
 */
export function toSafeCallbackPath(value: string | string[] | null | undefined, fallback = "/dashboard"): string {
  const candidate = Array.isArray(value) ? value[0] : value;
  if (!candidate || !candidate.startsWith("/") || candidate.startsWith("//") || candidate.startsWith("/\\")) return fallback;
  return candidate;
}
