/**
 * Domain validation of a configuration document (physics.md, "Units and axes"; product.md,
 * "The configuration file").
 *
 * `checkConfiguration` lists every problem that makes a configuration impossible to compute,
 * each at the JSON path of the offending value; `configurationWarnings` lists cautions for
 * configurations the engine computes but whose physics needs care. The zod schema in
 * `lib/validations/configuration.ts` checks shapes and adds these problems at their paths.
 *
 * Invalid-input policy: both functions never throw for a value of type `Configuration`, and
 * they are defensive about values that only pretend to be one (NaN, non-integers, bad keys).
 */

import { classifyPair } from "./classify";
import { checkCompactAxes } from "./compact";
import { bosonicCriticalDimension, superstringCriticalDimension } from "./constants";
import { checkOrientifolds } from "./orientifold-check";
import type { Configuration, Stack } from "./types";

/** One reason a configuration cannot be computed, at the JSON path of the offending value. */
export interface ConfigurationProblem {
  /** Path from the document root, e.g. ["stacks", 1, "worldvolume"]. */
  path: (string | number)[];
  /** Plain-language explanation that names the stack where there is one. */
  message: string;
}

/**
 * Thrown by `computeSpectrum` for a configuration that `checkConfiguration` rejects.
 * `problems` holds every problem, not just the first.
 */
export class ConfigurationError extends Error {
  /** Every problem found, in document order. */
  readonly problems: ConfigurationProblem[];

  /**
   * @param problems - The problems from `checkConfiguration` (at least one).
   * @example
   * new ConfigurationError([{ path: ["levels"], message: "..." }]).problems.length // => 1
   */
  constructor(problems: ConfigurationProblem[]) {
    const first = problems[0];
    const more = problems.length > 1 ? ` (and ${problems.length - 1} more)` : "";
    super(first ? `Invalid configuration: ${first.message}${more}` : "Invalid configuration");
    this.name = "ConfigurationError";
    this.problems = problems;
  }
}

/**
 * Limits on a configuration: they keep every computation fast and every count exact.
 *
 * @example
 * configurationLimits.maxStacks // => 64
 */
export const configurationLimits = {
  /** At most this many stacks (64 stacks give 2080 sectors). */
  maxStacks: 64,
  /** Highest mass cap `levels` (alpha' M^2 at zero separation) that may be requested. */
  maxLevel: 200,
  /** Largest branes-per-stack count. */
  maxCount: 10_000,
  /** Largest |position| in units of sqrt(alpha'); keeps y^2 far from overflow. */
  maxAbsPosition: 1_000_000,
  /** Smallest non-critical bosonic dimension allowed (one spatial axis). */
  minBosonicDimension: 2,
  /** Longest stack id. */
  maxIdLength: 64,
  /**
   * Largest `configurationCost`, sectors x (levels + 1), in one result: each unit lists at most
   * four level rows, so this bounds a result to 80,000 rows and 64 stacks cannot ask for millions.
   * Twelve stacks reach a mass cap of 200.
   */
  maxSectorLevels: 20_000,
  /** Largest string scale in GeV (beyond the Planck scale, ~1.2e19 GeV); keeps masses in GeV finite. */
  maxStringScaleGeV: 1e20,
} as const;

/**
 * Spacetime dimension of a configuration: the explicit `dimension`, else the critical one.
 *
 * @param config - Only `theory` and `dimension` are read.
 * @returns 26 for bosonic and 10 for IIA/IIB unless `dimension` is set.
 * @example
 * dimensionOf({ theory: "IIB" })                  // => 10
 * dimensionOf({ theory: "bosonic", dimension: 6 }) // => 6
 */
export function dimensionOf(config: Pick<Configuration, "theory" | "dimension">): number {
  if (config.dimension !== undefined) return config.dimension;
  return config.theory === "bosonic" ? bosonicCriticalDimension : superstringCriticalDimension;
}

/**
 * Human name of a stack for messages: `stack "p" (probe)`.
 *
 * @param stack - Only `id` and `label` are read.
 * @returns The id in quotes, followed by the label in parentheses when it differs and is set.
 * @example
 * describeStack({ id: "p", label: "probe" }) // => 'stack "p" (probe)'
 */
export function describeStack(stack: Pick<Stack, "id" | "label">): string {
  const label = typeof stack.label === "string" ? stack.label.trim() : "";
  return label && label !== stack.id ? `stack "${stack.id}" (${label})` : `stack "${stack.id}"`;
}

