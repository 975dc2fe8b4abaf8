"use server";

import { revalidatePath } from "next/cache";
import { restoreRevision } from "@/db/queries/revisions";
import { errorState } from "@/lib/action-state";
import { getCurrentUser } from "@/lib/server/session";

/**
 * Restores an old revision as a new revision (editors and owners); the DAL reuses its stored result
 * when the current engine computed it and recomputes it otherwise. `expectedVersion` guards against restoring over a save made meanwhile.
 */
export async function restoreRevisionAction(
  configurationId: string,
  revisionId: string,
  expectedVersion: number,
): Promise<{ error: string } | { restoredAs: number }> {
  try {
    const actor = await getCurrentUser();
    const restored = await restoreRevision(actor, configurationId, revisionId, { expectedVersion });
    revalidatePath(`/configurations/${configurationId}`, "layout");
    return { restoredAs: restored.version };
  } catch (error) {
    return { error: errorState(error).message ?? "The revision could not be restored." };
  }
}
