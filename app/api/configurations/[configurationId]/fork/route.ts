import { forkConfiguration } from "@/db/queries/forks";
import { route } from "@/lib/server/route";
import { configurationBodyLimitBytes, forkConfigurationBodySchema } from "@/lib/validations/configuration-api";

/**
 * POST /api/configurations/[configurationId]/fork `{ targetGroupId, revisionId?, title?, document? }`:
 * copies a revision (the current one by default) into a group where the user may write, recording
 * its source configuration and revision; with `document` (an unsaved draft) the fork starts from that
 * document instead, in the same request. 201 with the new configuration.
 */
export const POST = route(
  { params: ["configurationId"], body: forkConfigurationBodySchema, bodyLimitBytes: configurationBodyLimitBytes },
  async ({ actor, params, body }) => {
    const fork = await forkConfiguration(actor, params.configurationId, body);
    return Response.json(fork, { status: 201, headers: { location: `/api/configurations/${fork.id}` } });
  },
);
