import type { ReactNode } from "react";
import {
  formatEngineProse,
  formatNumber,
  pairKey,
  sectorNames,
  type HeadlineState,
  type LightestHeadline,
  type SectorNames,
  type StackNameSource,
  type SummaryFacts,
} from "@/lib/spectrum";
import { Badge } from "@/components/ui/badge";
import { cn } from "@/lib/utils";
import { MassSquaredText } from "./mass-text";
import { SectorNameText } from "./sector-name-text";

export interface SpectrumSummaryProps {
  /** `summaryFacts(result)` of a full result, or the facts the server sends with a result's overview. */
  facts: SummaryFacts;
  /** The configuration's stacks, so that sectors are named by label. */
  stacks: readonly StackNameSource[];
}

/**
 * The headline of a spectrum: supersymmetry, tachyons, the lightest state and the theory on each
 * worldvolume (gauge and flavour groups, light matter, supersymmetry in that dimension). The one
 * summary of the designer preview, the results page and the shared view; it lays itself out by
 * the width it is given (a list in a side panel, cards across a page).
 */
export function SpectrumSummary({ facts, stacks }: SpectrumSummaryProps) {
  const names = sectorNames(stacks);
  const { tachyons, tachyonCount, lightest, worldvolumes, worldvolumeCount, stringCreation } = facts;
  const result = facts;
  return (
    <div className="@container grid gap-2">
      <SpectrumHeadline headline={facts.headline} names={names} />
      <dl className="grid gap-2 text-sm @2xl:grid-cols-3 @2xl:gap-3" aria-label="Spectrum summary">
        <SummaryItem
          term="Supersymmetry"
          value={
            <>
              <span data-testid="spectrum-supersymmetry">
                {result.supercharges === null ? "not applicable" : `${result.supercharges} supercharges`}
              </span>
              {result.supercharges === null ? null : (
                <Badge variant={result.bps ? (stringCreation.length > 0 ? "warning" : "success") : "outline"} className="ml-2 align-middle">
                  {result.bps ? (stringCreation.length > 0 ? "BPS with a stretched string" : "BPS") : "not BPS"}
                </Badge>
              )}
            </>
          }
          detail={
            result.supercharges === null ? (
              "The bosonic string has no spacetime supersymmetry."
            ) : !result.bps ? (
              "Some pairs break all supersymmetry between them."
            ) : stringCreation.length > 0 ? (
              <span data-testid="spectrum-string-creation">
                Supersymmetric only with a fundamental string stretched between{" "}
                {stringCreation.map((pair, index) => (
                  <span key={pairKey(...pair)}>
                    {index > 0 ? "; " : ""}
                    <span title={pair[0] === names.stack(pair[0]) ? undefined : `Stack ${pair[0]}`}>{names.stack(pair[0])}</span> and{" "}
                    <span title={pair[1] === names.stack(pair[1]) ? undefined : `Stack ${pair[1]}`}>{names.stack(pair[1])}</span>
                  </span>
                ))}{" "}
                (&nu; = 8: a string is created when the stacks cross); without it they feel a constant force.
              </span>
            ) : (
              "Every pair of stacks is mutually supersymmetric."
            )
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
                    <SectorNameText names={names} pair={tachyon.pair} />: &alpha;&prime;M&sup2; ={" "}
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
            lightest ? (
              <>
                <SectorNameText names={names} pair={lightest.pair} />, {lightest.sector} at oscillator level N = {lightest.level}: {lightest.withChanPaton} states
                with Chan-Paton factors.
              </>
            ) : (
              "No state up to the mass cap survives."
            )
          }
        />
        <SummaryItem
          term="Worldvolumes"
          className="@2xl:col-span-3"
          value={
            worldvolumes === null || worldvolumes.length === 0 ? (
              <span className="text-sm font-normal" data-testid="spectrum-worldvolumes">
                {worldvolumes === null ? "not recorded by the engine that stored this result" : "none"}
              </span>
            ) : (
              <ul className="grid gap-0.5 text-sm font-normal" data-testid="spectrum-worldvolumes">
                {worldvolumes.map((worldvolume) => (
                  <li key={worldvolume.key} data-testid={`worldvolume-${worldvolume.stacks.join("-")}`}>
                    <span>{formatEngineProse(worldvolume.summary)}</span>{" "}
                    <Badge variant={worldvolume.supercharges ? "success" : "outline"} className="align-middle">
                      {worldvolume.supersymmetry}
                    </Badge>
                  </li>
                ))}
                {worldvolumeCount > worldvolumes.length ? <li>and {worldvolumeCount - worldvolumes.length} more</li> : null}
              </ul>
            )
          }
          detail={
            <>
              Gauge factors over all worldvolumes:{" "}
              <span className="font-mono" data-testid="spectrum-gauge-group">
                {result.gaugeGroup || "none"}
              </span>
              ; each is gauged only on its own worldvolume, and a higher-dimensional stack&apos;s group is a flavour symmetry of
              the lower-dimensional theory. {facts.sectorCount} sector{facts.sectorCount === 1 ? "" : "s"} of open strings.
            </>
          }
        />
      </dl>
    </div>
  );
}

