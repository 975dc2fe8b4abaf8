import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import { verifyPassword } from "@/db/queries/users";
import { authTokens, groups, pendingSignUps, users } from "@/db/schema";
import { idleState } from "@/lib/action-state";
import { settleBackgroundMail } from "@/lib/server/mail";
import { createTestUser } from "@/tests/fixtures/users";

// The actions read the client address from the request (scripts/serve.mjs sets it); one per file.
vi.mock("next/headers", () => ({ headers: async () => new Headers({ "x-mooring-client-address": "198.51.100.20" }) }));
const {
  confirmSignUpAction,
  requestPasswordResetAction,
  requestSignInLinkAction,
  resetPasswordAction,
  signUpAction,
} = await import("@/app/(auth)/actions");
type EmailRequestState = Awaited<ReturnType<typeof requestSignInLinkAction>>;
type PasswordResetState = Awaited<ReturnType<typeof resetPasswordAction>>;

function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@test.mooring`;
}

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [key, value] of Object.entries(fields)) data.set(key, value);
  return data;
}

async function accountsWithEmail(email: string) {
  return db.select({ id: users.id }).from(users).where(eq(users.email, email));
}

interface CapturedMessage {
  subject: string;
  to: { address: string }[];
  text?: string;
}

/**
 * Messages to `address` captured by the fake mail server that the test run provides, once mail in
 * flight is sent and at least `atLeast` of them have reached the mailbox (the server stores a message
 * a moment after accepting it).
 */
async function mailTo(address: string, atLeast = 1): Promise<CapturedMessage[]> {
  await settleBackgroundMail();
  const base = process.env.MAILBOX_URL;
  if (!base) throw new Error("MAILBOX_URL is not set: run through `node scripts/test.mjs integration`");
  let found: CapturedMessage[] = [];
  await vi.waitFor(
    async () => {
      const response = await fetch(`${base.replace(/\/$/, "")}/email`);
      const messages = (await response.json()) as CapturedMessage[];
      found = messages.filter((message) => message.to.some((to) => to.address === address));
      expect(found.length).toBeGreaterThanOrEqual(atLeast);
    },
    { timeout: 10_000, interval: 100 },
  );
  return found;
}

/** The token at the end of the first app link in a message. */
function tokenIn(message: CapturedMessage | undefined, path: string): string {
  const match = message?.text?.match(new RegExp(`https?://\\S+${path}/([A-Za-z0-9_-]+)`));
  if (!match?.[1]) throw new Error(`no ${path} link in the message`);
  return match[1];
}

async function redirectOf(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
  } catch (error) {
    const digest = (error as { digest?: unknown }).digest;
    if (typeof digest === "string" && digest.startsWith("NEXT_REDIRECT")) return digest.split(";")[2] ?? "";
    throw error;
  }
  throw new Error("expected the action to redirect");
}

