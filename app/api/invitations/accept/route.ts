import { acceptInvitation, acceptInvitationWithNewAccount } from "@/db/queries/invitations";
import { readJsonBody } from "@/lib/server/configuration-handlers";
import { toErrorResponse, ValidationError } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { acceptInvitationSchema } from "@/lib/validations/invitation";

/**
 * POST /api/invitations/accept `{ token }` (signed in) or `{ token, name, password }` (no account
 * yet: the account is created for the invited e-mail). 200 `{ groupSlug, role }`.
 * Expired, revoked and used links answer 409 with `error` = invitation_expired | invitation_revoked |
 * invitation_used; a different signed-in account, 409 invitation_wrong_account.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    const actor = await getCurrentUser();
    const input = acceptInvitationSchema.parse(await readJsonBody(request, 4 * 1024));
    if (actor) {
      const accepted = await acceptInvitation(actor, input.token);
      return Response.json({ groupSlug: accepted.groupSlug, role: accepted.role });
    }
    if (!input.name || !input.password) {
      throw new ValidationError([
        ...(input.name ? [] : [{ path: ["name"], message: "Enter your name, or sign in if you have an account." }]),
        ...(input.password ? [] : [{ path: ["password"], message: "Choose a password." }]),
      ]);
    }
    const accepted = await acceptInvitationWithNewAccount(input.token, { name: input.name, password: input.password });
    return Response.json({ groupSlug: accepted.groupSlug, role: accepted.role, email: accepted.email }, { status: 201 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
