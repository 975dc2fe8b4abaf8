"use server";

import { revalidatePath } from "next/cache";
import { createApiToken, revokeApiToken } from "@/db/queries/api-tokens";
import { signOutEverywhere } from "@/db/queries/sessions";
import { updateAccount } from "@/db/queries/users";
import { errorState, invalidState, parseFields, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { getCurrentUser } from "@/lib/server/session";
import { createApiTokenSchema } from "@/lib/validations/api-token";
import { accountNameSchema, changePasswordSchema } from "@/lib/validations/auth";

export type AccountNameState = ActionState<FieldsOf<typeof accountNameSchema>>;
export type ChangePasswordState = ActionState<FieldsOf<typeof changePasswordSchema>>;
/** The new-token form's state; `secret` is the token itself, present once, right after it was created. */
export type CreateApiTokenState = ActionState<FieldsOf<typeof createApiTokenSchema>> & { secret?: string; tokenName?: string };

export async function updateAccountNameAction(_previous: AccountNameState, formData: FormData): Promise<AccountNameState> {
  const fields = readFields(formData, ["name"]);
  const parsed = parseFields(accountNameSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, fields);
  try {
    await updateAccount(await getCurrentUser(), { name: parsed.data.name });
  } catch (error) {
    return errorState(error, fields);
  }
  revalidatePath("/", "layout");
  return { status: "success", message: "Your name has been saved.", fieldErrors: {}, values: { name: parsed.data.name } };
}

export async function changePasswordAction(_previous: ChangePasswordState, formData: FormData): Promise<ChangePasswordState> {
  const fields = readFields(formData, ["currentPassword", "newPassword", "confirmPassword"]);
  const parsed = parseFields(changePasswordSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues);
  try {
    await updateAccount(await getCurrentUser(), {
      currentPassword: parsed.data.currentPassword,
      newPassword: parsed.data.newPassword,
    });
  } catch (error) {
    return errorState(error);
  }
  return {
    status: "success",
    message: "Your password has been changed. Every other device that was signed in has been signed out.",
    fieldErrors: {},
    values: {},
  };
}

export type SignOutEverywhereState = ActionState<never>;

/** Ends every session of the account, this one included; the client then clears its own cookie. */
export async function signOutEverywhereAction(): Promise<SignOutEverywhereState> {
  try {
    await signOutEverywhere(await getCurrentUser());
  } catch (error) {
    return errorState(error);
  }
  return { status: "success", message: null, fieldErrors: {}, values: {} };
}

export async function createApiTokenAction(_previous: CreateApiTokenState, formData: FormData): Promise<CreateApiTokenState> {
  const fields = readFields(formData, ["name", "scope", "expiresInDays"]);
  const parsed = parseFields(createApiTokenSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, fields);
  let created: Awaited<ReturnType<typeof createApiToken>>;
  try {
    created = await createApiToken(await getCurrentUser(), parsed.data);
  } catch (error) {
    return errorState(error, fields);
  }
  revalidatePath("/account");
  return {
    status: "success",
    message: `Token "${created.token.name}" created. Copy it now: it is not shown again.`,
    fieldErrors: {},
    values: {},
    secret: created.secret,
    tokenName: created.token.name,
  };
}

export async function revokeApiTokenAction(tokenId: string): Promise<ActionState> {
  try {
    const revoked = await revokeApiToken(await getCurrentUser(), tokenId);
    revalidatePath("/account");
    return { status: "success", message: `Token "${revoked.name}" revoked.`, fieldErrors: {}, values: {} };
  } catch (error) {
    return errorState(error);
  }
}
