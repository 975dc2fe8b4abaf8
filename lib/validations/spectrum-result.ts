import { z } from "./zod";
import type {
  AxisExpansion,
  CompactAxisTerm,
  TowerState,
  LevelRow,
  LightestState,
  MasslessContent,
  OrientifoldSummary,
  Sector,
  SectorMultiplet,
  SpectrumResult,
  WorldvolumeTheory,
  ZeroPoint,
} from "@/lib/boundary/types";
import { expansionEndPositions, parseExactRational, parseResultNumber } from "@/lib/spectrum";

/**
 * Stored spectrum results (the `results.result` json column), read back for any engine
 * version. Every stored result carries the `engineVersion` that computed it. A result of an
 * older engine may lack fields added since; the schema accepts it and `upgradeStoredResult`
 * fills each missing field with the value it stands for, and says so in `warnings` where the
 * default hides something (physics the old engine did not record). Adding a result field means
 * adding it here too, optional with its upgrade default, unless every stored result has it.
 */

const exactMessage = "Expected an exact rational such as -1/2.";
const numberMessage = "Expected an exact rational or a decimal number.";
const countMessage = "Expected a count of states.";
const countPattern = /^\d+$/;
const exactText = z.string().refine(isExactText, exactMessage);
const countText = z.string().regex(countPattern, countMessage);
const sectorKind = z.enum(["bosonic", "NS", "R"]);
const moding = z.enum(["integer", "half-integer"]);

/** An axis as stored: the end positions from engine 1.3.0 on, the boson's LaTeX before. */
type StoredAxisExpansion = Omit<AxisExpansion, "positionA" | "positionB"> &
  Partial<Pick<AxisExpansion, "positionA" | "positionB">> & { latex?: string };

const axisSchema = z.object({
  axis: z.number().int(),
  type: z.enum(["NN", "DD", "ND", "DN"]),
  bosonModing: moding,
  fermionModing: z.object({ NS: moding, R: moding }).optional(),
  zeroModes: z.array(z.string()),
  positionA: z.number().nullable().optional(),
  positionB: z.number().nullable().optional(),
  // Engines before 1.3.0: X(tau, sigma) as LaTeX, read for its positions by the upgrade step.
  latex: z.string().optional(),
}) satisfies z.ZodType<StoredAxisExpansion>;

// The texts of the rows are checked by `checkRowTexts`, once per list: a zod check per field costs
// about a microsecond, and a large result holds a few hundred thousand such fields.
const levelRowSchema = z.object({
  sector: sectorKind,
  level: z.string(),
  massSquared: z.string(),
  mass: z.number().nullable(),
  massGeV: z.number().nullable().optional(),
  states: z.string().nullable(),
  withChanPaton: z.string(),
  note: z.string().optional(),
  projected: z.object({ symmetric: countText, antisymmetric: countText }).optional(),
}) satisfies z.ZodType<LevelRow>;

const compactAxisSchema = z.object({
  axis: z.number().int(),
  type: z.enum(["NN", "DD"]),
  radius: z.number(),
  scale: z.number(),
  offset: z.number(),
}) satisfies z.ZodType<CompactAxisTerm>;

const quantumNumbers = z.record(z.string(), z.number().int());

const towerStateSchema = z.object({
  sector: sectorKind,
  level: z.string(),
  momentum: quantumNumbers,
  winding: quantumNumbers,
  massSquared: z.string(),
  mass: z.number().nullable(),
  massGeV: z.number().nullable().optional(),
  states: z.string().nullable(),
  withChanPaton: z.string(),
}) satisfies z.ZodType<TowerState>;

const zeroPointSchema = z.object({
  bosonic: exactText.optional(),
  NS: exactText.optional(),
  R: exactText.optional(),
}) satisfies z.ZodType<ZeroPoint>;

const masslessSchema = z.object({
  description: z.string(),
  sector: sectorKind,
  states: countText,
  withChanPaton: countText.optional(),
}) satisfies z.ZodType<MasslessContent>;

const multipletSchema = z.object({
  name: z.string(),
  dimension: z.number().int(),
  content: z.string(),
  states: countText,
  massSquared: z.string(),
  mass: z.number(),
}) satisfies z.ZodType<SectorMultiplet>;

/** Sector fields a result of an older engine may lack. */
type UpgradedSectorField = "supersymmetric" | "massless" | "notes" | "multiplet";

