"use client";

import { useRouter } from "next/navigation";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { useHydrated } from "@/lib/client/use-hydrated";
import { useUndeleteConfiguration } from "@/lib/client/configurations";

export interface DeletedNoticeProps {
  configurationId: string;
  title: string;
}

/** Shown on the dashboard right after a configuration was deleted, with an undo that brings it back. */
export function DeletedNotice({ configurationId, title }: DeletedNoticeProps) {
  const router = useRouter();
  const undelete = useUndeleteConfiguration(configurationId);
  const hydrated = useHydrated();
  const name = title.trim() ? `“${title.trim()}”` : "The configuration";

  return (
    <Alert variant="info" title={`${name} was deleted`}>
      <p>
        Its revisions, results and comments are kept; undo brings it back as it was. Its share links were turned off and stay off; create
        new ones after undoing if you still need them.
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <Button
          size="sm"
          pending={undelete.isPending}
          disabled={!hydrated}
          onClick={() => undelete.mutate(undefined, { onSuccess: () => router.push(`/configurations/${configurationId}`) })}
        >
          Undo delete
        </Button>
        <Button size="sm" variant="ghost" onClick={() => router.replace("/dashboard")}>
          Dismiss
        </Button>
      </div>
      {undelete.error ? <p className="mt-2 text-danger-soft-foreground">{undelete.error.message}</p> : null}
    </Alert>
  );
}
