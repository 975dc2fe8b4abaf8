import "server-only";
import { randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { and, asc, count, eq, gt, ilike, isNull, or, sql } from "drizzle-orm";
import {
  NotFoundError,
  RateLimitError,
  UnauthenticatedError,
  ValidationError,
} from "../../lib/errors";
import { createSecureToken, hashSecureToken } from "../../lib/server/secure-token";
import { db, type Transaction } from "../index";
import { authTokens, users, type AuthTokenKind, type SiteRole } from "../schema";
import { assertUuid, requireActor, requireSiteAdmin, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { createPersonalGroup } from "./groups";

/** bcrypt cost factor for password hashes. */
export const bcryptCost = 12;
/** Consecutive failed sign-ins that lock an account. */
export const maxFailedSignIns = 10;
/** How long a lockout lasts. */
export const lockoutMinutes = 15;
/** Lifetime of a sign-in link. */
export const signInLinkMinutes = 15;
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
  lockedUntil: Date | null;
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
  const issues: { path: string[]; message: string }[] = [];
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) issues.push({ path: ["email"], message: "Enter a valid e-mail address." });
  if (!name) issues.push({ path: ["name"], message: "Enter your name." });
  if (input.password != null) {
    const problem = passwordProblem(input.password);
    if (problem) issues.push({ path: ["password"], message: problem });
  }
  if (issues.length > 0) throw new ValidationError(issues);
  const passwordHash = input.password != null ? await bcrypt.hash(input.password, bcryptCost) : null;

  return db.transaction(async (tx) => {
    const [user] = await tx
      .insert(users)
      .values({
        email,
        name,
        passwordHash,
        siteRole: input.siteRole ?? "member",
        emailVerifiedAt: input.emailVerified ? new Date() : null,
      })
      .onConflictDoNothing({ target: users.email })
      .returning();
    if (!user) throw ValidationError.at(["email"], "An account with this e-mail already exists.");
    await createPersonalGroup(tx, user);
    await recordAudit(tx, {
      actorId: actor?.id ?? user.id,
      groupId: null,
      action: "user.create",
      entityType: "user",
      entityId: user.id,
      details: { siteRole: user.siteRole },
    });
    return toAccountDto(user);
  });
}

/**
 * Checks e-mail and password for a sign-in and returns the Actor. Wrong credentials give
 * UnauthenticatedError (the same message whether or not the account exists); after
 * `maxFailedSignIns` consecutive failures the account is locked for `lockoutMinutes`, during
 * which even the right password gets RateLimitError.
 */
export async function verifyPassword(
  _actor: Actor | null,
  email: string,
  password: string,
): Promise<Actor> {
  const wrong = new UnauthenticatedError("Wrong e-mail or password.");
  const [user] = await db
    .select()
    .from(users)
    .where(and(eq(users.email, normalizeEmail(email)), isNull(users.deletedAt)))
    .limit(1);
  if (!user || !user.passwordHash) {
    // Spend the same time as a real check so response times do not reveal which e-mails exist.
    await bcrypt.compare(password, await getDummyHash());
    throw wrong;
  }
  const now = Date.now();
  if (user.lockedUntil && user.lockedUntil.getTime() > now) throw lockedError(user.lockedUntil);

  if (await bcrypt.compare(password, user.passwordHash)) {
    if (user.failedSignIns > 0 || user.lockedUntil) {
      await db.update(users).set({ failedSignIns: 0, lockedUntil: null }).where(eq(users.id, user.id));
    }
    return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
  }

  // One atomic statement, so concurrent failures are all counted. An expired lock starts a new count.
  const expired = sql`(${users.lockedUntil} is not null and ${users.lockedUntil} <= now())`;
  const nextCount = sql`case when ${expired} then 1 else ${users.failedSignIns} + 1 end`;
  const [updated] = await db
    .update(users)
    .set({
      failedSignIns: sql`${nextCount}`,
      lockedUntil: sql`case
        when ${nextCount} >= ${maxFailedSignIns} then now() + make_interval(mins => ${lockoutMinutes})
        when ${expired} then null
        else ${users.lockedUntil} end`,
    })
    .where(eq(users.id, user.id))
    .returning({ failedSignIns: users.failedSignIns, lockedUntil: users.lockedUntil });
  if (updated?.lockedUntil && updated.failedSignIns === maxFailedSignIns) {
    await recordAudit(db, {
      actorId: null,
      groupId: null,
      action: "user.lock",
      entityType: "user",
      entityId: user.id,
      details: { failedSignIns: updated.failedSignIns },
    });
    throw lockedError(updated.lockedUntil);
  }
  if (updated?.lockedUntil && updated.lockedUntil.getTime() > now) throw lockedError(updated.lockedUntil);
  throw wrong;
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
 * Unknown, expired and reused tokens give a ValidationError on ["token"] saying which.
 */
export async function consumeSignInLinkToken(_actor: Actor | null, token: string): Promise<Actor> {
  return db.transaction(async (tx) => {
    const userId = await consumeToken(tx, token, "sign_in_link");
    const [user] = await tx
      .update(users)
      .set({ emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())` })
      .where(and(eq(users.id, userId), isNull(users.deletedAt)))
      .returning();
    if (!user) throw ValidationError.at(["token"], "This link is not valid.");
    await recordAudit(tx, {
      actorId: user.id,
      groupId: null,
      action: "user.sign_in_link_used",
      entityType: "user",
      entityId: user.id,
    });
    return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
  });
}

/**
 * Sets a new password with a reset token; also clears a lockout, verifies the e-mail and
 * invalidates the account's other unused reset tokens.
 */
export async function resetPasswordWithToken(
  _actor: Actor | null,
  token: string,
  newPassword: string,
): Promise<Actor> {
  const problem = passwordProblem(newPassword);
  if (problem) throw ValidationError.at(["password"], problem);
  const passwordHash = await bcrypt.hash(newPassword, bcryptCost);
  return db.transaction(async (tx) => {
    const userId = await consumeToken(tx, token, "password_reset");
    const [user] = await tx
      .update(users)
      .set({
        passwordHash,
        failedSignIns: 0,
        lockedUntil: null,
        emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`,
      })
      .where(and(eq(users.id, userId), isNull(users.deletedAt)))
      .returning();
    if (!user) throw ValidationError.at(["token"], "This link is not valid.");
    await tx
      .update(authTokens)
      .set({ usedAt: new Date() })
      .where(
        and(
          eq(authTokens.userId, userId),
          eq(authTokens.kind, "password_reset"),
          isNull(authTokens.usedAt),
        ),
      );
    await recordAudit(tx, {
      actorId: user.id,
      groupId: null,
      action: "user.password_reset",
      entityType: "user",
      entityId: user.id,
    });
    return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
  });
}

