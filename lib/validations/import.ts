import { z } from "./zod";
import { checkConfiguration } from "@/lib/boundary/check";
import type { Configuration } from "@/lib/boundary/types";
import { ValidationError, type FieldIssue } from "@/lib/errors";
import { compactSchema, configurationSchema, stackSchema } from "./configuration";

/** Largest configuration file accepted by `POST /api/configurations/import`, in bytes (256 KiB). */
export const importMaxBytes = 256 * 1024;

/** The non-file fields of the import form. Without `groupId` the file goes to the personal space. */
export const importFieldsSchema = z.object({
  groupId: z.uuid({ error: "Choose a space you belong to." }).optional(),
});

const expectation = "Import takes one configuration file: a JSON object such as Export → Configuration (JSON) writes.";

/**
 * Parses and validates an uploaded configuration file, judged by its content whatever its name:
 * a picture, a PDF, a table or other text that is not JSON is named as what it looks like. Every
 * problem is reported at once with its JSON path inside the file (422).
 */
export function parseConfigurationFileBytes(bytes: Uint8Array): Configuration {
  const binary = binaryKind(bytes);
  if (binary) throw ValidationError.at([], `This file is ${binary}, not a configuration file. ${expectation}`);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw ValidationError.at([], `This file is not text (it is not valid UTF-8), so it cannot be a configuration file. ${expectation}`);
  }
  return parseConfigurationFile(text);
}

/**
 * Parses and validates the text of a configuration file. Every problem is reported at once with
 * its JSON path inside the file (422): the shape's problems and the engine's, even when the shape
 * is wrong in other places. Text that is not JSON is named by what it looks like.
 */
export function parseConfigurationFile(text: string): Configuration {
  const body = text.replace(/^\uFEFF/, "");
  let raw: unknown;
  try {
    raw = JSON.parse(body);
  } catch (error) {
    const looks = textKind(body);
    if (looks) throw ValidationError.at([], `This file is not JSON: it looks like ${looks}. ${expectation}`);
    const detail = error instanceof Error ? error.message : "unreadable";
    throw ValidationError.at([], `The file is not valid JSON (${detail}). ${expectation}`);
  }
  if (Array.isArray(raw)) {
    throw ValidationError.at(
      [],
      `The file holds a list (it starts with “[”) of ${raw.length} ${raw.length === 1 ? "item" : "items"}; a configuration file is one object, starting with “{”. To import several configurations, put each in a file of its own.`,
    );
  }
  if (typeof raw !== "object" || raw === null) {
    throw ValidationError.at([], `The file holds a single ${raw === null ? "null" : typeof raw} value, not a configuration object. ${expectation}`);
  }
  const parsed = configurationSchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const issues = ValidationError.fromZod(parsed.error).issues;
  throw new ValidationError(withIssues(issues, engineIssuesOfWellFormedStacks(raw as Record<string, unknown>)));
}

/**
 * The engine's problems with the stacks that have the right shape, when other parts of the file do
 * not (a missing title, one malformed stack): zod stops before the engine's check then, and the
 * author should not have to fix the file twice to learn that a D3 is not allowed in IIA.
 */
function engineIssuesOfWellFormedStacks(raw: Record<string, unknown>): FieldIssue[] {
  const theory = raw.theory;
  if (theory !== "IIA" && theory !== "IIB" && theory !== "bosonic") return [];
  if (!Array.isArray(raw.stacks)) return [];
  const indices: number[] = [];
  const stacks: Configuration["stacks"] = [];
  raw.stacks.forEach((candidate: unknown, index: number) => {
    const stack = stackSchema.safeParse(candidate);
    if (stack.success) {
      indices.push(index);
      stacks.push(stack.data);
    }
  });
  const dimension = typeof raw.dimension === "number" ? { dimension: raw.dimension } : {};
  // Wilson lines are judged against the compact axes, so only when those are well formed.
  const compact = compactSchema.optional().safeParse(raw.compact);
  const probe: Configuration = {
    format: 2,
    title: "probe",
    theory,
    ...dimension,
    stringScaleGeV: null,
    levels: 0,
    stacks,
    ...(compact.success && compact.data ? { compact: compact.data } : {}),
  };
  return checkConfiguration(probe)
    .filter((issue) => issue.path[0] === "stacks" && typeof issue.path[1] === "number")
    .filter((issue) => compact.success || issue.path[2] !== "wilson")
    .map((issue) => ({ path: ["stacks", indices[issue.path[1] as number] ?? (issue.path[1] as number), ...issue.path.slice(2)], message: issue.message }));
}

function withIssues(issues: FieldIssue[], more: FieldIssue[]): FieldIssue[] {
  const seen = new Set(issues.map((issue) => `${issue.path.join(".")}|${issue.message}`));
  return [...issues, ...more.filter((issue) => !seen.has(`${issue.path.join(".")}|${issue.message}`))];
}

/** What a binary file is, from its first bytes (file signatures, common practice), or null for text. */
function binaryKind(bytes: Uint8Array): string | null {
  const starts = (...signature: number[]) => signature.every((byte, i) => bytes[i] === byte);
  if (starts(0x89, 0x50, 0x4e, 0x47)) return "a PNG image";
  if (starts(0xff, 0xd8, 0xff)) return "a JPEG image";
  if (starts(0x47, 0x49, 0x46, 0x38)) return "a GIF image";
  if (starts(0x25, 0x50, 0x44, 0x46)) return "a PDF document";
  if (starts(0x50, 0x4b, 0x03, 0x04)) return "a ZIP archive (or an office document)";
  if (bytes.subarray(0, 4096).includes(0)) return "a binary file";
  return null;
}

/** What text that is not JSON looks like, or null when it looks like broken JSON. */
function textKind(text: string): string | null {
  const start = text.trimStart();
  if (start === "") return "an empty file";
  if (start.startsWith("{") || start.startsWith("[")) return null;
  if (/\\(documentclass|begin\{)/.test(start)) return "a LaTeX document";
  if (start.startsWith("<")) return "an HTML or XML document";
  const lines = start.split(/\r?\n/).filter((line) => line.trim() !== "").slice(0, 5);
  const commas = lines.map((line) => line.split(",").length - 1);
  if (lines.length >= 2 && commas[0]! > 0 && commas.every((n) => n === commas[0])) return "a CSV table (a spectrum export, perhaps)";
  if (lines.every((line) => /^\s*(-\s+)?[\w"' ]+:\s/.test(line) || /^\s*-\s/.test(line) || /^\s*#/.test(line))) return "YAML";
  return "plain text";
}