/**
 * Lists every problem that prevents computing a configuration's spectrum.
 *
 * Rules: bosonic D is 26 or a non-critical integer 2..26 (a warning, not a problem); type II
 * needs D = 10; IIA allows only even p and IIB only odd p; worldvolume axes lie in 1..D-1,
 * sorted and without duplicates; stack ids are unique and well formed; counts are integers
 * 1..10000; at most 64 stacks; the mass cap `levels` is an integer 0..200; positions are finite, at most 1e6
 * in size, and keyed by Dirichlet axes of the stack; the string scale is null or positive and at
 * most 1e20 GeV; sectors x (levels + 1) stays within 20000.
 *
 * @param config - The configuration to check (not mutated).
 * @returns The problems in document order; an empty array means the configuration is valid.
 * @example
 * checkConfiguration({ format: 1, title: "t", theory: "IIA", stringScaleGeV: null, levels: 2,
 *   stacks: [{ id: "s", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} }] })
 * // => [{ path: ["stacks", 0, "worldvolume"], message: 'Stack "s" is a D3 brane, but IIA allows only even p (D0, D2, D4, D6, D8)' }]
 */
export function checkConfiguration(config: Configuration): ConfigurationProblem[] {
  const problems: ConfigurationProblem[] = [];
  const dimension = checkDimension(config, problems);
  const levelsOk = Number.isInteger(config.levels) && config.levels >= 0 && config.levels <= configurationLimits.maxLevel;

  if (!levelsOk) {
    problems.push({
      path: ["levels"],
      message: `The mass cap (levels: the highest alpha' M^2 listed at zero separation) must be a whole number from 0 to ${configurationLimits.maxLevel}, got ${String(config.levels)}`,
    });
  }

  const scale = config.stringScaleGeV;
  if (scale !== null && !(Number.isFinite(scale) && scale > 0 && scale <= configurationLimits.maxStringScaleGeV)) {
    problems.push({
      path: ["stringScaleGeV"],
      message: `The string scale must be a positive number of GeV up to ${configurationLimits.maxStringScaleGeV} (above the Planck scale), or null; got ${String(scale)}`,
    });
  }

  if (config.stacks.length > configurationLimits.maxStacks) {
    problems.push({
      path: ["stacks"],
      message: `At most ${configurationLimits.maxStacks} stacks are allowed, got ${config.stacks.length}`,
    });
  }

  const sectorCount = (config.stacks.length * (config.stacks.length + 1)) / 2;
  if (levelsOk && config.stacks.length <= configurationLimits.maxStacks && configurationCost(config) > configurationLimits.maxSectorLevels) {
    const highest = Math.floor(configurationLimits.maxSectorLevels / sectorCount) - 1;
    problems.push({
      path: ["levels"],
      message:
        `${config.stacks.length} stacks give ${sectorCount} sectors, too many to list up to alpha' M^2 = ${config.levels} in one result; ` +
        `lower the mass cap (levels) to at most ${highest} or use fewer stacks`,
    });
  }

  const firstIndexById = new Map<string, number>();
  config.stacks.forEach((stack, index) => {
    const previous = firstIndexById.get(stack.id);
    if (previous !== undefined) {
      problems.push({
        path: ["stacks", index, "id"],
        message: `Stack id "${stack.id}" is already used by stacks[${previous}]; ids must be unique`,
      });
    } else {
      firstIndexById.set(stack.id, index);
    }
    checkStack(stack, index, config.theory, dimension, problems);
  });
  problems.push(...checkCompactAxes(config, dimension));
  checkOrientifolds(config, dimension, problems);

  return problems;
}

/**
 * The work a configuration asks of the engine: sectors x (levels + 1), the quantity that
 * `configurationLimits.maxSectorLevels` bounds. Rate limits and the choice to compute off the
 * request thread are weighted by it.
 *
 * Each unit stands for at most four level rows: with the mass cap N + a <= levels, a type II
 * sector lists N on the half-integer grid up to levels - a with a >= -1/2 in each of NS and R
 * (at most 2 levels + 2 rows each), and a bosonic sector up to levels - a with a >= -1 (at most
 * 2 levels + 3 rows), so rows <= 4 x cost.
 *
 * @param config - Only the number of stacks and `levels` are read.
 * @returns n (n + 1) / 2 sectors for n stacks, times levels + 1 (at least 1 level counted).
 * @example
 * configurationCost({ stacks: [a, b, c], levels: 9 }) // => 60   (6 sectors x 10)
 */
export function configurationCost(config: Pick<Configuration, "stacks" | "levels">): number {
  const sectors = (config.stacks.length * (config.stacks.length + 1)) / 2;
  const levels = Number.isFinite(config.levels) ? Math.max(0, Math.floor(config.levels)) : 0;
  return sectors * (levels + 1);
}

