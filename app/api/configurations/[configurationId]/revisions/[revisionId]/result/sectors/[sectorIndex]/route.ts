import { getResultSector } from "@/db/queries/result-reads";
import { NotFoundError } from "@/lib/errors";
import { route } from "@/lib/server/route";

/**
 * GET /api/configurations/[configurationId]/revisions/[revisionId]/result/sectors/[sectorIndex]:
 * one sector of the stored result with its detail (level rows, mode expansions, massless content,
 * notes); `sectorIndex` is the sector's position in the result (the overview's `index`).
 */
export const GET = route({ params: ["configurationId", "revisionId", "sectorIndex"] }, async ({ actor, params }) => {
  if (!/^\d{1,6}$/.test(params.sectorIndex)) throw new NotFoundError("No such sector.");
  const sector = await getResultSector(actor, params.configurationId, params.revisionId, Number(params.sectorIndex));
  return Response.json(sector, { headers: { "cache-control": "private, max-age=0, must-revalidate" } });
});
