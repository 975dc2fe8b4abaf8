"use client";

import { diffConfigurations } from "@/lib/revisions/diff";
import { describeConfigurationDiff } from "@/lib/revisions/describe";
import type { MergeResult } from "@/lib/revisions/merge";
import type { StaleSave } from "@/lib/client/stale-save";
import { formatDateTime } from "@/lib/format-date";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";

export interface ConflictDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  /** The version this draft was based on. */
  baseVersion: number | null;
  /** The stored side, once read; null while it loads. */
  stale: StaleSave | null;
  /** Why the stored side could not be read. */
  error: string | null;
  /** The draft merged with the stored version; null when the draft's base could not be read. */
  merge: MergeResult | null;
  canFork: boolean;
  pending: boolean;
  onMerge: () => void;
  onReload: () => void;
  onFork: () => void;
}

/**
 * Shown when the stored configuration moved past the draft (a save answered 409, or another tab or
 * person saved): who saved what, and the ways on: merge the draft into the stored version when the
 * edits touch different fields, reload the stored version, or keep the draft as a fork.
 */
export function ConflictDialog({ open, onOpenChange, baseVersion, stale, error, merge, canFork, pending, onMerge, onReload, onFork }: ConflictDialogProps) {
  const currentVersion = stale?.latest.version ?? null;
  const changes = stale?.base ? describeConfigurationDiff(diffConfigurations(stale.base, stale.latest.document)) : null;
  const mergeable = merge !== null && merge.document !== null;
  return (
    <Dialog
      open={open}
      onOpenChange={onOpenChange}
      title="Someone saved a newer version"
      description={
        currentVersion === null
          ? "Reading what was saved after your draft's version…"
          : `You edited version ${baseVersion ?? "?"}, but version ${currentVersion} is now stored. Nothing was overwritten, and your draft is still here.`
      }
      className="w-[min(40rem,calc(100vw-2rem))]"
      footer={
        <>
          <Button variant="secondary" onClick={() => onOpenChange(false)}>
            Keep editing
          </Button>
          <Button variant="outline" onClick={onReload} disabled={pending || stale === null}>
            Reload latest (discard my draft)
          </Button>
          {canFork ? (
            <Button variant={mergeable ? "outline" : "primary"} onClick={onFork} pending={pending}>
              Save as fork
            </Button>
          ) : null}
          {mergeable ? (
            <Button onClick={onMerge} disabled={pending}>
              Merge my changes
            </Button>
          ) : null}
        </>
      }
    >
      <div className="grid gap-3 text-sm">
        {error ? <p className="text-danger-soft-foreground">{error}</p> : null}
        {stale && stale.newer.length > 0 ? (
          <section aria-labelledby="conflict-saves-title" className="grid gap-1">
            <h3 id="conflict-saves-title" className="font-semibold">
              Saved since your version
            </h3>
            <ul className="grid gap-0.5" data-testid="conflict-saves">
              {stale.newer.map((revision) => (
                <li key={revision.id}>
                  Version {revision.number} by <span className="font-medium">{revision.author.name}</span>, {formatDateTime(new Date(revision.createdAt))}
                  {revision.message ? <>: “{revision.message}”</> : null}
                </li>
              ))}
            </ul>
          </section>
        ) : null}
        {changes ? (
          <section aria-labelledby="conflict-changes-title" className="grid gap-1">
            <h3 id="conflict-changes-title" className="font-semibold">
              What changed in the stored version
            </h3>
            {changes.length === 0 ? (
              <p className="text-muted-foreground">Nothing in the document: only the revision was saved again.</p>
            ) : (
              <ul className="list-disc pl-5" data-testid="conflict-changes">
                {changes.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            )}
          </section>
        ) : null}
        {merge && merge.document === null ? (
          <section aria-labelledby="conflict-clashes-title" className="grid gap-1">
            <h3 id="conflict-clashes-title" className="font-semibold text-danger-soft-foreground">
              Both of you changed the same fields, so they cannot be merged
            </h3>
            <ul className="list-disc pl-5" data-testid="conflict-clashes">
              {merge.conflicts.map((clash) => (
                <li key={clash.field}>
                  {clash.field}: yours {clash.mine}, stored {clash.theirs}
                </li>
              ))}
            </ul>
          </section>
        ) : null}
        <p className="text-muted-foreground">
          {mergeable
            ? "Your edits touch other fields than the stored ones: merging puts them on top of the stored version, for you to check and save. "
            : ""}
          Reloading replaces your draft with the stored version. Saving as a fork copies the version you started from into a space where you may write and saves your
          draft there, linked to its source.
        </p>
      </div>
    </Dialog>
  );
}
