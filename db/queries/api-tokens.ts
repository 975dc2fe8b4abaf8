import "server-only";
import { and, count, desc, eq, gt, isNull, lt, or, sql } from "drizzle-orm";
import { NotFoundError, ValidationError } from "../../lib/errors";
import { createSecureToken, hashSecureToken } from "../../lib/server/secure-token";
import { apiTokenPrefix, apiTokenSecretSchema, type CreateApiTokenInput } from "../../lib/validations/api-token";
import { db } from "../index";
import { apiTokens, users, type ApiTokenScope } from "../schema";
import { assertUuid, requireActor, type Actor } from "./actor";
import { recordAudit } from "./audit";

/**
 * Personal API tokens. Each account manages its own (no one else, not even a site admin, sees or
 * revokes them). The secret is returned once, at creation; only its SHA-256 digest is stored. A
 * token acts as its account with the account's current rights, so a deleted account's tokens stop
 * at once and a demoted admin's tokens lose the admin's reach at once.
 */
export interface ApiTokenDto {
  id: string;
  name: string;
  scope: ApiTokenScope;
  /** The token's first characters, e.g. "mooring_Xk3f". */
  hint: string;
  createdAt: Date;
  expiresAt: Date;
  lastUsedAt: Date | null;
  revokedAt: Date | null;
}

/** Who a request that carries a token acts as, and within which scope. */
export interface ApiTokenCaller {
  actor: Actor;
  tokenId: string;
  scope: ApiTokenScope;
}

/** Live (not revoked, not expired) tokens one account may hold at once. */
export const maxLiveApiTokens = 20;
/** How many characters of a token the lists show. */
const hintLength = apiTokenPrefix.length + 4;
/** `last_used_at` is refreshed when it is older than this, not on every request. */
const lastUsedResolutionMs = 5 * 60 * 1000;

/** Creates a token for the actor's own account; returns the plain secret once. */
export async function createApiToken(
  actor: Actor | null,
  input: CreateApiTokenInput,
): Promise<{ token: ApiTokenDto; secret: string }> {
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    // Serialise one account's creations so two at once cannot pass the limit together.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`api-tokens:${signedIn.id}`}))`);
    const [live] = await tx
      .select({ n: count() })
      .from(apiTokens)
      .where(and(eq(apiTokens.userId, signedIn.id), isNull(apiTokens.revokedAt), gt(apiTokens.expiresAt, sql`now()`)));
    if ((live?.n ?? 0) >= maxLiveApiTokens) {
      throw ValidationError.at(["name"], `You already have ${maxLiveApiTokens} live tokens; revoke one you no longer use first.`);
    }
    const secret = `${apiTokenPrefix}${createSecureToken()}`;
    const [row] = await tx
      .insert(apiTokens)
      .values({
        userId: signedIn.id,
        name: input.name,
        scope: input.scope,
        tokenHash: hashSecureToken(secret),
        hint: secret.slice(0, hintLength),
        expiresAt: new Date(Date.now() + input.expiresInDays * 24 * 60 * 60 * 1000),
      })
      .returning();
    if (!row) throw new Error("API token insert returned no row.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: null,
      action: "api_token.create",
      entityType: "api_token",
      entityId: row.id,
      details: { name: row.name, scope: row.scope, expiresAt: row.expiresAt.toISOString() },
    });
    return { token: toDto(row), secret };
  });
}

/** The actor's own tokens, newest first, including expired and revoked ones. */
export async function listApiTokens(actor: Actor | null): Promise<ApiTokenDto[]> {
  const signedIn = requireActor(actor);
  const rows = await db.select().from(apiTokens).where(eq(apiTokens.userId, signedIn.id)).orderBy(desc(apiTokens.createdAt));
  return rows.map(toDto);
}

/** Revokes one of the actor's own tokens; it is refused from the next request on. Revoking twice is harmless. */
export async function revokeApiToken(actor: Actor | null, tokenId: string): Promise<ApiTokenDto> {
  const signedIn = requireActor(actor);
  assertUuid(tokenId, "token");
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(apiTokens)
      .set({ revokedAt: sql`coalesce(${apiTokens.revokedAt}, now())` })
      .where(and(eq(apiTokens.id, tokenId), eq(apiTokens.userId, signedIn.id)))
      .returning();
    // Someone else's token is "no such token": its existence does not leak.
    if (!row) throw new NotFoundError("No such token.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: null,
      action: "api_token.revoke",
      entityType: "api_token",
      entityId: row.id,
      details: { name: row.name },
    });
    return toDto(row);
  });
}

/**
 * The caller behind a token sent by a script, or null when the token is malformed, unknown,
 * revoked or expired, or its account is deleted. One indexed lookup (the digest is unique) that
 * also reads the account's current name and site role; `last_used_at` is written only when it is
 * older than a few minutes. Authorizes nothing by itself: route handlers check the scope and the
 * DAL checks the account's rights as for a signed-in user.
 */
export async function getApiTokenCaller(secret: string): Promise<ApiTokenCaller | null> {
  if (!apiTokenSecretSchema.safeParse(secret).success) return null;
  const [row] = await tokenCallerStatement.execute({ tokenHash: hashSecureToken(secret) });
  if (!row) return null;
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > lastUsedResolutionMs) {
    await db
      .update(apiTokens)
      .set({ lastUsedAt: sql`now()` })
      .where(
        and(
          eq(apiTokens.id, row.tokenId),
          or(isNull(apiTokens.lastUsedAt), lt(apiTokens.lastUsedAt, sql`now() - make_interval(secs => ${lastUsedResolutionMs / 1000})`)),
        ),
      );
  }
  return { actor: { id: row.id, email: row.email, name: row.name, siteRole: row.siteRole }, tokenId: row.tokenId, scope: row.scope };
}

// Prepared once per connection, like the session's actor lookup (db/queries/actor.ts): a script
// sends the token on every request.
const tokenCallerStatement = db
  .select({
    tokenId: apiTokens.id,
    scope: apiTokens.scope,
    lastUsedAt: apiTokens.lastUsedAt,
    id: users.id,
    email: users.email,
    name: users.name,
    siteRole: users.siteRole,
  })
  .from(apiTokens)
  .innerJoin(users, eq(users.id, apiTokens.userId))
  .where(
    and(
      eq(apiTokens.tokenHash, sql.placeholder("tokenHash")),
      isNull(apiTokens.revokedAt),
      gt(apiTokens.expiresAt, sql`now()`),
      isNull(users.deletedAt),
    ),
  )
  .limit(1)
  .prepare("api_token_caller");

function toDto(row: typeof apiTokens.$inferSelect): ApiTokenDto {
  return {
    id: row.id,
    name: row.name,
    scope: row.scope,
    hint: row.hint,
    createdAt: row.createdAt,
    expiresAt: row.expiresAt,
    lastUsedAt: row.lastUsedAt,
    revokedAt: row.revokedAt,
  };
}
