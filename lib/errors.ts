import { ZodError } from "zod";
import { unstorableTextMessage } from "@/lib/storable-text";

/** One problem with an input, addressed by its JSON path (e.g. ["stacks", 0, "count"]). */
export interface FieldIssue {
  path: (string | number)[];
  message: string;
}

/**
 * Formats a path as JSON-path text: `["stacks", 0, "position", "9"]` -> `stacks[0].position["9"]`.
 *
 * @example
 * formatJsonPath(["stacks", 1, "worldvolume"]) // => "stacks[1].worldvolume"
 * formatJsonPath([])                           // => ""
 */
export function formatJsonPath(path: readonly PropertyKey[]): string {
  let text = "";
  for (const key of path) {
    if (typeof key === "number") text += `[${key}]`;
    else if (typeof key === "string" && /^[A-Za-z_$][\w$]*$/.test(key)) text += text ? `.${key}` : key;
    else text += `[${JSON.stringify(String(key))}]`;
  }
  return text;
}

/** Base class of the errors the data-access layer throws on purpose; each maps to one HTTP status. */
export abstract class DomainError extends Error {
  abstract readonly status: number;
  abstract readonly code: string;

  /** Extra JSON fields of the error response (besides `error` and `message`). */
  toJSON(): Record<string, unknown> {
    return {};
  }
}

/** The thing does not exist, or the caller may not know that it exists (404). */
export class NotFoundError extends DomainError {
  readonly status = 404;
  readonly code = "not_found";
  constructor(message = "Not found.") {
    super(message);
    this.name = "NotFoundError";
  }
}

/** The caller is known and may see the thing, but may not do this to it (403). */
export class ForbiddenError extends DomainError {
  readonly status = 403;
  readonly code = "forbidden";
  constructor(message = "You do not have permission to do this.") {
    super(message);
    this.name = "ForbiddenError";
  }
}

/** No session, or the credentials are wrong (401). */
export class UnauthenticatedError extends DomainError {
  readonly status = 401;
  readonly code = "unauthenticated";
  constructor(message = "Please sign in.") {
    super(message);
    this.name = "UnauthenticatedError";
  }
}

/** A save based on a stale version (409); carries the version now stored. */
export class ConflictError extends DomainError {
  readonly status = 409;
  readonly code = "conflict";
  constructor(
    readonly currentVersion: number,
    message = "Someone else saved a newer version. Reload it or save yours as a fork.",
  ) {
    super(message);
    this.name = "ConflictError";
  }
  override toJSON() {
    return { currentVersion: this.currentVersion };
  }
}

/** The input is well-formed but wrong (422); lists every problem with its path. */
export class ValidationError extends DomainError {
  readonly status = 422;
  readonly code = "validation_failed";
  constructor(
    readonly issues: FieldIssue[],
    message = issues[0]?.message ?? "The input is not valid.",
  ) {
    super(message);
    this.name = "ValidationError";
  }

  /** A ValidationError with a single issue at `path`. */
  static at(path: (string | number)[], message: string): ValidationError {
    return new ValidationError([{ path, message }]);
  }

  /** Converts a zod error, keeping every issue and its JSON path. */
  static fromZod(error: ZodError): ValidationError {
    return new ValidationError(
      error.issues.map((issue) => ({
        path: issue.path.map((key) => (typeof key === "number" ? key : String(key))),
        message: issue.message,
      })),
    );
  }

  /** Each issue with its path as an array (for programs) and as JSON-path text (for people). */
  override toJSON() {
    return { issues: this.issues.map((issue) => ({ ...issue, jsonPath: formatJsonPath(issue.path) })) };
  }
}

/** The request body is not well-formed JSON (or not UTF-8 text) (400). */
export class InvalidJsonError extends DomainError {
  readonly status = 400;
  readonly code = "invalid_json";
  constructor(message = "The request body is not valid JSON.") {
    super(message);
    this.name = "InvalidJsonError";
  }
}

