/**
 * Sweeps: a saved configuration varied along dimensions (N/D choices, positions, counts,
 * brane/antibrane, compact radii), each combination one point. Pure TypeScript on top of
 * lib/boundary and lib/spectrum: the browser, the app and the workers share the same definitions and numbering.
 */
export type * from "./types";
export { binomial, multisetCount, rankMultiset, unrankMultiset } from "./combinatorics";
export {
  dimensionLabel,
  dimensionSize,
  dimensionValue,
  formatDimensionValue,
  isNeumannAt,
  isNumericDimension,
  numericValue,
  valueAt,
  valuesLength,
  type NumericDimension,
} from "./dimension";
export { checkSweepDefinition, formatPointCount, sweepLimits, sweepPointCount, type SweepProblem } from "./definition";
export { applyValues, pointDigits, pointDocument, pointNumbering, pointValues } from "./enumerate";
export { computeSweepPoint, pointVerdict, summarizeSweepPoint } from "./point-summary";
export { chunkCount, chunkLimits, chunkRange, chunkSizeFor, firstFairTag } from "./chunks";
export {
  sweepColumnHeadings,
  toPointColumns,
  toPointRows,
  type StoredSweepPoint,
  type SweepExportSource,
  type SweepPointColumns,
  type SweepPointRow,
} from "./point-rows";
export { sweepCsvColumns, sweepExportConventions, sweepToCsv, sweepToJson } from "./export";
export { massPlotAxes, massPlotPoints, verdictMap, type MassPlotAxis, type MassPlotPoint, type VerdictCell, type VerdictMap } from "./plot-data";
export { draftToDefinition, firstValues, newDimensionDraft, toDimensionDraft, type DimensionDraft, type ValuesDraft } from "./form-draft";
export { formatDuration, formatRate } from "./format";
