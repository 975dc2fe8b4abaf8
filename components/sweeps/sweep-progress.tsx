"use client";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/client/api-client";
import { useSweepControl, type SweepDetailJson } from "@/lib/client/sweeps";
import { formatDuration, formatPointCount, formatRate } from "@/lib/sweeps";
import { SweepStatusBadge } from "./sweep-status-badge";

export interface SweepProgressProps {
  sweep: SweepDetailJson;
}

/** Points stored of the total, the rate and the time left, with cancel and resume. */
export function SweepProgress({ sweep }: SweepProgressProps) {
  const control = useSweepControl(sweep.id);
  const fraction = sweep.totalPoints > 0 ? sweep.donePoints / sweep.totalPoints : 0;
  const percent = Math.floor(fraction * 1000) / 10;
  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <SweepStatusBadge status={sweep.status} />
        <p className="text-sm" aria-live="polite" data-testid="sweep-progress-text">
          <strong className="font-semibold tabular">{formatPointCount(sweep.donePoints)}</strong> of {formatPointCount(sweep.totalPoints)} points stored ({percent}%)
        </p>
        {sweep.canControl ? (
          <div className="ml-auto flex gap-2">
            {sweep.status === "running" ? (
              <Button size="sm" variant="secondary" pending={control.isPending} onClick={() => control.mutate("cancel")}>
                Cancel sweep
              </Button>
            ) : null}
            {sweep.status === "cancelled" || sweep.status === "failed" ? (
              <Button size="sm" pending={control.isPending} onClick={() => control.mutate("resume")}>
                Resume sweep
              </Button>
            ) : null}
          </div>
        ) : null}
      </div>
      <div
        role="progressbar"
        aria-label="Points stored"
        aria-valuemin={0}
        aria-valuemax={sweep.totalPoints}
        aria-valuenow={sweep.donePoints}
        className="h-2 w-full overflow-hidden rounded-full bg-surface-muted"
      >
        <div className="h-full bg-accent transition-[width]" style={{ width: `${fraction * 100}%` }} />
      </div>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
        <div>
          <dt className="text-xs text-muted-foreground">Rate</dt>
          <dd className="tabular">{formatRate(sweep.pointsPerSecond)}</dd>
        </div>
        <div>
          <dt className="text-xs text-muted-foreground">Time left</dt>
          <dd className="tabular">{sweep.status === "running" ? formatDuration(sweep.secondsLeft) : "—"}</dd>
        </div>
        <div>
          <dt className="text-xs text-muted-foreground">Chunks</dt>
          <dd className="tabular">
            {sweep.chunkCount} {sweep.chunkCount === 1 ? "chunk" : "chunks"} of up to {sweep.chunkSize} points
          </dd>
        </div>
        <div>
          <dt className="text-xs text-muted-foreground">Started by</dt>
          <dd>{sweep.createdBy.name}</dd>
        </div>
      </dl>
      {sweep.status === "running" && sweep.donePoints === 0 ? (
        <p className="text-xs text-muted-foreground">Waiting for a worker to take the first chunk (workers run with `npm run worker`).</p>
      ) : null}
      {sweep.failure ? <Alert variant="danger" title="The sweep stopped">{sweep.failure}</Alert> : null}
      {control.error ? <Alert variant="danger">{control.error instanceof ApiError ? control.error.message : "The request failed."}</Alert> : null}
    </div>
  );
}
