import { configurationCost } from "@/lib/boundary";
import { RateLimitError } from "@/lib/errors";
import type { Credential } from "@/lib/server/api-token";
import { computeSpectrumJob } from "@/lib/server/compute/pool";
import { getEnv } from "@/lib/server/env";
import { clientAddress, consumeRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";
import { route } from "@/lib/server/route";
import { spectrumQuerySchema, spectrumRequestSchema } from "@/lib/validations/configuration";

/**
 * Compute budget per minute, in units of about 500 sector-levels (sectors x (levels + 1)): an
 * ordinary configuration costs one unit, the largest accepted one about forty. Anonymous callers
 * are counted per client address (SPECTRUM_BUDGET_ANONYMOUS, default 120), signed-in users per
 * account and each API token on its own (SPECTRUM_BUDGET_ACCOUNT, default 600; a script cannot use
 * up its owner's budget in the browser). Computing needs no database, so while PostgreSQL (which
 * holds the counters) is down the limits are not enforced. Units are counted in leases (see
 * `leaseUnits` in lib/server/rate-limit.ts): exact within one process, and with several instances a
 * caller may be refused a little early, never let past the budget.
 */
function budget(kind: "anonymous" | "account"): RateLimitOptions {
  const env = getEnv();
  const limit = kind === "anonymous" ? env.SPECTRUM_BUDGET_ANONYMOUS : env.SPECTRUM_BUDGET_ACCOUNT;
  return {
    limit,
    windowMs: 60_000,
    whenUnavailable: "allow",
    // Counting every compute in PostgreSQL cost about a sixth of the route's time: each process
    // reserves a few units ahead (a thirty-second of the budget, at most 64) and spends them locally.
    leaseUnits: Math.min(64, Math.floor(limit / 32)),
  };
}
const sectorLevelsPerUnit = 500;

/**
 * POST /api/spectrum: stateless compute of a configuration's spectrum (body: the configuration
 * document, file format 1 or 2). 200 with the SpectrumResult and a `page`: sectors from `sectorOffset`
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
    // Computing changes nothing, so a read-only API token may do it.
    scope: "read",
    anonymousWhenSessionUnavailable: true,
    query: spectrumQuerySchema,
    // 64 KiB holds 64 verbose stacks.
    body: spectrumRequestSchema,
    bodyLimitBytes: 64 * 1024,
    before: async ({ request, actor, credential }) => spendBudget(budgetOf(request, actor?.id ?? null, credential), 1),
  },
  async ({ request, actor, credential, body, query }) => {
    const units = Math.ceil(configurationCost(body) / sectorLevelsPerUnit);
    if (units > 1) await spendBudget(budgetOf(request, actor?.id ?? null, credential), units - 1);
    const outcome = await computeSpectrumJob({ document: body, page: { sectorOffset: query.sectorOffset, maxDetailRows: query.maxRows } });
    return new Response(outcome.json, { headers: { "content-type": "application/json", "cache-control": "no-store" } });
  },
);

/** The rate-limit key and budget of the caller: its API token, its account or its address. */
function budgetOf(request: Request, userId: string | null, credential: Credential | null): { key: string; budget: RateLimitOptions } {
  if (credential?.kind === "token") return { key: `spectrum:token:${credential.tokenId}`, budget: budget("account") };
  if (userId) return { key: `spectrum:user:${userId}`, budget: budget("account") };
  return { key: `spectrum:${clientAddress(request)}`, budget: budget("anonymous") };
}

async function spendBudget({ key, budget }: { key: string; budget: RateLimitOptions }, units: number): Promise<void> {
  const verdict = await consumeRateLimit(key, budget, units);
  if (!verdict.ok) throw new RateLimitError(verdict.retryAfterSeconds, "The compute budget for this minute is used up. Please wait and try again.");
}
