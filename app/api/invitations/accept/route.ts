import { acceptInvitation, acceptInvitationWithNewAccount } from "@/db/queries/invitations";
import { ValidationError } from "@/lib/errors";
import { route } from "@/lib/server/route";
import { acceptInvitationSchema } from "@/lib/validations/invitation";

/**
 * POST /api/invitations/accept `{ token }` (signed in) or `{ token, name, password }` (no account
 * yet: the account is created for the invited e-mail). 200 `{ groupSlug, role }`.
 * Expired, revoked and used links answer 409 with `error` = invitation_expired | invitation_revoked |
 * invitation_used; a different signed-in account, 409 invitation_wrong_account.
 */
export const POST = route(
  { auth: "optional", body: acceptInvitationSchema, bodyLimitBytes: 4 * 1024 },
  async ({ actor, body }) => {
    if (actor) {
      const accepted = await acceptInvitation(actor, body.token);
      return Response.json({ groupSlug: accepted.groupSlug, role: accepted.role });
    }
    if (!body.name || !body.password) {
      throw new ValidationError([
        ...(body.name ? [] : [{ path: ["name"], message: "Enter your name, or sign in if you have an account." }]),
        ...(body.password ? [] : [{ path: ["password"], message: "Choose a password." }]),
      ]);
    }
    const accepted = await acceptInvitationWithNewAccount(body.token, { name: body.name, password: body.password });
    return Response.json({ groupSlug: accepted.groupSlug, role: accepted.role, email: accepted.email }, { status: 201 });
  },
);
