import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { getAuthSecret } from "@/lib/server/auth-secret";
import { checkCrossSiteRequest, crossSiteRejection } from "@/lib/server/csrf";
import { decodeSessionToken } from "@/lib/server/session-token";
import { getEnv } from "@/lib/server/env";

/**
 * Refuses cross-site state-changing requests to /api and cross-site server actions with 403
 * (lib/server/csrf.ts; next-auth's routes keep their own token), and sends visitors without a
 * session from the signed-in areas to the sign-in page. The redirect is convenience only: every
 * page, action, route handler and DAL function checks the session again.
 *
 * Under /api the proxy runs only for requests a browser may have sent from another site (see
 * `config.matcher`): running it costs about as much as a whole small route handler, and every
 * request it skips is one that `checkCrossSiteRequest` lets through whatever its method.
 */
export async function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const serverAction = request.headers.has("next-action");
  if (pathname.startsWith("/api/") || serverAction) {
    if (pathname.startsWith("/api/auth/")) return NextResponse.next();
    // Next refuses a cross-site server action itself, but as a 500; answer it as the API does.
    // A same-site action goes on to the action, which checks the session itself.
    const appUrl = getEnv().NEXTAUTH_URL;
    const verdict = checkCrossSiteRequest(request, appUrl ? [appUrl] : []);
    if (verdict.ok) return NextResponse.next();
    console.warn(`Refused a cross-site ${serverAction ? "server action" : request.method} ${pathname}: ${verdict.reason}`);
    return crossSiteRejection();
  }
  const token = await getToken({ req: request, secret: getAuthSecret(), decode: decodeSessionToken });
  if (token) return NextResponse.next();
  const url = new URL("/sign-in", request.url);
  url.searchParams.set("callbackUrl", `${pathname}${request.nextUrl.search}`);
  return NextResponse.redirect(url);
}

export const config = {
  matcher: [
    "/dashboard/:path*",
    "/configurations/:path*",
    "/groups/:path*",
    "/admin/:path*",
    "/account/:path*",
    // /api, for requests that may come from another site. Skipped: Sec-Fetch-Site "same-origin" (the
    // app's own fetches) and requests with neither Sec-Fetch-Site nor Origin (scripts, which carry no
    // ambient cookies). tests/integration/security.test.ts checks that lib/server/csrf.ts passes all of them.
    { source: "/api/:path*", has: [{ type: "header", key: "sec-fetch-site", value: "(?!same-origin$).*" }] },
    { source: "/api/:path*", missing: [{ type: "header", key: "sec-fetch-site" }], has: [{ type: "header", key: "origin" }] },
    // Server actions (a POST to any page with a Next-Action header), for the same check.
    { source: "/:path*", has: [{ type: "header", key: "next-action" }] },
  ],
};
