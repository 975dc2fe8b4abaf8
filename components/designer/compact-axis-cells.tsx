"use client";

import type { Configuration, Stack } from "@/lib/boundary/types";
import { maxRadius, minRadius, wilsonPeriod } from "@/lib/designer/compact-edits";
import { useDesignerStore } from "@/lib/client/designer-store";
import { NumberField } from "./number-field";

/**
 * A number as a field shows it: 12 significant digits, so that a T-dual position theta R' or an
 * angle x / R reads 1.25 rather than 1.2499999999999998.
 */
export function fieldNumber(value: number): string {
  return String(Number(value.toPrecision(12)));
}

export interface CompactAxisRowProps {
  document: Configuration;
  axes: number[];
  /** Columns before the first axis column (select, id, label, type, N, charge). */
  leadingColumns: number;
  /** Columns after the last axis column (colour, actions). */
  trailingColumns: number;
  readOnly: boolean;
}

/**
 * The header row of the boundary grid for circles: under each axis, its radius (empty for a
 * non-compact axis) and, once compact, the T-duality command along it.
 */
export function CompactAxisRow({ document, axes, leadingColumns, trailingColumns, readOnly }: CompactAxisRowProps) {
  const { setRadius, tDualize } = useDesignerStore.getState();
  return (
    <tr className="border-t border-border">
      <th scope="row" colSpan={leadingColumns} className="px-2 py-1 text-right font-normal">
        <span className="font-semibold text-foreground">Circle radius R</span>
        <span className="block text-[11px]">empty = non-compact; &radic;&alpha;&prime; units</span>
      </th>
      {axes.map((axis) => {
        const radius = document.compact?.[String(axis)] ?? null;
        return (
          <td key={axis} className="px-1 py-1 align-top">
            <div className="flex flex-col items-center gap-0.5">
              <NumberField
                value={radius}
                positive
                min={minRadius}
                max={maxRadius}
                step={0.5}
                disabled={readOnly}
                name={`The radius of x${axis}`}
                onCommit={(value) => setRadius(axis, value)}
                onClear={() => setRadius(axis, null)}
                placeholder="\u221e"
                formatValue={fieldNumber}
                aria-label={`Radius of the circle x${axis} (empty: non-compact)`}
                className="w-11"
              />
              {radius !== null && !readOnly ? (
                <button
                  type="button"
                  onClick={() => tDualize(axis)}
                  aria-label={`T-dualise along x${axis}`}
                  title={`T-duality along x${axis}: R \u2192 1/R, N \u2194 D, Wilson lines \u2194 positions, IIA \u2194 IIB`}
                  className="h-6 rounded border border-accent px-1.5 font-mono text-[11px] text-accent hover:bg-accent-soft"
                >
                  T{axis}
                </button>
              ) : null}
            </div>
          </td>
        );
      })}
      <td colSpan={trailingColumns} />
    </tr>
  );
}

export interface WilsonLineFieldProps {
  stack: Stack;
  axis: number;
  readOnly: boolean;
}

/** The Wilson line theta (radians, [0, 2 pi)) of a stack along a compact Neumann axis, in its grid cell. */
export function WilsonLineField({ stack, axis, readOnly }: WilsonLineFieldProps) {
  const { setWilsonLine } = useDesignerStore.getState();
  return (
    <NumberField
      value={stack.wilson?.[String(axis)] ?? 0}
      step={0.1}
      min={0}
      // The largest double below 2 pi: theta = 2 pi is the same Wilson line as 0.
      max={wilsonPeriod - 1e-9}
      disabled={readOnly}
      name={`The Wilson line on x${axis}`}
      formatValue={fieldNumber}
      onCommit={(value) => setWilsonLine(stack.id, axis, value)}
      title="Wilson line theta in radians, 0 to 2 pi"
      aria-label={`Wilson line of stack ${stack.id} on x${axis} (radians)`}
      className="w-11"
    />
  );
}
