import { removeMember, setMemberRole } from "@/db/queries/groups";
import { route } from "@/lib/server/route";
import { changeRoleSchema } from "@/lib/validations/group";

/** PATCH /api/groups/[groupId]/members/[userId] `{ role }`: owners change a role; the last owner stays. */
export const PATCH = route(
  { params: ["groupId", "userId"], body: changeRoleSchema, bodyLimitBytes: 4 * 1024 },
  async ({ actor, params, body }) => Response.json(await setMemberRole(actor, params.groupId, params.userId, body.role)),
);

/** DELETE /api/groups/[groupId]/members/[userId]: owners remove a member; anyone removes themselves (leave). 204. */
export const DELETE = route({ params: ["groupId", "userId"] }, async ({ actor, params }) => {
  await removeMember(actor, params.groupId, params.userId);
  return new Response(null, { status: 204 });
});
