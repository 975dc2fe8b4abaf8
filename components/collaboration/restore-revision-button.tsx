"use client";

import { useState, useTransition } from "react";
import { restoreRevisionAction } from "@/app/(workspace)/configurations/[configurationId]/history/actions";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";

export interface RestoreRevisionButtonProps {
  configurationId: string;
  revisionId: string;
  revisionNumber: number;
  currentVersion: number;
}

/** Saves an old revision's document as a new revision; history is never rewritten. Asks first, in the app's own dialog. */
export function RestoreRevisionButton({ configurationId, revisionId, revisionNumber, currentVersion }: RestoreRevisionButtonProps) {
  const [pending, startTransition] = useTransition();
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  function restore() {
    startTransition(async () => {
      const result = await restoreRevisionAction(configurationId, revisionId, currentVersion);
      setMessage("error" in result ? result.error : null);
      setOpen(false);
    });
  }

  return (
    <span className="inline-flex flex-col items-end gap-1">
      <Button size="sm" variant="outline" pending={pending} aria-label={`Restore revision ${revisionNumber}`} onClick={() => setOpen(true)}>
        Restore
      </Button>
      {message ? (
        <span role="alert" className="max-w-56 text-right text-xs text-danger-soft-foreground">
          {message}
        </span>
      ) : null}
      <Dialog
        open={open}
        onOpenChange={setOpen}
        title={`Restore revision ${revisionNumber}?`}
        description={`Its document is saved as version ${currentVersion + 1}, on top of version ${currentVersion}. Every revision stays in the history, so nothing is lost.`}
        footer={
          <>
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Cancel
            </Button>
            <Button pending={pending} onClick={restore}>
              Restore as version {currentVersion + 1}
            </Button>
          </>
        }
      />
    </span>
  );
}
