import { z } from "./zod";

/** Roles inside a group, strongest first. */
export const groupRoleSchema = z.enum(["owner", "editor", "viewer"]);

/** Body of `POST /api/groups` and the new-group form. Personal spaces are created with the account, never here. */
export const createGroupSchema = z.object({
  name: z.string().trim().min(2, "Give the group a name of at least 2 characters.").max(120, "Use at most 120 characters."),
  slug: z
    .string()
    .trim()
    .max(48, "Use at most 48 characters.")
    .regex(/^(?:[a-z0-9]+(?:-[a-z0-9]+)*)?$/, "Use lowercase letters, digits and single hyphens, e.g. brane-engineering.")
    .optional()
    .transform((value) => value || undefined),
  description: z.string().trim().max(500, "Use at most 500 characters.").optional(),
  kind: z.enum(["research", "lab"], { error: "Choose a research group or a lab." }),
});
export type CreateGroupFormInput = z.infer<typeof createGroupSchema>;

/** Body of `PATCH /api/groups/[groupId]/members/[userId]`. */
export const changeRoleSchema = z.object({ role: groupRoleSchema });

/** Query of `GET /api/groups/[groupId]/audit`: how many entries, and only those before a moment. */
export const auditQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(100),
  before: z.iso.datetime({ offset: true }).transform((value) => new Date(value)).optional(),
});
