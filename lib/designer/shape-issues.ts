/**
 * The shape rules of the API's zod schema (types, text lengths, the file format) as field issues
 * with JSON paths. Kept apart from live-preview.ts so that the designer loads zod only once a
 * draft needs checking (see components/designer/use-live-preview.ts).
 */
import type { Configuration } from "@/lib/boundary/types";
import type { FieldIssue } from "@/lib/errors";
import { configurationShapeSchema } from "@/lib/validations/configuration";

/** The shape problems of `document`, each at its JSON path; empty when its shape is valid. */
export function shapeIssuesOf(document: Configuration): FieldIssue[] {
  const parsed = configurationShapeSchema.safeParse(document);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => ({
    path: issue.path.map((key) => (typeof key === "number" ? key : String(key))),
    message: issue.message,
  }));
}
