import { listRevisions } from "@/db/queries/revisions";
import { route } from "@/lib/server/route";

/** GET /api/configurations/[configurationId]/revisions: every revision, newest first. */
export const GET = route({ params: ["configurationId"] }, async ({ actor, params }) =>
  Response.json({ items: await listRevisions(actor, params.configurationId) }),
);
