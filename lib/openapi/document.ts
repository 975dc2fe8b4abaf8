import { OpenAPIRegistry, OpenApiGeneratorV31, zodToOpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ENGINE_VERSION } from "@/lib/boundary";
import { probeNearSevenBrane } from "@/lib/demo-configurations";
import { acceptsApiTokens } from "@/lib/validations/api-token";
import {
  configurationPageResponseSchema,
  configurationResponseSchema,
  conflictResponseSchema,
  errorResponseSchema,
  invalidJsonResponseSchema,
  payloadTooLargeResponseSchema,
  rateLimitedResponseSchema,
  revisionResponseSchema,
  revisionResultResponseSchema,
  revisionSummaryResponseSchema,
  spectrumPageResponseSchema,
  validationErrorResponseSchema,
} from "@/lib/validations/api-responses";
import { createCommentSchema } from "@/lib/validations/comment";
import { configurationSchema, spectrumQuerySchema, spectrumRequestSchema } from "@/lib/validations/configuration";
import {
  createConfigurationBodySchema,
  exportQuerySchema,
  forkConfigurationBodySchema,
  listConfigurationsQuerySchema,
  readConfigurationQuerySchema,
  sectorPageQuerySchema,
  updateConfigurationBodySchema,
} from "@/lib/validations/configuration-api";
import { storedSectorSchema } from "@/lib/validations/spectrum-result";
import { startSweepBodySchema, sweepExportQuerySchema } from "@/lib/validations/sweep";
import { auditQuerySchema, changeRoleSchema, createGroupSchema } from "@/lib/validations/group";
import { importFieldsSchema } from "@/lib/validations/import";
import { acceptInvitationSchema, createInvitationSchema } from "@/lib/validations/invitation";

/*
 * The OpenAPI 3.1 document of Mooring's JSON API, generated from the zod schemas the route handlers
 * parse with (lib/validations) by @asteasolutions/zod-to-openapi: request shapes are never written
 * twice. Served at GET /api/openapi.json and rendered at /docs/api. A route handler added under
 * app/api needs its entry in `operations` below; tests/integration/openapi.test.ts finds the route
 * files on disk and fails without it.
 */

/** Who may call an operation. */
type Access =
  /** A signed-in caller (session cookie, or an API token where the route accepts one). */
  | "signed-in"
  /** Anyone; a signed-in caller gets its own budget or account. */
  | "optional"
  /** Reads no caller at all. */
  | "public";

type Method = "get" | "post" | "put" | "patch" | "delete";

/** One operation of the API, as this module describes it before generation. */
interface Operation {
  method: Method;
  /** OpenAPI path, e.g. `/api/configurations/{configurationId}`. */
  path: string;
  tag: Tag;
  summary: string;
  description?: string;
  access: Access;
  /** Scope an API token needs, where the route accepts tokens (default: read for GET, write otherwise). */
  tokenScope?: "read" | "write";
  query?: z.ZodObject;
  headers?: z.ZodObject;
  body?: { schema: z.ZodType; example?: unknown; mediaType?: "application/json" | "multipart/form-data"; limitBytes?: number };
  success: { status: number; description: string; schema?: z.ZodType; mediaType?: string };
  /** Statuses besides the ones every operation of its kind may answer (401, 403, 404, 422, ...). */
  alsoAnswers?: number[];
}

const tags = {
  compute: { name: "Compute", description: "Stateless spectrum computation; open to everyone within a budget." },
  configurations: { name: "Configurations", description: "Saved configurations, their revisions and stored results." },
  collaboration: { name: "Collaboration", description: "Comments, attachments and read-only share links of a configuration." },
  sweeps: { name: "Sweeps", description: "Sweeps of a saved revision over boundary choices, positions, counts, orientations and compact radii, computed by workers from a queue." },
  groups: { name: "Groups", description: "Research groups and labs, members, invitations and the audit log." },
  service: { name: "Service", description: "Health check, this document, and the sign-in machinery the pages use." },
} as const;
type Tag = keyof typeof tags;

/** A made-up id for examples. */
const exampleId = "0f8fad5b-d9cb-469f-a165-70867728950e";

