import { undeleteConfiguration } from "@/db/queries/configurations";
import { UnauthenticatedError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface UndeleteRouteContext {
  params: Promise<{ configurationId: string }>;
}

/**
 * POST /api/configurations/[configurationId]/undelete: brings back a deleted configuration
 * (editors and owners of its group); 200 with the configuration. Deleting only hides a
 * configuration, so this restores it exactly as it was, revisions and results included.
 */
export async function POST(_request: Request, context: UndeleteRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    return Response.json(await undeleteConfiguration(actor, configurationId));
  } catch (error) {
    return toErrorResponse(error);
  }
}
