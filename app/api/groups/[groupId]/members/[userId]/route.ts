import { removeMember, setMemberRole } from "@/db/queries/groups";
import { readJsonBody } from "@/lib/server/configuration-handlers";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { changeRoleSchema } from "@/lib/validations/group";

interface MemberRouteContext {
  params: Promise<{ groupId: string; userId: string }>;
}

/** PATCH /api/groups/[groupId]/members/[userId] `{ role }`: owners change a role; the last owner stays. */
export async function PATCH(request: Request, context: MemberRouteContext): Promise<Response> {
  try {
    const { groupId, userId } = await context.params;
    const actor = await getCurrentUser();
    const { role } = changeRoleSchema.parse(await readJsonBody(request, 4 * 1024));
    return Response.json(await setMemberRole(actor, groupId, userId, role));
  } catch (error) {
    return toErrorResponse(error);
  }
}

/** DELETE /api/groups/[groupId]/members/[userId]: owners remove a member; anyone removes themselves (leave). 204. */
export async function DELETE(_request: Request, context: MemberRouteContext): Promise<Response> {
  try {
    const { groupId, userId } = await context.params;
    await removeMember(await getCurrentUser(), groupId, userId);
    return new Response(null, { status: 204 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
