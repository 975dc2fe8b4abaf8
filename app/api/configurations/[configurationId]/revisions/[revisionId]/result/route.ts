import { getResultForRevision, getRevisionOfConfiguration } from "@/db/queries/revisions";
import { route } from "@/lib/server/route";

/** GET /api/configurations/[configurationId]/revisions/[revisionId]/result: the stored engine result of that revision. */
export const GET = route({ params: ["configurationId", "revisionId"] }, async ({ actor, params }) => {
  await getRevisionOfConfiguration(actor, params.configurationId, params.revisionId);
  const stored = await getResultForRevision(actor, params.revisionId);
  return Response.json(stored, { headers: { "cache-control": "private, max-age=0, must-revalidate" } });
});
