import { getConfiguration, softDeleteConfiguration, updateConfiguration } from "@/db/queries/configurations";
import { getConfigurationWithResultText } from "@/db/queries/result-reads";
import { ValidationError } from "@/lib/errors";
import { route } from "@/lib/server/route";
import {
  configurationBodyLimitBytes,
  parseIfMatch,
  readConfigurationQuerySchema,
  updateConfigurationBodySchema,
} from "@/lib/validations/configuration-api";

/**
 * GET /api/configurations/[configurationId][?include=result]: the configuration with its current
 * document; ETag is the version. With `include=result` it also carries `result`, the current
 * revision's stored result `{ revisionId, engineVersion, computeMs, createdAt, result }` (null before
 * the first save), sent as stored.
 */
export const GET = route({ params: ["configurationId"], query: readConfigurationQuerySchema }, async ({ actor, params, query }) => {
  if (query.include === "result") {
    const { text, version } = await getConfigurationWithResultText(actor, params.configurationId);
    return new Response(text, { headers: { "content-type": "application/json", etag: `"${version}"` } });
  }
  const configuration = await getConfiguration(actor, params.configurationId);
  return Response.json(configuration, { headers: { etag: `"${configuration.version}"` } });
});

/**
 * PUT /api/configurations/[configurationId] `{ document, message?, expectedVersion? }` with the
 * version in `If-Match` or `expectedVersion`: saves a new revision with a server-computed result.
 * 409 `{ error, currentVersion }` when someone saved in between; nothing is written then.
 */
export const PUT = route(
  { params: ["configurationId"], body: updateConfigurationBodySchema, bodyLimitBytes: configurationBodyLimitBytes },
  async ({ request, actor, params, body }) => {
    const fromHeader = parseIfMatch(request.headers.get("if-match"));
    if (fromHeader !== null && Number.isNaN(fromHeader)) {
      throw ValidationError.at(["If-Match"], "If-Match must name the version you edited, e.g. \"3\".");
    }
    const expectedVersion = fromHeader ?? body.expectedVersion;
    if (expectedVersion === undefined) {
      throw ValidationError.at(["expectedVersion"], "Say which version you edited (If-Match header or expectedVersion).");
    }
    const updated = await updateConfiguration(actor, params.configurationId, {
      expectedVersion,
      document: body.document,
      message: body.message,
    });
    return Response.json(updated, { headers: { etag: `"${updated.version}"` } });
  },
);

/** DELETE /api/configurations/[configurationId]: soft delete (editors and owners); 204. */
export const DELETE = route({ params: ["configurationId"] }, async ({ actor, params }) => {
  await softDeleteConfiguration(actor, params.configurationId);
  return new Response(null, { status: 204 });
});
