/**
 * Stands in for the app's own origin while a callback is resolved: only the path, query and
 * fragment of a same-origin result are kept, so the real host never matters.
 */
const appOrigin = "https://mooring.invalid";

// C0 controls, DEL and C1 controls: browsers drop tab, CR and LF from URLs ("/\t/evil.example"
// becomes "//evil.example"), and a decoded CR or LF in a redirect header makes the server fail.
const controlCharacter = /[\u0000-\u001f\u007f-\u009f]/;

/**
 * A same-site path to go to after signing in, or `fallback`. The value is resolved as a URL
 * against the app's origin and kept only when it stays on that origin and its path does not start
 * with "//" (which a browser would read as another host); anything holding a control character is
 * refused outright. The result is the resolved path, query and fragment.
 */
export function toSafeCallbackPath(value: string | string[] | null | undefined, fallback = "/dashboard"): string {
  const candidate = Array.isArray(value) ? value[0] : value;
  if (!candidate || !candidate.startsWith("/") || controlCharacter.test(candidate)) return fallback;
  let resolved: URL;
  try {
    resolved = new URL(candidate, appOrigin);
  } catch {
    return fallback;
  }
  if (resolved.origin !== appOrigin) return fallback;
  const path = `${resolved.pathname}${resolved.search}${resolved.hash}`;
  if (!path.startsWith("/") || path.startsWith("//") || path.startsWith("/\\")) return fallback;
  return path;
}

/** `?callbackUrl=…` to carry `path` between the sign-in and sign-up pages; empty for the default. */
export function toCallbackQuery(path: string, fallback = "/dashboard"): string {
  return path === fallback ? "" : `?callbackUrl=${encodeURIComponent(path)}`;
}