/** Orders stacks by id: the canonical order of sectors and warnings, whatever the order of the input. */
export function compareStackIds(x: Stack, y: Stack): number {
  return x.id < y.id ? -1 : x.id > y.id ? 1 : 0;
}

/**
 * Lists cautions for a configuration the engine can compute but whose physics needs care.
 *
 * Covers: a non-critical bosonic dimension; antibranes in the bosonic theory (ignored); D7, D8 and
 * D9 stacks (a deficit angle and a running coupling; RR tadpoles, orientifolds, a varying dilaton);
 * pairs in which every spatial axis is ND, which are counted covariantly.
 *
 * @param config - The configuration (assumed to pass `checkConfiguration`; not mutated).
 * @returns Warning sentences in a fixed order, with stacks taken in id order so that the order of
 *   `config.stacks` does not matter; empty when there is nothing to say.
 * @example
 * configurationWarnings({ format: 1, title: "t", theory: "bosonic", dimension: 26, stringScaleGeV: null,
 *   levels: 1, stacks: [] })
 * // => []
 */
export function configurationWarnings(config: Configuration): string[] {
  const warnings: string[] = [];
  const dimension = dimensionOf(config);
  const stacks = [...config.stacks].sort(compareStackIds);
  if (config.theory === "bosonic" && dimension !== bosonicCriticalDimension) {
    warnings.push(
      `Non-critical dimension D = ${dimension}: the bosonic string is consistent only at D = ${bosonicCriticalDimension}. ` +
        "Only there is the level-1 vector massless and Lorentz symmetry preserved; the numbers shown are the formal light-cone counts.",
    );
  }
  if (config.theory === "bosonic") {
    const anti = stacks.filter((stack) => stack.anti);
    if (anti.length > 0) {
      warnings.push(
        `The bosonic string has no RR charge, so the antibrane flag of ${listStacks(anti)} is ignored.`,
      );
    }
  } else {
    // Codimension two or less: the brane's own fields do not fall off far away (common practice, from memory).
    const lowCodimension = stacks.filter((stack) => stack.worldvolume.length >= 7);
    for (const stack of lowCodimension) {
      const p = stack.worldvolume.length;
      const why =
        p === 9 && config.orientifolds?.length
          ? "a space-filling D9 stack needs its RR tadpole cancelled: see the tadpole balance with the orientifold plane"
          : p === 9
          ? "a space-filling D9 stack needs its RR tadpole cancelled (e.g. by an orientifold plane, as in type I with 32 D9 branes)"
          : p === 8
            ? "a D8 stack is a domain wall of codimension one: its RR charge sources a varying dilaton (massive IIA) and needs orientifolds or other D8s for consistency"
            : "a D7 stack has codimension two: it makes a deficit angle in the transverse plane and a coupling (axio-dilaton) that runs logarithmically with the distance, and a compact transverse space needs 24 of them (or orientifolds) to close up";
      const shown = config.orientifolds?.length ? "with the orientifold plane, without the other ingredients" : "without these ingredients";
      warnings.push(`${capitalise(describeStack(stack))} is a D${p}: ${why}. The open-string spectrum is shown ${shown}.`);
    }
  }
  for (let i = 0; i < stacks.length; i += 1) {
    for (let j = i + 1; j < stacks.length; j += 1) {
      const a = stacks[i];
      const b = stacks[j];
      if (a && b && classifyPair(a, b, dimension).nu === dimension - 1) {
        warnings.push(
          `Every spatial axis is ND between ${describeStack(a)} and ${describeStack(b)}: no axis is left for the ` +
            "light-cone gauge, so that pair's states are counted covariantly (X^0 with the b, c ghosts), with a = -(D - 2)/24 + nu/16.",
        );
      }
    }
  }
  return warnings;
}

function checkDimension(config: Configuration, problems: ConfigurationProblem[]): number {
  const dimension = dimensionOf(config);
  if (config.theory === "bosonic") {
    if (
      !Number.isInteger(dimension) ||
      dimension < configurationLimits.minBosonicDimension ||
      dimension > bosonicCriticalDimension
    ) {
      problems.push({
        path: ["dimension"],
        message: `The bosonic theory needs a whole-number dimension from ${configurationLimits.minBosonicDimension} to ${bosonicCriticalDimension} (critical: ${bosonicCriticalDimension}), got ${String(dimension)}`,
      });
      return bosonicCriticalDimension;
    }
  } else if (dimension !== superstringCriticalDimension) {
    problems.push({
      path: ["dimension"],
      message: `Type ${config.theory} lives in D = ${superstringCriticalDimension}, got ${String(dimension)}`,
    });
    return superstringCriticalDimension;
  }
  return dimension;
}

