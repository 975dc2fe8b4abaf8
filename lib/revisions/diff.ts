/**
 * Differences between two configuration documents and between two spectrum results,
 * for the history page ("what changed between revision 3 and revision 7?").
 *
 * Pure: plain documents in, plain descriptions out; inputs are never mutated.
 * Stacks are matched by their `id`; a stack whose id changed shows as removed + added.
 */
import { dimensionOf } from "@/lib/boundary";
import { interactionCurves, type InteractionCurve } from "@/lib/boundary/interaction";
import type { Configuration, OrientifoldPlane, SpectrumResult, Stack, Sector, SectorKind } from "@/lib/boundary/types";
import { formatWorldvolume, lightestLevel, pairKey, parseResultNumber, worldvolumeKey, type StackNameSource } from "@/lib/spectrum";
import { diffCompactAxes, type CompactDiff } from "./compact-diff";

/** Boundary condition of one stack on one spatial axis. */
export type Boundary = "N" | "D";

/** A top-level field of the document that changed (title, theory, levels, ...). */
export interface FieldChange {
  field: "title" | "description" | "theory" | "dimension" | "stringScaleGeV" | "levels";
  before: string | number | null;
  after: string | number | null;
}

/** One axis whose boundary condition flipped for a stack. */
export interface BoundaryChange {
  axis: number;
  before: Boundary;
  after: Boundary;
}

/** One Dirichlet axis (Dirichlet before and after) whose position moved. */
export interface PositionChange {
  axis: number;
  before: number;
  after: number;
}

/** A stack present in both documents, with everything that changed about it. */
export interface StackChange {
  id: string;
  label: { before: string; after: string } | null;
  count: { before: number; after: number } | null;
  /** Brane/antibrane orientation flip. */
  anti: { before: boolean; after: boolean } | null;
  colour: { before: string | null; after: string | null } | null;
  boundaries: BoundaryChange[];
  positions: PositionChange[];
}

/** Something described by one line that changed, appeared (before null) or went (after null). */
export interface LineChange {
  key: string;
  before: string | null;
  after: string | null;
}

export interface ConfigurationDiff {
  fields: FieldChange[];
  /** Orientifold planes added, removed or changed (matched by id). */
  planes: LineChange[];
  added: Stack[];
  removed: Stack[];
  changed: StackChange[];
  /** Radii and Wilson lines that changed (file format 2). */
  compact: CompactDiff;
  /** True when nothing differs. */
  identical: boolean;
}

/** The lightest surviving state of one sector, as shown in the diff. */
export interface LightestStateSummary {
  sector: SectorKind;
  level: string;
  massSquared: string;
}

/** A sector (pair of stacks) whose headline physics changed. */
export interface SectorChange {
  pair: [string, string];
  lightest: { before: LightestStateSummary | null; after: LightestStateSummary | null } | null;
  tachyonic: { before: boolean; after: boolean } | null;
  supersymmetric: { before: boolean; after: boolean } | null;
}

/** A worldvolume whose theory changed, appeared or went: its one-line description before and after. */
export interface WorldvolumeChange {
  /** Ids of its stacks, joined (see `worldvolumeKey`). */
  key: string;
  /** The line before, or null when it is new. */
  before: string | null;
  /** The line after, or null when it is gone. */
  after: string | null;
}

export interface SpectrumDiff {
  /** Images and tadpole entries of the orientifold that changed, appeared or went. */
  orientifold: LineChange[];
  /** Sectors present only in the later result (a stack was added). */
  addedSectors: Array<[string, string]>;
  /** Sectors present only in the earlier result (a stack was removed). */
  removedSectors: Array<[string, string]>;
  changedSectors: SectorChange[];
  bps: { before: boolean; after: boolean } | null;
  supercharges: { before: number | null; after: number | null } | null;
  gaugeGroup: { before: string; after: string } | null;
  /**
   * Worldvolumes whose theory (gauge and flavour groups, light matter, supersymmetry) changed;
   * empty when either result was stored before worldvolumes were recorded.
   */
  worldvolumes: WorldvolumeChange[];
  identical: boolean;
}

