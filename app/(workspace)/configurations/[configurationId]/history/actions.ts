"use server";

import { revalidatePath } from "next/cache";
import { getRevision, restoreRevision } from "@/db/queries/configurations";
import { computeAuthoritativeResult } from "@/lib/server/configuration-handlers";
import { errorState } from "@/lib/action-state";
import { getCurrentUser } from "@/lib/server/session";

/**
 * Restores an old revision as a new revision (editors and owners), recomputing its result with
 * the current engine. `expectedVersion` guards against restoring over a save made meanwhile.
 */
export async function restoreRevisionAction(
  configurationId: string,
  revisionId: string,
  expectedVersion: number,
): Promise<{ error: string } | { restoredAs: number }> {
  try {
    const actor = await getCurrentUser();
    const revision = await getRevision(actor, revisionId);
    const { result, computeMs } = computeAuthoritativeResult(revision.document);
    const restored = await restoreRevision(actor, configurationId, revisionId, { expectedVersion, result, computeMs });
    revalidatePath(`/configurations/${configurationId}`, "layout");
    return { restoredAs: restored.version };
  } catch (error) {
    return { error: errorState(error).message ?? "The revision could not be restored." };
  }
}
