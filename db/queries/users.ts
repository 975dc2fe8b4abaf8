import "server-only";
import { randomBytes } from "node:crypto";
import { and, asc, count, eq, gt, ilike, isNull, lt, or, sql } from "drizzle-orm";
import { NotFoundError, UnauthenticatedError, ValidationError } from "../../lib/errors";
import { comparePassword, hashPassword } from "../../lib/server/password-hashing";
import { createSecureToken, hashSecureToken } from "../../lib/server/secure-token";
import { isStorableText } from "../../lib/storable-text";
import { db, type Executor, type Transaction } from "../index";
import { authTokens, pendingSignUps, users, type AuthTokenKind, type SiteRole } from "../schema";
import { forgetSessionsOf } from "../session-cache";
import { assertUuid, requireActor, requireSiteAdmin, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { createPersonalGroup } from "./groups";
import { revokeSessions } from "./sessions";

/** bcrypt cost factor for password hashes. */
export const bcryptCost = 12;
/** Lifetime of a sign-in link. */
export const signInLinkMinutes = 15;
/** Lifetime of the link that confirms a sign-up. */
export const signUpLinkHours = 24;
/** Lifetime of a password-reset link. */
export const passwordResetMinutes = 60;
/** Shortest accepted password. */
export const minPasswordLength = 8;

/** The signed-in user's own account. */
export interface AccountDto {
  id: string;
  email: string;
  name: string;
  siteRole: SiteRole;
  hasPassword: boolean;
  emailVerifiedAt: Date | null;
  createdAt: Date;
}

/** A row of the admin users table. */
export interface UserSummaryDto {
  id: string;
  email: string;
  name: string;
  siteRole: SiteRole;
  emailVerifiedAt: Date | null;
  createdAt: Date;
}

/** Input of `createUser`. */
export interface CreateUserInput {
  email: string;
  name: string;
  /** Plain password (hashed here); omit for an account that signs in by e-mail link only. */
  password?: string | null;
  /** Only a site admin may create another admin. */
  siteRole?: SiteRole;
  /** Marks the e-mail as verified (e.g. an account created from an accepted invitation). */
  emailVerified?: boolean;
}

/** A token freshly issued for an e-mail link: send `token`, never store it. */
export interface IssuedToken {
  token: string;
  expiresAt: Date;
  user: { id: string; email: string; name: string };
}

/** Input of `updateAccount`. */
export interface UpdateAccountInput {
  name?: string;
  /** Required to change the password when the account already has one. */
  currentPassword?: string;
  newPassword?: string;
}

/** Lowercased, trimmed e-mail; the form stored and compared everywhere. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

/**
 * Creates an account with its personal space (sign-up when `actor` is null, or by an admin).
 * A duplicate e-mail fails with a ValidationError on ["email"]; nothing is written then.
 */
export async function createUser(actor: Actor | null, input: CreateUserInput): Promise<AccountDto> {
  if (input.siteRole === "admin") requireSiteAdmin(actor);
  const email = normalizeEmail(input.email);
  const name = input.name.trim();
  const issues = accountProblems(email, name, input.password);
  if (issues.length > 0) throw new ValidationError(issues);
  const passwordHash = input.password != null ? await hashPassword(input.password, bcryptCost) : null;

  return db.transaction(async (tx) => {
    const user = await insertAccount(tx, actor, {
      email,
      name,
      passwordHash,
      siteRole: input.siteRole ?? "member",
      emailVerifiedAt: input.emailVerified ? new Date() : null,
    });
    if (!user) throw ValidationError.at(["email"], "An account with this e-mail already exists.");
    return toAccountDto(user);
  });
}

/** Input of `requestSignUp`: what the sign-up form asks for. */
export interface SignUpInput {
  email: string;
  name: string;
  password: string;
}

/**
 * What `requestSignUp` leads to: a confirmation link to mail to a new address, or, for an address
 * that already has an account, a note to its owner. The caller answers both the same way.
 */
export type SignUpRequest =
  | { kind: "new"; email: string; name: string; token: string; expiresAt: Date }
  | { kind: "existing"; email: string; name: string }
  | { kind: "unavailable" };

/**
 * Starts a sign-up: nothing is created until the address is confirmed (`confirmSignUp`), so a
 * sign-up with someone else's address leads nowhere. Both outcomes do the same work (one bcrypt
 * hash, one sweep of expired sign-ups), so neither the answer nor its timing tells whether the
 * address has an account. Invalid fields give a ValidationError, as `createUser`.
 */
export async function requestSignUp(_actor: Actor | null, input: SignUpInput): Promise<SignUpRequest> {
  const email = normalizeEmail(input.email);
  const name = input.name.trim();
  const issues = accountProblems(email, name, input.password);
  if (issues.length > 0) throw new ValidationError(issues);
  const passwordHash = await hashPassword(input.password, bcryptCost);
  await db.delete(pendingSignUps).where(lt(pendingSignUps.expiresAt, sql`now()`));
  const [existing] = await db
    .select({ email: users.email, name: users.name, deletedAt: users.deletedAt })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  if (existing) return existing.deletedAt ? { kind: "unavailable" } : { kind: "existing", email: existing.email, name: existing.name };
  const token = createSecureToken();
  const expiresAt = new Date(Date.now() + signUpLinkHours * 60 * 60_000);
  await db.insert(pendingSignUps).values({ email, name, passwordHash, tokenHash: hashSecureToken(token), expiresAt });
  return { kind: "new", email, name, token, expiresAt };
}

/** The address a sign-up confirmation link is for, or null when the link is unknown or expired. */
export async function getPendingSignUp(_actor: Actor | null, token: string): Promise<{ email: string; name: string } | null> {
  const [row] = await db
    .select({ email: pendingSignUps.email, name: pendingSignUps.name })
    .from(pendingSignUps)
    .where(and(eq(pendingSignUps.tokenHash, hashSecureToken(token)), gt(pendingSignUps.expiresAt, sql`now()`)))
    .limit(1);
  return row ?? null;
}

/**
 * Finishes a sign-up from its mailed link: the password chosen at sign-up must be entered again,
 * which proves that whoever opened the mail also started the sign-up. Creates the account (e-mail
 * verified) with its personal space and drops every other pending sign-up for the address.
 * An unknown or expired link is a ValidationError on ["token"], a wrong password one on ["password"].
 */
export async function confirmSignUp(_actor: Actor | null, token: string, password: string): Promise<AccountDto> {
  const [pending] = await db
    .select()
    .from(pendingSignUps)
    .where(and(eq(pendingSignUps.tokenHash, hashSecureToken(token)), gt(pendingSignUps.expiresAt, sql`now()`)))
    .limit(1);
  if (!pending) throw ValidationError.at(["token"], "This link is not valid or has expired; sign up again.");
  if (!(await comparePassword(password, pending.passwordHash))) {
    throw ValidationError.at(["password"], "That is not the password chosen when signing up.");
  }
  return db.transaction(async (tx) => {
    const dropped = await tx.delete(pendingSignUps).where(eq(pendingSignUps.email, pending.email)).returning({ id: pendingSignUps.id });
    // A second tab confirming the same link got here first.
    if (!dropped.some((row) => row.id === pending.id)) throw ValidationError.at(["token"], "This link has already been used; sign in instead.");
    const user = await insertAccount(tx, null, {
      email: pending.email,
      name: pending.name,
      passwordHash: pending.passwordHash,
      siteRole: "member",
      emailVerifiedAt: new Date(),
    });
    if (!user) throw ValidationError.at(["token"], "An account with this address exists already; sign in instead.");
    return toAccountDto(user);
  });
}

/**
 * Checks e-mail and password for a sign-in and returns the Actor. Wrong credentials give
 * UnauthenticatedError with the same message, and the same bcrypt work, whether or not the account
 * exists. Repeated failures are slowed down by lib/server/sign-in-limit.ts, per client.
 */
export async function verifyPassword(
  _actor: Actor | null,
  email: string,
  password: string,
): Promise<Actor> {
  const [user] = await db
    .select()
    .from(users)
    .where(and(eq(users.email, normalizeEmail(email)), isNull(users.deletedAt)))
    .limit(1);
  const hash = user?.passwordHash ?? (await getDummyHash());
  const matches = await comparePassword(password, hash);
  if (!user || !user.passwordHash || !matches) throw new UnauthenticatedError("Wrong e-mail or password.");
  return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
}

/**
 * Issues a single-use sign-in link token for the account with this e-mail, or returns null when
 * there is no such account (answer the user the same way in both cases).
 */
export async function issueSignInLinkToken(
  actor: Actor | null,
  email: string,
): Promise<IssuedToken | null> {
  return issueToken(actor, email, "sign_in_link", signInLinkMinutes);
}

/** Issues a single-use password-reset token, or null when there is no such account. */
export async function issuePasswordResetToken(
  actor: Actor | null,
  email: string,
): Promise<IssuedToken | null> {
  return issueToken(actor, email, "password_reset", passwordResetMinutes);
}

/**
 * Consumes a sign-in link token and returns the Actor to sign in. The e-mail counts as verified.
 * An account whose address was never verified but has a password (made before sign-ups were
 * confirmed by mail, possibly by someone else using this address) loses that password and its
 * sessions here: whoever reads this mailbox owns the account from now on.
 * Unknown, expired and reused tokens give a ValidationError on ["token"] saying which.
 */
export async function consumeSignInLinkToken(_actor: Actor | null, token: string): Promise<Actor> {
  const result = await db.transaction(async (tx) => {
    const userId = await consumeToken(tx, token, "sign_in_link");
    const [before] = await tx
      .select({ emailVerifiedAt: users.emailVerifiedAt, passwordHash: users.passwordHash })
      .from(users)
      .where(and(eq(users.id, userId), isNull(users.deletedAt)))
      .for("update")
      .limit(1);
    if (!before) throw ValidationError.at(["token"], "This link is not valid.");
    const unprovenPassword = before.emailVerifiedAt === null && before.passwordHash !== null;
    const [user] = await tx
      .update(users)
      .set({ emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`, ...(unprovenPassword ? { passwordHash: null } : {}) })
      .where(eq(users.id, userId))
      .returning();
    if (!user) throw ValidationError.at(["token"], "This link is not valid.");
    if (unprovenPassword) {
      await revokeSessions(tx, user.id);
      await recordAudit(tx, {
        actorId: user.id,
        groupId: null,
        action: "user.unverified_password_cleared",
        entityType: "user",
        entityId: user.id,
      });
    }
    await recordAudit(tx, {
      actorId: user.id,
      groupId: null,
      action: "user.sign_in_link_used",
      entityType: "user",
      entityId: user.id,
    });
    return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
  });
  forgetSessionsOf(result.id);
  return result;
}

/**
 * Sets a new password with a reset token; also verifies the e-mail, ends every session of the
 * account and invalidates its other unused e-mailed links (sign-in and reset alike), so whoever
 * held the account before the reset is out.
 */
export async function resetPasswordWithToken(
  _actor: Actor | null,
  token: string,
  newPassword: string,
): Promise<Actor> {
  const problem = passwordProblem(newPassword);
  if (problem) throw ValidationError.at(["password"], problem);
  const passwordHash = await hashPassword(newPassword, bcryptCost);
  const result = await db.transaction(async (tx) => {
    const userId = await consumeToken(tx, token, "password_reset");
    const [user] = await tx
      .update(users)
      .set({
        passwordHash,
        emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`,
      })
      .where(and(eq(users.id, userId), isNull(users.deletedAt)))
      .returning();
    if (!user) throw ValidationError.at(["token"], "This link is not valid.");
    await tx
      .update(authTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(authTokens.userId, userId), isNull(authTokens.usedAt)));
    const endedSessions = await revokeSessions(tx, userId);
    await recordAudit(tx, {
      actorId: user.id,
      groupId: null,
      action: "user.password_reset",
      entityType: "user",
      entityId: user.id,
      details: { endedSessions },
    });
    return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
  });
  forgetSessionsOf(result.id);
  return result;
}

