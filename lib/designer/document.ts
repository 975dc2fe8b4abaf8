/**
 * Pure edits of a configuration document in the designer.
 *
 * Every function returns a new document and never mutates its input. An edit that would
 * make an impossible state (a duplicate or malformed id, a count below 1, a position that is
 * not a finite number, a Neumann axis outside space) is refused by returning the input
 * unchanged, so callers can compare references. States that can be entered but are invalid
 * (the wrong p for IIA/IIB, for example) are allowed here and reported by validation.
 */
import { configurationLimits, dimensionOf } from "@/lib/boundary";
import type { Configuration, Stack, Theory } from "@/lib/boundary/types";
import { cleanNumber } from "@/lib/canvas/snap";
import { configurationTitleMaxLength } from "@/lib/validations/limits";

/** Stack ids: letters, digits, "-" and "_", starting with a letter or digit, at most 64 characters. */
export const stackIdPattern = /^[A-Za-z0-9][A-Za-z0-9_-]{0,63}$/;

/** Largest stack count N the designer accepts (the engine's limit). */
export const maxStackCount = configurationLimits.maxCount;

/** Largest number of stacks in one configuration (the engine's limit). */
export const maxStacks = configurationLimits.maxStacks;

/** Palette offered for stack colours (CSS hex). */
export const stackPalette = ["#2f6f9f", "#b5542c", "#3f8f5a", "#7a4fa3", "#a8832a", "#2a8a8a", "#9c3d63", "#56606b"];

/** Spatial axes 1..D-1. */
export function spatialAxes(config: Pick<Configuration, "theory" | "dimension">): number[] {
  return Array.from({ length: dimensionOf(config) - 1 }, (_, i) => i + 1);
}

/** The p of a Dp stack: the number of spatial Neumann axes. */
export function stackDimension(stack: Pick<Stack, "worldvolume">): number {
  return stack.worldvolume.length;
}

/** A fresh id "prefixK" not used by any stack. */
export function nextStackId(config: Pick<Configuration, "stacks">, prefix = "s"): string {
  const used = new Set(config.stacks.map((s) => s.id));
  for (let k = 1; ; k++) {
    const id = `${prefix}${k}`;
    if (!used.has(id)) return id;
  }
}

/** Options of {@link addStack}. */
export interface AddStackOptions {
  id?: string;
  label?: string;
  worldvolume?: number[];
  position?: Record<string, number>;
  count?: number;
  anti?: boolean;
  colour?: string;
}

/**
 * Adds a stack. By default a D0 (IIA and bosonic) or a D1 along axis 1 (IIB) at the origin,
 * so that the new stack is valid for the theory. Refused at {@link maxStacks} stacks or for
 * a taken or malformed id.
 */
export function addStack(config: Configuration, options: AddStackOptions = {}): Configuration {
  if (config.stacks.length >= maxStacks) return config;
  const id = options.id ?? nextStackId(config);
  if (!isFreeId(config, id)) return config;
  const axes = new Set(spatialAxes(config));
  const worldvolume = normaliseAxes(options.worldvolume ?? (config.theory === "IIB" ? [1] : []), axes);
  const stack: Stack = {
    id,
    label: options.label ?? id,
    count: options.count !== undefined && isValidCount(options.count) ? options.count : 1,
    anti: options.anti ?? false,
    worldvolume,
    position: cleanPosition(options.position ?? {}, worldvolume),
    colour: options.colour ?? stackPalette[config.stacks.length % stackPalette.length],
  };
  return { ...config, stacks: [...config.stacks, stack] };
}

/** Options of {@link duplicateStacks}. */
export interface DuplicateStacksOptions {
  /** Offset added on Dirichlet axes of each copy, keyed by axis number (default none). */
  shift?: Record<string, number>;
}

/** Copies the given stacks (in document order) with fresh ids; returns the new document and the new ids. */
export function duplicateStacks(
  config: Configuration,
  ids: readonly string[],
  options: DuplicateStacksOptions = {},
): { config: Configuration; newIds: string[] } {
  const wanted = new Set(ids);
  let next = config;
  const newIds: string[] = [];
  for (const stack of config.stacks) {
    if (!wanted.has(stack.id)) continue;
    if (next.stacks.length >= maxStacks) break;
    const id = nextStackId(next, `${stack.id.replace(/\d+$/, "") || "s"}`);
    const copy: Stack = {
      ...stack,
      id,
      label: `${stack.label} copy`.slice(0, 64),
      position: shiftPosition(stack, options.shift ?? {}),
    };
    next = { ...next, stacks: [...next.stacks, copy] };
    newIds.push(id);
  }
  return { config: next, newIds };
}

/** Removes the given stacks. */
export function deleteStacks(config: Configuration, ids: readonly string[]): Configuration {
  const doomed = new Set(ids);
  if (!config.stacks.some((s) => doomed.has(s.id))) return config;
  return { ...config, stacks: config.stacks.filter((s) => !doomed.has(s.id)) };
}

