import { listRevisions } from "@/db/queries/configurations";
import { UnauthenticatedError, toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface RevisionsRouteContext {
  params: Promise<{ configurationId: string }>;
}

/** GET /api/configurations/[configurationId]/revisions: every revision, newest first. */
export async function GET(_request: Request, context: RevisionsRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const items = await listRevisions(actor, configurationId);
    return Response.json({ items }, { headers: { "cache-control": "private, no-store" } });
  } catch (error) {
    return toErrorResponse(error);
  }
}
