import "server-only";
import { ValidationError } from "@/lib/errors";
import type { Configuration } from "@/lib/boundary/types";
import { configurationSchema } from "@/lib/validations/configuration";

/**
 * Parses and validates the text of a configuration file. Every problem is reported at once with
 * its JSON path inside the file (422); a file that is not JSON reports the parser's position.
 */
export function parseConfigurationFile(text: string): Configuration {
  let raw: unknown;
  try {
    raw = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (error) {
    const detail = error instanceof Error ? error.message : "unreadable";
    throw ValidationError.at([], `The file is not valid JSON (${detail}).`);
  }
  const parsed = configurationSchema.safeParse(raw);
  if (!parsed.success) throw ValidationError.fromZod(parsed.error);
  return parsed.data;
}

/** Engine problems are reported at `["document", ...]`; in a file, the document is the root. */
export function relativeToFile(error: ValidationError): ValidationError {
  return new ValidationError(
    error.issues.map((issue) => ({
      path: issue.path[0] === "document" ? issue.path.slice(1) : issue.path,
      message: issue.message,
    })),
  );
}
