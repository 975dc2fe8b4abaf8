import { z } from "zod";
import { getResultSectorPage } from "@/db/queries/result-reads";
import { route } from "@/lib/server/route";

const sectorPageQuerySchema = z.object({
  offset: z.coerce.number({ error: "offset must be a whole number." }).int().min(0).max(1_000_000).default(0),
  limit: z.coerce.number({ error: "limit must be a whole number." }).int().min(1).max(500).default(100),
  search: z.string().trim().max(120).optional(),
  tachyonic: z.enum(["true", "false"]).transform((value) => value === "true").optional(),
});

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
