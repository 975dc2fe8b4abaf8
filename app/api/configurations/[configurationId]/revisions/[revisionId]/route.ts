import { getRevisionOfConfiguration } from "@/db/queries/revisions";
import { route } from "@/lib/server/route";

/** GET /api/configurations/[configurationId]/revisions/[revisionId]: the revision with its document (immutable). */
export const GET = route({ params: ["configurationId", "revisionId"] }, async ({ actor, params }) => {
  const revision = await getRevisionOfConfiguration(actor, params.configurationId, params.revisionId);
  return Response.json(revision, { headers: { "cache-control": "private, max-age=0, must-revalidate" } });
});
