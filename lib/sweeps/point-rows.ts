/**
 * Stored sweep points as the pages and exports read them: one compact, column-wise payload for
 * up to 200,000 points (repeated texts such as gauge groups are sent once), and rows rebuilt from it.
 *
 * Invalid-input policy: pure transforms; columns of unequal length read as missing values.
 */
import type { Configuration } from "../boundary/types";
import { dimensionLabel, dimensionValue, formatDimensionValue } from "./dimension";
import { pointNumbering } from "./enumerate";
import { pointVerdict } from "./point-summary";
import type { DimensionValue, PointVerdict, SweepDefinition, SweepPointOutcome } from "./types";

/** One stored point with its outcome. */
export type StoredSweepPoint = { index: number } & SweepPointOutcome;

/** Stored points, column by column. Texts are indices into `texts`, or -1 for none. */
export interface SweepPointColumns {
  index: number[];
  /** 1 for ok, 0 for invalid. */
  ok: number[];
  supercharges: (number | null)[];
  tachyonicSectors: number[];
  lightestMassSquared: (number | null)[];
  masslessStates: number[];
  gaugeGroup: number[];
  problem: number[];
  texts: string[];
}

/**
 * Packs points into columns.
 *
 * @example
 * toPointColumns([{ index: 0, status: "invalid", problem: "odd p" }]).texts // => ["odd p"]
 */
export function toPointColumns(points: readonly StoredSweepPoint[]): SweepPointColumns {
  const texts: string[] = [];
  const textIndex = new Map<string, number>();
  const text = (value: string | null): number => {
    if (value === null) return -1;
    let found = textIndex.get(value);
    if (found === undefined) {
      found = texts.length;
      texts.push(value);
      textIndex.set(value, found);
    }
    return found;
  };
  const columns: SweepPointColumns = {
    index: [],
    ok: [],
    supercharges: [],
    tachyonicSectors: [],
    lightestMassSquared: [],
    masslessStates: [],
    gaugeGroup: [],
    problem: [],
    texts,
  };
  for (const point of points) {
    const ok = point.status === "ok";
    columns.index.push(point.index);
    columns.ok.push(ok ? 1 : 0);
    columns.supercharges.push(ok ? point.supercharges : null);
    columns.tachyonicSectors.push(ok ? point.tachyonicSectors : 0);
    columns.lightestMassSquared.push(ok ? point.lightestMassSquared : null);
    columns.masslessStates.push(text(ok ? point.masslessStates : null));
    columns.gaugeGroup.push(text(ok ? point.gaugeGroup : null));
    columns.problem.push(text(ok ? null : point.problem));
  }
  return columns;
}

/** A point as the table, the plots and the exports read it. */
export interface SweepPointRow {
  index: number;
  /** The point's position along each dimension. */
  digits: number[];
  values: DimensionValue[];
  /** Each dimension's value as text. */
  labels: string[];
  verdict: PointVerdict;
  supercharges: number | null;
  tachyonicSectors: number;
  lightestMassSquared: number | null;
  masslessStates: string | null;
  gaugeGroup: string | null;
  problem: string | null;
}

/**
 * Unpacks columns into rows, decoding each point's values from its number.
 *
 * @example
 * toPointRows(definition, toPointColumns(points))[0].labels // => ["a NN · b DD", "2.5"]
 */
export function toPointRows(definition: SweepDefinition, columns: SweepPointColumns): SweepPointRow[] {
  const text = (i: number | undefined) => (i === undefined || i < 0 ? null : (columns.texts[i] ?? null));
  // Many points share each dimension's value: decode and label each value once.
  const decoded = definition.dimensions.map(() => new Map<number, { value: DimensionValue; label: string }>());
  const valueOf = (d: number, digit: number) => {
    const dimension = definition.dimensions[d];
    const cache = decoded[d];
    if (!dimension || !cache) throw new RangeError(`No dimension ${d}`);
    let found = cache.get(digit);
    if (!found) {
      const value = dimensionValue(dimension, digit);
      found = { value, label: formatDimensionValue(dimension, value) };
      cache.set(digit, found);
    }
    return found;
  };
  const numbering = pointNumbering(definition);
  return columns.index.map((index, i) => {
    const digits = numbering.digits(index);
    const values = digits.map((digit, d) => valueOf(d, digit));
    const ok = columns.ok[i] === 1;
    const supercharges = columns.supercharges[i] ?? null;
    const tachyonicSectors = columns.tachyonicSectors[i] ?? 0;
    return {
      index,
      digits,
      values: values.map((item) => item.value),
      labels: values.map((item) => item.label),
      verdict: pointVerdict({ status: ok ? "ok" : "invalid", supercharges, tachyonicSectors }),
      supercharges,
      tachyonicSectors,
      lightestMassSquared: columns.lightestMassSquared[i] ?? null,
      masslessStates: text(columns.masslessStates[i]),
      gaugeGroup: text(columns.gaugeGroup[i]),
      problem: text(columns.problem[i]),
    };
  });
}

/** Column headings of a sweep's rows: the dimensions, then the stored columns. */
export function sweepColumnHeadings(definition: SweepDefinition): string[] {
  return definition.dimensions.map(dimensionLabel);
}

/** The base configuration is carried along so that exports can state their theory. */
export type SweepExportSource = { title: string; base: Configuration; definition: SweepDefinition; rows: SweepPointRow[] };
