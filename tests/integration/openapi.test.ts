import { readFileSync } from "node:fs";
import path from "node:path";
import Ajv2020, { type ValidateFunction } from "ajv/dist/2020";
import addFormats from "ajv-formats";
import { describe, expect, it, vi } from "vitest";
import type { Actor } from "@/db/queries/actor";
import { createApiToken } from "@/db/queries/api-tokens";
import { createConfiguration } from "@/db/queries/configurations";
import { twoTwoBraneStacks } from "@/lib/demo-configurations";
import { getOpenApiDocument, requestExamples } from "@/lib/openapi/document";
import { configurationSchema, spectrumRequestSchema } from "@/lib/validations/configuration";
import {
  createConfigurationBodySchema,
  forkConfigurationBodySchema,
  updateConfigurationBodySchema,
} from "@/lib/validations/configuration-api";
import { createCommentSchema } from "@/lib/validations/comment";
import { changeRoleSchema, createGroupSchema } from "@/lib/validations/group";
import { acceptInvitationSchema, createInvitationSchema } from "@/lib/validations/invitation";
import { createTestUser } from "@/tests/fixtures/users";
import { handlersOf, routeFiles, urlPathOf } from "@/tests/support/app-modules";

// The OpenAPI document (lib/openapi/document.ts) against the app: every route handler found on
// disk is in it with exactly its methods, its request schemas accept the examples (its own and the
// README's) and refuse broken ones, and real answers of the handlers match its response schemas.
// The schemas are checked with Ajv, an independent JSON Schema 2020-12 validator (OpenAPI 3.1's
// schema dialect), not with the zod schemas they were generated from.
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async (): Promise<Actor | null> => null }));

const document = getOpenApiDocument() as unknown as {
  openapi: string;
  paths: Record<string, Record<string, { requestBody?: { content: Record<string, { example?: unknown }> }; security?: unknown[] }>>;
};
const documentId = "https://mooring.test/openapi.json";
const ajv = new Ajv2020({ strict: false, allErrors: true });
addFormats(ajv);
ajv.addFormat("binary", true);
ajv.addSchema(document, documentId);

/** A JSON pointer into the document, e.g. ["paths", "/api/spectrum", "post"] -> "#/paths/~1api~1spectrum/post". */
function pointer(...keys: string[]): string {
  return `#/${keys.map((key) => key.replaceAll("~", "~0").replaceAll("/", "~1")).join("/")}`;
}

function validatorAt(...keys: string[]): ValidateFunction {
  const validate = ajv.getSchema(`${documentId}${pointer(...keys)}`);
  if (!validate) throw new Error(`No schema at ${pointer(...keys)}`);
  return validate;
}

const requestSchema = (apiPath: string, method: string, mediaType = "application/json") =>
  validatorAt("paths", apiPath, method, "requestBody", "content", mediaType, "schema");
const responseSchema = (apiPath: string, method: string, status: number) =>
  validatorAt("paths", apiPath, method, "responses", String(status), "content", "application/json", "schema");

function expectValid(validate: ValidateFunction, value: unknown): void {
  const ok = validate(value);
  expect({ ok, errors: validate.errors ?? [] }).toEqual({ ok: true, errors: [] });
}

describe("the OpenAPI document", () => {
  it("is OpenAPI 3.1 and lists every route handler under app/api with exactly its methods", async () => {
    expect(document.openapi).toBe("3.1.0");
    const files = routeFiles();
    expect(files.length).toBeGreaterThan(20);
    const onDisk: Record<string, string[]> = {};
    for (const file of files) onDisk[urlPathOf(file)] = Object.keys(await handlersOf(file)).map((method) => method.toLowerCase()).sort();
    const documented = Object.fromEntries(Object.entries(document.paths).map(([apiPath, item]) => [apiPath, Object.keys(item).sort()]));
    expect(documented).toEqual(onDisk);
  });

  it("offers API tokens exactly on the configuration and compute routes", () => {
    for (const [apiPath, item] of Object.entries(document.paths)) {
      for (const operation of Object.values(item)) {
        const offersToken = JSON.stringify(operation.security ?? []).includes("apiToken");
        expect({ apiPath, offersToken }).toEqual({ apiPath, offersToken: apiPath === "/api/spectrum" || apiPath.startsWith("/api/configurations") });
      }
    }
  });

  it("accepts every example it carries, and the zod schemas the handlers parse with accept them too", () => {
    let checked = 0;
    for (const [apiPath, item] of Object.entries(document.paths)) {
      for (const [method, operation] of Object.entries(item)) {
        for (const [mediaType, content] of Object.entries(operation.requestBody?.content ?? {})) {
          if (content.example === undefined) continue;
          expectValid(requestSchema(apiPath, method, mediaType), content.example);
          checked += 1;
        }
      }
    }
    expect(checked).toBe(Object.keys(requestExamples).length);
    const zodOf: Record<keyof typeof requestExamples, { safeParse: (value: unknown) => { success: boolean } }> = {
      spectrum: spectrumRequestSchema,
      createConfiguration: createConfigurationBodySchema,
      updateConfiguration: updateConfigurationBodySchema,
      fork: forkConfigurationBodySchema,
      comment: createCommentSchema,
      createGroup: createGroupSchema,
      changeRole: changeRoleSchema,
      invitation: createInvitationSchema,
      acceptInvitation: acceptInvitationSchema,
    };
    for (const [name, example] of Object.entries(requestExamples)) {
      expect({ name, ok: zodOf[name as keyof typeof requestExamples].safeParse(example).success }).toEqual({ name, ok: true });
    }
  });

  it("refuses broken bodies", () => {
    const spectrum = requestSchema("/api/spectrum", "post");
    const [first, ...rest] = requestExamples.spectrum.stacks;
    expect(spectrum({ ...requestExamples.spectrum, theory: "IIC" })).toBe(false);
    expect(spectrum({ ...requestExamples.spectrum, stacks: [{ ...first, count: "two" }, ...rest] })).toBe(false);
    expect(spectrum({ ...requestExamples.spectrum, format: 3 })).toBe(false);
    expect(requestSchema("/api/configurations", "post")({ document: requestExamples.spectrum })).toBe(false);
  });

  it("accepts the configuration files of the README's scripting examples", () => {
    const readme = readFileSync(path.resolve(import.meta.dirname, "..", "..", "README.md"), "utf8");
    const section = readme.slice(readme.indexOf("## Scripting the API"));
    const files = [...section.matchAll(/```json\n([\s\S]*?)```/g)].map((match) => JSON.parse(match[1] ?? "") as unknown);
    expect(files.length).toBeGreaterThan(0);
    for (const file of files) {
      expectValid(requestSchema("/api/spectrum", "post"), file);
      expect(configurationSchema.safeParse(file).success).toBe(true);
    }
  });
});

