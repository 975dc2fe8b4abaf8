import { z } from "zod";
import { CONVENTIONS_TEXT } from "@/lib/boundary/constants";
import type {
  AxisExpansion,
  LevelRow,
  LightestState,
  MasslessContent,
  Sector,
  SpectrumResult,
  ZeroPoint,
} from "@/lib/boundary/types";
import { parseExactRational, parseResultNumber } from "@/lib/spectrum";

/**
 * Stored spectrum results (the `results.result` jsonb column), read back for any engine
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

const axisSchema = z.object({
  axis: z.number().int(),
  type: z.enum(["NN", "DD", "ND", "DN"]),
  bosonModing: moding,
  fermionModing: z.object({ NS: moding, R: moding }).optional(),
  zeroModes: z.array(z.string()),
  latex: z.string(),
}) satisfies z.ZodType<AxisExpansion>;

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
}) satisfies z.ZodType<LevelRow>;

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

/** Sector fields a result of an older engine may lack. */
type UpgradedSectorField = "supersymmetric" | "massless" | "notes";

/** A sector as stored by any engine version. */
type StoredSector = Omit<Sector, UpgradedSectorField> & Partial<Pick<Sector, UpgradedSectorField>>;

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
  notes: z.array(z.string()).optional(),
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

/** Result fields a result of an older engine may lack. */
type UpgradedResultField = "warnings" | "conventions";

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
  supercharges: z.number().int().nullable(),
  bps: z.boolean(),
  sectors: z.array(storedSectorSchema),
  lightest: z.array(lightestSchema).superRefine(checkRowTexts),
  conventions: z.string().optional(),
}) satisfies z.ZodType<StoredSpectrumResult>;

/**
 * A stored spectrum result of any engine version, checked and upgraded to the current shape.
 *
 * @example
 * storedSpectrumResultSchema.parse(resultStoredWithoutConventions).conventions // => CONVENTIONS_TEXT
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
 * The upgrade step: missing lists become empty, missing conventions the engine's statement
 * (unchanged since the first version: alpha' = 1), and a sector without a supersymmetry flag
 * reads as not supersymmetric. Where a default hides physics the old engine did not record, a
 * warning names it, so that no screen presents a default as a computed result.
 */
function upgradeStoredResult(stored: StoredSpectrumResult): SpectrumResult {
  const unrecorded = new Set<string>();
  const sectors = stored.sectors.map((sector): Sector => {
    if (sector.supersymmetric === undefined && stored.theory !== "bosonic") unrecorded.add("which sectors are supersymmetric");
    if (sector.massless === undefined) unrecorded.add("the massless content of each sector");
    return {
      ...sector,
      // The bosonic string has no supersymmetry, so its default is not a guess.
      supersymmetric: sector.supersymmetric ?? false,
      massless: sector.massless ?? [],
      notes: sector.notes ?? [],
    };
  });
  const warnings = [...(stored.warnings ?? [])];
  if (unrecorded.size > 0) {
    warnings.push(
      `Stored by engine ${stored.engineVersion}, which did not record ${[...unrecorded].join(" or ")}; ` +
        "save the configuration again to recompute the result with the current engine.",
    );
  }
  return { ...stored, warnings, sectors, conventions: stored.conventions ?? CONVENTIONS_TEXT };
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
