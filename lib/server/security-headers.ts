/**
 * HTTP security headers for every response, applied by `headers()` in next.config.ts. Plain data,
 * no Next imports, so next.config.ts can load it and unit tests can read it.
 *
 * The content security policy is static, so it works with cached and static pages alike:
 * - scripts: 'self' plus 'unsafe-inline', because Next streams the React payload in inline
 *   `<script>` tags and the theme is set by an inline script before paint; a nonce would force every
 *   page to render per request. 'unsafe-eval' only under `next dev` (fast refresh).
 * - styles: 'unsafe-inline' for the style attributes KaTeX, react-konva and recharts write.
 * - images: data: and blob: for the canvas PNG export; fonts are served from the app itself.
 * - no plugins, no framing by other sites, forms and the base URL stay on this origin.
 */

/** Options of `securityHeaders`. */
export interface SecurityHeadersOptions {
  /** True under `next dev`: allows eval and the hot-reload web socket. */
  development: boolean;
  /** True when the public address (NEXTAUTH_URL) is https: adds HSTS and upgrade-insecure-requests. */
  https: boolean;
}

/** One response header as next.config.ts `headers()` takes it. */
export interface HeaderEntry {
  key: string;
  value: string;
}

/**
 * The content security policy as one header value.
 *
 * @example
 * contentSecurityPolicy({ development: false, https: false }).startsWith("default-src 'self'") // => true
 */
export function contentSecurityPolicy(options: SecurityHeadersOptions): string {
  const directives: [string, ...string[]][] = [
    ["default-src", "'self'"],
    ["script-src", "'self'", "'unsafe-inline'", ...(options.development ? ["'unsafe-eval'"] : [])],
    ["style-src", "'self'", "'unsafe-inline'"],
    ["img-src", "'self'", "data:", "blob:"],
    ["font-src", "'self'", "data:"],
    ["connect-src", "'self'", ...(options.development ? ["ws:", "wss:"] : [])],
    ["worker-src", "'self'", "blob:"],
    ["object-src", "'none'"],
    ["base-uri", "'self'"],
    ["form-action", "'self'"],
    ["frame-ancestors", "'none'"],
  ];
  if (options.https) directives.push(["upgrade-insecure-requests"]);
  return directives.map((parts) => parts.join(" ")).join("; ");
}

/**
 * Every security header of Mooring's responses.
 *
 * @example
 * securityHeaders({ development: false, https: true }).map((h) => h.key)
 * // => ["Content-Security-Policy", "X-Content-Type-Options", "X-Frame-Options", "Referrer-Policy",
 * //     "Permissions-Policy", "Cross-Origin-Opener-Policy", "Strict-Transport-Security"]
 */
export function securityHeaders(options: SecurityHeadersOptions): HeaderEntry[] {
  const headers: HeaderEntry[] = [
    { key: "Content-Security-Policy", value: contentSecurityPolicy(options) },
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "X-Frame-Options", value: "DENY" },
    // Share links carry their token in the path: other sites see only our origin.
    { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
    { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
    { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  ];
  if (options.https) {
    headers.push({ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" });
  }
  return headers;
}
