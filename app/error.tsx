"use client";

import { useEffect } from "react";
import { Button, ButtonLink } from "@/components/ui/button";

interface ErrorPageProps {
  error: unknown;
  retry?: () => void;
  reset?: () => void;
}

export default function ErrorPage({ error, retry, reset }: ErrorPageProps) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  const digest = error instanceof Error && "digest" in error && typeof error.digest === "string" ? error.digest : null;
  const tryAgain = retry ?? reset;

  return (
    <div role="alert" className="mx-auto flex max-w-xl flex-col items-start gap-4 px-4 py-20 sm:px-6">
      <p className="font-mono text-sm text-danger">Error</p>
      <h1 className="text-2xl font-semibold tracking-tight">Something went wrong</h1>
      <p className="text-sm leading-relaxed text-muted-foreground">
        The page could not be shown. Your saved work is safe; try again, or go back to the dashboard.
        {digest ? (
          <>
            {" "}
            Reference: <code className="font-mono text-xs">{digest}</code>
          </>
        ) : null}
      </p>
      <div className="flex gap-2">
        {tryAgain ? <Button onClick={() => tryAgain()}>Try again</Button> : null}
        <ButtonLink href="/dashboard" variant="outline">
          Dashboard
        </ButtonLink>
      </div>
    </div>
  );
}
