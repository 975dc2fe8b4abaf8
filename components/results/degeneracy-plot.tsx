"use client";

import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { configurationQueries } from "@/lib/client/configurations";
import { degeneracyRows } from "@/lib/designer/plot-data";
import { formatNumber, pairKey, type SectorNames, type SectorOverview } from "@/lib/spectrum";
import { axisStyle, horizontalAxisLabel, tooltipContentStyle, verticalAxisLabel } from "./chart-style";

export interface DegeneracyPlotProps {
  configurationId: string;
  revisionId: string;
  /** The sectors to choose from (the first page of the result's sectors). */
  sectors: SectorOverview[];
  /** How many sectors the result has in all. */
  total: number;
  names: SectorNames;
}

const kinds = [
  { key: "NS", stroke: "#2f6f9f", dash: "" },
  { key: "R", stroke: "#b5542c", dash: "6 3" },
  { key: "bosonic", stroke: "#3f8f5a", dash: "" },
] as const;

/** log10 of the number of states (with Chan-Paton factors) against the level, for a chosen sector (loaded on its own). */
export function DegeneracyPlot({ configurationId, revisionId, sectors, total, names }: DegeneracyPlotProps) {
  const [index, setIndex] = useState(0);
  const chosen = sectors[Math.min(index, sectors.length - 1)];
  const detail = useQuery({ ...configurationQueries.resultSector(configurationId, revisionId, chosen?.index ?? 0), enabled: chosen !== undefined });
  const rows = useMemo(() => (detail.data ? degeneracyRows(detail.data) : []), [detail.data]);
  if (!chosen) return null;
  const present = kinds.filter((k) => rows.some((r) => r[k.key] !== undefined));
  return (
    <figure className="grid gap-2">
      <label className="flex items-center gap-2 text-xs">
        <span className="text-muted-foreground">Sector</span>
        <select
          value={index}
          onChange={(event) => setIndex(Number(event.target.value))}
          className="h-7 rounded border border-border-strong bg-surface px-1"
        >
          {sectors.map((s, i) => (
            <option key={pairKey(...s.pair)} value={i}>
              {names.sector(s.pair).text}
            </option>
          ))}
        </select>
        {total > sectors.length ? <span className="text-muted-foreground">(the first {sectors.length} of {total}; open any sector below for its table)</span> : null}
      </label>
      {detail.isError ? (
        <p className="text-xs text-danger-soft-foreground" role="alert">
          The levels of {names.sector(chosen.pair).text} could not be loaded ({detail.error.message}).
        </p>
      ) : null}
      <div className="h-64 w-full" aria-busy={detail.isPending}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={{ top: 8, right: 24, bottom: 28, left: 8 }}>
            <CartesianGrid strokeDasharray="2 4" stroke="var(--border)" />
            <XAxis
              dataKey="level"
              type="number"
              domain={["dataMin", "dataMax"]}
              label={horizontalAxisLabel("level N")}
              {...axisStyle}
            />
            <YAxis
              tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })}
              label={verticalAxisLabel("log\u2081\u2080 states")}
              {...axisStyle}
            />
            <Tooltip
              formatter={(value) => (typeof value === "number" ? formatNumber(value) : String(value))}
              labelFormatter={(value) => `N = ${String(value)}`}
              contentStyle={tooltipContentStyle}
            />
            <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
            {present.map((kind) => (
              <Line
                key={kind.key}
                dataKey={kind.key}
                name={kind.key}
                type="linear"
                stroke={kind.stroke}
                strokeDasharray={kind.dash}
                strokeWidth={2}
                dot={{ r: 3 }}
                connectNulls
                isAnimationActive={false}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-xs text-muted-foreground">
        log&#8321;&#8320; of the states at each level, over both orientations and all Chan-Paton labels, after the GSO projection.
      </figcaption>
    </figure>
  );
}
