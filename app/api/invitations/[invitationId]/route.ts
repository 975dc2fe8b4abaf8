import { revokeInvitation } from "@/db/queries/invitations";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface InvitationRouteContext {
  params: Promise<{ invitationId: string }>;
}

/** DELETE /api/invitations/[invitationId]: revokes the invitation (owners only); its link stops working. */
export async function DELETE(_request: Request, context: InvitationRouteContext): Promise<Response> {
  try {
    const { invitationId } = await context.params;
    return Response.json(await revokeInvitation(await getCurrentUser(), invitationId));
  } catch (error) {
    return toErrorResponse(error);
  }
}
