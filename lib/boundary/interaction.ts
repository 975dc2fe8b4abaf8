/**
 * The interaction potential V(y) of every pair of distinct stacks (and of stacks with images) of a
 * configuration, sampled for plots and exports. Computed on demand from the pure engine, not
 * stored with results: a curve depends only on the pair's shape (nu, nn, orientations), so pairs of
 * one shape share one set of samples.
 *
 * Conventions (see `annulus.ts`): V per unit (p+1)-volume of the common worldvolume, alpha' = 1,
 * V < 0 attractive; N_a N_b Chan-Paton labels of the covering space (2N for a stack on an
 * orientifold plane), both orientations of the string. The samples run over y from y_c (or 1 when
 * there is no tachyon) to 12 string lengths beyond it; the value at the pair's own separation is
 * given separately.
 *
 * Invalid-input policy: expects a configuration that `checkConfiguration` passes.
 */

import { createAnnulusCache, type AnnulusShape } from "./annulus";
import { compareStackIds, dimensionOf } from "./check";
import { classifyPair } from "./classify";
import { describeCompactPair } from "./compact";
import { stacksUnderPlane, type StackUnderPlane } from "./orientifold";
import type { Configuration, Stack } from "./types";

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

/** A pair whose V(y) can be plotted: its shape and separation, without the potential itself. */
export type InteractionPair = Pick<InteractionCurve, "pair" | "nu" | "nn" | "dd" | "sameOrientation" | "labels" | "separation">;

/**
 * Every pair of different stacks of a configuration, and (with an orientifold plane) every stack
 * with the image of a stack off the plane, that share a Dirichlet axis: the pairs of the engine's
 * sectors, in the same order (pairs in id order, then stacks with images). Cheap: no potential is
 * computed (see {@link interactionCurve}).
 *
 * @param configuration - A configuration that `checkConfiguration` passes (type II; the bosonic
 *   theory yields [] because its closed-string tachyon makes the annulus diverge).
 * @returns One entry per separable pair.
 * @example
 * interactionPairs(d3AntiD3)[0]?.nu // => 0
 */
export function interactionPairs(configuration: Configuration): InteractionPair[] {
  if (configuration.theory === "bosonic") return [];
  const dimension = dimensionOf(configuration);
  const stacks = [...configuration.stacks].sort(compareStackIds);
  const plane = configuration.orientifolds?.[0];
  const entries = plane ? stacksUnderPlane(stacks, plane, configuration.theory, dimension) : null;
  const ends = stacks.map((stack, index) => ({ stack, labels: stack.count * (entries?.[index]?.fixed ? 2 : 1) }));
  const pairs: { a: Stack; b: Stack; labels: number }[] = [];
  for (let i = 0; i < ends.length; i += 1) {
    for (let j = i + 1; j < ends.length; j += 1) {
      const a = ends[i] as (typeof ends)[number];
      const b = ends[j] as (typeof ends)[number];
      pairs.push({ a: a.stack, b: b.stack, labels: a.labels * b.labels });
    }
  }
  if (entries) {
    for (let i = 0; i < entries.length; i += 1) {
      for (let j = i; j < entries.length; j += 1) {
        const a = entries[i] as StackUnderPlane;
        const image = (entries[j] as StackUnderPlane).image;
        if (!a.fixed && image) pairs.push({ a: a.stack, b: image, labels: a.stack.count * image.count });
      }
    }
  }
  const separable: InteractionPair[] = [];
  for (const { a, b, labels } of pairs) {
    // On circles the separation is that of the nearest image, as in the pair's sector (the
    // potential of the other images is not added: see CONVENTIONS.md).
    const { classification } = describeCompactPair(classifyPair(a, b, dimension), a, b, configuration);
    if (classification.dd === 0) continue;
    separable.push({
      pair: [a.id, b.id],
      nu: classification.nu,
      nn: classification.nn,
      dd: classification.dd,
      sameOrientation: a.anti === b.anti,
      labels,
      separation: classification.separation,
    });
  }
  return separable;
}

/** Work shared between the curves of one call: the annulus of each shape and its samples. */
export interface InteractionCache {
  annulus: ReturnType<typeof createAnnulusCache>;
  samples: Map<string, { y: number; v: number }[]>;
}

/** A fresh {@link InteractionCache}. */
export function createInteractionCache(): InteractionCache {
  return { annulus: createAnnulusCache(), samples: new Map() };
}

/**
 * V(y) of one pair from {@link interactionPairs}: the samples, the critical separation and the
 * value at the pair's own separation.
 *
 * @param pair - An entry of `interactionPairs(configuration)`.
 * @param cache - Shared between the curves of one configuration (pairs of one shape share their
 *   samples); a fresh one by default.
 * @returns The pair's curve.
 * @example
 * interactionCurve(interactionPairs(d3AntiD3)[0]!).criticalSeparation // => 4.442882938158366
 */
export function interactionCurve(pair: InteractionPair, cache: InteractionCache = createInteractionCache()): InteractionCurve {
  const shape: AnnulusShape = { nu: pair.nu, nn: pair.nn, sameOrientation: pair.sameOrientation };
  const curve = cache.annulus(shape);
  const key = `${shape.nu}|${shape.nn}|${shape.sameOrientation}`;
  let perLabel = cache.samples.get(key);
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
    cache.samples.set(key, perLabel);
  }
  const own = curve.potential(pair.separation);
  const { labels } = pair;
  return {
    ...pair,
    pair: [pair.pair[0], pair.pair[1]],
    criticalSeparation: curve.criticalSeparation,
    atSeparation: own === null ? null : own * labels,
    vanishes: curve.vanishes,
    undefinedReason: curve.undefinedReason,
    samples: perLabel.map(({ y, v }) => ({ y, v: v * labels })),
  };
}

/**
 * V(y) for every pair of {@link interactionPairs}, in the same order (exports and the revision diff).
 *
 * @param configuration - A configuration that `checkConfiguration` passes (type II; the bosonic
 *   theory yields [] because its closed-string tachyon makes the annulus diverge).
 * @returns One curve per separable pair.
 * @example
 * interactionCurves(d3AntiD3)[0]?.criticalSeparation // => 4.442882938158366
 */
export function interactionCurves(configuration: Configuration): InteractionCurve[] {
  const cache = createInteractionCache();
  return interactionPairs(configuration).map((pair) => interactionCurve(pair, cache));
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
