/**
 * The open-string spectrum of a configuration of parallel brane stacks (physics.md, all sections).
 *
 * For every unordered pair of stacks, including each stack with itself, the engine classifies the
 * axes, takes the zero-point energy a of each sector, counts states level by level (GSO-projected
 * in type II), adds the stretching energy and the Chan-Paton multiplicity, and reads off massless
 * content, tachyons and critical separations. It then combines the sectors into the gauge group,
 * the lightest states and the supercharges preserved by the whole configuration.
 *
 * Mass formula: alpha' M^2 = (y / 2 pi)^2 + N + a with alpha' = 1 (physics.md, "Mass formula").
 * Continuous momentum along the common Neumann directions is not included.
 *
 * Determinism: stacks are ordered by id (code-unit order), so neither the order of the stacks in
 * the document nor anything else outside the configuration changes the result.
 */

import {
  ConfigurationError,
  checkConfiguration,
  compareStackIds,
  configurationWarnings,
  describeStack,
  dimensionOf,
  type ConfigurationProblem,
} from "./check";
import { classifyPair, type PairClassification } from "./classify";
import {
  compactNotes,
  computeTower,
  describeCompactPair,
  hasCompactAxes,
  towerRowLimit,
  withCompactConventions,
  type TowerLevel,
} from "./compact";
import { CONVENTIONS_TEXT, ENGINE_VERSION } from "./constants";
import { oscillatorDegeneracies, projectedDegeneracies, type OrientedCounts } from "./degeneracy";
import { expandPair } from "./expansion";
import { formatDecimal, listInWords } from "./format";
import {
  addRational,
  compareRational,
  formatRational,
  isNegativeRational,
  isZeroRational,
  rational,
  rationalToNumber,
  subtractRational,
  type Rational,
} from "./rational";
import { describeWorldvolumes, type PairSummary } from "./worldvolume";
import { applyOrientifold } from "./orientifold";
import { countSupercharges, pairPreservesSupersymmetry } from "./supersymmetry";
import type {
  ComputeSpectrumOptions,
  Configuration,
  LevelRow,
  LightestState,
  MasslessContent,
  Sector,
  SectorKind,
  SectorMultiplet,
  SpectrumResult,
  Stack,
  ZeroPoint,
} from "./types";
import { zeroPointEnergy } from "./zero-point";

/** Default length of `SpectrumResult.lightest`. */
const defaultLightestCount = 10;

/**
 * Computes the full spectrum result of a configuration.
 *
 * @param configuration - A configuration document (format 1 or 2); it is validated first and not mutated.
 * @param options - `lightestCount`: how many entries `lightest` holds (default 10, a whole number >= 0).
 * @returns The result of product.md ("The spectrum result"): one sector per unordered pair of
 *   stacks (each stack with itself included), in id order; exact alpha' M^2 at zero separation
 *   and 12-significant-digit decimals otherwise; degeneracies as decimal strings.
 * @throws ConfigurationError (with every problem and its JSON path) when `checkConfiguration`
 *   finds problems; RangeError for an invalid `lightestCount`.
 * @example
 * const result = computeSpectrum({ format: 1, title: "one D25", theory: "bosonic", stringScaleGeV: null,
 *   levels: 1, stacks: [{ id: "a", label: "", count: 1, anti: false,
 *   worldvolume: Array.from({ length: 25 }, (_, i) => i + 1), position: {} }] });
 * result.sectors[0].levels.map((row) => [row.massSquared, row.states]) // => [["-1", "1"], ["0", "24"]]
 */
export function computeSpectrum(configuration: Configuration, options: ComputeSpectrumOptions = {}): SpectrumResult {
  const attempt = tryComputeSpectrum(configuration, options);
  if (attempt.result === null) throw new ConfigurationError(attempt.problems);
  return attempt.result;
}

/** What {@link tryComputeSpectrum} returns: either the problems found, or the result. */
export type SpectrumAttempt =
  | { problems: ConfigurationProblem[]; result: null }
  | { problems: []; result: SpectrumResult };

