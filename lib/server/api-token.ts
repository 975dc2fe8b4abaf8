import "server-only";
import { getApiTokenCaller, type ApiTokenCaller } from "@/db/queries/api-tokens";
import type { ApiTokenScope } from "@/db/schema";
import { ForbiddenError, RateLimitError, UnauthenticatedError } from "@/lib/errors";
import { consumeRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";
import { acceptsApiTokens } from "@/lib/validations/api-token";

/**
 * Personal API tokens on route handlers (`route()` in lib/server/route.ts calls this when a
 * request carries an Authorization header). Kept apart from the cookie session
 * (lib/server/session.ts): a request with a token is judged by the token alone, and its cookies,
 * if any, are ignored, so a read-only token cannot borrow a session's rights. Tokens carry no
 * ambient credentials, so the cross-site checks of proxy.ts have nothing to protect here.
 */

/** How the caller of a route proved who it is: a cookie session or a personal API token. */
export type Credential = { kind: "session" } | { kind: "token"; tokenId: string; scope: ApiTokenScope };

/** Requests per minute one token may make, on top of the compute budget of POST /api/spectrum. */
export const apiTokenRequestBudget: RateLimitOptions = { limit: 300, windowMs: 60_000 };

/**
 * The caller named by the request's Authorization header, checked against the route: 401 for a
 * header that is not `Bearer <token>` or a token that is unknown, expired or revoked (or whose
 * account is gone), 403 on a route that takes no tokens or for a read-only token on a route that
 * writes, 429 past the token's request budget.
 */
export async function authenticateApiToken(request: Request, authorization: string, needs: ApiTokenScope): Promise<ApiTokenCaller> {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(authorization);
  if (!match?.[1]) throw new UnauthenticatedError("Send the API token as `Authorization: Bearer <token>`.");
  const caller = await getApiTokenCaller(match[1]);
  if (!caller) throw new UnauthenticatedError("This API token is not valid: it is unknown, expired or revoked.");
  if (!acceptsApiTokens(new URL(request.url).pathname)) {
    throw new ForbiddenError("API tokens are accepted by the configuration and compute routes only.");
  }
  if (needs === "write" && caller.scope === "read") {
    throw new ForbiddenError("This API token is read-only; create a read and write token to save changes.");
  }
  const verdict = await consumeRateLimit(`api-token:${caller.tokenId}`, apiTokenRequestBudget);
  if (!verdict.ok) throw new RateLimitError(verdict.retryAfterSeconds, "This API token has made too many requests this minute. Please wait and try again.");
  return caller;
}
