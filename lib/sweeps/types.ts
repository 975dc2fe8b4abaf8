/**
 * Types of a sweep: a saved configuration varied along one or more dimensions, every combination
 * of their values being one point. Conventions as in the engine: alpha' = 1, positions in units
 * of sqrt(alpha').
 *
 * Adding a dimension means one more member of `SweepDimension` and `DimensionValue`, its size,
 * values and label in `dimension.ts`, how it changes the document in `enumerate.ts`, its checks
 * in `definition.ts` and its zod schema in `lib/validations/sweep.ts`; points, chunks, storage,
 * the queue and the pages work through those functions and need no change.
 */

/** The values a numeric dimension takes: listed, or `steps` evenly spaced from `from` to `to` inclusive. */
export type SweepValues = { kind: "list"; values: number[] } | { kind: "range"; from: number; to: number; steps: number };

/**
 * Which boundary choices a boundary dimension enumerates: `all` gives every N/D assignment of
 * the chosen (stack, axis) cells; `relabel-axes` counts assignments that differ only by a
 * permutation of the chosen axes once (one representative per orbit).
 */
export type BoundarySymmetry = "all" | "relabel-axes";

/** One direction of a sweep. */
export type SweepDimension =
  | {
      /** The N/D choice of every chosen stack on every chosen spatial axis. */
      kind: "boundary";
      stacks: string[];
      axes: number[];
      symmetry: BoundarySymmetry;
    }
  | {
      /** The Dirichlet position of one stack on one axis (ignored at points where the axis is Neumann for it). */
      kind: "position";
      stack: string;
      axis: number;
      values: SweepValues;
    }
  | {
      /** The number N of branes in one stack. */
      kind: "count";
      stack: string;
      values: SweepValues;
    }
  | {
      /** Brane, then antibrane, for one stack. */
      kind: "orientation";
      stack: string;
    }
  | {
      /**
       * The radius R of compact axis `axis`, in units of sqrt(alpha'): every point is a format 2
       * document with that axis compact, so a non-compact axis of the base is swept onto a circle.
       */
      kind: "radius";
      axis: number;
      values: SweepValues;
    };

/** The kinds of dimension. */
export type SweepDimensionKind = SweepDimension["kind"];

/** A sweep definition, format 1: the product of its dimensions, the first varying slowest. */
export interface SweepDefinition {
  format: 1;
  dimensions: SweepDimension[];
}

/** The value one dimension takes at a point. */
export type DimensionValue =
  | { kind: "boundary"; /** Per chosen axis, the set of chosen stacks (bit i = stacks[i]) that are Neumann on it. */ columns: number[] }
  | { kind: "position"; value: number }
  | { kind: "count"; value: number }
  | { kind: "orientation"; anti: boolean }
  | { kind: "radius"; value: number };

/** What one sweep point computes to, as stored per point. */
export type SweepPointOutcome =
  | {
      status: "ok";
      /** Supercharges of the whole configuration (type II), null for bosonic. */
      supercharges: number | null;
      /** How many sectors are tachyonic. */
      tachyonicSectors: number;
      /** alpha' M^2 of the lightest state, or null when none survives. */
      lightestMassSquared: number | null;
      /** Massless states over all sectors, both orientations and all Chan-Paton labels, as a decimal string. */
      masslessStates: string;
      gaugeGroup: string;
    }
  | {
      /** The engine refused the point's configuration (e.g. an odd p in IIA); `problem` says why. */
      status: "invalid";
      problem: string;
    };

/** How a point reads on the map. */
export type PointVerdict = "supersymmetric" | "tachyonic" | "neither" | "invalid";