/** Options of {@link moveStacks}. */
export interface MoveStacksOptions {
  /** Snap the moved coordinates to multiples of this step (sqrt(alpha') units). */
  snapStep?: number;
}

/**
 * Moves stacks by `delta` (axis number -> offset). Only Dirichlet axes move: a Neumann end
 * has no position along its worldvolume.
 */
export function moveStacks(
  config: Configuration,
  ids: readonly string[],
  delta: Record<string, number>,
  options: MoveStacksOptions = {},
): Configuration {
  if (Object.values(delta).some((d) => !Number.isFinite(d))) return config;
  const wanted = new Set(ids);
  let changed = false;
  const stacks = config.stacks.map((stack) => {
    if (!wanted.has(stack.id)) return stack;
    const position = shiftPosition(stack, delta, options.snapStep);
    if (samePosition(position, stack.position)) return stack;
    changed = true;
    return { ...stack, position };
  });
  return changed ? { ...config, stacks } : config;
}

/**
 * Flips one spatial axis of a stack between Neumann and Dirichlet. A new Dirichlet axis sits
 * at `position` (default 0); a new Neumann axis drops its position. Time is not a spatial
 * axis and cannot be toggled: every stack extends along time.
 */
export function toggleAxis(config: Configuration, id: string, axis: number, position = 0): Configuration {
  if (!spatialAxes(config).includes(axis) || !Number.isFinite(position)) return config;
  return updateStack(config, id, (stack) => {
    const key = String(axis);
    if (stack.worldvolume.includes(axis)) {
      return {
        ...stack,
        worldvolume: stack.worldvolume.filter((a) => a !== axis),
        position: { ...stack.position, [key]: cleanNumber(position) },
      };
    }
    const { [key]: _dropped, ...rest } = stack.position;
    return { ...stack, worldvolume: normaliseAxes([...stack.worldvolume, axis], new Set(spatialAxes(config))), position: rest };
  });
}

/** Sets the position of a stack on one of its Dirichlet axes. Refused on Neumann axes and for non-finite values. */
export function setPosition(config: Configuration, id: string, axis: number, value: number): Configuration {
  if (!Number.isFinite(value) || !spatialAxes(config).includes(axis)) return config;
  return updateStack(config, id, (stack) =>
    stack.worldvolume.includes(axis) ? stack : { ...stack, position: { ...stack.position, [String(axis)]: cleanNumber(value) } },
  );
}

/** Sets N. Refused unless it is an integer in 1..{@link maxStackCount}. */
export function setCount(config: Configuration, id: string, count: number): Configuration {
  if (!isValidCount(count)) return config;
  return updateStack(config, id, (stack) => ({ ...stack, count }));
}

/** Marks a stack as brane (false) or antibrane (true). */
export function setAnti(config: Configuration, id: string, anti: boolean): Configuration {
  return updateStack(config, id, (stack) => ({ ...stack, anti }));
}

/** Sets the free-text label (trimmed to 64 characters). */
export function setLabel(config: Configuration, id: string, label: string): Configuration {
  return updateStack(config, id, (stack) => ({ ...stack, label: label.slice(0, 64) }));
}

