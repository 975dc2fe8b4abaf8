/**
 * The designer's live check and compute: the same zod schema as the API, then the engine's
 * own checks, then the spectrum. Runs in the browser on every edit.
 */
import { checkConfiguration, computeSpectrum } from "@/lib/boundary";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import type { FieldIssue } from "@/lib/errors";
import { configurationSchema } from "@/lib/validations/configuration";

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
}

/** Validates a draft and, when it is valid, computes its spectrum. */
export function computeLivePreview(document: Configuration, options: ComputeLivePreviewOptions = {}): LivePreview {
  const now = options.now ?? (() => performance.now());
  const started = now();
  const issues = validateDraft(document);
  const result = issues.length === 0 ? computeSpectrum(document) : null;
  return { issues, result, elapsedMs: now() - started };
}

/** Problems with a draft from the zod schema and the engine's checks, without duplicates. */
export function validateDraft(document: Configuration): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const parsed = configurationSchema.safeParse(document);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      issues.push({ path: issue.path.map((key) => (typeof key === "number" ? key : String(key))), message: issue.message });
    }
  } else {
    issues.push(...checkConfiguration(document).map((problem) => ({ path: problem.path, message: problem.message })));
  }
  const seen = new Set<string>();
  return issues.filter((issue) => {
    const key = `${issue.path.join(".")}|${issue.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
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
