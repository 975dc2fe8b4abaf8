import { assertMayAttach, listAttachments, uploadAttachment } from "@/db/queries/attachments";
import { readMultipartFile } from "@/lib/server/multipart";
import { route } from "@/lib/server/route";
import { attachmentFileNameSchema, attachmentMaxBytes } from "@/lib/validations/attachment";

/** GET /api/configurations/[configurationId]/attachments: metadata of the attachments (any member). */
export const GET = route({ params: ["configurationId"] }, async ({ actor, params }) =>
  Response.json(await listAttachments(actor, params.configurationId)),
);

/**
 * POST /api/configurations/[configurationId]/attachments (multipart, field `file`): editors and
 * owners, checked before the upload is read (anyone else gets 401/403/404 without sending it).
 * 201 with the attachment; 413 over the size limit, counted as the body streams in; 422 when the
 * bytes are not PNG, JPEG or PDF. The stored name ends in the extension of the type found.
 */
export const POST = route(
  {
    params: ["configurationId"],
    before: ({ actor, params }) => assertMayAttach(actor, params.configurationId),
  },
  async ({ request, actor, params }) => {
    const file = await readMultipartFile(request, "file", attachmentMaxBytes);
    const fileName = attachmentFileNameSchema.parse(file.fileName);
    return Response.json(await uploadAttachment(actor, params.configurationId, { fileName, data: file.data }), { status: 201 });
  },
);
