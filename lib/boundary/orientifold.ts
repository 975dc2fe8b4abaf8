/**
 * Orientifold planes: image stacks, the orientifold projection of open strings, and SO/USp groups.
 *
 * An Op-plane reflects its Dirichlet axes through its position (x -> 2 x_O - x) and reverses the
 * orientation of the string (Omega). Every stack S off the plane has an image S' at the reflected
 * position with the conjugate Chan-Paton factor; a stack on the plane is its own image, so its N
 * branes and their N images make 2N branes of the covering space (common practice, from memory:
 * Polchinski vol. 2, section 13.2; Gimon and Polchinski 1996).
 *
 * Rules, with nu' the number of ND/DN axes between a stack and the plane:
 * - nu' = 0 mod 4: the image has the same RR orientation (the plane keeps C_(p+1)). A stack on the
 *   plane gets SO(2N) or USp(2N): SO on an O- plane when nu' = 0 mod 8, USp on an O+ plane, and the
 *   other way round when nu' = 4 mod 8 (the D5 branes of an O9- plane carry USp; Gimon and
 *   Polchinski 1996, from memory). Adjoint dimensions N(2N - 1) and N(2N + 1).
 * - nu' = 2 mod 4 (type II): the plane maps C_(p'+1) to -C_(p'+1), so the image is an antibrane and
 *   the stack's charge is projected out; the projection of its strings is not modelled (noted).
 * - Strings between a stack and its own image (the aa' sector, y = twice the distance to the plane)
 *   and the strings of a stack on the plane are projected. Omega acts on an oscillator state at
 *   level N as e^(i pi (N - N_v)) times (-1) for each oscillator along an axis that is ND between the
 *   stack and the plane (there the reflection and the moding add one sign), N_v the level of the
 *   massless vector (1 bosonic, 1/2 NS); R states take the sign of their NS partners one half-level
 *   up, as the supercharges the plane preserves commute with Omega. States of sign + pair with the
 *   antisymmetric Chan-Paton representation for SO-type planes and with the symmetric one for
 *   USp-type (so the vector is in the adjoint), states of sign - with the other; for the aa' strings
 *   of U(N) these are the antisymmetric or symmetric of U(N) and their conjugates (a'a strings).
 *
 * Counting: `states` stays the oscillator count per oriented string and Chan-Paton pair;
 * `projected` splits it between the symmetric and antisymmetric; `withChanPaton` is
 * sum over signs of states x dimension of the representation (x 2 for the aa' and a'a strings).
 * Other sectors touching a stack on the plane count its 2N covering-space labels.
 *
 * Limits: at most one plane (two reflections generate a lattice of images on non-compact axes).
 * The force between a stack and the plane itself (the Moebius strip) is not computed.
 *
 * Invalid-input policy: the functions assume a configuration that `checkConfiguration` passed.
 */

import { classifyPair, type ClassifiedStack } from "./classify";
import { formatRational } from "./rational";
import { modeFactors, seriesProduct } from "./series";
import { planeCharge, tadpoleBalance } from "./tadpole";
import type {
  ImageStack,
  OrientifoldPlane,
  OrientifoldSummary,
  OrientifoldType,
  Sector,
  SectorKind,
  Stack,
  Theory,
  WorldvolumeTheory,
} from "./types";

/** What a plane does to one stack. */
export interface StackUnderPlane {
  stack: Stack;
  /** ND/DN axes between the stack and the plane. */
  nuPlane: number;
  /** The stack lies on the plane (its reflected positions equal its own). */
  onPlane: boolean;
  /** nu' = 0 mod 4: the projection is modelled (the image has the stack's orientation). */
  compatible: boolean;
  /** On the plane and compatible: its own image, with an SO or USp group. */
  fixed: boolean;
  /** The image stack (id `${id}'`), or null for a fixed stack. */
  image: Stack | null;
  /** Group type of a fixed stack, else null. */
  group: "SO" | "USp" | null;
  /** Chan-Paton representation paired with Omega-even oscillator states, when compatible. */
  evenRepresentation: "antisymmetric" | "symmetric" | null;
}

/**
 * The plane seen as a stack-like object (worldvolume and positions), for `classifyPair`.
 *
 * @param plane - The plane.
 * @returns Its worldvolume and position.
 * @example
 * planeGeometry({ id: "o", type: "O-", worldvolume: [1, 2], position: { "3": 1 } }).position // => { "3": 1 }
 */
export function planeGeometry(plane: OrientifoldPlane): ClassifiedStack {
  return { worldvolume: plane.worldvolume, position: plane.position };
}

