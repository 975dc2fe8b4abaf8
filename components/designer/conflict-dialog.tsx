"use client";

import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";

export interface ConflictDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  /** The version now stored on the server. */
  currentVersion: number | null;
  /** The version this draft was based on. */
  baseVersion: number | null;
  canFork: boolean;
  pending: boolean;
  onReload: () => void;
  onFork: () => void;
}

/** Shown when a save hits a newer stored version (409): reload the latest or keep the draft as a fork. */
export function ConflictDialog({ open, onOpenChange, currentVersion, baseVersion, canFork, pending, onReload, onFork }: ConflictDialogProps) {
  return (
    <Dialog
      open={open}
      onOpenChange={onOpenChange}
      title="Someone saved a newer version"
      description={`You edited version ${baseVersion ?? "?"}, but version ${currentVersion ?? "?"} is now stored. Nothing was overwritten, and your draft is still here.`}
      footer={
        <>
          <Button variant="secondary" onClick={() => onOpenChange(false)}>
            Keep editing
          </Button>
          <Button variant="outline" onClick={onReload} disabled={pending}>
            Reload latest (discard my draft)
          </Button>
          {canFork ? (
            <Button onClick={onFork} pending={pending}>
              Save as fork
            </Button>
          ) : null}
        </>
      }
    >
      <p className="text-muted-foreground">
        Reloading replaces your draft with the stored version. Saving as a fork copies the version you started from into a space where you may
        write and saves your draft there, linked to its source.
      </p>
    </Dialog>
  );
}
