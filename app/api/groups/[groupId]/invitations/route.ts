import { createInvitation, listInvitations } from "@/db/queries/invitations";
import { readJsonBody } from "@/lib/server/configuration-handlers";
import { deliverInvitation } from "@/lib/server/invitation-mail";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { createInvitationSchema } from "@/lib/validations/invitation";

interface InvitationsRouteContext {
  params: Promise<{ groupId: string }>;
}

/** GET /api/groups/[groupId]/invitations: every invitation of the group with its status (owners only). */
export async function GET(_request: Request, context: InvitationsRouteContext): Promise<Response> {
  try {
    const { groupId } = await context.params;
    return Response.json(await listInvitations(await getCurrentUser(), groupId));
  } catch (error) {
    return toErrorResponse(error);
  }
}

/**
 * POST /api/groups/[groupId]/invitations `{ email, role }`: invites by e-mail (owners only).
 * 201 `{ invitation, mailSent }`; when the mail server refused the message the invitation is
 * kept and `mailSent` is false, so the owner can resend.
 */
export async function POST(request: Request, context: InvitationsRouteContext): Promise<Response> {
  try {
    const { groupId } = await context.params;
    const actor = await getCurrentUser();
    const input = createInvitationSchema.parse(await readJsonBody(request, 4 * 1024));
    const issued = await createInvitation(actor, groupId, input);
    const mailSent = await deliverInvitation(issued);
    return Response.json({ invitation: issued.invitation, mailSent }, { status: 201 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