/**
 * The image of every stack under one plane, with the projection rules of the module doc.
 *
 * @param stacks - The stacks (any order; the output keeps it).
 * @param plane - The plane.
 * @param theory - The theory (antibrane images only in type II).
 * @param dimension - Spacetime dimension D.
 * @returns One entry per stack.
 * @example
 * stacksUnderPlane([d9], o9minus, "IIB", 10)[0]?.group // => "SO"
 */
export function stacksUnderPlane(stacks: readonly Stack[], plane: OrientifoldPlane, theory: Theory, dimension: number): StackUnderPlane[] {
  const geometry = planeGeometry(plane);
  return stacks.map((stack) => {
    const classification = classifyPair(stack, geometry, dimension);
    const nuPlane = classification.nu;
    const position: Record<string, number> = {};
    let onPlane = true;
    for (const axis of classification.axes) {
      if (axis.type === "NN" || axis.type === "ND") continue;
      const own = axis.positionA ?? 0;
      // DD: reflected through the plane; DN: the plane extends along it, nothing moves.
      const reflected = axis.type === "DD" ? 2 * (axis.positionB ?? 0) - own : own;
      if (reflected !== own) onPlane = false;
      if (reflected !== 0) position[String(axis.axis)] = reflected;
    }
    const compatible = nuPlane % 4 === 0;
    const fixed = onPlane && compatible;
    const evenRepresentation = compatible ? evenRepresentationOf(plane.type, nuPlane) : null;
    const group = fixed ? (evenRepresentation === "antisymmetric" ? "SO" : "USp") : null;
    const image: Stack | null = fixed
      ? null
      : {
          id: `${stack.id}'`,
          label: stack.label ? `${stack.label} (image)` : "image",
          count: stack.count,
          anti: theory !== "bosonic" && nuPlane % 4 === 2 ? !stack.anti : stack.anti,
          worldvolume: stack.worldvolume,
          position,
        };
    return { stack, nuPlane, onPlane, compatible, fixed, image, group, evenRepresentation };
  });
}

/**
 * The image records of a result (`OrientifoldSummary.images`).
 *
 * @param entries - From `stacksUnderPlane`.
 * @param plane - The plane.
 * @returns One image per stack, in the order of `entries`; a fixed stack is listed with `onPlane` and its own position.
 * @example
 * imageRecords(stacksUnderPlane([d3], o3, "IIB", 10), o3)[0]?.id // => "a'"
 */
export function imageRecords(entries: readonly StackUnderPlane[], plane: OrientifoldPlane): ImageStack[] {
  return entries.map(({ stack, image, fixed }) => ({
    id: `${stack.id}'`,
    of: stack.id,
    plane: plane.id,
    anti: image?.anti ?? stack.anti,
    position: image?.position ?? stack.position,
    onPlane: fixed,
  }));
}

/**
 * Name of the group of a stack of N branes under the plane.
 *
 * @param entry - From `stacksUnderPlane`.
 * @param count - Total count N (coincident fixed stacks add up).
 * @returns "SO(2N)", "USp(2N)" or "U(N)".
 * @example
 * groupName({ group: "SO" }, 16) // => "SO(32)"
 */
export function groupName(entry: Pick<StackUnderPlane, "group">, count: number): string {
  return entry.group ? `${entry.group}(${2 * count})` : `U(${count})`;
}

/**
 * Omega-twisted oscillator counts of a nu = 0, same-orientation sector (a stack on the plane, or a
 * stack and its image): Tr Omega over the states of each level, normalised so that the massless
 * vector along an axis that is not flipped counts +1 (module doc).
 *
 * @param kind - "bosonic", "NS" or "R".
 * @param flipped - Transverse axes whose oscillators take the extra sign: nu' of the stack and plane.
 * @param dimension - D (26 or less bosonic; 10 for NS and R).
 * @param maxTwiceLevel - Highest 2N needed.
 * @returns Map from 2N to Tr Omega at that level (only levels the GSO projection keeps).
 * @throws RangeError when flipped exceeds the transverse directions.
 * @example
 * omegaTwistedCounts("NS", 0, 10, 1).get(1) // => 8n   (the vector: adjoint)
 * omegaTwistedCounts("bosonic", 0, 26, 0).get(0) // => -1n (the tachyon: the other representation)
 */
