import { and, eq, isNull, sql } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { createConfiguration } from "@/db/queries/configurations";
import { acceptInvitation, createInvitation } from "@/db/queries/invitations";
import { configurations, invitations, memberships, results, revisions } from "@/db/schema";
import type { Configuration } from "@/lib/boundary/types";
import { probeNearSevenBrane } from "@/lib/demo-configurations";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

// Many requests at once through the route handlers, each with its own signed-in user: the mocked
// session reads the actor from an AsyncLocalStorage, so parallel requests do not share one.
// (tests/integration/db-configurations.test.ts covers a few concurrent saves at the DAL level.)
vi.mock("@/lib/server/session", async () => {
  const { AsyncLocalStorage } = await import("node:async_hooks");
  const store = new AsyncLocalStorage<Actor | null>();
  return {
    getCurrentUser: async () => store.getStore() ?? null,
    runAs: <T>(actor: Actor | null, action: () => Promise<T>) => store.run(actor, action),
  };
});
const { runAs } = (await import("@/lib/server/session")) as unknown as {
  runAs: <T>(actor: Actor | null, action: () => Promise<T>) => Promise<T>;
};
const configurationRoute = await import("@/app/api/configurations/[configurationId]/route");
const forkRoute = await import("@/app/api/configurations/[configurationId]/fork/route");

const params = (configurationId: string) => ({ params: Promise.resolve({ configurationId }) });

/** A document that says which client wrote it (the probe's distance along x8). */
function documentOf(client: number): Configuration {
  return {
    ...probeNearSevenBrane,
    stacks: probeNearSevenBrane.stacks.map((stack, index) =>
      index === 1 ? { ...stack, position: { ...stack.position, "8": 1 + client / 8 } } : stack,
    ),
  };
}

function save(actor: Actor, configurationId: string, version: number, client: number): Promise<Response> {
  return runAs(actor, () =>
    configurationRoute.PUT(
      new Request(`http://127.0.0.1/api/configurations/${configurationId}`, {
        method: "PUT",
        headers: { "content-type": "application/json", "if-match": `"${version}"` },
        body: JSON.stringify({ document: documentOf(client), message: `client ${client}` }),
      }),
      params(configurationId),
    ),
  );
}

async function scenario() {
  const [owner, editor] = await Promise.all([createTestUser({ label: "owner" }), createTestUser({ label: "editor" })]);
  const group = await createTestGroup(owner.actor, [{ actor: editor.actor, role: "editor" }]);
  const configuration = await createConfiguration(owner.actor, group.id, probeNearSevenBrane, "first");
  return { owner, editor, group, configuration };
}

/** Version, revision numbers and result count as stored. */
async function stored(configurationId: string) {
  const [row] = await db.select({ version: configurations.version }).from(configurations).where(eq(configurations.id, configurationId));
  const rows = await db
    .select({ number: revisions.number, message: revisions.message, document: revisions.document })
    .from(revisions)
    .where(eq(revisions.configurationId, configurationId))
    .orderBy(revisions.number);
  const [resultCount] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(results)
    .innerJoin(revisions, eq(revisions.id, results.revisionId))
    .where(eq(revisions.configurationId, configurationId));
  return { version: row?.version ?? 0, revisions: rows, results: resultCount?.n ?? 0 };
}