/** Example bodies; tests/integration/openapi.test.ts checks that the document's schemas accept them. */
export const requestExamples = {
  spectrum: probeNearSevenBrane,
  createConfiguration: { groupId: exampleId, document: probeNearSevenBrane, message: "First sketch" },
  updateConfiguration: {
    document: { ...probeNearSevenBrane, stacks: probeNearSevenBrane.stacks.map((stack) => (stack.id === "probe" ? { ...stack, position: { ...stack.position, "8": 3 } } : stack)) },
    message: "Probe moved out to 3 string lengths",
    expectedVersion: 1,
  },
  fork: { targetGroupId: exampleId, title: "D3 probe near a D7 (my variant)" },
  comment: { body: "The D3-D7 sector has four ND axes, so the NS zero-point energy vanishes." },
  createGroup: { name: "Brane engineering", kind: "research", description: "Intersecting stacks for model building." },
  changeRole: { role: "editor" },
  invitation: { email: "colleague@example.org", role: "viewer" },
  acceptInvitation: { token: "kV3mQ9b2Z1rT8nC5xW0yL7dF4hJ6sA2pE9gU1iO3qRk" },
  startSweep: {
    title: "Probe pulled away, both orientations",
    definition: {
      format: 1,
      dimensions: [
        { kind: "orientation", stack: "probe" },
        { kind: "position", stack: "probe", axis: 8, values: { kind: "range", from: 0, to: 4, steps: 9 } },
      ],
    },
  },
} as const;

const uuid = (what: string) => z.uuid().describe(`Id of the ${what}.`);
const configurationParams = z.object({ configurationId: uuid("configuration") });
const revisionParams = configurationParams.extend({ revisionId: uuid("revision") });
const ifMatchHeader = z.object({ "if-match": z.string().optional().describe('The version you edited, e.g. "3" (or send expectedVersion).') });
const multipartFile = z.string().meta({ format: "binary" });
const listOf = (description: string) => ({ status: 200, description });

