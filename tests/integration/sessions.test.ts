import { decode, encode } from "next-auth/jwt";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { signOutEverywhere } from "@/db/queries/sessions";
import { consumeSignInLinkToken, issuePasswordResetToken, issueSignInLinkToken, resetPasswordWithToken, updateAccount } from "@/db/queries/users";
import { ValidationError } from "@/lib/errors";
import { getAuthSecret } from "@/lib/server/auth-secret";
import { createTestUser } from "@/tests/fixtures/users";
import { signInCookies, signOutWith, type SetCookie } from "@/tests/support/next-auth";

// Sessions end when they should (issue 15, item 5): a session token is checked against its row in
// `sessions` on every request, so signing out, a password change, a reset and "sign out of all
// devices" end it at once. next-auth's real handler signs in and out; getCurrentUser
// (lib/server/session.ts) decrypts the cookie's token itself, as it does in the app.

const browser = vi.hoisted(() => ({ sessionToken: null as string | null }));
vi.mock("next/headers", () => ({
  headers: async () => new Headers(browser.sessionToken ? { cookie: `next-auth.session-token=${encodeURIComponent(browser.sessionToken)}` } : {}),
}));
const { getCurrentUser } = await import("@/lib/server/session");

function sessionTokenOf(cookies: SetCookie[]): string {
  const value = cookies.find((cookie) => cookie.name === "next-auth.session-token")?.value;
  if (!value) throw new Error("signing in set no session cookie");
  return decodeURIComponent(value);
}

/** The actor a request carrying `token` acts as (null: signed out). */
async function actorWith(token: string) {
  browser.sessionToken = token;
  return getCurrentUser();
}

const password = "correct horse battery";

beforeEach(() => {
  process.env.NEXTAUTH_URL = "http://127.0.0.1:3000";
  browser.sessionToken = null;
});

describe("session revocation", () => {
  it("a token stops working once its session signs out, and only that session ends", async () => {
    const user = await createTestUser({ label: "sign-out", password });
    const laptop = await signInCookies(user.actor.email, password);
    const phone = await signInCookies(user.actor.email, password);
    expect(await actorWith(sessionTokenOf(laptop))).toMatchObject({ id: user.actor.id });

    await signOutWith(laptop);
    // The copied cookie of the signed-out browser is refused; the other device stays signed in.
    expect(await actorWith(sessionTokenOf(laptop))).toBeNull();
    expect(await actorWith(sessionTokenOf(phone))).toMatchObject({ id: user.actor.id });
  });

  it("a password change ends the other sessions and keeps the one that made it", async () => {
    const user = await createTestUser({ label: "change", password });
    const here = sessionTokenOf(await signInCookies(user.actor.email, password));
    const elsewhere = sessionTokenOf(await signInCookies(user.actor.email, password));
    const actor = await actorWith(here);
    expect(actor?.sessionId).toBeTruthy();

    await updateAccount(actor, { currentPassword: password, newPassword: "a brand new password" });
    expect(await actorWith(here)).toMatchObject({ id: user.actor.id });
    expect(await actorWith(elsewhere)).toBeNull();
  });

  it("a reset ends every session and spends sign-in and reset links issued before it", async () => {
    const user = await createTestUser({ label: "reset", password });
    const token = sessionTokenOf(await signInCookies(user.actor.email, password));
    const earlierLink = await issueSignInLinkToken(null, user.actor.email);
    const earlierReset = await issuePasswordResetToken(null, user.actor.email);
    const reset = await issuePasswordResetToken(null, user.actor.email);

    await resetPasswordWithToken(null, reset?.token ?? "", "chosen after the reset");
    expect(await actorWith(token)).toBeNull();
    const link = await consumeSignInLinkToken(null, earlierLink?.token ?? "").catch((error: unknown) => error);
    expect(link).toBeInstanceOf(ValidationError);
    expect((link as ValidationError).issues[0]?.message).toBe("This link has already been used; request a new one.");
    const secondReset = await resetPasswordWithToken(null, earlierReset?.token ?? "", "yet another password").catch((error: unknown) => error);
    expect(secondReset).toBeInstanceOf(ValidationError);
  });

  it("signing out of all devices ends every session, this one included", async () => {
    const user = await createTestUser({ label: "everywhere", password });
    const tokens = [
      sessionTokenOf(await signInCookies(user.actor.email, password)),
      sessionTokenOf(await signInCookies(user.actor.email, password)),
    ];
    const actor = await actorWith(tokens[0] ?? "");
    expect(await signOutEverywhere(actor)).toEqual({ ended: 2 });
    for (const token of tokens) expect(await actorWith(token)).toBeNull();
  });

  it("refuses a validly signed token that names no session (issued before sessions were recorded)", async () => {
    const user = await createTestUser({ label: "legacy" });
    const legacy = await encode({
      token: { id: user.actor.id, siteRole: "member", name: user.actor.name, email: user.actor.email, sub: user.actor.id },
      secret: getAuthSecret(),
    });
    expect(await actorWith(legacy)).toBeNull();
    // The same user with a session id of someone else's session is refused as well.
    const other = await createTestUser({ label: "other", password });
    const othersToken = await decode({ token: sessionTokenOf(await signInCookies(other.actor.email, password)), secret: getAuthSecret() });
    const borrowed = await encode({
      token: { id: user.actor.id, siteRole: "member", name: user.actor.name, email: user.actor.email, sid: othersToken?.sid },
      secret: getAuthSecret(),
    });
    expect(await actorWith(borrowed)).toBeNull();
  });
});
