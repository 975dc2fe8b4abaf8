/**
 * What a designer needs to know when the stored configuration moved past its draft: the stored
 * version now, the document the draft started from, and who saved what in between. Read through
 * react-query (lib/client/configurations.ts), fresh from the server.
 */
import type { QueryClient } from "@tanstack/react-query";
import type { Configuration } from "@/lib/boundary/types";
import { configurationQueries, type ConfigurationJson, type RevisionSummaryJson } from "./configurations";

/** The stored side of a stale draft. */
export interface StaleSave {
  latest: ConfigurationJson;
  /** The document of the version the draft was based on; null when that revision cannot be read. */
  base: Configuration | null;
  /** The saves after the draft's base, oldest first. */
  newer: RevisionSummaryJson[];
}

/** Reads the stored side of a draft based on `baseVersion` (the revision number it started from). */
export async function fetchStaleSave(client: QueryClient, configurationId: string, baseVersion: number): Promise<StaleSave> {
  const [latest, revisions] = await Promise.all([
    client.fetchQuery({ ...configurationQueries.detail(configurationId), staleTime: 0 }),
    client.fetchQuery({ ...configurationQueries.revisions(configurationId), staleTime: 0 }),
  ]);
  const baseRevision = revisions.items.find((revision) => revision.number === baseVersion);
  const base = baseRevision ? (await client.fetchQuery(configurationQueries.revision(configurationId, baseRevision.id))).document : null;
  const newer = revisions.items.filter((revision) => revision.number > baseVersion).sort((a, b) => a.number - b.number);
  return { latest, base, newer };
}
