import { createHash } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { authTokens, groups, users } from "@/db/schema";
import { getActorForSession } from "@/db/queries/actor";
import { startSession } from "@/db/queries/sessions";
import {
  consumeSignInLinkToken,
  createUser,
  getAccount,
  issuePasswordResetToken,
  issueSignInLinkToken,
  listUsers,
  resetPasswordWithToken,
  setSiteRole,
  updateAccount,
  verifyPassword,
} from "@/db/queries/users";
import { ForbiddenError, UnauthenticatedError, ValidationError } from "@/lib/errors";
import { createTestUser } from "@/tests/fixtures/users";

function uniqueEmail(label: string): string {
  return `${label}-${crypto.randomUUID().slice(0, 8)}@test.mooring`;
}

async function rejection(promise: Promise<unknown>): Promise<unknown> {
  try {
    await promise;
  } catch (error) {
    return error;
  }
  throw new Error("expected the promise to reject");
}

describe("createUser", () => {
  it("stores the e-mail lowercased and creates the personal space", async () => {
    const email = uniqueEmail("Mixed.Case");
    const account = await createUser(null, { email: `  ${email.toUpperCase()} `, name: "Mixed" });
    expect(account.email).toBe(email.toLowerCase());
    expect(account.siteRole).toBe("member");
    expect(account.hasPassword).toBe(false);
    const personal = await db.select().from(groups).where(eq(groups.personalUserId, account.id));
    expect(personal).toHaveLength(1);
    expect(personal[0]?.kind).toBe("personal");
  });

  it("rejects a duplicate e-mail on the email field and writes nothing", async () => {
    const email = uniqueEmail("dup");
    await createUser(null, { email, name: "First" });
    const [before] = await db.select({ n: sql<number>`count(*)::int` }).from(groups);
    const error = await rejection(createUser(null, { email: email.toUpperCase(), name: "Second" }));
    expect(error).toBeInstanceOf(ValidationError);
    expect((error as ValidationError).issues[0]?.path).toEqual(["email"]);
    const rows = await db.select().from(users).where(eq(users.email, email));
    expect(rows).toHaveLength(1);
    expect(rows[0]?.name).toBe("First");
    const [after] = await db.select({ n: sql<number>`count(*)::int` }).from(groups);
    expect(after?.n).toBe(before?.n);
  });

  it("names every invalid field at once", async () => {
    const error = await rejection(createUser(null, { email: "not-an-email", name: " ", password: "short" }));
    expect(error).toBeInstanceOf(ValidationError);
    expect((error as ValidationError).issues.map((issue) => issue.path[0])).toEqual(["email", "name", "password"]);
  });

  it("lets only a site admin create an admin", async () => {
    const error = await rejection(
      createUser(null, { email: uniqueEmail("sneaky"), name: "Sneaky", siteRole: "admin" }),
    );
    expect(error).toBeInstanceOf(UnauthenticatedError);
    const admin = await createTestUser({ label: "admin", siteRole: "admin" });
    const created = await createUser(admin.actor, { email: uniqueEmail("new-admin"), name: "New", siteRole: "admin" });
    expect(created.siteRole).toBe("admin");
  });
});

describe("verifyPassword", () => {
  it("returns the actor for the right password, case-insensitively on the e-mail", async () => {
    const user = await createTestUser({ label: "signin", password: "correct-horse-1" });
    const actor = await verifyPassword(null, user.actor.email.toUpperCase(), "correct-horse-1");
    expect(actor).toEqual(user.actor);
    const [row] = await db.select().from(users).where(eq(users.id, user.actor.id));
    // bcrypt hash with cost 12, never the password itself.
    expect(row?.passwordHash).toMatch(/^\$2[aby]\$12\$/);
  });

  it("gives the same UnauthenticatedError for a wrong password and an unknown account", async () => {
    const user = await createTestUser({ label: "wrong", password: "correct-horse-1" });
    const wrong = await rejection(verifyPassword(null, user.actor.email, "incorrect-1"));
    const unknown = await rejection(verifyPassword(null, uniqueEmail("nobody"), "incorrect-1"));
    expect(wrong).toBeInstanceOf(UnauthenticatedError);
    expect(unknown).toBeInstanceOf(UnauthenticatedError);
    expect((wrong as Error).message).toBe((unknown as Error).message);
  });

  it("never locks the account itself: the right password works after many wrong ones", async () => {
    // Repeated failures are slowed down per client by lib/server/sign-in-limit.ts, never by a lock
    // on the account that a stranger could trigger.
    const user = await createTestUser({ label: "no-lock", password: "correct-horse-1" });
    for (let attempt = 1; attempt <= 3; attempt += 1) {
      expect(await rejection(verifyPassword(null, user.actor.email, "wrong-password"))).toBeInstanceOf(UnauthenticatedError);
    }
    await expect(verifyPassword(null, user.actor.email, "correct-horse-1")).resolves.toEqual(user.actor);
  });
});

