import { deleteComment } from "@/db/queries/comments";
import { route } from "@/lib/server/route";

/** DELETE /api/comments/[commentId]: the author or a group owner. 204. */
export const DELETE = route({ params: ["commentId"] }, async ({ actor, params }) => {
  await deleteComment(actor, params.commentId);
  return new Response(null, { status: 204 });
});
