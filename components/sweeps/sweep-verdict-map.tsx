"use client";

import { useMemo, useState } from "react";
import { Label } from "@/components/ui/label";
import { Select } from "@/components/ui/select";
import { dimensionLabel, dimensionSize, dimensionValue, formatDimensionValue, verdictMap, type PointVerdict, type SweepDefinition, type SweepPointRow } from "@/lib/sweeps";
import { verdictFill, verdictLabels } from "./verdict-style";

export interface SweepVerdictMapProps {
  definition: SweepDefinition;
  rows: SweepPointRow[];
  selected: number | null;
  onSelect: (index: number) => void;
}

/** Largest cell side in px, and the widest map drawn. */
const maxCell = 36;
const maxWidth = 720;
const legend: PointVerdict[] = ["supersymmetric", "tachyonic", "neither", "invalid"];

/**
 * Supersymmetric, tachyonic or neither over two swept dimensions, the other dimensions held at
 * chosen values. Each stored cell is a button that opens its point.
 */
export function SweepVerdictMap({ definition, rows, selected, onSelect }: SweepVerdictMapProps) {
  const dims = definition.dimensions;
  const [x, setX] = useState(0);
  const [y, setY] = useState(dims.length > 1 ? 1 : 0);
  const [fixed, setFixed] = useState<number[]>(() => dims.map(() => 0));
  const map = useMemo(() => verdictMap(definition, rows, x, y, fixed), [definition, rows, x, y, fixed]);
  const cell = Math.max(4, Math.min(maxCell, Math.floor(maxWidth / Math.max(1, map.columns.length))));
  const labelled = map.cells.length <= 2_500;
  const xName = dims[x] ? dimensionLabel(dims[x]) : "";
  const yName = dims.length > 1 && dims[y] ? dimensionLabel(dims[y]) : "";

  return (
    <figure className="grid gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <AxisSelect id="map-x" label="Across" value={x} onChange={setX} definition={definition} />
        {dims.length > 1 ? <AxisSelect id="map-y" label="Down" value={y} onChange={setY} definition={definition} /> : null}
        {dims.map((dimension, d) =>
          d === x || d === y ? null : (
            <div key={d} className="grid gap-1.5">
              <Label htmlFor={`map-fixed-${d}`}>Hold {dimensionLabel(dimension)} at</Label>
              <Select
                id={`map-fixed-${d}`}
                value={String(fixed[d] ?? 0)}
                onChange={(event) => setFixed((current) => current.map((value, i) => (i === d ? Number(event.target.value) : value)))}
                className="w-48"
              >
                {Array.from({ length: Math.min(1000, Number(dimensionSize(dimension))) }, (_unused, i) => (
                  <option key={i} value={i}>
                    {formatDimensionValue(dimension, dimensionValue(dimension, i))}
                  </option>
                ))}
              </Select>
            </div>
          ),
        )}
      </div>
      <div className="overflow-auto">
        <div className="inline-grid gap-px" style={{ gridTemplateColumns: `auto repeat(${map.columns.length}, ${cell}px)` }} role="grid" aria-label="Verdict map">
          <div role="row" className="contents">
            <span role="columnheader" />
            {map.columns.map((label, c) => (
              <span key={c} role="columnheader" className="truncate text-center text-[10px] text-muted-foreground" title={label}>
                {labelled && cell >= 24 ? label : ""}
              </span>
            ))}
          </div>
          {map.rows.map((rowLabel, r) => (
            <div key={r} role="row" className="contents">
              <span role="rowheader" className="pr-2 text-right font-mono text-[10px] whitespace-nowrap text-muted-foreground">
                {rowLabel}
              </span>
              {map.columns.map((columnLabel, c) => {
                const item = map.cells[r * map.columns.length + c];
                const verdict = item?.verdict ?? null;
                const index = item?.index ?? null;
                const name = `${xName} ${columnLabel}${yName ? `, ${yName} ${rowLabel}` : ""}: ${verdict ? verdictLabels[verdict] : "not computed yet"}`;
                return (
                  <span key={c} role="gridcell">
                    {index === null ? (
                      <span className="block border border-dashed border-border" style={{ width: cell, height: cell }} title={name} aria-label={name} />
                    ) : (
                      <button
                        type="button"
                        onClick={() => onSelect(index)}
                        title={name}
                        aria-label={name}
                        aria-pressed={selected === index}
                        className="block outline-offset-1 focus-visible:outline-2 focus-visible:outline-ring"
                        style={{ width: cell, height: cell, background: verdict ? verdictFill[verdict] : undefined, boxShadow: selected === index ? "inset 0 0 0 2px var(--foreground)" : undefined }}
                      />
                    )}
                  </span>
                );
              })}
            </div>
          ))}
        </div>
      </div>
      <figcaption className="flex flex-wrap gap-4 text-xs text-muted-foreground">
        {legend.map((verdict) => (
          <span key={verdict} className="inline-flex items-center gap-1.5">
            <span className="inline-block size-3 rounded-sm" style={{ background: verdictFill[verdict] }} aria-hidden="true" />
            {verdictLabels[verdict]}
          </span>
        ))}
        <span>Dashed: not computed yet. A tachyonic point counts as tachyonic even if it keeps supercharges.</span>
      </figcaption>
    </figure>
  );
}

function AxisSelect({ id, label, value, onChange, definition }: { id: string; label: string; value: number; onChange: (value: number) => void; definition: SweepDefinition }) {
  return (
    <div className="grid gap-1.5">
      <Label htmlFor={id}>{label}</Label>
      <Select id={id} value={String(value)} onChange={(event) => onChange(Number(event.target.value))} className="w-48">
        {definition.dimensions.map((dimension, d) => (
          <option key={d} value={d}>
            {dimensionLabel(dimension)}
          </option>
        ))}
      </Select>
    </div>
  );
}
