/**
 * Cross-site request forgery protection for the JSON and upload routes under /api (proxy.ts calls
 * it for every state-changing request). Browsers mark each request with `Sec-Fetch-Site` and, on
 * cross-origin POST/PUT/PATCH/DELETE, with `Origin`; pages cannot forge either header. A request
 * that a browser says came from another site is refused. Requests with neither header come from
 * non-browser clients (scripts, load tests), which carry no ambient cookies to abuse.
 * next-auth's own routes (/api/auth/*) are left to next-auth's CSRF token.
 */

/** Methods that never change state, so they need no check. */
const safeMethods = new Set(["GET", "HEAD", "OPTIONS"]);

/** The outcome of `checkCrossSiteRequest`. */
export type CrossSiteVerdict = { ok: true } | { ok: false; reason: string };

/**
 * Decides whether a request may change state, judged by where the browser says it came from.
 *
 * @param request - Method, URL and headers are read.
 * @param allowedOrigins - Origins the app is served from, e.g. NEXTAUTH_URL's origin; the request
 *   URL's own origin and the Host header's host are always allowed.
 * @returns `{ ok: true }`, or `{ ok: false, reason }` for a cross-site state-changing request.
 */
export function checkCrossSiteRequest(request: Request, allowedOrigins: readonly string[] = []): CrossSiteVerdict {
  if (safeMethods.has(request.method.toUpperCase())) return { ok: true };
  const site = request.headers.get("sec-fetch-site")?.toLowerCase();
  if (site === "same-origin") return { ok: true };
  // "none": typed in the address bar or opened from a bookmark; never a forged cross-site form.
  if (site && site !== "none") return { ok: false, reason: `Sec-Fetch-Site is "${site}"` };
  const origin = request.headers.get("origin");
  if (origin === null) return { ok: true };
  if (allowedOrigins.map(originOf).includes(origin) || new URL(request.url).origin === origin) return { ok: true };
  // The Host the browser addressed (Next may rewrite 127.0.0.1 to localhost in request.url).
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  if (host && hostOf(origin) === host) return { ok: true };
  return { ok: false, reason: `Origin ${origin} is not this site` };
}

/** The 403 answer to a refused cross-site request, in the API's error shape. */
export function crossSiteRejection(): Response {
  return Response.json(
    {
      error: "cross_site_request",
      message: "This request came from another site and was refused. Reload Mooring and try again.",
    },
    { status: 403 },
  );
}

function hostOf(url: string): string | null {
  try {
    return new URL(url).host;
  } catch {
    return null;
  }
}

function originOf(url: string): string {
  try {
    return new URL(url).origin;
  } catch {
    return url;
  }
}
