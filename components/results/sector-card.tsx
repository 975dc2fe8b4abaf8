"use client";

import { useQuery } from "@tanstack/react-query";
import dynamic from "next/dynamic";
import type { Sector, SectorKind } from "@/lib/boundary/types";
import { configurationQueries } from "@/lib/client/configurations";
import { formatEngineProse, formatMassSquared, formatNumber, type SectorNames, type SectorOverview } from "@/lib/spectrum";
import { Badge } from "@/components/ui/badge";
import { SectorLevelsTable } from "./sector-levels-table";
import { TowerPanel } from "./tower-panel";

const ModeExpansions = dynamic(() => import("./mode-expansions").then((m) => m.ModeExpansions), {
  ssr: false,
  loading: () => <p className="text-xs text-muted-foreground">Typesetting&hellip;</p>,
});

export interface SectorCardProps {
  configurationId: string;
  revisionId: string;
  sector: SectorOverview;
  open: boolean;
  onToggle: (open: boolean) => void;
  /** Whether the theory has supersymmetry to speak of (type II). */
  typeTwo: boolean;
  kind: SectorKind | "all";
  /** Rows with alpha' M^2 at zero separation (N + a) up to this value are listed. */
  massCap: number;
  showGeV: boolean;
  names: SectorNames;
}

/**
 * One sector of a stored result: its header from the overview, and, once opened, its level table,
 * massless content, notes and mode expansions, loaded for this sector alone.
 */
export function SectorCard({ configurationId, revisionId, sector, open, onToggle, typeTwo, kind, massCap, showGeV, names }: SectorCardProps) {
  const name = names.sector(sector.pair);
  const title = name.text;
  return (
    <details
      open={open}
      onToggle={(event) => onToggle(event.currentTarget.open)}
      className="rounded-lg border border-border bg-surface"
      data-testid={`sector-${sector.pair.join("-")}`}
    >
      <summary className="flex cursor-pointer flex-wrap items-center gap-x-4 gap-y-1 px-4 py-2 text-sm">
        <span className="font-semibold" title={name.ids === name.text ? undefined : `Stacks ${name.ids}`}>
          {title}
        </span>
        <span className="text-muted-foreground">
          NN {sector.nn} &middot; DD {sector.dd} &middot; &nu; = {sector.nu} &middot; y = {formatNumber(sector.separation)} &middot; Chan-Paton {sector.chanPaton}
        </span>
        <span className="font-mono text-xs text-muted-foreground">
          a:{" "}
          {Object.entries(sector.zeroPoint)
            .map(([k, v]) => `${k} ${formatMassSquared(v)}`)
            .join(", ")}
        </span>
        {sector.tachyonic ? (
          <Badge variant="danger" className="border-dashed border-danger">
            tachyon{sector.criticalSeparation !== null ? `, y_c = ${formatNumber(sector.criticalSeparation)}` : ""}
          </Badge>
        ) : null}
        {sector.orientifold?.imageOf ? <Badge variant="outline">with an image</Badge> : null}
        {sector.orientifold?.representation ? (
          <span className="text-xs text-muted-foreground" data-testid={`projection-${sector.pair.join("-")}`}>
            {sector.orientifold.representation}
          </span>
        ) : null}
        {typeTwo ? (
          <Badge variant={sector.supersymmetric ? "success" : "outline"}>{sector.supersymmetric ? "supersymmetric" : "no supersymmetry"}</Badge>
        ) : null}
      </summary>
      {open ? (
        <SectorDetail configurationId={configurationId} revisionId={revisionId} sector={sector} title={title} kind={kind} massCap={massCap} showGeV={showGeV} />
      ) : null}
    </details>
  );
}

interface SectorDetailProps {
  configurationId: string;
  revisionId: string;
  sector: SectorOverview;
  title: string;
  kind: SectorKind | "all";
  massCap: number;
  showGeV: boolean;
}

function SectorDetail({ configurationId, revisionId, sector, title, kind, massCap, showGeV }: SectorDetailProps) {
  const query = useQuery(configurationQueries.resultSector(configurationId, revisionId, sector.index));
  if (query.isPending) {
    return (
      <p className="border-t border-border px-4 py-3 text-xs text-muted-foreground" role="status">
        Loading the {sector.rowCount} level rows of {title}&hellip;
      </p>
    );
  }
  if (query.isError) {
    return (
      <p className="border-t border-border px-4 py-3 text-xs text-danger-soft-foreground" role="alert">
        The levels of {title} could not be loaded ({query.error.message}).{" "}
        <button type="button" className="underline" onClick={() => void query.refetch()}>
          Try again
        </button>
      </p>
    );
  }
  const detail: Sector = query.data;
  return (
    <div className="grid gap-3 border-t border-border px-4 py-3">
      <SectorLevelsTable
        caption={`Levels of sector ${title}`}
        rows={detail.levels}
        zeroPoint={detail.zeroPoint}
        kind={kind}
        massCap={massCap}
        showGeV={showGeV}
      />
      {detail.tower ? <TowerPanel sector={detail} title={title} kind={kind} showGeV={showGeV} /> : null}
      {detail.massless.length > 0 ? (
        <div className="text-xs">
          <h4 className="font-semibold">Massless content</h4>
          <ul className="list-disc pl-4 text-muted-foreground">
            {detail.massless.map((m) => (
              <li key={`${m.sector}-${m.description}`}>
                {m.sector}: {formatEngineProse(m.description)} (light-cone trace count {m.states}
                {m.withChanPaton ? `, ${m.withChanPaton} with Chan-Paton` : ""})
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {sector.multiplet ? (
        <p className="text-xs" data-testid={`multiplet-${sector.pair.join("-")}`}>
          <span className="font-semibold">Lightest multiplet:</span> {sector.multiplet.name} in {sector.multiplet.dimension} dimensions:{" "}
          {sector.multiplet.content} ({sector.multiplet.states} states, light-cone trace count), M&radic;&alpha;&prime; ={" "}
          <span className="font-mono">{formatNumber(sector.multiplet.mass)}</span>
        </p>
      ) : null}
      {detail.notes.length > 0 ? (
        <ul className="list-disc pl-4 text-xs text-muted-foreground">
          {detail.notes.map((n) => (
            <li key={n}>{formatEngineProse(n)}</li>
          ))}
        </ul>
      ) : null}
      <details className="text-xs">
        <summary className="cursor-pointer font-semibold">Mode expansions</summary>
        <div className="mt-2 overflow-x-auto">
          <ModeExpansions axes={detail.axes} />
        </div>
      </details>
    </div>
  );
}
