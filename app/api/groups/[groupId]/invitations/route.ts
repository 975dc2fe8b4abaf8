import { createInvitation, listInvitations } from "@/db/queries/invitations";
import { deliverInvitation } from "@/lib/server/invitation-mail";
import { route } from "@/lib/server/route";
import { createInvitationSchema } from "@/lib/validations/invitation";

/** GET /api/groups/[groupId]/invitations: every invitation of the group with its status (owners only). */
export const GET = route({ params: ["groupId"] }, async ({ actor, params }) =>
  Response.json(await listInvitations(actor, params.groupId)),
);

/**
 * POST /api/groups/[groupId]/invitations `{ email, role }`: invites by e-mail (owners only).
 * 201 `{ invitation, mailSent }`; when the mail server refused the message the invitation is
 * kept and `mailSent` is false, so the owner can resend.
 */
export const POST = route(
  { params: ["groupId"], body: createInvitationSchema, bodyLimitBytes: 4 * 1024 },
  async ({ actor, params, body }) => {
    const issued = await createInvitation(actor, params.groupId, body);
    const mailSent = await deliverInvitation(issued);
    return Response.json({ invitation: issued.invitation, mailSent }, { status: 201 });
  },
);
