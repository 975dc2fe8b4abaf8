"use client";

import { useMemo, useState } from "react";
import { CartesianGrid, Legend, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import { axisStyle, horizontalAxisLabel, tooltipContentStyle, verticalAxisLabel } from "@/components/results/chart-style";
import { Label } from "@/components/ui/label";
import { Select } from "@/components/ui/select";
import type { Configuration } from "@/lib/boundary/types";
import { formatNumber } from "@/lib/spectrum";
import { massPlotAxes, massPlotPoints, type PointVerdict, type SweepDefinition, type SweepPointRow } from "@/lib/sweeps";
import { verdictFill, verdictLabels } from "./verdict-style";

export interface SweepMassPlotProps {
  base: Configuration;
  definition: SweepDefinition;
  rows: SweepPointRow[];
  onSelect: (index: number) => void;
}

/** Most dots drawn; beyond it every n-th point is shown (the table has them all). */
const maxDots = 5_000;
const shapes: Record<PointVerdict, "circle" | "triangle" | "diamond" | "cross"> = {
  supersymmetric: "diamond",
  tachyonic: "triangle",
  neither: "circle",
  invalid: "cross",
};

/** The lightest alpha' M^2 of each point against a separation or a swept number; a dot opens its point. */
export function SweepMassPlot({ base, definition, rows, onSelect }: SweepMassPlotProps) {
  const axes = useMemo(() => massPlotAxes(base, definition), [base, definition]);
  const [choice, setChoice] = useState(0);
  const axis = axes[Math.min(choice, axes.length - 1)];
  const series = useMemo(() => {
    if (!axis) return [];
    const points = massPlotPoints(base, definition, rows, axis.axis);
    const stride = Math.max(1, Math.ceil(points.length / maxDots));
    const kept = points.filter((_point, i) => i % stride === 0);
    return (["supersymmetric", "tachyonic", "neither"] as const).map((verdict) => ({ verdict, points: kept.filter((point) => point.verdict === verdict) }));
  }, [axis, base, definition, rows]);

  if (!axis) {
    return <p className="text-sm text-muted-foreground">This sweep moves no stack and sweeps no number, so there is no separation to plot against.</p>;
  }
  return (
    <figure className="grid gap-2">
      <div className="grid max-w-md gap-1.5">
        <Label htmlFor="mass-plot-axis">Horizontal axis</Label>
        <Select id="mass-plot-axis" value={String(choice)} onChange={(event) => setChoice(Number(event.target.value))}>
          {axes.map((option, i) => (
            <option key={option.label} value={i}>
              {option.label}
            </option>
          ))}
        </Select>
      </div>
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <ScatterChart margin={{ top: 12, right: 24, bottom: 28, left: 8 }}>
            <CartesianGrid strokeDasharray="2 4" stroke="var(--border)" />
            <XAxis dataKey="x" type="number" name={axis.label} tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })} label={horizontalAxisLabel(axis.label)} {...axisStyle} />
            <YAxis dataKey="y" type="number" name="α′M²" tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })} label={verticalAxisLabel("lightest \u03b1\u2032M\u00b2")} {...axisStyle} />
            <Tooltip
              contentStyle={tooltipContentStyle}
              formatter={(value) => (typeof value === "number" ? formatNumber(value) : String(value))}
            />
            <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
            <ReferenceLine y={0} stroke="var(--muted-foreground)" strokeDasharray="4 2" />
            {series.map(({ verdict, points }) => (
              <Scatter
                key={verdict}
                name={verdictLabels[verdict]}
                data={points}
                fill={verdictFill[verdict]}
                shape={shapes[verdict]}
                isAnimationActive={false}
                onClick={(item) => {
                  const payload: unknown = item.payload;
                  if (typeof payload === "object" && payload !== null && "index" in payload && typeof payload.index === "number") onSelect(payload.index);
                }}
              />
            ))}
          </ScatterChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-xs text-muted-foreground">
        Lightest α′M² of each computed point (α′ = 1, lengths in √α′); below the dashed line the point is tachyonic. Click a dot to open its point.
      </figcaption>
    </figure>
  );
}
