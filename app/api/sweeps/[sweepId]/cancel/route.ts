import { cancelSweep } from "@/db/queries/sweeps";
import { route } from "@/lib/server/route";

/** POST /api/sweeps/[sweepId]/cancel: stops a running sweep (editors and owners); a no-op otherwise. */
export const POST = route({ params: ["sweepId"] }, async ({ actor, params }) => Response.json(await cancelSweep(actor, params.sweepId)));
