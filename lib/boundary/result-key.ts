/**
 * The canonical text of everything in a configuration that its spectrum result depends on, so
 * that equal texts have equal results (for one engine version) and a stored result can be reused
 * for an unchanged document (content addressing of results).
 *
 * Left out because no field of the result reads them: the document's `title` and `description`
 * and each stack's display `colour`. Made canonical because the result does not depend on them:
 * the order of the stacks (sectors and warnings come in id order), the order of object keys, and
 * whether a Dirichlet position or a Wilson line of 0 is written or left out (a missing one is 0); the
 * same for orientifold planes (their `label` is display-only, their order is by id). Every
 * other field is kept as it is, so a field added to the format changes the key until it is listed
 * here on purpose.
 */

import type { Configuration } from "./types";

/** Document fields that no part of the result reads. */
const displayOnlyFields = new Set(["title", "description"]);
/** Stack fields that no part of the result reads. */
const displayOnlyStackFields = new Set(["colour"]);
/** Orientifold plane fields that no part of the result reads. */
const displayOnlyPlaneFields = new Set(["label"]);

/**
 * Canonical JSON text of the result-relevant part of a configuration.
 *
 * @param config - Any configuration value (not mutated; need not be valid).
 * @returns Sorted-key JSON without the display-only fields, with stacks in id order and zero
 *   positions dropped.
 * @example
 * resultInputKey({ ...config, title: "A" }) === resultInputKey({ ...config, title: "B" }) // => true
 */
export function resultInputKey(config: Configuration): string {
  const entries = Object.entries(config).filter(([key]) => !displayOnlyFields.has(key));
  const canonical: Record<string, unknown> = {
    stacks: canonicalObjects(config.stacks, displayOnlyStackFields),
    orientifolds: config.orientifolds ? canonicalObjects(config.orientifolds, displayOnlyPlaneFields) : undefined,
  };
  return canonicalJson(Object.fromEntries(entries.map(([key, value]) => [key, key in canonical ? canonical[key] : value])));
}

/** Objects with an id and positions in id order, without their display-only fields and zero positions or Wilson lines. */
function canonicalObjects<T extends { id: string; position: Record<string, number>; wilson?: Record<string, number> }>(list: readonly T[], displayOnly: ReadonlySet<string>): unknown[] {
  return [...list]
    .sort((x, y) => (x.id < y.id ? -1 : x.id > y.id ? 1 : 0))
    .map((item) => {
      const kept = Object.entries(item).filter(([key]) => !displayOnly.has(key));
      const position = Object.entries(item.position ?? {}).filter(([, value]) => value !== 0);
      const wilson = Object.entries(item.wilson ?? {}).filter(([, value]) => value !== 0);
      return Object.fromEntries(
        kept
          .filter(([key]) => key !== "wilson" || wilson.length > 0)
          .map(([key, value]) => [key, key === "position" ? Object.fromEntries(position) : key === "wilson" ? Object.fromEntries(wilson) : value]),
      );
    });
}

/** JSON with object keys sorted at every depth (arrays keep their order). */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value !== null && typeof value === "object") {
    const keys = Object.keys(value).sort();
    return `{${keys
      .filter((key) => (value as Record<string, unknown>)[key] !== undefined)
      .map((key) => `${JSON.stringify(key)}:${canonicalJson((value as Record<string, unknown>)[key])}`)
      .join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}
