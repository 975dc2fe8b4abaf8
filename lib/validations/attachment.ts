import { z } from "zod";

/** Largest attachment accepted, in bytes (5 MiB). The database allows more; the app caps here. */
export const attachmentMaxBytes = 5 * 1024 * 1024;

/** File names are kept for display and downloads; path parts and control characters are dropped. */
export const attachmentFileNameSchema = z
  .string()
  .transform((name) => name.split(/[\\/]/).pop() ?? "")
  .transform((name) => name.replace(/[\u0000-\u001f\u007f"]/g, "").trim().slice(0, 200))
  .pipe(z.string().min(1, "The file needs a name."));