describe("concurrent saves", () => {
  it("accepts exactly one of 50 simultaneous saves from the same version; the other 49 get 409 and write nothing", async () => {
    const { owner, editor, configuration } = await scenario();
    const responses = await Promise.all(
      Array.from({ length: 50 }, (_, client) => save(client % 2 ? editor.actor : owner.actor, configuration.id, 1, client)),
    );
    const statuses = responses.map((response) => response.status);
    expect(statuses.filter((status) => status === 200)).toHaveLength(1);
    expect(statuses.filter((status) => status === 409)).toHaveLength(49);
    const conflicts = await Promise.all(responses.filter((r) => r.status === 409).map((r) => r.json() as Promise<{ error: string; currentVersion: number }>));
    expect(conflicts.every((body) => body.error === "conflict" && body.currentVersion === 2)).toBe(true);

    const after = await stored(configuration.id);
    expect(after.version).toBe(2);
    expect(after.revisions.map((revision) => revision.number)).toEqual([1, 2]);
    expect(after.results).toBe(2);
    // The accepted save is the one stored.
    const winner = (await responses.find((r) => r.status === 200)?.json()) as { document: Configuration };
    expect(after.revisions[1]?.document).toEqual(winner.document);
  });

  it("loses nothing when 20 clients retry after each 409: 20 accepted saves, 21 revisions, every client's document kept once", async () => {
    const { owner, editor, configuration } = await scenario();
    const clients = 20;
    let conflicts = 0;
    await Promise.all(
      Array.from({ length: clients }, async (_, client) => {
        const actor = client % 2 ? editor.actor : owner.actor;
        let version = 1;
        // Bounded: each round accepts one save, so no client needs more than `clients` tries.
        for (let attempt = 0; attempt <= clients; attempt += 1) {
          const response = await save(actor, configuration.id, version, client);
          if (response.status === 200) return;
          expect(response.status).toBe(409);
          conflicts += 1;
          version = ((await response.json()) as { currentVersion: number }).currentVersion;
        }
        throw new Error(`client ${client} never got its save in`);
      }),
    );
    const after = await stored(configuration.id);
    expect(after.version).toBe(1 + clients);
    expect(after.revisions.map((revision) => revision.number)).toEqual(Array.from({ length: clients + 1 }, (_, i) => i + 1));
    expect(after.results).toBe(clients + 1);
    const writers = after.revisions.slice(1).map((revision) => revision.message).sort();
    expect(writers).toEqual(Array.from({ length: clients }, (_, client) => `client ${client}`).sort());
    expect(conflicts).toBeGreaterThan(0);
  });
});

describe("concurrent forks", () => {
  it("gives 20 simultaneous forks of one configuration 20 distinct configurations, each at version 1 from the same revision", async () => {
    const { owner, editor, group, configuration } = await scenario();
    const responses = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        runAs(i % 2 ? editor.actor : owner.actor, () =>
          forkRoute.POST(
            new Request(`http://127.0.0.1/api/configurations/${configuration.id}/fork`, {
              method: "POST",
              headers: { "content-type": "application/json" },
              body: JSON.stringify({ targetGroupId: group.id, title: `fork ${i}` }),
            }),
            params(configuration.id),
          ),
        ),
      ),
    );
    expect(responses.map((response) => response.status)).toEqual(Array.from({ length: 20 }, () => 201));
    const forks = await Promise.all(responses.map((r) => r.json() as Promise<{ id: string; version: number; forkedFrom: { revisionNumber: number } }>));
    expect(new Set(forks.map((fork) => fork.id)).size).toBe(20);
    expect(forks.every((fork) => fork.version === 1 && fork.forkedFrom.revisionNumber === 1)).toBe(true);
    for (const fork of forks) {
      const copy = await stored(fork.id);
      expect(copy.revisions).toHaveLength(1);
      expect(copy.results).toBe(1);
    }
    // The source is untouched.
    expect((await stored(configuration.id)).version).toBe(1);
  });
});

describe("concurrent invitations", () => {
  it("keeps one pending invitation when the same e-mail is invited 10 times at once (a newer invitation retires the older)", async () => {
    const { owner, group } = await scenario();
    const email = `invitee-${Date.now()}@test.mooring`;
    const outcomes = await Promise.allSettled(
      Array.from({ length: 10 }, (_, i) => createInvitation(owner.actor, group.id, { email, role: i % 2 ? "viewer" : "editor" })),
    );
    expect(outcomes.filter((o) => o.status === "fulfilled").length).toBeGreaterThan(0);
    const pending = await db
      .select({ id: invitations.id })
      .from(invitations)
      .where(and(eq(invitations.groupId, group.id), eq(invitations.email, email), isNull(invitations.revokedAt), isNull(invitations.acceptedAt)));
    expect(pending).toHaveLength(1);
  });

  it("adds the invitee once when one invitation is accepted 10 times at once", async () => {
    const { owner, group } = await scenario();
    const invitee = await createTestUser({ label: "invitee" });
    const issued = await createInvitation(owner.actor, group.id, { email: invitee.actor.email, role: "viewer" });
    const outcomes = await Promise.allSettled(Array.from({ length: 10 }, () => acceptInvitation(invitee.actor, issued.token)));
    expect(outcomes.filter((o) => o.status === "fulfilled")).toHaveLength(1);
    for (const outcome of outcomes) {
      if (outcome.status === "rejected") expect((outcome.reason as { status?: number }).status).toBeGreaterThanOrEqual(400);
    }
    const rows = await db
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.groupId, group.id), eq(memberships.userId, invitee.actor.id)));
    expect(rows).toEqual([{ role: "viewer" }]);
  });
});
