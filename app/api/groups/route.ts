import { createGroup, listGroupsForUser } from "@/db/queries/groups";
import { readJsonBody } from "@/lib/server/configuration-handlers";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { createGroupSchema } from "@/lib/validations/group";

/** GET /api/groups: the signed-in user's groups (personal space first). */
export async function GET(): Promise<Response> {
  try {
    return Response.json(await listGroupsForUser(await getCurrentUser()));
  } catch (error) {
    return toErrorResponse(error);
  }
}

/** POST /api/groups `{ name, kind, slug?, description? }`: creates a group owned by the caller. 201. */
export async function POST(request: Request): Promise<Response> {
  try {
    const actor = await getCurrentUser();
    const input = createGroupSchema.parse(await readJsonBody(request, 16 * 1024));
    const group = await createGroup(actor, input);
    return Response.json(group, { status: 201, headers: { location: `/groups/${group.slug}` } });
  } catch (error) {
    return toErrorResponse(error);
  }
}
