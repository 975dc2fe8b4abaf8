"use server";

import { redirect } from "next/navigation";
import { createUser, issuePasswordResetToken, issueSignInLinkToken, resetPasswordWithToken } from "@/db/queries/users";
import { errorState, invalidState, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { sendPasswordResetMail, sendSignInLinkMail } from "@/lib/server/mail";
import { limitEmailedLinks } from "@/lib/server/sign-in-limit";
import { emailRequestSchema, passwordResetSchema, signUpSchema } from "@/lib/validations/auth";

export type SignUpState = ActionState<FieldsOf<typeof signUpSchema>>;
export type EmailRequestState = ActionState<FieldsOf<typeof emailRequestSchema>>;
export type PasswordResetState = ActionState<FieldsOf<typeof passwordResetSchema>>;

/** Creates an account (and its personal space). The client signs in with the same credentials on success. */
export async function signUpAction(_previous: SignUpState, formData: FormData): Promise<SignUpState> {
  const fields = readFields(formData, ["name", "email", "password", "confirmPassword"]);
  const kept = { name: fields.name, email: fields.email };
  const parsed = signUpSchema.safeParse(fields);
  if (!parsed.success) return invalidState(parsed.error.issues, kept);
  try {
    await createUser(null, { name: parsed.data.name, email: parsed.data.email, password: parsed.data.password });
  } catch (error) {
    return errorState(error, kept);
  }
  return { status: "success", message: null, fieldErrors: {}, values: kept };
}

/** The same answer whether or not the account exists, so the form cannot be used to probe for accounts. */
const linkSentMessage =
  "If an account exists for that address, we've sent a sign-in link to it. The link works once and expires in 15 minutes.";
const resetSentMessage =
  "If an account exists for that address, we've sent a link to choose a new password. The link works once and expires in an hour.";

/** E-mails a single-use sign-in link. */
export async function requestSignInLinkAction(_previous: EmailRequestState, formData: FormData): Promise<EmailRequestState> {
  return requestEmailedLink(formData, linkSentMessage, async (email) => {
    const issued = await issueSignInLinkToken(null, email);
    if (issued) await sendSignInLinkMail({ to: issued.user.email, name: issued.user.name, token: issued.token, expiresAt: issued.expiresAt });
  });
}

/** E-mails a single-use password-reset link. */
export async function requestPasswordResetAction(_previous: EmailRequestState, formData: FormData): Promise<EmailRequestState> {
  return requestEmailedLink(formData, resetSentMessage, async (email) => {
    const issued = await issuePasswordResetToken(null, email);
    if (issued) await sendPasswordResetMail({ to: issued.user.email, name: issued.user.name, token: issued.token, expiresAt: issued.expiresAt });
  });
}

/** Sets a new password with a reset token, then sends the user to sign in with it. */
export async function resetPasswordAction(_previous: PasswordResetState, formData: FormData): Promise<PasswordResetState> {
  const fields = readFields(formData, ["token", "password", "confirmPassword"]);
  const kept = { token: fields.token };
  const parsed = passwordResetSchema.safeParse(fields);
  if (!parsed.success) return invalidState(parsed.error.issues, kept);
  try {
    await resetPasswordWithToken(null, parsed.data.token, parsed.data.password);
  } catch (error) {
    return errorState(error, kept);
  }
  redirect("/sign-in?reset=1");
}

/** Validates the e-mail, issues and sends the link, and answers `sentMessage` whether or not the account exists. */
async function requestEmailedLink(
  formData: FormData,
  sentMessage: string,
  issueAndSend: (email: string) => Promise<void>,
): Promise<EmailRequestState> {
  const fields = readFields(formData, ["email"]);
  const parsed = emailRequestSchema.safeParse(fields);
  if (!parsed.success) return invalidState(parsed.error.issues, fields);
  try {
    // At most a few links per address per quarter hour (lib/server/sign-in-limit.ts), account or not.
    const refused = await limitEmailedLinks(parsed.data.email);
    if (refused) return { status: "error", message: refused, fieldErrors: {}, values: fields };
    await issueAndSend(parsed.data.email);
  } catch (error) {
    console.error("Sending an account e-mail failed:", error);
    return {
      status: "error",
      message: "We could not send e-mail just now. Nothing was changed; please try again in a moment.",
      fieldErrors: {},
      values: fields,
    };
  }
  return { status: "success", message: sentMessage, fieldErrors: {}, values: fields };
}
