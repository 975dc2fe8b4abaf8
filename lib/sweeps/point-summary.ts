/**
 * What a sweep stores per point: the engine's result reduced to the columns the sweep table,
 * the plots and the map read (types.ts `SweepPointOutcome`).
 *
 * Invalid-input policy: a point whose configuration the engine refuses is an `invalid` outcome
 * with the engine's first message; any other error of the engine propagates (the chunk is retried).
 */
import { tryComputeSpectrum } from "../boundary";
import type { Configuration, SpectrumResult } from "../boundary/types";
import { parseResultNumber } from "../spectrum/result-number";
import { countMasslessStates } from "../spectrum/massless-count";
import { pointDocument } from "./enumerate";
import type { PointVerdict, SweepDefinition, SweepPointOutcome } from "./types";

/**
 * Reduces a result to a sweep point's summary.
 *
 * @example
 * summarizeSweepPoint(computeSpectrum(braneAntibranePair))
 * // => { status: "ok", supercharges: 0, tachyonicSectors: 1, lightestMassSquared: -0.5, masslessStates: "...", gaugeGroup: "U(1) x U(1)" }
 */
export function summarizeSweepPoint(result: SpectrumResult): SweepPointOutcome {
  const lightest = result.lightest[0];
  const value = lightest ? parseResultNumber(lightest.massSquared) : Number.NaN;
  return {
    status: "ok",
    supercharges: result.supercharges,
    tachyonicSectors: result.sectors.filter((sector) => sector.tachyonic).length,
    lightestMassSquared: Number.isFinite(value) ? value : null,
    masslessStates: countMasslessStates(result),
    gaugeGroup: result.gaugeGroup,
  };
}

/**
 * Computes point `index` of a sweep of `base`.
 *
 * @example
 * computeSweepPoint(base, definition, 0).status // => "ok"
 */
export function computeSweepPoint(base: Configuration, definition: SweepDefinition, index: number): SweepPointOutcome {
  const attempt = tryComputeSpectrum(pointDocument(base, definition, index), { lightestCount: 1 });
  if (attempt.result === null) return { status: "invalid", problem: attempt.problems[0]?.message ?? "The engine refused this configuration" };
  return summarizeSweepPoint(attempt.result);
}

/**
 * How a point reads on the map: tachyonic when any sector is, else supersymmetric when it keeps
 * supercharges, else neither; `invalid` for a point the engine refused.
 *
 * @example
 * pointVerdict({ status: "ok", supercharges: 16, tachyonicSectors: 0, ... }) // => "supersymmetric"
 */
export function pointVerdict(outcome: Pick<SweepPointOutcome, "status"> & { supercharges?: number | null; tachyonicSectors?: number }): PointVerdict {
  if (outcome.status === "invalid") return "invalid";
  if ((outcome.tachyonicSectors ?? 0) > 0) return "tachyonic";
  if ((outcome.supercharges ?? 0) > 0) return "supersymmetric";
  return "neither";
}
