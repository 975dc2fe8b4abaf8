import { getConfiguration } from "@/db/queries/configurations";
import { getResultForRevision } from "@/db/queries/result-reads";
import { getRevisionOfConfiguration } from "@/db/queries/revisions";
import { NotFoundError } from "@/lib/errors";
import { spectrumToCsv } from "@/lib/export/csv";
import { spectrumToLatexTable } from "@/lib/export/latex-table";
import { interactionExportLines, interactionsToCsv, orientifoldExportLines } from "@/lib/export/orientifold";
import { interactionCurves } from "@/lib/boundary/interaction";
import { contentDisposition } from "@/lib/server/content-disposition";
import { route } from "@/lib/server/route";
import { exportQuerySchema } from "@/lib/validations/configuration-api";

const mediaTypes = {
  json: "application/json; charset=utf-8",
  csv: "text/csv; charset=utf-8; header=present",
  tex: "application/x-tex; charset=utf-8",
  potential: "text/csv; charset=utf-8; header=present",
} as const;
const extensions = { json: "json", csv: "csv", tex: "tex", potential: "potential.csv" } as const;

/**
 * GET /api/configurations/[configurationId]/export?format=json|csv|tex|potential[&revision=id]: the
 * configuration file (JSON, re-importable), its stored spectrum as CSV or a LaTeX table (with the
 * orientifold summary and V(y) of each pair at its separation as comments), or the sampled V(y) of
 * every pair as CSV (computed from the document), of the current revision unless `revision` names another. Any member. Downloads as an attachment.
 */
export const GET = route({ params: ["configurationId"], query: exportQuerySchema }, async ({ actor, params, query }) => {
  const configuration = await getConfiguration(actor, params.configurationId);
  let document = configuration.document;
  let revision = configuration.currentRevision;
  if (query.revision) {
    const picked = await getRevisionOfConfiguration(actor, configuration.id, query.revision);
    document = picked.document;
    revision = { id: picked.id, number: picked.number };
  }
  const base = `${fileStem(document.title)}-r${revision?.number ?? 1}`;
  let body: string;
  if (query.format === "json") {
    body = `${JSON.stringify(document, null, 2)}\n`;
  } else if (query.format === "potential") {
    body = interactionsToCsv(interactionCurves(document), { title: document.title });
  } else {
    if (!revision) throw new NotFoundError("This configuration has no saved result yet.");
    const { result } = await getResultForRevision(actor, revision.id);
    const commentLines = [...(result.orientifold ? orientifoldExportLines(result.orientifold) : []), ...interactionExportLines(interactionCurves(document))];
    body =
      query.format === "csv"
        ? spectrumToCsv(result, { title: document.title, stacks: document.stacks, commentLines })
        : spectrumToLatexTable(result, { title: document.title, label: `tab:${fileStem(document.title)}`, stacks: document.stacks, commentLines });
  }
  return new Response(body, {
    headers: {
      "content-type": mediaTypes[query.format],
      "content-disposition": contentDisposition("attachment", `${base}.${extensions[query.format]}`),
      "cache-control": "private, no-store",
    },
  });
});

/** A lowercase, hyphenated file name stem from a title ("Probe D4 near a wall" -> "probe-d4-near-a-wall"). */
function fileStem(title: string): string {
  return (
    title
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60) || "configuration"
  );
}