/** Every route handler under app/api, every method. */
const operations: Operation[] = [
  {
    method: "post",
    path: "/api/spectrum",
    tag: "compute",
    summary: "Compute a spectrum",
    description:
      "Computes the open-string spectrum of a configuration document (file format 1, or 2 with compact axes, Wilson lines and orientifold planes) without saving anything. Large results are paged by sectors: sectors from `sectorOffset` carry their level rows and mode expansions until `maxRows` rows; the others are marked `detailOmitted: true`, and `page.nextSectorOffset` names the next page. The compute budget (per address, account or API token) is weighted by the configuration's size.",
    access: "optional",
    tokenScope: "read",
    query: spectrumQuerySchema,
    body: { schema: spectrumRequestSchema, example: requestExamples.spectrum, limitBytes: 64 * 1024 },
    success: { status: 200, description: "The spectrum, its sectors paged.", schema: spectrumPageResponseSchema },
    alsoAnswers: [429, 503],
  },
  {
    method: "get",
    path: "/api/configurations",
    tag: "configurations",
    summary: "List configurations",
    description: "A page of the configurations the caller can see (or of one group's, with `groupId`), sortable and filterable.",
    access: "signed-in",
    query: listConfigurationsQuerySchema,
    success: { status: 200, description: "A page of configurations.", schema: configurationPageResponseSchema },
  },
  {
    method: "post",
    path: "/api/configurations",
    tag: "configurations",
    summary: "Create a configuration",
    description: "Creates a configuration and its first revision in a group where the caller is an editor or owner; the server computes and stores the result.",
    access: "signed-in",
    body: { schema: createConfigurationBodySchema, example: requestExamples.createConfiguration, limitBytes: 256 * 1024 },
    success: { status: 201, description: "The new configuration (Location and ETag headers).", schema: configurationResponseSchema },
  },
  {
    method: "post",
    path: "/api/configurations/import",
    tag: "configurations",
    summary: "Import a configuration file",
    description: "Creates a configuration from an uploaded configuration file (multipart field `file`), in `groupId` or the personal space. Nothing is saved from an invalid file; every problem is listed with its JSON path.",
    access: "signed-in",
    body: { schema: importFieldsSchema.extend({ file: multipartFile.describe("The configuration file (JSON, at most 256 KiB).") }), mediaType: "multipart/form-data", limitBytes: 256 * 1024 },
    success: { status: 201, description: "The new configuration.", schema: configurationResponseSchema },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}",
    tag: "configurations",
    summary: "Read a configuration",
    description:
      "The configuration with its current document. The ETag header is its version. With `include=result` it also carries `result`: the current revision's stored result `{ revisionId, engineVersion, computeMs, createdAt, result }` (null before the first save), sent as stored.",
    access: "signed-in",
    query: readConfigurationQuerySchema,
    success: { status: 200, description: "The configuration.", schema: configurationResponseSchema },
  },
  {
    method: "put",
    path: "/api/configurations/{configurationId}",
    tag: "configurations",
    summary: "Save a new revision",
    description: "Saves the document as a new revision, with a result the server computes. Name the version you edited in If-Match or `expectedVersion`: when someone saved in between the answer is 409 and nothing is written.",
    access: "signed-in",
    headers: ifMatchHeader,
    body: { schema: updateConfigurationBodySchema, example: requestExamples.updateConfiguration, limitBytes: 256 * 1024 },
    success: { status: 200, description: "The configuration at its new version.", schema: configurationResponseSchema },
    alsoAnswers: [409],
  },
  {
    method: "delete",
    path: "/api/configurations/{configurationId}",
    tag: "configurations",
    summary: "Delete a configuration",
    description: "Hides the configuration (editors and owners); it can be brought back with undelete.",
    access: "signed-in",
    success: { status: 204, description: "Deleted." },
  },
  {
    method: "post",
    path: "/api/configurations/{configurationId}/undelete",
    tag: "configurations",
    summary: "Bring back a deleted configuration",
    access: "signed-in",
    success: { status: 200, description: "The configuration, as it was.", schema: configurationResponseSchema },
  },
  {
    method: "post",
    path: "/api/configurations/{configurationId}/fork",
    tag: "configurations",
    summary: "Fork a configuration",
    description: "Copies a revision (the current one by default), or an unsaved `document`, into a group where the caller may write, recording where it came from.",
    access: "signed-in",
    body: { schema: forkConfigurationBodySchema, example: requestExamples.fork, limitBytes: 256 * 1024 },
    success: { status: 201, description: "The new configuration.", schema: configurationResponseSchema },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/revisions",
    tag: "configurations",
    summary: "List revisions",
    description: "Every revision of the configuration, newest first.",
    access: "signed-in",
    success: { status: 200, description: "`{ items }`, the revisions.", schema: z.object({ items: z.array(revisionSummaryResponseSchema) }) },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/revisions/{revisionId}",
    tag: "configurations",
    summary: "Read a revision",
    access: "signed-in",
    success: { status: 200, description: "The revision with its document.", schema: revisionResponseSchema },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/revisions/{revisionId}/result",
    tag: "configurations",
    summary: "Read a revision's stored result",
    description: "The spectrum the server computed when the revision was saved.",
    access: "signed-in",
    success: { status: 200, description: "The stored result.", schema: revisionResultResponseSchema },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/revisions/{revisionId}/result/overview",
    tag: "configurations",
    summary: "Read the head of a stored result",
    description:
      "What the results page opens with: `{ revisionId, engineVersion, computeMs, createdAt, result, facts, massCurves, showGeV, stacks, firstPage }`: the result without its sectors, the summary facts (with the headline of the lightest states), the revision's stacks (id and label, for naming sectors), the lightest-state curves against the separation (one per exact N + a), and the first 100 sector overviews (each sector without its level rows, with its lightest row and row count).",
    access: "signed-in",
    success: { status: 200, description: "The head of the result." },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/revisions/{revisionId}/result/sectors",
    tag: "configurations",
    summary: "Page the sector overviews of a stored result",
    description:
      "`{ items, total, offset }`: sector overviews in result order, filtered by a stack id or label (`search`) and by `tachyonic=true`.",
    access: "signed-in",
    query: sectorPageQuerySchema,
    success: { status: 200, description: "A page of sector overviews." },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/revisions/{revisionId}/result/sectors/{sectorIndex}",
    tag: "configurations",
    summary: "Read one sector of a stored result",
    description: "The sector at `sectorIndex` (its position in the result, the overview's `index`) with its level rows, mode expansions, massless content and notes.",
    access: "signed-in",
    success: { status: 200, description: "The sector.", schema: storedSectorSchema },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/export",
    tag: "configurations",
    summary: "Export a configuration",
    description: "The configuration file (json, re-importable) or its stored spectrum as a CSV or LaTeX table, of the current revision unless `revision` names another. Downloads as an attachment.",
    access: "signed-in",
    query: exportQuerySchema,
    success: { status: 200, description: "The file.", mediaType: "application/octet-stream" },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/comments",
    tag: "collaboration",
    summary: "List comments",
    access: "signed-in",
    success: listOf("Comments, oldest first, each with its revision."),
  },
  {
    method: "post",
    path: "/api/configurations/{configurationId}/comments",
    tag: "collaboration",
    summary: "Add a comment",
    description: "Any member may comment, viewers included. Without `revisionId` the comment is tied to the current revision.",
    access: "signed-in",
    body: { schema: createCommentSchema, example: requestExamples.comment, limitBytes: 32 * 1024 },
    success: { status: 201, description: "The comment." },
  },
  {
    method: "delete",
    path: "/api/comments/{commentId}",
    tag: "collaboration",
    summary: "Delete a comment",
    description: "The author or a group owner.",
    access: "signed-in",
    success: { status: 204, description: "Deleted." },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/attachments",
    tag: "collaboration",
    summary: "List attachments",
    access: "signed-in",
    success: listOf("The attachments' metadata."),
  },
  {
    method: "post",
    path: "/api/configurations/{configurationId}/attachments",
    tag: "collaboration",
    summary: "Attach a figure or note",
    description: "A PNG, JPEG or PDF (multipart field `file`); editors and owners.",
    access: "signed-in",
    body: { schema: z.object({ file: multipartFile.describe("PNG, JPEG or PDF, at most 5 MiB.") }), mediaType: "multipart/form-data", limitBytes: 5 * 1024 * 1024 },
    success: { status: 201, description: "The attachment's metadata." },
  },
  {
    method: "get",
    path: "/api/attachments/{attachmentId}",
    tag: "collaboration",
    summary: "Download an attachment",
    access: "signed-in",
    success: { status: 200, description: "The file.", mediaType: "application/octet-stream" },
  },
  {
    method: "delete",
    path: "/api/attachments/{attachmentId}",
    tag: "collaboration",
    summary: "Delete an attachment",
    access: "signed-in",
    success: { status: 204, description: "Deleted." },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/share-links",
    tag: "collaboration",
    summary: "List share links",
    description: "The configuration's read-only links and their state, never their tokens (editors and owners).",
    access: "signed-in",
    success: listOf("The links."),
  },
  {
    method: "post",
    path: "/api/configurations/{configurationId}/share-links",
    tag: "collaboration",
    summary: "Create a share link",
    description: "A new read-only link; its URL is in this answer only.",
    access: "signed-in",
    success: { status: 201, description: "`{ link, url }`." },
  },
  {
    method: "delete",
    path: "/api/share-links/{shareLinkId}",
    tag: "collaboration",
    summary: "Revoke a share link",
    access: "signed-in",
    success: { status: 200, description: "The link, revoked." },
  },
  {
    method: "get",
    path: "/api/configurations/{configurationId}/sweeps",
    tag: "sweeps",
    summary: "List sweeps",
    description: "The configuration's sweeps, newest first, with their progress, and the sweeps its lab starter suggests. Any member.",
    access: "signed-in",
    success: listOf("`{ items, suggested }`."),
  },
  {
    method: "post",
    path: "/api/configurations/{configurationId}/sweeps",
    tag: "sweeps",
    summary: "Start a sweep",
    description:
      "Starts a sweep of the current revision (editors and owners): every combination of the dimensions' values is one point, at most 200,000 points. A definition that does not fit the configuration, or is over the point limit, is a 422 with the problems at their paths; past the account's running points the answer is 429. Workers compute the points; follow the progress at GET /api/sweeps/{sweepId}.",
    access: "signed-in",
    body: { schema: startSweepBodySchema, example: requestExamples.startSweep, limitBytes: 64 * 1024 },
    success: { status: 201, description: "The sweep (Location header)." },
  },
  {
    method: "get",
    path: "/api/sweeps/{sweepId}",
    tag: "sweeps",
    summary: "Read a sweep",
    description: "The sweep, its progress (points done of the total, status) and the document it varies. Members of its configuration.",
    access: "signed-in",
    success: { status: 200, description: "The sweep." },
  },
  {
    method: "get",
    path: "/api/sweeps/{sweepId}/points",
    tag: "sweeps",
    summary: "List a sweep's points",
    description:
      "Every stored point, column by column (`index`, `ok`, `supercharges`, `tachyonicSectors`, `lightestMassSquared` in units of 1/alpha', `masslessStates`, `gaugeGroup`, `problem`), compact enough for 200,000 points.",
    access: "signed-in",
    success: { status: 200, description: "The points' columns." },
  },
  {
    method: "get",
    path: "/api/sweeps/{sweepId}/export",
    tag: "sweeps",
    summary: "Export a sweep",
    description: "The stored points with their dimension values, the conventions (alpha' = 1) and a caution, as CSV or JSON. Downloads as an attachment.",
    access: "signed-in",
    query: sweepExportQuerySchema,
    success: { status: 200, description: "The file.", mediaType: "application/octet-stream" },
  },
  {
    method: "post",
    path: "/api/sweeps/{sweepId}/cancel",
    tag: "sweeps",
    summary: "Cancel a sweep",
    description: "Stops a running sweep (editors and owners); the points stored so far stay. A no-op for a sweep that is not running.",
    access: "signed-in",
    success: { status: 200, description: "The sweep." },
  },
  {
    method: "post",
    path: "/api/sweeps/{sweepId}/resume",
    tag: "sweeps",
    summary: "Resume a sweep",
    description: "Puts the points not yet stored of a cancelled or failed sweep back on the queue (editors and owners); a no-op for a running or completed one. 429 past the account's running points.",
    access: "signed-in",
    success: { status: 200, description: "The sweep." },
    alsoAnswers: [429],
  },
  {
    method: "get",
    path: "/api/groups",
    tag: "groups",
    summary: "List my groups",
    description: "The caller's groups, personal space first.",
    access: "signed-in",
    success: listOf("The groups."),
  },
  {
    method: "post",
    path: "/api/groups",
    tag: "groups",
    summary: "Create a group",
    access: "signed-in",
    body: { schema: createGroupSchema, example: requestExamples.createGroup, limitBytes: 16 * 1024 },
    success: { status: 201, description: "The group, owned by the caller." },
  },
  {
    method: "get",
    path: "/api/groups/{groupId}/members",
    tag: "groups",
    summary: "List members",
    access: "signed-in",
    success: listOf("The members and their roles."),
  },
  {
    method: "patch",
    path: "/api/groups/{groupId}/members/{userId}",
    tag: "groups",
    summary: "Change a member's role",
    description: "Owners only; the last owner stays an owner.",
    access: "signed-in",
    body: { schema: changeRoleSchema, example: requestExamples.changeRole, limitBytes: 4 * 1024 },
    success: { status: 200, description: "The membership." },
  },
  {
    method: "delete",
    path: "/api/groups/{groupId}/members/{userId}",
    tag: "groups",
    summary: "Remove a member",
    description: "Owners remove anyone; every member may remove themselves (leave).",
    access: "signed-in",
    success: { status: 204, description: "Removed." },
  },
  {
    method: "get",
    path: "/api/groups/{groupId}/invitations",
    tag: "groups",
    summary: "List invitations",
    access: "signed-in",
    success: listOf("Every invitation of the group with its status (owners only)."),
  },
  {
    method: "post",
    path: "/api/groups/{groupId}/invitations",
    tag: "groups",
    summary: "Invite by e-mail",
    description: "Owners only. When the mail server refused the message the invitation is kept and `mailSent` is false.",
    access: "signed-in",
    body: { schema: createInvitationSchema, example: requestExamples.invitation, limitBytes: 4 * 1024 },
    success: { status: 201, description: "`{ invitation, mailSent }`." },
  },
  {
    method: "delete",
    path: "/api/invitations/{invitationId}",
    tag: "groups",
    summary: "Revoke an invitation",
    access: "signed-in",
    success: { status: 200, description: "The invitation, revoked." },
  },
  {
    method: "post",
    path: "/api/invitations/{invitationId}/resend",
    tag: "groups",
    summary: "Resend an invitation",
    description: "A new link with a fresh expiry, mailed again (owners only).",
    access: "signed-in",
    success: { status: 200, description: "The invitation." },
  },
  {
    method: "post",
    path: "/api/invitations/accept",
    tag: "groups",
    summary: "Accept an invitation",
    description: "Signed in: the token alone. Without an account: the token, a name and a password, and the account is created for the invited address (201). Expired, revoked and used links answer 409.",
    access: "optional",
    body: { schema: acceptInvitationSchema, example: requestExamples.acceptInvitation, limitBytes: 4 * 1024 },
    success: { status: 200, description: "`{ groupSlug, role }`." },
    alsoAnswers: [201, 409],
  },
  {
    method: "get",
    path: "/api/groups/{groupId}/audit",
    tag: "groups",
    summary: "Read the audit log",
    description: "The group's writes, newest first (owners only).",
    access: "signed-in",
    query: auditQuerySchema,
    success: listOf("Audit entries."),
  },
  {
    method: "get",
    path: "/api/health",
    tag: "service",
    summary: "Health check",
    description: "200 when the app and its database answer, 503 when PostgreSQL does not. Never cached.",
    access: "public",
    success: { status: 200, description: "`{ ok: true, database: { ok: true, latencyMs } }`." },
    alsoAnswers: [503],
  },
  {
    method: "get",
    path: "/api/openapi.json",
    tag: "service",
    summary: "This document",
    access: "public",
    success: { status: 200, description: "The OpenAPI 3.1 document." },
  },
  ...(["get", "post"] as const).map(
    (method): Operation => ({
      method,
      path: "/api/auth/{nextauth}",
      tag: "service",
      summary: method === "get" ? "Sign-in machinery (session, CSRF token)" : "Sign-in machinery (sign in, sign out)",
      description: "next-auth's own endpoints, used by the sign-in pages with their own CSRF token; not meant for scripts, which use API tokens.",
      access: "public",
      success: { status: 200, description: "next-auth's answer." },
    }),
  ),
];

