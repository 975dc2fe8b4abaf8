"use client";

import { useQuery } from "@tanstack/react-query";
import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { useDeferredValue, useMemo, useState } from "react";
import type { SectorKind } from "@/lib/boundary/types";
import { formatNumber, sectorNames } from "@/lib/spectrum";
import { formatDateTime } from "@/lib/format-date";
import {
  configurationQueries,
  useForkConfiguration,
  type ConfigurationJson,
  type ResultHeadJson,
  type RevisionSummaryJson,
} from "@/lib/client/configurations";
import { Badge } from "@/components/ui/badge";
import { Button, ButtonLink } from "@/components/ui/button";
import { ExportMenu } from "@/components/configurations/export-menu";
import { ConventionsNote } from "@/components/designer/conventions-note";
import { ForkDialog, type WritableGroup } from "@/components/designer/fork-dialog";
import { ForkedFromNote } from "@/components/designer/forked-from-note";
import type { Configuration } from "@/lib/boundary/types";
import { LightestStatesTable } from "./lightest-states-table";
import { OrientifoldPanel } from "./orientifold-panel";
import { SectorList } from "./sector-list";
import { SpectrumSummary } from "./spectrum-summary";
import { WorldvolumeTable } from "./worldvolume-table";

const MassPlot = dynamic(() => import("./mass-plot").then((m) => m.MassPlot), {
  ssr: false,
  loading: () => <div className="h-72 animate-pulse rounded-md bg-border/50" />,
});
const InteractionPlot = dynamic(() => import("./interaction-plot").then((m) => m.InteractionPlot), {
  ssr: false,
  loading: () => <div className="h-64 animate-pulse rounded-md bg-border/50" />,
});
const DegeneracyPlot = dynamic(() => import("./degeneracy-plot").then((m) => m.DegeneracyPlot), {
  ssr: false,
  loading: () => <div className="h-64 animate-pulse rounded-md bg-border/50" />,
});

export interface ResultsViewProps {
  configuration: ConfigurationJson;
  revisions: RevisionSummaryJson[];
  revision: RevisionSummaryJson;
  initialResult: ResultHeadJson;
  writableGroups: WritableGroup[];
  /** The revision's document (the interaction potentials are computed from it on demand). */
  document: Configuration;
}

/**
 * The results panel of one saved revision: summaries, per-sector tables with mode expansions,
 * plots, conventions, exports and forking.
 */
