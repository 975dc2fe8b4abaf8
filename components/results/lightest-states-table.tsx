import type { LightestState } from "@/lib/boundary/types";
import { formatPair, pairKey } from "@/lib/spectrum";
import { cn } from "@/lib/utils";
import { MassSquaredText, MassText } from "./mass-text";

export interface LightestStatesTableProps {
  states: LightestState[];
  /** Accessible name of the table. */
  label: string;
  /** Smaller type and padding, for the panel beside the canvas. */
  compact?: boolean;
  "data-testid"?: string;
}

const headings = ["Sector", "NS/R", "Oscillator level N", "\u03b1\u2032M\u00b2", "M\u221a\u03b1\u2032", "States", "With Chan-Paton"];

/** The lightest states over all sectors, as the engine sorted them (alpha' = 1). */
export function LightestStatesTable({ states, label, compact = false, "data-testid": testId }: LightestStatesTableProps) {
  const cell = compact ? "px-1.5 py-1" : "px-3 py-1.5";
  return (
    <div className="overflow-x-auto rounded-md border border-border bg-surface">
      <table className={cn("w-full border-collapse", compact ? "text-xs" : "text-sm")} aria-label={label} data-testid={testId}>
        <thead className="bg-surface-muted/70 text-xs text-muted-foreground">
          <tr>
            {headings.map((heading, i) => (
              <th key={heading} scope="col" className={cn(cell, "font-semibold", i < 2 ? "text-left" : "text-right")}>
                {heading}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {states.length === 0 ? (
            <tr>
              <td colSpan={headings.length} className={cn(cell, "text-center text-muted-foreground")}>
                No states up to the mass cap.
              </td>
            </tr>
          ) : (
            states.map((state, i) => (
              <tr key={`${pairKey(...state.pair)}-${state.sector}-${state.level}-${i}`} className="border-t border-border">
                <td className={cn(cell, "font-mono whitespace-nowrap")}>{formatPair(state.pair)}</td>
                <td className={cell}>{state.sector}</td>
                <td className={cn(cell, "text-right font-mono")}>{state.level}</td>
                <td className={cn(cell, "text-right font-mono whitespace-nowrap")}>
                  <MassSquaredText value={state.massSquared} />
                </td>
                <td className={cn(cell, "text-right font-mono")}>
                  <MassText value={state.mass} />
                </td>
                <td className={cn(cell, "text-right font-mono")}>{state.states ?? "\u2014"}</td>
                <td className={cn(cell, "text-right font-mono")}>{state.withChanPaton}</td>
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