/** A sector as stored by any engine version. */
type StoredSector = Omit<Sector, UpgradedSectorField | "axes"> & Partial<Pick<Sector, UpgradedSectorField>> & { axes: StoredAxisExpansion[] };

/** A sector as stored by any engine version (also the sector shape of the API reference). */
export const storedSectorSchema = z.object({
  pair: z.tuple([z.string(), z.string()]),
  nn: z.number().int(),
  dd: z.number().int(),
  nu: z.number().int(),
  separation: z.number(),
  chanPaton: z.number().int(),
  zeroPoint: zeroPointSchema,
  tachyonic: z.boolean(),
  criticalSeparation: z.number().nullable(),
  supersymmetric: z.boolean().optional(),
  axes: z.array(axisSchema),
  levels: z.array(levelRowSchema).superRefine(checkRowTexts),
  massless: z.array(masslessSchema).optional(),
  multiplet: multipletSchema.nullable().optional(),
  notes: z.array(z.string()).optional(),
  // Engine 1.2.0 on, only for configurations with compact axes: absent means none, not unrecorded.
  compactAxes: z.array(compactAxisSchema).optional(),
  tower: z.array(towerStateSchema).superRefine(checkRowTexts).optional(),
  towerTruncated: z.boolean().optional(),
  orientifold: z
    .object({ imageOf: z.string().nullable(), projected: z.boolean(), representation: z.string().nullable() })
    .optional(),
}) satisfies z.ZodType<StoredSector>;

const lightestSchema = z.object({
  pair: z.tuple([z.string(), z.string()]),
  sector: sectorKind,
  level: z.string(),
  massSquared: z.string(),
  mass: z.number().nullable(),
  states: z.string().nullable(),
  withChanPaton: z.string(),
}) satisfies z.ZodType<LightestState>;

const worldvolumeGroupSchema = z.object({ stacks: z.array(z.string()), group: z.string(), dimension: z.number().int() });

const worldvolumeSchema = z.object({
  stacks: z.array(z.string()),
  worldvolume: z.array(z.number().int()),
  dimension: z.number().int(),
  gaugeGroup: z.string(),
  content: z.string(),
  flavour: z.array(worldvolumeGroupSchema),
  matter: z.array(
    z.object({
      stacks: z.array(z.string()),
      nu: z.number().int(),
      role: z.enum(["flavour", "gauge"]),
      description: z.string(),
      massSquared: z.string(),
    }),
  ),
  defects: z.array(z.object({ stacks: z.array(z.string()), dimension: z.number().int() })),
  supercharges: z.number().int().nullable(),
  chirality: z.object({ positive: z.number().int(), negative: z.number().int() }).nullable(),
  supersymmetry: z.string(),
  summary: z.string(),
}) satisfies z.ZodType<WorldvolumeTheory>;

// Engines before 1.2.0 had no orientifold planes, so a result without this part has none to lack.
const orientifoldSummarySchema = z.object({
  planes: z.array(z.object({ id: z.string(), type: z.enum(["O-", "O+"]), p: z.number().int(), charge: exactText })),
  images: z.array(
    z.object({
      id: z.string(),
      of: z.string(),
      plane: z.string(),
      anti: z.boolean(),
      position: z.record(z.string(), z.number()),
      onPlane: z.boolean(),
    }),
  ),
  tadpoles: z.array(
    z.object({
      p: z.number().int(),
      stacks: exactText,
      planes: exactText,
      net: exactText,
      status: z.enum(["cancelled", "tadpole", "net charge", "projected out"]),
      message: z.string(),
      toCancel: z.string().nullable(),
    }),
  ),
  notes: z.array(z.string()),
}) satisfies z.ZodType<OrientifoldSummary>;

/** Result fields a result of an older engine may lack. */
type UpgradedResultField = "warnings" | "conventions" | "worldvolumes";

/** A spectrum result as stored by any engine version. */
export type StoredSpectrumResult = Omit<SpectrumResult, UpgradedResultField | "sectors"> &
  Partial<Pick<SpectrumResult, UpgradedResultField>> & { sectors: StoredSector[] };

