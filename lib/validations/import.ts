import { z } from "zod";

/** Largest configuration file accepted by `POST /api/configurations/import`, in bytes (256 KiB). */
export const importMaxBytes = 256 * 1024;

/** The non-file fields of the import form. Without `groupId` the file goes to the personal space. */
export const importFieldsSchema = z.object({
  groupId: z.uuid({ error: "Choose a space you belong to." }).optional(),
});
