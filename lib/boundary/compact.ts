/**
 * Compact axes: circles of radius R, Wilson lines, and the tower of momentum and winding states
 * (file format 2, issue 9).
 *
 * Conventions (alpha' = 1, lengths in units of sqrt(alpha')): for an open string from stack a
 * (sigma = 0) to stack b (sigma = pi),
 * - on a compact NN axis the momentum is p = (n + (theta_b - theta_a) / 2 pi) / R, n in Z, with
 *   theta the Wilson line of each stack on that axis (Polchinski vol. 1, section 8.6, from memory);
 * - on a compact DD axis the string may wind: its stretched length is Delta x + 2 pi R w, w in Z,
 *   with the positions read modulo 2 pi R into [0, 2 pi R) (section 8.7, from memory);
 * - ND and DN axes carry neither (one end slides freely, the other is fixed).
 * Then alpha' M^2 = N + a + sum_NN p^2 + sum_DD ((Delta x + 2 pi R w) / 2 pi)^2 + (y_flat / 2 pi)^2,
 * y_flat the separation along the non-compact DD axes. Both compact terms have the form
 * (scale (m + offset))^2, scale = 1/R (NN) or R (DD), which T-duality (R -> 1/R, N <-> D,
 * x = theta R') maps into each other with m unchanged (`t-duality.ts`).
 *
 * The level rows of a sector (`Sector.levels`) keep the lightest momentum and winding on every
 * compact axis (the nearest image of the other stack); the tower lists every state up to the cap.
 */

import type { ConfigurationProblem } from "./check";
import type { PairClassification } from "./classify";
import { formatDecimal } from "./format";
import { addRational, formatRational, isNegativeRational, multiplyRational, rational, type Rational } from "./rational";
import type { CompactAxisTerm, Configuration, SectorKind, Stack, TowerState } from "./types";

/**
 * Limits on compact axes, chosen so that a tower stays small and its arithmetic exact enough.
 *
 * @example
 * compactLimits.minRadius // => 0.001
 */
export const compactLimits = {
  /** Smallest radius, in units of sqrt(alpha'). */
  minRadius: 0.001,
  /** Largest radius, in units of sqrt(alpha'). */
  maxRadius: 1000,
  /** Most tower rows listed per sector (fewer when the configuration has many sectors). */
  maxTowerRows: 200,
  /** Tower rows allowed over the whole result: `towerRowLimit` spreads them over the sectors. */
  maxResultTowerRows: 40_000,
} as const;

const twoPi = 2 * Math.PI;

/**
 * The conventions statement of a result with compact axes: `CONVENTIONS_TEXT` with the circle
 * terms stated before its closing caution.
 *
 * @param conventions - The flat-space statement (`CONVENTIONS_TEXT`).
 * @returns The statement with one more paragraph on momentum, winding and Wilson lines.
 * @example
 * withCompactConventions(CONVENTIONS_TEXT).includes("2 pi R w") // => true
 */
export function withCompactConventions(conventions: string): string {
  const compact =
    "On a compact axis of radius R (file format 2) a string from stack a to stack b adds " +
    "((n + (theta_b - theta_a) / 2 pi) / R)^2 along NN (momentum n, Wilson lines theta in radians) and " +
    "((Delta x + 2 pi R w) / 2 pi)^2 along DD (winding w, positions read modulo 2 pi R into [0, 2 pi R)); " +
    "the tower lists these states up to alpha' M^2 <= levels, the string from b to a having the opposite numbers. ";
  const caution = conventions.indexOf("Caution:");
  return caution < 0 ? `${conventions} ${compact}` : `${conventions.slice(0, caution)}${compact}${conventions.slice(caution)}`;
}

/**
 * Radius of a compact axis, or null for a non-compact one.
 *
 * @param configuration - Only `compact` is read.
 * @param axis - Spatial axis number.
 * @returns R in units of sqrt(alpha'), or null when the axis is not listed in `compact`.
 * @example
 * compactRadius({ compact: { "9": 2.5 } }, 9) // => 2.5
 * compactRadius({}, 9)                        // => null
 */
export function compactRadius(configuration: Pick<Configuration, "compact">, axis: number): number | null {
  return configuration.compact?.[String(axis)] ?? null;
}

/**
 * Whether a configuration has compact axes (a Wilson line needs one: see `checkCompactAxes`).
 *
 * @param configuration - Only `compact` is read.
 * @returns True when some axis is compact.
 * @example
 * hasCompactAxes({ compact: { "9": 1 } }) // => true
 */
