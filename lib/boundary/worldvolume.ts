/**
 * The theory on each worldvolume of a configuration: its gauge group, the flavour groups other
 * stacks give it, the light states of strings that fill it, the defects where other stacks meet
 * it, and its supersymmetry (physics.md, "Chan-Paton factors and gauge content").
 *
 * Conventions:
 * - A worldvolume is one stack, or a set of coincident stacks (same worldvolume axes, same
 *   position, same orientation), whose U(N_a) x U(N_b) is enhanced to U(N_a + N_b).
 * - Strings from a worldvolume A to stacks B whose Neumann axes include all of A's move on the whole
 *   of A. When B is higher-dimensional its gauge coupling on A's worldvolume is diluted by the
 *   infinite volume of the extra (non-compact) directions, so U(N_B) acts on A's theory as a
 *   flavour (global) symmetry (common practice, e.g. the D3-D7 system: 4d N=2 U(N) with N_7
 *   fundamental hypermultiplets and U(N_7) flavour; from memory). A parallel stack of the same
 *   worldvolume elsewhere gives bifundamental matter of two gauge groups.
 * - Stacks that meet A (y = 0) on a smaller intersection give states localised there: defects of A.
 *   Stacks apart from A on such an intersection give it neither matter nor a defect.
 * - The supersymmetry of A's theory is the one preserved by A and by every stack whose strings
 *   fill A, from the explicit gamma matrices (`worldvolumeSupersymmetry`), named as usual
 *   (`nameSupersymmetry`).
 */

import { formatDecimal, listInWords } from "./format";
import { formatRational, rational, rationalToNumber, type Rational } from "./rational";
import { nameSupersymmetry, worldvolumeSupersymmetry } from "./supersymmetry";
import type { Sector, Stack, Theory, WorldvolumeDefect, WorldvolumeGroup, WorldvolumeMatter, WorldvolumeTheory } from "./types";

/** What `describeWorldvolumes` reads of the computed sector of a pair of stacks. */
export interface PairSummary {
  /** The sector of the pair (in id order). */
  sector: Sector;
  /** N + a of the lightest surviving state, exact; null when nothing survives. */
  lowest: Rational | null;
  /** (y / 2 pi)^2, the stretching term of alpha' M^2 (0 when the stacks coincide). */
  stretch: number;
  /** True when every Dirichlet-Dirichlet difference is exactly zero. */
  coincident: boolean;
}

/** Input of `describeWorldvolumes`. */
export interface DescribeWorldvolumesInput {
  /** The stacks in id order. */
  stacks: readonly Stack[];
  theory: Theory;
  /** Spacetime dimension D. */
  dimension: number;
  /** The computed sector of stacks[i] with stacks[j] (either order). */
  pair(i: number, j: number): PairSummary;
}

/**
 * Describes the theory on every worldvolume of a configuration.
 *
 * @param input - Stacks in id order, the theory, D and the computed sector of each pair.
 * @returns `worldvolumes`, one per set of coincident stacks in the id order of its first stack,
 *   and `gaugeGroup`, every gauge factor over all worldvolumes ("U(2) x U(1)", largest first; "none"
 *   without stacks), the compatibility field of `SpectrumResult`.
 * @example
 * // One D3 stack of two branes at the origin and a D7 along 1..7 (IIB):
 * describeWorldvolumes(input).worldvolumes[0].summary // => "4d: U(2), one fundamental hypermultiplet; U(1) flavour"
 * describeWorldvolumes(input).worldvolumes[0].supersymmetry // => "4d N=2"
 *
 * Invalid input is not rejected here: the stacks must pass `checkConfiguration`.
 */
export function describeWorldvolumes(input: DescribeWorldvolumesInput): { worldvolumes: WorldvolumeTheory[]; gaugeGroup: string } {
  const groups = coincidentGroups(input);
  const worldvolumes = groups.map((group) => describeGroup(group, groups, input));
  const gaugeGroup =
    groups.length === 0
      ? "none"
      : [...groups]
          .sort((x, y) => y.rank - x.rank || (x.members[0] as number) - (y.members[0] as number))
          .map((group) => `U(${group.rank})`)
          .join(" x ");
  return { worldvolumes, gaugeGroup };
}

interface Group {
  /** Indices into the stacks (id order), ascending. */
  members: number[];
  /** Total count N. */
  rank: number;
}

/** Union-find over stacks that coincide: same worldvolume, same position, same orientation (bosonic: any). */
function coincidentGroups({ stacks, theory, pair }: DescribeWorldvolumesInput): Group[] {
  const parent = stacks.map((_, index) => index);
  const find = (index: number): number => {
    let root = index;
    while (parent[root] !== root) root = parent[root] as number;
    return root;
  };
  for (let i = 0; i < stacks.length; i += 1) {
    for (let j = i + 1; j < stacks.length; j += 1) {
      const summary = pair(i, j);
      const sameOrientation = theory === "bosonic" || (stacks[i] as Stack).anti === (stacks[j] as Stack).anti;
      if (summary.sector.nu === 0 && summary.coincident && sameOrientation) {
        const [low, high] = [find(i), find(j)].sort((x, y) => x - y) as [number, number];
        parent[high] = low;
      }
    }
  }
  const byRoot = new Map<number, Group>();
  stacks.forEach((stack, index) => {
    const root = find(index);
    const group = byRoot.get(root) ?? { members: [], rank: 0 };
    group.members.push(index);
    group.rank += stack.count;
    byRoot.set(root, group);
  });
  return [...byRoot.values()].sort((x, y) => (x.members[0] as number) - (y.members[0] as number));
}

