import "server-only";
import type { z } from "zod";
import type { Actor } from "@/db/queries/actor";
import type { ApiTokenScope } from "@/db/schema";
import { NotFoundError, UnauthenticatedError, isDatabaseUnavailable, toErrorResponse } from "@/lib/errors";
import { authenticateApiToken, type Credential } from "@/lib/server/api-token";
import { readJsonBody, readQuery } from "@/lib/server/request-body";
import { getCurrentUser } from "@/lib/server/session";

/** Largest JSON body a route accepts unless it says otherwise, in bytes. */
const defaultBodyLimitBytes = 64 * 1024;

/** How a route treats the caller's session. */
type AuthMode = "required" | "optional";

/** Methods that read; every other method needs a read and write token. */
const readingMethods = new Set(["GET", "HEAD", "OPTIONS"]);

/** Options of {@link route}: who may call it and how its input is read. */
export interface RouteOptions<
  TParam extends string,
  TBody extends z.ZodType | undefined,
  TQuery extends z.ZodType | undefined,
  TAuth extends AuthMode,
> {
  /** Names of the dynamic segments the handler reads, e.g. `["configurationId"]`. */
  params?: readonly TParam[];
  /** "required" (default): 401 without a signed-in user. "optional": the handler gets `actor: null`. */
  auth?: TAuth;
  /**
   * What an API token needs for this route: "read" (default for GET) or "write" (default for every
   * other method; a read-only token is refused with 403). A POST that changes nothing, such as the
   * stateless compute, says "read".
   */
  scope?: ApiTokenScope;
  /** Schema of the JSON body; without it the body is not read. */
  body?: TBody;
  /** Largest JSON body, counted as it streams in (default 64 KiB). */
  bodyLimitBytes?: number;
  /** Schema of the query string (as an object of strings). */
  query?: TQuery;
  /**
   * Checks run after the actor and params are known and before the body is read (rate limits, a
   * role check before an upload is accepted): a refused caller never gets to send a body.
   */
  before?: (input: {
    request: Request;
    actor: TAuth extends "optional" ? Actor | null : Actor;
    credential: Credential | null;
    params: Record<TParam, string>;
  }) => Promise<void>;
  /**
   * With `auth: "optional"`: treat the caller as anonymous when the session cannot be checked (the
   * database is down) instead of answering 503; for routes that need no database themselves.
   */
  anonymousWhenSessionUnavailable?: boolean;
}

/** What a handler receives: the request, the acting user, and its parsed params, body and query. */
export interface RouteInput<TParams, TBody, TQuery, TActor> {
  request: Request;
  actor: TActor;
  /** How the actor signed in (null for an anonymous caller). */
  credential: Credential | null;
  params: TParams;
  body: TBody;
  query: TQuery;
}

type Parsed<T> = T extends z.ZodType ? z.output<T> : undefined;

/**
 * The one wrapper of Mooring's route handlers. In order: the actor (401 when required and missing,
 * before anything else is read; from the cookie session, or from a personal API token in
 * `Authorization: Bearer`, checked against the route's `scope`), the query string (422 for NUL
 * characters or unpaired surrogates, on every route), the route params, the `before` checks, the
 * query schema and the JSON body (read with a byte count, 400 for malformed JSON, 413 past the
 * limit, 422 with every zod issue at its JSON path),
 * then the handler. Thrown errors become their status (lib/errors.ts `toErrorResponse`); anything
 * unexpected is logged and answered 500. Every response to a caller with a session (errors
 * included, and whatever the handler set) is `Cache-Control: private, no-store`: it may hold
 * what only that user may see, and no cache, shared or the browser's, should keep it.
 *
 * @example
 * export const GET = route({ params: ["thingId"] }, async ({ actor, params }) =>
 *   Response.json(await getThing(actor, params.thingId)),
 * );
 */
export function route<
  TParam extends string = never,
  TBody extends z.ZodType | undefined = undefined,
  TQuery extends z.ZodType | undefined = undefined,
  TAuth extends AuthMode = "required",
