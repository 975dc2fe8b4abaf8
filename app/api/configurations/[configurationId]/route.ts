import { getConfiguration, softDeleteConfiguration, updateConfiguration } from "@/db/queries/configurations";
import { computeAuthoritativeResult, readJsonBody } from "@/lib/server/configuration-handlers";
import { UnauthenticatedError, ValidationError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import {
  configurationBodyLimitBytes,
  parseIfMatch,
  updateConfigurationBodySchema,
} from "@/lib/validations/configuration-api";

interface ConfigurationRouteContext {
  params: Promise<{ configurationId: string }>;
}

/** GET /api/configurations/[configurationId]: the configuration with its current document; ETag is the version. */
export async function GET(_request: Request, context: ConfigurationRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const configuration = await getConfiguration(actor, configurationId);
    return Response.json(configuration, {
      headers: { etag: `"${configuration.version}"`, "cache-control": "private, no-store" },
    });
  } catch (error) {
    return toErrorResponse(error);
  }
}

/**
 * PUT /api/configurations/[configurationId] `{ document, message?, expectedVersion? }` with the
 * version in `If-Match` or `expectedVersion`: saves a new revision with a server-computed result.
 * 409 `{ error, currentVersion }` when someone saved in between; nothing is written then.
 */
export async function PUT(request: Request, context: ConfigurationRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const body = updateConfigurationBodySchema.parse(await readJsonBody(request, configurationBodyLimitBytes));
    const fromHeader = parseIfMatch(request.headers.get("if-match"));
    if (fromHeader !== null && Number.isNaN(fromHeader)) {
      throw ValidationError.at(["If-Match"], "If-Match must name the version you edited, e.g. \"3\".");
    }
    const expectedVersion = fromHeader ?? body.expectedVersion;
    if (expectedVersion === undefined) {
      throw ValidationError.at(["expectedVersion"], "Say which version you edited (If-Match header or expectedVersion).");
    }
    const { result, computeMs } = computeAuthoritativeResult(body.document);
    const updated = await updateConfiguration(actor, configurationId, {
      expectedVersion,
      document: body.document,
      message: body.message,
      result,
      computeMs,
    });
    return Response.json(updated, { headers: { etag: `"${updated.version}"` } });
  } catch (error) {
    return toErrorResponse(error);
  }
}

/** DELETE /api/configurations/[configurationId]: soft delete (editors and owners); 204. */
export async function DELETE(_request: Request, context: ConfigurationRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    await softDeleteConfiguration(actor, configurationId);
    return new Response(null, { status: 204 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
