"use client";

import { useMemo, useState } from "react";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { Sector } from "@/lib/boundary/types";
import { degeneracyRows } from "@/lib/designer/plot-data";
import { formatNumber, formatPair, pairKey } from "@/lib/spectrum";
import { axisStyle, horizontalAxisLabel, tooltipContentStyle, verticalAxisLabel } from "./chart-style";

export interface DegeneracyPlotProps {
  sectors: Sector[];
}

const kinds = [
  { key: "NS", stroke: "#2f6f9f", dash: "" },
  { key: "R", stroke: "#b5542c", dash: "6 3" },
  { key: "bosonic", stroke: "#3f8f5a", dash: "" },
] as const;

/** log10 of the number of states (with Chan-Paton factors) against the level, for a chosen sector. */
export function DegeneracyPlot({ sectors }: DegeneracyPlotProps) {
  const [index, setIndex] = useState(0);
  const sector = sectors[Math.min(index, sectors.length - 1)];
  const rows = useMemo(() => (sector ? degeneracyRows(sector) : []), [sector]);
  if (!sector) return null;
  const present = kinds.filter((k) => rows.some((r) => r[k.key] !== undefined));
  return (
    <figure className="grid gap-2">
      <label className="flex items-center gap-2 text-xs">
        <span className="text-muted-foreground">Sector</span>
        <select
          value={index}
          onChange={(event) => setIndex(Number(event.target.value))}
          className="h-7 rounded border border-border-strong bg-surface px-1 font-mono"
        >
          {sectors.map((s, i) => (
            <option key={pairKey(...s.pair)} value={i}>
              {formatPair(s.pair)}
            </option>
          ))}
        </select>
      </label>
      <div className="h-64 w-full">
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
