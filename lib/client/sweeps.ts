/**
 * react-query factories and mutations for sweeps. The sweep page polls the sweep while it runs
 * (progress) and reloads its points less often the more there are.
 */
import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { SuggestedSweepDto, SweepDetailDto, SweepDto } from "@/db/queries/sweeps";
import { apiFetch, type Jsonified } from "@/lib/client/api-client";
import type { SweepPointColumns } from "@/lib/sweeps";
import type { StartSweepBody } from "@/lib/validations/sweep";

export type SweepJson = Jsonified<SweepDto>;
export type SweepDetailJson = Jsonified<SweepDetailDto>;
export type SuggestedSweepJson = Jsonified<SuggestedSweepDto>;
export type SweepPointsJson = SweepPointColumns & { totalPoints: number };

/** How often a running sweep's progress is read, in ms. */
export const sweepProgressIntervalMs = 1_000;

/**
 * How often a running sweep's points are reloaded: every 2 s for small sweeps, up to every 20 s
 * for 200,000 points, so the table keeps up without refetching megabytes each second.
 */
export function sweepPointsIntervalMs(totalPoints: number): number {
  return Math.min(20_000, Math.max(2_000, Math.round(totalPoints / 10)));
}

/** Query factories: `useQuery(sweepQueries.detail(id))`. */
export const sweepQueries = {
  all: () => ["sweeps"] as const,
  list: (configurationId: string) =>
    queryOptions({
      queryKey: [...sweepQueries.all(), "list", configurationId] as const,
      queryFn: () => apiFetch<{ items: SweepJson[]; suggested: SuggestedSweepJson[] }>(`/api/configurations/${configurationId}/sweeps`),
    }),
  detail: (sweepId: string) =>
    queryOptions({
      queryKey: [...sweepQueries.all(), "detail", sweepId] as const,
      queryFn: () => apiFetch<SweepDetailJson>(`/api/sweeps/${sweepId}`),
    }),
  points: (sweepId: string) =>
    queryOptions({
      queryKey: [...sweepQueries.all(), "points", sweepId] as const,
      queryFn: () => apiFetch<SweepPointsJson>(`/api/sweeps/${sweepId}/points`),
      placeholderData: (previous) => previous,
    }),
};

/** Starts a sweep of a configuration's current revision. */
export function useStartSweep(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: StartSweepBody) =>
      apiFetch<SweepJson>(`/api/configurations/${configurationId}/sweeps`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      }),
    onSuccess: () => void client.invalidateQueries({ queryKey: sweepQueries.list(configurationId).queryKey }),
  });
}

/** Cancels or resumes a sweep. */
export function useSweepControl(sweepId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (action: "cancel" | "resume") => apiFetch<SweepJson>(`/api/sweeps/${sweepId}/${action}`, { method: "POST" }),
    onSuccess: () => void client.invalidateQueries({ queryKey: sweepQueries.all() }),
  });
}