/** The signed-in user's account. */
export async function getAccount(actor: Actor | null): Promise<AccountDto> {
  return toAccountDto(await loadOwnAccount(actor));
}

/**
 * Changes the signed-in user's name and/or password (the current password is required to change
 * it). A password change ends the account's other sessions and keeps the one making the change.
 */
export async function updateAccount(
  actor: Actor | null,
  input: UpdateAccountInput,
): Promise<AccountDto> {
  const user = await loadOwnAccount(actor);

  const changes: Partial<typeof users.$inferInsert> = {};
  if (input.name !== undefined) {
    const name = input.name.trim();
    if (!name) throw ValidationError.at(["name"], "Enter your name.");
    changes.name = name;
  }
  if (input.newPassword !== undefined) {
    const problem = passwordProblem(input.newPassword);
    if (problem) throw ValidationError.at(["newPassword"], problem);
    if (user.passwordHash) {
      const current = input.currentPassword ?? "";
      if (!(await comparePassword(current, user.passwordHash))) {
        throw ValidationError.at(["currentPassword"], "The current password is wrong.");
      }
    }
    changes.passwordHash = await hashPassword(input.newPassword, bcryptCost);
  }
  if (Object.keys(changes).length === 0) return toAccountDto(user);

  const result = await db.transaction(async (tx) => {
    const [updated] = await tx.update(users).set(changes).where(eq(users.id, user.id)).returning();
    if (!updated) throw new UnauthenticatedError("Your account no longer exists.");
    // A new password ends every other session: whoever knew the old one is signed out elsewhere.
    const endedSessions = changes.passwordHash ? await revokeSessions(tx, user.id, { except: actor?.sessionId }) : 0;
    await recordAudit(tx, {
      actorId: user.id,
      groupId: null,
      action: "user.update",
      entityType: "user",
      entityId: user.id,
      details: {
        fields: Object.keys(changes).map((key) => (key === "passwordHash" ? "password" : key)),
        ...(changes.passwordHash ? { endedSessions } : {}),
      },
    });
    return toAccountDto(updated);
  });
  forgetSessionsOf(user.id);
  return result;
}

