import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import {
  requestPasswordResetAction,
  requestSignInLinkAction,
  resetPasswordAction,
  signUpAction,
  type EmailRequestState,
  type PasswordResetState,
  type SignUpState,
} from "@/app/(auth)/actions";
import { db } from "@/db/index";
import { verifyPassword } from "@/db/queries/users";
import { authTokens, groups, users } from "@/db/schema";
import { idleState } from "@/lib/action-state";
import { createTestUser } from "@/tests/fixtures/users";

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

/** Messages to `address` captured by the fake mail server that the test run provides. */
async function mailTo(address: string): Promise<CapturedMessage[]> {
  const base = process.env.MAILBOX_URL;
  if (!base) throw new Error("MAILBOX_URL is not set: run through `node scripts/test.mjs integration`");
  const response = await fetch(`${base.replace(/\/$/, "")}/email`);
  const messages = (await response.json()) as CapturedMessage[];
  return messages.filter((message) => message.to.some((to) => to.address === address));
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

describe("signUpAction", () => {
  it("creates the account with its personal space and a working password", async () => {
    const email = uniqueEmail("signup");
    const state = await signUpAction(
      idleState(),
      form({ name: "  Nadia Strand ", email: email.toUpperCase(), password: "sturdy-password-1", confirmPassword: "sturdy-password-1" }),
    );
    expect(state.status).toBe("success");
    const [account] = await accountsWithEmail(email);
    expect(account).toBeDefined();
    const personal = await db.select().from(groups).where(eq(groups.personalUserId, account?.id ?? ""));
    expect(personal).toHaveLength(1);
    const actor = await verifyPassword(null, email, "sturdy-password-1");
    expect(actor.name).toBe("Nadia Strand");
  });

  it("answers a taken e-mail on the email field, keeps name and e-mail, and writes nothing", async () => {
    const existing = await createTestUser({ label: "taken" });
    const before = await db.select({ id: users.id }).from(users);
    const state: SignUpState = await signUpAction(
      idleState(),
      form({ name: "Second", email: existing.actor.email, password: "another-password", confirmPassword: "another-password" }),
    );
    expect(state.status).toBe("error");
    expect(state.fieldErrors.email).toEqual(["An account with this e-mail already exists."]);
    expect(state.values).toEqual({ name: "Second", email: existing.actor.email });
    expect(await db.select({ id: users.id }).from(users)).toHaveLength(before.length);
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
    expect(await mailTo(unknownEmail)).toHaveLength(0);
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
