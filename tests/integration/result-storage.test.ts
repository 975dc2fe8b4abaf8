import { eq, sql } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { createConfiguration, updateConfiguration } from "@/db/queries/configurations";
import { forkConfiguration } from "@/db/queries/forks";
import { getResultHead, getResultSector, getResultSectorPage, getResultText } from "@/db/queries/result-reads";
import { hashDocument } from "@/db/queries/results";
import { restoreRevision } from "@/db/queries/revisions";
import { results } from "@/db/schema";
import { computeSpectrum, ENGINE_VERSION } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { NotFoundError } from "@/lib/errors";
import { resultOverview, summaryFacts } from "@/lib/spectrum";
import { createRoleGroup } from "@/tests/fixtures/users";

// Counts the computations the DAL asks for, passing each on to the real pool.
const computed = vi.hoisted(() => ({ count: 0 }));
vi.mock("@/lib/server/compute/pool", async (importOriginal) => {
  const actual = await importOriginal<typeof import("@/lib/server/compute/pool")>();
  return {
    ...actual,
    computeSpectrumJob: (...args: Parameters<typeof actual.computeSpectrumJob>) => {
      computed.count += 1;
      return actual.computeSpectrumJob(...args);
    },
  };
});

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
const itemRoute = await import("@/app/api/configurations/[configurationId]/route");

/** A document no other test stores, so its content hash is new. */
function fresh(label: string): Configuration {
  return {
    ...braneAntibranePair,
    title: `Reuse ${label}`,
    stacks: braneAntibranePair.stacks.map((stack) => ({ ...stack, label: `${stack.label} ${label} ${crypto.randomUUID()}` })),
  };
}

async function storedRows(configurationId: string) {
  return db.execute<{ number: number; content_hash: string | null; compute_ms: number }>(sql`
    select r.number, s.content_hash, s.compute_ms from revisions r join results s on s.revision_id = r.id
    where r.configuration_id = ${configurationId} order by r.number`);
}

beforeEach(() => {
  computed.count = 0;
});

describe("content-addressed results", () => {
  it("computes a new document once and reuses its result for unchanged saves, restores and forks", async () => {
    const { owner, viewer, group } = await createRoleGroup();
    const document = fresh("a");
    const created = await createConfiguration(owner.actor, group.id, document, "first");
    expect(computed.count).toBe(1);

    // Saving the same physics under a new title, with stacks in another order: no computation.
    const renamed = { ...document, title: "Renamed", stacks: [...document.stacks].reverse() };
    const saved = await updateConfiguration(owner.actor, created.id, { expectedVersion: 1, document: renamed, message: "rename" });
    expect(computed.count).toBe(1);
    // The list summary of the reused result, read from the stored row, is the computed one's.
    const summary = ({ lightestMassSquared, tachyonic, supercharges }: typeof saved) => ({ lightestMassSquared, tachyonic, supercharges });
    expect(summary(saved)).toEqual(summary(created));
    expect(summary(saved).tachyonic).toBe(true);

    const moved = { ...document, stacks: document.stacks.map((stack) => (stack.id === "anti" ? { ...stack, position: { ...stack.position, "9": 4 } } : stack)) };
    await updateConfiguration(owner.actor, created.id, { expectedVersion: saved.version, document: moved, message: "moved" });
    expect(computed.count).toBe(2);

    await restoreRevision(owner.actor, created.id, created.currentRevision?.id ?? "", { expectedVersion: 3 });
    await forkConfiguration(viewer.actor, created.id, { targetGroupId: viewer.personalGroupId });
    expect(computed.count).toBe(2);

    const rows = (await storedRows(created.id)).rows;
    expect(rows.map((row) => row.content_hash)).toEqual([hashDocument(document), hashDocument(document), hashDocument(moved), hashDocument(document)]);
    // A reused result is the same row's content: its compute time is copied, not measured again.
    expect(rows[1]?.compute_ms).toBe(rows[0]?.compute_ms);
    expect(rows[3]?.compute_ms).toBe(rows[0]?.compute_ms);
  });

  it("keys the hash on the engine version and the result-relevant content only", () => {
    const document = fresh("b");
    expect(hashDocument({ ...document, title: "x", description: "y" })).toBe(hashDocument(document));
    expect(hashDocument({ ...document, levels: document.levels + 1 })).not.toBe(hashDocument(document));
    expect(hashDocument(document)).toMatch(/^[0-9a-f]{64}$/);
  });
});

