import { computeSpectrum } from "@/lib/boundary";
import { PayloadTooLargeError, RateLimitError, toErrorResponse } from "@/lib/errors";
import { clientAddress, consumeRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";
import { getCurrentUser } from "@/lib/server/session";
import { formatIssues, spectrumRequestSchema } from "@/lib/validations/configuration";

/** Largest accepted body of `POST /api/spectrum`, in bytes (64 KiB holds 64 verbose stacks). */
const spectrumBodyLimitBytes = 64 * 1024;

/**
 * Anonymous callers: requests per window per client address. Computing needs no database, so
 * while PostgreSQL (which holds the counters) is down the limit is not enforced.
 */
const anonymousSpectrumLimit: RateLimitOptions = { limit: 120, windowMs: 60_000, whenUnavailable: "allow" };

/**
 * POST /api/spectrum: stateless compute of a configuration's spectrum (body: the configuration
 * document, file format 1). 200 with the SpectrumResult; 400 for malformed JSON; 413 past 64 KiB;
 * 422 `{ error, message, issues: [{ path, message }] }` with JSON paths such as
 * `stacks[1].worldvolume`; 429 with Retry-After for anonymous callers past the rate limit.
 * Signed-in users are not rate limited.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    if (!(await isSignedIn(request))) {
      const verdict = await consumeRateLimit(`spectrum:${clientAddress(request)}`, anonymousSpectrumLimit);
      if (!verdict.ok) throw new RateLimitError(verdict.retryAfterSeconds);
    }

    const text = await readLimitedText(request, spectrumBodyLimitBytes);
    let body: unknown;
    try {
      body = JSON.parse(text);
    } catch {
      return Response.json(
        { error: "invalid_json", message: "The request body is not valid JSON." },
        { status: 400 },
      );
    }

    const parsed = spectrumRequestSchema.safeParse(body);
    if (!parsed.success) {
      const issues = formatIssues(parsed.error);
      return Response.json(
        { error: "validation_failed", message: issues[0]?.message ?? "The configuration is not valid.", issues },
        { status: 422 },
      );
    }
    return Response.json(computeSpectrum(parsed.data), { headers: { "cache-control": "no-store" } });
  } catch (error) {
    return toErrorResponse(error);
  }
}

/**
 * Only requests carrying a next-auth session cookie pay for a session lookup; if that lookup
 * fails (e.g. the database is down) the caller is treated as anonymous, since computing needs no
 * database.
 */
async function isSignedIn(request: Request): Promise<boolean> {
  if (!request.headers.get("cookie")?.includes("next-auth.session-token")) return false;
  try {
    return (await getCurrentUser()) !== null;
  } catch (error) {
    console.error("POST /api/spectrum: session lookup failed; treating the caller as anonymous", error);
    return false;
  }
}

/** Reads the body as text, refusing it (413) when it declares or turns out to be over `limitBytes`. */
async function readLimitedText(request: Request, limitBytes: number): Promise<string> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > limitBytes) throw new PayloadTooLargeError(limitBytes);
  const text = await request.text();
  // UTF-8 length without allocating a copy when the text is plainly small enough.
  if (text.length * 3 > limitBytes && Buffer.byteLength(text, "utf8") > limitBytes) {
    throw new PayloadTooLargeError(limitBytes);
  }
  return text;
}
