import { deleteAttachment, getAttachmentFile } from "@/db/queries/attachments";
import { contentDisposition } from "@/lib/server/content-disposition";
import { route } from "@/lib/server/route";

/**
 * GET /api/attachments/[attachmentId]: the file, members of the configuration's group only
 * (everyone else 404). Images may display inline; PDFs download.
 */
export const GET = route({ params: ["attachmentId"] }, async ({ request, actor, params }) => {
  const file = await getAttachmentFile(actor, params.attachmentId);
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
});

/** DELETE /api/attachments/[attachmentId]: editors and owners. 204. */
export const DELETE = route({ params: ["attachmentId"] }, async ({ actor, params }) => {
  await deleteAttachment(actor, params.attachmentId);
  return new Response(null, { status: 204 });
});