describe("signUpAction and confirmSignUpAction", () => {
  const signUpForm = (email: string, password = "sturdy-password-1", extra: Record<string, string> = {}) =>
    form({ name: "  Nadia Strand ", email, password, confirmPassword: password, ...extra });

  it("creates the account only once the mailed link is opened and the chosen password entered again", async () => {
    const email = uniqueEmail("signup");
    const state = await signUpAction(idleState(), signUpForm(email.toUpperCase(), "sturdy-password-1", { callbackPath: "/account" }));
    expect(state.status).toBe("success");
    expect(state.message).toContain(email);
    // Nothing exists under the address yet, so nobody can use it before its owner confirms it.
    expect(await accountsWithEmail(email)).toHaveLength(0);

    const [message] = await mailTo(email);
    expect(message?.subject).toBe("Confirm your address to finish your Mooring account");
    expect(message?.text).toMatch(new RegExp(`${process.env.NEXTAUTH_URL}/sign-up/confirm/[A-Za-z0-9_-]+\\?callbackUrl=%2Faccount`));
    const token = tokenIn(message, "/sign-up/confirm");

    const wrong = await confirmSignUpAction(idleState(), form({ token, password: "not-what-was-chosen" }));
    expect(wrong.fieldErrors.password).toEqual(["That is not the password chosen when signing up."]);
    expect(await accountsWithEmail(email)).toHaveLength(0);

    expect((await confirmSignUpAction(idleState(), form({ token, password: "sturdy-password-1" }))).status).toBe("success");
    const [account] = await db.select().from(users).where(eq(users.email, email));
    expect(account?.emailVerifiedAt).toBeInstanceOf(Date);
    const personal = await db.select().from(groups).where(eq(groups.personalUserId, account?.id ?? ""));
    expect(personal).toHaveLength(1);
    expect((await verifyPassword(null, email, "sturdy-password-1")).name).toBe("Nadia Strand");

    const reused = await confirmSignUpAction(idleState(), form({ token, password: "sturdy-password-1" }));
    expect(reused.fieldErrors.token).toEqual(["This link is not valid or has expired; sign up again."]);
  });

  it("answers a taken address exactly like a new one, and mails its owner instead of creating anything", async () => {
    const existing = await createTestUser({ label: "taken" });
    const fresh = uniqueEmail("fresh");
    const before = await db.select({ id: users.id }).from(users);
    const taken = await signUpAction(idleState(), signUpForm(existing.actor.email, "another-password"));
    const created = await signUpAction(idleState(), signUpForm(fresh, "another-password"));
    // Same status, fields and wording: only the address itself differs.
    expect({ ...taken, message: taken.message?.replace(existing.actor.email, "ADDRESS") }).toEqual({
      ...created,
      message: created.message?.replace(fresh, "ADDRESS"),
      values: { ...created.values, email: existing.actor.email },
    });
    expect(await db.select({ id: users.id }).from(users)).toHaveLength(before.length);
    expect(await db.select().from(pendingSignUps).where(eq(pendingSignUps.email, existing.actor.email))).toHaveLength(0);
    const [notice] = await mailTo(existing.actor.email);
    expect(notice?.subject).toBe("You already have a Mooring account");
  });

  it("a sign-up with someone else's address leads nowhere: the owner's own sign-up wins with the owner's password", async () => {
    const email = uniqueEmail("victim");
    await signUpAction(idleState(), signUpForm(email, "attacker-password-1"));
    const [attackersMail] = await mailTo(email);
    await signUpAction(idleState(), signUpForm(email, "owner-password-1"));
    const ownersMail = (await mailTo(email, 2)).find((message) => message.text !== attackersMail?.text);
    // Whoever opens the first mail cannot finish it without the password someone else chose.
    const attackersToken = tokenIn(attackersMail, "/sign-up/confirm");
    const blocked = await confirmSignUpAction(idleState(), form({ token: attackersToken, password: "owner-password-1" }));
    expect(blocked.fieldErrors.password).toBeDefined();
    expect((await confirmSignUpAction(idleState(), form({ token: tokenIn(ownersMail, "/sign-up/confirm"), password: "owner-password-1" }))).status).toBe(
      "success",
    );
    await expect(verifyPassword(null, email, "attacker-password-1")).rejects.toThrow("Wrong e-mail or password.");
    // The other pending sign-up for the address is gone with the confirmation.
    const late = await confirmSignUpAction(idleState(), form({ token: attackersToken, password: "attacker-password-1" }));
    expect(late.fieldErrors.token).toBeDefined();
  });

  it("reports every invalid field at once and never echoes passwords", async () => {
    const email = uniqueEmail("invalid");
    const state = await signUpAction(idleState(), form({ name: " ", email: "nope", password: "short", confirmPassword: "other" }));
    expect(state.status).toBe("error");
    expect(state.fieldErrors.name).toEqual(["Enter your name."]);
    expect(state.fieldErrors.email).toEqual(["Enter a valid e-mail address."]);
    expect(state.fieldErrors.password).toEqual(["Use at least 8 characters."]);
    expect(state.fieldErrors.confirmPassword).toEqual(["The passwords don't match."]);
    expect(Object.keys(state.values).sort()).toEqual(["email", "name"]);
    expect(await accountsWithEmail(email)).toHaveLength(0);
  });

  describe("edge cases", () => {
    it("refuses a password longer than bcrypt can use (72 bytes)", async () => {
      const long = "é".repeat(37); // 74 bytes in UTF-8
      const state = await signUpAction(idleState(), form({ name: "Long", email: uniqueEmail("long"), password: long, confirmPassword: long }));
      expect(state.fieldErrors.password).toEqual(["Use at most 72 bytes."]);
    });

    it("treats missing fields as empty", async () => {
      const state = await signUpAction(idleState(), form({}));
      expect(state.fieldErrors.email).toEqual(["Enter your e-mail address."]);
      expect(state.fieldErrors.password).toEqual(["Use at least 8 characters."]);
    });

    it("keeps an off-site callback out of the confirmation link", async () => {
      const email = uniqueEmail("callback");
      await signUpAction(idleState(), signUpForm(email, "sturdy-password-1", { callbackPath: "/\t/evil.example" }));
      const [message] = await mailTo(email);
      expect(message?.text).toMatch(/\/sign-up\/confirm\/[A-Za-z0-9_-]+\n/);
    });
  });
});

