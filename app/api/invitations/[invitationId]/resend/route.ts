import { resendInvitation } from "@/db/queries/invitations";
import { deliverInvitation } from "@/lib/server/invitation-mail";
import { route } from "@/lib/server/route";

/** POST /api/invitations/[invitationId]/resend: a new link with a fresh expiry, mailed again (owners only). */
export const POST = route({ params: ["invitationId"] }, async ({ actor, params }) => {
  const issued = await resendInvitation(actor, params.invitationId);
  const mailSent = await deliverInvitation(issued);
  return Response.json({ invitation: issued.invitation, mailSent });
});
