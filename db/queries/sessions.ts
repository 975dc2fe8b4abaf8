import "server-only";
import { and, eq, isNull, ne } from "drizzle-orm";
import { db, type Executor } from "../index";
import { sessions } from "../schema";
import { forgetSessionsOf } from "../session-cache";
import { isUuid, requireActor, type Actor } from "./actor";
import { recordAudit } from "./audit";

/**
 * Signed-in sessions, one row per browser or device. A session's JWT carries the row's id; the
 * per-request check is `getActorForSession` in ./actor.ts.
 */

/**
 * Opens a session for a user who has just proved who they are (password, e-mailed link) and
 * returns its id for the session token. Called by next-auth's jwt callback, never by a request.
 */
export async function startSession(userId: string): Promise<string> {
  const [row] = await db.insert(sessions).values({ userId }).returning({ id: sessions.id });
  if (!row) throw new Error("Session insert returned no row.");
  return row.id;
}

/** Ends one session (signing out); a session of another user, or one already ended, is left alone. */
export async function endSession(userId: string, sessionId: string): Promise<void> {
  if (!isUuid(userId) || !isUuid(sessionId)) return;
  await db
    .update(sessions)
    .set({ revokedAt: new Date() })
    .where(and(eq(sessions.id, sessionId), eq(sessions.userId, userId), isNull(sessions.revokedAt)));
  forgetSessionsOf(userId);
}

/** Ends every session of the signed-in user, this one included ("sign out of all devices"). */
export async function signOutEverywhere(actor: Actor | null): Promise<{ ended: number }> {
  const signedIn = requireActor(actor);
  const result = await db.transaction(async (tx) => {
    const ended = await revokeSessions(tx, signedIn.id);
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: null,
      action: "user.sign_out_everywhere",
      entityType: "user",
      entityId: signedIn.id,
      details: { ended },
    });
    return { ended };
  });
  forgetSessionsOf(signedIn.id);
  return result;
}

/**
 * Revokes the user's open sessions, all of them or all but `except` (the one making a password
 * change), and returns how many were open. The caller calls `forgetSessionsOf` (db/session-cache.ts)
 * once its transaction has committed.
 */
export async function revokeSessions(executor: Executor, userId: string, options: { except?: string } = {}): Promise<number> {
  const revoked = await executor
    .update(sessions)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(sessions.userId, userId),
        isNull(sessions.revokedAt),
        options.except && isUuid(options.except) ? ne(sessions.id, options.except) : undefined,
      ),
    )
    .returning({ id: sessions.id });
  return revoked.length;
}