/** A result as stored by any engine version, before the upgrade step (also the result shape of the API reference). */
export const storedResultShape = z.object({
  engineVersion: z.string().min(1, "A stored result names the engine version that computed it."),
  theory: z.enum(["bosonic", "IIA", "IIB"]),
  dimension: z.number().int(),
  warnings: z.array(z.string()).optional(),
  gaugeGroup: z.string(),
  worldvolumes: z.array(worldvolumeSchema).optional(),
  supercharges: z.number().int().nullable(),
  bps: z.boolean(),
  sectors: z.array(storedSectorSchema),
  lightest: z.array(lightestSchema).superRefine(checkRowTexts),
  conventions: z.string().optional(),
  orientifold: orientifoldSummarySchema.optional(),
}) satisfies z.ZodType<StoredSpectrumResult>;

/**
 * A stored spectrum result of any engine version, checked and upgraded to the current shape.
 *
 * @example
 * storedSpectrumResultSchema.parse(resultStoredWithoutConventions).conventions // => conventionsBeforeMassCap
 */
export const storedSpectrumResultSchema = storedResultShape.transform(upgradeStoredResult) satisfies z.ZodType<SpectrumResult>;

/** A stored result that is not a spectrum result of any engine version (a server-side fault, not bad input). */
export class StoredResultError extends Error {
  /** Every problem found, at its JSON path inside the stored result. */
  readonly issues: Array<{ path: PropertyKey[]; message: string }>;

  constructor(issues: Array<{ path: PropertyKey[]; message: string }>) {
    const first = issues[0];
    super(`Unreadable stored result${first ? ` at ${first.path.map(String).join(".") || "the root"}: ${first.message}` : ""}`);
    this.name = "StoredResultError";
    this.issues = issues;
  }
}

/**
 * Reads a stored spectrum result: checks its shape and upgrades a result of an older engine
 * version (missing fields get their upgrade defaults, and a warning where a default hides
 * physics the old engine did not record). The data-access layer reads every stored result through it.
 *
 * @param json - The stored jsonb value.
 * @returns The result in the current shape, with the `engineVersion` that computed it.
 * @throws StoredResultError when `json` is not a result of any engine version; deliberately not a
 *   ZodError, which route handlers answer with 422 as if the caller had sent bad input.
 * @example
 * readStoredResult(row.result).sectors[0].massless // => [] for a result stored before massless content was recorded
 */
export function readStoredResult(json: unknown): SpectrumResult {
  const parsed = storedSpectrumResultSchema.safeParse(json);
  if (!parsed.success) throw new StoredResultError(parsed.error.issues.map(({ path, message }) => ({ path, message })));
  return parsed.data;
}

/**
 * The conventions statement of engines before 1.1.0, the default of a result stored without one:
 * those engines listed each sector up to oscillator level N = levels, which the current
 * `CONVENTIONS_TEXT` (a mass cap for every sector) would misstate.
 *
 * @example
 * conventionsBeforeMassCap.startsWith("Conventions: alpha' = 1") // => true
 */
export const conventionsBeforeMassCap =
  "Conventions: alpha' = 1; lengths (positions and separations y) are in units of sqrt(alpha'), " +
  "the string length. Masses are given as alpha' M^2 = (y / 2 pi)^2 + N + a, where N is the " +
  "oscillator level (integer or half-integer) and a the zero-point energy of the sector, from " +
  "zeta(-1) = -1/12 and zeta(-1, 1/2) = 1/24 (bosonic: a = -(D - 2)/24 + nu/16; NS: a = -1/2 + nu/8; " +
  "R: a = 0, with nu the number of ND/DN axes), and as M sqrt(alpha'). Degeneracies count " +
  "light-cone oscillator states after the GSO projection, per oriented string and per Chan-Paton " +
  "label. Continuous momentum along the common Neumann directions is not included. " +
  "Caution: these are machine-computed results; anyone publishing them should check them independently.";

/** The engine version from which `levels` is a mass cap, N + a <= levels, in every sector. */
const massCapVersion = [1, 1, 0] as const;

/**
 * The upgrade step: missing lists become empty, missing conventions the statement of the engines
 * that did not store one (`conventionsBeforeMassCap`), a sector without a supersymmetry flag reads
 * as not supersymmetric, a sector without a multiplet as having none, and a result without
 * worldvolumes as listing none. Where a default hides
 * physics the old engine did not record, a warning names it, so that no screen presents a default
 * as a computed result; a result of an engine before 1.1.0 also says that its sectors were cut by
 * oscillator level rather than by mass.
 */