interface Partner {
  group: Group;
  summary: PairSummary;
  role: WorldvolumeMatter["role"];
}

function describeGroup(group: Group, groups: readonly Group[], input: DescribeWorldvolumesInput): WorldvolumeTheory {
  const { stacks, theory, dimension } = input;
  const first = group.members[0] as number;
  const own = stacks[first] as Stack;
  const axes = new Set(own.worldvolume);
  const p = own.worldvolume.length;
  const ids = (members: readonly number[]): string[] => members.map((index) => (stacks[index] as Stack).id);

  const partners: Partner[] = [];
  const flavour: WorldvolumeGroup[] = [];
  const defects: WorldvolumeDefect[] = [];
  for (const other of groups) {
    if (other === group) continue;
    const head = other.members[0] as number;
    const stack = stacks[head] as Stack;
    const summary = input.pair(first, head);
    const fills = own.worldvolume.every((axis) => stack.worldvolume.includes(axis));
    if (!fills) {
      if (summary.coincident) defects.push({ stacks: ids(other.members), dimension: summary.sector.nn + 1 });
      continue;
    }
    const higher = stack.worldvolume.length > axes.size;
    if (higher) flavour.push({ stacks: ids(other.members), group: `U(${other.rank})`, dimension: stack.worldvolume.length + 1 });
    if (summary.lowest !== null) partners.push({ group: other, summary, role: higher ? "flavour" : "gauge" });
  }

  let supercharges: number | null = null;
  let chirality: WorldvolumeTheory["chirality"] = null;
  let supersymmetry = "no supersymmetry (bosonic string)";
  if (theory !== "bosonic") {
    const involved = [...group.members, ...partners.flatMap((partner) => partner.group.members)].map((index) => stacks[index] as Stack);
    const preserved = worldvolumeSupersymmetry(involved, own.worldvolume);
    supercharges = preserved.supercharges;
    chirality = preserved.chirality;
    supersymmetry = nameSupersymmetry(p + 1, preserved);
    // nu = 8 across a common Dirichlet axis: supersymmetric only with the created string (see the sector note).
    const created = partners.filter((partner) => partner.summary.sector.nu === 8 && partner.summary.sector.dd > 0);
    if (supercharges > 0 && created.length > 0) {
      supersymmetry += `, with a fundamental string stretched to ${quoteIds(created.flatMap((partner) => ids(partner.group.members)))}`;
    }
  }

  const matter = partners.map(
    (partner): WorldvolumeMatter => ({
      stacks: ids(partner.group.members),
      nu: partner.summary.sector.nu,
      role: partner.role,
      description: describeMatter(partner, { rank: group.rank, dimension: p + 1, theory, supercharges }),
      massSquared: massSquaredText(partner.summary),
    }),
  );

  const gaugeGroup = `U(${group.rank})`;
  const matterText = summaryList(
    matter.map((entry) => {
      const origin = entry.role === "gauge" ? ` (with ${quoteIds(entry.stacks)})` : flavour.length > 1 ? ` (from ${quoteIds(entry.stacks)})` : "";
      return `${entry.description}${origin}`;
    }),
    "matter",
  );
  const flavourText = flavour.length > 0 ? `; ${flavour.map((entry) => entry.group).join(" x ")} flavour` : "";
  const defectText = summaryList(
    defects.map((entry) => `${entry.dimension}d defect with ${quoteIds(entry.stacks)}`),
    "defects",
  );

  return {
    stacks: ids(group.members),
    worldvolume: [...own.worldvolume],
    dimension: p + 1,
    gaugeGroup,
    content: describeAdjointContent(theory, dimension, p),
    flavour,
    matter,
    defects,
    supercharges,
    chirality,
    supersymmetry,
    summary: `${p + 1}d: ${gaugeGroup}${matterText ? `, ${matterText}` : ""}${flavourText}${defectText ? `; ${defectText}` : ""}`,
  };
}

interface MatterContext {
  /** Rank N_A of the worldvolume's own gauge group. */
  rank: number;
  /** p + 1 of the worldvolume. */
  dimension: number;
  theory: Theory;
  /** Supercharges of the worldvolume theory (null for bosonic). */
  supercharges: number | null;
}

/**
 * The light states of strings from a worldvolume to one partner group, in field-theory words.
 * nu = 4 (type II): the NS ground states (2 complex scalars) and R ground states of both orientations
 * form a hypermultiplet of the pair's 8 supercharges, one per Chan-Paton pair, so N_B fundamental
 * hypermultiplets of U(N_A) (Polchinski vol. 2, section 13.4, from memory). nu = 8: the single R
 * ground state is one real fermionic mode in 0+1 dimensions or a chiral fermion in 1+1.
 */
