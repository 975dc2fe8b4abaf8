import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getActorForSession, type Actor } from "@/db/queries/actor";
import { getAuthSecret } from "@/lib/server/auth-secret";
import { decodeSessionToken, sessionCookieName, sessionTokenFromCookieHeader } from "@/lib/server/session-token";

/**
 * The signed-in user as an Actor, or null. The session token only names the account and its
 * session; one query per request checks that the session is still open and reads name and site
 * role fresh, so a signed-out or revoked session, or a demoted or deleted account, loses its rights
 * at once instead of when its token expires. Tokens without a session id (from before sessions
 * were recorded) count as signed out.
 */
export const getCurrentUser = cache(async (): Promise<Actor | null> => {
  // The token is read from the request's Cookie header and decrypted and checked (expiry
  // included) as next-auth's getToken and getServerSession do (session-token.ts), without
  // getServerSession's re-encryption of a new cookie on every call (the browser's SessionProvider
  // keeps the session sliding through /api/auth/session) and without building Next's mutable
  // cookie store. Only the cookies are read, so a JWT in an Authorization header is never taken
  // for a session. Callers without a session cookie (scripts, the landing page's compute
  // requests) stop at the header.
  const token = sessionTokenFromCookieHeader((await headers()).get("cookie"), sessionCookieName(process.env.NEXTAUTH_URL));
  if (!token) return null;
  const claims = await decodeSessionToken({ token, secret: getAuthSecret() }).catch(() => null);
  const id = claims?.id;
  const sessionId = claims?.sid;
  if (typeof id !== "string" || typeof sessionId !== "string") return null;
  return getActorForSession(id, sessionId);
});

/** The signed-in user; redirects to the sign-in page (coming back to `returnTo`) when there is none. */
export async function requireUser(returnTo?: string): Promise<Actor> {
  const user = await getCurrentUser();
  if (!user) redirect(returnTo ? `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}` : "/sign-in");
  return user;
}
