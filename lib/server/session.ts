import "server-only";
import { getServerSession } from "next-auth";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getActorById, type Actor } from "@/db/queries/actor";
import { authOptions } from "@/lib/server/auth";

/**
 * The signed-in user as an Actor, or null. The session only names the account; name and site role
 * are read fresh from the database (once per request), so a demoted or deleted account loses its
 * rights at once instead of when its session expires.
 */
export const getCurrentUser = cache(async (): Promise<Actor | null> => {
  // Callers without a session cookie (scripts, the landing page's compute requests) skip next-auth.
  if (!(await cookies()).getAll().some((cookie) => cookie.name.includes("next-auth.session-token"))) return null;
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id) return null;
  return getActorById(id);
});

/** The signed-in user; redirects to the sign-in page (coming back to `returnTo`) when there is none. */
export async function requireUser(returnTo?: string): Promise<Actor> {
  const user = await getCurrentUser();
  if (!user) redirect(returnTo ? `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}` : "/sign-in");
  return user;
}
