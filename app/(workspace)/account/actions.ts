"use server";

import { revalidatePath } from "next/cache";
import { signOutEverywhere } from "@/db/queries/sessions";
import { updateAccount } from "@/db/queries/users";
import { errorState, invalidState, parseFields, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { getCurrentUser } from "@/lib/server/session";
import { accountNameSchema, changePasswordSchema } from "@/lib/validations/auth";

export type AccountNameState = ActionState<FieldsOf<typeof accountNameSchema>>;
export type ChangePasswordState = ActionState<FieldsOf<typeof changePasswordSchema>>;

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
