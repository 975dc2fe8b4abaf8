import { getSweep, listSweepPoints } from "@/db/queries/sweeps";
import { contentDisposition } from "@/lib/server/content-disposition";
import { route } from "@/lib/server/route";
import { sweepToCsv, sweepToJson, toPointRows } from "@/lib/sweeps";
import { sweepExportQuerySchema } from "@/lib/validations/sweep";

const mediaTypes = { csv: "text/csv; charset=utf-8; header=present", json: "application/json; charset=utf-8" } as const;

/**
 * GET /api/sweeps/[sweepId]/export?format=csv|json: the stored points with their dimension values,
 * the conventions and the caution, as a download. Members of its configuration.
 */
export const GET = route({ params: ["sweepId"], query: sweepExportQuerySchema }, async ({ actor, params, query }) => {
  const [sweep, columns] = await Promise.all([getSweep(actor, params.sweepId), listSweepPoints(actor, params.sweepId)]);
  const source = {
    title: `${sweep.configurationTitle}, revision ${sweep.revisionNumber}${sweep.title ? `: ${sweep.title}` : ""}`,
    base: sweep.document,
    definition: sweep.definition,
    rows: toPointRows(sweep.definition, columns),
  };
  const body = query.format === "csv" ? sweepToCsv(source) : `${sweepToJson(source)}\n`;
  return new Response(body, {
    headers: {
      "content-type": mediaTypes[query.format],
      "content-disposition": contentDisposition("attachment", `sweep-${sweep.id.slice(0, 8)}.${query.format}`),
      "cache-control": "private, no-store",
    },
  });
});