function describeMatter(partner: Partner, context: MatterContext): string {
  const { summary, group, role } = partner;
  const { sector, lowest } = summary;
  const other = group.rank;
  const typeTwo = context.theory !== "bosonic";
  const value = summary.stretch + rationalToNumber(lowest as Rational);
  const massClause = summary.coincident || value < 0 ? "" : ` of mass M sqrt(alpha') = ${short(Math.sqrt(value))}`;
  const tachyonic = value < 0;
  // Prose keeps four significant digits of a decimal; `massSquared` keeps the engine's full text.
  const shown = summary.coincident ? massSquaredText(summary) : short(value);
  const lightest = `${tachyonic ? "a tachyon at" : "lightest"} alpha' M^2 = ${shown}`;

  if (role === "gauge") {
    const bifundamental = `the bifundamental of U(${context.rank}) x U(${other})`;
    if (sector.multiplet) {
      const what = typeTwo ? "a massive W-boson multiplet" : "massive W bosons";
      return `${what} in ${bifundamental}${massClause}`;
    }
    return `strings in ${bifundamental} with ${lightest}`;
  }
  if (typeTwo && sector.nu === 4) {
    const shortfall = context.supercharges !== null && context.supercharges < 8 ? " (a multiplet of the 8 supercharges of this pair)" : "";
    return `${countWord(other)} fundamental hypermultiplet${other === 1 ? "" : "s"}${massClause}${shortfall}`;
  }
  if (typeTwo && sector.nu === 8 && (context.dimension === 1 || context.dimension === 2)) {
    const kind = context.dimension === 1 ? "fermionic mode" : "chiral fermion";
    const where = context.dimension === 1 ? "0+1" : "1+1";
    return `${countWord(other)} fundamental ${kind}${other === 1 ? "" : "s"} in ${where} dimensions${massClause}`;
  }
  return `fundamental strings (${other} flavour${other === 1 ? "" : "s"}) with ${lightest}`;
}

/**
 * The massless content of a worldvolume's own strings, covariantly (the light-cone trace counts are
 * in the sector's massless list). Type II: the 10d vector multiplet reduced to p + 1 dimensions, a
 * gauge field with p - 1 polarisations, 9 - p adjoint scalars and 16 real fermions; in 0+1
 * dimensions A_0 is not dynamical, and in 1+1 the gauge field propagates nothing but carries
 * electric flux (common practice, from memory).
 */
function describeAdjointContent(theory: Theory, dimension: number, p: number): string {
  const scalars = (count: number): string => `${count} adjoint scalar${count === 1 ? "" : "s"}`;
  const gauge =
    p === 0
      ? null
      : p === 1
        ? "a gauge field with no propagating degrees of freedom (it still carries electric flux)"
        : `a gauge field (${p - 1} polarisation${p - 1 === 1 ? "" : "s"})`;
  const positions = dimension - 1 - p;
  if (theory !== "bosonic") {
    const parts = p === 0 ? [`${scalars(positions)} (positions)`, "a non-dynamical A_0"] : [gauge as string];
    if (p > 0 && positions > 0) parts.push(scalars(positions));
    return listInWords([...parts, "16 real fermions"]);
  }
  // a = -(D - 2)/24: the aa ground state is a tachyon unless D = 2.
  const tachyon = dimension > 2 ? `an adjoint tachyon at alpha' M^2 = ${formatRational(rational(-(dimension - 2), 24))}` : "";
  if (dimension !== 26) {
    const base = tachyon === "" ? "an adjoint scalar at alpha' M^2 = 0" : tachyon;
    return `${base}; away from D = 26 the level-1 vector and scalars are massive`;
  }
  const parts = p === 0 ? [`${scalars(positions)} (positions)`, "a non-dynamical A_0"] : [gauge as string];
  if (p > 0 && positions > 0) parts.push(scalars(positions));
  return `${listInWords(parts)}, with ${tachyon}`;
}

function massSquaredText(summary: PairSummary): string {
  const lowest = summary.lowest as Rational;
  return summary.coincident ? formatRational(lowest) : formatDecimal(summary.stretch + rationalToNumber(lowest));
}

function short(value: number): string {
  return formatDecimal(value, { significantDigits: 4 });
}

/** Entries a summary line names before it says how many more there are. */
const summaryEntries = 4;

/** The first entries joined by ", ", and "and K more <what>" past `summaryEntries`. */
function summaryList(entries: readonly string[], what: string): string {
  const shown = entries.slice(0, summaryEntries).join(", ");
  return entries.length > summaryEntries ? `${shown} and ${entries.length - summaryEntries} more ${what}` : shown;
}

function countWord(count: number): string {
  return count === 1 ? "one" : String(count);
}

function quoteIds(ids: readonly string[]): string {
  return ids.map((id) => `"${id}"`).join(", ");
}
