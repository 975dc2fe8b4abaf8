import { getSweep } from "@/db/queries/sweeps";
import { route } from "@/lib/server/route";

/** GET /api/sweeps/[sweepId]: the sweep, its progress and the document it varies. Members of its configuration. */
export const GET = route({ params: ["sweepId"] }, async ({ actor, params }) => Response.json(await getSweep(actor, params.sweepId)));
