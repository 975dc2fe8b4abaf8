import { z } from "./zod";
import { configurationSchema } from "./configuration";
import { configurationTitleMaxLength } from "./limits";

/** Largest request body accepted by the configuration routes, in bytes. */
export const configurationBodyLimitBytes = 256 * 1024;

const uuid = z.uuid({ error: "Not a valid id." });
const theory = z.enum(["bosonic", "IIA", "IIB"]);

/** Query of `GET /api/configurations`. */
export const listConfigurationsQuerySchema = z.object({
  groupId: uuid.optional(),
  scope: z.enum(["accessible", "created"]).default("accessible"),
  search: z.string().trim().max(configurationTitleMaxLength).optional(),
  theory: theory.optional(),
  starter: z.enum(["true", "false"]).transform((value) => value === "true").optional(),
  sort: z.enum(["updated", "created", "title", "lightest", "stacks"]).default("updated"),
  direction: z.enum(["asc", "desc"]).default("desc"),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListConfigurationsQuery = z.infer<typeof listConfigurationsQuerySchema>;

const message = z.string().trim().max(500, "Keep the message under 500 characters.");

/** Body of `POST /api/configurations`. */
export const createConfigurationBodySchema = z.object({
  groupId: uuid,
  document: configurationSchema,
  message: message.default("Created"),
});
export type CreateConfigurationBody = z.infer<typeof createConfigurationBodySchema>;

/** Body of `PUT /api/configurations/[configurationId]`; the version may instead come in `If-Match`. */
export const updateConfigurationBodySchema = z.object({
  document: configurationSchema,
  message: message.default(""),
  expectedVersion: z.number().int().min(1).optional(),
});
export type UpdateConfigurationBody = z.infer<typeof updateConfigurationBodySchema>;

/** Query of `GET /api/configurations/[configurationId]/export`: the format, and a revision other than the current one. */
export const exportQuerySchema = z.object({
  format: z.enum(["json", "csv", "tex", "potential"], { error: "Choose json, csv, tex or potential." }),
  revision: z.uuid({ error: "Not a valid revision id." }).optional(),
});

/** The dashboard's `?deleted=<id>&title=<title>` after a delete, which offers an undo. */
export const deletedNoticeSchema = z.object({
  deleted: uuid,
  title: z.string().max(configurationTitleMaxLength).catch(""),
});

/** Body of `POST /api/configurations/[configurationId]/fork`. */
export const forkConfigurationBodySchema = z.object({
  targetGroupId: uuid,
  revisionId: uuid.optional(),
  title: z.string().trim().min(1).max(configurationTitleMaxLength).optional(),
  /** An unsaved draft to start the fork from instead of the revision's document. */
  document: configurationSchema.optional(),
});
export type ForkConfigurationBody = z.infer<typeof forkConfigurationBodySchema>;

/**
 * The version named by an `If-Match` header: `3`, `"3"` or `W/"3"`. Null when the header is
 * absent; NaN when present but not a version number.
 */
export function parseIfMatch(header: string | null): number | null {
  if (header === null || header.trim() === "") return null;
  const match = /^\s*(?:W\/)?"?(\d{1,9})"?\s*$/.exec(header);
  return match ? Number(match[1]) : Number.NaN;
}

/** Query of `GET /api/configurations/[configurationId]`: `include=result` adds the current revision's stored result. */
export const readConfigurationQuerySchema = z.object({
  include: z.enum(["result"], { error: 'include may only be "result".' }).optional(),
});

/** Query of `GET .../revisions/[revisionId]/result/sectors`: a page of sector overviews, filtered. */
export const sectorPageQuerySchema = z.object({
  offset: z.coerce.number({ error: "offset must be a whole number." }).int().min(0).max(1_000_000).default(0),
  limit: z.coerce.number({ error: "limit must be a whole number." }).int().min(1).max(500).default(100),
  search: z.string().trim().max(120).optional(),
  tachyonic: z.enum(["true", "false"]).transform((value) => value === "true").optional(),
});
