"use client";

import type { ReactNode } from "react";
import { maxAbsPosition } from "@/lib/designer/document";
import { cn } from "@/lib/utils";
import { NumberField } from "./number-field";

export interface BoundaryAxisCellProps {
  axis: number;
  neumann: boolean;
  /** Position on the axis (shown in Dirichlet cells). */
  position: number;
  readOnly: boolean;
  /** Accessible name of the N/D button, e.g. "Stack a, axis x4: Dirichlet". */
  toggleLabel: string;
  title?: string;
  /** Accessible name of the position field. */
  positionLabel: string;
  describedBy?: string;
  onToggle: () => void;
  onCommit: (value: number) => void;
  /** How the position field writes its value (the field's default when left out). */
  formatValue?: (value: number) => string;
  /** Shown after the N/D button on a Neumann axis (a Wilson line field on a circle). */
  children?: ReactNode;
}

/**
 * One axis cell of the boundary grid: the N/D button, `children` on a Neumann axis, and on a
 * Dirichlet axis the position field.
 */
export function BoundaryAxisCell({
  axis,
  neumann,
  position,
  readOnly,
  toggleLabel,
  title,
  positionLabel,
  describedBy,
  onToggle,
  onCommit,
  formatValue,
  children,
}: BoundaryAxisCellProps) {
  return (
    <td className={cn("px-1 py-1", neumann ? "bg-surface-muted/60" : "")}>
      <div className="flex items-center justify-center gap-0.5">
        <button
          type="button"
          disabled={readOnly}
          aria-label={toggleLabel}
          title={title}
          onClick={onToggle}
          className={cn(
            "h-7 w-6 rounded font-mono text-xs font-semibold",
            neumann ? "bg-foreground text-background" : "border border-border-strong bg-surface text-foreground",
            "focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-ring disabled:opacity-60",
          )}
          aria-describedby={describedBy}
        >
          {neumann ? "N" : "D"}
        </button>
        {neumann ? children : null}
        {!neumann ? (
          <NumberField
            value={position}
            step={0.5}
            disabled={readOnly}
            onCommit={onCommit}
            name={`The position on x${axis}`}
            {...(formatValue ? { formatValue } : {})}
            min={-maxAbsPosition}
            max={maxAbsPosition}
            aria-label={positionLabel}
            className="w-11"
          />
        ) : null}
      </div>
    </td>
  );
}
