/**
 * Reading the theory on each worldvolume of a result (`SpectrumResult.worldvolumes`) and the
 * pairs whose supersymmetry needs a created string, for the summary, the exports and the diff.
 *
 * Invalid-input policy: nothing throws; a result stored before worldvolumes were recorded reads
 * as having none (its warning says so).
 */
import type { Sector, SpectrumResult, WorldvolumeTheory } from "@/lib/boundary/types";

/**
 * One line per worldvolume: its summary and its supersymmetry.
 *
 * @param worldvolume - `summary` and `supersymmetry` are read.
 * @returns E.g. "4d: U(2), one fundamental hypermultiplet; U(1) flavour; 4d N=2".
 * @example
 * formatWorldvolume({ summary: "2d: U(1)", supersymmetry: "2d (8,8)" }) // => "2d: U(1); 2d (8,8)"
 */
export function formatWorldvolume(worldvolume: Pick<WorldvolumeTheory, "summary" | "supersymmetry">): string {
  return `${worldvolume.summary}; ${worldvolume.supersymmetry}`;
}

/**
 * A key for a worldvolume that stays the same while its stacks do: for lists and the diff.
 *
 * @example
 * worldvolumeKey({ stacks: ["a", "b"] }) // => "a|b"
 */
export function worldvolumeKey(worldvolume: Pick<WorldvolumeTheory, "stacks">): string {
  return worldvolume.stacks.join("|");
}

/**
 * The sectors whose supersymmetry holds only with a fundamental string stretched between the
 * stacks: nu = 8 with a common Dirichlet axis to be separated along (string creation; the engine's
 * sector note says so).
 *
 * @param result - `theory` and each sector's `nu` and `dd` are read (full sectors or overviews).
 * @returns Those sectors in the order of the result; none for the bosonic string.
 * @example
 * stringCreationSectors(pointAndWall).map((sector) => sector.pair) // => [["point", "wall"]]
 */
export function stringCreationSectors<S extends Pick<Sector, "nu" | "dd">>(
  result: Pick<SpectrumResult, "theory"> & { sectors: readonly S[] },
): S[] {
  if (result.theory === "bosonic") return [];
  return result.sectors.filter((sector) => sector.nu === 8 && sector.dd > 0);
}

/** A worldvolume with its lists cut for a page, and how many entries of each were left out. */
export type ListedWorldvolume = WorldvolumeTheory & {
  omitted: { matter: number; flavour: number; defects: number };
};

/**
 * A worldvolume for a page: at most `max` entries of each of `matter`, `flavour` and `defects`
 * (in the engine's order), with the counts left out. With 64 stacks every worldvolume meets
 * dozens of others, and the full lists would make the results page megabytes long; the full
 * lists stay in the stored result and its exports.
 *
 * @param worldvolume - Not mutated.
 * @param max - Entries kept per list (at least 0).
 * @example
 * listWorldvolume(wideWorldvolume, 8).omitted.matter // => wideWorldvolume.matter.length - 8
 */
export function listWorldvolume(worldvolume: WorldvolumeTheory, max: number): ListedWorldvolume {
  const keep = Math.max(0, Math.floor(max));
  return {
    ...worldvolume,
    matter: worldvolume.matter.slice(0, keep),
    flavour: worldvolume.flavour.slice(0, keep),
    defects: worldvolume.defects.slice(0, keep),
    omitted: {
      matter: Math.max(0, worldvolume.matter.length - keep),
      flavour: Math.max(0, worldvolume.flavour.length - keep),
      defects: Math.max(0, worldvolume.defects.length - keep),
    },
  };
}
