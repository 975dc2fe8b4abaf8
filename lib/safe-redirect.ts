/**
 * A same-site path to go to after signing in, or `fallback`. Only paths that start with a single "/"
 * are accepted, so a crafted link cannot send the user to another site.
 */
export function toSafeCallbackPath(value: string | string[] | null | undefined, fallback = "/dashboard"): string {
  const candidate = Array.isArray(value) ? value[0] : value;
  if (!candidate || !candidate.startsWith("/") || candidate.startsWith("//") || candidate.startsWith("/\\")) return fallback;
  return candidate;
}

/** `?callbackUrl=…` to carry `path` between the sign-in and sign-up pages; empty for the default. */
export function toCallbackQuery(path: string, fallback = "/dashboard"): string {
  return path === fallback ? "" : `?callbackUrl=${encodeURIComponent(path)}`;
}
