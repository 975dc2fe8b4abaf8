import { z } from "zod";
import type { Configuration } from "@/lib/boundary/types";
import { ValidationError } from "@/lib/errors";
import { configurationSchema } from "./configuration";

/** Largest configuration file accepted by `POST /api/configurations/import`, in bytes (256 KiB). */
export const importMaxBytes = 256 * 1024;

/** The non-file fields of the import form. Without `groupId` the file goes to the personal space. */
export const importFieldsSchema = z.object({
  groupId: z.uuid({ error: "Choose a space you belong to." }).optional(),
});

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
