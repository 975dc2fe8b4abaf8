"use client";

import { useState, useTransition } from "react";
import { forkToPersonalSpaceAction } from "@/app/(workspace)/groups/actions";
import { Button, type ButtonProps } from "@/components/ui/button";

export interface ForkToSpaceButtonProps {
  configurationId: string;
  title: string;
  variant?: ButtonProps["variant"];
}

/** Copies a configuration into the user's personal space and opens the copy in the designer. */
export function ForkToSpaceButton({ configurationId, title, variant = "secondary" }: ForkToSpaceButtonProps) {
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <Button
        size="sm"
        variant={variant}
        pending={pending}
        aria-label={`Fork “${title}” to my space`}
        onClick={() =>
          startTransition(async () => {
            setError(null);
            const result = await forkToPersonalSpaceAction(configurationId);
            if (result?.error) setError(result.error);
          })
        }
      >
        Fork to my space
      </Button>
      {error ? (
        <span role="alert" className="text-xs text-danger-soft-foreground">
          {error}
        </span>
      ) : null}
    </span>
  );
}
