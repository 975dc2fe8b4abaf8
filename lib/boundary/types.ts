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
  /**
   * Wilson lines (file format 2): an angle theta in [0, 2 pi) per compact Neumann axis, keyed by the
   * axis number as a string; a missing key is theta = 0. See `compact.ts`.
   */
  wilson?: Record<string, number>;
}

/** Kind of orientifold plane: O- (negative charge, SO groups on it) or O+ (positive, USp). */
export type OrientifoldType = "O-" | "O+";

/**
 * An orientifold plane (file format 2): an Op-plane along `worldvolume`, at `position` on its
 * Dirichlet axes (missing = 0). It reflects those axes through its position; every stack off the
 * plane gets an image there (see `orientifold.ts`).
 */
export interface OrientifoldPlane {
  /** Unique id among stacks and planes: letters, digits, "-" and "_". */
  id: string;
  /** Free-text label shown on the canvas. */
  label?: string;
  type: OrientifoldType;
  /** Spatial Neumann axes, sorted, without duplicates; p = worldvolume.length. */
  worldvolume: number[];
  /** Positions along Dirichlet axes, keyed by the axis number as a string. */
  position: Record<string, number>;
}

/**
 * A configuration document, file format 1 or 2 (format 1 plus optional fields: `compact` and
 * stacks' `wilson`, `orientifolds`).
 */