/** The signed-in user's account. */
export async function getAccount(actor: Actor | null): Promise<AccountDto> {
  return toAccountDto(await loadOwnAccount(actor));
}

/** Changes the signed-in user's name and/or password (the current password is required to change it). */
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
      if (!(await bcrypt.compare(current, user.passwordHash))) {
        throw ValidationError.at(["currentPassword"], "The current password is wrong.");
      }
    }
    changes.passwordHash = await bcrypt.hash(input.newPassword, bcryptCost);
  }
  if (Object.keys(changes).length === 0) return toAccountDto(user);

  return db.transaction(async (tx) => {
    const [updated] = await tx.update(users).set(changes).where(eq(users.id, user.id)).returning();
    if (!updated) throw new UnauthenticatedError("Your account no longer exists.");
    await recordAudit(tx, {
      actorId: user.id,
      groupId: null,
      action: "user.update",
      entityType: "user",
      entityId: user.id,
      details: { fields: Object.keys(changes).map((key) => (key === "passwordHash" ? "password" : key)) },
    });
    return toAccountDto(updated);
  });
}

/** All accounts (site admins only), optionally filtered by a search over e-mail and name. */
export async function listUsers(
  actor: Actor | null,
  options: { search?: string; limit?: number; offset?: number } = {},
): Promise<{ items: UserSummaryDto[]; total: number }> {
  requireSiteAdmin(actor);
  const search = options.search?.trim();
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
        lockedUntil: users.lockedUntil,
        createdAt: users.createdAt,
      })
      .from(users)
      .where(where)
      .orderBy(asc(users.email))
      .limit(Math.min(Math.max(options.limit ?? 100, 1), 500))
      .offset(Math.max(options.offset ?? 0, 0)),
    db.select({ n: count() }).from(users).where(where),
  ]);
  return {
    items: items.map((item) => ({
      ...item,
      lockedUntil: item.lockedUntil && item.lockedUntil.getTime() > Date.now() ? item.lockedUntil : null,
    })),
    total: totals[0]?.n ?? 0,
  };
}

/** Changes a user's site role (site admins only). The last admin cannot be demoted. */
export async function setSiteRole(
  actor: Actor | null,
  userId: string,
  siteRole: SiteRole,
): Promise<UserSummaryDto> {
  const admin = requireSiteAdmin(actor);
  assertUuid(userId, "user");
  return db.transaction(async (tx) => {
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
      lockedUntil: updated.lockedUntil,
      createdAt: updated.createdAt,
    };
  });
}

// A valid bcrypt hash of a random string, compared against when the account does not exist;
// made on first use so importing this module stays cheap.
let dummyHash: Promise<string> | undefined;
function getDummyHash(): Promise<string> {
  dummyHash ??= bcrypt.hash(randomBytes(16).toString("hex"), bcryptCost);
  return dummyHash;
}

function passwordProblem(password: string): string | null {
  if (password.length < minPasswordLength) return `Use at least ${minPasswordLength} characters.`;
  // bcrypt ignores everything past 72 bytes; refuse rather than silently truncate.
  if (Buffer.byteLength(password, "utf8") > 72) return "Use at most 72 bytes.";
  return null;
}

function lockedError(until: Date): RateLimitError {
  const seconds = Math.max(1, Math.ceil((until.getTime() - Date.now()) / 1000));
  const minutes = Math.ceil(seconds / 60);
  return new RateLimitError(
    seconds,
    `Too many failed sign-ins. This account is locked for ${minutes} more minute${minutes === 1 ? "" : "s"}; you can also reset the password.`,
  );
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