function upgradeStoredResult(stored: StoredSpectrumResult): SpectrumResult {
  const unrecorded = new Set<string>();
  const sectors = stored.sectors.map((sector): Sector => {
    if (sector.supersymmetric === undefined && stored.theory !== "bosonic") unrecorded.add("which sectors are supersymmetric");
    if (sector.massless === undefined) unrecorded.add("the massless content of each sector");
    // Only separated stacks with the same worldvolume can have a multiplet to name.
    if (sector.multiplet === undefined && sector.nu === 0 && sector.separation > 0) unrecorded.add("the W-boson multiplets of separated stacks");
    const axes = sector.axes.map(upgradeAxis);
    if (axes.some((axis) => axis === null)) unrecorded.add("the end positions of some mode expansions");
    return {
      ...sector,
      axes: axes.map((axis, index) => axis ?? { ...withoutStoredLatex(sector.axes[index] as StoredAxisExpansion), positionA: null, positionB: null }),
      // The bosonic string has no supersymmetry, so its default is not a guess.
      supersymmetric: sector.supersymmetric ?? false,
      massless: sector.massless ?? [],
      multiplet: sector.multiplet ?? null,
      notes: sector.notes ?? [],
    };
  });
  // With no stacks there is no worldvolume, so the default is exact.
  if (stored.worldvolumes === undefined && sectors.length > 0) {
    unrecorded.add("the theory on each worldvolume (gauge and flavour groups, light matter and supersymmetry)");
  }
  const warnings = [...(stored.warnings ?? [])];
  if (unrecorded.size > 0) {
    warnings.push(
      `Stored by engine ${stored.engineVersion}, which did not record ${[...unrecorded].join(" or ")}; ` +
        "save the configuration again to recompute the result with the current engine.",
    );
  }
  if (isVersionBefore(stored.engineVersion, massCapVersion) && sectors.length > 0) {
    warnings.push(
      `Stored by engine ${stored.engineVersion}, which listed every sector up to the oscillator level N = levels rather than ` +
        "up to the same alpha' M^2, so NS and R rows may stop at different masses; save the configuration again to cut them at one mass.",
    );
  }
  return {
    ...stored,
    warnings,
    sectors,
    worldvolumes: stored.worldvolumes ?? [],
    conventions: stored.conventions ?? conventionsBeforeMassCap,
  };
}

/**
 * An axis in the current shape: as stored from engine 1.3.0 on; before, with the end positions read
 * back from the boson's LaTeX (`expansionEndPositions`). Null when that text cannot be read.
 */
function upgradeAxis(axis: StoredAxisExpansion): AxisExpansion | null {
  const rest = withoutStoredLatex(axis);
  if (axis.positionA !== undefined && axis.positionB !== undefined) return { ...rest, positionA: axis.positionA, positionB: axis.positionB };
  const positions = axis.latex === undefined ? null : expansionEndPositions(axis.type, axis.latex);
  return positions ? { ...rest, ...positions } : null;
}

function withoutStoredLatex(axis: StoredAxisExpansion): Omit<AxisExpansion, "positionA" | "positionB"> {
  const { latex: _latex, positionA: _positionA, positionB: _positionB, ...rest } = axis;
  return rest;
}

/** Whether a "major.minor.patch" version is older than `reference`; text of another form is not. */
function isVersionBefore(version: string, reference: readonly [number, number, number]): boolean {
  const match = /^(\d+)\.(\d+)\.(\d+)/.exec(version);
  if (!match) return false;
  for (let index = 0; index < 3; index += 1) {
    const part = Number(match[index + 1]);
    if (part !== reference[index]) return part < (reference[index] as number);
  }
  return false;
}

/** Adds an issue at each level, alpha' M^2 or count text of the rows that cannot be read. */
function checkRowTexts(rows: Array<Pick<LevelRow, "level" | "massSquared" | "states" | "withChanPaton">>, context: z.RefinementCtx): void {
  rows.forEach((row, index) => {
    if (!isExactText(row.level)) context.addIssue({ code: "custom", path: [index, "level"], message: exactMessage });
    if (Number.isNaN(parseResultNumber(row.massSquared))) context.addIssue({ code: "custom", path: [index, "massSquared"], message: numberMessage });
    if (row.states !== null && !countPattern.test(row.states)) context.addIssue({ code: "custom", path: [index, "states"], message: countMessage });
    if (!countPattern.test(row.withChanPaton)) context.addIssue({ code: "custom", path: [index, "withChanPaton"], message: countMessage });
  });
}

function isExactText(text: string): boolean {
  return parseExactRational(text) !== null;
}
