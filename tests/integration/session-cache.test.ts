import { Client } from "pg";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { getActorForSession } from "@/db/queries/actor";
import { endSession, signOutEverywhere, startSession } from "@/db/queries/sessions";
import { checkTicket, rememberMs, sessionChangesHeard } from "@/db/session-cache";
import { createTestUser } from "@/tests/fixtures/users";

// The session checks a process remembers (db/session-cache.ts) while it hears, through migration
// 0008's triggers, every change to sessions and accounts. `elsewhere` is a connection of its own,
// standing for another app process or a tool working on the same database. A change it makes
// with the trigger switched off is one nobody announces: what a check returns then shows whether
// it asked PostgreSQL or answered from memory.

let elsewhere: Client;

beforeAll(async () => {
  elsewhere = new Client({ connectionString: process.env.DATABASE_URL });
  await elsewhere.connect();
});

afterAll(async () => {
  await elsewhere.end();
});

afterEach(() => {
  vi.useRealTimers();
});

/** Revokes a session from the other connection without the trigger: no process hears of it. */
async function revokeUnannounced(sessionId: string): Promise<void> {
  await elsewhere.query("alter table sessions disable trigger sessions_notify_change");
  try {
    await elsewhere.query("update sessions set revoked_at = now() where id = $1", [sessionId]);
  } finally {
    await elsewhere.query("alter table sessions enable trigger sessions_notify_change");
  }
}

async function openSession(label: string) {
  const user = await createTestUser({ label });
  const sessionId = await startSession(user.actor.id);
  return { user, sessionId, check: () => getActorForSession(user.actor.id, sessionId) };
}

describe("remembered session checks", () => {
  it("answer from memory while the process listens, and a change announced elsewhere ends that at once", async () => {
    await sessionChangesHeard();
    const { user, sessionId, check } = await openSession("remembered");
    expect(await check()).toMatchObject({ id: user.actor.id, sessionId });

    await revokeUnannounced(sessionId);
    // Nobody announced it, so the check answers from memory: the session still counts as open.
    expect(await check()).toMatchObject({ id: user.actor.id });

    // The same change, announced (the trigger is back): the process forgets and asks again.
    await elsewhere.query("update sessions set revoked_at = now() where id = $1", [sessionId]);
    await expect.poll(check, { timeout: 5_000, interval: 20 }).toBeNull();
  });

  it("hear a demotion, a rename and a deletion of the account made elsewhere", async () => {
    await sessionChangesHeard();
    const { user, check } = await openSession("account");
    await elsewhere.query("update users set site_role = 'admin' where id = $1", [user.actor.id]);
    await expect.poll(async () => (await check())?.siteRole, { timeout: 5_000, interval: 20 }).toBe("admin");
    await elsewhere.query("update users set site_role = 'member', name = 'Renamed elsewhere' where id = $1", [user.actor.id]);
    await expect.poll(async () => (await check())?.name, { timeout: 5_000, interval: 20 }).toBe("Renamed elsewhere");
    expect((await check())?.siteRole).toBe("member");
    await elsewhere.query("update users set deleted_at = now() where id = $1", [user.actor.id]);
    await expect.poll(check, { timeout: 5_000, interval: 20 }).toBeNull();
  });

  it("end with a sign-out in this process at once, without waiting for the announcement", async () => {
    await sessionChangesHeard();
    const one = await openSession("sign-out");
    expect(await one.check()).not.toBeNull();
    // With the trigger off only the process's own forgetting can end what it remembered.
    await elsewhere.query("alter table sessions disable trigger sessions_notify_change");
    try {
      await endSession(one.user.actor.id, one.sessionId);
      expect(await one.check()).toBeNull();

      const two = await openSession("everywhere");
      const actor = await two.check();
      expect(actor).not.toBeNull();
      await signOutEverywhere(actor);
      expect(await two.check()).toBeNull();
    } finally {
      await elsewhere.query("alter table sessions enable trigger sessions_notify_change");
    }
  });

  it("are asked again after a few seconds, announced or not", async () => {
    await sessionChangesHeard();
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-06-01T12:00:00Z"));
    const { check, sessionId } = await openSession("aged");
    expect(await check()).not.toBeNull();
    await revokeUnannounced(sessionId);
    vi.setSystemTime(new Date(Date.parse("2026-06-01T12:00:00Z") + rememberMs - 1_000));
    expect(await check()).not.toBeNull();
    vi.setSystemTime(new Date(Date.parse("2026-06-01T12:00:00Z") + rememberMs + 1_000));
    expect(await check()).toBeNull();
  });

  it("are not remembered while the listener is down, and again once it is back", async () => {
    await sessionChangesHeard();
    const before = await openSession("listener");
    expect(await before.check()).not.toBeNull();
    // PostgreSQL ends the listener's connection (as a restart would).
    await elsewhere.query(
      "select pg_terminate_backend(pid) from pg_stat_activity where application_name = 'mooring-session-changes' and datname = current_database()",
    );
    await expect.poll(() => checkTicket(), { timeout: 5_000, interval: 10 }).toBeNull();
    // Everything remembered went with it (and would go again when the listener is back): an
    // unannounced revocation is seen at once.
    await revokeUnannounced(before.sessionId);
    expect(await before.check()).toBeNull();

    // The listener comes back by itself, and checks are remembered again.
    await sessionChangesHeard();
    const after = await openSession("heard-again");
    expect(await after.check()).not.toBeNull();
    await revokeUnannounced(after.sessionId);
    expect(await after.check()).not.toBeNull();
  });
});