export function hasCompactAxes(configuration: Pick<Configuration, "compact">): boolean {
  return Object.keys(configuration.compact ?? {}).length > 0;
}

/**
 * Wilson line of a stack on an axis.
 *
 * @param stack - Only `wilson` is read.
 * @param axis - Spatial axis number.
 * @returns theta in [0, 2 pi) (radians); 0 when the key is absent.
 * @example
 * wilsonLine({ wilson: { "9": 1.2 } }, 9) // => 1.2
 */
export function wilsonLine(stack: Pick<Stack, "wilson">, axis: number): number {
  return stack.wilson?.[String(axis)] ?? 0;
}

/**
 * A position (or an angle) on a circle as the fraction of a turn it lies at, read modulo one turn.
 *
 * @param x - Position in units of sqrt(alpha') (any finite number), or an angle with `period` 2 pi.
 * @param period - Length of the circle, 2 pi R (or 2 pi for an angle).
 * @returns t in [0, 1); a value within 1e-12 of a whole turn reads as 0, so that rounding (a position
 *   of -1e-16, an angle computed as 2 pi - 1e-16) never puts a stack a whole turn away.
 * @example
 * turnsOnCircle(-Math.PI / 2, 2 * Math.PI) // => 0.75
 */
export function turnsOnCircle(x: number, period: number): number {
  const ratio = x / period;
  const turns = ratio - Math.floor(ratio);
  return turns >= 1 - 1e-12 || turns < 0 ? 0 : turns;
}

/**
 * A position on a circle read modulo 2 pi R into [0, 2 pi R).
 *
 * @param x - Position in units of sqrt(alpha') (any finite number).
 * @param radius - R > 0.
 * @returns 2 pi R times `turnsOnCircle(x, 2 pi R)`.
 * @example
 * canonicalPosition(-1, 1) // => 2 pi - 1 (about 5.2832)
 */
export function canonicalPosition(x: number, radius: number): number {
  const period = twoPi * radius;
  return period * turnsOnCircle(x, period);
}

/** A pair of stacks seen on the compact axes. */
export interface CompactPair {
  /**
   * The classification with every compact DD difference replaced by that of the nearest image
   * (|Delta x| <= pi R), and the separation recomputed from them.
   */
  classification: PairClassification;
  /** The compact NN and DD axes of the pair, in axis order. */
  terms: CompactAxisTerm[];
  /** Lightest momentum contribution, sum over compact NN axes of min_n p^2, to alpha' M^2. */
  momentumShift: number;
  /** True when every compact NN axis has equal Wilson lines (the pair can be massless there). */
  aligned: boolean;
  /** (y / 2 pi)^2 along the non-compact DD axes only. */
  flatStretch: number;
}

/**
 * Reads a classified pair on the compact axes of its configuration.
 *
 * @param classification - `classifyPair(a, b, D)` (not mutated).
 * @param a - Stack at sigma = 0.
 * @param b - Stack at sigma = pi.
 * @param configuration - Only `compact` is read.
 * @returns The nearest-image classification, the compact terms, the lightest momentum shift and
 *   whether the Wilson lines agree. Without compact axes the classification is returned as it is.
 * @example
 * // Two D0s on a circle of radius 1 at x = 0.5 and x = 2 pi - 0.5: the nearest images are 1 apart.
 * describeCompactPair(classifyPair(a, b, 10), a, b, { compact: { "9": 1 } }).classification.separation // => 1
 */
