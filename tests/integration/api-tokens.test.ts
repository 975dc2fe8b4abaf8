import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import { afterEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { createApiToken, listApiTokens, maxLiveApiTokens, revokeApiToken } from "@/db/queries/api-tokens";
import { createConfiguration } from "@/db/queries/configurations";
import { setSiteRole } from "@/db/queries/users";
import { apiTokens, users } from "@/db/schema";
import { probeNearSevenBrane } from "@/lib/demo-configurations";
import { apiTokenRequestBudget } from "@/lib/server/api-token";
import { consumeRateLimit } from "@/lib/server/rate-limit";
import { createRoleGroup, createTestUser } from "@/tests/fixtures/users";

// Personal API tokens: the DAL that manages them, and the route handlers called with
// `Authorization: Bearer` against PostgreSQL. The cookie session is mocked (as in the other route
// tests), so a test can also show that a token request ignores the session.
const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
const listRoute = await import("@/app/api/configurations/route");
const itemRoute = await import("@/app/api/configurations/[configurationId]/route");
const spectrumRoute = await import("@/app/api/spectrum/route");
const groupsRoute = await import("@/app/api/groups/route");

const base = "http://mooring.test/api";

function bearer(method: string, path: string, token: string, body?: unknown): Request {
  return new Request(`${base}${path}`, {
    method,
    headers: { authorization: `Bearer ${token}`, ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

const params = (configurationId: string) => ({ params: Promise.resolve({ configurationId }) });

async function scenario() {
  const cast = await createRoleGroup();
  const configuration = await createConfiguration(cast.owner.actor, cast.group.id, probeNearSevenBrane, "first");
  const read = await createApiToken(cast.owner.actor, { name: "notebook", scope: "read", expiresInDays: 30 });
  const write = await createApiToken(cast.owner.actor, { name: "batch runner", scope: "write", expiresInDays: 30 });
  session.actor = null;
  return { ...cast, configuration, read, write };
}

/** Pins the clock (Date only; the pg driver keeps its real timers) to the start of a minute, so a rate-limit window cannot roll over mid-test. */
function pinClockToWindowStart(): void {
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(Math.floor(Date.now() / 60_000) * 60_000 + 1_000);
}

async function readConfiguration(token: string, configurationId: string): Promise<Response> {
  return itemRoute.GET(bearer("GET", `/configurations/${configurationId}`, token), params(configurationId));
}

describe("createApiToken, listApiTokens, revokeApiToken", () => {
  it("returns the secret once and stores only its SHA-256 digest", async () => {
    const user = await createTestUser({ label: "tokens" });
    const { token, secret } = await createApiToken(user.actor, { name: "laptop", scope: "write", expiresInDays: 7 });
    expect(secret).toMatch(/^mooring_[A-Za-z0-9_-]{43}$/);
    expect(token).toMatchObject({ name: "laptop", scope: "write", hint: secret.slice(0, 12), revokedAt: null, lastUsedAt: null });
    const days = (token.expiresAt.getTime() - token.createdAt.getTime()) / 86_400_000;
    expect(days).toBeGreaterThan(6.9);
    expect(days).toBeLessThan(7.1);
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, token.id));
    // SHA-256 of the secret, computed here with node:crypto independently of lib/server/secure-token.
    expect(row?.tokenHash).toBe(createHash("sha256").update(secret).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(secret);
    const listed = await listApiTokens(user.actor);
    expect(listed.map((item) => item.id)).toEqual([token.id]);
    expect(JSON.stringify(listed)).not.toContain(secret);
  });

  it("lists and revokes only the account's own tokens", async () => {
    const [alice, bob] = await Promise.all([createTestUser({ label: "alice" }), createTestUser({ label: "bob" })]);
    const { token } = await createApiToken(alice.actor, { name: "alice's", scope: "read", expiresInDays: 30 });
    expect(await listApiTokens(bob.actor)).toEqual([]);
    await expect(revokeApiToken(bob.actor, token.id)).rejects.toMatchObject({ status: 404 });
    const revoked = await revokeApiToken(alice.actor, token.id);
    expect(revoked.revokedAt).toBeInstanceOf(Date);
    // Revoking twice keeps the first moment.
    expect((await revokeApiToken(alice.actor, token.id)).revokedAt).toEqual(revoked.revokedAt);
    await expect(listApiTokens(null)).rejects.toMatchObject({ status: 401 });
  });

  it(`refuses a token past ${maxLiveApiTokens} live ones; revoked ones do not count`, async () => {
    const user = await createTestUser({ label: "many" });
    const created = [];
    for (let i = 0; i < maxLiveApiTokens; i += 1) created.push(await createApiToken(user.actor, { name: `t${i}`, scope: "read", expiresInDays: 7 }));
    await expect(createApiToken(user.actor, { name: "one more", scope: "read", expiresInDays: 7 })).rejects.toMatchObject({ status: 422 });
    const first = created[0];
    if (!first) throw new Error("no token was created");
    await revokeApiToken(user.actor, first.token.id);
    await expect(createApiToken(user.actor, { name: "one more", scope: "read", expiresInDays: 7 })).resolves.toBeDefined();
  });
});

describe("route handlers with Authorization: Bearer", () => {
  afterEach(() => {
    vi.useRealTimers();
    session.actor = null;
  });

  it("lists and reads configurations with either token and notes when the token was last used", async () => {
    const { configuration, read, write } = await scenario();
    for (const token of [read.secret, write.secret]) {
      const list = await listRoute.GET(bearer("GET", "/configurations", token));
      expect(list.status).toBe(200);
      expect(list.headers.get("cache-control")).toBe("private, no-store");
      const page = (await list.json()) as { items: { id: string }[] };
      expect(page.items.map((item) => item.id)).toContain(configuration.id);
      expect((await readConfiguration(token, configuration.id)).status).toBe(200);
    }
    const [row] = await db.select({ lastUsedAt: apiTokens.lastUsedAt }).from(apiTokens).where(eq(apiTokens.id, read.token.id));
    expect(row?.lastUsedAt).toBeInstanceOf(Date);
  });

  it("saves with a read and write token and refuses a read-only one (403) without writing", async () => {
    const { configuration, read, write } = await scenario();
    const edit = { document: { ...probeNearSevenBrane, title: "Edited by a script" }, message: "from a script", expectedVersion: 1 };
    const refused = await itemRoute.PUT(bearer("PUT", `/configurations/${configuration.id}`, read.secret, edit), params(configuration.id));
    expect(refused.status).toBe(403);
    expect(((await refused.json()) as { message: string }).message).toMatch(/read-only/);
    const saved = await itemRoute.PUT(bearer("PUT", `/configurations/${configuration.id}`, write.secret, edit), params(configuration.id));
    expect(saved.status).toBe(200);
    expect(((await saved.json()) as { version: number; title: string })).toMatchObject({ version: 2, title: "Edited by a script" });
  });

  it("judges the token alone: a session beside a read-only token lends it no right to write", async () => {
    const { owner, configuration, read } = await scenario();
    session.actor = owner.actor;
    const edit = { document: probeNearSevenBrane, expectedVersion: 1 };
    const response = await itemRoute.PUT(bearer("PUT", `/configurations/${configuration.id}`, read.secret, edit), params(configuration.id));
    expect(response.status).toBe(403);
  });

  it("refuses unknown, malformed, expired and revoked tokens with 401", async () => {
    const { owner, configuration, read, write } = await scenario();
    const unknown = `mooring_${"A".repeat(43)}`;
    for (const token of [unknown, "not-a-token", read.secret.slice(0, -1)]) {
      expect((await readConfiguration(token, configuration.id)).status).toBe(401);
    }
    const noScheme = new Request(`${base}/configurations`, { headers: { authorization: read.secret } });
    expect((await listRoute.GET(noScheme)).status).toBe(401);
    await db.update(apiTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(apiTokens.id, read.token.id));
    expect((await readConfiguration(read.secret, configuration.id)).status).toBe(401);
    expect((await readConfiguration(write.secret, configuration.id)).status).toBe(200);
    await revokeApiToken(owner.actor, write.token.id);
    const revoked = await readConfiguration(write.secret, configuration.id);
    expect(revoked.status).toBe(401);
    expect(((await revoked.json()) as { message: string }).message).toMatch(/unknown, expired or revoked/);
  });

  it("stops the tokens of a deleted account at once", async () => {
    const { owner, configuration, write } = await scenario();
    expect((await readConfiguration(write.secret, configuration.id)).status).toBe(200);
    await db.update(users).set({ deletedAt: new Date() }).where(eq(users.id, owner.actor.id));
    expect((await readConfiguration(write.secret, configuration.id)).status).toBe(401);
  });

  it("acts with the account's current role: a demoted admin's token loses the admin's reach at once", async () => {
    const { configuration } = await scenario();
    const [admin, otherAdmin] = await Promise.all([
      createTestUser({ label: "admin", siteRole: "admin" }),
      createTestUser({ label: "admin2", siteRole: "admin" }),
    ]);
    const { secret } = await createApiToken(admin.actor, { name: "admin script", scope: "read", expiresInDays: 7 });
    // Site admins act as owners of every group (db/queries/actor.ts), so the admin reads a group it is not in.
    expect((await readConfiguration(secret, configuration.id)).status).toBe(200);
    await setSiteRole(otherAdmin.actor, admin.actor.id, "member");
    expect((await readConfiguration(secret, configuration.id)).status).toBe(404);
  });

  it("refuses tokens on routes outside the configuration and compute routes (403)", async () => {
    const { write } = await scenario();
    const response = await groupsRoute.GET(bearer("GET", "/groups", write.secret));
    expect(response.status).toBe(403);
    expect(((await response.json()) as { message: string }).message).toMatch(/configuration and compute routes only/);
  });

  it("rate-limits each token on its own (429 with Retry-After)", async () => {
    pinClockToWindowStart();
    const { configuration, read, write } = await scenario();
    await consumeRateLimit(`api-token:${read.token.id}`, apiTokenRequestBudget, apiTokenRequestBudget.limit);
    const limited = await readConfiguration(read.secret, configuration.id);
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThanOrEqual(1);
    // The same account's other token has a budget of its own.
    expect((await readConfiguration(write.secret, configuration.id)).status).toBe(200);
  });

  it("computes with a read-only token, from a compute budget of the token's own", async () => {
    pinClockToWindowStart();
    const { owner, read, write } = await scenario();
    const compute = (token: string) => spectrumRoute.POST(bearer("POST", "/spectrum", token, probeNearSevenBrane));
    const response = await compute(read.secret);
    expect(response.status).toBe(200);
    expect(((await response.json()) as { sectors: unknown[] }).sectors.length).toBeGreaterThan(0);
    // Use up a fresh token's compute budget (600 units a minute, app/api/spectrum/route.ts).
    const spent = await createApiToken(owner.actor, { name: "spent", scope: "read", expiresInDays: 7 });
    expect((await consumeRateLimit(`spectrum:token:${spent.token.id}`, { limit: 600, windowMs: 60_000 }, 600)).ok).toBe(true);
    expect((await compute(spent.secret)).status).toBe(429);
    expect((await compute(write.secret)).status).toBe(200);
    // The owner's own budget in the browser is untouched.
    session.actor = owner.actor;
    const inBrowser = new Request(`${base}/spectrum`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(probeNearSevenBrane) });
    expect((await spectrumRoute.POST(inBrowser)).status).toBe(200);
  });
});