export function ResultsView({ configuration, revisions, revision, initialResult, writableGroups, document }: ResultsViewProps) {
  const router = useRouter();
  const { data: stored } = useQuery({ ...configurationQueries.resultHead(configuration.id, revision.id), initialData: initialResult });
  const { result, facts, massCurves, showGeV, firstPage, stacks } = stored;
  const names = useMemo(() => sectorNames(stacks), [stacks]);
  const [kind, setKind] = useState<SectorKind | "all">("all");
  // alpha' M^2 at zero separation (N + a) up to which the tables list rows; null lists every row.
  const [massCap, setMassCap] = useState<number | null>(null);
  const [search, setSearch] = useState("");
  const [onlyTachyonic, setOnlyTachyonic] = useState(false);
  const [forkOpen, setForkOpen] = useState(false);
  const fork = useForkConfiguration(configuration.id);
  const kinds: SectorKind[] = result.theory === "bosonic" ? ["bosonic"] : ["NS", "R"];
  // The list is filtered on the server; typing does not wait for it.
  const deferredSearch = useDeferredValue(search.trim());

  return (
    <div className="mx-auto grid w-full max-w-7xl gap-6 px-4 py-6 sm:px-6">
      <header className="flex flex-wrap items-end justify-between gap-4 border-b border-border pb-4">
        <div className="min-w-0">
          <div className="flex flex-wrap items-center gap-2 text-xs text-muted-foreground">
            <span>{configuration.group.kind === "personal" ? "Personal space" : configuration.group.name}</span>
            <Badge variant="outline">{result.theory}</Badge>
            <span>D = {result.dimension}</span>
            <ForkedFromNote forkedFrom={configuration.forkedFrom} />
          </div>
          <h1 className="text-2xl font-semibold tracking-tight">Results: {configuration.title}</h1>
          <p className="text-sm text-muted-foreground">
            Revision {revision.number} by {revision.author.name}, {formatDateTime(revision.createdAt)}
            {revision.message ? ` \u2014 \u201c${revision.message}\u201d` : ""}. Engine {stored.engineVersion}, computed in {formatNumber(stored.computeMs)} ms.
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <label className="flex items-center gap-1 text-xs">
            <span className="text-muted-foreground">Revision</span>
            <select
              value={revision.id}
              onChange={(event) => router.push(`/configurations/${configuration.id}/results?revision=${event.target.value}`)}
              className="h-8 rounded border border-border-strong bg-surface px-1 text-sm"
              aria-label="Revision"
            >
              {revisions.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.number}
                  {r.isCurrent ? " (current)" : ""}
                </option>
              ))}
            </select>
          </label>
          <ButtonLink href={`/configurations/${configuration.id}`} variant="secondary" size="sm">
            Open in designer
          </ButtonLink>
          <Button variant="secondary" size="sm" onClick={() => setForkOpen(true)} disabled={writableGroups.length === 0}>
            Fork
          </Button>
          <ExportMenu configurationId={configuration.id} revisionId={revision.id} />
        </div>
      </header>

      <section aria-labelledby="summary-title">
        <h2 id="summary-title" className="sr-only">
          Summary
        </h2>
        <SpectrumSummary facts={facts} stacks={stacks} />
      </section>

      <section aria-labelledby="worldvolumes-title" className="grid gap-2">
        <h2 id="worldvolumes-title" className="text-lg font-semibold">
          Worldvolume theories
        </h2>
        <WorldvolumeTable worldvolumes={result.worldvolumes} />
      </section>

      {result.orientifold ? (
        <section aria-labelledby="orientifold-title" className="grid gap-2">
          <h2 id="orientifold-title" className="text-lg font-semibold">
            Orientifold plane and tadpoles
          </h2>
          <OrientifoldPanel summary={result.orientifold} />
        </section>
      ) : null}

      {result.warnings.length > 0 ? (
        <ul className="list-disc space-y-1 rounded-md border border-warning/40 bg-warning-soft py-2 pr-3 pl-7 text-sm text-warning-soft-foreground">
          {result.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      ) : null}

      <section aria-labelledby="lightest-title" className="grid gap-2">
        <h2 id="lightest-title" className="text-lg font-semibold">
          Lightest states
        </h2>
        <LightestStatesTable states={result.lightest} stacks={stacks} label="Lightest states" data-testid="lightest-table" />
      </section>

      <section aria-labelledby="plots-title" className="grid gap-4">
        <h2 id="plots-title" className="text-lg font-semibold">
          Plots
        </h2>
        <div className="grid gap-4 lg:grid-cols-2">
          <div className="rounded-lg border border-border bg-surface p-4">
            <h3 className="mb-2 text-sm font-semibold">&alpha;&prime;M&sup2; against separation</h3>
            <MassPlot curves={massCurves} />
          </div>
          <div className="rounded-lg border border-border bg-surface p-4">
            <h3 className="mb-2 text-sm font-semibold">Degeneracy against level</h3>
            <DegeneracyPlot configurationId={configuration.id} revisionId={revision.id} sectors={firstPage.items} total={firstPage.total} names={names} />
          </div>
          <div className="rounded-lg border border-border bg-surface p-4 lg:col-span-2">
            <h3 className="mb-2 text-sm font-semibold">Interaction potential V(y) from the annulus</h3>
            <InteractionPlot document={document} />
          </div>
        </div>
      </section>

      <section aria-labelledby="sectors-title" className="grid gap-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="sectors-title" className="text-lg font-semibold">
            Sectors
          </h2>
          <div role="group" aria-label="Filter the sector tables" className="flex flex-wrap items-center gap-3 text-xs">
            <label className="flex items-center gap-1">
              <span className="text-muted-foreground">Stack</span>
              <input
                type="search"
                value={search}
                onChange={(event) => setSearch(event.target.value)}
                placeholder="label or id"
                className="h-8 w-28 rounded border border-border-strong bg-surface px-2"
                aria-label="Show sectors of stacks whose label or id contains"
              />
            </label>
            <label className="flex items-center gap-1">
              <span className="text-muted-foreground">Kind</span>
              <select value={kind} onChange={(event) => setKind(event.target.value as SectorKind | "all")} className="h-8 rounded border border-border-strong bg-surface px-1">
                <option value="all">all</option>
                {kinds.map((k) => (
                  <option key={k} value={k}>
                    {k}
                  </option>
                ))}
              </select>
            </label>
            <label className="flex items-center gap-1">
              <span className="text-muted-foreground">Up to &alpha;&prime;M&sup2; at y = 0</span>
              <input
                type="number"
                min={-1}
                step={0.5}
                value={massCap ?? ""}
                placeholder="all"
                onChange={(event) => setMassCap(event.target.value === "" ? null : Number(event.target.value))}
                className="h-8 w-16 rounded border border-border-strong bg-surface px-2"
                aria-label="Show levels up to alpha' M squared at zero separation"
              />
            </label>
            <label className="flex items-center gap-1">
              <input type="checkbox" checked={onlyTachyonic} onChange={(event) => setOnlyTachyonic(event.target.checked)} />
              <span>Tachyonic only</span>
            </label>
          </div>
        </div>
        <SectorList
          configurationId={configuration.id}
          revisionId={revision.id}
          filter={{ search: deferredSearch, tachyonicOnly: onlyTachyonic }}
          firstPage={firstPage}
          typeTwo={result.supercharges !== null}
          kind={kind}
          massCap={massCap ?? Number.POSITIVE_INFINITY}
          showGeV={showGeV}
          names={names}
        />
      </section>

      <ConventionsNote full />

      {forkOpen ? (
        <ForkDialog
          open
          onOpenChange={setForkOpen}
          groups={writableGroups}
          defaultTitle={`${configuration.title} (fork)`}
          sourceLabel={`revision ${revision.number}`}
          pending={fork.isPending}
          error={fork.error?.message ?? null}
          onFork={(input) =>
            fork.mutate({ ...input, revisionId: revision.id }, { onSuccess: (created) => router.push(`/configurations/${created.id}`) })
          }
        />
      ) : null}
    </div>
  );
}
