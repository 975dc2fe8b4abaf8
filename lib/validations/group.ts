import { z } from "zod";

/** Roles inside a group, strongest first. */
export const groupRoleSchema = z.enum(["owner", "editor", "viewer"]);

/** URL-safe group slug: lowercase letters, digits and single hyphens. */
export const groupSlugSchema = z
  .string()
  .trim()
  .min(3, "Use at least 3 characters.")
  .max(48, "Use at most 48 characters.")
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Use lowercase letters, digits and single hyphens.");

/** Body of `POST /api/groups` and the new-group form. Personal spaces are created with the account, never here. */
export const createGroupSchema = z.object({
  name: z.string().trim().min(2, "Give the group a name.").max(80, "Use at most 80 characters."),
  slug: groupSlugSchema.optional(),
  description: z.string().trim().max(500, "Use at most 500 characters.").default(""),
  kind: z.enum(["research", "lab"]),
});
export type CreateGroupInput = z.infer<typeof createGroupSchema>;

/** Body of `PATCH /api/groups/[slug]/members/[userId]`. */
export const changeRoleSchema = z.object({ role: groupRoleSchema });

/** Route params that carry a uuid. */
export const uuidSchema = z.uuid("Not a valid id.");
