import type { ReactNode } from "react";
import { Badge } from "@/components/ui/badge";
import { formatMassSquared, pairKey, sectorNames, type StackNameSource } from "@/lib/spectrum";
import { SectorNameText } from "@/components/results/sector-name-text";
import { describeCompactDiff } from "@/lib/revisions/compact-diff";
import type { ConfigurationDiff, LineChange, SpectrumDiff } from "@/lib/revisions/diff";

export interface RevisionDiffViewProps {
  fromNumber: number;
  toNumber: number;
  /** Names of the two sides in the heading, when they are not revisions of one configuration ("the source", "this fork"). */
  sideLabels?: { from: string; to: string };
  configurationDiff: ConfigurationDiff;
  /** Null when either revision has no stored result. */
  spectrumDiff: SpectrumDiff | null;
  /** The stacks of both sides (the later side's label wins), so that sectors are named by label. */
  stacks: readonly StackNameSource[];
  /** Changes of V(y) at each pair's separation (from the two documents); absent where not computed. */
  potentialChanges?: LineChange[];
}

const fieldLabels: Record<ConfigurationDiff["fields"][number]["field"], string> = {
  title: "Title",
  description: "Description",
  theory: "Theory",
  dimension: "Dimension",
  stringScaleGeV: "String scale (GeV)",
  levels: "Mass cap (\u03b1\u2032M\u00b2 at y = 0)",
};

