import { z } from "./zod";
import { configurationSchema } from "./configuration";
import { storedResultShape, storedSectorSchema } from "./spectrum-result";

/*
 * Shapes of the JSON the API answers with, for the OpenAPI document (lib/openapi/document.ts).
 * Requests are checked by the schemas the route handlers parse with; these describe responses,
 * and tests/integration/openapi.test.ts checks real responses against them.
 */

const timestamp = z.iso.datetime({ offset: true }).describe("ISO 8601 date and time.");
const id = z.uuid();
const theory = z.enum(["bosonic", "IIA", "IIB"]);

/** Every error answer: a stable code for programs and a sentence for people. */
export const errorResponseSchema = z.object({
  error: z.string().describe("Stable code, e.g. not_found, forbidden, unauthenticated."),
  message: z.string().describe("What went wrong, for people."),
});

/** 422: every problem with the input, each at its path. */
export const validationErrorResponseSchema = errorResponseSchema.extend({
  error: z.literal("validation_failed"),
  issues: z.array(
    z.object({
      path: z.array(z.union([z.string(), z.number().int()])).describe('Where the problem is, e.g. ["stacks", 1, "worldvolume"].'),
      jsonPath: z.string().describe("The same path as JSON-path text, e.g. stacks[1].worldvolume."),
      message: z.string(),
    }),
  ),
});

/** 400: the body is not well-formed JSON. */
export const invalidJsonResponseSchema = errorResponseSchema.extend({ error: z.literal("invalid_json") });

/** 409 on a save: someone saved a newer version in between; nothing was written. */
export const conflictResponseSchema = errorResponseSchema.extend({
  error: z.literal("conflict"),
  currentVersion: z.number().int().describe("The version now stored; reload it and apply your change again."),
});

/** 413: the body is larger than the route accepts. */
export const payloadTooLargeResponseSchema = errorResponseSchema.extend({
  error: z.literal("payload_too_large"),
  limitBytes: z.number().int(),
});

/** 429: a rate limit or compute budget is used up; also in the Retry-After header. */
export const rateLimitedResponseSchema = errorResponseSchema.extend({
  error: z.literal("rate_limited"),
  retryAfterSeconds: z.number().int(),
});

const person = z.object({ id, name: z.string() });

/** One row of a configurations list. */
export const configurationSummaryResponseSchema = z.object({
  id,
  title: z.string(),
  theory,
  group: z.object({ id, slug: z.string(), name: z.string(), kind: z.enum(["personal", "research", "lab"]) }),
  version: z.number().int().describe("Send it back in If-Match (or expectedVersion) when saving."),
  isStarter: z.boolean(),
  stackCount: z.number().int(),
  lightestMassSquared: z.number().nullable().describe("alpha' M^2 of the lightest state; null when unknown."),
  tachyonic: z.boolean(),
  supercharges: z.number().int().nullable(),
  forkedFromConfigurationId: id.nullable(),
  author: person,
  createdAt: timestamp,
  updatedAt: timestamp,
});

/** `GET /api/configurations`. */
export const configurationPageResponseSchema = z.object({
  items: z.array(configurationSummaryResponseSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});

/** A configuration with its current document. */
export const configurationResponseSchema = configurationSummaryResponseSchema.extend({
  description: z.string(),
  document: configurationSchema,
  currentRevision: z.object({ id, number: z.number().int() }).nullable(),
  forkedFrom: z
    .object({ configurationId: id, revisionId: id.nullable(), revisionNumber: z.number().int().nullable(), title: z.string().nullable() })
    .nullable(),
  role: z.enum(["owner", "editor", "viewer"]).describe("The caller's role in the configuration's group."),
  canEdit: z.boolean(),
});

/** One row of a configuration's history. */
export const revisionSummaryResponseSchema = z.object({
  id,
  configurationId: id,
  number: z.number().int(),
  message: z.string(),
  author: person,
  createdAt: timestamp,
  isCurrent: z.boolean(),
  hasResult: z.boolean(),
});

/** A revision with its (immutable) document. */
export const revisionResponseSchema = revisionSummaryResponseSchema.extend({ document: configurationSchema });

/** The spectrum result the engine computed (exact rationals as strings; alpha' = 1). */
export const spectrumResultResponseSchema = storedResultShape.describe(
  "Exact rationals as strings (\"-1/2\"), state counts as decimal strings; alpha' = 1, lengths in sqrt(alpha'), masses as alpha' M^2 and M sqrt(alpha').",
);

/** The stored result of one revision. */
export const revisionResultResponseSchema = z.object({
  revisionId: id,
  engineVersion: z.string(),
  result: spectrumResultResponseSchema,
  computeMs: z.number(),
  createdAt: timestamp,
});

/** `POST /api/spectrum`: the result with its sectors paged. */
export const spectrumPageResponseSchema = storedResultShape.extend({
  sectors: z.array(
    storedSectorSchema.extend({
      detailOmitted: z
        .boolean()
        .optional()
        .describe("true on sectors outside this page: their levels and axes are empty; ask for them with sectorOffset."),
    }),
  ),
  page: z.object({
    sectorOffset: z.number().int(),
    sectorsWithDetail: z.number().int().describe("Sectors from sectorOffset on that carry their level rows and expansions."),
    sectorCount: z.number().int(),
    nextSectorOffset: z.number().int().nullable().describe("The sectorOffset of the next page; null after the last one."),
  }),
});