/** All accounts (site admins only), optionally filtered by a search over e-mail and name. */
export async function listUsers(
  actor: Actor | null,
  options: { search?: string; limit?: number; offset?: number } = {},
): Promise<{ items: UserSummaryDto[]; total: number }> {
  requireSiteAdmin(actor);
  const search = options.search?.trim();
  // No account holds text the database cannot store, so such a search matches nothing.
  if (search && !isStorableText(search)) return { items: [], total: 0 };
  const pattern = search ? `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  const where = and(
    isNull(users.deletedAt),
    pattern ? or(ilike(users.email, pattern), ilike(users.name, pattern)) : undefined,
  );
  const [items, totals] = await Promise.all([
    db
      .select({
        id: users.id,
        email: users.email,
        name: users.name,
        siteRole: users.siteRole,
        emailVerifiedAt: users.emailVerifiedAt,
        createdAt: users.createdAt,
      })
      .from(users)
      .where(where)
      .orderBy(asc(users.email))
      .limit(Math.min(Math.max(options.limit ?? 100, 1), 500))
      .offset(Math.max(options.offset ?? 0, 0)),
    db.select({ n: count() }).from(users).where(where),
  ]);
  return { items, total: totals[0]?.n ?? 0 };
}

/** Changes a user's site role (site admins only). The last admin cannot be demoted. */
export async function setSiteRole(
  actor: Actor | null,
  userId: string,
  siteRole: SiteRole,
): Promise<UserSummaryDto> {
  const admin = requireSiteAdmin(actor);
  assertUuid(userId, "user");
  const result = await db.transaction(async (tx) => {
    // Serialise role changes so two admins demoting each other cannot leave no admin.
    await tx.execute(sql`select pg_advisory_xact_lock(72616202)`);
    const [target] = await tx
      .select()
      .from(users)
      .where(and(eq(users.id, userId), isNull(users.deletedAt)))
      .limit(1);
    if (!target) throw new NotFoundError("No such user.");
    if (target.siteRole === "admin" && siteRole !== "admin") {
      const [others] = await tx
        .select({ n: count() })
        .from(users)
        .where(and(eq(users.siteRole, "admin"), isNull(users.deletedAt), sql`${users.id} <> ${userId}`));
      if (!others || others.n === 0) {
        throw ValidationError.at(["siteRole"], "Mooring needs at least one administrator.");
      }
    }
    const [updated] = await tx.update(users).set({ siteRole }).where(eq(users.id, userId)).returning();
    if (!updated) throw new NotFoundError("No such user.");
    await recordAudit(tx, {
      actorId: admin.id,
      groupId: null,
      action: "user.site_role_change",
      entityType: "user",
      entityId: userId,
      details: { from: target.siteRole, to: siteRole },
    });
    return {
      id: updated.id,
      email: updated.email,
      name: updated.name,
      siteRole: updated.siteRole,
      emailVerifiedAt: updated.emailVerifiedAt,
      createdAt: updated.createdAt,
    };
  });
  forgetSessionsOf(userId);
  return result;
}

// A valid bcrypt hash of a random string, compared against when the account does not exist;
// made on first use so importing this module stays cheap.
let dummyHash: Promise<string> | undefined;
function getDummyHash(): Promise<string> {
  if (!dummyHash) {
    const made = hashPassword(randomBytes(16).toString("hex"), bcryptCost);
    dummyHash = made;
    // A first attempt that failed (a busy pool) must not leave a rejected promise for every later caller.
    made.catch(() => {
      if (dummyHash === made) dummyHash = undefined;
    });
  }
  return dummyHash;
}

function passwordProblem(password: string): string | null {
  if (password.length < minPasswordLength) return `Use at least ${minPasswordLength} characters.`;
  // bcrypt ignores everything past 72 bytes; refuse rather than silently truncate.
  if (Buffer.byteLength(password, "utf8") > 72) return "Use at most 72 bytes.";
  return null;
}

async function issueToken(
  actor: Actor | null,
  email: string,
  kind: AuthTokenKind,
  minutes: number,
): Promise<IssuedToken | null> {
  const [user] = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(and(eq(users.email, normalizeEmail(email)), isNull(users.deletedAt)))
    .limit(1);
  if (!user) return null;
  const token = createSecureToken();
  const expiresAt = new Date(Date.now() + minutes * 60_000);
  await db.transaction(async (tx) => {
    await tx.insert(authTokens).values({ kind, tokenHash: hashSecureToken(token), userId: user.id, expiresAt });
    await recordAudit(tx, {
      actorId: actor?.id ?? null,
      groupId: null,
      action: `user.${kind}_issued`,
      entityType: "user",
      entityId: user.id,
    });
  });
  return { token, expiresAt, user };
}

/** Marks the token used and returns its user id; explains unknown, expired and reused tokens. */
async function consumeToken(
  executor: Transaction,
  token: string,
  kind: AuthTokenKind,
): Promise<string> {
  const tokenHash = hashSecureToken(token);
  const [used] = await executor
    .update(authTokens)
    .set({ usedAt: new Date() })
    .where(
      and(
        eq(authTokens.tokenHash, tokenHash),
        eq(authTokens.kind, kind),
        isNull(authTokens.usedAt),
        gt(authTokens.expiresAt, sql`now()`),
      ),
    )
    .returning({ userId: authTokens.userId });
  if (used) return used.userId;
  const [row] = await executor
    .select({ usedAt: authTokens.usedAt, expiresAt: authTokens.expiresAt })
    .from(authTokens)
    .where(and(eq(authTokens.tokenHash, tokenHash), eq(authTokens.kind, kind)))
    .limit(1);
  if (!row) throw ValidationError.at(["token"], "This link is not valid.");
  if (row.usedAt) throw ValidationError.at(["token"], "This link has already been used; request a new one.");
  throw ValidationError.at(["token"], "This link has expired; request a new one.");
}

/** The actor's own live user row; UnauthenticatedError when signed out or the account is gone. */
async function loadOwnAccount(actor: Actor | null): Promise<typeof users.$inferSelect> {
  const signedIn = requireActor(actor);
  const [user] = await db
    .select()
    .from(users)
    .where(and(eq(users.id, signedIn.id), isNull(users.deletedAt)))
    .limit(1);
  if (!user) throw new UnauthenticatedError("Your account no longer exists.");
  return user;
}

/** Checks of a new account's fields, every problem at once. */
function accountProblems(email: string, name: string, password: string | null | undefined): { path: string[]; message: string }[] {
  const issues: { path: string[]; message: string }[] = [];
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) issues.push({ path: ["email"], message: "Enter a valid e-mail address." });
  if (!name) issues.push({ path: ["name"], message: "Enter your name." });
  if (password != null) {
    const problem = passwordProblem(password);
    if (problem) issues.push({ path: ["password"], message: problem });
  }
  return issues;
}

/**
 * Inserts an account with its personal space and audit entry, or returns null when the e-mail is
 * taken. Runs inside the caller's transaction.
 */
async function insertAccount(
  tx: Executor,
  actor: Actor | null,
  values: Pick<typeof users.$inferInsert, "email" | "name" | "passwordHash" | "siteRole" | "emailVerifiedAt">,
): Promise<typeof users.$inferSelect | null> {
  const [user] = await tx.insert(users).values(values).onConflictDoNothing({ target: users.email }).returning();
  if (!user) return null;
  await createPersonalGroup(tx, user);
  await recordAudit(tx, {
    actorId: actor?.id ?? user.id,
    groupId: null,
    action: "user.create",
    entityType: "user",
    entityId: user.id,
    details: { siteRole: user.siteRole },
  });
  return user;
}

function toAccountDto(user: typeof users.$inferSelect): AccountDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    siteRole: user.siteRole,
    hasPassword: user.passwordHash !== null,
    emailVerifiedAt: user.emailVerifiedAt,
    createdAt: user.createdAt,
  };
}
