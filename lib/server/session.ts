import "server-only";
import { getToken } from "next-auth/jwt";
import { cookies } from "next/headers";
import type { NextRequest } from "next/server";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getActorForSession, type Actor } from "@/db/queries/actor";
import { getAuthSecret } from "@/lib/server/auth-secret";
import { decodeSessionToken } from "@/lib/server/session-token";

/**
 * The signed-in user as an Actor, or null. The session token only names the account and its
 * session; one query per request checks that the session is still open and reads name and site
 * role fresh, so a signed-out or revoked session, or a demoted or deleted account, loses its rights
 * at once instead of when its token expires. Tokens without a session id (from before sessions
 * were recorded) count as signed out.
 */
export const getCurrentUser = cache(async (): Promise<Actor | null> => {
  const store = await cookies();
  // Callers without a session cookie (scripts, the landing page's compute requests) skip next-auth.
  if (!store.getAll().some((cookie) => cookie.name.includes("next-auth.session-token"))) return null;
  // The token is decrypted and checked (expiry included) as next-auth's getServerSession does, but
  // without its session route, which also re-encrypts the token into a new cookie on every call:
  // the browser's SessionProvider keeps the session sliding through /api/auth/session. Only the
  // cookies are passed, so a JWT in an Authorization header is never taken for a session. The key is
  // derived once (session-token.ts).
  const token = await getToken({ req: { cookies: store, headers: {} } as unknown as NextRequest, secret: getAuthSecret(), decode: decodeSessionToken });
  const id = token?.id;
  const sessionId = token?.sid;
  if (typeof id !== "string" || typeof sessionId !== "string") return null;
  return getActorForSession(id, sessionId);
});

/** The signed-in user; redirects to the sign-in page (coming back to `returnTo`) when there is none. */
export async function requireUser(returnTo?: string): Promise<Actor> {
  const user = await getCurrentUser();
  if (!user) redirect(returnTo ? `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}` : "/sign-in");
  return user;
}
