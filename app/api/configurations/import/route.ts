import { importConfiguration } from "@/db/queries/configurations";
import { readMultipartFile } from "@/lib/server/multipart";
import { route } from "@/lib/server/route";
import { importFieldsSchema, importMaxBytes } from "@/lib/validations/import";

/**
 * POST /api/configurations/import (multipart: `file`, optional `groupId`): creates a configuration
 * from a configuration file. 201 with the configuration; 413 over 256 kB; 422 listing every
 * problem with its JSON path in the file. Nothing is saved from an invalid file.
 */
export const POST = route({}, async ({ request, actor }) => {
  const file = await readMultipartFile(request, "file", importMaxBytes);
  const groupValue = file.form.get("groupId");
  const fields = importFieldsSchema.parse({ groupId: typeof groupValue === "string" && groupValue ? groupValue : undefined });
  const created = await importConfiguration(actor, {
    groupId: fields.groupId,
    fileName: file.fileName,
    bytes: file.data,
  });
  return Response.json(created, { status: 201, headers: { location: `/configurations/${created.id}` } });
});
