import { readdirSync } from "node:fs";
import path from "node:path";

/** The folder of the JSON route handlers. */
export const apiRoot = path.resolve(import.meta.dirname, "..", "..", "app", "api");

/** HTTP methods a route file may export. */
export const routeMethods = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
export type RouteMethod = (typeof routeMethods)[number];

export type RouteHandler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** Every route.ts under app/api, relative to it (e.g. "configurations/[configurationId]/route.ts"), found on disk. */
export function routeFiles(): string[] {
  return (readdirSync(apiRoot, { recursive: true }) as string[])
    .map((file) => file.split(path.sep).join("/"))
    .filter((file) => file === "route.ts" || file.endsWith("/route.ts"))
    .sort();
}

/** The handlers a route file exports, by method. */
export async function handlersOf(file: string): Promise<Partial<Record<RouteMethod, RouteHandler>>> {
  const module = (await import(/* @vite-ignore */ path.join(apiRoot, file))) as Record<string, unknown>;
  return Object.fromEntries(routeMethods.filter((method) => typeof module[method] === "function").map((method) => [method, module[method] as RouteHandler]));
}

/**
 * The URL path of a route file, with its dynamic segments in OpenAPI's braces:
 * "configurations/[configurationId]/route.ts" -> "/api/configurations/{configurationId}".
 */
export function urlPathOf(file: string): string {
  const segments = file.replace(/(^|\/)route\.ts$/, "").split("/").filter(Boolean);
  return `/api/${segments.map((segment) => segment.replace(/^\[(?:\.\.\.)?(\w+)\]$/, "{$1}")).join("/")}`;
}
