"use client";

import { useId, useMemo, useState } from "react";
import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import type { Sector, SectorKind } from "@/lib/boundary/types";
import { formatNumber, quantumNumberText, towerPoints, type TowerPoint } from "@/lib/spectrum";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import { axisStyle, horizontalAxisLabel, tooltipContentStyle, verticalAxisLabel } from "./chart-style";
import { MassSquaredText, MassText } from "./mass-text";

export interface TowerPanelProps {
  /** The sector with its detail; only `compactAxes`, `tower` and `towerTruncated` are read. */
  sector: Pick<Sector, "compactAxes" | "tower" | "towerTruncated">;
  /** The sector's name ("a–b"), for captions. */
  title: string;
  /** Only states of this kind (NS, R, bosonic), or all. */
  kind: SectorKind | "all";
  showGeV: boolean;
}

/** Marker shapes and colours per sector kind, so the kinds differ without colour too. */
const kindStyles: Record<SectorKind, { fill: string; shape: "circle" | "diamond" | "square" }> = {
  NS: { fill: "#2f6f9f", shape: "circle" },
  R: { fill: "#b5542c", shape: "diamond" },
  bosonic: { fill: "#3f8f5a", shape: "square" },
};

/**
 * The tower of momentum and winding states of one sector on its compact axes: a plot of
 * alpha' M^2 against n (NN axis) or w (DD axis) of the chosen axis, and the table of states with
 * every quantum number. Empty states say why (no compact axis along which the pair can move).
 */
export function TowerPanel({ sector, title, kind, showGeV }: TowerPanelProps) {
  const axes = sector.compactAxes ?? [];
  const [chosen, setChosen] = useState<number | null>(null);
  const axis = chosen ?? axes[0]?.axis ?? null;
  const selectId = useId();
  const states = useMemo(() => (sector.tower ?? []).filter((state) => kind === "all" || state.sector === kind), [sector.tower, kind]);
  const points = useMemo(
    () => (axis === null ? [] : towerPoints({ tower: states }, axis)),
    [states, axis],
  );
  const byKind = useMemo(() => {
    const groups = new Map<SectorKind, TowerPoint[]>();
    for (const point of points) groups.set(point.sector, [...(groups.get(point.sector) ?? []), point]);
    return [...groups.entries()];
  }, [points]);
  const term = axes.find((entry) => entry.axis === axis);
  const numberName = term?.type === "DD" ? "winding w" : "momentum n";

  if (axes.length === 0) {
    return (
      <p className="text-xs text-muted-foreground" data-testid="tower-empty">
        Every compact axis is ND or DN for this pair, so its strings carry neither momentum nor winding there: the level table is the whole spectrum.
      </p>
    );
  }
  return (
    <section className="grid gap-2" aria-label={`Tower of ${title}`} data-testid="tower-panel">
      <div className="flex flex-wrap items-center gap-3 text-xs">
        <h4 className="font-semibold">Momentum and winding tower</h4>
        <label htmlFor={selectId} className="text-muted-foreground">
          Plot against
        </label>
        <select
          id={selectId}
          className="rounded border border-border bg-surface px-2 py-1"
          value={axis ?? ""}
          onChange={(event) => setChosen(Number(event.target.value))}
        >
          {axes.map((entry) => (
            <option key={entry.axis} value={entry.axis}>
              x{entry.axis}: {entry.type === "NN" ? "momentum n" : "winding w"} (R = {formatNumber(entry.radius)})
            </option>
          ))}
        </select>
      </div>
      {points.length > 0 ? (
        <figure className="grid gap-1">
          <div className="h-56 w-full">
            <ResponsiveContainer width="100%" height="100%">
              <ScatterChart margin={{ top: 12, right: 24, bottom: 28, left: 8 }}>
                <CartesianGrid strokeDasharray="2 4" stroke="var(--border)" />
                <XAxis
                  dataKey="number"
                  type="number"
                  allowDecimals={false}
                  domain={["dataMin - 1", "dataMax + 1"]}
                  label={horizontalAxisLabel(`${numberName} on x${axis ?? ""}`)}
                  {...axisStyle}
                />
                <YAxis
                  dataKey="massSquared"
                  type="number"
                  tickFormatter={(v: number) => formatNumber(v, { significantDigits: 3 })}
                  label={verticalAxisLabel("\u03b1\u2032M\u00b2")}
                  {...axisStyle}
                />
                <Tooltip
                  formatter={(value, name) => (typeof value === "number" ? [formatNumber(value), String(name)] : [String(value), String(name)])}
                  contentStyle={tooltipContentStyle}
                />
                <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
                {byKind.map(([sectorKind, data]) => (
                  <Scatter
                    key={sectorKind}
                    name={sectorKind}
                    data={data}
                    fill={kindStyles[sectorKind].fill}
                    shape={kindStyles[sectorKind].shape}
                    isAnimationActive={false}
                  />
                ))}
              </ScatterChart>
            </ResponsiveContainer>
          </div>
          <figcaption className="text-xs text-muted-foreground">
            &alpha;&prime;M&sup2; of each state against its {numberName} on x{axis}; states with other numbers on the other compact axes
            share a column. &alpha;&prime; = 1, radii in units of &radic;&alpha;&prime;.
          </figcaption>
        </figure>
      ) : null}
      <div className="max-h-80 overflow-auto">
        <Table>
          <TableCaption>
            Tower of sector {title}: {states.length} states up to the mass cap
            {sector.towerTruncated ? " (the lightest are listed; more lie within the cap)" : ""}. The string from the second stack to the
            first has the opposite numbers.
          </TableCaption>
          <TableHeader>
            <TableRow>
              <TableHead>Sector</TableHead>
              <TableHead>Level N</TableHead>
              <TableHead>n, w</TableHead>
              <TableHead>&alpha;&prime;M&sup2;</TableHead>
              <TableHead>M&radic;&alpha;&prime;</TableHead>
              {showGeV ? <TableHead>M (GeV)</TableHead> : null}
              <TableHead>States (light-cone)</TableHead>
              <TableHead>With Chan-Paton</TableHead>
            </TableRow>
          </TableHeader>
          <TableBody>
            {states.map((state) => {
              const numbers = quantumNumberText(state);
              return (
                <TableRow key={`${state.sector}-${state.level}-${numbers}`}>
                  <TableCell>{state.sector}</TableCell>
                  <TableCell className="font-mono">{state.level}</TableCell>
                  <TableCell className="font-mono">{numbers}</TableCell>
                  <TableCell className="font-mono">
                    <MassSquaredText value={state.massSquared} />
                  </TableCell>
                  <TableCell className="font-mono">
                    <MassText value={state.mass} />
                  </TableCell>
                  {showGeV ? <TableCell className="font-mono">{formatNumber(state.massGeV ?? null)}</TableCell> : null}
                  <TableCell className="font-mono">{state.states ?? "orientations differ"}</TableCell>
                  <TableCell className="font-mono">{state.withChanPaton}</TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </div>
    </section>
  );
}