/**
 * Checks a configuration once and computes its spectrum when it has no problems: the same checks
 * and result as `computeSpectrum`, for callers that show the problems instead of catching them
 * (the designer's live preview validates each keystroke with this single pass).
 *
 * @param configuration - A configuration document (format 1 or 2); it is validated first and not mutated.
 * @param options - As for `computeSpectrum`.
 * @returns `{ problems, result: null }` with every problem `checkConfiguration` finds (at least
 *   one), or `{ problems: [], result }` with the result `computeSpectrum` would return.
 * @throws RangeError for an invalid `lightestCount` (problems of the configuration are returned, not thrown).
 * @example
 * tryComputeSpectrum({ format: 1, title: "t", theory: "IIA", stringScaleGeV: null, levels: 1,
 *   stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [1], position: {} }] }).problems[0]?.path
 * // => ["stacks", 0, "worldvolume"]
 */
export function tryComputeSpectrum(configuration: Configuration, options: ComputeSpectrumOptions = {}): SpectrumAttempt {
  const problems = checkConfiguration(configuration);
  if (problems.length > 0) return { problems, result: null };
  return { problems: [], result: computeCheckedSpectrum(configuration, options) };
}

/** The spectrum of a configuration that `checkConfiguration` has just passed. */
function computeCheckedSpectrum(configuration: Configuration, options: ComputeSpectrumOptions): SpectrumResult {
  const lightestCount = options.lightestCount ?? defaultLightestCount;
  if (!Number.isInteger(lightestCount) || lightestCount < 0) {
    throw new RangeError(`lightestCount must be a whole number of at least 0, got ${String(lightestCount)}`);
  }

  const context = createSectorContext(configuration);
  const stacks = [...configuration.stacks].sort(compareStackIds);
  const built: BuiltSector[] = [];
  // built index of the pair (i, j), i <= j in id order.
  const pairIndex = (i: number, j: number): number => i * stacks.length - (i * (i - 1)) / 2 + (j - i);
  for (let i = 0; i < stacks.length; i += 1) {
    for (let j = i; j < stacks.length; j += 1) {
      built.push(buildSector(stacks[i] as Stack, stacks[j] as Stack, configuration, context));
    }
  }

  const superstring = configuration.theory !== "bosonic";
  const plane = configuration.orientifolds?.[0];
  // A plane preserves the supersymmetry of a brane along it (common practice, from memory).
  const preserving: Stack[] = plane ? [...stacks, { id: plane.id, label: "", count: 1, anti: false, worldvolume: plane.worldvolume, position: plane.position }] : stacks;
  const supercharges = superstring ? countSupercharges(preserving) : null;
  const warnings = configurationWarnings(configuration);
  if (stacks.length === 0) warnings.push("The configuration has no stacks yet, so there are no open strings.");
  let { worldvolumes, gaugeGroup } = describeWorldvolumes({
    stacks,
    theory: configuration.theory,
    dimension: context.dimension,
    pair: (i, j) => built[pairIndex(Math.min(i, j), Math.max(i, j))] as BuiltSector,
  });
  const orientifold = plane
    ? applyOrientifold({
        stacks,
        plane,
        theory: configuration.theory,
        dimension: context.dimension,
        built,
        pairIndex,
        build: (a, b) => buildSector(a, b, configuration, context),
        worldvolumes,
        gaugeGroup,
      })
    : null;
  if (orientifold) {
    built.push(...orientifold.extra);
    warnings.push(...orientifold.warnings);
    ({ worldvolumes, gaugeGroup } = orientifold);
  }

  return {
    engineVersion: ENGINE_VERSION,
    theory: configuration.theory,
    dimension: context.dimension,
    warnings,
    gaugeGroup,
    worldvolumes,
    supercharges,
    bps: supercharges !== null && stacks.length > 0 && supercharges > 0,
    sectors: built.map((entry) => entry.sector),
    lightest: collectLightest(built, lightestCount),
    conventions: hasCompactAxes(configuration) ? withCompactConventions(CONVENTIONS_TEXT) : CONVENTIONS_TEXT,
    ...(orientifold ? { orientifold: orientifold.summary } : {}),
  };
}

/**
 * One level of a (sector kind, nu, orientation relation) series, with everything that does not
 * depend on the particular pair: shared by every sector with the same key.
 */
export interface LevelTemplate {
  kind: SectorKind;
  /** Twice the oscillator level N. */
  twiceLevel: number;
  /** N as an exact rational string. */
  level: string;
  /** N + a, exact. */
  exact: Rational;
  /** N + a as text ("-1/2"). */
  exactText: string;
  /** N + a as a number. */
  exactValue: number;
  /** N + a = 0: massless at zero separation. */
  massless: boolean;
  /** States of the string from stack a to stack b, per Chan-Paton label. */
  ab: bigint;
  /** States of the string from stack b to stack a, per Chan-Paton label. */
  ba: bigint;
  /** `ab` as text, shared by every row built from this template. */
  abText: string;
}

