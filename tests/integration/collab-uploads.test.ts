import { count, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { createConfiguration } from "@/db/queries/configurations";
import { attachments, configurations, revisions } from "@/db/schema";
import { braneAntibranePair, probeNearSevenBrane } from "@/lib/demo-configurations";
import { attachmentMaxBytes } from "@/lib/validations/attachment";
import { importMaxBytes } from "@/lib/validations/import";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
const attachmentsRoute = await import("@/app/api/configurations/[configurationId]/attachments/route");
const attachmentRoute = await import("@/app/api/attachments/[attachmentId]/route");
const importRoute = await import("@/app/api/configurations/import/route");
const exportRoute = await import("@/app/api/configurations/[configurationId]/export/route");

const pngBytes = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 73, 72, 68, 82]);

function upload(url: string, file: Blob, name: string, extra: Record<string, string> = {}): Request {
  const form = new FormData();
  form.set("file", file, name);
  for (const [key, value] of Object.entries(extra)) form.set(key, value);
  return new Request(`http://test.local${url}`, { method: "POST", body: form });
}

async function scenario() {
  const [owner, viewer, outsider] = await Promise.all([
    createTestUser({ label: "owner" }),
    createTestUser({ label: "viewer" }),
    createTestUser({ label: "outsider" }),
  ]);
  const group = await createTestGroup(owner.actor, [{ actor: viewer.actor, role: "viewer" }]);
  const configuration = await createConfiguration(owner.actor, group.id, braneAntibranePair, "First");
  const params = { params: Promise.resolve({ configurationId: configuration.id }) };
  return { owner, viewer, outsider, group, configuration, params };
}

async function attachmentCount(configurationId: string): Promise<number> {
  const [row] = await db.select({ n: count() }).from(attachments).where(eq(attachments.configurationId, configurationId));
  return row?.n ?? 0;
}

beforeEach(() => {
  session.actor = null;
});

/**
 * A chunked upload with no Content-Length that produces up to `totalBytes` of a multipart body in
 * 64 KiB pieces only as they are read, and counts how many bytes were read.
 */
function streamingUpload(url: string, totalBytes: number): { request: Request; delivered: () => number } {
  const boundary = "mooring-test-boundary";
  const head = new TextEncoder().encode(
    `--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="huge.png"\r\ncontent-type: image/png\r\n\r\n`,
  );
  let delivered = 0;
  const chunk = new Uint8Array(64 * 1024);
  chunk.set(pngBytes);
  const body = new ReadableStream<Uint8Array>(
    {
      pull(controller) {
        if (delivered >= totalBytes) return controller.close();
        const piece = delivered === 0 ? head : chunk;
        delivered += piece.byteLength;
        controller.enqueue(piece);
      },
    },
    // Nothing is produced before someone reads.
    { highWaterMark: 0 },
  );
  const request = new Request(`http://test.local${url}`, {
    method: "POST",
    headers: { "content-type": `multipart/form-data; boundary=${boundary}` },
    body,
    duplex: "half",
  } as RequestInit);
  return { request, delivered: () => delivered };
}

describe("attachments", () => {
  it("stores a PNG for an editor, sniffed from its bytes, downloadable by members only", async () => {
    const { owner, viewer, outsider, configuration, params } = await scenario();
    session.actor = owner.actor;
    // The browser's claimed type is ignored; the bytes decide.
    const response = await attachmentsRoute.POST(
      upload(`/api/configurations/${configuration.id}/attachments`, new Blob([pngBytes], { type: "application/pdf" }), "figure.png"),
      params,
    );
    expect(response.status).toBe(201);
    const created = (await response.json()) as { id: string; contentType: string; byteSize: number };
    expect(created.contentType).toBe("image/png");
    expect(created.byteSize).toBe(pngBytes.length);

    const attachmentParams = { params: Promise.resolve({ attachmentId: created.id }) };
    session.actor = viewer.actor;
    const download = await attachmentRoute.GET(new Request(`http://test.local/api/attachments/${created.id}`), attachmentParams);
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("image/png");
    expect(download.headers.get("content-disposition")).toContain('attachment; filename="figure.png"');
    expect(new Uint8Array(await download.arrayBuffer())).toEqual(pngBytes);

    session.actor = outsider.actor;
    const denied = await attachmentRoute.GET(new Request(`http://test.local/api/attachments/${created.id}`), attachmentParams);
    expect(denied.status).toBe(404);
    session.actor = null;
    const anonymous = await attachmentRoute.GET(new Request(`http://test.local/api/attachments/${created.id}`), attachmentParams);
    expect(anonymous.status).toBe(401);
  });

  it("rejects a file that is not PNG, JPEG or PDF with 422 and stores nothing", async () => {
    const { owner, configuration, params } = await scenario();
    session.actor = owner.actor;
    const response = await attachmentsRoute.POST(
      upload(`/api/configurations/${configuration.id}/attachments`, new Blob(["<svg/>"], { type: "image/png" }), "fake.png"),
      params,
    );
    expect(response.status).toBe(422);
    const body = (await response.json()) as { issues: { path: string[] }[] };
    expect(body.issues[0]?.path).toEqual(["file"]);
    expect(await attachmentCount(configuration.id)).toBe(0);
  });

  it("rejects a file over 5 MB with 413 and stores nothing", async () => {
    const { owner, configuration, params } = await scenario();
    session.actor = owner.actor;
    const big = new Uint8Array(attachmentMaxBytes + 1);
    big.set(pngBytes);
    const response = await attachmentsRoute.POST(
      upload(`/api/configurations/${configuration.id}/attachments`, new Blob([big]), "big.png"),
      params,
    );
    expect(response.status).toBe(413);
    expect(await attachmentCount(configuration.id)).toBe(0);
  });

  it("reads no byte of an upload from a caller who may not attach (authorized before the body)", async () => {
    const { viewer, outsider, configuration, params } = await scenario();
    const url = `/api/configurations/${configuration.id}/attachments`;
    for (const [actor, status] of [
      [null, 401],
      [outsider.actor, 404],
      [viewer.actor, 403],
    ] as const) {
      session.actor = actor;
      const upload = streamingUpload(url, 4 * 1024 * 1024);
      const response = await attachmentsRoute.POST(upload.request, params);
      expect({ status: response.status, bytesRead: upload.delivered() }).toEqual({ status, bytesRead: 0 });
    }
    expect(await attachmentCount(configuration.id)).toBe(0);
  });

  it("stops reading a chunked upload without Content-Length once it passes the limit (413)", async () => {
    const { owner, configuration, params } = await scenario();
    session.actor = owner.actor;
    const upload = streamingUpload(`/api/configurations/${configuration.id}/attachments`, 64 * 1024 * 1024);
    const response = await attachmentsRoute.POST(upload.request, params);
    expect(response.status).toBe(413);
    // The limit, the room allowed for the form's framing (16 KiB) and the piece that crossed it.
    expect(upload.delivered()).toBeLessThanOrEqual(attachmentMaxBytes + 16 * 1024 + 64 * 1024);
    expect(await attachmentCount(configuration.id)).toBe(0);
  });

  it("names a stored file by the type found in its bytes and drops bidirectional formatting characters", async () => {
    const { owner, configuration, params } = await scenario();
    session.actor = owner.actor;
    const url = `/api/configurations/${configuration.id}/attachments`;
    const names: string[] = [];
    for (const sent of ["plot.html", "scan.JPEG", "invoice\u202Egnp.html", "\u2066figure\u2069.png", "notes"]) {
      const bytes = sent === "scan.JPEG" ? new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 16]) : pngBytes;
      const response = await attachmentsRoute.POST(upload(url, new Blob([bytes], { type: "text/html" }), sent), params);
      expect(response.status).toBe(201);
      const created = (await response.json()) as { id: string; fileName: string };
      names.push(created.fileName);
      const download = await attachmentRoute.GET(new Request(`http://test.local/api/attachments/${created.id}`), {
        params: Promise.resolve({ attachmentId: created.id }),
      });
      expect(download.headers.get("content-disposition")).toContain(`filename="${created.fileName}"`);
    }
    // An HTML page with PNG bytes is stored (and downloads) as a PNG, never as .html.
    expect(names).toEqual(["plot.png", "scan.JPEG", "invoicegnp.png", "figure.png", "notes.png"]);
  });

  it("refuses uploads by viewers (403)", async () => {
    const { viewer, configuration, params } = await scenario();
    session.actor = viewer.actor;
    const response = await attachmentsRoute.POST(
      upload(`/api/configurations/${configuration.id}/attachments`, new Blob([pngBytes]), "figure.png"),
      params,
    );
    expect(response.status).toBe(403);
    expect(await attachmentCount(configuration.id)).toBe(0);
  });
});

describe("import", () => {
  async function configurationTotal(): Promise<number> {
    const [row] = await db.select({ n: count() }).from(configurations);
    return row?.n ?? 0;
  }

  it("creates a configuration with revision 1 and its result from a valid file", async () => {
    const { owner } = await scenario();
    session.actor = owner.actor;
    const file = new Blob([JSON.stringify(probeNearSevenBrane)], { type: "application/json" });
    const response = await importRoute.POST(upload("/api/configurations/import", file, "probe.json"));
    expect(response.status).toBe(201);
    const created = (await response.json()) as { id: string; title: string; group: { kind: string } };
    expect(created.title).toBe(probeNearSevenBrane.title);
    expect(created.group.kind).toBe("personal");
    const rows = await db.select().from(revisions).where(eq(revisions.configurationId, created.id));
    expect(rows.map((row) => row.message)).toEqual(["Imported from probe.json"]);
  });

  async function importIssuePaths(document: unknown): Promise<string[]> {
    const response = await importRoute.POST(upload("/api/configurations/import", new Blob([JSON.stringify(document)]), "broken.json"));
    expect(response.status).toBe(422);
    const body = (await response.json()) as { issues: { path: (string | number)[] }[] };
    return body.issues.map((issue) => JSON.stringify(issue.path));
  }

  it("lists every problem with its JSON path (422) and saves nothing", async () => {
    const { owner } = await scenario();
    session.actor = owner.actor;
    const before = await configurationTotal();
    // Shape problems in two places are reported together.
    const misshapen = {
      ...braneAntibranePair,
      theory: "IIC",
      stacks: [braneAntibranePair.stacks[0], { ...braneAntibranePair.stacks[1], worldvolume: "all" }],
    };
    expect(await importIssuePaths(misshapen)).toEqual(
      expect.arrayContaining([JSON.stringify(["theory"]), JSON.stringify(["stacks", 1, "worldvolume"])]),
    );
    // Rule problems (well-shaped values out of range) are reported together too.
    const outOfRange = {
      ...braneAntibranePair,
      levels: -3,
      stacks: [{ ...braneAntibranePair.stacks[0], count: 0 }, braneAntibranePair.stacks[1]],
    };
    expect(await importIssuePaths(outOfRange)).toEqual(
      expect.arrayContaining([JSON.stringify(["levels"]), JSON.stringify(["stacks", 0, "count"])]),
    );
    expect(await configurationTotal()).toBe(before);
  });

  it("reports a file that is not JSON, and one over 256 kB", async () => {
    const { owner } = await scenario();
    session.actor = owner.actor;
    const notJson = await importRoute.POST(upload("/api/configurations/import", new Blob(["{ title: "]), "x.json"));
    expect(notJson.status).toBe(422);
    expect(((await notJson.json()) as { message: string }).message).toContain("not valid JSON");
    const tooBig = await importRoute.POST(
      upload("/api/configurations/import", new Blob([" ".repeat(importMaxBytes + 1)]), "big.json"),
    );
    expect(tooBig.status).toBe(413);
  });

  it("names a file that is not JSON by its content, and words a top-level list plainly", async () => {
    const { owner } = await scenario();
    session.actor = owner.actor;
    const messageOf = async (body: BlobPart, name: string) => {
      const response = await importRoute.POST(upload("/api/configurations/import", new Blob([body]), name));
      expect(response.status).toBe(422);
      return ((await response.json()) as { message: string }).message;
    };
    // PNG signature (RFC 2083): 89 50 4E 47 0D 0A 1A 0A, whatever the file is called.
    expect(await messageOf(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]), "figure.json")).toContain("a PNG image");
    expect(await messageOf("pair,sector,level\na-b,NS,0\n", "spectrum.json")).toContain("a CSV table");
    expect(await messageOf(JSON.stringify([probeNearSevenBrane, probeNearSevenBrane]), "two.json")).toContain("holds a list");
  });

  it("requires a session (401) and membership of the target group", async () => {
    const { outsider, group } = await scenario();
    const file = new Blob([JSON.stringify(probeNearSevenBrane)]);
    expect((await importRoute.POST(upload("/api/configurations/import", file, "p.json"))).status).toBe(401);
    session.actor = outsider.actor;
    const denied = await importRoute.POST(upload("/api/configurations/import", file, "p.json", { groupId: group.id }));
    expect(denied.status).toBe(404);
  });
});

describe("export", () => {
  it("serves JSON that re-imports, and CSV and LaTeX with conventions, to members only", async () => {
    const { viewer, outsider, params } = await scenario();
    session.actor = viewer.actor;
    const json = await exportRoute.GET(new Request(`http://test.local/x?format=json`), params);
    expect(json.status).toBe(200);
    expect(json.headers.get("content-disposition")).toMatch(/attachment; filename=".*-r1\.json"/);
    expect(await json.json()).toEqual(braneAntibranePair);

    const csv = await exportRoute.GET(new Request(`http://test.local/x?format=csv`), params);
    expect(csv.headers.get("content-type")).toContain("text/csv");
    expect((await csv.text()).startsWith("stack_a,stack_b,")).toBe(true);
    const tex = await exportRoute.GET(new Request(`http://test.local/x?format=tex`), params);
    expect(await tex.text()).toContain("\\toprule");

    const bad = await exportRoute.GET(new Request(`http://test.local/x?format=xml`), params);
    expect(bad.status).toBe(422);
    session.actor = outsider.actor;
    expect((await exportRoute.GET(new Request(`http://test.local/x?format=json`), params)).status).toBe(404);
  });
});
