/**
 * Content type of an uploaded file from its first bytes ("magic numbers"), never from the
 * file name or the browser's claim. Only the attachment types Mooring accepts are known.
 */

/** Content types accepted for attachments. */
export type AttachmentContentType = "image/png" | "image/jpeg" | "application/pdf";

/** Signatures: PNG (RFC 2083 section 3.1), JPEG SOI + marker (ITU T.81), PDF header (ISO 32000-1 section 7.5.2). */
const signatures: ReadonlyArray<{ type: AttachmentContentType; bytes: readonly number[] }> = [
  { type: "image/png", bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { type: "image/jpeg", bytes: [0xff, 0xd8, 0xff] },
  { type: "application/pdf", bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] },
];

/**
 * Detects PNG, JPEG or PDF from the leading bytes.
 *
 * @param bytes - the file contents (only the first 8 bytes are read)
 * @returns the content type, or null for anything else (the caller rejects the upload)
 * @example
 * sniffContentType(new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d, 0x31])) // => "application/pdf"
 */
export function sniffContentType(bytes: Uint8Array): AttachmentContentType | null {
  for (const signature of signatures) {
    if (bytes.length >= signature.bytes.length && signature.bytes.every((byte, index) => bytes[index] === byte)) {
      return signature.type;
    }
  }
  return null;
}

/**
 * The file extension conventionally used for a sniffed type.
 *
 * @example
 * extensionFor("image/jpeg") // => "jpg"
 */
export function extensionFor(type: AttachmentContentType): "png" | "jpg" | "pdf" {
  return type === "image/png" ? "png" : type === "image/jpeg" ? "jpg" : "pdf";
}

/**
 * The name an attachment is stored under: the uploaded name's stem with the extension of the
 * sniffed type, whatever extension it had ("plot.html" holding PNG bytes becomes "plot.png"; an
 * extension that already names the type, like ".jpeg" or ".PNG", is kept as typed).
 *
 * @param fileName - the cleaned-up uploaded name (see `attachmentFileNameSchema`)
 * @param type - the type sniffed from the bytes
 * @example
 * attachmentFileNameFor("figure.svg.html", "image/png") // => "figure.svg.png"
 */
export function attachmentFileNameFor(fileName: string, type: AttachmentContentType): string {
  const dot = fileName.lastIndexOf(".");
  const stem = dot > 0 ? fileName.slice(0, dot) : fileName;
  const extension = dot > 0 ? fileName.slice(dot + 1) : "";
  if (knownExtensions[type].includes(extension.toLowerCase())) return fileName;
  return `${stem || "attachment"}.${extensionFor(type)}`;
}

const knownExtensions: Record<AttachmentContentType, readonly string[]> = {
  "image/png": ["png"],
  "image/jpeg": ["jpg", "jpeg"],
  "application/pdf": ["pdf"],
};
