import "server-only";
import { PayloadTooLargeError, ValidationError } from "@/lib/errors";

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
 * Reads the file in form field `field` of a multipart request. A body whose declared length
 * exceeds the limit is refused before it is read (413); so is a file over `limitBytes`.
 * A missing field or a request that is not multipart is a 422 on `[field]`.
 */
export async function readMultipartFile(request: Request, field: string, limitBytes: number): Promise<UploadedFile> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > limitBytes + multipartOverheadBytes) throw new PayloadTooLargeError(limitBytes, tooLarge(limitBytes));
  if (!(request.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data")) {
    throw ValidationError.at([field], "Send the file as multipart/form-data.");
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw ValidationError.at([field], "The upload could not be read; try again.");
  }
  const file = form.get(field);
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
