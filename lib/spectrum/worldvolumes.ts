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