/**
 * Compares two configuration documents.
 *
 * @param before - the earlier document
 * @param after - the later document
 * @returns top-level field changes, stacks added/removed (matched by id) and, for stacks in
 *   both, label/count/orientation/colour changes, per-axis boundary flips (N <-> D) and moved
 *   Dirichlet positions (a missing position counts as 0, as in the file format).
 * @example
 * diffConfigurations(a, { ...a, title: "B" }).fields
 * // => [{ field: "title", before: "A", after: "B" }]
 */
export function diffConfigurations(before: Configuration, after: Configuration): ConfigurationDiff {
  const fields: FieldChange[] = [];
  const pushField = (field: FieldChange["field"], b: string | number | null, a: string | number | null) => {
    if (b !== a) fields.push({ field, before: b, after: a });
  };
  pushField("title", before.title, after.title);
  pushField("description", before.description ?? null, after.description ?? null);
  pushField("theory", before.theory, after.theory);
  pushField("dimension", dimensionOf(before), dimensionOf(after));
  pushField("stringScaleGeV", before.stringScaleGeV, after.stringScaleGeV);
  pushField("levels", before.levels, after.levels);

  const beforeById = new Map(before.stacks.map((stack) => [stack.id, stack]));
  const afterById = new Map(after.stacks.map((stack) => [stack.id, stack]));
  const added = after.stacks.filter((stack) => !beforeById.has(stack.id));
  const removed = before.stacks.filter((stack) => !afterById.has(stack.id));

  // Compare axes up to the larger dimension so a theory change still lists every flipped axis.
  const spatialAxes = Math.max(dimensionOf(before), dimensionOf(after)) - 1;
  const changed: StackChange[] = [];
  for (const next of after.stacks) {
    const previous = beforeById.get(next.id);
    if (!previous) continue;
    const change = diffStack(previous, next, spatialAxes);
    if (change) changed.push(change);
  }

  const compact = diffCompactAxes(before, after);
  const planes = diffLines(
    new Map((before.orientifolds ?? []).map((plane) => [plane.id, describePlane(plane)])),
    new Map((after.orientifolds ?? []).map((plane) => [plane.id, describePlane(plane)])),
  );

  return {
    fields,
    planes,
    added,
    removed,
    changed,
    compact,
    identical:
      fields.length === 0 &&
      planes.length === 0 &&
      added.length === 0 &&
      removed.length === 0 &&
      changed.length === 0 &&
      compact.radii.length === 0 &&
      compact.wilsonLines.length === 0,
  };
}

/**
 * Compares two spectrum results sector by sector.
 *
 * @param before - the result stored with the earlier revision
 * @param after - the result stored with the later revision
 * @returns sectors added/removed, and sectors whose lightest surviving state (alpha' M^2,
 *   compared numerically so "-1/2" equals "-0.5"), tachyon status or supersymmetry changed;
 *   plus changes of the configuration-wide BPS flag, supercharge count and gauge group, and of
 *   the theory on each worldvolume (matched by its stacks).
 *   Sectors are matched as unordered pairs of stack ids.
 * @example
 * diffSpectra(r, r).identical // => true
 */
