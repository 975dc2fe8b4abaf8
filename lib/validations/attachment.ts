import { z } from "./zod";

/** Largest attachment accepted, in bytes (5 MiB). The database allows more; the app caps here. */
export const attachmentMaxBytes = 5 * 1024 * 1024;

// Bidirectional formatting characters (U+061C, U+200E-U+200F, U+202A-U+202E, U+2066-U+2069) make
// a name display in another order than it is stored: "report\u202Efdp.exe" shows as "reportexe.pdf".
const bidiControls = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/**
 * File names are kept for display and downloads; path parts, control characters and bidirectional
 * formatting characters are dropped (the extension is set from the content, see
 * `attachmentFileNameFor`).
 */
export const attachmentFileNameSchema = z
  .string()
  .transform((name) => name.split(/[\\/]/).pop() ?? "")
  .transform((name) => name.replace(/[\u0000-\u001f\u007f-\u009f"]/g, "").replace(bidiControls, "").trim().slice(0, 200))
  .pipe(z.string().min(1, "The file needs a name."));
