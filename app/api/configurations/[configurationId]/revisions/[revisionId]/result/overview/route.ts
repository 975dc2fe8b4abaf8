import { getResultHead } from "@/db/queries/result-reads";
import { route } from "@/lib/server/route";

/**
 * GET /api/configurations/[configurationId]/revisions/[revisionId]/result/overview: what the results
 * page opens with: `{ revisionId, engineVersion, computeMs, createdAt, result, facts, massCurves,
 * showGeV, stacks, firstPage }`, i.e. the stored result without its sectors, the summary facts, the
 * lightest-state curves against the separation, and the first page of sector overviews (each
 * sector's lightest row and row count, without its level rows).
 */
export const GET = route({ params: ["configurationId", "revisionId"] }, async ({ actor, params }) =>
  Response.json(await getResultHead(actor, params.configurationId, params.revisionId), {
    headers: { "cache-control": "private, max-age=0, must-revalidate" },
  }),
);
