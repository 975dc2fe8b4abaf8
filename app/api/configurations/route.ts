import { createConfiguration, listConfigurationsForGroup, listConfigurationsForUser } from "@/db/queries/configurations";
import { route } from "@/lib/server/route";
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
export const GET = route({ query: listConfigurationsQuerySchema }, async ({ actor, query }) => {
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
  return Response.json({ ...page, page: query.page, pageSize: query.pageSize });
});

/**
 * POST /api/configurations `{ groupId, document, message? }`: creates a configuration and its
 * first revision; the server computes and stores the result. 201 with the configuration.
 */
export const POST = route(
  { body: createConfigurationBodySchema, bodyLimitBytes: configurationBodyLimitBytes },
  async ({ actor, body }) => {
    const created = await createConfiguration(actor, body.groupId, body.document, body.message || "Created");
    return Response.json(created, {
      status: 201,
      headers: { location: `/api/configurations/${created.id}`, etag: `"${created.version}"` },
    });
  },
);
