"use client";

import { maxLevels, maxStringScaleGeV } from "@/lib/designer/document";
import { selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { NumberField } from "./number-field";

export interface DocumentSettingsProps {
  readOnly?: boolean;
}

/**
 * The settings of the whole configuration beside its stacks: how many oscillator levels the
 * spectrum lists, and the string scale M_s = 1/sqrt(alpha') in GeV that adds masses in GeV.
 */
/** 1e16 rather than 10000000000000000: scales of interest run from TeV to beyond the GUT scale. */
function scientific(value: number): string {
  return value >= 1e6 ? value.toExponential().replace("e+", "e") : String(value);
}

export function DocumentSettings({ readOnly = false }: DocumentSettingsProps) {
  const document = useDesignerStore(selectDocument);
  const { setLevels, setStringScale } = useDesignerStore.getState();
  return (
    <section aria-labelledby="document-settings-title" className="flex flex-wrap items-start gap-x-6 gap-y-2 rounded-lg border border-border bg-surface px-3 py-2 text-xs">
      <h2 id="document-settings-title" className="self-center text-sm font-semibold">
        Spectrum settings
      </h2>
      <div className="flex items-start gap-2">
        <label htmlFor="document-levels" className="pt-1.5 text-muted-foreground">
          Highest level N
        </label>
        <NumberField
          id="document-levels"
          value={document.levels}
          integer
          min={0}
          max={maxLevels}
          disabled={readOnly}
          name="The highest level"
          onCommit={setLevels}
          aria-describedby="document-levels-hint"
          className="w-14"
        />
        <span id="document-levels-hint" className="pt-1.5 text-muted-foreground">
          0 to {maxLevels}
        </span>
      </div>
      <div className="flex items-start gap-2">
        <label htmlFor="document-string-scale" className="pt-1.5 text-muted-foreground">
          String scale M<sub>s</sub>
        </label>
        <NumberField
          id="document-string-scale"
          value={document.stringScaleGeV}
          positive
          max={maxStringScaleGeV}
          unit="GeV"
          formatValue={scientific}
          disabled={readOnly}
          name="The string scale"
          onCommit={setStringScale}
          onClear={() => setStringScale(null)}
          placeholder="none"
          aria-describedby="document-string-scale-hint"
          className="w-24"
        />
        <span id="document-string-scale-hint" className="pt-1.5 text-muted-foreground">
          GeV; M<sub>s</sub> = 1/&radic;&alpha;&prime;. Leave empty to keep masses in string units.
        </span>
      </div>
    </section>
  );
}