// Named shapes become components and are referenced wherever they are used. The names go into the
// library's own registry, keyed by the very schema instances the route handlers use (so
// lib/validations stays free of OpenAPI metadata, and every use of a schema gets the reference).
const components: Array<[z.ZodType, string, string]> = [
  [configurationSchema, "ConfigurationDocument", "A configuration document, file format 1 or 2 (format 2 adds compact axes, Wilson lines and orientifold planes; also the body of POST /api/spectrum)."],
  [spectrumPageResponseSchema, "SpectrumPage", "A computed spectrum with its sectors paged."],
  [configurationResponseSchema, "Configuration", "A saved configuration with its current document."],
  [revisionSummaryResponseSchema, "RevisionSummary", "One row of a configuration's history."],
  [revisionResponseSchema, "Revision", "A revision with its document."],
  [revisionResultResponseSchema, "RevisionResult", "The stored result of a revision."],
  [errorResponseSchema, "Error", "Every error answer."],
  [validationErrorResponseSchema, "ValidationError", "422: every problem with the input at its path."],
  [invalidJsonResponseSchema, "InvalidJson", "400: the body is not well-formed JSON."],
  [conflictResponseSchema, "Conflict", "409: someone saved a newer version; nothing was written."],
  [payloadTooLargeResponseSchema, "PayloadTooLarge", "413: the body is too large."],
  [rateLimitedResponseSchema, "RateLimited", "429: a rate limit or budget is used up; see Retry-After."],
];

