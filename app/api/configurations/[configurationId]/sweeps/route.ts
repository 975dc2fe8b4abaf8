import { listSweeps, startSweep } from "@/db/queries/sweeps";
import { route } from "@/lib/server/route";
import { startSweepBodySchema } from "@/lib/validations/sweep";

/**
 * GET /api/configurations/[configurationId]/sweeps: the configuration's sweeps, newest first, and
 * the sweeps its lab starter suggests. Any member.
 */
export const GET = route({ params: ["configurationId"] }, async ({ actor, params }) =>
  Response.json(await listSweeps(actor, params.configurationId)),
);

/**
 * POST /api/configurations/[configurationId]/sweeps `{ definition, title?, attachToStarter? }`:
 * starts a sweep of the current revision (editors and owners). 422 with the problems at their
 * paths, including a sweep over the point limit; 429 past the account's running points. 201.
 */
export const POST = route({ params: ["configurationId"], body: startSweepBodySchema }, async ({ actor, params, body }) => {
  const sweep = await startSweep(actor, params.configurationId, body);
  return Response.json(sweep, { status: 201, headers: { location: `/api/sweeps/${sweep.id}` } });
});