/** The counted levels of one sector kind for one nu and orientation relation. */
export interface SectorSeries {
  kind: SectorKind;
  /** Zero-point energy a. */
  zeroPoint: Rational;
  /**
   * Levels with surviving states, in increasing order: every level with N + a <= the mass cap
   * (`Configuration.levels`), and at least up to N = 1 so that the lowest state is known.
   */
  levels: LevelTemplate[];
  /** How many of `levels` lie within the mass cap (N + a <= levels): the rows a sector lists. */
  listed: number;
  /** The level with the lowest N + a, or null when nothing survives. */
  lowest: LevelTemplate | null;
}

/**
 * What `computeSpectrum` looks up per sector: the counted series of each (sector kind, nu,
 * orientation relation) and the supersymmetry of each pair shape, each worked out once however
 * many sectors share it (see `seriesTable`).
 */
export interface SectorContext {
  /** Spacetime dimension D. */
  dimension: number;
  /** The counted series for (kind, nu, same orientation); the bosonic kind ignores orientation. */
  series(kind: SectorKind, nu: number, sameOrientation: boolean): SectorSeries;
  /** Supersymmetry flag of a pair of distinct stacks, memoised by worldvolumes and orientations. */
  pairSupersymmetric(a: Stack, b: Stack): boolean;
  /** Most tower rows per sector (`towerRowLimit` of the configuration's sector count). */
  towerLimit: number;
}

/**
 * Builds the per-call memo used by `computeSector`.
 *
 * @param configuration - A valid configuration (see `checkConfiguration`).
 * @returns A fresh context; each series is counted to the mass cap, N + a <= levels, and at least to
 *   N = 1, so that the lightest state of every sector (always at N <= 1) is known even when the cap
 *   lists fewer rows.
 * @throws RangeError from the degeneracy and zero-point modules when asked for an nu they do not cover.
 * @example
 * createSectorContext(configuration).series("NS", 0, true).levels[0]?.ab // => 8n
 */
export function createSectorContext(configuration: Configuration): SectorContext {
  const dimension = dimensionOf(configuration);
  const cap = rational(configuration.levels);
  const stackCount = configuration.stacks.length;
  return {
    dimension,
    towerLimit: towerRowLimit((stackCount * (stackCount + 1)) / 2),
    series(kind, nu, sameOrientation) {
      // Everything the series depends on: D, the mass cap, the kind, nu and the orientation relation.
      const key = `${dimension}|${configuration.levels}|${kind}|${nu}|${kind === "bosonic" || sameOrientation}`;
      let series = seriesTable.get(key);
      if (!series) {
        const zeroPoint = zeroPointEnergy(kind, { dimension, nu });
        // Highest N with N + a <= cap, on the half-integer grid: floor(2 (cap - a)) / 2.
        const headroom = subtractRational(cap, zeroPoint);
        const twiceCut = floorDivide(2n * headroom.num, headroom.den);
        const countedLevel = Math.max(Number(twiceCut), 2) / 2;
        const counts =
          kind === "bosonic"
            ? bosonicCounts(dimension, nu, countedLevel)
            : projectedDegeneracies(kind, { nu, sameOrientation, maxLevel: countedLevel });
        series = buildSeries(kind, zeroPoint, counts, cap);
        remember(seriesTable, key, series);
      }
      return series;
    },
    pairSupersymmetric(a, b) {
      const key = `${a.worldvolume.join(",")}|${a.anti}|${b.worldvolume.join(",")}|${b.anti}`;
      let preserved = supersymmetryTable.get(key);
      if (preserved === undefined) {
        preserved = pairPreservesSupersymmetry(a, b);
        remember(supersymmetryTable, key, preserved);
      }
      return preserved;
    },
  };
}

/**
 * Tables of pure functions of a few small inputs, kept across calls: the counted series (exact
 * degeneracies and zero points) of each (D, mass cap, kind, nu, orientation relation), and the
 * supersymmetry of each pair of worldvolumes and orientations. Neither depends on positions, counts,
 * labels or anything else of a configuration, so a table entry is what a fresh count would give;
 * the entries are never mutated (rows are built from them). Each table is emptied when it reaches
 * `tableLimit` entries, which bounds its memory.
 */
const seriesTable = new Map<string, SectorSeries>();
const supersymmetryTable = new Map<string, boolean>();
const tableLimit = 2048;

