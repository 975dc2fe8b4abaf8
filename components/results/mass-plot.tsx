"use client";

import { useMemo } from "react";
import { CartesianGrid, ComposedChart, Legend, Line, ReferenceDot, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { massCurvePoints, type MassCurve } from "@/lib/designer/plot-data";
import { formatNumber } from "@/lib/spectrum";
import { axisStyle, horizontalAxisLabel, tooltipContentStyle, verticalAxisLabel } from "./chart-style";

export interface MassPlotProps {
  /** `massCurves` of the pairs of distinct stacks (lib/designer/plot-data.ts); the server sends them with the result. */
  curves: readonly MassCurve[];
}

/** Line colours and dash patterns, so curves differ without colour too. */
const strokes = ["#2f6f9f", "#b5542c", "#3f8f5a", "#7a4fa3", "#a8832a", "#2a8a8a", "#9c3d63", "#56606b"];
const dashes = ["", "6 3", "2 3", "10 3 2 3", "1 2", "12 4"];

/**
 * alpha' M^2 of each sector's lightest state against the separation y, with the zero line,
 * the tachyon crossings y_c and the actual separations marked.
 */
export function MassPlot({ curves: allCurves }: MassPlotProps) {
  const curves = useMemo(() => allCurves.slice(0, strokes.length * dashes.length), [allCurves]);
  const { rows, yMax } = useMemo(() => massCurvePoints(curves), [curves]);
  // The actual separations as one scatter series: hundreds of separate reference dots would each
  // register with the chart and cost a re-render of every other one.
  const marks = useMemo(
    () =>
      curves.flatMap((curve, index) =>
        curve.sectors.map((sector): SeparationMark => ({
          y: sector.separation,
          mark: (sector.separation / (2 * Math.PI)) ** 2 + curve.intercept,
          fill: strokes[index % strokes.length] ?? "currentColor",
        })),
      ),
    [curves],
  );
  if (curves.length === 0) {
    return <p className="text-sm text-muted-foreground">A single stack has no separations to plot.</p>;
  }
  return (
    <figure className="grid gap-2">
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 12, right: 24, bottom: 28, left: 8 }}>
            <CartesianGrid strokeDasharray="2 4" stroke="var(--border)" />
            <XAxis
              dataKey="y"
              type="number"
              domain={[0, yMax]}
              tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })}
              label={horizontalAxisLabel("separation y (\u221a\u03b1\u2032)")}
              {...axisStyle}
            />
            <YAxis
              tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })}
              label={verticalAxisLabel("\u03b1\u2032M\u00b2")}
              {...axisStyle}
            />
            <Tooltip
              formatter={(value) => (typeof value === "number" ? formatNumber(value) : String(value))}
              labelFormatter={(value) => `y = ${typeof value === "number" ? formatNumber(value) : String(value)}`}
              contentStyle={tooltipContentStyle}
            />
            <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
            <ReferenceLine y={0} stroke="var(--muted-foreground)" strokeDasharray="4 2" label={{ value: "massless", position: "insideTopRight", fontSize: 11, fill: "var(--muted-foreground)" }} />
            {curves.map((curve, i) => (
              <Line
                key={curve.key}
                dataKey={curve.key}
                name={curve.label}
                type="monotone"
                dot={false}
                stroke={strokes[i % strokes.length]}
                strokeDasharray={dashes[i % dashes.length]}
                strokeWidth={2}
                isAnimationActive={false}
              />
            ))}
            {curves.map((curve) =>
              curve.crossing !== null ? (
                <ReferenceDot
                  key={`yc-${curve.key}`}
                  x={curve.crossing}
                  y={0}
                  r={5}
                  fill="var(--danger)"
                  stroke="var(--surface)"
                  label={{ value: `y_c = ${formatNumber(curve.crossing)}`, position: "top", fontSize: 11, fill: "var(--danger)" }}
                  ifOverflow="extendDomain"
                />
              ) : null,
            )}
            <Scatter data={marks} dataKey="mark" shape={SeparationDot} legendType="none" tooltipType="none" isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-xs text-muted-foreground">
        Lightest state of each pair of distinct stacks: &alpha;&prime;M&sup2; = (y/2&pi;)&sup2; + N + a, one curve per value of N + a
        (exact). Dots mark the actual separations (of up to 240 pairs);
        red dots mark tachyon crossings y<sub>c</sub> = 2&pi;&radic;(&minus;(N + a)), beyond which the state is massive.
        {curves
          .filter((c) => c.crossing !== null)
          .map((c) => ` ${c.label}: y_c = ${formatNumber(c.crossing)}.`)
          .join("")}
      </figcaption>
    </figure>
  );
}

/** A sector's actual separation on its curve, in the plot's coordinates. */
interface SeparationMark {
  /** The separation (the x axis reads `y`). */
  y: number;
  /** alpha' M^2 of the sector's lightest state there. */
  mark: number;
  /** The colour of the sector's curve. */
  fill: string;
}

function SeparationDot({ cx, cy, payload }: { cx?: number; cy?: number; payload?: SeparationMark }) {
  if (cx === undefined || cy === undefined) return null;
  return <circle cx={cx} cy={cy} r={4} fill={payload?.fill} stroke="var(--surface)" data-mark="separation" />;
}
