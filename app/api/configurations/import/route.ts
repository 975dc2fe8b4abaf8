import { createConfiguration } from "@/db/queries/configurations";
import { getPersonalGroup } from "@/db/queries/groups";
import { computeAuthoritativeResult } from "@/lib/server/configuration-handlers";
import { parseConfigurationFile, relativeToFile } from "@/lib/server/import-configuration";
import { readMultipartFile } from "@/lib/server/multipart";
import { toErrorResponse, UnauthenticatedError, ValidationError } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { importFieldsSchema, importMaxBytes } from "@/lib/validations/import";

/**
 * POST /api/configurations/import (multipart: `file`, optional `groupId`): creates a configuration
 * from a configuration file. 201 with the configuration; 413 over 256 kB; 422 listing every
 * problem with its JSON path in the file. Nothing is saved from an invalid file.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    const actor = await getCurrentUser();
    if (!actor) throw new UnauthenticatedError();
    const file = await readMultipartFile(request, "file", importMaxBytes);
    const groupValue = file.form.get("groupId");
    const fields = importFieldsSchema.parse({ groupId: typeof groupValue === "string" && groupValue ? groupValue : undefined });
    const document = parseConfigurationFile(new TextDecoder("utf-8").decode(file.data));
    let computed: ReturnType<typeof computeAuthoritativeResult>;
    try {
      computed = computeAuthoritativeResult(document);
    } catch (error) {
      throw error instanceof ValidationError ? relativeToFile(error) : error;
    }
    const groupId = fields.groupId ?? (await getPersonalGroup(actor)).id;
    const created = await createConfiguration(
      actor,
      groupId,
      document,
      `Imported from ${file.fileName || "a file"}`,
      computed.result,
      computed.computeMs,
    );
    return Response.json(created, { status: 201, headers: { location: `/configurations/${created.id}` } });
  } catch (error) {
    return toErrorResponse(error);
  }
}
