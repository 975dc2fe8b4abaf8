import { listSweepPoints } from "@/db/queries/sweeps";
import { route } from "@/lib/server/route";

/**
 * GET /api/sweeps/[sweepId]/points: every stored point, column by column (lib/sweeps/point-rows.ts
 * `SweepPointColumns`), compact enough for 200,000 points. Members of its configuration.
 */
export const GET = route({ params: ["sweepId"] }, async ({ actor, params }) => Response.json(await listSweepPoints(actor, params.sweepId)));