/** Too many requests or a locked account (429); `retryAfterSeconds` feeds the Retry-After header. */
export class RateLimitError extends DomainError {
  readonly status = 429;
  readonly code = "rate_limited";
  constructor(
    readonly retryAfterSeconds: number,
    message = "Too many requests. Please wait and try again.",
  ) {
    super(message);
    this.name = "RateLimitError";
  }
  override toJSON() {
    return { retryAfterSeconds: this.retryAfterSeconds };
  }
}

/** The request body is larger than allowed (413). */
export class PayloadTooLargeError extends DomainError {
  readonly status = 413;
  readonly code = "payload_too_large";
  constructor(
    readonly limitBytes: number,
    message = `The request is larger than ${limitBytes} bytes.`,
  ) {
    super(message);
    this.name = "PayloadTooLargeError";
  }
  override toJSON() {
    return { limitBytes: this.limitBytes };
  }
}

/** The database cannot be reached (503); nothing was written. */
export class ServiceUnavailableError extends DomainError {
  readonly status = 503;
  readonly code = "service_unavailable";
  constructor(message = "The database is unavailable. Nothing was saved; please try again shortly.") {
    super(message);
    this.name = "ServiceUnavailableError";
  }
}

/**
 * Maps any thrown value to a JSON Response: domain errors to their status, zod errors to 422 with
 * every issue's path, lost database connections to 503, anything else to a logged 500.
 * Body shape: `{ error: code, message, ...details }`.
 */
export function toErrorResponse(error: unknown): Response {
  const known = toDomainError(error);
  if (known) {
    const headers: Record<string, string> = {};
    if (known instanceof RateLimitError) {
      headers["Retry-After"] = String(Math.max(1, Math.ceil(known.retryAfterSeconds)));
    }
    if (known instanceof ServiceUnavailableError) headers["Retry-After"] = "5";
    return Response.json(
      { error: known.code, message: known.message, ...known.toJSON() },
      { status: known.status, headers },
    );
  }
  console.error("Unexpected error while handling a request:", error);
  return Response.json(
    { error: "internal_error", message: "Something went wrong on our side. Please try again." },
    { status: 500 },
  );
}

/** The DomainError that `error` stands for, or null when it is unexpected. */
export function toDomainError(error: unknown): DomainError | null {
  if (error instanceof DomainError) return error;
  if (error instanceof ZodError) return ValidationError.fromZod(error);
  if (isDatabaseUnavailable(error)) return new ServiceUnavailableError();
  if (isUnstorableText(error)) return new ValidationError([{ path: [], message: unstorableTextMessage }]);
  return null;
}

/**
 * True for PostgreSQL refusing text it cannot hold: 22021 (a NUL byte in text) and 22P05 (\u0000
 * in jsonb). Inputs are checked before they reach the database; this is the net under those checks.
 */
function isUnstorableText(error: unknown): boolean {
  for (let current = error, depth = 0; current && typeof current === "object" && depth < 5; depth += 1) {
    const code = "code" in current ? String(current.code) : "";
    if (code === "22021" || code === "22P05") return true;
    current = "cause" in current ? current.cause : undefined;
  }
  return false;
}

/** PostgreSQL SQLSTATE classes and Node socket codes that mean "the database is not reachable". */
const unavailableCodes = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "57P01", // admin_shutdown
  "57P02", // crash_shutdown
  "57P03", // cannot_connect_now
]);

/** True when `error` (or any error in its `cause` chain) says the database connection failed. */
export function isDatabaseUnavailable(error: unknown): boolean {
  for (let current = error, depth = 0; current && depth < 5; depth += 1) {
    if (typeof current !== "object") return false;
    const code = "code" in current ? String(current.code) : "";
    const message = current instanceof Error ? current.message : "";
    if (unavailableCodes.has(code) || code.startsWith("08")) return true;
    if (/Connection terminated|connection timeout|Client has encountered a connection error/i.test(message)) {
      return true;
    }
    current = "cause" in current ? current.cause : undefined;
  }
  return false;
}
