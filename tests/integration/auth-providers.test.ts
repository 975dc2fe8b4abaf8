import type { User } from "next-auth";
import type { CredentialsConfig } from "next-auth/providers/credentials";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { sessions } from "@/db/schema";
import { issueSignInLinkToken } from "@/db/queries/users";
import { authOptions } from "@/lib/server/auth";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";
import { createTestUser } from "@/tests/fixtures/users";

type Authorize = (credentials: Record<string, string>) => Promise<User | null>;

/** The `authorize` function a Credentials provider of lib/server/auth.ts was configured with. */
function authorizeOf(id: "password" | "email-link"): Authorize {
  const provider = authOptions.providers.find(
    (candidate) => candidate.type === "credentials" && (candidate as CredentialsConfig).options?.id === id,
  ) as CredentialsConfig | undefined;
  const authorize = provider?.options?.authorize;
  if (!authorize) throw new Error(`no credentials provider "${id}"`);
  // next-auth passes the request's headers; one documentation address stands in for the client.
  return (credentials) => authorize(credentials, { headers: { [clientAddressHeader]: "203.0.113.7" } });
}

describe("password provider", () => {
  it("returns the user with id and site role for the right password", async () => {
    const user = await createTestUser({ label: "provider", password: "right-password-1" });
    const result = await authorizeOf("password")({ email: user.actor.email, password: "right-password-1" });
    expect(result).toEqual({ id: user.actor.id, name: user.actor.name, email: user.actor.email, siteRole: "member" });
  });

  it("throws the user-facing message for a wrong password and for an unknown e-mail alike", async () => {
    const user = await createTestUser({ label: "provider-wrong", password: "right-password-1" });
    await expect(authorizeOf("password")({ email: user.actor.email, password: "wrong-password" })).rejects.toThrow(
      "Wrong e-mail or password.",
    );
    await expect(authorizeOf("password")({ email: "nobody-at-all@test.mooring", password: "wrong-password" })).rejects.toThrow(
      "Wrong e-mail or password.",
    );
  });

  it("validates the credentials with zod before touching the database", async () => {
    await expect(authorizeOf("password")({ email: "not an address", password: "x" })).rejects.toThrow("Enter a valid e-mail address.");
    await expect(authorizeOf("password")({ email: "someone@test.mooring", password: "" })).rejects.toThrow("Enter your password.");
  });
});

describe("email-link provider", () => {
  it("signs in once with an issued token and refuses the token afterwards", async () => {
    const user = await createTestUser({ label: "link-provider" });
    const issued = await issueSignInLinkToken(null, user.actor.email);
    expect(issued).not.toBeNull();
    const token = issued?.token ?? "";

    await expect(authorizeOf("email-link")({ token })).resolves.toMatchObject({ id: user.actor.id, siteRole: "member" });
    await expect(authorizeOf("email-link")({ token })).rejects.toThrow("This link has already been used; request a new one.");
  });

  it("refuses malformed and unknown tokens", async () => {
    await expect(authorizeOf("email-link")({ token: "short" })).rejects.toThrow("This link is not valid.");
    await expect(authorizeOf("email-link")({ token: "B".repeat(43) })).rejects.toThrow("This link is not valid.");
  });
});

describe("session callbacks", () => {
  it("carry id, site role and a new session's id from the signed-in user into the token and the session", async () => {
    const jwt = authOptions.callbacks?.jwt;
    const session = authOptions.callbacks?.session;
    if (!jwt || !session) throw new Error("lib/server/auth.ts must define the jwt and session callbacks");
    const created = await createTestUser({ label: "callbacks", siteRole: "admin" });
    const user = { id: created.actor.id, name: "Ada", email: "ada@test.mooring", siteRole: "admin" as const };

    const token = await jwt({ token: { sub: user.id }, user, account: null, trigger: "signIn" });
    expect(token).toMatchObject({ id: user.id, siteRole: "admin", name: "Ada", email: "ada@test.mooring" });
    // Each sign-in opens a session row; the token names it.
    const [row] = await db.select().from(sessions).where(eq(sessions.id, String(token.sid)));
    expect(row).toMatchObject({ userId: user.id, revokedAt: null });

    // A later request: no `user`, the token keeps what it holds (and opens no new session).
    const again = await jwt({ token, user: undefined as unknown as User, account: null });
    expect(again).toMatchObject({ id: user.id, siteRole: "admin", sid: token.sid });
    expect(await db.select().from(sessions).where(eq(sessions.userId, user.id))).toHaveLength(1);

    // next-auth hands the callback its default session, which lacks the fields the callback adds.
    const defaultSession = { user: { name: "Ada", email: "ada@test.mooring", image: null }, expires: "2099-01-01T00:00:00.000Z" };
    const input = { session: defaultSession, token: again, user: undefined, newSession: undefined, trigger: "update" };
    const result = await session(input as unknown as Parameters<typeof session>[0]);
    expect(result.user).toMatchObject({ id: user.id, siteRole: "admin", email: "ada@test.mooring", sessionId: token.sid });
  });
});
