/**
 * The browser's one way to call the Mooring API: `apiFetch` sends JSON requests and turns error
 * answers into {@link ApiError}s with their status, code, field issues and current version.
 */
import type { FieldIssue } from "@/lib/errors";

/** A DTO as it arrives over JSON: dates become ISO strings. */
export type Jsonified<T> = T extends Date
  ? string
  : T extends object
    ? { [K in keyof T]: Jsonified<T[K]> }
    : T;

/** An error answer of the API, with its status and body fields. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: FieldIssue[] = [],
    readonly currentVersion: number | null = null,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/** Fetches JSON from the API and turns error answers into {@link ApiError}. */
export async function apiFetch<T>(url: string, init?: RequestInit): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, { ...init, headers: { accept: "application/json", ...init?.headers } });
  } catch {
    throw new ApiError(0, "network", "The server could not be reached. Your draft is kept in this browser.");
  }
  if (response.status === 204) return undefined as T;
  const body: unknown = await response.json().catch(() => null);
  if (!response.ok) {
    const data = (typeof body === "object" && body !== null ? body : {}) as Record<string, unknown>;
    throw new ApiError(
      response.status,
      typeof data.error === "string" ? data.error : "error",
      typeof data.message === "string" ? data.message : `The request failed (${response.status}).`,
      Array.isArray(data.issues) ? (data.issues as FieldIssue[]) : [],
      typeof data.currentVersion === "number" ? data.currentVersion : null,
    );
  }
  return body as T;
}

/** Converts a server DTO to the shape the API sends (dates as ISO strings), for server-rendered initial data. */
export function toJson<T>(value: T): Jsonified<T> {
  return JSON.parse(JSON.stringify(value)) as Jsonified<T>;
}
