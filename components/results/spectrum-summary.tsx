import type { ReactNode } from "react";
import { formatNumber, formatPair, pairKey, type SummaryFacts } from "@/lib/spectrum";
import { Badge } from "@/components/ui/badge";
import { MassSquaredText } from "./mass-text";

export interface SpectrumSummaryProps {
  /** `summaryFacts(result)` of a full result, or the facts the server sends with a result's overview. */
  facts: SummaryFacts;
}

/**
 * The headline of a spectrum: supersymmetry, tachyons, gauge group and the lightest state.
 * The one summary of the designer preview, the results page and the shared view; it lays
 * itself out by the width it is given (a list in a side panel, cards across a page).
 */
export function SpectrumSummary({ facts }: SpectrumSummaryProps) {
  const { tachyons, tachyonCount, lightest } = facts;
  const result = facts;
  return (
    <div className="@container">
      <dl className="grid gap-2 text-sm @2xl:grid-cols-2 @2xl:gap-3 @5xl:grid-cols-4" aria-label="Spectrum summary">
        <SummaryItem
          term="Supersymmetry"
          value={
            <>
              <span data-testid="spectrum-supersymmetry">
                {result.supercharges === null ? "not applicable" : `${result.supercharges} supercharges`}
              </span>
              {result.supercharges === null ? null : (
                <Badge variant={result.bps ? "success" : "outline"} className="ml-2 align-middle">
                  {result.bps ? "BPS" : "not BPS"}
                </Badge>
              )}
            </>
          }
          detail={
            result.supercharges === null
              ? "The bosonic string has no spacetime supersymmetry."
              : result.bps
                ? "Every pair of stacks is mutually supersymmetric."
                : "Some pairs break all supersymmetry between them."
          }
        />
        <SummaryItem
          term="Stability"
          value={
            <span data-testid="spectrum-stability" className={tachyons.length > 0 ? "text-danger-soft-foreground" : undefined}>
              {tachyonCount === 0 ? "No tachyons" : `${tachyonCount} tachyonic sector${tachyonCount > 1 ? "s" : ""}`}
            </span>
          }
          detail={
            tachyons.length === 0 ? (
              "The lightest state of every sector has \u03b1\u2032M\u00b2 \u2265 0."
            ) : (
              <ul className="grid gap-0.5" data-testid="spectrum-tachyons">
                {tachyons.map((tachyon) => (
                  <li key={pairKey(...tachyon.pair)}>
                    <span className="font-mono">{formatPair(tachyon.pair)}</span>: &alpha;&prime;M&sup2; ={" "}
                    <span className="font-mono">{tachyon.lightest ? <MassSquaredText value={tachyon.lightest.massSquared} /> : "?"}</span> at y ={" "}
                    <span className="font-mono">{formatNumber(tachyon.separation)}</span>
                    {tachyon.criticalSeparation !== null ? (
                      <>
                        ; massive beyond y<sub>c</sub> = <span className="font-mono">{formatNumber(tachyon.criticalSeparation)}</span>
                      </>
                    ) : null}
                  </li>
                ))}
                {tachyonCount > tachyons.length ? <li>and {tachyonCount - tachyons.length} more (see the sectors below)</li> : null}
              </ul>
            )
          }
        />
        <SummaryItem
          term="Gauge group"
          value={
            <span className="font-mono" data-testid="spectrum-gauge-group">
              {result.gaugeGroup || "none"}
            </span>
          }
          detail={`${facts.sectorCount} sector${facts.sectorCount === 1 ? "" : "s"} of open strings.`}
        />
        <SummaryItem
          term="Lightest state"
          value={
            lightest ? (
              <span data-testid="spectrum-lightest">
                &alpha;&prime;M&sup2; = <span className="font-mono"><MassSquaredText value={lightest.massSquared} /></span>
              </span>
            ) : (
              <span data-testid="spectrum-lightest">none computed</span>
            )
          }
          detail={
            lightest
              ? `${formatPair(lightest.pair)}, ${lightest.sector} at level ${lightest.level}: ${lightest.withChanPaton} states with Chan-Paton factors.`
              : "No level up to the highest one computed keeps a state."
          }
        />
      </dl>
    </div>
  );
}

function SummaryItem({ term, value, detail }: { term: string; value: ReactNode; detail: ReactNode }) {
  return (
    <div className="grid grid-cols-[7.5rem_minmax(0,1fr)] gap-x-3 gap-y-0.5 @2xl:grid-cols-1 @2xl:content-start @2xl:rounded-lg @2xl:border @2xl:border-border @2xl:bg-surface @2xl:p-4">
      <dt className="text-xs text-muted-foreground @2xl:font-semibold @2xl:tracking-wide @2xl:uppercase">{term}</dt>
      <dd className="font-medium @2xl:text-lg @2xl:font-semibold">{value}</dd>
      <dd className="col-start-2 text-xs text-muted-foreground @2xl:col-start-1 @2xl:text-sm">{detail}</dd>
    </div>
  );
}
