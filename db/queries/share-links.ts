import "server-only";
import { readStoredResult } from "../../lib/validations/spectrum-result";
import { and, desc, eq, isNull } from "drizzle-orm";
import type { Configuration, SpectrumResult } from "../../lib/boundary/types";
import { NotFoundError } from "../../lib/errors";
import { createSecureToken, hashSecureToken } from "../../lib/server/secure-token";
import { db } from "../index";
import { configurations, groups, results, revisions, shareLinks, users } from "../schema";
import { assertUuid, requireActor, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { requireConfigurationRole } from "./configuration-access";

/**
 * Read-only share links. Editors and owners create and revoke them; anyone holding the token may
 * read the configuration's current document and stored result, nothing else. Only the SHA-256
 * of the token is stored, so a link can be shown once, at creation.
 */
export interface ShareLinkDto {
  id: string;
  createdByName: string;
  createdAt: Date;
  revokedAt: Date | null;
}

/** What `/share/[token]` renders. */
export interface SharedConfigurationDto {
  title: string;
  description: string;
  groupName: string;
  revisionNumber: number;
  updatedAt: Date;
  document: Configuration;
  result: SpectrumResult | null;
}

/** Creates a share link; returns the plain token once. Editors and owners. */
export async function createShareLink(
  actor: Actor | null,
  configurationId: string,
): Promise<{ link: ShareLinkDto; token: string }> {
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    const access = await requireConfigurationRole(tx, signedIn, configurationId, "editor");
    const token = createSecureToken();
    const [row] = await tx
      .insert(shareLinks)
      .values({ configurationId, tokenHash: hashSecureToken(token), createdBy: signedIn.id })
      .returning();
    if (!row) throw new Error("Share link insert returned no row.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: access.row.groupId,
      action: "share_link.create",
      entityType: "share_link",
      entityId: row.id,
      details: { configurationId },
    });
    return {
      link: { id: row.id, createdByName: signedIn.name, createdAt: row.createdAt, revokedAt: null },
      token,
    };
  });
}

/** A configuration's share links, newest first, including revoked ones. Editors and owners. */
export async function listShareLinks(actor: Actor | null, configurationId: string): Promise<ShareLinkDto[]> {
  await requireConfigurationRole(db, actor, configurationId, "editor");
  return db
    .select({
      id: shareLinks.id,
      createdByName: users.name,
      createdAt: shareLinks.createdAt,
      revokedAt: shareLinks.revokedAt,
    })
    .from(shareLinks)
    .innerJoin(users, eq(users.id, shareLinks.createdBy))
    .where(eq(shareLinks.configurationId, configurationId))
    .orderBy(desc(shareLinks.createdAt));
}

/** Revokes a share link; its URL then answers 404. Editors and owners. Revoking twice is harmless. */
export async function revokeShareLink(actor: Actor | null, shareLinkId: string): Promise<ShareLinkDto> {
  assertUuid(shareLinkId, "share link");
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    const [link] = await tx.select().from(shareLinks).where(eq(shareLinks.id, shareLinkId)).for("update").limit(1);
    if (!link) throw new NotFoundError("No such share link.");
    const access = await requireConfigurationRole(tx, signedIn, link.configurationId, "editor");
    const revokedAt = link.revokedAt ?? new Date();
    if (!link.revokedAt) {
      await tx.update(shareLinks).set({ revokedAt }).where(eq(shareLinks.id, shareLinkId));
      await recordAudit(tx, {
        actorId: signedIn.id,
        groupId: access.row.groupId,
        action: "share_link.revoke",
        entityType: "share_link",
        entityId: shareLinkId,
        details: { configurationId: link.configurationId },
      });
    }
    const [creator] = await tx.select({ name: users.name }).from(users).where(eq(users.id, link.createdBy)).limit(1);
    return { id: link.id, createdByName: creator?.name ?? "", createdAt: link.createdAt, revokedAt };
  });
}

/**
 * The configuration behind a share token, for anyone holding it. Unknown and revoked tokens and
 * deleted configurations are all a 404, indistinguishable from each other.
 */
export async function getSharedConfiguration(token: string): Promise<SharedConfigurationDto> {
  const [row] = await db
    .select({
      title: configurations.title,
      description: configurations.description,
      groupName: groups.name,
      updatedAt: configurations.updatedAt,
      document: configurations.document,
      revisionNumber: revisions.number,
      result: results.result,
    })
    .from(shareLinks)
    .innerJoin(configurations, eq(configurations.id, shareLinks.configurationId))
    .innerJoin(groups, eq(groups.id, configurations.groupId))
    .leftJoin(revisions, eq(revisions.id, configurations.currentRevisionId))
    .leftJoin(results, eq(results.revisionId, configurations.currentRevisionId))
    .where(
      and(
        eq(shareLinks.tokenHash, hashSecureToken(token)),
        isNull(shareLinks.revokedAt),
        isNull(configurations.deletedAt),
        isNull(groups.deletedAt),
      ),
    )
    .limit(1);
  if (!row) throw new NotFoundError("This share link does not exist or was revoked.");
  return { ...row, revisionNumber: row.revisionNumber ?? 1, result: row.result === null ? null : readStoredResult(row.result) };
}