/** What changed between two revisions: the document, then the spectrum (alpha' = 1). */
export function RevisionDiffView({ fromNumber, toNumber, sideLabels, configurationDiff, spectrumDiff, stacks, potentialChanges }: RevisionDiffViewProps) {
  const names = sectorNames(stacks);
  return (
    <div className="grid gap-6 text-sm" aria-live="polite">
      <section aria-labelledby="document-changes" className="grid gap-2">
        <h3 id="document-changes" className="font-semibold">
          {sideLabels ? `Configuration, ${sideLabels.from} → ${sideLabels.to}` : `Configuration, revision ${fromNumber} → ${toNumber}`}
        </h3>
        {configurationDiff.identical ? (
          <p className="text-muted-foreground">The documents are identical.</p>
        ) : (
          <ul className="grid gap-1.5">
            {configurationDiff.fields.map((change) => (
              <li key={change.field}>
                {fieldLabels[change.field]}: <Old>{show(change.before)}</Old> → <New>{show(change.after)}</New>
              </li>
            ))}
            {configurationDiff.planes.map((change) => (
              <LineChangeItem key={`plane-${change.key}`} label={<>orientifold plane <code>{change.key}</code></>} change={change} />
            ))}
            {configurationDiff.added.map((stack) => (
              <li key={`added-${stack.id}`}>
                <Badge variant="success">added</Badge> stack <code>{stack.id}</code> ({stack.label || "no label"}): D{stack.worldvolume.length}, N = {stack.count}
                {stack.anti ? ", antibrane" : ""}
              </li>
            ))}
            {configurationDiff.removed.map((stack) => (
              <li key={`removed-${stack.id}`}>
                <Badge variant="danger">removed</Badge> stack <code>{stack.id}</code> ({stack.label || "no label"})
              </li>
            ))}
            {configurationDiff.changed.map((change) => (
              <li key={`changed-${change.id}`} className="grid gap-0.5">
                <span>
                  <Badge variant="warning">changed</Badge> stack <code>{change.id}</code>
                </span>
                <ul className="ml-6 list-disc text-muted-foreground">
                  {change.label ? (
                    <li>
                      label <Old>{change.label.before}</Old> → <New>{change.label.after}</New>
                    </li>
                  ) : null}
                  {change.count ? (
                    <li>
                      count N <Old>{change.count.before}</Old> → <New>{change.count.after}</New>
                    </li>
                  ) : null}
                  {change.anti ? <li>orientation {change.anti.after ? "brane → antibrane" : "antibrane → brane"}</li> : null}
                  {change.colour ? <li>colour changed</li> : null}
                  {change.boundaries.map((boundary) => (
                    <li key={`b-${boundary.axis}`}>
                      x<sub>{boundary.axis}</sub>: {boundary.before} → {boundary.after}
                    </li>
                  ))}
                  {change.positions.map((position) => (
                    <li key={`p-${position.axis}`}>
                      position on x<sub>{position.axis}</sub>: <Old>{position.before}</Old> → <New>{position.after}</New>
                    </li>
                  ))}
                </ul>
              </li>
            ))}
            {describeCompactDiff(configurationDiff.compact).map((line) => (
              <li key={line}>
                <Badge variant="warning">circle</Badge> {line}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="spectrum-changes" className="grid gap-2">
        <h3 id="spectrum-changes" className="font-semibold">
          Spectrum
        </h3>
        {!spectrumDiff ? (
          <p className="text-muted-foreground">One of the revisions has no stored result to compare.</p>
        ) : spectrumDiff.identical ? (
          <p className="text-muted-foreground">No sector changed its lightest mass, tachyon status or supersymmetry.</p>
        ) : (
          <ul className="grid gap-1.5">
            {spectrumDiff.gaugeGroup ? (
              <li>
                Gauge group <Old>{spectrumDiff.gaugeGroup.before}</Old> → <New>{spectrumDiff.gaugeGroup.after}</New>
              </li>
            ) : null}
            {spectrumDiff.worldvolumes.map((change) => (
              <LineChangeItem key={`wv-${change.key}`} label={<>Worldvolume <code>{change.key.split("|").join(", ")}</code></>} change={change} />
            ))}
            {spectrumDiff.orientifold.map((change) => (
              <LineChangeItem key={`orientifold-${change.key}`} label={<>{change.key}</>} change={change} />
            ))}
            {(potentialChanges ?? []).map((change) => (
              <LineChangeItem key={`potential-${change.key}`} label={<>V(y) of <code>{change.key}</code></>} change={change} />
            ))}
            {spectrumDiff.supercharges ? (
              <li>
                Supercharges <Old>{show(spectrumDiff.supercharges.before)}</Old> → <New>{show(spectrumDiff.supercharges.after)}</New>
              </li>
            ) : null}
            {spectrumDiff.bps ? <li>All stacks mutually supersymmetric: {spectrumDiff.bps.after ? "now yes" : "no longer"}</li> : null}
            {spectrumDiff.addedSectors.map((pair) => (
              <li key={`as-${pairKey(...pair)}`}>
                <Badge variant="success">new sector</Badge> <SectorNameText names={names} pair={pair} />
              </li>
            ))}
            {spectrumDiff.removedSectors.map((pair) => (
              <li key={`rs-${pairKey(...pair)}`}>
                <Badge variant="danger">sector gone</Badge> <SectorNameText names={names} pair={pair} />
              </li>
            ))}
            {spectrumDiff.changedSectors.map((sector) => (
              <li key={`cs-${pairKey(...sector.pair)}`} className="grid gap-0.5">
                <span>
                  Sector <SectorNameText names={names} pair={sector.pair} className="font-semibold" />
                </span>
                <ul className="ml-6 list-disc text-muted-foreground">
                  {sector.lightest ? (
                    <li>
                      lightest α′M² <Old>{massOrNone(sector.lightest.before)}</Old> →{" "}
                      <New>{massOrNone(sector.lightest.after)}</New>
                      {sector.lightest.after ? ` (${sector.lightest.after.sector}, level ${sector.lightest.after.level})` : ""}
                    </li>
                  ) : null}
                  {sector.tachyonic ? <li>{sector.tachyonic.after ? "becomes tachyonic" : "no longer tachyonic"}</li> : null}
                  {sector.supersymmetric ? (
                    <li>{sector.supersymmetric.after ? "becomes supersymmetric" : "no longer supersymmetric"}</li>
                  ) : null}
                </ul>
              </li>
            ))}
          </ul>
        )}
        <p className="text-xs text-muted-foreground">Conventions: alpha&apos; = 1, masses as alpha&apos; M². Check published results independently.</p>
      </section>
    </div>
  );
}

function massOrNone(state: { massSquared: string } | null): string {
  return state ? formatMassSquared(state.massSquared) : "none";
}

function show(value: string | number | null): string {
  return value === null || value === "" ? "none" : String(value);
}

function Old({ children }: { children: ReactNode }) {
  return <del className="rounded bg-danger-soft px-1 text-danger-soft-foreground no-underline">{children}</del>;
}

function New({ children }: { children: ReactNode }) {
  return <ins className="rounded bg-success-soft px-1 text-success-soft-foreground no-underline">{children}</ins>;
}

/** One line that changed, appeared or went: "label: before → after". */
function LineChangeItem({ label, change }: { label: ReactNode; change: LineChange }) {
  return (
    <li>
      {label}:{" "}
      {change.before === null ? (
        <New>{change.after}</New>
      ) : change.after === null ? (
        <Old>{change.before}</Old>
      ) : (
        <>
          <Old>{change.before}</Old> → <New>{change.after}</New>
        </>
      )}
    </li>
  );
}