describe("requestSignInLinkAction", () => {
  it("mails a link under NEXTAUTH_URL, and answers an unknown address identically without mail", async () => {
    const user = await createTestUser({ label: "link" });
    const known: EmailRequestState = await requestSignInLinkAction(idleState(), form({ email: user.actor.email }));
    const unknownEmail = uniqueEmail("nobody");
    const unknown = await requestSignInLinkAction(idleState(), form({ email: unknownEmail }));

    expect(known.status).toBe("success");
    expect(unknown.status).toBe("success");
    expect(unknown.message).toBe(known.message);
    const messages = await mailTo(user.actor.email);
    expect(messages).toHaveLength(1);
    expect(messages[0]?.subject).toBe("Your Mooring sign-in link");
    expect(messages[0]?.text).toContain(`${process.env.NEXTAUTH_URL}/sign-in/link/`);
    expect(await mailTo(unknownEmail, 0)).toHaveLength(0);
  });

  it("answers a malformed e-mail on the email field and issues nothing", async () => {
    const before = await db.select({ id: authTokens.id }).from(authTokens);
    const state = await requestSignInLinkAction(idleState(), form({ email: "not an address" }));
    expect(state.fieldErrors.email).toEqual(["Enter a valid e-mail address."]);
    expect(await db.select({ id: authTokens.id }).from(authTokens)).toHaveLength(before.length);
  });
});

describe("password reset actions", () => {
  it("a mailed token sets the new password once; the reused token is refused on the token field", async () => {
    const user = await createTestUser({ label: "reset", password: "original-password" });
    const requested = await requestPasswordResetAction(idleState(), form({ email: user.actor.email }));
    expect(requested.status).toBe("success");
    const [message] = await mailTo(user.actor.email);
    expect(message?.subject).toBe("Reset your Mooring password");
    const token = tokenIn(message, "/reset-password");

    const mismatch: PasswordResetState = await resetPasswordAction(
      idleState(),
      form({ token, password: "replacement-1", confirmPassword: "replacement-2" }),
    );
    expect(mismatch.fieldErrors.confirmPassword).toEqual(["The passwords don't match."]);

    const target = await redirectOf(resetPasswordAction(idleState(), form({ token, password: "replacement-1", confirmPassword: "replacement-1" })));
    expect(target).toBe("/sign-in?reset=1");
    await expect(verifyPassword(null, user.actor.email, "replacement-1")).resolves.toMatchObject({ id: user.actor.id });
    await expect(verifyPassword(null, user.actor.email, "original-password")).rejects.toThrow("Wrong e-mail or password.");

    const reused = await resetPasswordAction(idleState(), form({ token, password: "third-password", confirmPassword: "third-password" }));
    expect(reused.status).toBe("error");
    expect(reused.fieldErrors.token).toEqual(["This link has already been used; request a new one."]);
    await expect(verifyPassword(null, user.actor.email, "replacement-1")).resolves.toMatchObject({ id: user.actor.id });
  });

  it("refuses a well-formed token that was never issued", async () => {
    const state = await resetPasswordAction(
      idleState(),
      form({ token: "A".repeat(43), password: "replacement-1", confirmPassword: "replacement-1" }),
    );
    expect(state.fieldErrors.token).toEqual(["This link is not valid."]);
  });
});
