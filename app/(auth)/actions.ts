"use server";

import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { confirmSignUp, issuePasswordResetToken, issueSignInLinkToken, requestSignUp, resetPasswordWithToken } from "@/db/queries/users";
import { errorState, invalidState, parseFields, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { toCallbackQuery, toSafeCallbackPath } from "@/lib/safe-redirect";
import {
  sendExistingAccountMail,
  sendMailInBackground,
  sendPasswordResetMail,
  sendSignInLinkMail,
  sendSignUpConfirmationMail,
} from "@/lib/server/mail";
import { clientAddress } from "@/lib/server/rate-limit";
import { limitEmailedLinks, limitSignUps } from "@/lib/server/sign-in-limit";
import { confirmSignUpSchema, emailRequestSchema, passwordResetSchema, signUpSchema } from "@/lib/validations/auth";

export type SignUpState = ActionState<FieldsOf<typeof signUpSchema>>;
export type ConfirmSignUpState = ActionState<FieldsOf<typeof confirmSignUpSchema>>;
export type EmailRequestState = ActionState<FieldsOf<typeof emailRequestSchema>>;
export type PasswordResetState = ActionState<FieldsOf<typeof passwordResetSchema>>;

/** The same answer whether or not the address has an account, so sign-up cannot be used to probe for accounts. */
function signUpSentMessage(email: string): string {
  return `We've sent a message to ${email}. Open the link in it within 24 hours and enter your password again to finish creating your account.`;
}

/**
 * Starts a sign-up: mails a confirmation link to a new address, or a note to the owner of an
 * address that already has an account, and answers both the same way. The account exists only once
 * the link is followed (`confirmSignUpAction`), so nobody can sign up with someone else's address.
 */
export async function signUpAction(_previous: SignUpState, formData: FormData): Promise<SignUpState> {
  const fields = readFields(formData, ["name", "email", "password", "confirmPassword", "callbackPath"]);
  const kept = { name: fields.name, email: fields.email };
  const parsed = parseFields(signUpSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, kept);
  try {
    const refused = (await limitSignUps(clientAddress(await headers()))) ?? (await limitEmailedLinks(parsed.data.email));
    if (refused) return { status: "error", message: refused, fieldErrors: {}, values: kept };
    const request = await requestSignUp(null, { name: parsed.data.name, email: parsed.data.email, password: parsed.data.password });
    const callbackQuery = toCallbackQuery(toSafeCallbackPath(fields.callbackPath));
    if (request.kind === "new") {
      sendMailInBackground("a sign-up confirmation", () =>
        sendSignUpConfirmationMail({ to: request.email, name: request.name, token: request.token, expiresAt: request.expiresAt, callbackQuery }),
      );
    } else if (request.kind === "existing") {
      sendMailInBackground("an existing-account notice", () => sendExistingAccountMail({ to: request.email, name: request.name }));
    }
  } catch (error) {
    return errorState(error, kept);
  }
  return { status: "success", message: signUpSentMessage(parsed.data.email), fieldErrors: {}, values: kept };
}

/** Finishes a sign-up from its mailed link with the password chosen at sign-up; the client then signs in. */
export async function confirmSignUpAction(_previous: ConfirmSignUpState, formData: FormData): Promise<ConfirmSignUpState> {
  const fields = readFields(formData, ["token", "password"]);
  const kept = { token: fields.token };
  const parsed = parseFields(confirmSignUpSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, kept);
  try {
    await confirmSignUp(null, parsed.data.token, parsed.data.password);
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
  return requestEmailedLink(formData, linkSentMessage, "a sign-in link", async (email) => {
    const issued = await issueSignInLinkToken(null, email);
    if (issued) await sendSignInLinkMail({ to: issued.user.email, name: issued.user.name, token: issued.token, expiresAt: issued.expiresAt });
  });
}

/** E-mails a single-use password-reset link. */
export async function requestPasswordResetAction(_previous: EmailRequestState, formData: FormData): Promise<EmailRequestState> {
  return requestEmailedLink(formData, resetSentMessage, "a password-reset link", async (email) => {
    const issued = await issuePasswordResetToken(null, email);
    if (issued) await sendPasswordResetMail({ to: issued.user.email, name: issued.user.name, token: issued.token, expiresAt: issued.expiresAt });
  });
}

/** Sets a new password with a reset token, then sends the user to sign in with it. */
export async function resetPasswordAction(_previous: PasswordResetState, formData: FormData): Promise<PasswordResetState> {
  const fields = readFields(formData, ["token", "password", "confirmPassword"]);
  const kept = { token: fields.token };
  const parsed = parseFields(passwordResetSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, kept);
  try {
    await resetPasswordWithToken(null, parsed.data.token, parsed.data.password);
  } catch (error) {
    return errorState(error, kept);
  }
  redirect("/sign-in?reset=1");
}

/**
 * Validates the e-mail and answers `sentMessage` whether or not the account exists. Issuing the
 * token and sending the mail happen after the answer, so neither the answer nor its timing differs
 * between known and unknown addresses.
 */
async function requestEmailedLink(
  formData: FormData,
  sentMessage: string,
  what: string,
  issueAndSend: (email: string) => Promise<void>,
): Promise<EmailRequestState> {
  const fields = readFields(formData, ["email"]);
  const parsed = parseFields(emailRequestSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, fields);
  try {
    // At most a few links per address per quarter hour (lib/server/sign-in-limit.ts), account or not.
    const refused = await limitEmailedLinks(parsed.data.email);
    if (refused) return { status: "error", message: refused, fieldErrors: {}, values: fields };
  } catch (error) {
    return errorState(error, fields);
  }
  sendMailInBackground(what, () => issueAndSend(parsed.data.email));
  return { status: "success", message: sentMessage, fieldErrors: {}, values: fields };
}
