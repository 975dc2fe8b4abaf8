import { listAttachments, uploadAttachment } from "@/db/queries/attachments";
import { readMultipartFile } from "@/lib/server/multipart";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { attachmentFileNameSchema, attachmentMaxBytes } from "@/lib/validations/attachment";

interface AttachmentsRouteContext {
  params: Promise<{ configurationId: string }>;
}

/** GET /api/configurations/[configurationId]/attachments: metadata of the attachments (any member). */
export async function GET(_request: Request, context: AttachmentsRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    return Response.json(await listAttachments(await getCurrentUser(), configurationId));
  } catch (error) {
    return toErrorResponse(error);
  }
}

/**
 * POST /api/configurations/[configurationId]/attachments (multipart, field `file`): editors and
 * owners. 201 with the attachment; 413 over 5 MB; 422 when the bytes are not PNG, JPEG or PDF.
 */
export async function POST(request: Request, context: AttachmentsRouteContext): Promise<Response> {
  try {
    const { configurationId } = await context.params;
    const actor = await getCurrentUser();
    const file = await readMultipartFile(request, "file", attachmentMaxBytes);
    const fileName = attachmentFileNameSchema.parse(file.fileName);
    return Response.json(await uploadAttachment(actor, configurationId, { fileName, data: file.data }), { status: 201 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
