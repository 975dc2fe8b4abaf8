import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { getAuthSecret } from "@/lib/auth-secret";
import { checkCrossSiteRequest, crossSiteRejection } from "@/lib/csrf";
import { getEnv } from "@/lib/env";

/**
 * Refuses cross-site state-changing requests to /api (lib/csrf.ts; next-auth's routes keep their own
 * token), and sends visitors without a session from the signed-in areas to the sign-in page. The
 * redirect is convenience only: every page, action, route handler and DAL function checks the session again.
 */
export async function proxy(request: NextRequest) {
  if (request.nextUrl.pathname.startsWith("/api/")) {
    if (request.nextUrl.pathname.startsWith("/api/auth/")) return NextResponse.next();
    const appUrl = getEnv().NEXTAUTH_URL;
    const verdict = checkCrossSiteRequest(request, appUrl ? [appUrl] : []);
    if (verdict.ok) return NextResponse.next();
    console.warn(`Refused a cross-site ${request.method} ${request.nextUrl.pathname}: ${verdict.reason}`);
    return crossSiteRejection();
  }
  const token = await getToken({ req: request, secret: getAuthSecret() });
  if (token) return NextResponse.next();
  const { pathname, search } = request.nextUrl;
  const url = new URL("/sign-in", request.url);
  url.searchParams.set("callbackUrl", `${pathname}${search}`);
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/api/:path*", "/dashboard/:path*", "/configurations/:path*", "/groups/:path*", "/admin/:path*", "/account/:path*"],
};
