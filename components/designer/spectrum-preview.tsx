"use client";

import type { SpectrumResult } from "@/lib/boundary/types";
import type { FieldIssue } from "@/lib/errors";
import { LightestStatesTable } from "@/components/results/lightest-states-table";
import { formatNumber, massInGeV, summaryFacts, type StackNameSource } from "@/lib/spectrum";
import { SpectrumSummary } from "@/components/results/spectrum-summary";
import { ConventionsNote } from "./conventions-note";

export interface SpectrumPreviewProps {
  result: SpectrumResult | null;
  issues: FieldIssue[];
  elapsedMs: number;
  /** Rows of the lightest-states table (default 8). */
  lightestRows?: number;
  /** M_s in GeV of the draft: masses are shown in GeV too when set. */
  stringScaleGeV?: number | null;
  /** The draft's stacks, so that sectors are named by label. */
  stacks: readonly StackNameSource[];
}

/** The live spectrum beside the canvas: summary, tachyons, lightest states and warnings. */
export function SpectrumPreview({ result, issues, elapsedMs, lightestRows = 8, stringScaleGeV = null, stacks }: SpectrumPreviewProps) {
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
        <PreviewBody result={result} lightestRows={lightestRows} stringScaleGeV={stringScaleGeV} stacks={stacks} />
      )}
      <ConventionsNote />
    </section>
  );
}

function PreviewBody({
  result,
  lightestRows,
  stringScaleGeV,
  stacks,
}: {
  result: SpectrumResult;
  lightestRows: number;
  stringScaleGeV: number | null;
  stacks: readonly StackNameSource[];
}) {
  const firstMassive = result.lightest.find((state) => state.mass !== null && state.mass > 0) ?? null;
  return (
    <>
      <SpectrumSummary facts={summaryFacts(result)} stacks={stacks} />

      {stringScaleGeV !== null ? (
        <p className="rounded-md border border-border bg-surface-muted/50 px-2.5 py-1.5 text-xs" data-testid="preview-string-scale">
          String scale M<sub>s</sub> = <span className="font-mono">{formatNumber(stringScaleGeV)}</span> GeV, so M = (M&radic;&alpha;&prime;) &times; M
          <sub>s</sub>.
          {firstMassive ? (
            <>
              {" "}
              Lightest massive state listed: M = <span className="font-mono">{formatNumber(massInGeV(firstMassive.mass, stringScaleGeV))}</span> GeV.
            </>
          ) : null}
        </p>
      ) : null}

      <div>
        <h3 className="mb-1 text-xs font-semibold">Lightest states</h3>
        <LightestStatesTable states={result.lightest.slice(0, lightestRows)} stacks={stacks} label="Lightest states" compact stringScaleGeV={stringScaleGeV} />
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
