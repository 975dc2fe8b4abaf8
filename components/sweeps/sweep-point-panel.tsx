"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { Configuration } from "@/lib/boundary/types";
import { useForkConfiguration } from "@/lib/client/configurations";
import { readDraft, writeDraft } from "@/lib/designer/draft-storage";
import { formatMassSquared } from "@/lib/spectrum";
import { dimensionLabel, pointDocument, type SweepDefinition, type SweepPointRow } from "@/lib/sweeps";
import { configurationTitleMaxLength } from "@/lib/validations/limits";
import { verdictLabels, verdictTextClass } from "./verdict-style";

export interface SweepPointPanelProps {
  configurationId: string;
  /** The revision number the sweep varies (the draft's base version). */
  revisionNumber: number;
  revisionId: string;
  base: Configuration;
  definition: SweepDefinition;
  point: SweepPointRow;
  /** The caller may edit the configuration, so a draft of it can be saved. */
  canEdit: boolean;
  /** The caller's personal space, where forks go; null when there is none. */
  personalGroupId: string | null;
}

/** One point: its values and summary, and the ways to open it (a draft of this configuration, or a fork). */
export function SweepPointPanel({ configurationId, revisionNumber, revisionId, base, definition, point, canEdit, personalGroupId }: SweepPointPanelProps) {
  const router = useRouter();
  const fork = useForkConfiguration(configurationId);
  const [replacing, setReplacing] = useState(false);
  const document = () => ({ ...pointDocument(base, definition, point.index), title: base.title });

  const openDraft = (replace: boolean) => {
    const existing = readDraft(window.localStorage, configurationId);
    if (existing && !replace) {
      setReplacing(true);
      return;
    }
    // The draft is based on the swept revision: saving it over a newer one shows the conflict dialog.
    writeDraft(window.localStorage, configurationId, { document: document(), baseVersion: revisionNumber, savedAt: Date.now() });
    router.push(`/configurations/${configurationId}`);
  };

  const openFork = () => {
    if (!personalGroupId) return;
    const suffix = ` (sweep point ${point.index})`;
    fork.mutate(
      { targetGroupId: personalGroupId, revisionId, title: `${base.title.slice(0, configurationTitleMaxLength - suffix.length)}${suffix}`, document: document() },
      { onSuccess: (created) => router.push(`/configurations/${created.id}`) },
    );
  };

  return (
    <section aria-labelledby="sweep-point-title" className="grid gap-3 rounded-lg border border-border bg-surface p-4">
      <h3 id="sweep-point-title" className="text-sm font-semibold">
        Point #{point.index}: <span className={verdictTextClass[point.verdict]}>{verdictLabels[point.verdict]}</span>
      </h3>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        {definition.dimensions.map((dimension, d) => (
          <div key={d} className="contents">
            <dt className="text-muted-foreground">{dimensionLabel(dimension)}</dt>
            <dd className="font-mono">{point.labels[d]}</dd>
          </div>
        ))}
        {point.problem ? (
          <>
            <dt className="text-muted-foreground">Refused</dt>
            <dd>{point.problem}</dd>
          </>
        ) : (
          <>
            <dt className="text-muted-foreground">Lightest α′M²</dt>
            <dd className="font-mono">{formatMassSquared(point.lightestMassSquared)}</dd>
            <dt className="text-muted-foreground">Supercharges</dt>
            <dd>{point.supercharges ?? "n/a (bosonic)"}</dd>
            <dt className="text-muted-foreground">Tachyonic sectors</dt>
            <dd>{point.tachyonicSectors}</dd>
            <dt className="text-muted-foreground">Massless states</dt>
            <dd className="font-mono">{point.masslessStates}</dd>
            <dt className="text-muted-foreground">Gauge group</dt>
            <dd>{point.gaugeGroup}</dd>
          </>
        )}
      </dl>
      <div className="flex flex-wrap gap-2">
        {canEdit ? (
          <Button size="sm" onClick={() => openDraft(false)}>
            Open as draft
          </Button>
        ) : null}
        {personalGroupId ? (
          <Button size="sm" variant="secondary" pending={fork.isPending} onClick={openFork}>
            Fork into my space
          </Button>
        ) : null}
      </div>
      {replacing ? (
        <Alert variant="warning" title="You have an unsaved draft of this configuration">
          Opening the point replaces that draft in this browser.{" "}
          <Button size="sm" variant="danger" onClick={() => openDraft(true)}>
            Replace my draft
          </Button>{" "}
          <Button size="sm" variant="ghost" onClick={() => setReplacing(false)}>
            Keep it
          </Button>
        </Alert>
      ) : null}
      {fork.error ? <Alert variant="danger">{fork.error.message}</Alert> : null}
    </section>
  );
}
