"use client";

import { useState, useTransition } from "react";
import { setStarterAction } from "@/app/(workspace)/groups/actions";
import { Button } from "@/components/ui/button";

export interface StarterToggleProps {
  configurationId: string;
  title: string;
  isStarter: boolean;
  groupSlug: string;
}

/** Lab owners publish a configuration as a starter for students, or withdraw it. */
export function StarterToggle({ configurationId, title, isStarter, groupSlug }: StarterToggleProps) {
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <Button
        size="sm"
        variant={isStarter ? "ghost" : "outline"}
        pending={pending}
        aria-label={isStarter ? `Withdraw “${title}” as a starter` : `Publish “${title}” as a starter`}
        onClick={() =>
          startTransition(async () => {
            setError(null);
            const result = await setStarterAction(configurationId, !isStarter, groupSlug);
            if (result?.error) setError(result.error);
          })
        }
      >
        {isStarter ? "Withdraw starter" : "Publish as starter"}
      </Button>
      {error ? (
        <span role="alert" className="text-xs text-danger-soft-foreground">
          {error}
        </span>
      ) : null}
    </span>
  );
}