function remember<T>(table: Map<string, T>, key: string, value: T): void {
  if (table.size >= tableLimit) table.clear();
  table.set(key, value);
}

/**
 * Computes the sector of one ordered pair of stacks (a at sigma = 0, b at sigma = pi).
 *
 * `computeSpectrum` calls it with the pair in id order; calling it with (b, a) gives the same
 * physics (counts, masses, zero points, tachyons) with ND and DN axes swapped and the pair reversed.
 *
 * @param a - Stack at sigma = 0.
 * @param b - Stack at sigma = pi; the same stack (same id) as `a` for the stack with itself.
 * @param configuration - The (valid) configuration the stacks belong to.
 * @param context - The per-call memo from `createSectorContext(configuration)`.
 * @returns The sector: classification, zero points, level rows with N + a <= `configuration.levels`
 *   (the mass cap at zero separation), massless content, the named multiplet of separated identical
 *   stacks, tachyon and critical separation, supersymmetry flag and notes.
 * @example
 * const context = createSectorContext(configuration);
 * computeSector(d3, d3, configuration, context).massless[0].description
 * // => "vector with 2 polarisations (NN axes 1-3 less one light-cone direction) and 6 scalars (positions on DD axes 4-9)"
 */
export function computeSector(a: Stack, b: Stack, configuration: Configuration, context: SectorContext): Sector {
  return buildSector(a, b, configuration, context).sector;
}

/** A sector with the numeric alpha' M^2 of each of its level rows (for the lightest states). */
interface BuiltSector extends PairSummary {
  sector: Sector;
  /** alpha' M^2 of `sector.levels[i]` as a number. */
  values: number[];
}

function buildSector(a: Stack, b: Stack, configuration: Configuration, context: SectorContext): BuiltSector {
  const { dimension } = context;
  const theory = configuration.theory;
  // Ids are unique within a configuration, so equal ids mean the stack with itself.
  const self = a.id === b.id;
  // On compact axes: the nearest image of b, and the lightest momentum its Wilson lines allow.
  const compactPair = describeCompactPair(classifyPair(a, b, dimension), a, b, configuration);
  const { classification } = compactPair;
  const { nu } = classification;
  // Exact zero only when every DD difference is exactly zero (a tiny difference can square to 0).
  const coincident = compactPair.aligned && classification.separationVector.every((component) => component.delta === 0);
  const stretch = coincident ? 0 : classification.separationSquared / (4 * Math.PI * Math.PI) + compactPair.momentumShift;
  const sameOrientation = theory === "bosonic" || a.anti === b.anti;
  const kinds: SectorKind[] = theory === "bosonic" ? ["bosonic"] : ["NS", "R"];
  // No axis left for the light-cone gauge (a bosonic pair with every spatial axis ND): counted covariantly.
  const covariant = nu === dimension - 1;

  const base = {
    pair: [a.id, b.id] as [string, string],
    nn: classification.nn,
    dd: classification.dd,
    nu,
    separation: classification.separation,
    chanPaton: self ? a.count * a.count : 2 * a.count * b.count,
    supersymmetric: theory !== "bosonic" && (self || context.pairSupersymmetric(a, b)),
    axes: expandPair(classification, theory),
  };

  const zeroPoint: ZeroPoint = {};
  const levels: LevelRow[] = [];
  const values: number[] = [];
  const massless: MasslessContent[] = [];
  const notes: string[] = [];
  const rowContext: RowContext = {
    self,
    a,
    b,
    stretch,
    // Chan-Paton multiplier of the per-orientation count: N_a^2 (one kind of string) or N_a N_b.
    factor: self ? a.count * a.count : a.count * b.count,
    stringScaleGeV: configuration.stringScaleGeV,
  };
  let lowest: LevelTemplate | null = null;
  const towerLevels: TowerLevel[][] = [];
  // Rows with N + a = 0: massless at coincidence, the W-boson multiplet when the stacks are apart.
  const zeroRows: LevelRow[] = [];
  for (const kind of kinds) {
    const series = context.series(kind, nu, sameOrientation);
    zeroPoint[kind] = formatRational(series.zeroPoint);
    if (compactPair.terms.length > 0) towerLevels.push(series.levels.map((template) => towerLevel(template, rowContext)));
    if (series.lowest && (lowest === null || compareRational(series.lowest.exact, lowest.exact) < 0)) {
      lowest = series.lowest;
    }
    for (let index = 0; index < series.listed; index += 1) {
      const template = series.levels[index] as LevelTemplate;
      const row = buildRow(template, rowContext);
      if (template.massless) {
        if (coincident) massless.push(describeMassless(row, template, classification, { self, sameOrientation, a, b }));
        zeroRows.push(row);
      }
      levels.push(row);
      values.push(stretch + template.exactValue);
    }
  }

  const tachyonic =
    lowest !== null && (coincident ? isNegativeRational(lowest.exact) : stretch + lowest.exactValue < 0);
  // y_c only means something for two stacks that can be pulled apart along a common DD axis.
  const criticalSeparation =
    !self && classification.dd > 0 && lowest !== null && isNegativeRational(lowest.exact)
      ? 2 * Math.PI * Math.sqrt(-lowest.exactValue)
      : null;
  const multiplet =
    !self && nu === 0 && !coincident && sameOrientation ? describeWMultiplet(zeroRows, classification, theory, dimension) : null;

  notes.push(
    ...sectorNotes({ self, a, b, classification, coincident, sameOrientation, theory, criticalSeparation, multiplet }),
    ...compactNotes(compactPair, self, criticalSeparation),
  );
  if (covariant) {
    notes.unshift(
      `Every spatial axis is ND for this pair, so no axis is left for the light-cone gauge: its states are counted covariantly ` +
        `(X^0 and the b, c ghosts leave prod (1 - q^n)^(+1) (1 - q^(n-1/2))^(-${nu})), with a = -(D - 2)/24 + nu/16 = ${zeroPoint.bosonic ?? "?"}.`,
    );
  }
  const sector: Sector = { ...base, zeroPoint, tachyonic, criticalSeparation, levels, massless, multiplet, notes };
  if (hasCompactAxes(configuration)) {
    const tower = computeTower({
      terms: compactPair.terms,
      flatStretch: compactPair.flatStretch,
      levels: towerLevels,
      cap: configuration.levels,
      limit: context.towerLimit,
      stringScaleGeV: configuration.stringScaleGeV,
    });
    sector.compactAxes = compactPair.terms;
    sector.tower = tower.rows;
    sector.towerTruncated = tower.truncated;
  }
  return { sector, values, lowest: lowest?.exact ?? null, stretch, coincident };
}

