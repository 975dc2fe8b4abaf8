import { z } from "./zod";

/** What a token may do: `read` reads and computes, `write` may also save, fork, comment and delete. */
export const apiTokenScopeSchema = z.enum(["read", "write"], { error: "Choose read only or read and write." });
export type ApiTokenScopeInput = z.infer<typeof apiTokenScopeSchema>;

/** Lifetimes offered for a new token, in days; every token expires. */
export const apiTokenLifetimesDays = [7, 30, 90, 365] as const;

/** The account page's "new token" form. */
export const createApiTokenSchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, "Name the token after the script or machine that will use it.")
    .max(80, "Keep the name under 80 characters."),
  scope: apiTokenScopeSchema,
  expiresInDays: z.coerce
    .number({ error: "Choose how long the token lasts." })
    .refine((days) => (apiTokenLifetimesDays as readonly number[]).includes(days), "Choose how long the token lasts."),
});
export type CreateApiTokenInput = z.infer<typeof createApiTokenSchema>;

/** Every token starts with this, so a leaked one is recognisable (and secret scanners can find it). */
export const apiTokenPrefix = "mooring_";

/** A token as sent in `Authorization: Bearer <token>`: the prefix and 43 base64url characters. */
export const apiTokenSecretSchema = z.string().regex(/^mooring_[A-Za-z0-9_-]{43}$/, "Not a Mooring API token.");

/**
 * The routes that accept a token: the configuration routes (a configuration's sweeps among them),
 * the stateless compute, and a sweep's own routes, so a script that starts a sweep can follow it.
 */
const tokenRoutePattern = /^\/api\/(?:configurations(?:\/.*)?|spectrum|sweeps\/.+)$/;

/**
 * True when the route at `pathname` accepts `Authorization: Bearer <token>`.
 *
 * @example
 * acceptsApiTokens("/api/configurations/3f0c.../revisions") // => true
 * acceptsApiTokens("/api/sweeps/9a1e.../points") // => true
 * acceptsApiTokens("/api/groups") // => false
 */
export function acceptsApiTokens(pathname: string): boolean {
  return tokenRoutePattern.test(pathname);
}
