import { z } from "zod";
import { configurationCost } from "@/lib/boundary";
import { RateLimitError } from "@/lib/errors";
import { computeSpectrumJob } from "@/lib/server/compute/pool";
import { clientAddress, consumeRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";
import { route } from "@/lib/server/route";
import { spectrumRequestSchema } from "@/lib/validations/configuration";

/**
 * Compute budget per minute, in units of about 500 sector-levels (sectors x (levels + 1)): an
 * ordinary configuration costs one unit, the largest accepted one about forty. Anonymous callers
 * are counted per client address, signed-in users per account. Computing needs no database, so
 * while PostgreSQL (which holds the counters) is down the limits are not enforced.
 */
const anonymousBudget: RateLimitOptions = { limit: 120, windowMs: 60_000, whenUnavailable: "allow" };
const signedInBudget: RateLimitOptions = { limit: 600, windowMs: 60_000, whenUnavailable: "allow" };
const sectorLevelsPerUnit = 500;

/** Paging of the response: sectors from `sectorOffset` keep their level rows until `maxRows` rows. */
const spectrumQuerySchema = z.object({
  sectorOffset: z.coerce.number({ error: "sectorOffset must be a whole number." }).int().min(0).max(1_000_000).default(0),
  maxRows: z.coerce.number({ error: "maxRows must be a whole number." }).int().min(1).max(20_000).default(10_000),
});

/**
 * POST /api/spectrum: stateless compute of a configuration's spectrum (body: the configuration
 * document, file format 1). 200 with the SpectrumResult and a `page`: sectors from `sectorOffset`
 * (query, default 0) carry their level rows and mode expansions until `maxRows` rows (default
 * 10,000); the others are marked `detailOmitted`, and `page.nextSectorOffset` names the next page.
 * 400 for malformed JSON; 413 past 64 KiB; 422 `{ error, message, issues: [{ path, jsonPath, message }] }`
 * with JSON paths such as `stacks[1].worldvolume`; 429 with Retry-After past the compute budget
 * (one unit is taken before the body is read, the rest by the configuration's cost); 503 while the
 * server's compute threads are all busy.
 */
export const POST = route(
  {
    auth: "optional",
    anonymousWhenSessionUnavailable: true,
    query: spectrumQuerySchema,
    // 64 KiB holds 64 verbose stacks.
    body: spectrumRequestSchema,
    bodyLimitBytes: 64 * 1024,
    before: async ({ request, actor }) => spendBudget(request, actor?.id ?? null, 1),
  },
  async ({ request, actor, body, query }) => {
    const units = Math.ceil(configurationCost(body) / sectorLevelsPerUnit);
    if (units > 1) await spendBudget(request, actor?.id ?? null, units - 1);
    const outcome = await computeSpectrumJob({ document: body, page: { sectorOffset: query.sectorOffset, maxDetailRows: query.maxRows } });
    return new Response(outcome.json, { headers: { "content-type": "application/json", "cache-control": "no-store" } });
  },
);

async function spendBudget(request: Request, userId: string | null, units: number): Promise<void> {
  const verdict = userId
    ? await consumeRateLimit(`spectrum:user:${userId}`, signedInBudget, units)
    : await consumeRateLimit(`spectrum:${clientAddress(request)}`, anonymousBudget, units);
  if (!verdict.ok) throw new RateLimitError(verdict.retryAfterSeconds, "The compute budget for this minute is used up. Please wait and try again.");
}
