"use server";

import { revalidatePath } from "next/cache";
import { setSiteRole } from "@/db/queries/users";
import { errorState, invalidState, parseFields, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { getCurrentUser } from "@/lib/server/session";
import { siteRoleChangeSchema } from "@/lib/validations/auth";

export type SiteRoleState = ActionState<FieldsOf<typeof siteRoleChangeSchema>>;

/** Changes a user's site role; the DAL re-checks that the caller is an admin and keeps one admin. */
export async function changeSiteRoleAction(_previous: SiteRoleState, formData: FormData): Promise<SiteRoleState> {
  const fields = readFields(formData, ["userId", "siteRole"]);
  const parsed = parseFields(siteRoleChangeSchema, fields);
  if (!parsed.success) return invalidState(parsed.error.issues, fields);
  try {
    const updated = await setSiteRole(await getCurrentUser(), parsed.data.userId, parsed.data.siteRole);
    revalidatePath("/admin");
    return { status: "success", message: `${updated.name} is now ${updated.siteRole === "admin" ? "an admin" : "a member"}.`, fieldErrors: {}, values: fields };
  } catch (error) {
    return errorState(error, fields);
  }
}
