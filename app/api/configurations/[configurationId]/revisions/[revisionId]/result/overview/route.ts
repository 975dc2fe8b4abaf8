import { getResultOverview } from "@/db/queries/result-reads";
import { route } from "@/lib/server/route";

/**
 * GET /api/configurations/[configurationId]/revisions/[revisionId]/result/overview: the stored
 * result without per-sector detail (level rows, expansions, massless content, notes), with each
 * sector's lightest row and row count: what the results page opens with.
 */
export const GET = route({ params: ["configurationId", "revisionId"] }, async ({ actor, params }) =>
  Response.json(await getResultOverview(actor, params.configurationId, params.revisionId), {
    headers: { "cache-control": "private, max-age=0, must-revalidate" },
  }),
);