export function omegaTwistedCounts(kind: SectorKind, flipped: number, dimension: number, maxTwiceLevel: number): Map<number, bigint> {
  const transverse = dimension - 2;
  if (flipped < 0 || flipped > transverse) throw new RangeError(`At most ${transverse} flipped directions, got ${flipped}`);
  const counts = new Map<number, bigint>();
  if (kind === "bosonic") {
    const series = seriesProduct(
      [...modeFactors("integer", -1, -(transverse - flipped), maxTwiceLevel), ...modeFactors("integer", 1, -flipped, maxTwiceLevel)],
      maxTwiceLevel,
    );
    for (let k = 0; k <= maxTwiceLevel; k += 2) {
      const n = k / 2;
      counts.set(k, (n % 2 === 1 ? 1n : -1n) * (series[k] ?? 0n));
    }
    return counts;
  }
  // NS: psi along flipped axes (1 - q^r), bosons (1 + q^n)^-1; states at level N carry e^(i pi N).
  const top = kind === "R" ? maxTwiceLevel + 1 : maxTwiceLevel;
  const series = seriesProduct(
    [
      ...modeFactors("half-integer", 1, transverse - flipped, top),
      ...modeFactors("half-integer", -1, flipped, top),
      ...modeFactors("integer", -1, -(transverse - flipped), top),
      ...modeFactors("integer", 1, -flipped, top),
    ],
    top,
  );
  for (let k = 1; k <= top; k += 2) {
    // e^(i pi (N - 1/2)) = (-1)^((k - 1) / 2) on the GSO-kept half-integer levels N = k / 2.
    const value = (((k - 1) / 2) % 2 === 0 ? 1n : -1n) * (series[k] ?? 0n);
    if (kind === "NS") counts.set(k, value);
    else counts.set(k - 1, value);
  }
  return counts;
}

/** Dimension of the symmetric or antisymmetric two-index representation of n labels. */
function twoIndexDimension(representation: "symmetric" | "antisymmetric", n: number): bigint {
  const big = BigInt(n);
  return representation === "symmetric" ? (big * (big + 1n)) / 2n : (big * (big - 1n)) / 2n;
}

/** The Chan-Paton representation of Omega-even states (module doc). */
function evenRepresentationOf(type: OrientifoldType, nuPlane: number): "antisymmetric" | "symmetric" {
  const soType = (type === "O-") === (nuPlane % 8 === 0);
  return soType ? "antisymmetric" : "symmetric";
}

/** Options of `projectSector`. */
export interface ProjectSectorOptions {
  entry: StackUnderPlane;
  dimension: number;
  /** "fixed": the strings of a stack on the plane (2N labels); "image": a stack and its image (N labels, both orientations). */
  mode: "fixed" | "image";
}

/**
 * Applies the orientifold projection to the level rows of a sector in place (module doc).
 *
 * @param sector - A nu = 0, same-orientation sector: a fixed stack with itself, or a stack with its image.
 * @param options - The stack's plane entry (compatible), D and the mode.
 * @throws RangeError when a level's counts do not split into whole numbers (an inconsistent twist).
 * @example
 * projectSector(sector, { entry, dimension: 10, mode: "fixed" }); sector.levels[0]?.projected
 */
export function projectSector(sector: Sector, options: ProjectSectorOptions): void {
  const { entry, dimension, mode } = options;
  const even = entry.evenRepresentation ?? "antisymmetric";
  const odd = even === "antisymmetric" ? "symmetric" : "antisymmetric";
  const labels = mode === "fixed" ? 2 * entry.stack.count : entry.stack.count;
  const orientations = mode === "fixed" ? 1n : 2n;
  const maxTwice = Math.max(0, ...sector.levels.map((row) => twiceOf(row.level)));
  const twists = new Map<SectorKind, Map<number, bigint>>();
  for (const row of sector.levels) {
    let twist = twists.get(row.sector);
    if (!twist) {
      twist = omegaTwistedCounts(row.sector, entry.nuPlane, dimension, maxTwice);
      twists.set(row.sector, twist);
    }
    const total = BigInt(row.states ?? "0");
    const trace = twist.get(twiceOf(row.level)) ?? 0n;
    if ((total + trace) % 2n !== 0n || total < (trace < 0n ? -trace : trace)) {
      throw new RangeError(`Omega does not split ${total.toString()} states with trace ${trace.toString()} at level ${row.level}`);
    }
    const evenStates = (total + trace) / 2n;
    const oddStates = (total - trace) / 2n;
    const split = { [even]: evenStates, [odd]: oddStates } as Record<"symmetric" | "antisymmetric", bigint>;
    row.projected = { symmetric: split.symmetric.toString(), antisymmetric: split.antisymmetric.toString() };
    row.withChanPaton = (
      orientations *
      (split.symmetric * twoIndexDimension("symmetric", labels) + split.antisymmetric * twoIndexDimension("antisymmetric", labels))
    ).toString();
  }
  const group = mode === "fixed" ? groupName(entry, entry.stack.count) : `U(${entry.stack.count})`;
  const evenName = mode === "fixed" ? "adjoint" : even;
  const oddName = mode === "fixed" ? (entry.group === "SO" ? "symmetric" : "antisymmetric") : odd;
  const representation =
    mode === "fixed"
      ? `adjoint of ${group} for the vector; states odd under the projection are in the ${oddName}`
      : `${evenName} of ${group} and its conjugate at the vector level, the ${oddName} at the levels in between`;
  sector.orientifold = { imageOf: mode === "image" ? entry.stack.id : null, projected: true, representation };
  sector.chanPaton =
    mode === "fixed" ? Number(twoIndexDimension(even, labels)) : entry.stack.count * entry.stack.count;
  for (const content of sector.massless) {
    const row = sector.levels.find((candidate) => candidate.sector === content.sector && candidate.massSquared === "0");
    if (!row) continue;
    content.withChanPaton = row.withChanPaton;
    content.description = `${content.description.replace(`adjoint of U(${entry.stack.count})`, `adjoint of ${group}`)}; Chan-Paton: ${
      row.projected?.[even] ?? "0"
    } in the ${evenName}, ${row.projected?.[odd] ?? "0"} in the ${oddName} of ${group}`;
  }
}

