import "server-only";
import { PayloadTooLargeError, ValidationError } from "@/lib/errors";
import { assertStorableText, readBodyBytes } from "@/lib/server/request-body";

/** Room for multipart boundaries and headers around the file itself. */
const multipartOverheadBytes = 16 * 1024;

/** One uploaded file, read into memory. */
export interface UploadedFile {
  fileName: string;
  data: Uint8Array;
  /** The whole form, for the request's other fields. */
  form: FormData;
}

/**
 * Reads the file in form field `field` of a multipart request. The body is counted as it streams
 * in and refused (413) as soon as it passes the limit plus room for the form's framing, declared
 * length or not; so is a file over `limitBytes`. A missing field or a request that is not
 * multipart is a 422 on `[field]`; so is a file name holding NUL characters (see
 * `assertStorableText`).
 */
export async function readMultipartFile(request: Request, field: string, limitBytes: number): Promise<UploadedFile> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    throw ValidationError.at([field], "Send the file as multipart/form-data.");
  }
  const bytes = await readBodyBytes(request, limitBytes + multipartOverheadBytes, tooLarge(limitBytes));
  let form: FormData;
  try {
    // Request bodies arrive in ArrayBuffers (never shared memory), which is what Response takes.
    form = await new Response(bytes as Uint8Array<ArrayBuffer>, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw ValidationError.at([field], "The upload could not be read; try again.");
  }
  const file = form.get(field);
  // The file's name is stored; other fields are read through the route's own schema, and fields
  // nobody reads (any name a client makes up) are ignored.
  if (file !== null) assertStorableText({ [field]: typeof file === "string" ? file : file.name });
  if (!(file instanceof File)) throw ValidationError.at([field], "Choose a file to upload.");
  if (file.size > limitBytes) throw new PayloadTooLargeError(limitBytes, tooLarge(limitBytes));
  return { fileName: file.name, data: new Uint8Array(await file.arrayBuffer()), form };
}

/** A plain-language size limit, e.g. "5 MB" or "256 kB". */
export function describeBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB` : `${Math.round(bytes / 1024)} kB`;
}

function tooLarge(limitBytes: number): string {
  return `The file is larger than ${describeBytes(limitBytes)}.`;
}
