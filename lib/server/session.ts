import "server-only";
import { getServerSession } from "next-auth";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getActorForSession, type Actor } from "@/db/queries/actor";
import { authOptions } from "@/lib/server/auth";

/**
 * The signed-in user as an Actor, or null. The session token only names the account and its
 * session; one query per request checks that the session is still open and reads name and site
 * role fresh, so a signed-out or revoked session, or a demoted or deleted account, loses its rights
 * at once instead of when its token expires. Tokens without a session id (from before sessions
 * were recorded) count as signed out.
 */
export const getCurrentUser = cache(async (): Promise<Actor | null> => {
  // Callers without a session cookie (scripts, the landing page's compute requests) skip next-auth.
  if (!(await cookies()).getAll().some((cookie) => cookie.name.includes("next-auth.session-token"))) return null;
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  const sessionId = session?.user?.sessionId;
  if (!id || !sessionId) return null;
  return getActorForSession(id, sessionId);
});

/** The signed-in user; redirects to the sign-in page (coming back to `returnTo`) when there is none. */
export async function requireUser(returnTo?: string): Promise<Actor> {
  const user = await getCurrentUser();
  if (!user) redirect(returnTo ? `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}` : "/sign-in");
  return user;
}
