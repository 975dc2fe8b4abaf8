import { forkConfiguration } from "@/db/queries/configurations";
import { readJsonBody } from "@/lib/server/configuration-handlers";
import { UnauthenticatedError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { configurationBodyLimitBytes, forkConfigurationBodySchema } from "@/lib/validations/configuration-api";

interface ForkRouteContext {
  params: Promise<{ configurationId: string }>;
}

/**
 * POST /api/configurations/[configurationId]/fork `{ targetGroupId, revisionId?, title? }`: copies
 * a revision (the current one by default) into a group where the user may write, recording its
 * source configuration and revision. 201 with the new configuration.
 */
export async function POST(request: Request, context: ForkRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const body = forkConfigurationBodySchema.parse(await readJsonBody(request, configurationBodyLimitBytes));
    const fork = await forkConfiguration(actor, configurationId, body);
    return Response.json(fork, { status: 201, headers: { location: `/api/configurations/${fork.id}` } });
  } catch (error) {
    return toErrorResponse(error);
  }
}
