/**
 * A sweep's points as CSV (RFC 4180, like the spectrum CSV: CRLF line ends, a first comment
 * record with the conventions and the caution) and as JSON (the definition, the base
 * configuration and one object per point).
 *
 * Invalid-input policy: pure formatting; nothing throws.
 */
import { ENGINE_VERSION, dimensionOf } from "../boundary";
import { exportCaution } from "../export/caution";
import { quoteCsvField } from "../export/csv";
import { dimensionLabel } from "./dimension";
import type { SweepExportSource } from "./point-rows";

/** Units and conventions every sweep export states. */
export const sweepExportConventions =
  "alpha' = 1; lengths (positions) in units of sqrt(alpha'); masses as alpha' M^2; massless states counted over all sectors, both orientations and all Chan-Paton labels.";

/** The stored columns of a sweep CSV, after one column per dimension. */
export const sweepCsvColumns = [
  "verdict",
  "supercharges",
  "tachyonic_sectors",
  "lightest_alpha_prime_mass_squared",
  "massless_states",
  "gauge_group",
  "problem",
] as const;

/**
 * Renders a sweep's points as CSV, one record per point in point order.
 *
 * @example
 * sweepToCsv(source).split("\r\n")[1] // => "point,probe x8,verdict,supercharges,..."
 */
export function sweepToCsv(source: SweepExportSource): string {
  const comment = `# ${source.title}. ${conventionLine(source)} ${exportCaution}`;
  const header = ["point", ...source.definition.dimensions.map(dimensionLabel), ...sweepCsvColumns];
  const records = [...source.rows]
    .sort((a, b) => a.index - b.index)
    .map((row) => [
      String(row.index),
      ...row.labels,
      row.verdict,
      row.supercharges === null ? "" : String(row.supercharges),
      String(row.tachyonicSectors),
      row.lightestMassSquared === null ? "" : String(row.lightestMassSquared),
      row.masslessStates ?? "",
      row.gaugeGroup ?? "",
      row.problem ?? "",
    ]);
  return [[comment], header, ...records].map((record) => record.map(quoteCsvField).join(",")).join("\r\n") + "\r\n";
}

/**
 * Renders a sweep as JSON text: conventions, caution, definition, base configuration and points.
 *
 * @example
 * JSON.parse(sweepToJson(source)).points[0] // => { point: 0, values: { "probe x8": "0" }, verdict: "supersymmetric", ... }
 */
export function sweepToJson(source: SweepExportSource): string {
  const labels = source.definition.dimensions.map(dimensionLabel);
  return JSON.stringify(
    {
      format: 1,
      title: source.title,
      conventions: conventionLine(source),
      caution: exportCaution,
      definition: source.definition,
      base: source.base,
      points: [...source.rows]
        .sort((a, b) => a.index - b.index)
        .map((row) => ({
          point: row.index,
          values: Object.fromEntries(labels.map((label, d) => [label, row.labels[d] ?? ""])),
          verdict: row.verdict,
          supercharges: row.supercharges,
          tachyonicSectors: row.tachyonicSectors,
          lightestMassSquared: row.lightestMassSquared,
          masslessStates: row.masslessStates,
          gaugeGroup: row.gaugeGroup,
          problem: row.problem,
        })),
    },
    null,
    2,
  );
}

function conventionLine(source: SweepExportSource): string {
  return `${sweepExportConventions} Theory ${source.base.theory}, D = ${dimensionOf(source.base)}. Engine ${ENGINE_VERSION}.`;
}