export interface Configuration {
  format: 1 | 2;
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
  /**
   * Mass cap (0..200): every sector lists its states with alpha' M^2 <= levels at zero separation,
   * i.e. N + a <= levels, so NS, R and bosonic rows stop at the same mass. The name is kept from
   * file format 1, where engines before 1.1.0 read it as the highest oscillator level N per sector.
   */
  levels: number;
  stacks: Stack[];
  /**
   * Compact spatial axes (file format 2): the radius R_k > 0 of each circle, in units of sqrt(alpha'),
   * keyed by the axis number as a string. Every other axis is non-compact. See `compact.ts`.
   */
  compact?: Record<string, number>;
  /** Orientifold planes (format 2 only; at most one). */
  orientifolds?: OrientifoldPlane[];
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
  /** Position of stack a (sigma = 0) on this axis when it is Dirichlet there, else null; units of sqrt(alpha'). */
  positionA: number | null;
  /** Position of stack b (sigma = pi) on this axis when it is Dirichlet there, else null. */
  positionB: number | null;
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
  /**
   * Orientifold-projected rows only: of the `states` oscillator states, how many pair with the
   * symmetric and with the antisymmetric Chan-Paton representation.
   */
  projected?: { symmetric: string; antisymmetric: string };
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

/**
 * The named multiplet of the lightest states of a sector: the W-boson multiplet of two separated
 * stacks with the same worldvolume and orientation.
 */
export interface SectorMultiplet {
  /** E.g. "massive W-boson vector multiplet (short, 16 supercharges)". */
  name: string;
  /** Spacetime dimension the states move in: the common worldvolume, nn + 1. */
  dimension: number;
  /** Spin content, e.g. "one massive vector (3 polarisations), 5 scalars and 8 fermion states". */
  content: string;
  /** Light-cone trace count of the multiplet: states of one oriented string per Chan-Paton label. */
  states: string;
  /** alpha' M^2 of the multiplet, as a level row writes it. */
  massSquared: string;
  /** M sqrt(alpha') = y / (2 pi). */
  mass: number;
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
  /** The named multiplet of the lightest states (separated identical stacks), or null. */
  multiplet: SectorMultiplet | null;
  notes: string[];
  /** The compact axes on which this pair has momentum (NN) or winding (DD) states; absent without compact axes. */
  compactAxes?: CompactAxisTerm[];
  /**
   * The tower of momentum and winding states with alpha' M^2 <= levels, lightest first; absent
   * without compact axes. At most `towerRowLimit(sectors)` rows: see `towerTruncated`.
   */
  tower?: TowerState[];
  /** True when more tower states lie within the mass cap than `tower` lists (the lightest are kept). */
  towerTruncated?: boolean;
  /** Present when an orientifold plane is set: what the projection does to this sector. */
  orientifold?: SectorOrientifold;
  /**
   * Set (true) on sectors of a paged API response whose `levels` and `axes` were left out to keep
   * the response small; the engine itself never sets it.
   */
  detailOmitted?: boolean;
}

/**
 * One compact axis of a pair: its states add (scale (m + offset))^2 to alpha' M^2 for every integer m
 * (the momentum n on an NN axis, the winding w on a DD axis).
 */
export interface CompactAxisTerm {
  axis: number;
  /** NN: momentum states; DD: winding states (ND and DN axes carry neither). */
  type: "NN" | "DD";
  /** Radius R of the circle, in units of sqrt(alpha'). */
  radius: number;
  /** 1 / R on an NN axis (p = (n + offset) / R), R on a DD axis ((Delta x + 2 pi R w) / 2 pi = R (w + offset)). */
  scale: number;
  /**
   * NN: (theta_b - theta_a) / 2 pi; DD: Delta x / (2 pi R), with Delta x = x_b - x_a of the positions read
   * modulo 2 pi R into [0, 2 pi R). Either way in (-1, 1).
   */
  offset: number;
}

/** One state of the tower: an oscillator level with momentum and winding numbers on the compact axes. */
export interface TowerState {
  sector: SectorKind;
  /** Oscillator level N, exact. */
  level: string;
  /** Momentum number n per compact NN axis of the pair (string from stack a to stack b), keyed by axis. */
  momentum: Record<string, number>;
  /** Winding number w per compact DD axis of the pair, keyed by axis. */
  winding: Record<string, number>;
  /** alpha' M^2: exact rational string where rational, else a decimal string. */
  massSquared: string;
  /** M sqrt(alpha'), or null for a tachyon. */
  mass: number | null;
  /** Mass in GeV when the configuration sets a string scale, else absent. */
  massGeV?: number | null;
  /** As `LevelRow.states`: per oriented string and Chan-Paton label, null where the orientations differ. */
  states: string | null;
  /**
   * As `LevelRow.withChanPaton`: both orientations, the string from b to a counted with the opposite
   * numbers (-n, -w), which have the same mass.
   */
  withChanPaton: string;
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

/** A group of coincident stacks seen from another worldvolume (a flavour group or a defect). */
export interface WorldvolumeGroup {
  /** Ids of the stacks, in id order. */
  stacks: string[];
  /** U(N) with N the total count of the stacks. */
  group: string;
  /** Dimension p + 1 of their worldvolume. */
  dimension: number;
}

/** Light states of strings from a worldvolume to other stacks that fill all of it. */
export interface WorldvolumeMatter {
  /** Ids of the stacks at the other end (one set of coincident stacks), in id order. */
  stacks: string[];
  /** nu of the pair. */
  nu: number;
  /**
   * "flavour" when the other stacks are higher-dimensional (their group is a global symmetry here),
   * "gauge" when they share the worldvolume (a parallel stack elsewhere: bifundamental matter).
   */
  role: "flavour" | "gauge";
  /** E.g. "one fundamental hypermultiplet", "a massive W-boson multiplet in the bifundamental of U(2) x U(1)". */
  description: string;
  /** alpha' M^2 of the lightest of these states at the actual separation (exact or decimal). */
  massSquared: string;
}

/** Where other stacks meet a worldvolume (y = 0) on a smaller intersection: states localised there. */
export interface WorldvolumeDefect {
  /** Ids of the stacks (one set of coincident stacks), in id order. */
  stacks: string[];
  /** Dimension nn + 1 of the intersection. */
  dimension: number;
}

/**
 * The theory on one worldvolume: one stack, or a set of coincident stacks of the same orientation
 * whose U(N_a) x U(N_b) is enhanced to U(N_a + N_b) (on circles, also with equal Wilson lines). Along
 * non-compact axes the groups of higher-dimensional stacks are flavour (global) symmetries here.
 */
export interface WorldvolumeTheory {
  /** Ids of the stacks on this worldvolume, in id order. */
  stacks: string[];
  /** Spatial Neumann axes of the worldvolume. */
  worldvolume: number[];
  /** Spacetime dimension p + 1. */
  dimension: number;
  /** U(N), N the total count. */
  gaugeGroup: string;
  /** Massless content of its own strings (adjoint of the gauge group), in field-theory terms. */
  content: string;
  /** Groups of higher-dimensional stacks that contain this worldvolume: flavour symmetries. */
  flavour: WorldvolumeGroup[];
  /** Light states of strings to stacks that fill this worldvolume (flavour and parallel stacks). */
  matter: WorldvolumeMatter[];
  /** Stacks meeting this worldvolume (y = 0) on a smaller intersection (their strings live there). */
  defects: WorldvolumeDefect[];
  /**
   * Real supercharges preserved by this worldvolume's stacks and every stack in `flavour` and
   * `matter` (type II; null for bosonic).
   */
  supercharges: number | null;
  /** In 2d and 6d: the supercharges of worldvolume chirality +1 and -1 (see `worldvolumeSupersymmetry`). */
  chirality: { positive: number; negative: number } | null;
  /** The usual name: "4d N=2", "2d (4,4)", "no supersymmetry", "no supersymmetry (bosonic string)". */
  supersymmetry: string;
  /**
   * One line, e.g. "4d: U(2), one fundamental hypermultiplet; U(1) flavour"; past four matter entries
   * or defects it says how many more `matter` and `defects` hold.
   */
  summary: string;
}

/** How the orientifold projection acts on one sector. */
export interface SectorOrientifold {
  /** Id of the stack whose image is the second end (the pair then reads ["a", "b'"]), or null. */
  imageOf: string | null;
  /** True when the orientifold projection splits the Chan-Paton labels (see `LevelRow.projected`). */
  projected: boolean;
  /** E.g. "adjoint of SO(4)", "antisymmetric of U(2) and its conjugate at the vector level". */
  representation: string | null;
}

/** The image of a stack in the orientifold plane. */
export interface ImageStack {
  /** `${of}'`. */
  id: string;
  /** Id of the stack. */
  of: string;
  /** Id of the plane. */
  plane: string;
  /** RR orientation of the image (type II): flipped when the stack and plane have nu = 2 mod 4. */
  anti: boolean;
  /** Reflected positions on the stack's Dirichlet axes. */
  position: Record<string, number>;
  /** True when the stack lies on the plane: it is its own image (SO or USp), and no separate image exists. */
  onPlane: boolean;
}

/** RR charge balance of one p: stacks (physical branes, images not counted again) and planes. */
export interface TadpoleEntry {
  p: number;
  /** Sum of +N (branes) and -N (antibranes), exact. */
  stacks: string;
  /** Charge of the planes of this p: -2^(p-5) (O-) or +2^(p-5) (O+), exact. */
  planes: string;
  /** stacks + planes, exact. */
  net: string;
  /** "cancelled"; "tadpole" (space-filling p = 9, uncancelled: inconsistent); "net charge" (p < 9: flux escapes to infinity); "projected out". */
  status: "cancelled" | "tadpole" | "net charge" | "projected out";
  /** Plain sentence of the balance. */
  message: string;
  /** What would cancel it, or null when cancelled. */
  toCancel: string | null;
}

/** The orientifold part of a result (only when the configuration has a plane). */
export interface OrientifoldSummary {
  planes: { id: string; type: OrientifoldType; p: number; charge: string }[];
  images: ImageStack[];
  tadpoles: TadpoleEntry[];
  notes: string[];
}

export interface SpectrumResult {
  engineVersion: string;
  theory: Theory;
  dimension: number;
  warnings: string[];
  /**
   * Every gauge factor over all worldvolumes, e.g. "U(2) x U(1)" (kept for lists and older readers;
   * each factor is gauged only on its own worldvolume: see `worldvolumes`).
   */
  gaugeGroup: string;
  /** The theory on each worldvolume, in the id order of its first stack. */
  worldvolumes: WorldvolumeTheory[];
  /** Supercharges preserved by the whole configuration (type II only; null for bosonic). */
  supercharges: number | null;
  /** True when all stacks are mutually supersymmetric (type II only). */
  bps: boolean;
  sectors: Sector[];
  lightest: LightestState[];
  conventions: string;
  /** Planes, images and RR tadpoles, when the configuration has an orientifold plane. */
  orientifold?: OrientifoldSummary;
}

export interface ComputeSpectrumOptions {
  /** How many entries `lightest` holds (default 10). */
  lightestCount?: number;
}
