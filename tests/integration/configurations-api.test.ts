import { count, eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { revisions } from "@/db/schema";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { braneAntibranePair, landingDemoConfiguration } from "@/lib/demo-configurations";
import { moveStacks } from "@/lib/designer/document";
import { createRoleGroup, createTestUser } from "@/tests/fixtures/users";

// The configuration route handlers, called with Request objects against PostgreSQL. The session
// is injected by mocking `getCurrentUser`; everything behind it (zod, the DAL, the engine) is real.
const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
const listRoute = await import("@/app/api/configurations/route");
const itemRoute = await import("@/app/api/configurations/[configurationId]/route");
const forkRoute = await import("@/app/api/configurations/[configurationId]/fork/route");
const revisionsRoute = await import("@/app/api/configurations/[configurationId]/revisions/route");
const revisionRoute = await import("@/app/api/configurations/[configurationId]/revisions/[revisionId]/route");
const resultRoute = await import("@/app/api/configurations/[configurationId]/revisions/[revisionId]/result/route");

const base = "http://mooring.test/api/configurations";

function as(actor: Actor | null) {
  session.actor = actor;
}

function json(method: string, url: string, body: unknown, headers: Record<string, string> = {}): Request {
  return new Request(url, { method, headers: { "content-type": "application/json", ...headers }, body: JSON.stringify(body) });
}

function params<T extends Record<string, string>>(value: T) {
  return { params: Promise.resolve(value) };
}

async function revisionCount(configurationId: string): Promise<number> {
  const [row] = await db.select({ n: count() }).from(revisions).where(eq(revisions.configurationId, configurationId));
  return row?.n ?? 0;
}

async function scenario() {
  const { owner, editor, viewer, outsider, group } = await createRoleGroup();
  as(owner.actor);
  const created = await listRoute.POST(json("POST", base, { groupId: group.id, document: landingDemoConfiguration, message: "First sketch" }));
  expect(created.status).toBe(201);
  const configuration = (await created.json()) as { id: string; version: number; currentRevision: { id: string; number: number } };
  return { owner, editor, viewer, outsider, group, configuration };
}

describe("POST /api/configurations", () => {
  it("creates version 1 and stores the server's own result for its first revision", async () => {
    const { configuration } = await scenario();
    expect(configuration.version).toBe(1);
    const stored = await resultRoute.GET(
      new Request(`${base}/${configuration.id}/revisions/${configuration.currentRevision.id}/result`),
      params({ configurationId: configuration.id, revisionId: configuration.currentRevision.id }),
    );
    expect(stored.status).toBe(200);
    const body = (await stored.json()) as { result: { lightest: unknown; gaugeGroup: string } };
    // The stored result is the engine's result for the same document.
    const expected = computeSpectrum(landingDemoConfiguration);
    expect(body.result.gaugeGroup).toBe(expected.gaugeGroup);
    expect(body.result.lightest).toEqual(expected.lightest);
  });

  it("answers 401 without a session and 422 with JSON paths for an invalid document", async () => {
    const { group } = await scenario();
    as(null);
    expect((await listRoute.POST(json("POST", base, { groupId: group.id, document: landingDemoConfiguration }))).status).toBe(401);
    as((await createTestUser({ label: "author" })).actor);
    const wrongP: Configuration = {
      ...braneAntibranePair,
      stacks: braneAntibranePair.stacks.map((s, i) => (i === 0 ? { ...s, worldvolume: [1, 2, 3] } : s)),
    };
    const response = await listRoute.POST(json("POST", base, { groupId: group.id, document: wrongP }));
    expect(response.status).toBe(422);
    const body = (await response.json()) as { issues: Array<{ path: Array<string | number> }> };
    expect(body.issues.some((issue) => issue.path.join(".").startsWith("document.stacks.0"))).toBe(true);
  });

  it("refuses to create in a group where the user is only a viewer", async () => {
    const { viewer, group } = await scenario();
    as(viewer.actor);
    const response = await listRoute.POST(json("POST", base, { groupId: group.id, document: landingDemoConfiguration }));
    expect(response.status).toBe(403);
  });
});

describe("PUT /api/configurations/[configurationId]", () => {
  it("saves a new revision when If-Match names the stored version", async () => {
    const { editor, configuration } = await scenario();
    as(editor.actor);
    const moved = moveStacks(landingDemoConfiguration, ["probe"], { "8": 1 });
    const response = await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: moved, message: "Probe further out" }, { "if-match": '"1"' }),
      params({ configurationId: configuration.id }),
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("etag")).toBe('"2"');
    const body = (await response.json()) as { version: number; document: Configuration };
    expect(body.version).toBe(2);
    expect(body.document.stacks.find((s) => s.id === "probe")?.position["8"]).toBe(2.5);
    expect(await revisionCount(configuration.id)).toBe(2);
  });

  it("answers 409 with the current version for a stale save and writes nothing", async () => {
    const { owner, editor, configuration } = await scenario();
    as(owner.actor);
    const first = await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: moveStacks(landingDemoConfiguration, ["probe"], { "9": 1 }), expectedVersion: 1 }),
      params({ configurationId: configuration.id }),
    );
    expect(first.status).toBe(200);

    as(editor.actor);
    const stale = await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: moveStacks(landingDemoConfiguration, ["probe"], { "9": -1 }) }, { "if-match": '"1"' }),
      params({ configurationId: configuration.id }),
    );
    expect(stale.status).toBe(409);
    const body = (await stale.json()) as { error: string; currentVersion: number };
    expect(body).toMatchObject({ error: "conflict", currentVersion: 2 });
    expect(await revisionCount(configuration.id)).toBe(2);

    const current = await itemRoute.GET(new Request(`${base}/${configuration.id}`), params({ configurationId: configuration.id }));
    const stored = (await current.json()) as { version: number; document: Configuration };
    expect(stored.version).toBe(2);
    expect(stored.document.stacks.find((s) => s.id === "probe")?.position["9"]).toBe(1);
  });

  it("requires a version and rejects a malformed If-Match", async () => {
    const { owner, configuration } = await scenario();
    as(owner.actor);
    const missing = await itemRoute.PUT(json("PUT", `${base}/${configuration.id}`, { document: landingDemoConfiguration }), params({ configurationId: configuration.id }));
    expect(missing.status).toBe(422);
    const malformed = await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: landingDemoConfiguration }, { "if-match": "*" }),
      params({ configurationId: configuration.id }),
    );
    expect(malformed.status).toBe(422);
    expect(await revisionCount(configuration.id)).toBe(1);
  });

  it("answers 403 to a viewer and writes nothing", async () => {
    const { viewer, configuration } = await scenario();
    as(viewer.actor);
    const response = await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: moveStacks(landingDemoConfiguration, ["probe"], { "8": 1 }) }, { "if-match": '"1"' }),
      params({ configurationId: configuration.id }),
    );
    expect(response.status).toBe(403);
    expect(await revisionCount(configuration.id)).toBe(1);
  });

  it("answers 413 to a body over the size limit", async () => {
    const { owner, configuration } = await scenario();
    as(owner.actor);
    const huge = { ...landingDemoConfiguration, description: "x".repeat(300 * 1024) };
    const response = await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: huge }, { "if-match": '"1"' }),
      params({ configurationId: configuration.id }),
    );
    expect(response.status).toBe(413);
  });
});

