import "server-only";
import { notFound } from "next/navigation";
import { roleAtLeast, type Actor } from "@/db/queries/actor";
import { getConfiguration } from "@/db/queries/configurations";
import { type ConfigurationDto } from "@/db/queries/configuration-dtos";
import { listGroupsForUser } from "@/db/queries/groups";
import { NotFoundError } from "@/lib/errors";

/** The configuration for a page, or the route's not-found page when it does not exist or is hidden. */
export async function getConfigurationOrNotFound(actor: Actor, configurationId: string): Promise<ConfigurationDto> {
  try {
    return await getConfiguration(actor, configurationId);
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

/** Spaces where the user may create or fork configurations (editor or owner), personal space first. */
export async function listWritableGroups(actor: Actor): Promise<Array<{ id: string; name: string; kind: string }>> {
  const groups = await listGroupsForUser(actor);
  return groups
    .filter((group) => roleAtLeast(group.role, "editor"))
    .sort((a, b) => Number(b.kind === "personal") - Number(a.kind === "personal") || a.name.localeCompare(b.name))
    .map((group) => ({ id: group.id, name: group.name, kind: group.kind }));
}
