import { z } from "./zod";
import { checkConfiguration } from "@/lib/boundary/check";
import type { Configuration, OrientifoldPlane, Stack } from "@/lib/boundary/types";
import { configurationDescriptionMaxLength, configurationTitleMaxLength, stackLabelMaxLength } from "./limits";

/**
 * Shapes of a configuration document (format 1, and format 2 with optional `compact`, stacks'
 * `wilson` and `orientifolds`; product.md "The configuration file"). The
 * schema checks types and text lengths; the physics rules (p parity per theory, axis ranges,
 * limits, unique ids, positions on Dirichlet axes) come from `checkConfiguration`, added as
 * issues at their JSON paths so that there is one source of truth for them.
 */

/** Wilson lines of a stack (format 2): angles in radians by compact Neumann axis; ranges are the engine's. */
const wilsonSchema = z
  .record(z.string(), z.number({ error: "Wilson lines must be finite numbers (radians)." }), {
    error: 'Wilson lines must be an object such as { "9": 1.2 } (radians, by axis).',
  })
  .describe("Format 2: a Wilson line theta in [0, 2 pi) radians per compact Neumann axis of the stack, keyed by axis.");

/** Radii of the compact axes (format 2), by axis, in units of sqrt(alpha'); ranges are the engine's. */
export const compactSchema = z
  .record(z.string(), z.number({ error: "Radii must be finite numbers (units of sqrt(alpha'))." }), {
    error: 'Compact axes must be an object such as { "9": 2.5 } (radius by axis).',
  })
  .describe("Format 2: compact spatial axes, each with its radius R in units of sqrt(alpha'), keyed by axis.");

/** The shape of one stack. */
export const stackSchema = z.object({
  id: z.string({ error: "A stack id must be text." }),
  label: z.string({ error: "A label must be text." }).max(stackLabelMaxLength, `Keep the label under ${stackLabelMaxLength} characters.`).default(""),
  count: z.number({ error: "The count must be a number." }),
  anti: z.boolean({ error: "anti must be true or false." }).default(false),
  worldvolume: z.array(z.number({ error: "Worldvolume axes must be numbers." }), {
    error: "The worldvolume must be a list of axis numbers.",
  }),
  position: z
    .record(z.string(), z.number({ error: "Positions must be finite numbers." }), {
      error: 'Positions must be an object such as { "9": 3.5 }.',
    })
    .default({}),
  colour: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, "The colour must be a hex colour such as #1f77b4.")
    .optional(),
  wilson: wilsonSchema.optional(),
}) satisfies z.ZodType<Stack>;

/** The shape of one orientifold plane (file format 2). */
export const orientifoldPlaneSchema = z.object({
  id: z.string({ error: "A plane id must be text." }),
  label: z.string({ error: "A label must be text." }).max(120, "Keep the label under 120 characters.").optional(),
  type: z.enum(["O-", "O+"], { error: 'The plane type must be "O-" or "O+".' }),
  worldvolume: z.array(z.number({ error: "Worldvolume axes must be numbers." }), {
    error: "The worldvolume must be a list of axis numbers.",
  }),
  position: z
    .record(z.string(), z.number({ error: "Positions must be finite numbers." }), {
      error: 'Positions must be an object such as { "9": 0 }.',
    })
    .default({}),
}) satisfies z.ZodType<OrientifoldPlane>;

/**
 * The document's shape alone: types, text lengths and the file format, without the engine's
 * problems. For a caller that runs `checkConfiguration` itself (the designer's live preview checks
 * and computes in one engine pass); everything else uses {@link configurationSchema}.
 */
export const configurationShapeSchema = z.object({
  format: z.union([z.literal(1), z.literal(2)], { error: "The file format must be 1 or 2." }),
  title: z
    .string({ error: "The title must be text." })
    .trim()
    .min(1, "Give the configuration a title.")
    .max(configurationTitleMaxLength, `Use at most ${configurationTitleMaxLength} characters.`),
  description: z.string().max(configurationDescriptionMaxLength, `Keep the description under ${configurationDescriptionMaxLength} characters.`).optional(),
  theory: z.enum(["bosonic", "IIA", "IIB"], { error: 'The theory must be "bosonic", "IIA" or "IIB".' }),
  dimension: z.number({ error: "The dimension must be a number." }).optional(),
  stringScaleGeV: z.number({ error: "The string scale must be a number of GeV or null." }).nullable().default(null),
  levels: z
    .number({ error: "The mass cap (levels: the highest alpha' M^2 listed at zero separation) must be a number." })
    .describe("Mass cap, a whole number 0 to 200: every sector lists its states with alpha' M^2 <= levels at zero separation (N + a <= levels)."),
  stacks: z.array(stackSchema, { error: "Stacks must be a list." }),
  compact: compactSchema.optional(),
  orientifolds: z.array(orientifoldPlaneSchema, { error: "Orientifolds must be a list of planes." }).optional(),
});

/**
 * A configuration document: shape checks plus every problem `checkConfiguration` finds, each at
 * its JSON path. `label`, `anti`, `position` and `stringScaleGeV` may be left out (defaults "",
 * false, {} and null).
 *
 * @example
 * configurationSchema.safeParse(document).success
 */
export const configurationSchema = configurationShapeSchema.superRefine((configuration, context) => {
  for (const problem of checkConfiguration(configuration)) {
    context.addIssue({ code: "custom", path: problem.path, message: problem.message });
  }
}) satisfies z.ZodType<Configuration>;

/**
 * Body of `POST /api/spectrum`: the configuration document itself, checked for shape here; the
 * physics rules (p parity, axis ranges, limits, unique ids) are checked by the engine as it
 * computes, in the same pass, and answered with the same 422 and JSON paths.
 */
export const spectrumRequestSchema = configurationShapeSchema;


/** Query of `POST /api/spectrum`: sectors from `sectorOffset` keep their level rows until `maxRows` rows. */
export const spectrumQuerySchema = z.object({
  sectorOffset: z.coerce.number({ error: "sectorOffset must be a whole number." }).int().min(0).max(1_000_000).default(0),
  maxRows: z.coerce.number({ error: "maxRows must be a whole number." }).int().min(1).max(20_000).default(10_000),
});
