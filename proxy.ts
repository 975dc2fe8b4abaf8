import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { getAuthSecret } from "@/lib/auth-secret";

/**
 * Sends visitors without a session from the signed-in areas to the sign-in page. Convenience only:
 * every page, action, route handler and DAL function checks the session again.
 */
export async function proxy(request: NextRequest) {
  const token = await getToken({ req: request, secret: getAuthSecret() });
  if (token) return NextResponse.next();
  const { pathname, search } = request.nextUrl;
  const url = new URL("/sign-in", request.url);
  url.searchParams.set("callbackUrl", `${pathname}${search}`);
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/dashboard/:path*", "/configurations/:path*", "/groups/:path*", "/admin/:path*", "/account/:path*"],
};
