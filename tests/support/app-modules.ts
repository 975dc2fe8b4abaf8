// The route handlers under app/api and the server actions under app/, found on disk when a test
// runs, so that tables over them (tests/integration/authorization-matrix.test.ts, fuzz-api.test.ts,
// openapi.test.ts)
// notice every new file or export.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

export const methods = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
export type Method = (typeof methods)[number];

/** A route handler as Next calls it. */
export type RouteHandler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
/** A server action, whatever its arguments. */
export type ServerAction = (...args: never[]) => Promise<unknown>;

const appRoot = path.resolve(import.meta.dirname, "..", "..", "app");
const apiRoot = path.join(appRoot, "api");

/** Every route.ts under app/api, relative to it (e.g. "groups/[groupId]/route.ts"). */
export function routeFiles(): string[] {
  return (readdirSync(apiRoot, { recursive: true }) as string[])
    .map((file) => file.split(path.sep).join("/"))
    .filter((file) => file === "route.ts" || file.endsWith("/route.ts"))
    .sort();
}

/** The HTTP methods a route file exports, with their handlers. */
export async function handlersOf(file: string): Promise<Partial<Record<Method, RouteHandler>>> {
  const module = (await import(/* @vite-ignore */ path.join(apiRoot, file))) as Record<string, unknown>;
  return Object.fromEntries(methods.filter((method) => typeof module[method] === "function").map((method) => [method, module[method] as RouteHandler]));
}

/** The names of a route file's dynamic segments, e.g. ["groupId", "userId"]. */
export function paramNamesOf(file: string): string[] {
  return [...file.matchAll(/\[(?:\.\.\.)?([^\]]+)\]/g)].map((match) => match[1] ?? "");
}

/**
 * The URL path of a route file, with its dynamic segments in OpenAPI's braces:
 * "configurations/[configurationId]/route.ts" -> "/api/configurations/{configurationId}".
 */
export function urlPathOf(file: string): string {
  const segments = file.replace(/(^|\/)route\.ts$/, "").split("/").filter(Boolean);
  return `/api/${segments.map((segment) => segment.replace(/^\[(?:\.\.\.)?(\w+)\]$/, "{$1}")).join("/")}`;
}

/** Every file under app/ that starts with "use server", relative to app/. */
export function actionFiles(): string[] {
  return (readdirSync(appRoot, { recursive: true }) as string[])
    .map((file) => file.split(path.sep).join("/"))
    .filter((file) => /\.tsx?$/.test(file) && /^\s*["']use server["']/.test(readFileSync(path.join(appRoot, file), "utf8")))
    .sort();
}

/** The functions a server action file exports. */
export async function actionsOf(file: string): Promise<Record<string, ServerAction>> {
  const module = (await import(/* @vite-ignore */ path.join(appRoot, file))) as Record<string, unknown>;
  return Object.fromEntries(Object.entries(module).filter((entry): entry is [string, ServerAction] => typeof entry[1] === "function"));
}