function checkStack(
  stack: Stack,
  index: number,
  theory: Configuration["theory"],
  dimension: number,
  problems: ConfigurationProblem[],
): void {
  const at = (...rest: (string | number)[]): (string | number)[] => ["stacks", index, ...rest];
  const name = describeStack(stack);

  if (!/^[A-Za-z0-9_-]+$/.test(stack.id) || stack.id.length > configurationLimits.maxIdLength) {
    problems.push({
      path: at("id"),
      message: `Stack id "${stack.id}" must be 1 to ${configurationLimits.maxIdLength} letters, digits, "-" or "_"`,
    });
  }

  if (!Number.isInteger(stack.count) || stack.count < 1 || stack.count > configurationLimits.maxCount) {
    problems.push({
      path: at("count"),
      message: `The count of ${name} must be a whole number from 1 to ${configurationLimits.maxCount}, got ${String(stack.count)}`,
    });
  }

  const axesOk = checkWorldvolume(stack, name, dimension, at, problems);
  if (axesOk && theory !== "bosonic") {
    const p = stack.worldvolume.length;
    const wantEven = theory === "IIA";
    if ((p % 2 === 0) !== wantEven) {
      problems.push({
        path: at("worldvolume"),
        message: wantEven
          ? `${capitalise(name)} is a D${p} brane, but IIA allows only even p (D0, D2, D4, D6, D8)`
          : `${capitalise(name)} is a D${p} brane, but IIB allows only odd p (D1, D3, D5, D7, D9)`,
      });
    }
  }

  checkPositions(stack, name, dimension, at, problems);
}

/**
 * Adds a problem for every position key that is not a Dirichlet spatial axis of the object, and for
 * every value that is not finite or lies beyond `configurationLimits.maxAbsPosition`.
 */
export function checkPositions(
  stack: Pick<Stack, "worldvolume" | "position">,
  name: string,
  dimension: number,
  at: (...rest: (string | number)[]) => (string | number)[],
  problems: ConfigurationProblem[],
): void {
  const neumann = new Set(stack.worldvolume);
  for (const [key, value] of Object.entries(stack.position)) {
    const axis = Number(key);
    if (!/^[0-9]+$/.test(key) || !Number.isInteger(axis) || axis < 1 || axis > dimension - 1) {
      problems.push({
        path: at("position", key),
        message: `Position key "${key}" of ${name} is not a spatial axis 1..${dimension - 1}`,
      });
    } else if (neumann.has(axis)) {
      problems.push({
        path: at("position", key),
        message: `${capitalise(name)} is Neumann along axis ${axis}, so it has no position there; remove the key or make the axis Dirichlet`,
      });
    }
    if (typeof value !== "number" || !Number.isFinite(value)) {
      problems.push({ path: at("position", key), message: `Position of ${name} on axis ${key} must be a finite number` });
    } else if (Math.abs(value) > configurationLimits.maxAbsPosition) {
      problems.push({
        path: at("position", key),
        message: `Position of ${name} on axis ${key} must lie within ±${configurationLimits.maxAbsPosition} (units of sqrt(alpha'))`,
      });
    }
  }
}

/** Returns true when every worldvolume axis is a valid spatial axis, so p is meaningful. */
export function checkWorldvolume(
  stack: Pick<Stack, "worldvolume">,
  name: string,
  dimension: number,
  at: (...rest: (string | number)[]) => (string | number)[],
  problems: ConfigurationProblem[],
): boolean {
  let ok = true;
  stack.worldvolume.forEach((axis, position) => {
    if (!Number.isInteger(axis) || axis < 1 || axis > dimension - 1) {
      ok = false;
      problems.push({
        path: at("worldvolume", position),
        message: `Worldvolume axis ${String(axis)} of ${name} is not a spatial axis 1..${dimension - 1} (time, axis 0, is always included)`,
      });
    }
  });
  if (!ok) return false;
  for (let i = 1; i < stack.worldvolume.length; i += 1) {
    const previous = stack.worldvolume[i - 1] ?? 0;
    const current = stack.worldvolume[i] ?? 0;
    if (current <= previous) {
      problems.push({
        path: at("worldvolume"),
        message:
          current === previous
            ? `Worldvolume of ${name} lists axis ${current} twice`
            : `Worldvolume of ${name} must be sorted in increasing order`,
      });
      return false;
    }
  }
  return true;
}

function listStacks(stacks: Stack[]): string {
  return stacks.map((stack) => `"${stack.id}"`).join(", ");
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