export function describeCompactPair(
  classification: PairClassification,
  a: Pick<Stack, "wilson">,
  b: Pick<Stack, "wilson">,
  configuration: Pick<Configuration, "compact">,
): CompactPair {
  if (!configuration.compact || Object.keys(configuration.compact).length === 0) {
    return { classification, terms: [], momentumShift: 0, aligned: true, flatStretch: classification.separationSquared / (twoPi * twoPi) };
  }
  const terms: CompactAxisTerm[] = [];
  let momentumShift = 0;
  let aligned = true;
  let flatSquared = 0;
  for (const axis of classification.axes) {
    const radius = compactRadius(configuration, axis.axis);
    if (radius === null) continue;
    if (axis.type === "NN") {
      const offset = snapToWhole(turnsOnCircle(wilsonLine(b, axis.axis), twoPi) - turnsOnCircle(wilsonLine(a, axis.axis), twoPi));
      terms.push({ axis: axis.axis, type: "NN", radius, scale: 1 / radius, offset });
      if (offset !== 0) aligned = false;
      const nearest = offset - Math.round(offset);
      momentumShift += (nearest / radius) ** 2;
    } else if (axis.type === "DD") {
      const period = twoPi * radius;
      const offset = snapToWhole(turnsOnCircle(axis.positionB ?? 0, period) - turnsOnCircle(axis.positionA ?? 0, period));
      terms.push({ axis: axis.axis, type: "DD", radius, scale: radius, offset });
    }
  }
  let separationSquared = 0;
  const separationVector = classification.separationVector.map((component) => {
    const term = terms.find((candidate) => candidate.axis === component.axis);
    if (term === undefined) {
      flatSquared += component.delta * component.delta;
      separationSquared += component.delta * component.delta;
      return component;
    }
    const delta = twoPi * term.radius * (term.offset - Math.round(term.offset));
    separationSquared += delta * delta;
    return { axis: component.axis, delta };
  });
  return {
    classification: { ...classification, separationVector, separationSquared, separation: Math.sqrt(separationSquared) },
    terms,
    momentumShift,
    aligned,
    flatStretch: flatSquared / (twoPi * twoPi),
  };
}

/**
 * How many tower rows each sector lists: `compactLimits.maxTowerRows`, fewer when there are so
 * many sectors that the result would outgrow `compactLimits.maxResultTowerRows`.
 *
 * @param sectors - Number of sectors of the result (at least 1 is assumed).
 * @returns A whole number from 8 to 200.
 * @example
 * towerRowLimit(78)   // => 200
 * towerRowLimit(2080) // => 19
 */
export function towerRowLimit(sectors: number): number {
  const share = Math.floor(compactLimits.maxResultTowerRows / Math.max(1, sectors));
  return Math.max(8, Math.min(compactLimits.maxTowerRows, share));
}

/** One oscillator level of a sector, as the tower reads it. */
export interface TowerLevel {
  kind: SectorKind;
  /** N, exact text. */
  level: string;
  /** N + a, exact. */
  exact: Rational;
  /** N + a as a number. */
  exactValue: number;
  /** Per oriented string and Chan-Paton label, or null where the orientations differ. */
  states: string | null;
  /** Over both orientations and all Chan-Paton labels. */
  withChanPaton: string;
}

/** Input of {@link computeTower}. */
export interface TowerInput {
  /** The compact terms of the pair (`describeCompactPair`). */
  terms: readonly CompactAxisTerm[];
  /** (y / 2 pi)^2 along the non-compact DD axes. */
  flatStretch: number;
  /** The levels of each sector kind, each list in increasing N + a. */
  levels: readonly (readonly TowerLevel[])[];
  /** Mass cap on the whole alpha' M^2 (`Configuration.levels`). */
  cap: number;
  /** Most rows listed (`towerRowLimit`). */
  limit: number;
  /** String scale in GeV, or null. */
  stringScaleGeV: number | null;
}

/** A combination of momentum and winding numbers with its compact contribution to alpha' M^2. */
interface Combination {
  numbers: number[];
  value: number;
}

/** A tower row before formatting. */
interface Candidate {
  level: TowerLevel;
  kindIndex: number;
  combination: Combination;
  value: number;
}

/**
 * The tower of a pair: every oscillator level combined with every momentum and winding number on
 * the compact axes, with alpha' M^2 <= cap, lightest first, at most `limit` rows.
 *
 * Exactness: alpha' M^2 is an exact rational when every term with a non-zero number has offset 0
 * and a radius written with at most six decimals, and nothing stretches along non-compact axes;
 * otherwise it is a 12-significant-digit decimal.
 *
 * @param input - See {@link TowerInput}.
 * @returns The rows and whether more lie within the cap than are listed.
 * @example
 * // One NN circle of radius 1 (scale 1, offset 0), bosonic levels N + a = -1, 0, cap 1:
 * computeTower(input).rows.map((row) => [row.momentum["9"], row.massSquared])
 * // => [[0, "-1"], [-1, "0"], [0, "0"], [1, "0"], [-1, "1"], [1, "1"]]
 */
