"use client";

import { useQuery } from "@tanstack/react-query";
import { useEffect, useMemo, useState } from "react";
import { ConventionsNote } from "@/components/designer/conventions-note";
import { Alert } from "@/components/ui/alert";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Skeleton } from "@/components/ui/skeleton";
import { sweepPointsIntervalMs, sweepProgressIntervalMs, sweepQueries, type SweepDetailJson } from "@/lib/client/sweeps";
import { dimensionLabel, toPointRows } from "@/lib/sweeps";
import { SweepMassPlot } from "./sweep-mass-plot";
import { SweepPointPanel } from "./sweep-point-panel";
import { SweepPointsTable } from "./sweep-points-table";
import { SweepProgress } from "./sweep-progress";
import { SweepVerdictMap } from "./sweep-verdict-map";

export interface SweepViewProps {
  initial: SweepDetailJson;
  /** The caller's personal space (forks of points go there), or null. */
  personalGroupId: string | null;
}

/** The sweep page: live progress, the points table, the plot and the map, exports, and the selected point. */
export function SweepView({ initial, personalGroupId }: SweepViewProps) {
  const detail = useQuery({
    ...sweepQueries.detail(initial.id),
    initialData: initial,
    refetchInterval: (query) => (query.state.data?.status === "running" ? sweepProgressIntervalMs : false),
  });
  const sweep = detail.data;
  const running = sweep.status === "running";
  const points = useQuery({ ...sweepQueries.points(sweep.id), refetchInterval: running ? sweepPointsIntervalMs(sweep.totalPoints) : false });
  const { refetch } = points;
  // Read the last points once the sweep stops.
  useEffect(() => {
    if (!running) void refetch();
  }, [running, refetch]);

  const rows = useMemo(() => (points.data ? toPointRows(sweep.definition, points.data) : []), [points.data, sweep.definition]);
  const [selected, setSelected] = useState<number | null>(null);
  const selectedRow = useMemo(() => (selected === null ? null : (rows.find((row) => row.index === selected) ?? null)), [rows, selected]);

  return (
    <div className="grid gap-6">
      <Card aria-labelledby="sweep-progress-title">
        <CardHeader>
          <CardTitle id="sweep-progress-title">Progress</CardTitle>
          <CardDescription>
            Revision {sweep.revisionNumber}, varied over {sweep.definition.dimensions.map(dimensionLabel).join("; ")}.
          </CardDescription>
        </CardHeader>
        <CardContent>
          <SweepProgress sweep={sweep} />
          {detail.error ? <Alert variant="warning">Progress could not be refreshed: {detail.error.message}</Alert> : null}
        </CardContent>
      </Card>

      <Card aria-labelledby="sweep-points-title">
        <CardHeader>
          <CardTitle id="sweep-points-title">Points</CardTitle>
          <CardDescription>
            Export{" "}
            <a className="text-accent hover:underline" href={`/api/sweeps/${sweep.id}/export?format=csv`}>
              CSV
            </a>{" "}
            or{" "}
            <a className="text-accent hover:underline" href={`/api/sweeps/${sweep.id}/export?format=json`}>
              JSON
            </a>{" "}
            (with the conventions and the caution). Open a point to see it in the designer or fork it.
          </CardDescription>
        </CardHeader>
        <CardContent className="grid gap-4">
          {points.isPending ? (
            <Skeleton className="h-64" />
          ) : points.error ? (
            <Alert variant="danger">The points could not be loaded: {points.error.message}</Alert>
          ) : (
            <SweepPointsTable definition={sweep.definition} rows={rows} totalPoints={sweep.totalPoints} selected={selected} onSelect={setSelected} />
          )}
          {selectedRow ? (
            <SweepPointPanel
              configurationId={sweep.configurationId}
              revisionNumber={sweep.revisionNumber}
              revisionId={sweep.revisionId}
              base={sweep.document}
              definition={sweep.definition}
              point={selectedRow}
              canEdit={sweep.canControl}
              personalGroupId={personalGroupId}
            />
          ) : null}
          <ConventionsNote />
        </CardContent>
      </Card>

      <Card aria-labelledby="sweep-plot-title">
        <CardHeader>
          <CardTitle id="sweep-plot-title">Lightest mass</CardTitle>
        </CardHeader>
        <CardContent>
          <SweepMassPlot base={sweep.document} definition={sweep.definition} rows={rows} onSelect={setSelected} />
        </CardContent>
      </Card>

      <Card aria-labelledby="sweep-map-title">
        <CardHeader>
          <CardTitle id="sweep-map-title">Map</CardTitle>
          <CardDescription>Supersymmetric, tachyonic or neither, over two swept dimensions.</CardDescription>
        </CardHeader>
        <CardContent>
          <SweepVerdictMap definition={sweep.definition} rows={rows} selected={selected} onSelect={setSelected} />
        </CardContent>
      </Card>
    </div>
  );
}
