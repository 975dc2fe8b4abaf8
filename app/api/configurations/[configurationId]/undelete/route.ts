import { undeleteConfiguration } from "@/db/queries/configurations";
import { route } from "@/lib/server/route";

/**
 * POST /api/configurations/[configurationId]/undelete: brings back a deleted configuration
 * (editors and owners of its group); 200 with the configuration. Deleting only hides a
 * configuration, so this restores it as it was, revisions and results included; only its share
 * links, revoked by the delete, stay revoked.
 */
export const POST = route({ params: ["configurationId"] }, async ({ actor, params }) =>
  Response.json(await undeleteConfiguration(actor, params.configurationId)),
);