export function computeTower(input: TowerInput): { rows: TowerState[]; truncated: boolean } {
  const { terms, flatStretch, levels, cap, limit, stringScaleGeV } = input;
  const keep = limit + 1;
  const ceiling = cap + 1e-9 * Math.max(1, Math.abs(cap));
  let lowest = Infinity;
  for (const list of levels) if (list[0] && list[0].exactValue < lowest) lowest = list[0].exactValue;
  if (lowest === Infinity) return { rows: [], truncated: false };
  const budget = ceiling - lowest - flatStretch;
  if (budget < 0) return { rows: [], truncated: false };

  let truncated = false;
  let combinations: Combination[] = [{ numbers: [], value: 0 }];
  for (const term of terms) {
    const values = axisValues(term, budget, keep);
    if (values.length > limit) truncated = true;
    const next: Combination[] = [];
    // Among the `keep` smallest sums of two sorted lists, entry (i, j) needs (i + 1)(j + 1) <= keep.
    for (let i = 0; i < combinations.length; i += 1) {
      const left = combinations[i] as Combination;
      for (let j = 0; j < values.length && (i + 1) * (j + 1) <= keep; j += 1) {
        const right = values[j] as { number: number; value: number };
        const value = left.value + right.value;
        if (value > budget) break;
        next.push({ numbers: [...left.numbers, right.number], value });
      }
    }
    next.sort(compareCombinations);
    if (next.length > limit) truncated = true;
    combinations = next.slice(0, keep);
  }

  const exactScales = terms.map(exactScaleSquare);
  const candidates: Candidate[] = [];
  levels.forEach((list, kindIndex) => {
    for (let i = 0; i < list.length; i += 1) {
      const level = list[i] as TowerLevel;
      for (let j = 0; j < combinations.length && (i + 1) * (j + 1) <= keep; j += 1) {
        const combination = combinations[j] as Combination;
        const value = level.exactValue + flatStretch + combination.value;
        if (value > ceiling) break;
        candidates.push({ level, kindIndex, combination, value });
      }
    }
  });
  candidates.sort(compareCandidates);
  if (candidates.length > limit) truncated = true;

  const rows = candidates.slice(0, limit).map(({ level, combination, value }): TowerState => {
    const momentum: Record<string, number> = {};
    const winding: Record<string, number> = {};
    terms.forEach((term, index) => {
      (term.type === "NN" ? momentum : winding)[String(term.axis)] = combination.numbers[index] ?? 0;
    });
    const exact = flatStretch === 0 ? exactMassSquared(level.exact, terms, exactScales, combination.numbers) : null;
    const negative = exact !== null ? exact.negative : value < 0;
    const mass = negative ? null : Math.sqrt(Math.max(0, value));
    const row: TowerState = {
      sector: level.kind,
      level: level.level,
      momentum,
      winding,
      massSquared: exact !== null ? exact.text : formatDecimal(value),
      mass,
      states: level.states,
      withChanPaton: level.withChanPaton,
    };
    if (stringScaleGeV !== null) row.massGeV = mass === null ? null : mass * stringScaleGeV;
    return row;
  });
  return { rows, truncated };
}

/**
 * Problems of the compact axes and Wilson lines of a configuration, each at its JSON path: axes
 * are spatial axes 1..D-1 (so at most 9 in type II and 25 in bosonic), radii lie in
 * [0.001, 1000], Wilson lines sit on compact Neumann axes of their stack with theta in [0, 2 pi),
 * and the fields need file format 2.
 *
 * @param configuration - The configuration (not mutated; defensive about malformed values).
 * @param dimension - Spacetime dimension D.
 * @returns The problems in document order; empty when there are none.
 * @example
 * checkCompactAxes({ ...config, format: 2, compact: { "9": -1 } }, 10)[0]?.path // => ["compact", "9"]
 */
