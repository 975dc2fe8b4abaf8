import Link from "next/link";

export function SiteFooter() {
  return (
    <footer className="mt-auto border-t border-border">
      <div className="mx-auto flex max-w-7xl flex-col gap-2 px-4 py-6 text-xs text-muted-foreground sm:flex-row sm:items-start sm:justify-between sm:px-6">
        <p className="max-w-3xl leading-relaxed">
          <span className="font-medium text-foreground">Conventions:</span> α′ = 1; masses and separations in string
          units (M² in units of 1/α′, distances in units of √α′) unless a string scale is set. Mooring computes tree-level
          open-string spectra of flat, parallel D-brane stacks. Check any result before you publish it.
        </p>
        <p className="shrink-0">
          Mooring · a workbench for parallel D-branes ·{" "}
          <Link href="/docs/api" className="underline-offset-2 hover:text-foreground hover:underline">
            API reference
          </Link>
        </p>
      </div>
    </footer>
  );
}
