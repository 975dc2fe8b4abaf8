import { getResultForRevision } from "@/db/queries/configurations";
import { getRevisionOfConfiguration } from "@/lib/server/configuration-handlers";
import { UnauthenticatedError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface ResultRouteContext {
  params: Promise<{ configurationId: string; revisionId: string }>;
}

/** GET /api/configurations/[configurationId]/revisions/[revisionId]/result: the stored engine result of that revision. */
export async function GET(_request: Request, context: ResultRouteContext): Promise<Response> {
  try {
    const { configurationId, revisionId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    await getRevisionOfConfiguration(actor, configurationId, revisionId);
    const stored = await getResultForRevision(actor, revisionId);
    return Response.json(stored, { headers: { "cache-control": "private, max-age=0, must-revalidate" } });
  } catch (error) {
    return toErrorResponse(error);
  }
}
