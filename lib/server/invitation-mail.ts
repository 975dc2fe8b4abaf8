import "server-only";
import type { IssuedInvitation } from "@/db/queries/invitations";
import { sendInvitationMail } from "@/lib/server/mail";

/**
 * Sends the e-mail of a freshly issued invitation. The invitation is already stored, so a mail
 * failure is reported (`false`) rather than thrown: the owner sees it and can resend.
 */
export async function deliverInvitation(issued: IssuedInvitation): Promise<boolean> {
  try {
    await sendInvitationMail({
      to: issued.invitation.email,
      groupName: issued.groupName,
      inviterName: issued.invitedByName,
      role: issued.invitation.role,
      acceptPath: `/invitations/${encodeURIComponent(issued.token)}`,
      expiresAt: issued.invitation.expiresAt,
    });
    return true;
  } catch (error) {
    console.error("Invitation e-mail could not be sent:", error);
    return false;
  }
}