describe("reading stored results", () => {
  async function saved() {
    const { owner, outsider, group } = await createRoleGroup();
    const document = fresh("reads");
    const configuration = await createConfiguration(owner.actor, group.id, document, "first");
    return { owner, outsider, configuration, document, revisionId: configuration.currentRevision?.id ?? "" };
  }

  it("sends the stored JSON as PostgreSQL holds it, and the same numbers as the engine", async () => {
    const { owner, configuration, document, revisionId } = await saved();
    const body = JSON.parse(await getResultText(owner.actor, configuration.id, revisionId)) as { engineVersion: string; result: unknown };
    expect(body.engineVersion).toBe(ENGINE_VERSION);
    expect(body.result).toEqual(computeSpectrum(document));
  });

  it("reads the head, then pages of sector overviews, then one sector at a time", async () => {
    const { owner, outsider, configuration, document, revisionId } = await saved();
    const full = computeSpectrum(document);
    const overview = resultOverview(full);
    const head = await getResultHead(owner.actor, configuration.id, revisionId);
    expect(head.firstPage).toEqual({ items: overview.sectors, total: overview.sectors.length, offset: 0 });
    expect(head.facts).toEqual(summaryFacts(full));
    expect(head.result.lightest).toEqual(full.lightest);
    expect(head.massCurves.map((curve) => curve.interceptText)).toEqual(["-1/2"]);
    for (const sector of overview.sectors) {
      expect(await getResultSector(owner.actor, configuration.id, revisionId, sector.index)).toEqual(full.sectors[sector.index]);
    }
    await expect(getResultSector(owner.actor, configuration.id, revisionId, overview.sectors.length)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getResultHead(outsider.actor, configuration.id, revisionId)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("filters the sector pages by stack id or label and by tachyons, on the server", async () => {
    const { owner, configuration, document, revisionId } = await saved();
    const antiLabel = document.stacks.find((stack) => stack.id === "anti")?.label ?? "";
    const byLabel = await getResultSectorPage(owner.actor, configuration.id, revisionId, { search: antiLabel.slice(-12) });
    expect(byLabel.items.map((sector) => sector.pair)).toEqual([
      ["anti", "anti"],
      ["anti", "brane"],
    ]);
    const tachyonic = await getResultSectorPage(owner.actor, configuration.id, revisionId, { tachyonicOnly: true });
    expect(tachyonic.items.map((sector) => sector.pair)).toEqual([["anti", "brane"]]);
    const paged = await getResultSectorPage(owner.actor, configuration.id, revisionId, { offset: 1, limit: 1 });
    expect(paged).toMatchObject({ total: 3, offset: 1 });
    expect(paged.items).toHaveLength(1);
  });

  it("upgrades a result stored by an older engine without an overview", async () => {
    const { owner, configuration, document, revisionId } = await saved();
    await db
      .update(results)
      .set({ engineVersion: "1.0.0", overview: null, contentHash: null, result: sql`jsonb_set(${results.result}::jsonb #- '{conventions}', '{engineVersion}', '"1.0.0"')::json` })
      .where(eq(results.revisionId, revisionId));
    const head = await getResultHead(owner.actor, configuration.id, revisionId);
    expect(head.engineVersion).toBe("1.0.0");
    expect(head.firstPage.total).toBe(computeSpectrum(document).sectors.length);
    const text = JSON.parse(await getResultText(owner.actor, configuration.id, revisionId)) as { result: { conventions: string } };
    // readStoredResult fills what the older engine did not store.
    expect(typeof text.result.conventions).toBe("string");
    expect(text.result.conventions.length).toBeGreaterThan(0);
  });

  it("answers GET /api/configurations/:id?include=result with the configuration and its stored result", async () => {
    const { owner, configuration, document } = await saved();
    session.actor = owner.actor;
    const response = await itemRoute.GET(new Request(`http://mooring.test/api/configurations/${configuration.id}?include=result`), {
      params: Promise.resolve({ configurationId: configuration.id }),
    });
    expect(response.status).toBe(200);
    expect(response.headers.get("etag")).toBe('"1"');
    const body = (await response.json()) as { id: string; document: Configuration; result: { revisionId: string; result: unknown } };
    expect(body.id).toBe(configuration.id);
    expect(body.document).toEqual(document);
    expect(body.result.revisionId).toBe(configuration.currentRevision?.id);
    expect(body.result.result).toEqual(computeSpectrum(document));
  });
});