describe("GET /api/configurations/[configurationId]", () => {
  it("answers 404 to a non-member (the configuration's existence does not leak) and for a malformed id", async () => {
    const { outsider, configuration } = await scenario();
    as(outsider.actor);
    expect((await itemRoute.GET(new Request(`${base}/${configuration.id}`), params({ configurationId: configuration.id }))).status).toBe(404);
    expect((await itemRoute.GET(new Request(`${base}/not-a-uuid`), params({ configurationId: "not-a-uuid" }))).status).toBe(404);
  });

  it("lets a viewer read, with the version as ETag", async () => {
    const { viewer, configuration } = await scenario();
    as(viewer.actor);
    const response = await itemRoute.GET(new Request(`${base}/${configuration.id}`), params({ configurationId: configuration.id }));
    expect(response.status).toBe(200);
    expect(response.headers.get("etag")).toBe('"1"');
    expect(((await response.json()) as { canEdit: boolean }).canEdit).toBe(false);
  });
});

describe("POST /api/configurations/[configurationId]/fork", () => {
  it("copies a revision into the collaborator's space and records where it came from", async () => {
    const { owner, viewer, configuration } = await scenario();
    as(owner.actor);
    await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: moveStacks(landingDemoConfiguration, ["probe"], { "8": 2 }) }, { "if-match": '"1"' }),
      params({ configurationId: configuration.id }),
    );

    as(viewer.actor);
    const response = await forkRoute.POST(
      json("POST", `${base}/${configuration.id}/fork`, { targetGroupId: viewer.personalGroupId, revisionId: configuration.currentRevision.id }),
      params({ configurationId: configuration.id }),
    );
    expect(response.status).toBe(201);
    const fork = (await response.json()) as {
      id: string;
      group: { id: string };
      document: Configuration;
      forkedFrom: { configurationId: string; revisionId: string; revisionNumber: number; title: string };
      canEdit: boolean;
    };
    expect(fork.group.id).toBe(viewer.personalGroupId);
    expect(fork.canEdit).toBe(true);
    expect(fork.forkedFrom).toMatchObject({
      configurationId: configuration.id,
      revisionId: configuration.currentRevision.id,
      revisionNumber: 1,
      title: landingDemoConfiguration.title,
    });
    // Revision 1 is forked, not the newer revision 2.
    expect(fork.document.stacks.find((s) => s.id === "probe")?.position["8"]).toBe(1.5);
  });

  it("refuses a target group where the user cannot write", async () => {
    const { viewer, group, configuration } = await scenario();
    as(viewer.actor);
    const response = await forkRoute.POST(
      json("POST", `${base}/${configuration.id}/fork`, { targetGroupId: group.id }),
      params({ configurationId: configuration.id }),
    );
    expect(response.status).toBe(403);
  });
});