>(
  options: RouteOptions<TParam, TBody, TQuery, TAuth>,
  handler: (
    input: RouteInput<Record<TParam, string>, Parsed<TBody>, Parsed<TQuery>, TAuth extends "optional" ? Actor | null : Actor>,
  ) => Promise<Response>,
): (request: Request, context?: { params: Promise<Record<string, string | string[]>> }) => Promise<Response> {
  return async (request, context) => {
    let actor: Actor | null = null;
    try {
      const caller = await resolveCaller(request, options);
      actor = caller.actor;
      const { credential } = caller;
      if (!actor && (options.auth ?? "required") === "required") throw new UnauthenticatedError();
      // Every route refuses a query string the database could not store, whether it reads it or not.
      const rawQuery = readQuery(request);
      const params = await readParams(context, options.params ?? []);
      const typedActor = actor as TAuth extends "optional" ? Actor | null : Actor;
      await options.before?.({ request, actor: typedActor, credential, params });
      const query = options.query ? options.query.parse(rawQuery) : undefined;
      const body = options.body
        ? options.body.parse(await readJsonBody(request, options.bodyLimitBytes ?? defaultBodyLimitBytes))
        : undefined;
      const response = await handler({
        request,
        actor: typedActor,
        credential,
        params,
        body: body as Parsed<TBody>,
        query: query as Parsed<TQuery>,
      });
      return actor || hasSessionCookie(request) ? withPrivateCaching(response) : response;
    } catch (error) {
      const response = toErrorResponse(error);
      return actor || hasSessionCookie(request) ? withPrivateCaching(response) : response;
    }
  };
}

/** The named route params; a missing or repeated one is a routing mistake, answered 404. */
async function readParams<TParam extends string>(
  context: { params: Promise<Record<string, string | string[]>> } | undefined,
  names: readonly TParam[],
): Promise<Record<TParam, string>> {
  const given = names.length > 0 && context?.params ? await context.params : {};
  const params = {} as Record<TParam, string>;
  for (const name of names) {
    const value = given[name];
    if (typeof value !== "string") throw new NotFoundError();
    params[name] = value;
  }
  return params;
}

/**
 * The caller: by API token when the request carries an Authorization header (its cookies are then
 * ignored), else by cookie session, else anonymous. See `anonymousWhenSessionUnavailable` for a
 * database that is down.
 */
async function resolveCaller(
  request: Request,
  options: { scope?: ApiTokenScope; anonymousWhenSessionUnavailable?: boolean },
): Promise<{ actor: Actor | null; credential: Credential | null }> {
  try {
    const authorization = request.headers.get("authorization");
    if (authorization !== null) {
      const needs = options.scope ?? (readingMethods.has(request.method.toUpperCase()) ? "read" : "write");
      const caller = await authenticateApiToken(request, authorization, needs);
      return { actor: caller.actor, credential: { kind: "token", tokenId: caller.tokenId, scope: caller.scope } };
    }
    const actor = await getCurrentUser();
    return { actor, credential: actor ? { kind: "session" } : null };
  } catch (error) {
    if (!options.anonymousWhenSessionUnavailable || !isDatabaseUnavailable(error)) throw error;
    console.error(`${request.method} ${new URL(request.url).pathname}: session lookup failed; treating the caller as anonymous`, error);
    return { actor: null, credential: null };
  }
}

/** Marks a response to a signed-in caller as cacheable by nobody. */
function withPrivateCaching(response: Response): Response {
  response.headers.set("cache-control", "private, no-store");
  return response;
}

/** True when the request carries a next-auth session cookie (plain, __Secure- or chunked). */
function hasSessionCookie(request: Request): boolean {
  return /(?:^|;\s*)(?:__Secure-)?next-auth\.session-token(?:\.\d+)?=/.test(request.headers.get("cookie") ?? "");
}
