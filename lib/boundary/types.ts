/**
 * Public types of the spectrum engine. This file is the contract shared by the engine,
 * the zod schemas in `lib/validations`, the database (jsonb columns) and the interface.
 *
 * Conventions (see `constants.ts`): alpha' = 1; lengths in units of sqrt(alpha');
 * masses as alpha' M^2 (exact rational strings where rational) and M sqrt(alpha').
 * Exact rationals travel as strings such as "-1/2" or "3"; degeneracies as decimal
 * strings because they outgrow 2^53.
 */

/** The string theories the engine knows. */
export type Theory = "bosonic" | "IIA" | "IIB";

/** One stack of N coincident D-branes (or antibranes). */
export interface Stack {
  /** Unique id inside the configuration: letters, digits, "-" and "_". */
  id: string;
  /** Free-text label shown on the canvas. */
  label: string;
  /** Number of coincident branes N (at least 1). */
  count: number;
  /** True for an antibrane stack (opposite RR charge). Ignored by the bosonic theory. */
  anti: boolean;
  /** Spatial Neumann axes (1..D-1), sorted, without duplicates. p = worldvolume.length. */
  worldvolume: number[];
  /**
   * Positions along Dirichlet axes, keyed by the axis number as a string.
   * A Dirichlet axis missing here sits at 0. Keys for Neumann axes are rejected by `checkConfiguration`.
   */
  position: Record<string, number>;
  /** Optional display colour (CSS hex), interface only. */
  colour?: string;
}

/** A configuration document, file format 1. */
export interface Configuration {
  format: 1;
  title: string;
  description?: string;
  theory: Theory;
  /**
   * Spacetime dimension. Optional: 26 for bosonic, 10 for IIA/IIB. A non-critical
   * bosonic dimension is allowed with a warning; type II must be 10.
   */
  dimension?: number;
  /** String scale M_s = 1/sqrt(alpha') in GeV, or null when masses stay in string units. */
  stringScaleGeV: number | null;
  /** Highest oscillator level N reported per sector (0..200). */
  levels: number;
  stacks: Stack[];
}

/** Boundary condition pair on one axis: first letter at sigma = 0 (stack a), second at sigma = pi (stack b). */
export type AxisType = "NN" | "DD" | "ND" | "DN";

/** Sector label of a level row. */
export type SectorKind = "bosonic" | "NS" | "R";

/** Moding of a field on one axis: integer (n in Z) or half-integer (r in Z + 1/2). */
export type Moding = "integer" | "half-integer";

export interface AxisExpansion {
  axis: number;
  type: AxisType;
  /** Moding of the boson X on this axis. */
  bosonModing: Moding;
  /** Moding of the worldsheet fermion per sector (type II only). */
  fermionModing?: { NS: Moding; R: Moding };
  /** Zero modes present: e.g. ["x", "p"] for NN, [] otherwise. */
  zeroModes: string[];
  /** The mode expansion X(tau, sigma) as LaTeX, with the endpoint positions substituted. */
  latex: string;
}

export interface LevelRow {
  sector: SectorKind;
  /** Oscillator level N as an exact rational string ("0", "1/2", "3/2"). */
  level: string;
  /** alpha' M^2: exact rational string when y = 0 (or y^2 rational), else a decimal string. */
  massSquared: string;
  /** M sqrt(alpha'), or null when alpha' M^2 < 0 (tachyon). */
  mass: number | null;
  /** Mass in GeV when the configuration sets a string scale, else absent. */
  massGeV?: number | null;
  /** States of one oriented string per Chan-Paton index pair; null where the orientations differ. */
  states: string | null;
  /** Total over both orientations and all Chan-Paton labels. */
  withChanPaton: string;
  /** Explanations, e.g. which orientation holds an unpaired R ground state. */
  note?: string;
}

export interface ZeroPoint {
  bosonic?: string;
  NS?: string;
  R?: string;
}

export interface MasslessContent {
  /** Human-readable field content, e.g. "vector (8 polarisations)", "2 scalars", "16 fermions". */
  description: string;
  sector: SectorKind;
  /** States per Chan-Paton index pair: of one oriented string, or summed over both orientations where they differ. */
  states: string;
  /** Total over both orientations and all Chan-Paton labels (as `LevelRow.withChanPaton`). */
  withChanPaton?: string;
}

export interface Sector {
  pair: [string, string];
  nn: number;
  dd: number;
  nu: number;
  /** Separation y in units of sqrt(alpha'). */
  separation: number;
  /** Chan-Paton states over both orientations: N_a^2 for a stack with itself, 2 N_a N_b otherwise. */
  chanPaton: number;
  zeroPoint: ZeroPoint;
  tachyonic: boolean;
  /**
   * y_c = 2 pi sqrt(-(N + a)) of the lightest surviving state, or null when none is tachyonic at y = 0,
   * for a stack with itself, and when the stacks share no Dirichlet axis to separate along.
   */
  criticalSeparation: number | null;
  /** Pair preserves some supersymmetry (type II only; false for bosonic). */
  supersymmetric: boolean;
  axes: AxisExpansion[];
  levels: LevelRow[];
  massless: MasslessContent[];
  notes: string[];
  /**
   * Set (true) on sectors of a paged API response whose `levels` and `axes` were left out to keep
   * the response small; the engine itself never sets it.
   */
  detailOmitted?: boolean;
}

export interface LightestState {
  pair: [string, string];
  sector: SectorKind;
  level: string;
  massSquared: string;
  mass: number | null;
  states: string | null;
  withChanPaton: string;
}

export interface SpectrumResult {
  engineVersion: string;
  theory: Theory;
  dimension: number;
  warnings: string[];
  gaugeGroup: string;
  /** Supercharges preserved by the whole configuration (type II only; null for bosonic). */
  supercharges: number | null;
  /** True when all stacks are mutually supersymmetric (type II only). */
  bps: boolean;
  sectors: Sector[];
  lightest: LightestState[];
  conventions: string;
}

export interface ComputeSpectrumOptions {
  /** How many entries `lightest` holds (default 10). */
  lightestCount?: number;
}