describe("sign-in link tokens", () => {
  it("stores only the SHA-256 of the token and signs in once", async () => {
    const user = await createTestUser({ label: "link" });
    const issued = await issueSignInLinkToken(null, user.actor.email);
    expect(issued).not.toBeNull();
    const token = issued?.token ?? "";
    const [stored] = await db.select().from(authTokens).where(eq(authTokens.userId, user.actor.id));
    expect(stored?.tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(stored?.tokenHash).not.toContain(token);

    await expect(consumeSignInLinkToken(null, token)).resolves.toEqual(user.actor);
    const [row] = await db.select().from(users).where(eq(users.id, user.actor.id));
    expect(row?.emailVerifiedAt).toBeInstanceOf(Date);

    const reused = await rejection(consumeSignInLinkToken(null, token));
    expect(reused).toBeInstanceOf(ValidationError);
    expect((reused as ValidationError).issues[0]).toEqual({
      path: ["token"],
      message: "This link has already been used; request a new one.",
    });
  });

  it("takes the password and sessions from a never-verified account at its first link sign-in", async () => {
    // As sign-ups were before they were confirmed by mail: anyone could have chosen this password.
    const squatted = await createTestUser({ label: "squatted", password: "chosen-by-someone-1" });
    const squatterSession = await startSession(squatted.actor.id);
    const issued = await issueSignInLinkToken(null, squatted.actor.email);
    await expect(consumeSignInLinkToken(null, issued?.token ?? "")).resolves.toEqual(squatted.actor);
    const [row] = await db.select().from(users).where(eq(users.id, squatted.actor.id));
    expect(row).toMatchObject({ passwordHash: null, emailVerifiedAt: expect.any(Date) });
    expect(await getActorForSession(squatted.actor.id, squatterSession)).toBeNull();
    await expect(verifyPassword(null, squatted.actor.email, "chosen-by-someone-1")).rejects.toBeInstanceOf(UnauthenticatedError);

    // A verified account keeps its password and sessions.
    const owner = await createTestUser({ label: "verified", password: "owners-own-password" });
    await db.update(users).set({ emailVerifiedAt: new Date() }).where(eq(users.id, owner.actor.id));
    const ownerSession = await startSession(owner.actor.id);
    await consumeSignInLinkToken(null, (await issueSignInLinkToken(null, owner.actor.email))?.token ?? "");
    expect(await getActorForSession(owner.actor.id, ownerSession)).toMatchObject({ id: owner.actor.id });
    await expect(verifyPassword(null, owner.actor.email, "owners-own-password")).resolves.toEqual(owner.actor);
  });

  it("explains an expired link and an unknown one", async () => {
    const user = await createTestUser({ label: "expired" });
    const issued = await issueSignInLinkToken(null, user.actor.email);
    await db
      .update(authTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(authTokens.userId, user.actor.id));
    const expired = await rejection(consumeSignInLinkToken(null, issued?.token ?? ""));
    expect((expired as ValidationError).issues[0]?.message).toMatch(/expired/);
    const unknown = await rejection(consumeSignInLinkToken(null, "not-a-real-token"));
    expect((unknown as ValidationError).issues[0]?.message).toBe("This link is not valid.");
  });

  it("returns null for an unknown e-mail and does not accept a reset token as a sign-in link", async () => {
    expect(await issueSignInLinkToken(null, uniqueEmail("ghost"))).toBeNull();
    const user = await createTestUser({ label: "kinds" });
    const reset = await issuePasswordResetToken(null, user.actor.email);
    const wrongKind = await rejection(consumeSignInLinkToken(null, reset?.token ?? ""));
    expect((wrongKind as ValidationError).issues[0]?.message).toBe("This link is not valid.");
  });
});

describe("resetPasswordWithToken", () => {
  it("sets the new password and refuses reuse", async () => {
    const user = await createTestUser({ label: "reset", password: "old-password-1" });
    const first = await issuePasswordResetToken(null, user.actor.email);
    const second = await issuePasswordResetToken(null, user.actor.email);
    await resetPasswordWithToken(null, second?.token ?? "", "new-password-1");
    await expect(verifyPassword(null, user.actor.email, "new-password-1")).resolves.toEqual(user.actor);
    expect(await rejection(verifyPassword(null, user.actor.email, "old-password-1"))).toBeInstanceOf(
      UnauthenticatedError,
    );
    // Both the used token and the older outstanding one are now spent.
    for (const token of [first?.token, second?.token]) {
      const error = await rejection(resetPasswordWithToken(null, token ?? "", "another-password-1"));
      expect((error as ValidationError).issues[0]?.path).toEqual(["token"]);
    }
  });

  it("rejects a too-short password before consuming the token", async () => {
    const user = await createTestUser({ label: "short" });
    const issued = await issuePasswordResetToken(null, user.actor.email);
    const error = await rejection(resetPasswordWithToken(null, issued?.token ?? "", "short"));
    expect((error as ValidationError).issues[0]?.path).toEqual(["password"]);
    await expect(resetPasswordWithToken(null, issued?.token ?? "", "long-enough-1")).resolves.toEqual(user.actor);
  });
});

describe("account", () => {
  it("reads and updates the actor's own account; a password change needs the current one", async () => {
    const user = await createTestUser({ label: "account", password: "first-password-1" });
    expect((await getAccount(user.actor)).email).toBe(user.actor.email);
    await expect(getAccount(null)).rejects.toBeInstanceOf(UnauthenticatedError);

    const wrong = await rejection(
      updateAccount(user.actor, { currentPassword: "nope-nope-1", newPassword: "second-password-1" }),
    );
    expect((wrong as ValidationError).issues[0]?.path).toEqual(["currentPassword"]);

    const updated = await updateAccount(user.actor, {
      name: "Renamed",
      currentPassword: "first-password-1",
      newPassword: "second-password-1",
    });
    expect(updated.name).toBe("Renamed");
    await expect(verifyPassword(null, user.actor.email, "second-password-1")).resolves.toMatchObject({
      name: "Renamed",
    });
  });
});

describe("admin functions", () => {
  it("refuse anonymous callers and members", async () => {
    const member = await createTestUser({ label: "member" });
    await expect(listUsers(null)).rejects.toBeInstanceOf(UnauthenticatedError);
    await expect(listUsers(member.actor)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(setSiteRole(member.actor, member.actor.id, "admin")).rejects.toBeInstanceOf(ForbiddenError);
    const [row] = await db.select().from(users).where(eq(users.id, member.actor.id));
    expect(row?.siteRole).toBe("member");
  });

  it("let an admin list users and change a site role", async () => {
    const admin = await createTestUser({ label: "admin", siteRole: "admin" });
    const member = await createTestUser({ label: "promoted" });
    const page = await listUsers(admin.actor, { search: member.actor.email });
    expect(page.items.map((item) => item.id)).toEqual([member.actor.id]);
    expect(page.total).toBe(1);

    // A session opened before the change sees the new role on its next request.
    const session = await startSession(member.actor.id);
    expect((await getActorForSession(member.actor.id, session))?.siteRole).toBe("member");
    const promoted = await setSiteRole(admin.actor, member.actor.id, "admin");
    expect(promoted.siteRole).toBe("admin");
    expect((await getActorForSession(member.actor.id, session))?.siteRole).toBe("admin");
  });

  it("let a search for text no account can hold match nothing instead of failing", async () => {
    const admin = await createTestUser({ label: "admin", siteRole: "admin" });
    expect(await listUsers(admin.actor, { search: "ada\u0000" })).toEqual({ items: [], total: 0 });
  });

  it("treat a malformed user id as not found", async () => {
    const admin = await createTestUser({ label: "admin", siteRole: "admin" });
    await expect(setSiteRole(admin.actor, "not-a-uuid", "admin")).rejects.toMatchObject({ status: 404 });
  });
});