interface RowContext {
  self: boolean;
  a: Stack;
  b: Stack;
  stretch: number;
  factor: number;
  stringScaleGeV: number | null;
}

/** A level as the tower reads it: its counts with the Chan-Paton factor of the pair. */
function towerLevel(template: LevelTemplate, context: RowContext): TowerLevel {
  const { ab, ba } = template;
  return {
    kind: template.kind,
    level: template.level,
    exact: template.exact,
    exactValue: template.exactValue,
    states: context.self || ab === ba ? template.abText : null,
    withChanPaton: multiplyCount(context.factor, context.self ? ab : ab + ba),
  };
}

function buildRow(template: LevelTemplate, context: RowContext): LevelRow {
  const { self, a, b, stretch, factor, stringScaleGeV } = context;
  const { ab, ba } = template;
  const value = stretch + template.exactValue;
  const negative = stretch === 0 ? isNegativeRational(template.exact) : value < 0;
  const mass = negative ? null : Math.sqrt(value);
  const row: LevelRow = {
    sector: template.kind,
    level: template.level,
    massSquared: stretch === 0 ? template.exactText : formatDecimal(value),
    mass,
    // A stack with itself has one kind of string; its N^2 labels already hold both orientations.
    states: self || ab === ba ? template.abText : null,
    withChanPaton: multiplyCount(factor, self ? ab : ab + ba),
  };
  if (stringScaleGeV !== null) row.massGeV = mass === null ? null : mass * stringScaleGeV;
  if (!self && ab !== ba) {
    const [more, fewer] = ab > ba ? ([[a, b], [b, a]] as const) : ([[b, a], [a, b]] as const);
    const unpaired =
      template.twiceLevel === 0 && template.kind === "R"
        ? " The unpaired R ground state sits in the first of these orientations: which one is a sign convention of the GSO projection, and exactly one orientation holds it."
        : "";
    row.note =
      `Orientations differ: ${plural(ab > ba ? ab : ba, "state")} for strings from "${more[0].id}" to "${more[1].id}", ` +
      `${(ab > ba ? ba : ab).toString()} from "${fewer[0].id}" to "${fewer[1].id}".${unpaired}`;
  }
  return row;
}

