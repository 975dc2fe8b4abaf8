import { getResultSectorPage } from "@/db/queries/result-reads";
import { route } from "@/lib/server/route";
import { sectorPageQuerySchema } from "@/lib/validations/configuration-api";

/**
 * GET /api/configurations/[configurationId]/revisions/[revisionId]/result/sectors?offset=&limit=&search=&tachyonic=:
 * one page `{ items, total, offset }` of the stored result's sector overviews (without level rows),
 * in result order, filtered by a stack id or label (`search`) and by `tachyonic=true`.
 */
export const GET = route({ params: ["configurationId", "revisionId"], query: sectorPageQuerySchema }, async ({ actor, params, query }) =>
  Response.json(
    await getResultSectorPage(actor, params.configurationId, params.revisionId, {
      offset: query.offset,
      limit: query.limit,
      search: query.search,
      tachyonicOnly: query.tachyonic ?? false,
    }),
    { headers: { "cache-control": "private, max-age=0, must-revalidate" } },
  ),
);
