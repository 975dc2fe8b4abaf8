import type { z } from "zod";
import { toDomainError, ValidationError } from "@/lib/errors";
import { isStorableText, unstorableTextMessage } from "@/lib/storable-text";

/**
 * What a form's server action answers: a status, a message for the whole form and error messages
 * per field. `values` echoes what the user typed (never passwords) so nothing is lost on failure.
 * Field names come from the form's zod schema, so they are never typed twice.
 */
export interface ActionState<TField extends string = string> {
  status: "idle" | "success" | "error";
  message: string | null;
  fieldErrors: Partial<Record<TField, string[]>>;
  values: Partial<Record<TField, string>>;
}

/** The field names of a zod object schema, for `ActionState<FieldsOf<typeof schema>>`. */
export type FieldsOf<TSchema extends z.ZodType> = Extract<keyof z.input<TSchema>, string>;

/** The state a form starts in. */
export function idleState<TField extends string>(): ActionState<TField> {
  return { status: "idle", message: null, fieldErrors: {}, values: {} };
}

/** Reads the named text fields of a form submission (missing fields become ""). */
export function readFields<TField extends string>(formData: FormData, fields: readonly TField[]): Record<TField, string> {
  const entries = fields.map((field) => {
    const value = formData.get(field);
    return [field, typeof value === "string" ? value : ""] as const;
  });
  return Object.fromEntries(entries) as Record<TField, string>;
}

/** What `parseFields` gives: the parsed data, or the issues to show with `invalidState`. */
export type ParsedFields<T> =
  | { success: true; data: T }
  | { success: false; error: { issues: readonly { path: readonly PropertyKey[]; message: string }[] } };

/**
 * Parses form fields with `schema`, after refusing (an issue on each such field) text PostgreSQL
 * cannot store, NUL characters and unpaired surrogates, as the JSON routes answer 422 for it.
 */
export function parseFields<TSchema extends z.ZodType>(schema: TSchema, fields: Record<string, string>): ParsedFields<z.output<TSchema>> {
  const unstorable = Object.keys(fields).filter((field) => !isStorableText(fields[field] ?? ""));
  if (unstorable.length > 0) {
    return { success: false, error: { issues: unstorable.map((field) => ({ path: [field], message: unstorableTextMessage })) } };
  }
  return schema.safeParse(fields);
}

/** An error state with each zod issue under the field it concerns (issues without a field go to `message`). */
export function invalidState<TField extends string>(
  issues: readonly { path: readonly PropertyKey[]; message: string }[],
  values: Partial<Record<TField, string>> = {},
): ActionState<TField> {
  const fieldErrors: Partial<Record<TField, string[]>> = {};
  const general: string[] = [];
  for (const issue of issues) {
    const field = issue.path[0];
    if (typeof field === "string") {
      const key = field as TField;
      (fieldErrors[key] ??= []).push(issue.message);
    } else {
      general.push(issue.message);
    }
  }
  return { status: "error", message: general[0] ?? "Please correct the highlighted fields.", fieldErrors, values };
}

/**
 * Turns an error thrown by the data-access layer into form state: validation issues land on their
 * fields, other domain errors become the form message, and anything unexpected is logged.
 */
export function errorState<TField extends string>(
  error: unknown,
  values: Partial<Record<TField, string>> = {},
): ActionState<TField> {
  const known = toDomainError(error);
  if (known instanceof ValidationError) return invalidState<TField>(known.issues, values);
  if (known) return { status: "error", message: known.message, fieldErrors: {}, values };
  console.error("Unexpected error in a form action:", error);
  return { status: "error", message: "Something went wrong on our side. Nothing was saved; please try again.", fieldErrors: {}, values };
}