/** factor * count as a decimal string, in doubles while exact and in BigInt beyond 2^53. */
function multiplyCount(factor: number, count: bigint): string {
  const product = factor * Number(count);
  return Number.isSafeInteger(product) ? String(product) : (BigInt(factor) * count).toString();
}

function buildSeries(kind: SectorKind, zeroPoint: Rational, counts: readonly OrientedCounts[], cap: Rational): SectorSeries {
  let lowest: LevelTemplate | null = null;
  let listed = 0;
  const levels = counts.map((count): LevelTemplate => {
    const level = rational(count.twiceLevel, 2);
    const exact = addRational(level, zeroPoint);
    const template: LevelTemplate = {
      kind,
      twiceLevel: count.twiceLevel,
      level: formatRational(level),
      exact,
      exactText: formatRational(exact),
      exactValue: rationalToNumber(exact),
      massless: isZeroRational(exact),
      ab: count.ab,
      ba: count.ba,
      abText: count.ab.toString(),
    };
    if (lowest === null || compareRational(exact, lowest.exact) < 0) lowest = template;
    // Levels rise, and so does N + a: the listed rows are a prefix.
    if (compareRational(exact, cap) <= 0) listed += 1;
    return template;
  });
  return { kind, zeroPoint, levels, listed, lowest };
}

/** floor(num / den) for den > 0. */
function floorDivide(num: bigint, den: bigint): bigint {
  const quotient = num / den;
  return num % den !== 0n && num < 0n ? quotient - 1n : quotient;
}

interface MasslessStacks {
  self: boolean;
  sameOrientation: boolean;
  a: Stack;
  b: Stack;
}

function describeMassless(
  row: LevelRow,
  counts: Pick<LevelTemplate, "ab" | "ba">,
  classification: PairClassification,
  stacks: MasslessStacks,
): MasslessContent {
  const { self, sameOrientation, a, b } = stacks;
  const states = row.states ?? (counts.ab + counts.ba).toString();
  const content = (description: string): MasslessContent => ({
    description,
    sector: row.sector,
    states,
    withChanPaton: row.withChanPaton,
  });
  const matter = self ? "" : "bifundamental ";
  const traceCount = `light-cone trace count: ${plural(states, "state")}`;

  if (row.sector === "R") {
    // The 10d gaugino reduced to p + 1 dimensions keeps its 16 real components (common practice).
    if (self) return content(`16 real fermions (superpartners of the gauge field and scalars, adjoint of U(${a.count})); ${traceCount}`);
    if (counts.ab !== counts.ba) {
      const holder = counts.ab > counts.ba ? `"${a.id}" to "${b.id}"` : `"${b.id}" to "${a.id}"`;
      // nu = 8 leaves nn <= 1: a single fermionic state on a line (0+1) or a chiral fermion on a plane (1+1).
      const kind =
        classification.nn === 0
          ? plural(states, "fermionic mode") + " in 0+1 dimensions"
          : classification.nn === 1
            ? plural(states, "chiral fermion state") + " in 1+1 dimensions"
            : plural(states, "fermion state");
      return content(`${kind} (strings from ${holder} only)`);
    }
    if (classification.nu === 0 && !sameOrientation) {
      return content(`${plural(states, `${matter}fermion state`)} per orientation, of the opposite chirality to the brane-brane case`);
    }
    return content(`${plural(states, `${matter}fermion state`)} per orientation`);
  }

  // Bosonic alpha_{-1} or NS psi_{-1/2}: one state per transverse axis, as in physics.md.
  const firstExcited = (row.sector === "bosonic" && row.level === "1") || (row.sector === "NS" && row.level === "1/2");
  if (classification.nu === 0 && firstExcited) {
    const nnAxes = axesOfType(classification, "NN");
    const ddAxes = axesOfType(classification, "DD");
    const ddList = `DD ${ddAxes.length === 1 ? "axis" : "axes"} ${formatAxisList(ddAxes)}`;
    const scalars = `${plural(ddAxes.length, `${matter}scalar`)} (positions on ${ddList})`;
    const wBoson = self ? "" : "; W-boson-like: massless because the stacks coincide";
    if (nnAxes.length === 0) {
      // 0+1 dimensions: every position is a scalar and A_0 has no propagating polarisation (common practice).
      return content(
        `${scalars} and a non-dynamical ${matter}A_0 (no propagating polarisation; it imposes Gauss's law); ${traceCount}${wBoson}`,
      );
    }
    if (nnAxes.length === 1) {
      // 1+1 dimensions: F_01 is a constant electric field, bound fundamental strings (common practice).
      return content(
        `${matter}gauge field with no propagating degrees of freedom in 1+1 dimensions (it still carries electric flux)` +
          `${ddAxes.length > 0 ? ` and ${scalars}` : ""}; ${traceCount}${wBoson}`,
      );
    }
    const vector = `${matter}vector with ${plural(nnAxes.length - 1, "polarisation")} (NN axes ${formatAxisList(nnAxes)} less one light-cone direction)`;
    return content(ddAxes.length > 0 ? `${vector} and ${scalars}${wBoson}` : `${vector}${wBoson}`);
  }
  if (self) return content(`${plural(states, "scalar state")} (adjoint of U(${a.count}))`);
  const hyper =
    classification.nu === 4 && row.sector === "NS" ? "; with the R fermions they form a hypermultiplet of the 8 supercharges of the pair" : "";
  return content(`${plural(states, `${matter}scalar state`)} per orientation, localised on the common worldvolume${hyper}`);
}

