import { deleteComment } from "@/db/queries/comments";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";

interface CommentRouteContext {
  params: Promise<{ commentId: string }>;
}

/** DELETE /api/comments/[commentId]: the author or a group owner. 204. */
export async function DELETE(_request: Request, context: CommentRouteContext): Promise<Response> {
  try {
    const { commentId } = await context.params;
    await deleteComment(await getCurrentUser(), commentId);
    return new Response(null, { status: 204 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
