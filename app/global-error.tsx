"use client";

import { useEffect } from "react";
import { themeInitScript } from "@/lib/theme";
import "./globals.css";

interface GlobalErrorProps {
  error: unknown;
  retry?: () => void;
  reset?: () => void;
}

/** Replaces the root layout when it fails, so it brings its own document, styles and theme. */
export default function GlobalError({ error, retry, reset }: GlobalErrorProps) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  const tryAgain = retry ?? reset;

  return (
    <html lang="en" suppressHydrationWarning>
      <head>
        <script dangerouslySetInnerHTML={{ __html: themeInitScript }} />
      </head>
      <body className="min-h-screen bg-background font-sans text-foreground">
        <title>Error · Mooring</title>
        <main role="alert" className="mx-auto flex max-w-xl flex-col items-start gap-4 px-6 py-24">
          <p className="font-mono text-sm text-danger">Mooring</p>
          <h1 className="text-2xl font-semibold tracking-tight">Mooring could not load</h1>
          <p className="text-sm leading-relaxed text-muted-foreground">
            An unexpected error stopped the page. Your saved work is safe. Try again in a moment.
          </p>
          {tryAgain ? (
            <button
              type="button"
              onClick={() => tryAgain()}
              className="rounded-md bg-accent px-4 py-2 text-sm font-medium text-accent-foreground hover:bg-accent-hover"
            >
              Try again
            </button>
          ) : null}
        </main>
      </body>
    </html>
  );
}