export function checkCompactAxes(configuration: Configuration, dimension: number): ConfigurationProblem[] {
  const problems: ConfigurationProblem[] = [];
  const compact = configuration.compact ?? {};
  const usesWilson = configuration.stacks.some((stack) => stack.wilson !== undefined && Object.keys(stack.wilson).length > 0);
  if (configuration.format === 1 && (Object.keys(compact).length > 0 || usesWilson)) {
    problems.push({
      path: ["format"],
      message: 'Compact axes and Wilson lines need file format 2: set "format": 2 (format 1 files have only non-compact axes)',
    });
  }
  for (const [key, radius] of Object.entries(compact)) {
    const axis = Number(key);
    if (!/^[0-9]+$/.test(key) || axis < 1 || axis > dimension - 1) {
      problems.push({ path: ["compact", key], message: `Compact axis "${key}" is not a spatial axis 1..${dimension - 1}` });
    }
    if (typeof radius !== "number" || !Number.isFinite(radius) || radius < compactLimits.minRadius || radius > compactLimits.maxRadius) {
      problems.push({
        path: ["compact", key],
        message: `The radius of compact axis ${key} must be a number from ${compactLimits.minRadius} to ${compactLimits.maxRadius} (units of sqrt(alpha')), got ${String(radius)}`,
      });
    }
  }
  configuration.stacks.forEach((stack, index) => {
    const neumann = new Set(stack.worldvolume);
    for (const [key, theta] of Object.entries(stack.wilson ?? {})) {
      const path = ["stacks", index, "wilson", key];
      const axis = Number(key);
      if (!(key in compact)) {
        problems.push({ path, message: `Stack "${stack.id}" has a Wilson line on axis ${key}, which is not compact; make the axis compact or remove the entry` });
      } else if (!neumann.has(axis)) {
        problems.push({
          path,
          message: `Stack "${stack.id}" is Dirichlet along axis ${key}, so it has a position there, not a Wilson line; remove the entry or make the axis Neumann`,
        });
      }
      if (typeof theta !== "number" || !Number.isFinite(theta) || theta < 0 || theta >= twoPi) {
        problems.push({ path, message: `The Wilson line of stack "${stack.id}" on axis ${key} must be an angle in [0, 2 pi) radians, got ${String(theta)}` });
      }
    }
  });
  return problems;
}

/**
 * Notes for a pair on compact axes: how its Wilson lines and circles shift the lightest states,
 * and whether a tachyonic pair can get beyond its critical separation at all.
 *
 * @param pair - `describeCompactPair` of the pair.
 * @param self - True for a stack with itself.
 * @param criticalSeparation - y_c of the pair, or null.
 * @returns Sentences, empty without compact axes.
 * @example
 * compactNotes(pair, false, null)[0] // => "On the compact axis 9 (R = 2.5, momentum n) the tower adds ..."
 */
export function compactNotes(pair: CompactPair, self: boolean, criticalSeparation: number | null): string[] {
  if (pair.terms.length === 0) return [];
  const described = pair.terms.map((term) => `${term.axis} (R = ${formatDecimal(term.radius)}, ${term.type === "NN" ? "momentum n" : "winding w"})`);
  const notes = [
    `On the compact ${described.length === 1 ? "axis" : "axes"} ${described.join(", ")} the tower adds ` +
      "((n + (theta_b - theta_a) / 2 pi) / R)^2 per NN axis and ((Delta x + 2 pi R w) / 2 pi)^2 per DD axis to alpha' M^2; " +
      "the level rows hold the lightest of these (the nearest image of the other stack).",
  ];
  if (!self && !pair.aligned) {
    notes.push(
      `The Wilson lines differ, so the lightest strings gain ${formatDecimal(pair.momentumShift)} in alpha' M^2 ` +
        "and the gauge group is not enhanced (the T-dual stacks sit apart on the dual circle).",
    );
  }
  // Along circles the nearest image is never further than pi R: with every DD axis compact the
  // stacks cannot get beyond sqrt(sum (pi R)^2).
  const circles = pair.terms.filter((term) => term.type === "DD");
  const separating = pair.classification.dd;
  if (criticalSeparation !== null && separating > 0 && circles.length === separating) {
    const farthest = Math.sqrt(circles.reduce((sum, term) => sum + (Math.PI * term.radius) ** 2, 0));
    if (farthest < criticalSeparation) {
      notes.push(
        `The farthest the nearest images can be on these circles is ${formatDecimal(farthest)}, below y_c = ${formatDecimal(criticalSeparation)}: ` +
          "the pair is tachyonic wherever the stacks sit.",
      );
    }
  }
  return notes;
}

/**
 * alpha' M^2 = N + a + sum scale^2 m^2 exactly, as text, or null when a term with a non-zero
 * number has an offset or no exact scale. Whole-number arithmetic in doubles while it stays below
 * 2^53 (radii with few decimals keep it there), exact BigInt rationals beyond: each row would
 * otherwise pay several BigInt normalisations.
 */