export function diffSpectra(before: SpectrumResult, after: SpectrumResult): SpectrumDiff {
  const beforeSectors = new Map(before.sectors.map((sector) => [pairKey(...sector.pair), sector]));
  const afterSectors = new Map(after.sectors.map((sector) => [pairKey(...sector.pair), sector]));

  const addedSectors = after.sectors.filter((s) => !beforeSectors.has(pairKey(...s.pair))).map((s) => s.pair);
  const removedSectors = before.sectors.filter((s) => !afterSectors.has(pairKey(...s.pair))).map((s) => s.pair);

  const changedSectors: SectorChange[] = [];
  for (const next of after.sectors) {
    const previous = beforeSectors.get(pairKey(...next.pair));
    if (!previous) continue;
    const lightestBefore = lightestOf(previous);
    const lightestAfter = lightestOf(next);
    const change: SectorChange = {
      pair: next.pair,
      lightest: sameLightest(lightestBefore, lightestAfter) ? null : { before: lightestBefore, after: lightestAfter },
      tachyonic: previous.tachyonic === next.tachyonic ? null : { before: previous.tachyonic, after: next.tachyonic },
      supersymmetric:
        previous.supersymmetric === next.supersymmetric
          ? null
          : { before: previous.supersymmetric, after: next.supersymmetric },
    };
    if (change.lightest || change.tachyonic || change.supersymmetric) changedSectors.push(change);
  }

  const bps = before.bps === after.bps ? null : { before: before.bps, after: after.bps };
  const supercharges =
    before.supercharges === after.supercharges ? null : { before: before.supercharges, after: after.supercharges };
  const gaugeGroup =
    before.gaugeGroup === after.gaugeGroup ? null : { before: before.gaugeGroup, after: after.gaugeGroup };
  const worldvolumes = diffWorldvolumes(before, after);
  const orientifold = diffLines(orientifoldLines(before), orientifoldLines(after));

  return {
    orientifold,
    addedSectors,
    removedSectors,
    changedSectors,
    bps,
    supercharges,
    gaugeGroup,
    worldvolumes,
    identical:
      addedSectors.length === 0 &&
      removedSectors.length === 0 &&
      changedSectors.length === 0 &&
      !bps &&
      !supercharges &&
      !gaugeGroup &&
      worldvolumes.length === 0 &&
      orientifold.length === 0,
  };
}

/**
 * How the interaction potential of each pair at its own separation changed between two documents
 * (computed from the documents with the engine; pairs matched by their ids).
 *
 * @param before - The earlier document.
 * @param after - The later document.
 * @returns One change per pair whose V at its separation (or whose being defined) differs, appeared or went.
 * @example
 * diffInteractions(d3AntiD3At10, d3AntiD3At20)[0]?.key // => "a-b"
 */
export function diffInteractions(before: Configuration, after: Configuration): LineChange[] {
  const lines = (document: Configuration) =>
    new Map(interactionCurves(document).map((curve) => [`${curve.pair[0]}-${curve.pair[1]}`, describePotential(curve)]));
  return diffLines(lines(before), lines(after));
}

function describePotential(curve: InteractionCurve): string {
  if (curve.undefinedReason) return `not finite (dd = ${curve.dd})`;
  if (curve.vanishes) return "V = 0 at every separation";
  const value = curve.atSeparation === null ? "not defined (tachyon)" : `V = ${curve.atSeparation.toPrecision(6)}`;
  return `y = ${curve.separation.toPrecision(6)}: ${value}`;
}

function describePlane(plane: OrientifoldPlane): string {
  const p = plane.worldvolume.length;
  const at = Object.entries(plane.position)
    .filter(([, value]) => value !== 0)
    .map(([axis, value]) => `x${axis} = ${value}`)
    .join(", ");
  return `O${p}${plane.type.slice(1)} along ${p === 0 ? "no spatial axis" : `x${plane.worldvolume.join(", x")}`}${at ? ` at ${at}` : " through the origin"}`;
}

function orientifoldLines(result: SpectrumResult): Map<string, string> {
  const lines = new Map<string, string>();
  for (const image of result.orientifold?.images ?? []) {
    const where = image.onPlane
      ? "on the plane"
      : Object.entries(image.position)
          .map(([axis, value]) => `x${axis} = ${value}`)
          .join(", ") || "at the origin";
    lines.set(`image ${image.id}`, `${image.anti ? "antibrane" : "brane"} ${where}`);
  }
  for (const entry of result.orientifold?.tadpoles ?? []) lines.set(`tadpole D${entry.p}`, `${entry.status}, net ${entry.net}`);
  return lines;
}

