import { getResultText } from "@/db/queries/result-reads";
import { route } from "@/lib/server/route";

/**
 * GET /api/configurations/[configurationId]/revisions/[revisionId]/result: the stored engine result
 * of that revision, `{ revisionId, engineVersion, computeMs, createdAt, result }`. The result's JSON
 * is sent as stored, without being parsed and re-serialised (older engine versions are upgraded).
 */
export const GET = route({ params: ["configurationId", "revisionId"] }, async ({ actor, params }) => {
  const text = await getResultText(actor, params.configurationId, params.revisionId);
  return new Response(text, {
    headers: { "content-type": "application/json", "cache-control": "private, max-age=0, must-revalidate" },
  });
});
