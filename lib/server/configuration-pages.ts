import "server-only";
import { forbidden, notFound } from "next/navigation";
import { cache } from "react";
import { roleAtLeast, type Actor } from "@/db/queries/actor";
import { configurationExistsForSignedIn } from "@/db/queries/configuration-access";
import { getConfiguration } from "@/db/queries/configurations";
import { type ConfigurationDto } from "@/db/queries/configuration-dtos";
import { listGroupsForUser } from "@/db/queries/groups";
import { ForbiddenError, NotFoundError } from "@/lib/errors";

/**
 * The configuration for a page (read once per request: the layout and the page share it). A
 * configuration that does not exist or was deleted renders the not-found page with HTTP 404; one
 * that exists but the reader may not see renders the forbidden page with HTTP 403.
 */
export const getConfigurationOrNotFound = cache(async (actor: Actor, configurationId: string): Promise<ConfigurationDto> => {
  try {
    return await getConfiguration(actor, configurationId);
  } catch (error) {
    if (error instanceof ForbiddenError) forbidden();
    if (error instanceof NotFoundError) {
      if (await configurationExistsForSignedIn(actor, configurationId).catch(() => false)) forbidden();
      notFound();
    }
    throw error;
  }
});

/** Spaces where the user may create or fork configurations (editor or owner), personal space first. */
export async function listWritableGroups(actor: Actor): Promise<Array<{ id: string; name: string; kind: string }>> {
  const groups = await listGroupsForUser(actor);
  return groups
    .filter((group) => roleAtLeast(group.role, "editor"))
    .sort((a, b) => Number(b.kind === "personal") - Number(a.kind === "personal") || a.name.localeCompare(b.name))
    .map((group) => ({ id: group.id, name: group.name, kind: group.kind }));
}
