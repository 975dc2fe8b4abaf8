import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { ForbiddenError, NotFoundError, ValidationError } from "../../lib/errors";
import type { CreateCommentInput } from "../../lib/validations/comment";
import { db } from "../index";
import { comments, revisions, users } from "../schema";
import { assertUuid, requireActor, requireGroupRole, roleAtLeast, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { requireConfigurationRole } from "./configuration-access";

/**
 * Comments on a configuration. Policy: every member of the configuration's group may read and
 * write comments, viewers included (a viewer's job is to read and remark, not to edit the
 * document). Authors delete their own comments; owners may delete any (soft delete).
 */
export interface CommentDto {
  id: string;
  body: string;
  authorId: string;
  authorName: string;
  revisionId: string;
  /** The revision number the comment was written on. */
  revisionNumber: number;
  createdAt: Date;
  /** True when the viewer may delete it. */
  canDelete: boolean;
}

/** A configuration's comments, oldest first. Any member of its group. */
export async function listComments(actor: Actor | null, configurationId: string): Promise<CommentDto[]> {
  const access = await requireConfigurationRole(db, actor, configurationId, "viewer");
  const signedIn = requireActor(actor);
  const rows = await db
    .select({
      id: comments.id,
      body: comments.body,
      authorId: comments.authorId,
      authorName: users.name,
      revisionId: comments.revisionId,
      revisionNumber: revisions.number,
      createdAt: comments.createdAt,
    })
    .from(comments)
    .innerJoin(users, eq(users.id, comments.authorId))
    .innerJoin(revisions, eq(revisions.id, comments.revisionId))
    .where(and(eq(comments.configurationId, configurationId), isNull(comments.deletedAt)))
    .orderBy(asc(comments.createdAt));
  return rows.map((row) => ({
    ...row,
    canDelete: row.authorId === signedIn.id || roleAtLeast(access.role, "owner"),
  }));
}

/**
 * Adds a comment tied to a revision of the configuration (the current one when `revisionId` is
 * omitted). Any member of the group. A revision of another configuration is a 422 on `revisionId`.
 */
export async function addComment(
  actor: Actor | null,
  configurationId: string,
  input: CreateCommentInput,
): Promise<CommentDto> {
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    const access = await requireConfigurationRole(tx, signedIn, configurationId, "viewer");
    const revisionId = input.revisionId ?? access.row.currentRevisionId;
    if (!revisionId) throw ValidationError.at(["revisionId"], "This configuration has no saved revision to comment on yet.");
    const [revision] = await tx
      .select({ id: revisions.id, number: revisions.number })
      .from(revisions)
      .where(and(eq(revisions.id, revisionId), eq(revisions.configurationId, configurationId)))
      .limit(1);
    if (!revision) throw ValidationError.at(["revisionId"], "That revision does not belong to this configuration.");
    const [row] = await tx
      .insert(comments)
      .values({ configurationId, revisionId: revision.id, authorId: signedIn.id, body: input.body })
      .returning();
    if (!row) throw new Error("Comment insert returned no row.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: access.row.groupId,
      action: "comment.create",
      entityType: "comment",
      entityId: row.id,
      details: { configurationId, revisionNumber: revision.number },
    });
    return {
      id: row.id,
      body: row.body,
      authorId: signedIn.id,
      authorName: signedIn.name,
      revisionId: revision.id,
      revisionNumber: revision.number,
      createdAt: row.createdAt,
      canDelete: true,
    };
  });
}

/** Deletes (softly) a comment: its author, or an owner of the group. */
export async function deleteComment(actor: Actor | null, commentId: string): Promise<void> {
  assertUuid(commentId, "comment");
  const signedIn = requireActor(actor);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select({ id: comments.id, authorId: comments.authorId, configurationId: comments.configurationId })
      .from(comments)
      .where(and(eq(comments.id, commentId), isNull(comments.deletedAt)))
      .limit(1);
    if (!row) throw new NotFoundError("No such comment.");
    const access = await requireConfigurationRole(tx, signedIn, row.configurationId, "viewer");
    if (row.authorId !== signedIn.id) {
      await requireGroupRole(tx, signedIn, access.row.groupId, "owner", "comment").catch(() => {
        throw new ForbiddenError("Only the author or a group owner can delete this comment.");
      });
    }
    await tx.update(comments).set({ deletedAt: new Date() }).where(eq(comments.id, commentId));
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: access.row.groupId,
      action: "comment.delete",
      entityType: "comment",
      entityId: commentId,
      details: { configurationId: row.configurationId },
    });
  });
}
