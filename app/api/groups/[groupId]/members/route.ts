import { listMembers } from "@/db/queries/groups";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface MembersRouteContext {
  params: Promise<{ groupId: string }>;
}

/** GET /api/groups/[groupId]/members: the members table (any member). */
export async function GET(_request: Request, context: MembersRouteContext): Promise<Response> {
  try {
    const { groupId } = await context.params;
    return Response.json(await listMembers(await getCurrentUser(), groupId));
  } catch (error) {
    return toErrorResponse(error);
  }
}
