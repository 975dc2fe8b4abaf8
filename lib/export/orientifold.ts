/**
 * The orientifold part of the spectrum exports: planes with their RR charge, images, the tadpole
 * balance with what would cancel it, and the interaction potentials V(y) (one line per pair at its own
 * separation in the CSV and LaTeX files; all samples in the potential CSV).
 */
import { INTERACTION_CONVENTIONS, type InteractionCurve } from "@/lib/boundary/interaction";
import type { OrientifoldSummary } from "@/lib/boundary/types";
import { exportCaution } from "./caution";
import Papa from "papaparse";
import { formulaCell } from "./csv";

/**
 * Plain sentences of the orientifold summary, for the exports' conventions (CSV) and comments (LaTeX).
 *
 * @example
 * orientifoldExportLines(summary)[0] // => "Orientifold plane o: O9- (p = 9), RR charge -16 (units of one D9 brane with its image)."
 */
export function orientifoldExportLines(summary: OrientifoldSummary): string[] {
  return [
    ...summary.planes.map(
      (plane) => `Orientifold plane ${plane.id}: O${plane.p}${plane.type.slice(1)} (p = ${plane.p}), RR charge ${plane.charge} (units of one D${plane.p} brane with its image).`,
    ),
    ...summary.images.map((image) =>
      image.onPlane
        ? `Image of ${image.of}: on the plane (its own image).`
        : `Image ${image.id} of ${image.of}: ${image.anti ? "antibrane" : "brane"} at ${
            Object.entries(image.position)
              .map(([axis, value]) => `x${axis} = ${value}`)
              .join(" ") || "the origin"
          }.`,
    ),
    ...summary.tadpoles.map((entry) => `Tadpole D${entry.p} [${entry.status}]: ${entry.message}${entry.toCancel ? ` To cancel: ${entry.toCancel}` : ""}`),
    ...summary.notes,
  ];
}

/**
 * One sentence per pair: V at its own separation, or why there is none.
 *
 * @example
 * interactionExportLines(curves)[0] // => "V(y) a-b at y = 30: -1.7e-7 (nu = 0, brane-antibrane, 1 Chan-Paton pair)."
 */
export function interactionExportLines(curves: readonly InteractionCurve[]): string[] {
  return curves.map((curve) => {
    const value = curve.undefinedReason
      ? curve.undefinedReason
      : curve.vanishes
        ? "0 at every separation"
        : curve.atSeparation === null
          ? "not defined (below y_c the tachyon makes the integral diverge)"
          : String(curve.atSeparation);
    const yc = curve.criticalSeparation === null ? "" : `, y_c = ${curve.criticalSeparation}`;
    return `V(y) ${curve.pair[0]}-${curve.pair[1]} at y = ${curve.separation}: ${value} (nu = ${curve.nu}, ${
      curve.sameOrientation ? "same orientation" : "brane-antibrane"
    }, ${curve.labels} Chan-Paton label pairs${yc}).`;
  });
}

/** Column names of the potential CSV. */
export const interactionCsvColumns = ["stack_a", "stack_b", "nu", "nn", "dd", "same_orientation", "chan_paton_pairs", "critical_separation", "y", "V", "conventions"] as const;

/**
 * The sampled V(y) of every pair as CSV, written like the spectrum CSV by papaparse (RFC 4180, CRLF,
 * one header record and only data below it): the conventions, the caution and each pair's line
 * are in the last column, `conventions`, of the first data record.
 *
 * @param curves - From `interactionCurves`.
 * @param options - `title` of the configuration.
 * @returns CSV text with a trailing CRLF.
 * @example
 * interactionsToCsv(curves).split("\r\n").find((line) => line.startsWith("stack_a")) // => "stack_a,stack_b,nu,..."
 */
export function interactionsToCsv(curves: readonly InteractionCurve[], options: { title?: string } = {}): string {
  const conventions = [`${options.title ? `${options.title}. ` : ""}${INTERACTION_CONVENTIONS} ${exportCaution}`, ...interactionExportLines(curves)].join(" | ");
  const records: string[][] = [];
  for (const curve of curves) {
    for (const sample of curve.samples) {
      records.push([
        curve.pair[0],
        curve.pair[1],
        String(curve.nu),
        String(curve.nn),
        String(curve.dd),
        String(curve.sameOrientation),
        String(curve.labels),
        curve.criticalSeparation === null ? "" : String(curve.criticalSeparation),
        String(sample.y),
        String(sample.v),
        records.length === 0 ? conventions : "",
      ]);
    }
  }
  if (records.length === 0) records.push(interactionCsvColumns.map((column) => (column === "conventions" ? conventions : "")));
  return `${Papa.unparse({ fields: [...interactionCsvColumns], data: records }, { newline: "\r\n", escapeFormulae: formulaCell })}\r\n`;
}
