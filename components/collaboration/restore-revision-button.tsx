"use client";

import { useState, useTransition } from "react";
import { restoreRevisionAction } from "@/app/(workspace)/configurations/[configurationId]/history/actions";
import { Button } from "@/components/ui/button";

export interface RestoreRevisionButtonProps {
  configurationId: string;
  revisionId: string;
  revisionNumber: number;
  currentVersion: number;
}

/** Saves an old revision's document as a new revision; history is never rewritten. */
export function RestoreRevisionButton({ configurationId, revisionId, revisionNumber, currentVersion }: RestoreRevisionButtonProps) {
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <Button
        size="sm"
        variant="outline"
        pending={pending}
        aria-label={`Restore revision ${revisionNumber}`}
        onClick={() => {
          if (!window.confirm(`Restore revision ${revisionNumber}? It is saved as a new revision; nothing is lost.`)) return;
          startTransition(async () => {
            const result = await restoreRevisionAction(configurationId, revisionId, currentVersion);
            setMessage("error" in result ? result.error : null);
          });
        }}
      >
        Restore
      </Button>
      {message ? (
        <span role="alert" className="max-w-56 text-right text-xs text-danger-soft-foreground">
          {message}
        </span>
      ) : null}
    </span>
  );
}
