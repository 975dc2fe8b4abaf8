import { addComment, listComments } from "@/db/queries/comments";
import { route } from "@/lib/server/route";
import { createCommentSchema } from "@/lib/validations/comment";

/** GET /api/configurations/[configurationId]/comments: oldest first, each with its revision (any member). */
export const GET = route({ params: ["configurationId"] }, async ({ actor, params }) =>
  Response.json(await listComments(actor, params.configurationId)),
);

/** POST /api/configurations/[configurationId]/comments `{ body, revisionId? }`: any member, viewers included. 201. */
export const POST = route(
  { params: ["configurationId"], body: createCommentSchema, bodyLimitBytes: 32 * 1024 },
  async ({ actor, params, body }) => Response.json(await addComment(actor, params.configurationId, body), { status: 201 }),
);
