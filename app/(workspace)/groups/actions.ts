"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { setConfigurationStarter } from "@/db/queries/configurations";
import { forkConfiguration } from "@/db/queries/forks";
import { createGroup, getPersonalGroup } from "@/db/queries/groups";
import { errorState, invalidState, parseFields, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { getCurrentUser } from "@/lib/server/session";
import { createGroupSchema } from "@/lib/validations/group";

export type CreateGroupState = ActionState<FieldsOf<typeof createGroupSchema>>;
const createGroupFields = ["name", "slug", "description", "kind"] as const;

/** Creates a research group or lab owned by the signed-in user, then opens it. */
export async function createGroupAction(_previous: CreateGroupState, formData: FormData): Promise<CreateGroupState> {
  const values = readFields(formData, createGroupFields);
  const parsed = parseFields(createGroupSchema, values);
  if (!parsed.success) return invalidState(parsed.error.issues, values);
  let slug: string;
  try {
    const group = await createGroup(await getCurrentUser(), parsed.data);
    slug = group.slug;
  } catch (error) {
    return errorState(error, values);
  }
  revalidatePath("/dashboard");
  redirect(`/groups/${slug}`);
}

/** Forks a lab starter (or any configuration the user can read) into the user's personal space and opens the fork. */
export async function forkToPersonalSpaceAction(configurationId: string): Promise<{ error: string } | undefined> {
  let forkId: string;
  try {
    const actor = await getCurrentUser();
    const personal = await getPersonalGroup(actor);
    const fork = await forkConfiguration(actor, configurationId, { targetGroupId: personal.id });
    forkId = fork.id;
  } catch (error) {
    const state = errorState(error);
    return { error: state.message ?? "The fork could not be created." };
  }
  revalidatePath("/dashboard");
  redirect(`/configurations/${forkId}`);
}

/** Publishes a lab configuration as a starter, or withdraws it (lab owners). */
export async function setStarterAction(configurationId: string, isStarter: boolean, groupSlug: string): Promise<{ error: string } | undefined> {
  try {
    await setConfigurationStarter(await getCurrentUser(), configurationId, isStarter);
  } catch (error) {
    return { error: errorState(error).message ?? "The change could not be saved." };
  }
  revalidatePath(`/groups/${groupSlug}`);
  return undefined;
}
