import { CONVENTIONS_TEXT } from "@/lib/boundary/constants";
import { cn } from "@/lib/utils";

export interface ConventionsNoteProps {
  className?: string;
  /** Show the full paragraph (results page) or the short line with the caution (preview). */
  full?: boolean;
}

/** The units and conventions of every number shown, with the caution to authors. */
export function ConventionsNote({ className, full = false }: ConventionsNoteProps) {
  return (
    <aside className={cn("rounded-md border border-border bg-surface-muted/60 px-3 py-2 text-xs leading-relaxed text-muted-foreground", className)}>
      {full ? (
        <p>{CONVENTIONS_TEXT}</p>
      ) : (
        <p>
          <strong className="font-semibold text-foreground">Conventions:</strong> &alpha;&prime; = 1; lengths in units of
          &radic;&alpha;&prime;; &alpha;&prime;M&sup2; = (y/2&pi;)&sup2; + N + a; masses as M&radic;&alpha;&prime; (times
          M<sub>s</sub> = 1/&radic;&alpha;&prime; for GeV). Every sector is listed up to the same mass cap, N + a &le; levels.
          Counts are light-cone trace counts after the GSO projection.{" "}
          <strong className="font-semibold text-foreground">Caution:</strong> machine-computed; check results independently
          before publishing them.
        </p>
      )}
    </aside>
  );
}
