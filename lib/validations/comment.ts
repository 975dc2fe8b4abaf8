import { z } from "./zod";

/** Longest comment body, in characters. */
export const commentMaxLength = 4000;

/**
 * Body of `POST /api/configurations/[id]/comments`. Without `revisionId` the comment is tied to
 * the configuration's current revision.
 */
export const createCommentSchema = z.object({
  body: z.string().trim().min(1, "Write something first.").max(commentMaxLength, `Use at most ${commentMaxLength} characters.`),
  revisionId: z.uuid().optional(),
});
export type CreateCommentInput = z.infer<typeof createCommentSchema>;
