import { resumeSweep } from "@/db/queries/sweeps";
import { route } from "@/lib/server/route";

/**
 * POST /api/sweeps/[sweepId]/resume: puts the points not yet stored of a cancelled or failed sweep
 * back on the queue (editors and owners); a no-op for a running or completed one. 429 past the
 * account's running points.
 */
export const POST = route({ params: ["sweepId"] }, async ({ actor, params }) => Response.json(await resumeSweep(actor, params.sweepId)));
