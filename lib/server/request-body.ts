import "server-only";
import { InvalidJsonError, PayloadTooLargeError, ValidationError, type FieldIssue } from "@/lib/errors";
import { isStorableText, unstorableTextMessage } from "@/lib/storable-text";

/**
 * Reads a request body into memory, counting bytes as they arrive: a body over `limitBytes` is
 * refused (413) as soon as it crosses the limit, whether or not it declared a Content-Length, so a
 * chunked upload cannot make the server hold more than the limit.
 */
export async function readBodyBytes(request: Request, limitBytes: number, tooLarge?: string): Promise<Uint8Array> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > limitBytes) throw new PayloadTooLargeError(limitBytes, tooLarge);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limitBytes) {
      await reader.cancel().catch(() => undefined);
      throw new PayloadTooLargeError(limitBytes, tooLarge);
    }
    chunks.push(value);
  }
  if (chunks.length === 1) return chunks[0] as Uint8Array;
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

const strictUtf8 = new TextDecoder("utf-8", { fatal: true });

/**
 * Reads a JSON body of at most `limitBytes`: 413 past the limit, 400 (`invalid_json`) for bytes that
 * are not UTF-8 JSON, 422 for text PostgreSQL cannot store (see {@link assertStorableText}).
 */
export async function readJsonBody(request: Request, limitBytes: number): Promise<unknown> {
  const bytes = await readBodyBytes(request, limitBytes);
  return parseJsonText(decodeUtf8(bytes));
}

/** Decodes UTF-8 strictly; malformed bytes are a 400. A leading byte-order mark is dropped. */
export function decodeUtf8(bytes: Uint8Array): string {
  try {
    return strictUtf8.decode(bytes);
  } catch {
    throw new InvalidJsonError("The request body is not valid UTF-8 text.");
  }
}

/** Parses JSON text (400 when it is not JSON) and checks that every string in it can be stored. */
export function parseJsonText(text: string): unknown {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new InvalidJsonError(`The request body is not valid JSON (${error instanceof Error ? error.message : "unreadable"}).`);
  }
  assertStorableText(value);
  return value;
}

/**
 * The query string as a plain object (last value wins), with the same text check as bodies.
 */
export function readQuery(request: Request): Record<string, string> {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  assertStorableText(query);
  return query;
}

/**
 * Rejects (422, with the JSON path of each bad string) NUL characters and unpaired surrogates in
 * any string or object key of a parsed JSON value: JSON allows them, but PostgreSQL's text and
 * jsonb do not, and they mean nothing in a configuration.
 */
export function assertStorableText(value: unknown): void {
  const issues: FieldIssue[] = [];
  // An explicit stack of nodes that point at their parents: JSON.parse accepts nesting deep enough
  // to overflow a recursive walk, and paths are built only for the strings that fail.
  const pending: PathNode[] = [{ value, key: null, parent: null }];
  while (pending.length > 0 && issues.length < maxIssues) {
    const node = pending.pop() as PathNode;
    const current = node.value;
    if (typeof current === "string") {
      if (!isStorableText(current)) issues.push({ path: pathOf(node), message: unstorableTextMessage });
    } else if (Array.isArray(current)) {
      for (let index = current.length - 1; index >= 0; index -= 1) pending.push({ value: current[index], key: index, parent: node });
    } else if (current !== null && typeof current === "object") {
      for (const [key, item] of Object.entries(current).reverse()) {
        const child: PathNode = { value: item, key, parent: node };
        if (!isStorableText(key)) {
          issues.push({ path: pathOf(child), message: "Keys may not contain NUL characters or unpaired UTF-16 surrogates." });
        } else {
          pending.push(child);
        }
      }
    }
  }
  if (issues.length > 0) throw new ValidationError(issues);
}

interface PathNode {
  value: unknown;
  key: string | number | null;
  parent: PathNode | null;
}

function pathOf(node: PathNode): (string | number)[] {
  const path: (string | number)[] = [];
  for (let current: PathNode | null = node; current && current.key !== null; current = current.parent) path.push(current.key);
  return path.reverse();
}

/** Enough issues to show what is wrong without echoing a hostile body back at length. */
const maxIssues = 20;
