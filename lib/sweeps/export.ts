/**
 * A sweep's points as CSV (written like the spectrum CSV by papaparse: RFC 4180, CRLF line ends,
 * one header record and only data below it, the title, conventions and caution in the last
 * column, `conventions`, of the first data record) and as JSON (the definition, the base
 * configuration and one object per point).
 *
 * Invalid-input policy: pure formatting; nothing throws.
 */
import { ENGINE_VERSION, dimensionOf } from "../boundary";
import { exportCaution } from "../export/caution";
import Papa from "papaparse";
import { formulaCell } from "../export/csv";
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
  "conventions",
] as const;

/**
 * Renders a sweep's points as CSV, one record per point in point order.
 *
 * @example
 * sweepToCsv(source).split("\r\n")[0] // => "point,probe x8,verdict,supercharges,..."
 */
export function sweepToCsv(source: SweepExportSource): string {
  const conventions = `${source.title}. ${conventionLine(source)} ${exportCaution}`;
  const header = ["point", ...source.definition.dimensions.map(dimensionLabel), ...sweepCsvColumns];
  const records = [...source.rows]
    .sort((a, b) => a.index - b.index)
    .map((row, position) => [
      String(row.index),
      ...row.labels,
      row.verdict,
      row.supercharges === null ? "" : String(row.supercharges),
      String(row.tachyonicSectors),
      row.lightestMassSquared === null ? "" : String(row.lightestMassSquared),
      row.masslessStates ?? "",
      row.gaugeGroup ?? "",
      row.problem ?? "",
      position === 0 ? conventions : "",
    ]);
  if (records.length === 0) records.push(header.map((column) => (column === "conventions" ? conventions : "")));
  return `${Papa.unparse({ fields: header, data: records }, { newline: "\r\n", escapeFormulae: formulaCell })}\r\n`;
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
