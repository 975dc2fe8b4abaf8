import { randomUUID } from "node:crypto";
import { and, eq, sql } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import { verifyPassword } from "@/db/queries/users";
import { signInThrottles } from "@/db/schema";
import { RateLimitError, ServiceUnavailableError, UnauthenticatedError } from "@/lib/errors";
import { consumeRateLimit, peekRateLimit } from "@/lib/server/rate-limit";
import { emailedLinkLimit, limitSignInAttempt, signInDelays, signUpLimitPerAddress } from "@/lib/server/sign-in-limit";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";
import { createTestUser } from "@/tests/fixtures/users";

// The server actions read the client address from the request headers (set by scripts/serve.mjs).
const request = vi.hoisted(() => ({ address: "198.51.100.1" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ "x-mooring-client-address": request.address }) }));

const small = {
  delays: { freeFailures: 3, baseSeconds: 60, maxSeconds: 15 * 60, forgetAfterSeconds: 24 * 60 * 60 },
  perAddress: { limit: 5, windowMs: 15 * 60_000 },
};

/** A fresh client address per test, so tests never share a window. */
const freshAddress = () => `198.51.100.${Math.floor(Math.random() * 250)}-${randomUUID().slice(0, 8)}`;
const wrong = () => Promise.reject(new UnauthenticatedError("Wrong e-mail or password."));

/** Lets the current wait of (email, address) run out, as if its time had passed. */
async function waitOut(email: string, address: string): Promise<void> {
  await db
    .update(signInThrottles)
    .set({ blockedUntil: sql`now() - interval '1 second'` })
    .where(and(eq(signInThrottles.email, email.toLowerCase()), eq(signInThrottles.clientAddress, address)));
}

async function refusal(promise: Promise<unknown>): Promise<RateLimitError> {
  const error = await promise.then(
    () => null,
    (reason: unknown) => reason,
  );
  expect(error).toBeInstanceOf(RateLimitError);
  return error as RateLimitError;
}

describe("limitSignInAttempt", () => {
  it("lets the first failures through, then makes each attempt wait twice as long as the last", async () => {
    const email = `nobody-${randomUUID()}@test.mooring`;
    const address = freshAddress();
    const options = { delays: small.delays };
    for (let i = 0; i < 3; i += 1) {
      await expect(limitSignInAttempt(email, address, wrong, options)).rejects.toBeInstanceOf(UnauthenticatedError);
    }
    // Even the right password waits: the delay comes before the check.
    const first = await refusal(limitSignInAttempt(email.toUpperCase(), address, async () => "signed in", options));
    expect(first.retryAfterSeconds).toBeGreaterThan(50);
    expect(first.retryAfterSeconds).toBeLessThanOrEqual(60);
    expect(first.message).toMatch(/^Too many failed sign-ins for this e-mail address\. Wait \d+ (second|minute)s? before trying again/);

    await waitOut(email, address);
    await expect(limitSignInAttempt(email, address, wrong, options)).rejects.toBeInstanceOf(UnauthenticatedError);
    const second = await refusal(limitSignInAttempt(email, address, wrong, options));
    expect(second.retryAfterSeconds).toBeGreaterThan(110);
    expect(second.retryAfterSeconds).toBeLessThanOrEqual(120);

    // Once the wait is over the right password signs in and the failures are forgotten.
    await waitOut(email, address);
    expect(await limitSignInAttempt(email, address, async () => "signed in", options)).toBe("signed in");
    for (let i = 0; i < 2; i += 1) {
      await expect(limitSignInAttempt(email, address, wrong, options)).rejects.toBeInstanceOf(UnauthenticatedError);
    }
  });

  it("a stranger guessing from elsewhere cannot lock the owner out (the real password check)", async () => {
    const user = await createTestUser({ label: "owner", password: "correct horse battery" });
    const stranger = freshAddress();
    // Long waits, so no wait runs out while the test runs; no per-address limit in the way.
    const options = { delays: small.delays, perAddress: { limit: 1_000, windowMs: 15 * 60_000 } };
    const attempt = (address: string, password: string) =>
      limitSignInAttempt(user.actor.email, address, () => verifyPassword(null, user.actor.email, password), options);
    const outcomes: string[] = [];
    for (let i = 0; i < 30; i += 1) {
      outcomes.push(await attempt(stranger, `guess ${i}`).then(() => "signed in", (error: Error) => error.name));
    }
    expect(outcomes.filter((name) => name === "UnauthenticatedError")).toHaveLength(small.delays.freeFailures);
    expect(outcomes.filter((name) => name === "RateLimitError")).toHaveLength(30 - small.delays.freeFailures);
    // The stranger is slowed down, even when guessing right...
    await expect(attempt(stranger, "correct horse battery")).rejects.toBeInstanceOf(RateLimitError);
    // ...and the owner, from their own network, signs in at once.
    await expect(attempt(freshAddress(), "correct horse battery")).resolves.toMatchObject({ id: user.actor.id });
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
    const [pair] = await db.select().from(signInThrottles).where(eq(signInThrottles.email, email));
    expect(pair?.failures ?? 0).toBe(0);
  });

  it("counts only failures: successful sign-ins and database errors are taken back", async () => {
    const email = `ok-${randomUUID()}@test.mooring`;
    const address = freshAddress();
    for (let i = 0; i < 6; i += 1) expect(await limitSignInAttempt(email, address, async () => i, small)).toBe(i);
    await expect(
      limitSignInAttempt(email, address, () => Promise.reject(new ServiceUnavailableError()), small),
    ).rejects.toBeInstanceOf(ServiceUnavailableError);
    const [pair] = await db.select().from(signInThrottles).where(eq(signInThrottles.email, email));
    expect(pair?.failures ?? 0).toBe(0);
    expect(await peekRateLimit(`sign-in:ip:${address}`, small.perAddress)).toMatchObject({ remaining: 5 });
  });

  it("lets only the free failures of simultaneous guesses through", async () => {
    const email = `burst-${randomUUID()}@test.mooring`;
    const address = freshAddress();
    const outcomes = await Promise.allSettled(Array.from({ length: 12 }, () => limitSignInAttempt(email, address, wrong, small)));
    const reasons = outcomes.map((o) => (o.status === "rejected" ? (o.reason as Error).name : "fulfilled"));
    expect(reasons.filter((r) => r === "UnauthenticatedError")).toHaveLength(3);
    expect(reasons.filter((r) => r === "RateLimitError")).toHaveLength(9);
  });
});

