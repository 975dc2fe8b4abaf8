import { addComment, listComments } from "@/db/queries/comments";
import { readJsonBody } from "@/lib/server/configuration-handlers";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { createCommentSchema } from "@/lib/validations/comment";

interface CommentsRouteContext {
  params: Promise<{ configurationId: string }>;
}

/** GET /api/configurations/[configurationId]/comments: oldest first, each with its revision (any member). */
export async function GET(_request: Request, context: CommentsRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    return Response.json(await listComments(await getCurrentUser(), configurationId));
  } catch (error) {
    return toErrorResponse(error);
  }
}

/** POST /api/configurations/[configurationId]/comments `{ body, revisionId? }`: any member, viewers included. 201. */
export async function POST(request: Request, context: CommentsRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    const input = createCommentSchema.parse(await readJsonBody(request, 32 * 1024));
    return Response.json(await addComment(actor, configurationId, input), { status: 201 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
