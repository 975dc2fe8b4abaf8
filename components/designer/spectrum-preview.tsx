"use client";

import type { SpectrumResult } from "@/lib/boundary/types";
import { formatMassSquared, formatNumber, lightestBySector, pairKey } from "@/lib/designer/spectrum-summary";
import type { FieldIssue } from "@/lib/errors";
import { Badge } from "@/components/ui/badge";
import { ConventionsNote } from "./conventions-note";

export interface SpectrumPreviewProps {
  result: SpectrumResult | null;
  issues: FieldIssue[];
  elapsedMs: number;
  /** Rows of the lightest-states table (default 8). */
  lightestRows?: number;
}

/** The live spectrum beside the canvas: summary, tachyons, lightest states and warnings. */
export function SpectrumPreview({ result, issues, elapsedMs, lightestRows = 8 }: SpectrumPreviewProps) {
  return (
    <section aria-labelledby="spectrum-preview-title" className="flex flex-col gap-3 text-sm">
      <div className="flex items-baseline justify-between gap-2">
        <h2 id="spectrum-preview-title" className="text-sm font-semibold">
          Live spectrum
        </h2>
        <span
          className="font-mono text-[11px] text-muted-foreground"
          title="Time to check and compute the draft in this browser"
          // Measured separately on the server render and in the browser.
          suppressHydrationWarning
        >
          {elapsedMs.toFixed(1)} ms
        </span>
      </div>
      {result === null ? (
        <div role="status" className="rounded-md border border-danger/30 bg-danger-soft px-3 py-2 text-xs text-danger-soft-foreground">
          <p className="font-semibold">Fix these to see the spectrum (saving is blocked until then):</p>
          <ul className="mt-1 list-disc space-y-0.5 pl-4">
            {issues.slice(0, 6).map((issue) => (
              <li key={`${issue.path.join(".")}-${issue.message}`}>{issue.message}</li>
            ))}
            {issues.length > 6 ? <li>and {issues.length - 6} more</li> : null}
          </ul>
        </div>
      ) : (
        <PreviewBody result={result} lightestRows={lightestRows} />
      )}
      <ConventionsNote />
    </section>
  );
}

function PreviewBody({ result, lightestRows }: { result: SpectrumResult; lightestRows: number }) {
  const tachyonic = result.sectors.filter((s) => s.tachyonic);
  const bySector = lightestBySector(result);
  return (
    <>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-xs" aria-label="Spectrum summary" data-testid="preview-summary">
        <dt className="text-muted-foreground">Gauge group</dt>
        <dd className="font-mono" data-testid="preview-gauge-group">{result.gaugeGroup || "none"}</dd>
        <dt className="text-muted-foreground">Supersymmetry</dt>
        <dd data-testid="preview-supersymmetry">
          {result.supercharges === null ? (
            "not applicable (bosonic)"
          ) : (
            <>
              <span className="font-mono">{result.supercharges}</span> supercharges
              {result.bps ? (
                <Badge variant="success" className="ml-2">
                  BPS
                </Badge>
              ) : (
                <Badge variant="outline" className="ml-2">
                  not BPS
                </Badge>
              )}
            </>
          )}
        </dd>
        <dt className="text-muted-foreground">Stability</dt>
        <dd data-testid="preview-stability">
          {tachyonic.length === 0 ? (
            "no tachyons"
          ) : (
            <span className="font-medium text-danger-soft-foreground">
              &#9888; {tachyonic.length} tachyonic sector{tachyonic.length > 1 ? "s" : ""}
            </span>
          )}
        </dd>
        <dt className="text-muted-foreground">Sectors</dt>
        <dd className="font-mono">{result.sectors.length}</dd>
      </dl>

      {tachyonic.length > 0 ? (
        <div>
          <h3 className="mb-1 text-xs font-semibold">Tachyons and critical separations</h3>
          <ul className="space-y-1 text-xs" data-testid="preview-tachyons">
            {tachyonic.map((sector) => {
              const info = bySector.get(pairKey(sector.pair[0], sector.pair[1]));
              return (
                <li key={sector.pair.join("|")} className="rounded border border-dashed border-danger/50 px-2 py-1">
                  <span className="font-mono">
                    {sector.pair[0]}&ndash;{sector.pair[1]}
                  </span>
                  : tachyon, &alpha;&prime;M&sup2; = <span className="font-mono">{info ? formatMassSquared(info.massSquared) : "?"}</span> at y ={" "}
                  <span className="font-mono">{formatNumber(sector.separation)}</span>
                  {sector.criticalSeparation !== null ? (
                    <>
                      ; massive beyond y<sub>c</sub> = <span className="font-mono">{formatNumber(sector.criticalSeparation)}</span>
                    </>
                  ) : null}
                </li>
              );
            })}
          </ul>
        </div>
      ) : null}

      <div>
        <h3 className="mb-1 text-xs font-semibold">Lightest states</h3>
        <div className="overflow-x-auto rounded-md border border-border">
          <table className="w-full border-collapse text-xs" aria-label="Lightest states">
            <thead className="bg-surface-muted/70 text-muted-foreground">
              <tr>
                <th scope="col" className="px-1.5 py-1 text-left font-semibold">Sector</th>
                <th scope="col" className="px-1.5 py-1 text-left font-semibold">NS/R</th>
                <th scope="col" className="px-1.5 py-1 text-right font-semibold">Level</th>
                <th scope="col" className="px-1.5 py-1 text-right font-semibold">&alpha;&prime;M&sup2;</th>
                <th scope="col" className="px-1.5 py-1 text-right font-semibold">M&radic;&alpha;&prime;</th>
                <th scope="col" className="px-1.5 py-1 text-right font-semibold">States</th>
                <th scope="col" className="px-1.5 py-1 text-right font-semibold">With CP</th>
              </tr>
            </thead>
            <tbody>
              {result.lightest.slice(0, lightestRows).map((row, i) => {
                const negative = row.massSquared.startsWith("-");
                return (
                  <tr key={`${row.pair.join("|")}-${row.sector}-${row.level}-${i}`} className="border-t border-border">
                    <td className="px-1.5 py-1 font-mono whitespace-nowrap">
                      {row.pair[0]}&ndash;{row.pair[1]}
                    </td>
                    <td className="px-2 py-1">{row.sector}</td>
                    <td className="px-1.5 py-1 text-right font-mono">{row.level}</td>
                    <td className="px-1.5 py-1 text-right font-mono whitespace-nowrap">
                      {formatMassSquared(row.massSquared)}
                      {negative ? <span className="ml-1 text-danger-soft-foreground">tachyon</span> : null}
                    </td>
                    <td className="px-1.5 py-1 text-right font-mono">{formatNumber(row.mass)}</td>
                    <td className="px-1.5 py-1 text-right font-mono">{row.states ?? "\u2014"}</td>
                    <td className="px-1.5 py-1 text-right font-mono">{row.withChanPaton}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </div>

      {result.warnings.length > 0 ? (
        <div>
          <h3 className="mb-1 text-xs font-semibold">Warnings</h3>
          <ul className="list-disc space-y-1 pl-4 text-xs text-warning-soft-foreground">
            {result.warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </>
  );
}
