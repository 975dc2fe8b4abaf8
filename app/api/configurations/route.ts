import {
  createConfiguration,
  listConfigurationsForGroup,
  listConfigurationsForUser,
} from "@/db/queries/configurations";
import { computeAuthoritativeResult, readJsonBody } from "@/lib/server/configuration-handlers";
import { UnauthenticatedError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import {
  configurationBodyLimitBytes,
  createConfigurationBodySchema,
  listConfigurationsQuerySchema,
} from "@/lib/validations/configuration-api";

/**
 * GET /api/configurations: a page of the configurations the user can see, or of one group's
 * (`groupId`), with `search`, `theory`, `starter`, `sort`, `direction`, `page`, `pageSize`.
 * Returns `{ items, total, page, pageSize }`.
 */
export async function GET(request: Request): Promise<Response> {
  try {
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const url = new URL(request.url);
    const query = listConfigurationsQuerySchema.parse(Object.fromEntries(url.searchParams));
    const options = {
      search: query.search || undefined,
      theory: query.theory,
      starter: query.starter,
      sort: query.sort,
      direction: query.direction,
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    };
    const page = query.groupId
      ? await listConfigurationsForGroup(actor, query.groupId, options)
      : await listConfigurationsForUser(actor, { ...options, scope: query.scope });
    return Response.json(
      { ...page, page: query.page, pageSize: query.pageSize },
      { headers: { "cache-control": "private, no-store" } },
    );
  } catch (error) {
    return toErrorResponse(error);
  }
}

/**
 * POST /api/configurations `{ groupId, document, message? }`: creates a configuration and its
 * first revision; the server computes and stores the result. 201 with the configuration.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const body = createConfigurationBodySchema.parse(await readJsonBody(request, configurationBodyLimitBytes));
    const { result, computeMs } = computeAuthoritativeResult(body.document);
    const created = await createConfiguration(actor, body.groupId, body.document, body.message || "Created", result, computeMs);
    return Response.json(created, {
      status: 201,
      headers: { location: `/api/configurations/${created.id}`, etag: `"${created.version}"` },
    });
  } catch (error) {
    return toErrorResponse(error);
  }
}