/**
 * Doubles the Chan-Paton count of a sector with a stack on the plane (2N labels in the covering space).
 *
 * @param sector - A sector between two distinct stacks, at least one of them fixed; mutated.
 * @param bothFixed - True when both ends are on the plane (Omega then identifies the two orientations).
 * @example
 * doubleFixedLabels(sector, false)
 */
export function doubleFixedLabels(sector: Sector, bothFixed: boolean): void {
  const twice = (text: string | undefined): string | undefined => (text === undefined ? undefined : (BigInt(text) * 2n).toString());
  for (const row of sector.levels) row.withChanPaton = twice(row.withChanPaton) ?? row.withChanPaton;
  for (const content of sector.massless) content.withChanPaton = twice(content.withChanPaton);
  sector.chanPaton *= 2;
  sector.orientifold = { imageOf: null, projected: false, representation: null };
  sector.notes.push(
    bothFixed
      ? "Both stacks lie on the orientifold plane: each has 2N branes in the covering space, and the projection identifies the two orientations of these strings (bifundamental of the two groups)."
      : "One stack lies on the orientifold plane: its 2N branes in the covering space (the N branes and their images) each end these strings.",
  );
}

/** 2N of an exact level string ("3/2" -> 3). */
function twiceOf(level: string): number {
  const [num, den] = level.split("/");
  return den === undefined ? 2 * Number(num) : Number(num);
}

/** Input of `applyOrientifold`: the sectors already built, and how to build more. */
export interface ApplyOrientifoldInput<B extends { sector: Sector }> {
  /** Stacks in id order (the order of `built`). */
  stacks: readonly Stack[];
  plane: OrientifoldPlane;
  theory: Theory;
  dimension: number;
  /** Sectors of the pairs (i, j), i <= j, at `pairIndex(i, j)`; mutated in place by the projection. */
  built: readonly B[];
  pairIndex(i: number, j: number): number;
  /** Builds the sector of stack a with another stack (here an image). */
  build(a: Stack, b: Stack): B;
  worldvolumes: WorldvolumeTheory[];
  gaugeGroup: string;
}

/**
 * Applies one orientifold plane to a computed spectrum: projects the strings of stacks on the plane,
 * counts their covering-space labels in other sectors, builds the sectors of stacks with images, and
 * renames the gauge groups (module doc).
 *
 * @param input - See `ApplyOrientifoldInput`.
 * @returns The image sectors to append (pairs (a, b') for a <= b in id order, both off the plane),
 *   the summary (planes, images, tadpoles, notes), warnings, and the renamed groups.
 * @example
 * applyOrientifold({ stacks, plane, theory: "IIB", dimension: 10, built, pairIndex, build, worldvolumes, gaugeGroup }).gaugeGroup // => "SO(32)"
 */
