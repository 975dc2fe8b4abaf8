/**
 * How stacks and sectors are named and ordered wherever a result is shown: by the stacks' labels
 * (the ids stay available for a tooltip), matched by label or id in filters, and in natural order
 * ("s2" before "s10"). The engine keys everything by id; this is the one place that turns ids
 * into the names a reader sees.
 *
 * Invalid-input policy: pure and total; an id that no stack has is named by the id itself, an
 * empty label falls back to the id, and two stacks sharing a label are told apart by their ids.
 */

/** What naming needs of a stack. */
export interface StackNameSource {
  id: string;
  label?: string | null;
}

/** The name of a sector, for display. */
export interface SectorName {
  /** The stacks' names joined by an en dash, e.g. "wall\u2013probe". */
  text: string;
  /** The stack ids joined the same way, e.g. "w\u2013p", for a tooltip. */
  ids: string;
}

/** Names and order of the stacks of one configuration (see {@link sectorNames}). */
export interface SectorNames {
  /** The display name of a stack: its label, or its id when the label is empty. */
  stack(id: string): string;
  /** The display name of a sector, with the ids for a tooltip. */
  sector(pair: readonly [string, string]): SectorName;
  /** Natural order of sectors by their names (first stack, then second). */
  compare(a: readonly [string, string], b: readonly [string, string]): number;
  /** Whether one of the sector's stacks has a name or id containing `text` (case-insensitive; empty text matches). */
  matches(pair: readonly [string, string], text: string): boolean;
}

/**
 * Builds the names of a configuration's stacks and sectors.
 *
 * @param stacks - The configuration's stacks (id and label); not mutated.
 * @returns Functions naming, ordering and matching sectors.
 * @example
 * const names = sectorNames([{ id: "w", label: "wall" }, { id: "p", label: "probe" }]);
 * names.sector(["w", "p"])         // => { text: "wall\u2013probe", ids: "w\u2013p" }
 * names.matches(["w", "p"], "PRO") // => true
 */
export function sectorNames(stacks: readonly StackNameSource[]): SectorNames {
  const labelCounts = new Map<string, number>();
  for (const stack of stacks) {
    const label = stack.label?.trim() ?? "";
    if (label !== "") labelCounts.set(label, (labelCounts.get(label) ?? 0) + 1);
  }
  const byId = new Map<string, string>();
  for (const stack of stacks) {
    const label = stack.label?.trim() ?? "";
    if (label === "") byId.set(stack.id, stack.id);
    else byId.set(stack.id, (labelCounts.get(label) ?? 0) > 1 && label !== stack.id ? `${label} (${stack.id})` : label);
  }
  const stack = (id: string) => byId.get(id) ?? id;
  return {
    stack,
    sector: (pair) => ({ text: `${stack(pair[0])}\u2013${stack(pair[1])}`, ids: `${pair[0]}\u2013${pair[1]}` }),
    compare: (a, b) => compareNatural(stack(a[0]), stack(b[0])) || compareNatural(stack(a[1]), stack(b[1])),
    matches: (pair, text) => {
      const needle = text.trim().toLowerCase();
      if (needle === "") return true;
      return pair.some((id) => id.toLowerCase().includes(needle) || stack(id).toLowerCase().includes(needle));
    },
  };
}

/**
 * Natural order of two names: runs of digits compare by value ("s2" before "s10"), letters
 * without regard to case; names equal that way fall back to code-unit order so the order is total.
 *
 * @param a - One name.
 * @param b - The other.
 * @returns Negative when `a` comes first, positive when `b` does, 0 only for identical strings.
 * @example
 * ["s10", "s2", "S1"].sort(compareNatural) // => ["S1", "s2", "s10"]
 */
export function compareNatural(a: string, b: string): number {
  return collator.compare(a, b) || (a < b ? -1 : a > b ? 1 : 0);
}

// A fixed locale: the server render and the browser must order alike.
const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });
