import { randomUUID } from "node:crypto";
import { count, eq } from "drizzle-orm";
import fc from "fast-check";
import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { createConfiguration } from "@/db/queries/configurations";
import { attachments, configurations } from "@/db/schema";
import { idleState, type ActionState } from "@/lib/action-state";
import {
  bosonicTwentyFiveWithTwentyThree,
  braneAntibranePair,
  landingDemoConfiguration,
  probeNearSevenBrane,
  zeroFourBoundState,
} from "@/lib/demo-configurations";
import { resetRateLimits } from "@/lib/server/rate-limit";
import { unstorableTextMessage } from "@/lib/storable-text";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";
import { actionFiles, actionsOf, handlersOf, paramNamesOf, routeFiles, type Method, type RouteHandler, type ServerAction } from "@/tests/support/app-modules";

// Fuzzing of the two routes that take a whole configuration document from outside: random JSON,
// valid documents with one part broken, text that is not JSON, odd numbers JSON.parse turns into
// Infinity, oversized bodies, and (for the import) odd multipart forms. Every answer must be a
// success or a deliberate 4xx; every 422 names each problem by a JSON path that points into the
// document that was sent. `FUZZ_API_RUNS` raises the run count for `npm run fuzz:long`.

const runs = Math.max(1_000, Number(process.env.FUZZ_API_RUNS ?? 0) || 0);
const seed = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : undefined;

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
const spectrumRoute = await import("@/app/api/spectrum/route");
const importRoute = await import("@/app/api/configurations/import/route");

const validDocuments = [
  landingDemoConfiguration,
  probeNearSevenBrane,
  braneAntibranePair,
  zeroFourBoundState,
  bosonicTwentyFiveWithTwentyThree,
];

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path to a value inside `value` (the root included, as []). */
function pathsOf(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const here = [prefix];
  if (Array.isArray(value)) return here.concat(...value.map((item, index) => pathsOf(item, [...prefix, index])));
  if (value && typeof value === "object") {
    return here.concat(...Object.entries(value).map(([key, item]) => pathsOf(item, [...prefix, key])));
  }
  return here;
}

/** A copy of `root` with the value at `path` replaced (or removed when `replacement` is undefined). */
function withValueAt(root: Json, path: (string | number)[], replacement: Json | undefined): Json | undefined {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  if (Array.isArray(root) && typeof head === "number") {
    const copy = [...root];
    const inner = withValueAt(copy[head] ?? null, rest, replacement);
    if (inner === undefined) copy.splice(head, 1);
    else copy[head] = inner;
    return copy;
  }
  if (root && typeof root === "object" && !Array.isArray(root) && head !== undefined) {
    const copy: { [key: string]: Json } = { ...root };
    const inner = withValueAt(copy[String(head)] ?? null, rest, replacement);
    if (inner === undefined) delete copy[String(head)];
    else copy[String(head)] = inner;
    return copy;
  }
  return root;
}

const nastyJson: fc.Arbitrary<Json> = fc.constantFrom<Json>(
  null,
  "",
  "9",
  -1,
  0,
  0.5,
  1e9,
  -1e308,
  true,
  [],
  {},
  [null],
  { "9": "x" },
  "<script>alert(1)</script>",
  "'; drop table users; --",
  "x".repeat(300),
);

/** A valid document with one value replaced by something else, or removed. */
const brokenDocument: fc.Arbitrary<string> = fc
  .record({
    document: fc.constantFrom(...validDocuments),
    pick: fc.nat(),
    // One in five loses the value instead.
    replacement: fc.oneof(
      { weight: 1, arbitrary: fc.constant<Json | undefined>(undefined) },
      { weight: 4, arbitrary: fc.oneof(nastyJson, fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>) },
    ),
  })
  .map(({ document, pick, replacement }) => {
    const root = JSON.parse(JSON.stringify(document)) as Json;
    const paths = pathsOf(root).filter((path) => path.length > 0);
    const path = paths[pick % paths.length] ?? [];
    return JSON.stringify(withValueAt(root, path, replacement) ?? null);
  });

/** Valid JSON whose numbers JSON.parse turns into Infinity, -0 or 0, or loses precision on. */
const oddNumberText: fc.Arbitrary<string> = fc
  .record({
    document: fc.constantFrom(...validDocuments),
    path: fc.constantFrom<(string | number)[]>(["levels"], ["stringScaleGeV"], ["dimension"], ["stacks", 0, "count"], ["stacks", 0, "position", "9"]),
    text: fc.constantFrom("1e400", "-1e400", "-0", "1e-400", "12345678901234567890", "2.00000000000000001", "4.5"),
  })
  .map(({ document, path, text }) => {
    const marker = "__odd_number__";
    const root = JSON.parse(JSON.stringify(document)) as Json;
    return JSON.stringify(withValueAt(root, path, marker)).replace(`"${marker}"`, text);
  });

/** Text that is mostly not JSON at all: random strings, truncated documents, deep nesting, a BOM. */
const strangeText: fc.Arbitrary<string> = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.record({ document: fc.constantFrom(...validDocuments), cut: fc.nat() }).map(({ document, cut }) => {
    const json = JSON.stringify(document);
    return json.slice(0, cut % json.length);
  }),
  fc.integer({ min: 1, max: 5_000 }).map((depth) => `${"[".repeat(depth)}${"]".repeat(depth)}`),
  fc.constantFrom("\uFEFF{}", "null", "[]", '"text"', "0", "{\"format\":1}", "{\"__proto__\":{\"polluted\":1}}"),
);

/** Valid documents, unchanged or with a fresh title: these must be accepted. */
const validText: fc.Arbitrary<string> = fc
  .record({ document: fc.constantFrom(...validDocuments), title: fc.string({ minLength: 1, maxLength: 30 }) })
  .map(({ document, title }) => JSON.stringify({ ...document, title: title.trim() ? title : document.title }));

const anyBody = fc.oneof(
  { weight: 2, arbitrary: validText },
  { weight: 4, arbitrary: brokenDocument },
  { weight: 1, arbitrary: oddNumberText },
  { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 3 }).map((value) => JSON.stringify(value)) },
  { weight: 2, arbitrary: strangeText },
);

/** Splits a JSON path, as text (`stacks[1].position["9"]`) or as an array, into its keys. */
function pathKeys(path: unknown): (string | number)[] {
  if (Array.isArray(path)) {
    expect(path.every((key) => typeof key === "string" || typeof key === "number")).toBe(true);
    return path as (string | number)[];
  }
  expect(typeof path).toBe("string");
  const text = path as string;
  const keys: (string | number)[] = [];
  const token = /(?:^|\.)([A-Za-z_$][\w$]*)|\[(\d+)\]|\[("(?:[^"\\]|\\.)*")\]/gy;
  let match: RegExpExecArray | null;
  while ((match = token.exec(text)) !== null) {
    if (match[1] !== undefined) keys.push(match[1]);
    else if (match[2] !== undefined) keys.push(Number(match[2]));
    else keys.push(JSON.parse(match[3] ?? '""') as string);
    if (token.lastIndex === text.length) break;
  }
  expect(keys.length === 0 ? text : token.lastIndex).toBe(keys.length === 0 ? "" : text.length);
  return keys;
}

/**
 * True when `keys` point into `document`: every key but the last names an existing own value, and
 * the last names a key of an existing object or array (a missing required field is named by the
 * key it should have).
 */
function pointsInto(document: unknown, keys: (string | number)[]): boolean {
  let current = document;
  for (const [index, key] of keys.entries()) {
    if (current === null || typeof current !== "object") return false;
    if (index === keys.length - 1) return true;
    if (!Object.prototype.hasOwnProperty.call(current, key)) return false;
    current = (current as Record<string | number, unknown>)[key];
  }
  return true;
}

interface ErrorBody {
  error?: string;
  message?: string;
  issues?: { path: unknown; message: string }[];
}

/** The answer is a deliberate status with a readable body; a 422 names paths inside `sent` (or the form `fields`). */
async function expectDeliberate(response: Response, sent: string, fields: string[] = []): Promise<number> {
  expect(response.status).toBeLessThan(500);
  if (response.status < 400) return response.status;
  expect([400, 401, 403, 404, 409, 413, 422, 429]).toContain(response.status);
  const body = (await response.json()) as ErrorBody;
  expect(typeof body.error).toBe("string");
  expect(body.message?.trim().length ?? 0).toBeGreaterThan(0);
  if (response.status === 422) {
    expect(body.issues?.length ?? 0).toBeGreaterThan(0);
    let document: unknown;
    try {
      document = JSON.parse(sent.replace(/^\uFEFF/, ""));
    } catch {
      document = undefined;
    }
    for (const issue of body.issues ?? []) {
      const keys = pathKeys(issue.path);
      expect(issue.message.trim().length).toBeGreaterThan(0);
      const namesField = keys.length === 1 && fields.includes(String(keys[0]));
      if (keys.length > 0 && !namesField) expect(pointsInto(document, keys)).toBe(true);
    }
  }
  return response.status;
}

let owner: Actor;

beforeAll(async () => {
  owner = (await createTestUser({ label: "fuzz" })).actor;
});

describe("POST /api/spectrum fuzzing", () => {
  beforeEach(async () => {
    await resetRateLimits("spectrum:");
  });

  it(`answers ${runs} random and malformed bodies with 200 or a deliberate 4xx naming JSON paths`, async () => {
    session.actor = owner;
    const statuses = new Map<number, number>();
    await fc.assert(
      fc.asyncProperty(anyBody, fc.boolean(), async (text, signedIn) => {
        const headers: Record<string, string> = { "content-type": "application/json" };
        // Signed-in callers spend the account's compute budget; anonymous ones come from a fresh address each time.
        if (signedIn) headers.cookie = "next-auth.session-token=fuzz";
        else headers[clientAddressHeader] = `fuzz-${randomUUID()}`;
        const response = await spectrumRoute.POST(
          new Request("http://127.0.0.1/api/spectrum", { method: "POST", headers, body: text }),
        );
        const status = await expectDeliberate(response, text);
        statuses.set(status, (statuses.get(status) ?? 0) + 1);
      }),
      { numRuns: runs, seed },
    );
    // Both success and each kind of rejection occur in volume, so the checks above are not vacuous.
    expect(statuses.get(200) ?? 0).toBeGreaterThan(runs / 10);
    expect(statuses.get(422) ?? 0).toBeGreaterThan(runs / 10);
    expect(statuses.get(400) ?? 0).toBeGreaterThan(0);
  }, Math.max(300_000, runs * 50));

  it("refuses bodies over 64 KiB with 413, declared or not", async () => {
    session.actor = owner;
    const big = JSON.stringify({ ...probeNearSevenBrane, description: "x".repeat(70 * 1024) });
    const headers = { "content-type": "application/json", cookie: "next-auth.session-token=fuzz" };
    const declared = await spectrumRoute.POST(new Request("http://127.0.0.1/api/spectrum", { method: "POST", headers, body: big }));
    expect(await expectDeliberate(declared, big)).toBe(413);
    const stream = new Blob([big]).stream();
    const undeclared = await spectrumRoute.POST(
      new Request("http://127.0.0.1/api/spectrum", { method: "POST", headers, body: stream, duplex: "half" } as RequestInit),
    );
    expect(await expectDeliberate(undeclared, big)).toBe(413);
  });
});

describe("POST /api/configurations/import fuzzing", () => {
  async function configurationsOf(actor: Actor): Promise<number> {
    const [row] = await db.select({ n: count() }).from(configurations).where(eq(configurations.createdBy, actor.id));
    return row?.n ?? 0;
  }

  /** Odd but possible multipart forms around the file text. */
  const formShape = fc.record({
    fieldName: fc.oneof({ weight: 9, arbitrary: fc.constant("file") }, { weight: 1, arbitrary: fc.constantFrom("File", "upload", "") }),
    fileName: fc.constantFrom("configuration.json", "", "../../etc/passwd", "x.png", "名前.json"),
    type: fc.constantFrom("application/json", "", "image/png", "text/plain"),
    groupId: fc.oneof(
      { weight: 8, arbitrary: fc.constant(undefined) },
      { weight: 1, arbitrary: fc.constantFrom("", "not-a-uuid", "'; drop table groups; --") },
      { weight: 1, arbitrary: fc.uuid() },
    ),
    // One file in ten is raw bytes instead of the text.
    binary: fc.oneof({ weight: 9, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: fc.uint8Array({ maxLength: 64 }) }),
  });

  it(`answers ${runs} random and malformed files with 201 or a deliberate 4xx naming JSON paths, saving nothing invalid`, async () => {
    session.actor = owner;
    const before = await configurationsOf(owner);
    let created = 0;
    const statuses = new Map<number, number>();
    await fc.assert(
      fc.asyncProperty(anyBody, formShape, async (text, shape) => {
        const form = new FormData();
        const content = shape.binary ?? text;
        form.set(shape.fieldName, new Blob([content], { type: shape.type }), shape.fileName);
        if (shape.groupId !== undefined) form.set("groupId", shape.groupId);
        const response = await importRoute.POST(
          new Request("http://127.0.0.1/api/configurations/import", { method: "POST", body: form }),
        );
        const sent = shape.binary ? "" : text;
        const status = await expectDeliberate(response, sent, ["file", "groupId"]);
        if (status === 201) created += 1;
        else expect(status).toBeGreaterThanOrEqual(400);
        statuses.set(status, (statuses.get(status) ?? 0) + 1);
      }),
      { numRuns: runs, seed },
    );
    // Every accepted file is exactly one new configuration; rejected ones left nothing behind.
    expect(await configurationsOf(owner)).toBe(before + created);
    expect(created).toBeGreaterThan(runs / 10);
    expect(statuses.get(422) ?? 0).toBeGreaterThan(runs / 10);
  }, Math.max(300_000, runs * 50));

  it("answers a body that is not multipart, and no session, with deliberate statuses", async () => {
    session.actor = owner;
    const json = JSON.stringify(probeNearSevenBrane);
    const notMultipart = await importRoute.POST(
      new Request("http://127.0.0.1/api/configurations/import", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: json,
      }),
    );
    expect(await expectDeliberate(notMultipart, json, ["file"])).toBe(422);
    session.actor = null;
    const form = new FormData();
    form.set("file", new Blob([json]), "p.json");
    const anonymous = await importRoute.POST(new Request("http://127.0.0.1/api/configurations/import", { method: "POST", body: form }));
    expect(anonymous.status).toBe(401);
  });
});

// ---------------------------------------------------------------------------------------------
// Text PostgreSQL cannot store (NUL characters, unpaired UTF-16 surrogates), in every way it can
// come in: query strings on every route, JSON bodies on every route that reads one, multipart fields
// and file names, and the fields of every form action. Each answers 422 (or the form's field error)
// and never reaches the database, where it would fail as a 500.
// ---------------------------------------------------------------------------------------------

/** Text around one character the database refuses (fast-check's strings are ASCII, so none pairs up). */
const unstorableText = fc
  .tuple(fc.string({ maxLength: 8 }), fc.constantFrom("\u0000", "\ud800", "\udbff", "\udc00", "\udfff"), fc.string({ maxLength: 8 }))
  .map(([before, bad, after]) => `${before}${bad}${after}`);

/**
 * Text with a NUL, for query strings, multipart and forms: these carry only well-formed text (a URL
 * or a FormData turns an unpaired surrogate into U+FFFD), so NUL is what can still reach them.
 */
const nulText = fc.tuple(fc.string({ maxLength: 8 }), fc.string({ maxLength: 8 })).map(([before, after]) => `${before}\u0000${after}`);

interface ValidationBody {
  error: string;
  issues: { path: (string | number)[]; message: string }[];
}

describe("text the database cannot store", () => {
  const routes = async () => {
    const found: { file: string; method: Method; handler: RouteHandler; params: Record<string, string> }[] = [];
    for (const file of routeFiles()) {
      // next-auth's own handler; health and the OpenAPI document read no input at all.
      if (file.startsWith("auth/") || file === "health/route.ts" || file === "openapi.json/route.ts") continue;
      const params = Object.fromEntries(paramNamesOf(file).map((name) => [name, randomUUID()]));
      for (const [method, handler] of Object.entries(await handlersOf(file)) as [Method, RouteHandler][]) {
        found.push({ file, method, handler, params });
      }
    }
    return found;
  };

  it("in the query string: 422 from every route, whether it reads its query or not", async () => {
    session.actor = owner;
    const all = await routes();
    expect(all.length).toBeGreaterThan(25);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...all), fc.constantFrom("format", "note", "revision", "q"), nulText, async (route, key, value) => {
        const url = new URL(`http://127.0.0.1/api/${route.file}`);
        url.searchParams.set(key, value);
        const response = await route.handler(new Request(url, { method: route.method }), { params: Promise.resolve(route.params) });
        expect({ route: `${route.method} ${route.file}`, status: response.status }).toEqual({ route: `${route.method} ${route.file}`, status: 422 });
        expect(((await response.json()) as ValidationBody).issues[0]?.path).toEqual([key]);
      }),
      { numRuns: 200, seed },
    );
  });

  it("in a JSON body: 422 naming the string, from every route that reads JSON", async () => {
    session.actor = owner;
    const writes = (await routes()).filter((route) => route.method !== "GET" && route.method !== "DELETE");
    const json = (body: string) => ({ method: "", headers: { "content-type": "application/json" }, body });
    // A route reads a JSON body exactly when malformed JSON gets it to answer 400.
    const readers: typeof writes = [];
    for (const route of writes) {
      const malformed = await route.handler(new Request("http://127.0.0.1/x", { ...json("{"), method: route.method }), { params: Promise.resolve(route.params) });
      if (malformed.status === 400) readers.push(route);
    }
    expect(readers.length).toBeGreaterThanOrEqual(8);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...readers), unstorableText, fc.boolean(), async (route, text, inKey) => {
        const body = inKey ? { title: "x", stacks: [{ [text]: 1 }] } : { title: "x", stacks: [{ label: text }] };
        const response = await route.handler(new Request("http://127.0.0.1/x", { ...json(JSON.stringify(body)), method: route.method }), {
          params: Promise.resolve(route.params),
        });
        expect({ route: `${route.method} ${route.file}`, status: response.status }).toEqual({ route: `${route.method} ${route.file}`, status: 422 });
        const issue = ((await response.json()) as ValidationBody).issues[0];
        expect(issue?.path).toEqual(inKey ? ["stacks", 0, text] : ["stacks", 0, "label"]);
      }),
      { numRuns: 200, seed },
    );
  });

  it("in a multipart field or file name: 422 from the import and attachment uploads, nothing stored", async () => {
    session.actor = owner;
    const group = await createTestGroup(owner);
    const configuration = await createConfiguration(owner, group.id, probeNearSevenBrane, "first");
    const attachmentsRoute = await import("@/app/api/configurations/[configurationId]/attachments/route");
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    await fc.assert(
      fc.asyncProperty(nulText, fc.constantFrom("import-group", "import-name", "attachment-name"), async (text, where) => {
        const form = new FormData();
        if (where === "attachment-name") {
          form.set("file", new Blob([png]), `${text}.png`);
          const response = await attachmentsRoute.POST(
            new Request(`http://127.0.0.1/api/configurations/${configuration.id}/attachments`, { method: "POST", body: form }),
            { params: Promise.resolve({ configurationId: configuration.id }) },
          );
          expect(response.status).toBe(422);
          return;
        }
        form.set("file", new Blob([JSON.stringify(probeNearSevenBrane)]), where === "import-name" ? `${text}.json` : "ok.json");
        if (where === "import-group") form.set("groupId", text);
        const response = await importRoute.POST(new Request("http://127.0.0.1/api/configurations/import", { method: "POST", body: form }));
        expect(response.status).toBe(422);
        expect(((await response.json()) as ValidationBody).issues[0]?.path).toEqual([where === "import-group" ? "groupId" : "file"]);
      }),
      { numRuns: 60, seed },
    );
    const [stored] = await db.select({ n: count() }).from(attachments).where(eq(attachments.configurationId, configuration.id));
    expect(stored?.n).toBe(0);
  });

  it("in a form: every form action answers an error on the field, never a failure of its own", async () => {
    session.actor = owner;
    // Every field name the forms use; each action reads its own and ignores the rest.
    const fieldNames = ["name", "email", "password", "confirmPassword", "token", "currentPassword", "newPassword", "slug", "description", "kind", "userId", "siteRole", "callbackPath"];
    const forms: { name: string; action: ServerAction }[] = [];
    for (const file of actionFiles()) {
      for (const [name, action] of Object.entries(await actionsOf(file))) {
        // Form actions take (previous state, form data); the others take ids, not text fields.
        if (action.length === 2) forms.push({ name: `${file} ${name}`, action });
      }
    }
    expect(forms.length).toBeGreaterThanOrEqual(8);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...forms), nulText, async ({ name, action }, text) => {
        const data = new FormData();
        for (const field of fieldNames) data.set(field, text);
        const state = (await action(...([idleState(), data] as never[]))) as ActionState;
        expect({ name, status: state.status }).toEqual({ name, status: "error" });
        const messages = Object.values(state.fieldErrors).flat();
        expect(messages.length).toBeGreaterThan(0);
        expect(messages.every((message) => message === unstorableTextMessage)).toBe(true);
      }),
      { numRuns: 100, seed },
    );
  });
});
