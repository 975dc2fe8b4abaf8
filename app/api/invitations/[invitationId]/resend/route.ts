import { resendInvitation } from "@/db/queries/invitations";
import { deliverInvitation } from "@/lib/server/invitation-mail";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface ResendRouteContext {
  params: Promise<{ invitationId: string }>;
}

/** POST /api/invitations/[invitationId]/resend: a new link with a fresh expiry, mailed again (owners only). */
export async function POST(_request: Request, context: ResendRouteContext): Promise<Response> {
  try {
    const { invitationId } = await context.params;
    const issued = await resendInvitation(await getCurrentUser(), invitationId);
    const mailSent = await deliverInvitation(issued);
    return Response.json({ invitation: issued.invitation, mailSent });
  } catch (error) {
    return toErrorResponse(error);
  }
}