/** Sets the display colour; refused unless it is a #rrggbb hex colour. */
export function setColour(config: Configuration, id: string, colour: string): Configuration {
  if (!/^#[0-9a-fA-F]{6}$/.test(colour)) return config;
  return updateStack(config, id, (stack) => ({ ...stack, colour: colour.toLowerCase() }));
}

/** Why a stack cannot be renamed to `newId`, or null when it can. */
export function renameProblem(config: Pick<Configuration, "stacks">, id: string, newId: string): string | null {
  if (newId === id) return null;
  if (!stackIdPattern.test(newId)) return "Use 1-64 letters, digits, '-' or '_', starting with a letter or digit.";
  if (config.stacks.some((s) => s.id === newId)) return `Another stack is already called "${newId}".`;
  return null;
}

/** Renames a stack's id; refused when {@link renameProblem} reports a problem. */
export function renameStack(config: Configuration, id: string, newId: string): Configuration {
  if (newId === id || renameProblem(config, id, newId) !== null) return config;
  if (!config.stacks.some((s) => s.id === id)) return config;
  return updateStack(config, id, (stack) => ({ ...stack, id: newId }));
}

/**
 * Switches the theory. Axes that no longer exist (moving from 26 to 10 dimensions) are
 * removed from every stack; an explicit dimension is dropped for type II.
 */
export function setTheory(config: Configuration, theory: Theory): Configuration {
  if (theory === config.theory) return config;
  const { dimension: _dimension, ...rest } = config;
  const next: Configuration = theory === "bosonic" ? { ...config, theory } : { ...rest, theory };
  const axes = new Set(spatialAxes(next));
  return {
    ...next,
    stacks: next.stacks.map((stack) => {
      const worldvolume = stack.worldvolume.filter((a) => axes.has(a));
      return { ...stack, worldvolume, position: cleanPosition(stack.position, worldvolume, axes) };
    }),
  };
}

/** Sets the document title (cut to {@link configurationTitleMaxLength} characters). */
export function setTitle(config: Configuration, title: string): Configuration {
  return { ...config, title: title.slice(0, configurationTitleMaxLength) };
}

/** Sets the highest oscillator level reported; refused outside 0..{@link maxLevels} or for non-integers. */
export function setLevels(config: Configuration, levels: number): Configuration {
  if (!Number.isInteger(levels) || levels < 0 || levels > maxLevels) return config;
  return { ...config, levels };
}

/** Largest string scale in GeV the designer accepts (the engine's limit). */
export const maxStringScaleGeV = configurationLimits.maxStringScaleGeV;

/** Highest oscillator level the designer accepts (the engine's limit). */
export const maxLevels = configurationLimits.maxLevel;

/** Largest |position| in units of sqrt(alpha') (the engine's limit). */
export const maxAbsPosition = configurationLimits.maxAbsPosition;

/** Sets the string scale in GeV, or null; refused unless positive, finite and at most {@link maxStringScaleGeV}. */
export function setStringScale(config: Configuration, value: number | null): Configuration {
  if (value !== null && !(Number.isFinite(value) && value > 0 && value <= maxStringScaleGeV)) return config;
  return { ...config, stringScaleGeV: value };
}

/** True when `id` is well-formed and not used by any stack. */
function isFreeId(config: Pick<Configuration, "stacks">, id: string): boolean {
  return stackIdPattern.test(id) && !config.stacks.some((s) => s.id === id);
}

function isValidCount(count: number): boolean {
  return Number.isInteger(count) && count >= 1 && count <= maxStackCount;
}

function updateStack(config: Configuration, id: string, edit: (stack: Stack) => Stack): Configuration {
  let changed = false;
  const stacks = config.stacks.map((stack) => {
    if (stack.id !== id) return stack;
    const next = edit(stack);
    if (next !== stack) changed = true;
    return next;
  });
  return changed ? { ...config, stacks } : config;
}

/** Sorted, unique axes that exist in space. */
function normaliseAxes(axes: number[], allowed: Set<number>): number[] {
  return [...new Set(axes)].filter((a) => allowed.has(a)).sort((a, b) => a - b);
}

/** Keeps only finite positions on Dirichlet axes (and, when given, axes that exist). */
function cleanPosition(
  position: Record<string, number>,
  worldvolume: number[],
  allowed?: Set<number>,
): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [key, value] of Object.entries(position)) {
    const axis = Number(key);
    if (worldvolume.includes(axis) || !Number.isFinite(value)) continue;
    if (allowed && !allowed.has(axis)) continue;
    out[key] = cleanNumber(value);
  }
  return out;
}

function shiftPosition(stack: Stack, delta: Record<string, number>, snapStep?: number): Record<string, number> {
  const position = { ...stack.position };
  for (const [key, d] of Object.entries(delta)) {
    if (stack.worldvolume.includes(Number(key)) || d === 0) continue;
    let value = (position[key] ?? 0) + d;
    if (snapStep !== undefined && snapStep > 0) value = Math.round(value / snapStep) * snapStep;
    position[key] = cleanNumber(value);
  }
  return position;
}

function samePosition(a: Record<string, number>, b: Record<string, number>): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const key of keys) if ((a[key] ?? 0) !== (b[key] ?? 0)) return false;
  return true;
}

/**
 * Moves one worldvolume direction of a stack to another axis ("move the worldvolume from x4 to
 * x6"): `from` becomes Dirichlet and `to` Neumann in one step, so p (and with it the IIA/IIB
 * parity) stays what it was, where two single flips would pass through an invalid p. The stack
 * keeps its place: its position on `to` moves over to `from`. Refused unless `from` is Neumann and
 * `to` Dirichlet for the stack, and both are spatial axes.
 */
export function moveWorldvolume(config: Configuration, id: string, from: number, to: number): Configuration {
  const axes = spatialAxes(config);
  if (from === to || !axes.includes(from) || !axes.includes(to)) return config;
  return updateStack(config, id, (stack) => {
    if (!stack.worldvolume.includes(from) || stack.worldvolume.includes(to)) return stack;
    const { [String(to)]: moved = 0, ...rest } = stack.position;
    return {
      ...stack,
      worldvolume: normaliseAxes([...stack.worldvolume.filter((a) => a !== from), to], new Set(axes)),
      position: { ...rest, [String(from)]: moved },
    };
  });
}

/** Why another stack cannot be added, or null when it can. */
export function addStackProblem(config: Pick<Configuration, "stacks">): string | null {
  return config.stacks.length >= maxStacks
    ? `A configuration holds at most ${maxStacks} stacks, and this one has ${config.stacks.length}. Delete a stack, or fork the configuration to explore another set.`
    : null;
}