const statusDescriptions: Record<number, [string, z.ZodType]> = {
  400: ["The body is not well-formed JSON.", invalidJsonResponseSchema],
  401: ["Not signed in, or the API token is unknown, expired or revoked.", errorResponseSchema],
  403: ["Not allowed: a viewer writing, a read-only token on a route that writes, or a token on a route that takes none.", errorResponseSchema],
  404: ["No such thing, or the caller may not know it exists.", errorResponseSchema],
  409: ["A conflict: a newer version was saved, or the link was already used.", conflictResponseSchema],
  413: ["The body is larger than the route accepts.", payloadTooLargeResponseSchema],
  422: ["The input is not valid; every problem is listed with its path.", validationErrorResponseSchema],
  429: ["A rate limit or budget is used up; wait for Retry-After seconds.", rateLimitedResponseSchema],
  503: ["The database (or every compute thread) is busy or down; nothing was saved.", errorResponseSchema],
};

let cached: ReturnType<OpenApiGeneratorV31["generateDocument"]> | undefined;

/**
 * The OpenAPI 3.1 document, built once per process.
 *
 * @example
 * getOpenApiDocument().paths["/api/spectrum"].post.requestBody
 */
export function getOpenApiDocument(): ReturnType<OpenApiGeneratorV31["generateDocument"]> {
  cached ??= buildDocument();
  return cached;
}

