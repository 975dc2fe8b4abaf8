/**
 * The designer's live check and compute: the shape rules of the API's zod schema (when the caller
 * passes them, see shape-issues.ts), then the engine's checks and the spectrum in one pass
 * (`tryComputeSpectrum`), so each edit runs the engine's checker once. Runs in the browser on
 * every edit.
 */
import { checkConfiguration, tryComputeSpectrum } from "@/lib/boundary";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import type { FieldIssue } from "@/lib/errors";

/** Everything the preview shows for one draft. */
export interface LivePreview {
  /** Problems that block saving, each with its JSON path into the document. */
  issues: FieldIssue[];
  /** The spectrum, or null while there are issues. */
  result: SpectrumResult | null;
  /** Milliseconds spent checking and computing. */
  elapsedMs: number;
}

/** Options of {@link computeLivePreview}. */
export interface ComputeLivePreviewOptions {
  /** Clock in milliseconds (performance.now by default). */
  now?: () => number;
  /**
   * The shape rules (`shapeIssuesOf` from shape-issues.ts). Left out, only the engine's problems
   * are listed: right for a document the server's schema has already accepted.
   */
  shapeIssues?: (document: Configuration) => FieldIssue[];
}

/**
 * Validates a draft as the API would (`configurationSchema`: shape problems and the engine's
 * problems together, when `options.shapeIssues` is given) and, when it is valid, computes its
 * spectrum.
 */
export function computeLivePreview(document: Configuration, options: ComputeLivePreviewOptions = {}): LivePreview {
  const now = options.now ?? (() => performance.now());
  const started = now();
  const shapeIssues = options.shapeIssues?.(document) ?? [];
  // A draft with a shape problem (an over-long title) is not computed, but its engine problems are
  // still listed beside it, as the API's schema would list them.
  const attempt =
    shapeIssues.length > 0 ? { problems: checkConfiguration(document), result: null } : tryComputeSpectrum(document);
  const issues = withoutDuplicates([...shapeIssues, ...attempt.problems]);
  return { issues, result: attempt.result, elapsedMs: now() - started };
}

/** Issues grouped for display: per stack index, and those about the document itself. */
export function groupIssues(issues: FieldIssue[]): { byStack: Map<number, FieldIssue[]>; document: FieldIssue[] } {
  const byStack = new Map<number, FieldIssue[]>();
  const documentIssues: FieldIssue[] = [];
  for (const issue of issues) {
    const [head, index] = issue.path;
    if (head === "stacks" && typeof index === "number") {
      byStack.set(index, [...(byStack.get(index) ?? []), issue]);
    } else {
      documentIssues.push(issue);
    }
  }
  return { byStack, document: documentIssues };
}

function withoutDuplicates(issues: FieldIssue[]): FieldIssue[] {
  const seen = new Set<string>();
  return issues.filter((issue) => {
    const key = `${issue.path.join(".")}|${issue.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
