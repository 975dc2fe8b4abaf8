import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import type { Configuration } from "../../lib/boundary/types";
import { ForbiddenError, NotFoundError, ValidationError } from "../../lib/errors";
import { distinctTitle } from "../../lib/titles";
import { configurationTitleMaxLength } from "../../lib/validations/limits";
import { db } from "../index";
import { configurations, groups, memberships, revisions } from "../schema";
import { assertUuid, getGroupRole, requireActor, roleAtLeast, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { requireConfigurationRole } from "./configuration-access";
import {
  toConfigurationDto,
  type ConfigurationDto,
  type ConfigurationPage,
  type ConfigurationSummaryDto,
  type ListConfigurationsOptions,
} from "./configuration-dtos";
import { listConfigurations } from "./configurations";
import { resultForDocument } from "./results";
import { addRevision, documentColumns } from "./revision-writes";

/** Input of `forkConfiguration`. */
export interface ForkConfigurationInput {
  /** The group (e.g. the actor's personal space) that receives the fork; editor or better. */
  targetGroupId: string;
  /** Revision to fork; the current one when omitted. */
  revisionId?: string;
  /** Title of the fork; the source title when omitted. A number is added when the space already has a configuration of that title. */
  title?: string;
  /**
   * An edited document to start the fork from (the designer's unsaved draft); the fork still records
   * the revision it was based on. Without it the fork starts from that revision's document.
   */
  document?: Configuration;
}

/**
 * Forks a configuration (viewer or better on the source) into a group where the actor is editor
 * or better, in one transaction. The fork starts at revision 1, with the source revision's document
 * (or the given draft) and its result, and records the source configuration and revision.
 */
export async function forkConfiguration(
  actor: Actor | null,
  configurationId: string,
  input: ForkConfigurationInput,
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  assertUuid(input.targetGroupId, "group");
  if (input.revisionId !== undefined) assertUuid(input.revisionId, "revision");
  return db.transaction(async (tx) => {
    const { row: source } = await requireConfigurationRole(tx, actor, configurationId, "viewer");
    const targetRole = await getGroupRole(tx, actor, input.targetGroupId);
    if (!targetRole) throw ValidationError.at(["targetGroupId"], "Choose a space you belong to.");
    if (!roleAtLeast(targetRole, "editor")) {
      throw new ForbiddenError("You can only fork into a space where you are an editor or owner.");
    }
    const revisionId = input.revisionId ?? source.currentRevisionId;
    const [revision] = revisionId
      ? await tx
          .select()
          .from(revisions)
          .where(and(eq(revisions.id, revisionId), eq(revisions.configurationId, source.id)))
          .limit(1)
      : [];
    if (!revision) throw new NotFoundError("No such revision.");

    // A repeat fork into the same space gets a numbered title ("X (fork 2)"), so the two can be told apart.
    const taken = await tx
      .select({ title: configurations.title })
      .from(configurations)
      .where(and(eq(configurations.groupId, input.targetGroupId), isNull(configurations.deletedAt)));
    const wanted = input.title?.trim() || (input.document ?? revision.document).title;
    const title = distinctTitle(wanted, new Set(taken.map((row) => row.title)), configurationTitleMaxLength);
    const document: Configuration = { ...(input.document ?? revision.document), title };
    // The title is not part of the physics, so an untouched document keeps the source's result.
    const result = await resultForDocument(tx, document, input.document === undefined ? { sameAs: { revisionId: revision.id } } : {});
    const [created] = await tx
      .insert(configurations)
      .values({
        groupId: input.targetGroupId,
        ...documentColumns(document, result.summary),
        version: 1,
        forkedFromConfigurationId: source.id,
        forkedFromRevisionId: revision.id,
        createdBy: author.id,
      })
      .returning();
    if (!created) throw new Error("Configuration insert returned no row");
    const message = input.document
      ? `Forked from "${source.title}", revision ${revision.number}, with unsaved changes`
      : `Forked from "${source.title}", revision ${revision.number}`;
    const row = await addRevision(tx, created, author.id, message, result);
    await recordAudit(tx, {
      actorId: author.id,
      groupId: input.targetGroupId,
      action: "configuration.fork",
      entityType: "configuration",
      entityId: row.id,
      details: { sourceConfigurationId: source.id, sourceRevisionId: revision.id, withDraft: input.document !== undefined },
    });
    // The source's side of the fork, so its author and group see who forked it (issue 16).
    await recordAudit(tx, {
      actorId: author.id,
      groupId: source.groupId,
      action: "configuration.forked",
      entityType: "configuration",
      entityId: source.id,
      details: { forkId: row.id, forkTitle: title, revisionNumber: revision.number },
    });
    const [group] = await tx.select().from(groups).where(eq(groups.id, input.targetGroupId));
    if (!group) throw new NotFoundError("No such group.");
    const forkedFrom = { configurationId: source.id, revisionId: revision.id, title: source.title, revisionNumber: revision.number };
    return toConfigurationDto(row, { group, authorName: author.name, source: forkedFrom }, targetRole);
  });
}

/**
 * Direct forks of a configuration, for the owners and editors of its group and for its author (a
 * lab instructor comparing students' forks of a starter, an author following her forks). Summaries
 * only, wherever the forks live.
 */
export async function listForksOfConfiguration(
  actor: Actor | null,
  configurationId: string,
  options: ListConfigurationsOptions = {},
): Promise<ConfigurationPage> {
  await requireForkListAccess(actor, configurationId);
  return listConfigurations(eq(configurations.forkedFromConfigurationId, configurationId), options);
}

/** A fork as the source's page lists it: its summary and whether the actor may open it. */
export type ForkListItemDto = ConfigurationSummaryDto & {
  /** True when the actor can read the fork (a member of its space, the lab's instructors for a starter, an admin). */
  readable: boolean;
};

/**
 * Direct forks of a configuration with whether the actor may open each one (see
 * {@link listForksOfConfiguration} for who may list them). Newest first, at most `limit` (default 50).
 */
export async function listForkLinks(actor: Actor | null, configurationId: string, limit = 50): Promise<ForkListItemDto[]> {
  const { row, context, role } = await requireForkListAccess(actor, configurationId);
  const page = await listConfigurations(eq(configurations.forkedFromConfigurationId, configurationId), { limit, sort: "updated", direction: "desc" });
  const signedIn = requireActor(actor);
  // A starter's forks are readable by the lab's owners and editors (configuration-access.ts).
  const everything = signedIn.siteRole === "admin" || (row.isStarter && context.group.kind === "lab" && roleAtLeast(role, "editor"));
  const groupIds = [...new Set(page.items.map((fork) => fork.group.id))];
  const memberOf = everything || groupIds.length === 0
    ? new Set<string>()
    : new Set(
        (
          await db
            .select({ groupId: memberships.groupId })
            .from(memberships)
            .where(and(eq(memberships.userId, signedIn.id), inArray(memberships.groupId, groupIds)))
        ).map((membership) => membership.groupId),
      );
  return page.items.map((fork) => ({ ...fork, readable: everything || memberOf.has(fork.group.id) }));
}

/** Editors and owners of the configuration's group, and its author, may list its forks. */
async function requireForkListAccess(actor: Actor | null, configurationId: string) {
  const access = await requireConfigurationRole(db, actor, configurationId, "viewer");
  const signedIn = requireActor(actor);
  if (!roleAtLeast(access.role, "editor") && access.row.createdBy !== signedIn.id) {
    throw new ForbiddenError("Only the author and the group's editors and owners can list its forks.");
  }
  return access;
}

