import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { verifyPassword } from "@/db/queries/users";
import { users } from "@/db/schema";
import { RateLimitError, ServiceUnavailableError, UnauthenticatedError } from "@/lib/errors";
import { consumeRateLimit, peekRateLimit } from "@/lib/server/rate-limit";
import {
  emailedLinkLimit,
  limitSignInAttempt,
  signInAddress,
  signInLimitPerAddress,
  signInLimitPerEmail,
} from "@/lib/server/sign-in-limit";
import { createTestUser } from "@/tests/fixtures/users";

const small = {
  perEmail: { limit: 3, windowMs: 15 * 60_000 },
  perAddress: { limit: 5, windowMs: 15 * 60_000 },
};

/** A fresh client address per test, so tests never share a window. */
const freshAddress = () => `198.51.100.${Math.floor(Math.random() * 250)}-${randomUUID().slice(0, 8)}`;
const wrong = () => Promise.reject(new UnauthenticatedError("Wrong e-mail or password."));

describe("limitSignInAttempt", () => {
  it("keeps the per-e-mail limit above the account lockout, so the lockout message shows first", () => {
    // db/queries/users.ts locks an account after 10 consecutive failures.
    expect(signInLimitPerEmail.limit).toBeGreaterThan(10);
    expect(signInLimitPerAddress.limit).toBeGreaterThan(signInLimitPerEmail.limit);
  });

  it("refuses an e-mail address after its failures with a clear message, whatever the password", async () => {
    const email = `nobody-${randomUUID()}@test.mooring`;
    const address = freshAddress();
    for (let i = 0; i < 3; i += 1) {
      await expect(limitSignInAttempt(email, address, wrong, small)).rejects.toBeInstanceOf(UnauthenticatedError);
    }
    const refused = limitSignInAttempt(email.toUpperCase(), freshAddress(), async () => "signed in", small);
    await expect(refused).rejects.toBeInstanceOf(RateLimitError);
    await expect(refused).rejects.toThrow(/Too many failed sign-ins for this e-mail address\. Try again in \d+ minutes?, or reset the password\.$/);
  });

  it("refuses a client address after failures across many e-mail addresses", async () => {
    const address = freshAddress();
    for (let i = 0; i < 5; i += 1) {
      await expect(limitSignInAttempt(`spray-${i}-${randomUUID()}@test.mooring`, address, wrong, small)).rejects.toBeInstanceOf(
        UnauthenticatedError,
      );
    }
    const email = `fresh-${randomUUID()}@test.mooring`;
    await expect(limitSignInAttempt(email, address, wrong, small)).rejects.toThrow(/Too many failed sign-ins from your network/);
    // The refused attempt did not count against the e-mail address.
    expect(await peekRateLimit(`sign-in:email:${email}`, small.perEmail)).toMatchObject({ remaining: 3 });
  });

  it("counts only failures: successful sign-ins and database errors are refunded", async () => {
    const email = `ok-${randomUUID()}@test.mooring`;
    const address = freshAddress();
    for (let i = 0; i < 6; i += 1) expect(await limitSignInAttempt(email, address, async () => i, small)).toBe(i);
    await expect(
      limitSignInAttempt(email, address, () => Promise.reject(new ServiceUnavailableError()), small),
    ).rejects.toBeInstanceOf(ServiceUnavailableError);
    expect(await peekRateLimit(`sign-in:email:${email}`, small.perEmail)).toMatchObject({ remaining: 3 });
    expect(await peekRateLimit(`sign-in:ip:${address}`, small.perAddress)).toMatchObject({ remaining: 5 });
  });

  it("lets at most the limit of simultaneous guesses through", async () => {
    const email = `burst-${randomUUID()}@test.mooring`;
    const outcomes = await Promise.allSettled(
      Array.from({ length: 12 }, () => limitSignInAttempt(email, freshAddress(), wrong, small)),
    );
    const reasons = outcomes.map((o) => (o.status === "rejected" ? (o.reason as Error).name : "fulfilled"));
    expect(reasons.filter((r) => r === "UnauthenticatedError")).toHaveLength(3);
    expect(reasons.filter((r) => r === "RateLimitError")).toHaveLength(9);
  });

  it("wraps the real password check: the account lockout still answers for an existing account", async () => {
    const user = await createTestUser({ label: "limited", password: "correct horse battery" });
    const address = freshAddress();
    const attempt = (password: string) =>
      limitSignInAttempt(user.actor.email, address, () => verifyPassword(null, user.actor.email, password));
    await expect(attempt("wrong password 1")).rejects.toThrow("Wrong e-mail or password.");
    expect((await attempt("correct horse battery")).id).toBe(user.actor.id);
  });
});

