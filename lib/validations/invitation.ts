import { z } from "./zod";
import { emailSchema, linkTokenSchema, nameSchema, newPasswordSchema } from "./auth";
import { groupRoleSchema } from "./group";

/** Body of `POST /api/groups/[groupId]/invitations`. */
export const createInvitationSchema = z.object({
  email: emailSchema,
  role: groupRoleSchema.default("editor"),
});
export type CreateInvitationInput = z.infer<typeof createInvitationSchema>;

/**
 * Body of `POST /api/invitations/accept`. A signed-in user sends only the token; someone without
 * an account also sends a name and a password, and the account is created for the invited e-mail.
 */
export const acceptInvitationSchema = z.object({
  token: linkTokenSchema,
  name: nameSchema.optional(),
  password: newPasswordSchema.optional(),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

/** The sign-up form on the invitation page (the e-mail is the invited one, not typed). */
export const invitationSignUpSchema = z
  .object({
    token: linkTokenSchema,
    name: nameSchema,
    password: newPasswordSchema,
    confirmPassword: z.string({ error: "Repeat the password." }),
  })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The passwords don't match.",
  });
