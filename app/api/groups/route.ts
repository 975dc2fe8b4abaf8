import { createGroup, listGroupsForUser } from "@/db/queries/groups";
import { route } from "@/lib/server/route";
import { createGroupSchema } from "@/lib/validations/group";

/** GET /api/groups: the signed-in user's groups (personal space first). */
export const GET = route({}, async ({ actor }) => Response.json(await listGroupsForUser(actor)));

/** POST /api/groups `{ name, kind, slug?, description? }`: creates a group owned by the caller. 201. */
export const POST = route({ body: createGroupSchema, bodyLimitBytes: 16 * 1024 }, async ({ actor, body }) => {
  const group = await createGroup(actor, body);
  return Response.json(group, { status: 201, headers: { location: `/groups/${group.slug}` } });
});
