import { deleteAttachment, getAttachmentFile } from "@/db/queries/attachments";
import { toErrorResponse } from "@/lib/errors";
import { getCurrentUser } from "@/lib/server/session";
import { contentDisposition } from "@/lib/server/content-disposition";

interface AttachmentRouteContext {
  params: Promise<{ attachmentId: string }>;
}

/**
 * GET /api/attachments/[attachmentId]: the file, members of the configuration's group only
 * (everyone else 404). Images may display inline; PDFs download.
 */
export async function GET(request: Request, context: AttachmentRouteContext): Promise<Response> {
  try {
    const { attachmentId } = await context.params;
    const file = await getAttachmentFile(await getCurrentUser(), attachmentId);
    const inline = new URL(request.url).searchParams.get("inline") === "1" && file.contentType.startsWith("image/");
    return new Response(new Uint8Array(file.data), {
      headers: {
        "content-type": file.contentType,
        "content-length": String(file.data.byteLength),
        "content-disposition": contentDisposition(inline ? "inline" : "attachment", file.fileName),
        "cache-control": "private, no-store",
        "x-content-type-options": "nosniff",
      },
    });
  } catch (error) {
    return toErrorResponse(error);
  }
}

/** DELETE /api/attachments/[attachmentId]: editors and owners. 204. */
export async function DELETE(_request: Request, context: AttachmentRouteContext): Promise<Response> {
  try {
    const { attachmentId } = await context.params;
    await deleteAttachment(await getCurrentUser(), attachmentId);
    return new Response(null, { status: 204 });
  } catch (error) {
    return toErrorResponse(error);
  }
}
