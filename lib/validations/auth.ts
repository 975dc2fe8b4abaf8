import { z } from "./zod";

/** Shortest accepted password; the DAL (db/queries/users.ts) enforces the same rule on the server. */
export const minPasswordLength = 8;
/** bcrypt ignores bytes past 72, so longer passwords are refused rather than silently truncated. */
export const maxPasswordBytes = 72;

export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .toLowerCase()
  .pipe(z.email({ error: "Enter a valid e-mail address." }));

export const newPasswordSchema = z
  .string({ error: "Enter a password." })
  .min(minPasswordLength, `Use at least ${minPasswordLength} characters.`)
  .refine((value) => new TextEncoder().encode(value).length <= maxPasswordBytes, `Use at most ${maxPasswordBytes} bytes.`);

export const nameSchema = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(100, "Use at most 100 characters.");

/** Tokens from e-mailed links: base64url, 32 random bytes (43 characters). */
export const linkTokenSchema = z
  .string({ error: "This link is not valid." })
  .regex(/^[A-Za-z0-9_-]{20,128}$/, "This link is not valid.");

const passwordsMatch = (value: { password: string; confirmPassword: string }) => value.password === value.confirmPassword;
const mismatch = { path: ["confirmPassword"], message: "The passwords don't match." };

export const signUpSchema = z
  .object({
    name: nameSchema,
    email: emailSchema,
    password: newPasswordSchema,
    confirmPassword: z.string({ error: "Repeat the password." }),
  })
  .refine(passwordsMatch, mismatch);

export const confirmSignUpSchema = z.object({
  token: linkTokenSchema,
  password: z.string({ error: "Enter the password you chose." }).min(1, "Enter the password you chose."),
});

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password."),
});

export const emailRequestSchema = z.object({ email: emailSchema });

export const signInLinkSchema = z.object({ token: linkTokenSchema });

export const passwordResetSchema = z
  .object({
    token: linkTokenSchema,
    password: newPasswordSchema,
    confirmPassword: z.string({ error: "Repeat the password." }),
  })
  .refine(passwordsMatch, mismatch);

export const accountNameSchema = z.object({ name: nameSchema });

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().max(200).default(""),
    newPassword: newPasswordSchema,
    confirmPassword: z.string({ error: "Repeat the new password." }),
  })
  .refine((value) => value.newPassword === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The passwords don't match.",
  });

export const siteRoleSchema = z.enum(["admin", "member"], { error: "Choose admin or member." });

export const siteRoleChangeSchema = z.object({
  userId: z.uuid({ error: "No such user." }),
  siteRole: siteRoleSchema,
});

export type SignUpInput = z.infer<typeof signUpSchema>;
export type SignInInput = z.infer<typeof signInSchema>;
