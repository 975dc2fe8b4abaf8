import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { ForbiddenError, NotFoundError, PayloadTooLargeError, ValidationError } from "../../lib/errors";
import { attachmentFileNameFor, sniffContentType, type AttachmentContentType } from "../../lib/files/sniff";
import { attachmentMaxBytes } from "../../lib/validations/attachment";
import { db } from "../index";
import { attachments, users } from "../schema";
import { assertUuid, requireActor, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { requireConfigurationRole } from "./configuration-access";

/**
 * Figures and notes attached to a configuration, stored in PostgreSQL. Editors and owners upload
 * and delete; every member of the group lists and downloads. The content type comes from the
 * bytes (PNG, JPEG, PDF only), never from the file name or the browser.
 */
export interface AttachmentDto {
  id: string;
  fileName: string;
  contentType: string;
  byteSize: number;
  uploadedByName: string;
  createdAt: Date;
}

/** An attachment's bytes for a download. */
export interface AttachmentFileDto {
  fileName: string;
  contentType: string;
  data: Buffer;
}

/**
 * Checks that the actor may attach files to the configuration (editors and owners), before an
 * upload is read: 401 without a session, 404 for a configuration the actor cannot see, 403 for a
 * viewer. `uploadAttachment` checks again inside its own work.
 */
export async function assertMayAttach(actor: Actor | null, configurationId: string): Promise<void> {
  await requireConfigurationRole(db, actor, configurationId, "editor");
}

/**
 * Stores an attachment. Editors and owners. Larger than `attachmentMaxBytes` is a 413, a type
 * other than PNG/JPEG/PDF a 422 on `file`; in both cases nothing is written. The stored name keeps
 * the uploaded one's stem but always ends in the extension of the type found in the bytes
 * ("notes.html" holding a PDF is stored as "notes.pdf"), so opening a download never runs it as
 * something else.
 */
export async function uploadAttachment(
  actor: Actor | null,
  configurationId: string,
  file: { fileName: string; data: Uint8Array },
): Promise<AttachmentDto> {
  const signedIn = requireActor(actor);
  const access = await requireConfigurationRole(db, signedIn, configurationId, "editor");
  if (file.data.byteLength > attachmentMaxBytes) {
    throw new PayloadTooLargeError(attachmentMaxBytes, `Attachments are limited to ${attachmentMaxBytes / (1024 * 1024)} MB.`);
  }
  if (file.data.byteLength === 0) throw ValidationError.at(["file"], "The file is empty.");
  const contentType: AttachmentContentType | null = sniffContentType(file.data);
  if (!contentType) {
    throw ValidationError.at(["file"], "Only PNG, JPEG and PDF files can be attached (checked from the file's contents).");
  }
  const fileName = attachmentFileNameFor(file.fileName, contentType);
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(attachments)
      .values({
        configurationId,
        fileName,
        contentType,
        byteSize: file.data.byteLength,
        data: Buffer.from(file.data.buffer, file.data.byteOffset, file.data.byteLength),
        uploadedBy: signedIn.id,
      })
      .returning({ id: attachments.id, createdAt: attachments.createdAt });
    if (!row) throw new Error("Attachment insert returned no row.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: access.row.groupId,
      action: "attachment.create",
      entityType: "attachment",
      entityId: row.id,
      details: { configurationId, fileName, contentType, byteSize: file.data.byteLength },
    });
    return {
      id: row.id,
      fileName,
      contentType,
      byteSize: file.data.byteLength,
      uploadedByName: signedIn.name,
      createdAt: row.createdAt,
    };
  });
}

/** A configuration's attachments (metadata only), newest first. Any member. */
export async function listAttachments(actor: Actor | null, configurationId: string): Promise<AttachmentDto[]> {
  await requireConfigurationRole(db, actor, configurationId, "viewer");
  return db
    .select({
      id: attachments.id,
      fileName: attachments.fileName,
      contentType: attachments.contentType,
      byteSize: attachments.byteSize,
      uploadedByName: users.name,
      createdAt: attachments.createdAt,
    })
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(eq(attachments.configurationId, configurationId), isNull(attachments.deletedAt)))
    .orderBy(desc(attachments.createdAt));
}

/** An attachment's bytes. Any member of the configuration's group; everyone else gets 404. */
export async function getAttachmentFile(actor: Actor | null, attachmentId: string): Promise<AttachmentFileDto> {
  assertUuid(attachmentId, "attachment");
  requireActor(actor);
  const [row] = await db
    .select({
      configurationId: attachments.configurationId,
      fileName: attachments.fileName,
      contentType: attachments.contentType,
      data: attachments.data,
    })
    .from(attachments)
    .where(and(eq(attachments.id, attachmentId), isNull(attachments.deletedAt)))
    .limit(1);
  if (!row) throw new NotFoundError("No such attachment.");
  await requireConfigurationRole(db, actor, row.configurationId, "viewer").catch((error: unknown) => {
    // A non-member must not learn that the attachment exists.
    if (error instanceof NotFoundError || error instanceof ForbiddenError) {
      throw new NotFoundError("No such attachment.");
    }
    throw error;
  });
  return { fileName: row.fileName, contentType: row.contentType, data: row.data };
}

/** Deletes (softly) an attachment. Editors and owners. */
export async function deleteAttachment(actor: Actor | null, attachmentId: string): Promise<void> {
  assertUuid(attachmentId, "attachment");
  const signedIn = requireActor(actor);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select({ configurationId: attachments.configurationId, fileName: attachments.fileName })
      .from(attachments)
      .where(and(eq(attachments.id, attachmentId), isNull(attachments.deletedAt)))
      .limit(1);
    if (!row) throw new NotFoundError("No such attachment.");
    const access = await requireConfigurationRole(tx, signedIn, row.configurationId, "editor");
    await tx.update(attachments).set({ deletedAt: new Date() }).where(eq(attachments.id, attachmentId));
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: access.row.groupId,
      action: "attachment.delete",
      entityType: "attachment",
      entityId: attachmentId,
      details: { configurationId: row.configurationId, fileName: row.fileName },
    });
  });
}
