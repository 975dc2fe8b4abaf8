import { revokeInvitation } from "@/db/queries/invitations";
import { route } from "@/lib/server/route";

/** DELETE /api/invitations/[invitationId]: revokes the invitation (owners only); its link stops working. */
export const DELETE = route({ params: ["invitationId"] }, async ({ actor, params }) =>
  Response.json(await revokeInvitation(actor, params.invitationId)),
);
