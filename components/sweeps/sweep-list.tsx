"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TableBody, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import { sweepProgressIntervalMs, sweepQueries, type SuggestedSweepJson, type SweepJson } from "@/lib/client/sweeps";
import { formatDateTime } from "@/lib/format-date";
import { dimensionLabel, formatPointCount } from "@/lib/sweeps";
import { SweepStatusBadge } from "./sweep-status-badge";

export interface SweepListProps {
  configurationId: string;
  initial: { items: SweepJson[]; suggested: SuggestedSweepJson[] };
}

/** The configuration's sweeps, newest first, refreshed while any runs. */
export function SweepList({ configurationId, initial }: SweepListProps) {
  const list = useQuery({
    ...sweepQueries.list(configurationId),
    initialData: initial,
    refetchInterval: (query) => (query.state.data?.items.some((sweep) => sweep.status === "running") ? sweepProgressIntervalMs * 2 : false),
  });
  const items = list.data.items;
  if (items.length === 0) {
    return <EmptyState title="No sweeps yet" description="Define one below: pick what to vary, see how many points it makes, and start it." />;
  }
  return (
    <Table>
      <TableHeader>
        <TableRow>
          <TableHead>Sweep</TableHead>
          <TableHead>Status</TableHead>
          <TableHead className="text-right">Points</TableHead>
          <TableHead>Started by</TableHead>
          <TableHead>When</TableHead>
        </TableRow>
      </TableHeader>
      <TableBody>
        {items.map((sweep) => (
          <TableRow key={sweep.id}>
            <TableCell>
              <Link href={`/configurations/${configurationId}/sweeps/${sweep.id}`} className="font-medium text-accent hover:underline">
                {sweep.title || sweep.definition.dimensions.map(dimensionLabel).join("; ")}
              </Link>
              {sweep.attachedToStarter ? <span className="ml-2 text-xs text-muted-foreground">offered to students</span> : null}
            </TableCell>
            <TableCell>
              <SweepStatusBadge status={sweep.status} />
            </TableCell>
            <TableCell className="text-right tabular">
              {formatPointCount(sweep.donePoints)} / {formatPointCount(sweep.totalPoints)}
            </TableCell>
            <TableCell>{sweep.createdBy.name}</TableCell>
            <TableCell className="whitespace-nowrap text-muted-foreground">{formatDateTime(sweep.createdAt)}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
