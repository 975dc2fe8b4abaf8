import { computeSpectrum } from "@/lib/boundary";
import { RateLimitError } from "@/lib/errors";
import { clientAddress, consumeRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";
import { route } from "@/lib/server/route";
import { spectrumRequestSchema } from "@/lib/validations/configuration";

/**
 * Anonymous callers: requests per window per client address. Computing needs no database, so
 * while PostgreSQL (which holds the counters) is down the limit is not enforced.
 */
const anonymousSpectrumLimit: RateLimitOptions = { limit: 120, windowMs: 60_000, whenUnavailable: "allow" };

/**
 * POST /api/spectrum: stateless compute of a configuration's spectrum (body: the configuration
 * document, file format 1). 200 with the SpectrumResult; 400 for malformed JSON; 413 past 64 KiB;
 * 422 `{ error, message, issues: [{ path, jsonPath, message }] }` with JSON paths such as
 * `stacks[1].worldvolume`; 429 with Retry-After for anonymous callers past the rate limit, checked
 * before the body is read. Signed-in users are not rate limited.
 */
export const POST = route(
  {
    auth: "optional",
    anonymousWhenSessionUnavailable: true,
    // 64 KiB holds 64 verbose stacks.
    body: spectrumRequestSchema,
    bodyLimitBytes: 64 * 1024,
    before: async ({ request, actor }) => {
      if (actor) return;
      const verdict = await consumeRateLimit(`spectrum:${clientAddress(request)}`, anonymousSpectrumLimit);
      if (!verdict.ok) throw new RateLimitError(verdict.retryAfterSeconds);
    },
  },
  async ({ body }) => Response.json(computeSpectrum(body), { headers: { "cache-control": "no-store" } }),
);