/**
 * The W-boson multiplet of two separated stacks with the same worldvolume and orientation: the
 * states with N + a = 0, of mass M = y / (2 pi alpha'). The vector eats the scalar along the
 * separation, so in p + 1 dimensions it has p polarisations (the little group SO(p) of a massive
 * particle) and D - 2 - p scalars remain (common practice). Type II: with 8 + 8 states it is the
 * short (BPS) massive vector multiplet of 16 supercharges, 2^(16/4) = 16 states where a long one has
 * 2^(16/2) = 256 (common practice, from memory). Null when the rows do not hold exactly that content
 * (a non-critical bosonic dimension, where nothing has N + a = 0 at the vector level).
 */
function describeWMultiplet(
  rows: readonly LevelRow[],
  classification: PairClassification,
  theory: Configuration["theory"],
  dimension: number,
): SectorMultiplet | null {
  const p = classification.nn;
  const transverse = dimension - 2;
  const bosons = rows.find((row) => (row.sector === "NS" && row.level === "1/2") || (row.sector === "bosonic" && row.level === "1"));
  if (!bosons || bosons.states !== String(transverse) || bosons.mass === null) return null;
  const scalars = transverse - p;
  const parts: string[] = [];
  if (p > 0) parts.push(`one massive vector (${plural(p, "polarisation")})`);
  if (scalars > 0) parts.push(plural(scalars, "scalar"));
  const spinless = p === 0 ? " (no spin in 0+1 dimensions)" : "";
  if (theory === "bosonic") {
    return {
      name: "massive W bosons",
      dimension: p + 1,
      content: `${listInWords(parts)}${spinless}`,
      states: bosons.states,
      massSquared: bosons.massSquared,
      mass: bosons.mass,
    };
  }
  const fermions = rows.find((row) => row.sector === "R" && row.level === "0");
  if (!fermions || fermions.states !== bosons.states) return null;
  const total = 2 * transverse;
  return {
    name: "massive W-boson vector multiplet (short, 16 supercharges)",
    dimension: p + 1,
    content: `${listInWords([...parts, plural(fermions.states, "fermion state")])}${spinless}`,
    states: String(total),
    massSquared: bosons.massSquared,
    mass: bosons.mass,
  };
}

interface NoteInput {
  self: boolean;
  a: Stack;
  b: Stack;
  classification: PairClassification;
  coincident: boolean;
  sameOrientation: boolean;
  theory: Configuration["theory"];
  criticalSeparation: number | null;
  multiplet: SectorMultiplet | null;
}