describe("revisions", () => {
  it("lists revisions newest first and serves each one with its document", async () => {
    const { owner, configuration } = await scenario();
    as(owner.actor);
    await itemRoute.PUT(
      json("PUT", `${base}/${configuration.id}`, { document: moveStacks(landingDemoConfiguration, ["probe"], { "8": 1 }), message: "second" }, { "if-match": '"1"' }),
      params({ configurationId: configuration.id }),
    );
    const list = await revisionsRoute.GET(new Request(`${base}/${configuration.id}/revisions`), params({ configurationId: configuration.id }));
    const { items } = (await list.json()) as { items: Array<{ id: string; number: number; message: string }> };
    expect(items.map((r) => r.number)).toEqual([2, 1]);
    expect(items[0]?.message).toBe("second");

    const first = items[1]!;
    const revision = await revisionRoute.GET(
      new Request(`${base}/${configuration.id}/revisions/${first.id}`),
      params({ configurationId: configuration.id, revisionId: first.id }),
    );
    expect(((await revision.json()) as { document: Configuration }).document).toEqual(landingDemoConfiguration);
  });

  it("answers 404 for a revision of another configuration", async () => {
    const one = await scenario();
    const other = await scenario();
    as(one.owner.actor);
    const response = await revisionRoute.GET(
      new Request(`${base}/${one.configuration.id}/revisions/${other.configuration.currentRevision.id}`),
      params({ configurationId: one.configuration.id, revisionId: other.configuration.currentRevision.id }),
    );
    expect(response.status).toBe(404);
  });
});

describe("GET /api/configurations", () => {
  it("pages, searches and filters a group's configurations", async () => {
    const { owner, group } = await scenario();
    as(owner.actor);
    for (const title of ["Alpha wall", "Beta wall", "Gamma probe"]) {
      const created = await listRoute.POST(json("POST", base, { groupId: group.id, document: { ...landingDemoConfiguration, title } }));
      expect(created.status).toBe(201);
    }
    const page = await listRoute.GET(new Request(`${base}?groupId=${group.id}&sort=title&direction=asc&pageSize=2&page=1`));
    const body = (await page.json()) as { items: Array<{ title: string }>; total: number; page: number };
    expect(body.total).toBe(4);
    expect(body.items.map((i) => i.title)).toEqual(["Alpha wall", "Beta wall"]);

    const searched = await listRoute.GET(new Request(`${base}?groupId=${group.id}&search=wall`));
    expect(((await searched.json()) as { total: number }).total).toBe(2);

    const filtered = await listRoute.GET(new Request(`${base}?groupId=${group.id}&theory=IIA`));
    expect(((await filtered.json()) as { total: number }).total).toBe(0);

    const bad = await listRoute.GET(new Request(`${base}?pageSize=1000`));
    expect(bad.status).toBe(422);
  });
});

describe("DELETE /api/configurations/[configurationId]", () => {
  it("soft-deletes for an editor; the configuration then reads as 404", async () => {
    const { editor, viewer, configuration } = await scenario();
    as(viewer.actor);
    expect((await itemRoute.DELETE(new Request(`${base}/${configuration.id}`, { method: "DELETE" }), params({ configurationId: configuration.id }))).status).toBe(403);
    as(editor.actor);
    expect((await itemRoute.DELETE(new Request(`${base}/${configuration.id}`, { method: "DELETE" }), params({ configurationId: configuration.id }))).status).toBe(204);
    expect((await itemRoute.GET(new Request(`${base}/${configuration.id}`), params({ configurationId: configuration.id }))).status).toBe(404);
    expect(await revisionCount(configuration.id)).toBe(1);
  });
});