describe("the password sign-in provider (lib/server/auth.ts)", () => {
  type Authorize = (credentials: Record<string, string>, req: { headers: Record<string, string> }) => Promise<unknown>;

  it("shows the account lockout after 10 failures, then the per-e-mail limit, and never signs in meanwhile", async () => {
    const { authOptions } = await import("@/lib/server/auth");
    // next-auth v4 keeps the provider's own options (id "password", authorize) under `options`.
    const providers = authOptions.providers as unknown as { options: { id?: string; authorize: Authorize } }[];
    const provider = providers.find((candidate) => candidate.options.id === "password");
    if (!provider) throw new Error("lib/server/auth.ts has no password provider");
    const user = await createTestUser({ label: "provider", password: "correct horse battery" });
    const req = { headers: { "x-forwarded-for": freshAddress() } };
    const signIn = (password: string) => provider.options.authorize({ email: user.actor.email, password }, req);

    await expect(signIn("wrong 1")).rejects.toThrow("Wrong e-mail or password.");
    // Eight more failures without paying for eight bcrypt checks; the limiter counts its own.
    await db.update(users).set({ failedSignIns: 9 }).where(eq(users.id, user.actor.id));
    for (let i = 2; i < 10; i += 1) await consumeRateLimit(`sign-in:email:${user.actor.email}`, signInLimitPerEmail);
    // db/queries/users.ts: the 10th consecutive failure locks the account.
    await expect(signIn("wrong 10")).rejects.toThrow(/This account is locked for 15 more minutes/);
    for (let i = 11; i <= signInLimitPerEmail.limit; i += 1) {
      await expect(signIn("correct horse battery")).rejects.toThrow(/This account is locked/);
    }
    await expect(signIn("correct horse battery")).rejects.toThrow(/Too many failed sign-ins for this e-mail address/);
  });
});

describe("e-mailed links (app/(auth)/actions.ts)", () => {
  it("sends at most 5 sign-in or reset links per address per window, then says to wait, account or not", async () => {
    const { requestPasswordResetAction, requestSignInLinkAction } = await import("@/app/(auth)/actions");
    const { idleState } = await import("@/lib/action-state");
    const email = `nobody-${randomUUID()}@test.mooring`;
    const form = new FormData();
    form.set("email", email);
    for (let i = 0; i < emailedLinkLimit.limit; i += 1) {
      const action = i % 2 ? requestPasswordResetAction : requestSignInLinkAction;
      expect((await action(idleState(), form)).status).toBe("success");
    }
    const refused = await requestSignInLinkAction(idleState(), form);
    expect(refused.status).toBe("error");
    expect(refused.message).toMatch(/^Too many e-mails were requested for this address\. Try again in \d+ minutes?\.$/);
    // Another address is not affected.
    const other = new FormData();
    other.set("email", `other-${randomUUID()}@test.mooring`);
    expect((await requestPasswordResetAction(idleState(), other)).status).toBe("success");
  });
});

describe("signInAddress", () => {
  it("reads next-auth's plain header object: x-forwarded-for first, then x-real-ip, then 'unknown'", () => {
    expect(signInAddress({ "x-forwarded-for": "203.0.113.1, 10.0.0.1" })).toBe("203.0.113.1");
    expect(signInAddress({ "x-real-ip": "198.51.100.2" })).toBe("198.51.100.2");
    expect(signInAddress({})).toBe("unknown");
    expect(signInAddress(undefined)).toBe("unknown");
  });
});
