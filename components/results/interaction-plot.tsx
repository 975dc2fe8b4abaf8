"use client";

import { useMemo, useState } from "react";
import { CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { INTERACTION_CONVENTIONS, createInteractionCache, interactionCurve, interactionPairs } from "@/lib/boundary/interaction";
import type { Configuration } from "@/lib/boundary/types";
import { formatNumber } from "@/lib/spectrum";
import { axisStyle, horizontalAxisLabel, tooltipContentStyle, verticalAxisLabel } from "./chart-style";

export interface InteractionPlotProps {
  /** The document of the revision shown; the curves are computed from it in the browser. */
  document: Configuration;
}

/**
 * The annulus interaction potential V(y) of one pair at a time, chosen from a list, with the
 * critical separation y_c and the pair's own separation marked and the sign conventions stated.
 * Only the chosen pair's curve is computed (a 64-stack configuration has some two thousand pairs).
 */
export function InteractionPlot({ document }: InteractionPlotProps) {
  const pairs = useMemo(() => interactionPairs(document), [document]);
  // Pairs of one shape share their samples: one cache per document, kept while pairs are chosen.
  const cache = useMemo(() => createInteractionCache(), [document]);
  const [selected, setSelected] = useState(0);
  const chosen = pairs[Math.min(selected, pairs.length - 1)];
  const curve = useMemo(() => (chosen ? interactionCurve(chosen, cache) : null), [chosen, cache]);
  if (document.theory === "bosonic") {
    return <p className="text-sm text-muted-foreground">Not computed for the bosonic string: its closed-string tachyon makes the annulus diverge.</p>;
  }
  if (pairs.length === 0) {
    return <p className="text-sm text-muted-foreground">No two stacks share a Dirichlet axis, so there is no separation to plot a force against.</p>;
  }
  if (!curve) return null;
  const name = (pair: readonly [string, string]) => `${pair[0]} \u2013 ${pair[1]}`;
  return (
    <figure className="grid gap-2" data-testid="interaction-plot">
      <label className="flex flex-wrap items-center gap-2 text-xs">
        <span className="text-muted-foreground">Pair</span>
        <select
          value={Math.min(selected, pairs.length - 1)}
          onChange={(event) => setSelected(Number(event.target.value))}
          className="h-8 rounded border border-border-strong bg-surface px-1 text-sm"
          aria-label="Pair for the interaction potential"
        >
          {pairs.map((c, index) => (
            <option key={name(c.pair)} value={index}>
              {name(c.pair)} (nu = {c.nu})
            </option>
          ))}
        </select>
      </label>
      <p className="text-sm" data-testid="interaction-summary">
        {name(curve.pair)}: nu = {curve.nu}, {curve.sameOrientation ? "same orientation" : "brane\u2013antibrane"}, {curve.labels} Chan-Paton{" "}
        {curve.labels === 1 ? "pair" : "pairs"}.{" "}
        {curve.undefinedReason ??
          (curve.vanishes
            ? "V(y) = 0 at every separation: no force (the NS and R contributions cancel)."
            : `At y = ${formatNumber(curve.separation)}: ${
                curve.atSeparation === null ? "not defined (the tachyon makes the integral diverge)" : `V = ${formatNumber(curve.atSeparation)}`
              }${curve.criticalSeparation !== null ? `; tachyonic below y_c = ${formatNumber(curve.criticalSeparation)}` : ""}; at large y V falls as y^-${curve.dd - 2}.`)}
      </p>
      {curve.samples.length > 0 ? (
        <div className="h-64 w-full">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={curve.samples} margin={{ top: 12, right: 24, bottom: 28, left: 16 }}>
              <CartesianGrid strokeDasharray="2 4" stroke="var(--border)" />
              <XAxis
                dataKey="y"
                type="number"
                domain={["dataMin", "dataMax"]}
                tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })}
                label={horizontalAxisLabel("separation y (\u221a\u03b1\u2032)")}
                {...axisStyle}
              />
              <YAxis
                tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })}
                label={verticalAxisLabel("V(y)")}
                width={72}
                {...axisStyle}
              />
              <Tooltip
                formatter={(value) => (typeof value === "number" ? formatNumber(value) : String(value))}
                labelFormatter={(value) => `y = ${typeof value === "number" ? formatNumber(value) : String(value)}`}
                contentStyle={tooltipContentStyle}
              />
              <ReferenceLine y={0} stroke="var(--muted-foreground)" strokeDasharray="4 2" />
              {curve.criticalSeparation !== null ? (
                <ReferenceLine
                  x={curve.criticalSeparation}
                  stroke="var(--danger)"
                  strokeDasharray="3 3"
                  label={{ value: `y_c = ${formatNumber(curve.criticalSeparation)}`, position: "insideTopRight", fontSize: 11, fill: "var(--danger)" }}
                />
              ) : null}
              <Line dataKey="v" name="V(y)" type="monotone" dot={false} stroke="#2f6f9f" strokeWidth={2} isAnimationActive={false} />
              {curve.atSeparation !== null ? (
                <ReferenceDot x={curve.separation} y={curve.atSeparation} r={5} fill="#b5542c" stroke="var(--surface)" ifOverflow="extendDomain" />
              ) : null}
            </LineChart>
          </ResponsiveContainer>
        </div>
      ) : null}
      <figcaption className="text-xs text-muted-foreground">
        {INTERACTION_CONVENTIONS} The dot marks the pair&apos;s own separation; the dashed red line the critical separation y<sub>c</sub>.
        Caution: these are machine-computed results; anyone publishing them should check them independently.
      </figcaption>
    </figure>
  );
}
