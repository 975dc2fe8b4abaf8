/**
 * react-query factories and fetchers for configurations, revisions and stored results.
 * The browser reads and writes configurations only through these.
 */
import { infiniteQueryOptions, queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { ConfigurationDto, ConfigurationPage, ConfigurationSummaryDto, ResultDto, RevisionDto, RevisionSummaryDto } from "@/db/queries/configuration-dtos";
import type { ResultHeadDto } from "@/db/queries/result-reads";
import type { Configuration, Sector } from "@/lib/boundary/types";
import type { SectorOverviewPage } from "@/lib/spectrum";
import { apiFetch, type Jsonified } from "@/lib/client/api-client";
import type { ListConfigurationsQuery } from "@/lib/validations/configuration-api";

export type ConfigurationJson = Jsonified<ConfigurationDto>;
export type ConfigurationSummaryJson = Jsonified<ConfigurationSummaryDto>;
export type RevisionSummaryJson = Jsonified<RevisionSummaryDto>;
export type RevisionJson = Jsonified<RevisionDto>;
export type ResultJson = Jsonified<ResultDto>;
export type ResultHeadJson = Jsonified<ResultHeadDto>;
export type SectorOverviewPageJson = Jsonified<SectorOverviewPage>;

/** Sector overviews fetched per page of the results page's list. */
export const sectorPageSize = 100;
export type ConfigurationPageJson = Jsonified<ConfigurationPage> & { page: number; pageSize: number };

/** Filters of a configuration list, as sent in the query string. */
export type ConfigurationListParams = Partial<Omit<ListConfigurationsQuery, "starter">> & { starter?: boolean };

function toSearch(params: ConfigurationListParams): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value === undefined || value === null || value === "") continue;
    search.set(key, String(value));
  }
  const text = search.toString();
  return text ? `?${text}` : "";
}

/** Query factories: `useQuery(configurationQueries.detail(id))`. */
export const configurationQueries = {
  all: () => ["configurations"] as const,
  lists: () => [...configurationQueries.all(), "list"] as const,
  list: (params: ConfigurationListParams) =>
    queryOptions({
      queryKey: [...configurationQueries.lists(), params] as const,
      queryFn: () => apiFetch<ConfigurationPageJson>(`/api/configurations${toSearch(params)}`),
      placeholderData: (previous) => previous,
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...configurationQueries.all(), "detail", id] as const,
      queryFn: () => apiFetch<ConfigurationJson>(`/api/configurations/${id}`),
    }),
  revisions: (id: string) =>
    queryOptions({
      queryKey: [...configurationQueries.all(), "revisions", id] as const,
      queryFn: () => apiFetch<{ items: RevisionSummaryJson[] }>(`/api/configurations/${id}/revisions`),
    }),
  revision: (id: string, revisionId: string) =>
    queryOptions({
      queryKey: [...configurationQueries.all(), "revision", id, revisionId] as const,
      queryFn: () => apiFetch<RevisionJson>(`/api/configurations/${id}/revisions/${revisionId}`),
      staleTime: Number.POSITIVE_INFINITY,
    }),
  resultHead: (id: string, revisionId: string) =>
    queryOptions({
      queryKey: [...configurationQueries.all(), "result-head", id, revisionId] as const,
      queryFn: () => apiFetch<ResultHeadJson>(`/api/configurations/${id}/revisions/${revisionId}/result/overview`),
      staleTime: Number.POSITIVE_INFINITY,
    }),
  resultSectorPages: (id: string, revisionId: string, filter: { search: string; tachyonicOnly: boolean }) =>
    infiniteQueryOptions({
      queryKey: [...configurationQueries.all(), "result-sector-pages", id, revisionId, filter] as const,
      queryFn: ({ pageParam }) => {
        const search = new URLSearchParams({ offset: String(pageParam), limit: String(sectorPageSize) });
        if (filter.search) search.set("search", filter.search);
        if (filter.tachyonicOnly) search.set("tachyonic", "true");
        return apiFetch<SectorOverviewPageJson>(`/api/configurations/${id}/revisions/${revisionId}/result/sectors?${search.toString()}`);
      },
      initialPageParam: 0,
      getNextPageParam: (last) => (last.offset + last.items.length < last.total ? last.offset + last.items.length : undefined),
      staleTime: Number.POSITIVE_INFINITY,
    }),
  resultSector: (id: string, revisionId: string, index: number) =>
    queryOptions({
      queryKey: [...configurationQueries.all(), "result-sector", id, revisionId, index] as const,
      queryFn: () => apiFetch<Sector>(`/api/configurations/${id}/revisions/${revisionId}/result/sectors/${index}`),
      // Revisions are immutable, and so are their stored results.
      staleTime: Number.POSITIVE_INFINITY,
    }),
  result: (id: string, revisionId: string) =>
    queryOptions({
      queryKey: [...configurationQueries.all(), "result", id, revisionId] as const,
      queryFn: () => apiFetch<ResultJson>(`/api/configurations/${id}/revisions/${revisionId}/result`),
      // Revisions are immutable, and so are their stored results.
      staleTime: Number.POSITIVE_INFINITY,
    }),
};

/** Creates a configuration; invalidates the lists. */
export function useCreateConfiguration() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { groupId: string; document: Configuration; message?: string }) =>
      apiFetch<ConfigurationJson>("/api/configurations", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(input),
      }),
    onSuccess: (created) => {
      client.setQueryData(configurationQueries.detail(created.id).queryKey, created);
      void client.invalidateQueries({ queryKey: configurationQueries.lists() });
    },
  });
}

/** Saves a new revision with a version check (409 -> ApiError with `currentVersion`). */
export function useUpdateConfiguration(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { document: Configuration; message: string; expectedVersion: number }) =>
      apiFetch<ConfigurationJson>(`/api/configurations/${id}`, {
        method: "PUT",
        headers: { "content-type": "application/json", "if-match": `"${input.expectedVersion}"` },
        body: JSON.stringify({ document: input.document, message: input.message }),
      }),
    onSuccess: (updated) => {
      client.setQueryData(configurationQueries.detail(id).queryKey, updated);
      void client.invalidateQueries({ queryKey: configurationQueries.revisions(id).queryKey });
      void client.invalidateQueries({ queryKey: configurationQueries.lists() });
    },
  });
}

/** Forks a configuration (optionally a given revision) into a group. */
export function useForkConfiguration(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { targetGroupId: string; revisionId?: string; title?: string; document?: Configuration }) =>
      apiFetch<ConfigurationJson>(`/api/configurations/${id}/fork`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(input),
      }),
    onSuccess: (fork) => {
      client.setQueryData(configurationQueries.detail(fork.id).queryKey, fork);
      void client.invalidateQueries({ queryKey: configurationQueries.lists() });
    },
  });
}

/** Soft-deletes a configuration. */
export function useDeleteConfiguration(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>(`/api/configurations/${id}`, { method: "DELETE" }),
    onSuccess: () => {
      client.removeQueries({ queryKey: configurationQueries.detail(id).queryKey });
      void client.invalidateQueries({ queryKey: configurationQueries.lists() });
    },
  });
}

/** Brings back a deleted configuration (the undo of `useDeleteConfiguration`). */
export function useUndeleteConfiguration(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<ConfigurationJson>(`/api/configurations/${id}/undelete`, { method: "POST" }),
    onSuccess: (configuration) => {
      client.setQueryData(configurationQueries.detail(id).queryKey, configuration);
      void client.invalidateQueries({ queryKey: configurationQueries.lists() });
    },
  });
}
