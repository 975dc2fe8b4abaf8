import { z } from "zod";
import { groupRoleSchema } from "./group";

/** Body of `POST /api/groups/[slug]/invitations`. */
export const createInvitationSchema = z.object({
  email: z.email("Enter a valid e-mail address.").trim().toLowerCase(),
  role: groupRoleSchema.default("editor"),
});
export type CreateInvitationInput = z.infer<typeof createInvitationSchema>;

/** An invitation token as sent by e-mail: 32 random bytes in base64url (43 characters). */
export const invitationTokenSchema = z
  .string()
  .trim()
  .regex(/^[A-Za-z0-9_-]{43}$/, "This invitation link is malformed; copy the whole link from the e-mail.");

/**
 * Body of `POST /api/invitations/accept`. A signed-in user sends only the token; someone without
 * an account also sends a name and a password, and the account is created for the invited e-mail.
 */
export const acceptInvitationSchema = z.object({
  token: invitationTokenSchema,
  name: z.string().trim().min(1, "Enter your name.").max(80, "Use at most 80 characters.").optional(),
  password: z.string().min(10, "Use at least 10 characters.").max(200, "Use at most 200 characters.").optional(),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
