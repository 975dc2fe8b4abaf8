/**
 * The interaction potential V(y) of every pair of distinct stacks (and of stacks with images) of a
 * computed result, sampled for plots and exports. Computed on demand from the pure engine, not
 * stored with results: a curve depends only on the pair's shape (nu, nn, orientations), so pairs of
 * one shape share one set of samples.
 *
 * Conventions (see `annulus.ts`): V per unit (p+1)-volume of the common worldvolume, alpha' = 1,
 * V < 0 attractive; N_a N_b Chan-Paton labels of the covering space (2N for a stack on an
 * orientifold plane), both orientations of the string. The samples run over y from y_c (or 1 when
 * there is no tachyon) to 12 string lengths beyond it; the value at the pair's own separation is
 * given separately.
 *
 * Invalid-input policy: expects the configuration the result was computed from; pairs whose ids it
 * does not know are left out.
 */

import { classifyPair } from "./classify";
import { dimensionOf } from "./check";
import { createAnnulusCache, type AnnulusShape } from "./annulus";
import type { Configuration, SpectrumResult } from "./types";

/** How many samples each curve holds. */
export const interactionSampleCount = 200;
/** Sampled length beyond the start of a curve, in units of sqrt(alpha'). */
const sampledSpan = 12;

/** One pair's V(y). */
export interface InteractionCurve {
  pair: [string, string];
  nu: number;
  nn: number;
  /** Common Dirichlet axes: V falls as y^-(dd-2) at large y when the pair is not supersymmetric. */
  dd: number;
  sameOrientation: boolean;
  /** Chan-Paton labels N_a N_b multiplying the per-label potential. */
  labels: number;
  /** The pair's actual separation. */
  separation: number;
  criticalSeparation: number | null;
  /** V at the actual separation; null below y_c, at y = 0 with a massless exchange, or when undefined. */
  atSeparation: number | null;
  /** True when V = 0 at every separation (supersymmetric: nu = 0 same orientation, nu = 4). */
  vanishes: boolean;
  /** Why there is no finite V(y), or null. */
  undefinedReason: string | null;
  /** (y, V) samples; empty when undefined. */
  samples: { y: number; v: number }[];
}

/**
 * V(y) for every sector of a result between two different stacks (or a stack and an image) that
 * share a Dirichlet axis, in the order of `result.sectors`.
 *
 * @param configuration - The configuration of the result.
 * @param result - Its spectrum result (type II; the bosonic theory yields [] because its closed-string
 *   tachyon makes the annulus diverge).
 * @returns One curve per separable pair.
 * @example
 * interactionCurves(d3AntiD3, computeSpectrum(d3AntiD3))[0]?.criticalSeparation // => 4.442882938158366
 */
export function interactionCurves(configuration: Configuration, result: SpectrumResult): InteractionCurve[] {
  if (configuration.theory === "bosonic") return [];
  const dimension = dimensionOf(configuration);
  const stacks = new Map(configuration.stacks.map((stack) => [stack.id, stack]));
  const images = new Map((result.orientifold?.images ?? []).map((image) => [image.id, image]));
  const fixed = new Set((result.orientifold?.images ?? []).filter((image) => image.onPlane).map((image) => image.of));
  const curveOf = createAnnulusCache();
  const samplesMemo = new Map<string, { y: number; v: number }[]>();
  const resolve = (id: string) => {
    const stack = stacks.get(id);
    if (stack) return { stack, anti: stack.anti, position: stack.position };
    const image = images.get(id);
    const of = image ? stacks.get(image.of) : undefined;
    return image && of ? { stack: of, anti: image.anti, position: image.position } : null;
  };
  const curves: InteractionCurve[] = [];
  for (const sector of result.sectors) {
    const [idA, idB] = sector.pair;
    if (idA === idB) continue;
    const a = resolve(idA);
    const b = resolve(idB);
    if (!a || !b) continue;
    const classification = classifyPair({ worldvolume: a.stack.worldvolume, position: a.position }, { worldvolume: b.stack.worldvolume, position: b.position }, dimension);
    if (classification.dd === 0) continue;
    const shape: AnnulusShape = { nu: classification.nu, nn: classification.nn, sameOrientation: a.anti === b.anti };
    const curve = curveOf(shape);
    const labels = a.stack.count * (fixed.has(a.stack.id) ? 2 : 1) * b.stack.count * (fixed.has(b.stack.id) && idB === b.stack.id ? 2 : 1);
    const key = `${shape.nu}|${shape.nn}|${shape.sameOrientation}`;
    let perLabel = samplesMemo.get(key);
    if (!perLabel) {
      perLabel = [];
      if (curve.undefinedReason === null) {
        const start = curve.criticalSeparation ?? 1;
        for (let k = 0; k < interactionSampleCount; k += 1) {
          const y = start + (sampledSpan * k) / (interactionSampleCount - 1);
          const v = curve.potential(y);
          if (v !== null) perLabel.push({ y, v });
        }
      }
      samplesMemo.set(key, perLabel);
    }
    const own = curve.potential(classification.separation);
    curves.push({
      pair: [idA, idB],
      nu: shape.nu,
      nn: shape.nn,
      dd: classification.dd,
      sameOrientation: shape.sameOrientation,
      labels,
      separation: classification.separation,
      criticalSeparation: curve.criticalSeparation,
      atSeparation: own === null ? null : own * labels,
      vanishes: curve.vanishes,
      undefinedReason: curve.undefinedReason,
      samples: perLabel.map(({ y, v }) => ({ y, v: v * labels })),
    });
  }
  return curves;
}

/**
 * The sign conventions of V(y), for the interface and exports.
 *
 * @example
 * INTERACTION_CONVENTIONS.includes("V < 0") // => true
 */
export const INTERACTION_CONVENTIONS =
  "V(y) = -(1/2) N_a N_b integral dt/t (8 pi^2 t)^(-(p+1)/2) exp(-t y^2 / 2 pi) Z(t), the one-loop annulus between the two stacks, " +
  "with Z the GSO-projected open-string trace of (-1)^(spacetime fermion number) q^(N + a), q = e^(-2 pi t), over both orientations; " +
  "p + 1 counts the common worldvolume directions. Energy per unit worldvolume in string units (alpha' = 1): V < 0 attracts, V > 0 repels. " +
  "Below the critical separation y_c the open-string tachyon makes the integral diverge (an instability, not a potential). " +
  "Interactions with an orientifold plane itself (the Moebius strip) are not included. Evaluated numerically (closed and open channels, trapezoidal rule in ln t).";