describe("real answers match the document", () => {
  const spectrumRoute = import("@/app/api/spectrum/route");
  const post = async (body: string, query = "") =>
    (await spectrumRoute).POST(
      new Request(`http://mooring.test/api/spectrum${query}`, {
        method: "POST",
        headers: { "content-type": "application/json", "x-forwarded-for": `openapi-${Math.random()}` },
        body,
      }),
    );

  it("POST /api/spectrum: 200 paged, 400 invalid_json, 422 with path and jsonPath", async () => {
    const ok = await post(JSON.stringify(requestExamples.spectrum));
    expect(ok.status).toBe(200);
    expectValid(responseSchema("/api/spectrum", "post", 200), await ok.json());

    // Two stacks make three sectors; one row per page leaves the later two without detail.
    const paged = await post(JSON.stringify(twoTwoBraneStacks), "?maxRows=1");
    expect(paged.status).toBe(200);
    const page = (await paged.json()) as { sectors: { detailOmitted?: boolean; levels: unknown[] }[]; page: { nextSectorOffset: number | null } };
    expectValid(responseSchema("/api/spectrum", "post", 200), page);
    expect(page.page.nextSectorOffset).toBe(1);
    expect(page.sectors[0]?.detailOmitted).toBeUndefined();
    expect(page.sectors.slice(1).every((sector) => sector.detailOmitted === true && sector.levels.length === 0)).toBe(true);

    const malformed = await post("{ not json");
    expect(malformed.status).toBe(400);
    const malformedBody = await malformed.json();
    expectValid(responseSchema("/api/spectrum", "post", 400), malformedBody);
    expect(malformedBody).toMatchObject({ error: "invalid_json" });

    const invalid = await post(JSON.stringify({ ...requestExamples.spectrum, theory: "IIC" }));
    expect(invalid.status).toBe(422);
    const invalidBody = (await invalid.json()) as { issues: { path: unknown; jsonPath: unknown }[] };
    expectValid(responseSchema("/api/spectrum", "post", 422), invalidBody);
    expect(invalidBody.issues[0]).toMatchObject({ path: ["theory"], jsonPath: "theory" });
  });

  it("the configuration routes, called with an API token, answer in the documented shapes", async () => {
    const user = await createTestUser({ label: "openapi" });
    const configuration = await createConfiguration(user.actor, user.personalGroupId, requestExamples.spectrum, "first");
    const revisionId = configuration.currentRevision?.id ?? "";
    const { secret } = await createApiToken(user.actor, { name: "docs check", scope: "read", expiresInDays: 7 });
    const call = async (file: string, url: string, params: Record<string, string> = {}) => {
      const handler = (await handlersOf(file)).GET;
      if (!handler) throw new Error(`${file} has no GET`);
      const response = await handler(new Request(`http://mooring.test${url}`, { headers: { authorization: `Bearer ${secret}` } }), {
        params: Promise.resolve(params),
      });
      expect(response.status).toBe(200);
      return response.json();
    };
    const ids = { configurationId: configuration.id, revisionId };
    expectValid(responseSchema("/api/configurations", "get", 200), await call("configurations/route.ts", "/api/configurations"));
    expectValid(
      responseSchema("/api/configurations/{configurationId}", "get", 200),
      await call("configurations/[configurationId]/route.ts", `/api/configurations/${configuration.id}`, ids),
    );
    expectValid(
      responseSchema("/api/configurations/{configurationId}/revisions", "get", 200),
      await call("configurations/[configurationId]/revisions/route.ts", `/api/configurations/${configuration.id}/revisions`, ids),
    );
    expectValid(
      responseSchema("/api/configurations/{configurationId}/revisions/{revisionId}", "get", 200),
      await call("configurations/[configurationId]/revisions/[revisionId]/route.ts", `/api/configurations/${configuration.id}/revisions/${revisionId}`, ids),
    );
    expectValid(
      responseSchema("/api/configurations/{configurationId}/revisions/{revisionId}/result", "get", 200),
      await call(
        "configurations/[configurationId]/revisions/[revisionId]/result/route.ts",
        `/api/configurations/${configuration.id}/revisions/${revisionId}/result`,
        ids,
      ),
    );
  });
});