function buildDocument(): ReturnType<OpenApiGeneratorV31["generateDocument"]> {
  for (const [schema, refId, description] of components) zodToOpenAPIRegistry.add(schema, { _internal: { refId }, description });
  const registry = new OpenAPIRegistry();
  registry.registerComponent("securitySchemes", "sessionCookie", {
    type: "apiKey",
    in: "cookie",
    name: "next-auth.session-token",
    description: "The browser's session after signing in on the site.",
  });
  registry.registerComponent("securitySchemes", "apiToken", {
    type: "http",
    scheme: "bearer",
    description:
      "A personal API token from the account page, sent as `Authorization: Bearer <token>`. Accepted by the configuration routes and POST /api/spectrum; a read-only token is refused (403) by every route that writes. Each token has a request budget of its own.",
  });
  for (const operation of operations) registry.registerPath(toRouteConfig(operation));
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: {
      title: "Mooring API",
      version: ENGINE_VERSION,
      description:
        "JSON API of Mooring, a workbench for parallel D-brane configurations. Results follow alpha' = 1: lengths in sqrt(alpha'), masses as alpha' M^2 and M sqrt(alpha'); exact rationals are strings. Check results before you publish them.",
    },
    tags: Object.values(tags),
  });
}

function toRouteConfig(operation: Operation): Parameters<OpenAPIRegistry["registerPath"]>[0] {
  const pathParams = [...operation.path.matchAll(/\{(\w+)\}/g)].map((match) => match[1] ?? "");
  const params =
    operation.path.startsWith("/api/configurations/{configurationId}/revisions/{revisionId}")
      ? revisionParams
      : operation.path.startsWith("/api/configurations/{configurationId}")
        ? configurationParams
        : pathParams.length > 0
          ? z.object(Object.fromEntries(pathParams.map((name) => [name, name === "nextauth" ? z.string() : uuid(name.replace(/Id$/, ""))])))
          : undefined;
  const tokens = operation.access !== "public" && acceptsApiTokens(operation.path.replace(/\{\w+\}/g, "x"));
  const scope = operation.tokenScope ?? (operation.method === "get" ? "read" : "write");
  const anonymous: Record<string, string[]> = {};
  const security = [
    ...(operation.access === "optional" ? [anonymous] : []),
    ...(operation.access === "public" ? [] : [{ sessionCookie: [] }]),
    ...(tokens ? [{ apiToken: [] }] : []),
  ];
  const mediaType = operation.body?.mediaType ?? "application/json";
  return {
    method: operation.method,
    path: operation.path,
    tags: [tags[operation.tag].name],
    summary: operation.summary,
    description: operation.description,
    security,
    "x-token-scope": tokens ? scope : undefined,
    request: {
      params,
      query: operation.query,
      headers: operation.headers,
      body: operation.body
        ? { required: true, content: { [mediaType]: { schema: operation.body.schema, example: operation.body.example } } }
        : undefined,
    },
    responses: responsesOf(operation, params !== undefined),
  };
}

function responsesOf(operation: Operation, hasParams: boolean) {
  const statuses = new Set<number>(operation.alsoAnswers ?? []);
  if (operation.access !== "public") {
    if (operation.access === "signed-in") statuses.add(401);
    statuses.add(403);
    if (hasParams) statuses.add(404);
  }
  if (operation.body || operation.query || hasParams) statuses.add(422);
  if (operation.body?.mediaType !== "multipart/form-data" && operation.body) statuses.add(400);
  if (operation.body) statuses.add(413);
  if (operation.access !== "public" && acceptsApiTokens(operation.path.replace(/\{\w+\}/g, "x"))) statuses.add(429);
  const { success } = operation;
  const responses: Record<string, { description: string; content?: Record<string, { schema: z.ZodType }> }> = {
    [success.status]: {
      description: success.description,
      content: success.schema ? { [success.mediaType ?? "application/json"]: { schema: success.schema } } : undefined,
    },
  };
  for (const status of [...statuses].sort((a, b) => a - b)) {
    if (status === success.status) continue;
    const known = statusDescriptions[status];
    responses[status] = known
      ? { description: known[0], content: { "application/json": { schema: known[1] } } }
      : { description: status === 201 ? "Created." : "See the description." };
  }
  return responses;
}
