import type { LightestState } from "@/lib/boundary/types";
import { formatNumber, isTachyonicState, massInGeV, pairKey, sectorNames, type StackNameSource } from "@/lib/spectrum";
import { cn } from "@/lib/utils";
import { MassSquaredText, MassText } from "./mass-text";
import { SectorNameText } from "./sector-name-text";

export interface LightestStatesTableProps {
  states: LightestState[];
  /** The configuration's stacks, so that sectors are named by label. */
  stacks: readonly StackNameSource[];
  /** Accessible name of the table. */
  label: string;
  /** Smaller type and padding, for the panel beside the canvas. */
  compact?: boolean;
  /** M_s in GeV: adds a column of masses in GeV when set. */
  stringScaleGeV?: number | null;
  "data-testid"?: string;
}

interface Heading {
  text: string;
  /** The heading in a compact table, with `text` as its accessible name and tooltip. */
  short?: string;
}

const baseHeadings: Heading[] = [
  { text: "Sector" },
  { text: "NS/R" },
  { text: "Oscillator level N", short: "N" },
  { text: "\u03b1\u2032M\u00b2" },
  { text: "M\u221a\u03b1\u2032" },
];
const gevHeading: Heading = { text: "M (GeV)", short: "GeV" };
const countHeadings: Heading[] = [{ text: "States" }, { text: "With Chan-Paton", short: "With CP" }];

/** The lightest states over all sectors, as the engine sorted them (alpha' = 1). */
export function LightestStatesTable({ states, stacks, label, compact = false, stringScaleGeV = null, "data-testid": testId }: LightestStatesTableProps) {
  const names = sectorNames(stacks);
  const cell = compact ? "px-1.5 py-1" : "px-3 py-1.5";
  const showGeV = stringScaleGeV !== null;
  const headings = [...baseHeadings, ...(showGeV ? [gevHeading] : []), ...countHeadings];
  return (
    <div className="overflow-x-auto rounded-md border border-border bg-surface">
      <table className={cn("w-full border-collapse", compact ? "text-xs" : "text-sm")} aria-label={label} data-testid={testId}>
        <thead className="bg-surface-muted/70 text-xs text-muted-foreground">
          <tr>
            {headings.map((heading, i) => (
              <th
                key={heading.text}
                scope="col"
                title={compact && heading.short ? heading.text : undefined}
                className={cn(cell, "font-semibold", i < 2 ? "text-left" : "text-right")}
              >
                {compact && heading.short ? (
                  <>
                    <span aria-hidden="true">{heading.short}</span>
                    <span className="sr-only">{heading.text}</span>
                  </>
                ) : (
                  heading.text
                )}
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
              <tr
                key={`${pairKey(...state.pair)}-${state.sector}-${state.level}-${i}`}
                className={cn("border-t border-border", isTachyonicState(state) && "bg-danger-soft/60")}
                data-tachyon={isTachyonicState(state) ? "true" : undefined}
              >
                <td className={cn(cell, "whitespace-nowrap")}>
                  <SectorNameText names={names} pair={state.pair} />
                </td>
                <td className={cell}>{state.sector}</td>
                <td className={cn(cell, "text-right font-mono")}>{state.level}</td>
                <td className={cn(cell, "text-right font-mono whitespace-nowrap")}>
                  <MassSquaredText value={state.massSquared} />
                </td>
                <td className={cn(cell, "text-right font-mono")}>
                  <MassText value={state.mass} />
                </td>
                {showGeV ? (
                  <td className={cn(cell, "text-right font-mono whitespace-nowrap")}>
                    {state.mass === null ? <MassText value={null} /> : formatNumber(massInGeV(state.mass, stringScaleGeV))}
                  </td>
                ) : null}
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
