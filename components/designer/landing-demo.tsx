"use client";

import { useEffect } from "react";
import type { Configuration } from "@/lib/boundary/types";
import { selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { BoundaryGrid } from "./boundary-grid";
import { DesignerCanvas } from "./designer-canvas";
import { SpectrumPreview } from "./spectrum-preview";
import { useLivePreview } from "./use-live-preview";

export interface LandingDemoProps {
  configuration: Configuration;
}

const demoId = "landing-demo";

/**
 * A read-only designer on the landing page: the demo configuration on the canvas, its
 * boundary grid and its live spectrum, computed in the visitor's browser.
 */
export function LandingDemo({ configuration }: LandingDemoProps) {
  const ready = useDesignerStore((s) => s.configurationId === demoId);
  const document = useDesignerStore(selectDocument);
  // Read-only: the demo is never edited, so its shape is never in question.
  const preview = useLivePreview(ready ? document : configuration, false);

  useEffect(() => {
    if (!ready) useDesignerStore.getState().load(configuration, { configurationId: demoId, baseVersion: null });
  }, [configuration, ready]);

  return (
    <section aria-labelledby="landing-demo-title" className="grid gap-3">
      <div>
        <h2 id="landing-demo-title" className="text-lg font-semibold">
          {configuration.title}
        </h2>
        {configuration.description ? <p className="text-sm text-muted-foreground">{configuration.description}</p> : null}
      </div>
      <div className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="flex min-w-0 flex-col gap-3">
          {ready ? <DesignerCanvas result={preview.result} readOnly className="h-[380px]" /> : <div className="h-[380px] rounded-lg border border-border bg-surface" />}
          {ready ? <BoundaryGrid issuesByStack={preview.byStack} readOnly /> : null}
        </div>
        <div className="min-w-0 rounded-lg border border-border bg-surface p-3">
          <SpectrumPreview result={preview.result} issues={preview.issues} elapsedMs={preview.elapsedMs} lightestRows={6} stacks={(ready ? document : configuration).stacks} />
        </div>
      </div>
    </section>
  );
}