function sectorNotes(input: NoteInput): string[] {
  const { self, a, b, classification, coincident, sameOrientation, theory, criticalSeparation, multiplet } = input;
  if (self) return [];
  const notes: string[] = [];
  const { nu } = classification;
  // A force needs a direction to pull along: a Dirichlet axis common to both stacks.
  const separable = classification.dd > 0;
  if (nu === 0 && coincident && sameOrientation) {
    notes.push(`Coincident stacks: U(${a.count}) x U(${b.count}) is enhanced to U(${a.count + b.count}).`);
  }
  // Stacks apart only by their Wilson lines are described by `compactNotes`.
  if (nu === 0 && sameOrientation && classification.separationVector.some((component) => component.delta !== 0)) {
    notes.push(
      multiplet
        ? `Separated by y = ${formatDecimal(classification.separation)}: the lightest stretched strings form a ${multiplet.name} ` +
            `in ${multiplet.dimension} dimensions: ${multiplet.content}, ${multiplet.states} states in all, with M = y / (2 pi alpha').`
        : `Separated by y = ${formatDecimal(classification.separation)}: the stretched strings gain (y / 2 pi)^2 in alpha' M^2.`,
    );
  }
  if (theory !== "bosonic" && nu === 0 && !sameOrientation) {
    notes.push("Brane-antibrane pair: the GSO projection keeps the NS tachyon and removes the massless vector.");
  }
  if (theory !== "bosonic" && nu === 8) {
    notes.push(
      separable
        ? "nu = 8: NS and R agree level by level except for the single R ground state of one orientation. Without a fundamental " +
            "string stretched between the stacks they feel a constant force, whatever their separation; with one (such a string is " +
            "created when the stacks cross) the configuration is supersymmetric (string creation: Bachas, Green and Schwimmer 1997; " +
            "Danielsson, Ferretti and Klebanov 1997)."
        : "nu = 8: NS and R agree level by level except for the single R ground state of one orientation.",
    );
  }
  if (theory !== "bosonic" && nu === 4) {
    notes.push(separable ? "nu = 4: NS and R agree level by level; the pair feels no force." : "nu = 4: NS and R agree level by level.");
  }
  if (criticalSeparation !== null) {
    notes.push(
      `Tachyonic below the critical separation y_c = ${formatDecimal(criticalSeparation)} (units of sqrt(alpha')); beyond it the lightest state is massive.`,
    );
  }
  if (!separable && nu > 0) {
    notes.push(`No axis is Dirichlet for both ${describeStack(a)} and ${describeStack(b)}, so they cannot be pulled apart.`);
  }
  return notes;
}

function collectLightest(built: BuiltSector[], count: number): LightestState[] {
  const candidates: { value: number; sectorIndex: number; rowIndex: number }[] = [];
  built.forEach(({ sector, values }, sectorIndex) => {
    // Within one sector kind the rows rise in level, hence in mass: only the first `count` can qualify.
    let kind: SectorKind | null = null;
    let taken = 0;
    sector.levels.forEach((row, rowIndex) => {
      if (row.sector !== kind) {
        kind = row.sector;
        taken = 0;
      }
      if (taken >= count) return;
      taken += 1;
      candidates.push({ value: values[rowIndex] ?? 0, sectorIndex, rowIndex });
    });
  });
  // Rows of a sector are ordered by kind then level, so the row index breaks ties deterministically.
  candidates.sort((x, y) => x.value - y.value || x.sectorIndex - y.sectorIndex || x.rowIndex - y.rowIndex);
  return candidates.slice(0, count).map(({ sectorIndex, rowIndex }) => {
    const sector = (built[sectorIndex] as BuiltSector).sector;
    const row = sector.levels[rowIndex] as LevelRow;
    return {
      pair: sector.pair,
      sector: row.sector,
      level: row.level,
      massSquared: row.massSquared,
      mass: row.mass,
      states: row.states,
      withChanPaton: row.withChanPaton,
    };
  });
}

function bosonicCounts(dimension: number, nu: number, maxLevel: number): OrientedCounts[] {
  const series = oscillatorDegeneracies("bosonic", { dimension, nu, maxLevel });
  const rows: OrientedCounts[] = [];
  series.forEach((count, twiceLevel) => {
    if (count !== 0n) rows.push({ twiceLevel, ab: count, ba: count });
  });
  return rows;
}

function axesOfType(classification: PairClassification, type: "NN" | "DD"): number[] {
  return classification.axes.filter((axis) => axis.type === type).map((axis) => axis.axis);
}

/** "1-4, 7, 9" style list of axis numbers (runs of three or more are collapsed). */
function formatAxisList(axes: number[]): string {
  const parts: string[] = [];
  let start = 0;
  while (start < axes.length) {
    let end = start;
    while (end + 1 < axes.length && (axes[end + 1] as number) === (axes[end] as number) + 1) end += 1;
    parts.push(end - start >= 2 ? `${axes[start]}-${axes[end]}` : axes.slice(start, end + 1).join(", "));
    start = end + 1;
  }
  return parts.join(", ");
}

/** "1 state", "8 states". */
function plural(count: number | bigint | string, noun: string): string {
  return `${String(count)} ${noun}${String(count) === "1" ? "" : "s"}`;
}
