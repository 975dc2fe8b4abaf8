import { listMembers } from "@/db/queries/groups";
import { route } from "@/lib/server/route";

/** GET /api/groups/[groupId]/members: the members table (any member). */
export const GET = route({ params: ["groupId"] }, async ({ actor, params }) => Response.json(await listMembers(actor, params.groupId)));