function exactMassSquared(
  level: Rational,
  terms: readonly CompactAxisTerm[],
  squares: readonly (Rational | null)[],
  numbers: readonly number[],
): { text: string; negative: boolean } | null {
  let num = Number(level.num);
  let den = Number(level.den);
  let big: Rational | null = Number.isSafeInteger(num) && Number.isSafeInteger(den) ? null : level;
  for (let index = 0; index < terms.length; index += 1) {
    const m = numbers[index] ?? 0;
    const term = terms[index] as CompactAxisTerm;
    if (m === 0 && term.offset === 0) continue;
    const square = squares[index];
    if (term.offset !== 0 || !square) return null;
    if (big === null) {
      const p = Number(square.num) * m * m;
      const q = Number(square.den);
      const nextNum = num * q + p * den;
      const nextDen = den * q;
      if (Number.isSafeInteger(p) && Number.isSafeInteger(nextNum) && Number.isSafeInteger(nextDen)) {
        const divisor = wholeGcd(Math.abs(nextNum), nextDen);
        num = nextNum / divisor;
        den = nextDen / divisor;
        continue;
      }
      big = rational(num, den);
    }
    big = addRational(big, multiplyRational(square, rational(BigInt(m) * BigInt(m))));
  }
  if (big !== null) return { text: formatRational(big), negative: isNegativeRational(big) };
  return { text: den === 1 ? String(num) : `${num}/${den}`, negative: num < 0 };
}

function wholeGcd(a: number, b: number): number {
  let x = a;
  let y = b;
  while (y !== 0) [x, y] = [y, x % y];
  return x === 0 ? 1 : x;
}

/**
 * A difference of two readings on a circle within 1e-12 of a whole turn is that whole turn: stacks
 * placed a turn apart, or on a circle and its dual, are then exactly coincident.
 */
function snapToWhole(turns: number): number {
  const whole = Math.round(turns) || 0;
  return Math.abs(turns - whole) < 1e-12 ? whole : turns;
}

/** Lightest first; equal contributions in the order of their numbers, axis by axis. */
function compareCombinations(x: Combination, y: Combination): number {
  if (x.value !== y.value) return x.value - y.value;
  for (let index = 0; index < x.numbers.length; index += 1) {
    const difference = (x.numbers[index] ?? 0) - (y.numbers[index] ?? 0);
    if (difference !== 0) return difference;
  }
  return 0;
}

/** Tie order of tower candidates of equal mass: sector kind, then the numbers axis by axis, then the level. */
function compareCandidates(x: Candidate, y: Candidate): number {
  if (x.value !== y.value) return x.value - y.value;
  if (x.kindIndex !== y.kindIndex) return x.kindIndex - y.kindIndex;
  for (let index = 0; index < x.combination.numbers.length; index += 1) {
    const difference = (x.combination.numbers[index] ?? 0) - (y.combination.numbers[index] ?? 0);
    if (difference !== 0) return difference;
  }
  return x.level.exactValue - y.level.exactValue;
}

/** Values (scale (m + offset))^2 <= budget of one axis, lightest first, at most `keep`. */
function axisValues(term: CompactAxisTerm, budget: number, keep: number): { number: number; value: number }[] {
  const values: { number: number; value: number }[] = [];
  const at = (m: number): number => (term.scale * (m + term.offset)) ** 2;
  // `|| 0` keeps -0 out of the quantum numbers.
  const centre = Math.round(-term.offset) || 0;
  let down = centre - 1;
  let up = centre;
  // Walk out from the centre on both sides: each side rises, so picking the smaller keeps the order.
  while (values.length < keep) {
    const upValue = at(up);
    const downValue = at(down);
    const takeUp = upValue <= downValue;
    const value = takeUp ? upValue : downValue;
    if (value > budget) break;
    values.push({ number: takeUp ? up : down, value });
    if (takeUp) up += 1;
    else down -= 1;
  }
  return values;
}

/** scale^2 (1/R^2 on an NN axis, R^2 on a DD axis) exactly, when R is written with at most six decimals. */
function exactScaleSquare(term: CompactAxisTerm): Rational | null {
  const radius = shortDecimal(term.radius);
  if (!radius) return null;
  const square = multiplyRational(radius, radius);
  return term.type === "DD" ? square : rational(square.den, square.num);
}

function shortDecimal(value: number): Rational | null {
  const match = /^(\d+)(?:\.(\d{1,6}))?$/.exec(String(value));
  if (!match) return null;
  const decimals = match[2] ?? "";
  return rational(BigInt(`${match[1]}${decimals}`), 10n ** BigInt(decimals.length));
}
