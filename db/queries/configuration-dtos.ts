import "server-only";
import type { Configuration, SpectrumResult, Theory } from "../../lib/boundary/types";
import { readStoredResult } from "../../lib/validations/spectrum-result";
import { groups, results, revisions, type ConfigurationRow, type GroupKind, type GroupRole } from "../schema";
import { roleAtLeast } from "./actor";
import type { ConfigurationContext } from "./configuration-access";

/*
 * The shapes the configuration DAL returns (configurations, revisions, forks, results) and the
 * functions that build them from rows. Only these DTOs leave db/queries; the browser sees them as
 * JSON (lib/client/configurations.ts).
 */

/** A person shown next to a record. */
export interface PersonDto {
  id: string;
  name: string;
}

/** One row of a configurations table (summary columns of the current revision's result). */
export interface ConfigurationSummaryDto {
  id: string;
  title: string;
  theory: Theory;
  group: { id: string; slug: string; name: string; kind: GroupKind };
  version: number;
  isStarter: boolean;
  stackCount: number;
  /** alpha' M^2 of the lightest state, or null when unknown. */
  lightestMassSquared: number | null;
  tachyonic: boolean;
  /** Supercharges preserved (type II); null for bosonic. */
  supercharges: number | null;
  forkedFromConfigurationId: string | null;
  author: PersonDto;
  createdAt: Date;
  updatedAt: Date;
}

/** A configuration as the designer opens it. */
export interface ConfigurationDto extends ConfigurationSummaryDto {
  description: string;
  document: Configuration;
  currentRevision: { id: string; number: number } | null;
  /** Where this configuration was forked from; `title` is null when the actor cannot see the source. */
  forkedFrom: {
    configurationId: string;
    revisionId: string | null;
    revisionNumber: number | null;
    title: string | null;
  } | null;
  /** The actor's effective role in the configuration's group. */
  role: GroupRole;
  canEdit: boolean;
}

/** One row of a configuration's history. */
export interface RevisionSummaryDto {
  id: string;
  configurationId: string;
  number: number;
  message: string;
  author: PersonDto;
  createdAt: Date;
  isCurrent: boolean;
  hasResult: boolean;
}

/** A revision with its document snapshot. */
export interface RevisionDto extends RevisionSummaryDto {
  document: Configuration;
}

/** When and by which engine version a revision's result was computed. */
export interface ResultMetaDto {
  revisionId: string;
  engineVersion: string;
  computeMs: number;
  createdAt: Date;
}

/** The stored engine result of one revision. */
export interface ResultDto extends ResultMetaDto {
  result: SpectrumResult;
}

/** Options of the list functions (configurations and forks). */
export interface ListConfigurationsOptions {
  /** Case-insensitive substring of the title. */
  search?: string;
  /** Only lab starter configurations (true) or only the others (false). */
  starter?: boolean;
  theory?: Theory;
  sort?: "updated" | "created" | "title" | "lightest" | "stacks";
  direction?: "asc" | "desc";
  /** Default 100, at most 500. */
  limit?: number;
  offset?: number;
}

/** A page of configuration rows and the total matching count. */
export interface ConfigurationPage {
  items: ConfigurationSummaryDto[];
  total: number;
}

/**
 * The DTO of one configuration row, with its group, author and fork source (from the access check,
 * db/queries/configuration-access.ts, or known to the write that made the row). The current
 * revision's number is the row's version: every accepted save makes revision number = version.
 */
export function toConfigurationDto(row: ConfigurationRow, context: ConfigurationContext, role: GroupRole): ConfigurationDto {
  return {
    ...toSummary(row, context.group, context.authorName),
    description: row.description,
    document: row.document,
    currentRevision: row.currentRevisionId ? { id: row.currentRevisionId, number: row.version } : null,
    forkedFrom: context.source,
    role,
    canEdit: roleAtLeast(role, "editor"),
  };
}

/** The list-row DTO of a configuration. */
export function toSummary(
  row: ConfigurationRow,
  group: typeof groups.$inferSelect,
  authorName: string,
): ConfigurationSummaryDto {
  return {
    id: row.id,
    title: row.title,
    theory: row.theory,
    group: { id: group.id, slug: group.slug, name: group.name, kind: group.kind },
    version: row.version,
    isStarter: row.isStarter,
    stackCount: row.stackCount,
    lightestMassSquared: row.lightestMassSquared,
    tachyonic: row.tachyonic,
    supercharges: row.supercharges,
    forkedFromConfigurationId: row.forkedFromConfigurationId,
    author: { id: row.createdBy, name: authorName },
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}

/** The history-row DTO of a revision. */
export function toRevisionSummary(
  revision: typeof revisions.$inferSelect,
  authorName: string,
  currentRevisionId: string | null,
  hasResult: boolean,
): RevisionSummaryDto {
  return {
    id: revision.id,
    configurationId: revision.configurationId,
    number: revision.number,
    message: revision.message,
    author: { id: revision.authorId, name: authorName },
    createdAt: revision.createdAt,
    isCurrent: revision.id === currentRevisionId,
    hasResult,
  };
}

/** The DTO of a stored result. */
export function toResultDto(row: typeof results.$inferSelect): ResultDto {
  return {
    revisionId: row.revisionId,
    engineVersion: row.engineVersion,
    result: readStoredResult(row.result),
    computeMs: row.computeMs,
    createdAt: row.createdAt,
  };
}
