import { getRevisionOfConfiguration } from "@/lib/server/configuration-handlers";
import { UnauthenticatedError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface RevisionRouteContext {
  params: Promise<{ configurationId: string; revisionId: string }>;
}

/** GET /api/configurations/[configurationId]/revisions/[revisionId]: the revision with its document (immutable). */
export async function GET(_request: Request, context: RevisionRouteContext): Promise<Response> {
  try {
    const { configurationId, revisionId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const revision = await getRevisionOfConfiguration(actor, configurationId, revisionId);
    return Response.json(revision, { headers: { "cache-control": "private, max-age=0, must-revalidate" } });
  } catch (error) {
    return toErrorResponse(error);
  }
}