function diffLines(was: ReadonlyMap<string, string>, now: ReadonlyMap<string, string>): LineChange[] {
  const changes: LineChange[] = [];
  for (const [key, line] of now) {
    const previous = was.get(key) ?? null;
    if (previous !== line) changes.push({ key, before: previous, after: line });
  }
  for (const [key, line] of was) if (!now.has(key)) changes.push({ key, before: line, after: null });
  return changes;
}

function diffWorldvolumes(before: SpectrumResult, after: SpectrumResult): WorldvolumeChange[] {
  // A result with sectors but no worldvolumes was stored before they were recorded: nothing to compare.
  const unrecorded = (result: SpectrumResult) => result.worldvolumes.length === 0 && result.sectors.length > 0;
  if (unrecorded(before) || unrecorded(after)) return [];
  const lines = (result: SpectrumResult) => new Map(result.worldvolumes.map((w) => [worldvolumeKey(w), formatWorldvolume(w)]));
  return diffLines(lines(before), lines(after));
}

function boundaryOf(stack: Stack, axis: number): Boundary {
  return stack.worldvolume.includes(axis) ? "N" : "D";
}

function diffStack(before: Stack, after: Stack, spatialAxes: number): StackChange | null {
  const boundaries: BoundaryChange[] = [];
  const positions: PositionChange[] = [];
  for (let axis = 1; axis <= spatialAxes; axis += 1) {
    const b = boundaryOf(before, axis);
    const a = boundaryOf(after, axis);
    if (b !== a) {
      boundaries.push({ axis, before: b, after: a });
    } else if (b === "D") {
      const from = before.position[String(axis)] ?? 0;
      const to = after.position[String(axis)] ?? 0;
      if (from !== to) positions.push({ axis, before: from, after: to });
    }
  }
  const change: StackChange = {
    id: after.id,
    label: before.label === after.label ? null : { before: before.label, after: after.label },
    count: before.count === after.count ? null : { before: before.count, after: after.count },
    anti: before.anti === after.anti ? null : { before: before.anti, after: after.anti },
    colour:
      (before.colour ?? null) === (after.colour ?? null)
        ? null
        : { before: before.colour ?? null, after: after.colour ?? null },
    boundaries,
    positions,
  };
  const hasChange =
    change.label || change.count || change.anti || change.colour || boundaries.length > 0 || positions.length > 0;
  return hasChange ? change : null;
}

function lightestOf(sector: Sector): LightestStateSummary | null {
  const row = lightestLevel(sector);
  return row ? { sector: row.sector, level: row.level, massSquared: row.massSquared } : null;
}

function sameLightest(a: LightestStateSummary | null, b: LightestStateSummary | null): boolean {
  if (a === null || b === null) return a === b;
  // Relative tolerance: decimal strings of irrational masses are rounded by the engine.
  const x = parseResultNumber(a.massSquared);
  const y = parseResultNumber(b.massSquared);
  return Math.abs(x - y) <= 1e-9 * Math.max(1, Math.abs(x), Math.abs(y));
}

/**
 * The stacks of two documents for naming the sectors of their diff: every stack of either side,
 * with the later side's label where both have the stack.
 *
 * @param before - The earlier document (not mutated).
 * @param after - The later document (not mutated).
 * @returns Id and label of each stack, the later side's first.
 * @example
 * bothSidesStacks(a, b).map((stack) => stack.id) // => ids of b, then ids only a has
 */
export function bothSidesStacks(before: Pick<Configuration, "stacks">, after: Pick<Configuration, "stacks">): StackNameSource[] {
  const ids = new Set(after.stacks.map((stack) => stack.id));
  return [...after.stacks, ...before.stacks.filter((stack) => !ids.has(stack.id))].map((stack) => ({ id: stack.id, label: stack.label }));
}