describe("the password sign-in provider (lib/server/auth.ts)", () => {
  type Authorize = (credentials: Record<string, string>, req: { headers: Record<string, string> }) => Promise<unknown>;

  it("slows a client down after its free failures and never signs in meanwhile, with no lock on the account", async () => {
    const { authOptions } = await import("@/lib/server/auth");
    // next-auth v4 keeps the provider's own options (id "password", authorize) under `options`.
    const providers = authOptions.providers as unknown as { options: { id?: string; authorize: Authorize } }[];
    const provider = providers.find((candidate) => candidate.options.id === "password");
    if (!provider) throw new Error("lib/server/auth.ts has no password provider");
    const user = await createTestUser({ label: "provider", password: "correct horse battery" });
    const address = freshAddress();
    const from = (client: string) => (password: string) =>
      provider.options.authorize({ email: user.actor.email, password }, { headers: { [clientAddressHeader]: client } });
    const signIn = from(address);

    for (let i = 1; i <= signInDelays.freeFailures; i += 1) await expect(signIn(`wrong ${i}`)).rejects.toThrow("Wrong e-mail or password.");
    const [pair] = await db.select().from(signInThrottles).where(eq(signInThrottles.email, user.actor.email));
    expect(pair).toMatchObject({ clientAddress: address, failures: signInDelays.freeFailures });
    // As after a few more failures: a wait of ten minutes, during which even the right password is refused.
    await db
      .update(signInThrottles)
      .set({ blockedUntil: sql`now() + interval '10 minutes'` })
      .where(eq(signInThrottles.email, user.actor.email));
    await expect(signIn("correct horse battery")).rejects.toThrow(/Wait 10 minutes before trying again/);
    // Another client is not slowed down at all.
    await expect(from(freshAddress())("correct horse battery")).resolves.toMatchObject({ id: user.actor.id });
    await waitOut(user.actor.email, address);
    await expect(signIn("correct horse battery")).resolves.toMatchObject({ id: user.actor.id });
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
    expect(refused.message).toMatch(/^Too many e-mails were requested for this address\. Try again in \d+ (seconds?|minutes?)\.$/);
    // Another address is not affected.
    const other = new FormData();
    other.set("email", `other-${randomUUID()}@test.mooring`);
    expect((await requestPasswordResetAction(idleState(), other)).status).toBe("success");
  });
});

describe("sign-ups (app/(auth)/actions.ts)", () => {
  it("are limited per client address, whatever the e-mail addresses", async () => {
    const { signUpAction } = await import("@/app/(auth)/actions");
    const { idleState } = await import("@/lib/action-state");
    const signUp = (email: string) => {
      const form = new FormData();
      for (const [key, value] of Object.entries({ name: "Flood", email, password: "long enough 1", confirmPassword: "long enough 1" })) {
        form.set(key, value);
      }
      return signUpAction(idleState(), form);
    };
    request.address = freshAddress();
    // Use up the window without paying for a bcrypt hash per sign-up.
    for (let i = 0; i < signUpLimitPerAddress.limit; i += 1) await consumeRateLimit(`sign-up:ip:${request.address}`, signUpLimitPerAddress);
    const refused = await signUp(`flood-${randomUUID()}@test.mooring`);
    expect(refused.status).toBe("error");
    expect(refused.message).toMatch(/^Too many accounts were started from your network\. Try again in \d+ (seconds?|minutes?)\.$/);

    request.address = freshAddress();
    expect((await signUp(`welcome-${randomUUID()}@test.mooring`)).status).toBe("success");
  });
});