/** One line: the tachyon, the massless content and the first massive state, each with its sector. */
function SpectrumHeadline({ headline, names }: { headline: LightestHeadline; names: SectorNames }) {
  const { tachyon, massless, firstMassive } = headline;
  const maxSectors = 3;
  return (
    <p className="text-sm" data-testid="spectrum-headline">
      <span data-testid="headline-tachyon" className={tachyon ? "text-danger-soft-foreground" : undefined}>
        {tachyon ? (
          <>
            Tachyon <HeadlineMass state={tachyon} names={names} />
          </>
        ) : (
          "No tachyon"
        )}
      </span>
      <span aria-hidden="true"> &middot; </span>
      <span data-testid="headline-massless">
        {massless ? (
          <>
            {massless.complete ? "" : "at least "}
            {massless.withChanPaton} massless states in{" "}
            {massless.pairs.slice(0, maxSectors).map((pair, index) => (
              <span key={pairKey(...pair)}>
                {index > 0 ? ", " : ""}
                <SectorNameText names={names} pair={pair} />
              </span>
            ))}
            {massless.pairs.length > maxSectors ? ` and ${massless.pairs.length - maxSectors} more sectors` : ""}
          </>
        ) : (
          "no massless states"
        )}
      </span>
      <span aria-hidden="true"> &middot; </span>
      <span data-testid="headline-first-massive">
        {firstMassive ? (
          <>
            first massive <HeadlineMass state={firstMassive} names={names} />
          </>
        ) : (
          "no massive state listed"
        )}
      </span>
    </p>
  );
}

function HeadlineMass({ state, names }: { state: HeadlineState; names: SectorNames }) {
  return (
    <>
      &alpha;&prime;M&sup2; = <span className="font-mono"><MassSquaredText value={state.massSquared} /></span> in <SectorNameText names={names} pair={state.pair} /> ({state.sector})
    </>
  );
}

function SummaryItem({ term, value, detail, className }: { term: string; value: ReactNode; detail: ReactNode; className?: string }) {
  return (
    <div
      className={cn(
        "grid grid-cols-[7.5rem_minmax(0,1fr)] gap-x-3 gap-y-0.5 @2xl:grid-cols-1 @2xl:content-start @2xl:rounded-lg @2xl:border @2xl:border-border @2xl:bg-surface @2xl:p-4",
        className,
      )}
    >
      <dt className="text-xs text-muted-foreground @2xl:font-semibold">{term}</dt>
      <dd className="font-medium @2xl:text-lg @2xl:font-semibold">{value}</dd>
      <dd className="col-start-2 text-xs text-muted-foreground @2xl:col-start-1 @2xl:text-sm">{detail}</dd>
    </div>
  );
}
