import { z } from "./zod";
import { sweepLimits } from "@/lib/sweeps/definition";
import type { SweepDefinition, SweepDimension, SweepValues } from "@/lib/sweeps/types";

/*
 * Sweep definitions as they cross the network. Shapes only: whether a definition fits its
 * configuration (stacks, axes, the point limit) is `checkSweepDefinition` in lib/sweeps, which the
 * DAL runs with the stored document.
 */

const finite = z.number({ error: "Enter a number." }).finite("Enter a finite number.");
const stackId = z.string().min(1, "Pick a stack.").max(64);
const axis = z.number().int("Axes are whole numbers.");
const valueCount = z.number().int().min(1, "Give at least one value.").max(sweepLimits.maxValues, `At most ${sweepLimits.maxValues} values.`);

const valuesSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("list"), values: z.array(finite).max(sweepLimits.maxValues, `At most ${sweepLimits.maxValues} values.`) }),
  z.object({ kind: z.literal("range"), from: finite, to: finite, steps: valueCount }),
]) satisfies z.ZodType<SweepValues>;

const dimensionSchema = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("boundary"),
    stacks: z.array(stackId).max(24),
    axes: z.array(axis).max(25),
    symmetry: z.enum(["all", "relabel-axes"]),
  }),
  z.object({ kind: z.literal("position"), stack: stackId, axis, values: valuesSchema }),
  z.object({ kind: z.literal("count"), stack: stackId, values: valuesSchema }),
  z.object({ kind: z.literal("orientation"), stack: stackId }),
  z.object({ kind: z.literal("radius"), axis, values: valuesSchema }),
]) satisfies z.ZodType<SweepDimension>;

/** A sweep definition (lib/sweeps/types.ts). */
export const sweepDefinitionSchema = z.object({
  format: z.literal(1),
  dimensions: z.array(dimensionSchema).max(sweepLimits.maxDimensions, `At most ${sweepLimits.maxDimensions} dimensions.`),
}) satisfies z.ZodType<SweepDefinition>;

/** Body of `POST /api/configurations/[configurationId]/sweeps`. */
export const startSweepBodySchema = z.object({
  definition: sweepDefinitionSchema,
  title: z.string().trim().max(200, "Keep the title under 200 characters.").optional(),
  attachToStarter: z.boolean().optional(),
});
export type StartSweepBody = z.infer<typeof startSweepBodySchema>;

/** Query of `GET /api/sweeps/[sweepId]/export`. */
export const sweepExportQuerySchema = z.object({ format: z.enum(["csv", "json"]).default("csv") });