export function applyOrientifold<B extends { sector: Sector }>(
  input: ApplyOrientifoldInput<B>,
): { extra: B[]; summary: OrientifoldSummary; warnings: string[]; gaugeGroup: string; worldvolumes: WorldvolumeTheory[] } {
  const { stacks, plane, theory, dimension, built, pairIndex, build } = input;
  const entries = stacksUnderPlane(stacks, plane, theory, dimension);
  const sectorAt = (i: number, j: number): Sector => (built[pairIndex(Math.min(i, j), Math.max(i, j))] as B).sector;
  const notes: string[] = [
    "Interactions with the plane itself (the Moebius strip) are not computed: the annulus potentials are those between stacks and images.",
  ];

  entries.forEach((entry, i) => {
    if (entry.fixed) projectSector(sectorAt(i, i), { entry, dimension, mode: "fixed" });
    for (let j = i + 1; j < entries.length; j += 1) {
      const other = entries[j] as StackUnderPlane;
      if (entry.fixed || other.fixed) doubleFixedLabels(sectorAt(i, j), entry.fixed && other.fixed);
    }
    if (!entry.compatible) {
      notes.push(
        `Stack "${entry.stack.id}" has nu = ${entry.nuPlane} ND axes with the plane: ` +
          (theory === "bosonic"
            ? "the projection of its strings is not modelled (only nu = 0 mod 4 is)."
            : "its image is an antibrane and its RR charge is projected out; the projection of its strings is not modelled."),
      );
    }
  });

  const extra: B[] = [];
  for (let i = 0; i < entries.length; i += 1) {
    const a = entries[i] as StackUnderPlane;
    if (a.fixed) continue;
    for (let j = i; j < entries.length; j += 1) {
      const b = entries[j] as StackUnderPlane;
      if (b.fixed || !b.image) continue;
      const made = build(a.stack, b.image);
      if (i === j && a.compatible) {
        projectSector(made.sector, { entry: a, dimension, mode: "image" });
        made.sector.notes.unshift(
          `Strings from "${a.stack.id}" to its own image, ${made.sector.separation.toPrecision(6)} apart (twice the distance to the plane): ` +
            `the projection keeps the ${a.evenRepresentation} of U(${a.stack.count}) at the vector level.`,
        );
      } else {
        made.sector.orientifold = { imageOf: b.stack.id, projected: false, representation: null };
        made.sector.notes.unshift(
          i === j
            ? `Strings from "${a.stack.id}" to its own image (an antibrane here), not projected in this model.`
            : `Strings from "${a.stack.id}" to the image of "${b.stack.id}"; the projection identifies them with strings from "${b.stack.id}" to the image of "${a.stack.id}".`,
        );
      }
      extra.push(made);
    }
  }

  const byId = new Map(entries.map((entry) => [entry.stack.id, entry]));
  let renamed = false;
  const worldvolumes = input.worldvolumes.map((theoryOn) => {
    const members = theoryOn.stacks.map((id) => byId.get(id)).filter((entry): entry is StackUnderPlane => entry !== undefined);
    const first = members[0];
    if (!first || !members.every((entry) => entry.fixed && entry.group === first.group)) return theoryOn;
    const count = members.reduce((sum, entry) => sum + entry.stack.count, 0);
    const group = groupName(first, count);
    renamed = true;
    return { ...theoryOn, gaugeGroup: group, summary: theoryOn.summary.replace(theoryOn.gaugeGroup, group) };
  });
  const gaugeGroup = renamed
    ? [...worldvolumes]
        .map((theoryOn) => ({ name: theoryOn.gaugeGroup, rank: rankOf(theoryOn.gaugeGroup) }))
        .sort((x, y) => y.rank - x.rank)
        .map((group) => group.name)
        .join(" x ")
    : input.gaugeGroup;

  const projectedOut = new Set(entries.filter((entry) => theory !== "bosonic" && entry.nuPlane % 4 === 2).map((entry) => entry.stack.id));
  const tadpoles = tadpoleBalance(stacks, [plane], theory, projectedOut);
  const warnings = tadpoles
    .filter((entry) => entry.status === "tadpole" || (entry.status === "net charge" && entry.p === plane.worldvolume.length))
    .map((entry) => `${entry.message} ${entry.toCancel ?? ""}`.trim());
  if (theory === "bosonic") {
    notes.push("The bosonic string has no RR charges: no tadpole balance is computed (its dilaton tadpole is not modelled).");
  }
  const summary: OrientifoldSummary = {
    planes: [{ id: plane.id, type: plane.type, p: plane.worldvolume.length, charge: formatRational(planeCharge(plane)) }],
    images: imageRecords(entries, plane),
    tadpoles,
    notes,
  };
  return { extra, summary, warnings, gaugeGroup, worldvolumes };
}

/** The N of U(N), SO(N) or USp(N), for ordering gauge factors (larger groups first). */
function rankOf(group: string): number {
  const match = /\((\d+)\)/.exec(group);
  return match ? Number(match[1]) / (group.startsWith("U(") ? 1 : 2) : 0;
}
