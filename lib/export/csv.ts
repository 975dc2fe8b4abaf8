/**
 * Spectrum as CSV, written by papaparse's `unparse` (RFC 4180: CRLF line ends, a field quoted
 * when it holds a comma, a quote, a line break or edge spaces, quotes doubled). Every record is
 * data: one header record, then one record per (sector, level). Nothing is rewritten: commas and
 * quotes in labels and notes stay as they are, quoted.
 *
 * The conventions, the caution and the configuration's title are in the last column,
 * `conventions`, of the first data record (empty below it), so the file stays one rectangular
 * table that any reader loads without options. The theory on each worldvolume is in the
 * `worldvolume` column of the rows of each stack's strings with itself, and a sector's notes
 * (which name its multiplet) in `sector_notes` on each of its rows.
 */
import Papa from "papaparse";
import type { SpectrumResult } from "@/lib/boundary/types";
import { formatWorldvolume, quantumNumberText, resultHasTower, sectorNames, unstretchedMassSquaredText, type StackNameSource } from "@/lib/spectrum";
import { conventionsLine, exportCaution } from "./caution";

/** Column names of the spectrum CSV, one row per (sector, level). */
export const spectrumCsvColumns = [
  "stack_a",
  "stack_b",
  "stack_a_label",
  "stack_b_label",
  "nn",
  "dd",
  "nu",
  "separation",
  "tachyonic",
  "supersymmetric",
  "sector",
  "oscillator_level",
  "alpha_prime_mass_squared",
  "alpha_prime_mass_squared_at_y0",
  "mass_sqrt_alpha_prime",
  "mass_gev",
  "states",
  "with_chan_paton",
  "note",
  "sector_notes",
  "worldvolume",
  "conventions",
] as const;

/**
 * Columns added before `conventions` when the result has compact axes: "level" for a level
 * row (the lightest momentum and winding) or "tower" for a tower state, and its quantum numbers
 * ("n9 = 1; w8 = -2", momentum n on NN axes and winding w on DD axes).
 */
export const towerCsvColumns = ["row", "quantum_numbers"] as const;

export interface SpectrumToCsvOptions {
  /** Title written into the conventions cell (e.g. the configuration title). */
  title?: string;
  /** The configuration's stacks, for the label columns (ids stand in where a stack is missing). */
  stacks?: readonly StackNameSource[];
  /** Further notes for the conventions cell, after the conventions (the orientifold summary and V(y) of each pair). */
  commentLines?: readonly string[];
}

/**
 * Renders a spectrum result as CSV.
 *
 * @param result - the engine result (exact rationals stay as strings like "-1/2")
 * @param options - the title for the conventions cell and the stacks for the label columns
 * @returns CSV text with CRLF line ends and a trailing CRLF; the first record is the header
 * @example
 * spectrumToCsv(result).split("\r\n")[0] // => "stack_a,stack_b,stack_a_label,..."
 */
export function spectrumToCsv(result: SpectrumResult, options: SpectrumToCsvOptions = {}): string {
  const names = sectorNames(options.stacks ?? []);
  const conventions = [
    `${options.title ? `${options.title}. ` : ""}${conventionsLine(result)} ${exportCaution}`,
    ...(options.commentLines ?? []),
  ].join(" | ");
  // The theory on a worldvolume goes on the rows of each of its stacks' strings with itself.
  const worldvolumeOf = new Map<string, string>();
  for (const worldvolume of result.worldvolumes) {
    const text = formatWorldvolume(worldvolume);
    for (const stack of worldvolume.stacks) worldvolumeOf.set(stack, text);
  }
  const tower = resultHasTower(result);
  const fields: string[] = tower
    ? [...spectrumCsvColumns.slice(0, -1), ...towerCsvColumns, "conventions"]
    : [...spectrumCsvColumns];
  const records: string[][] = [];
  const conventionsCell = () => (records.length === 0 ? conventions : "");
  for (const sector of result.sectors) {
    const [a, b] = sector.pair;
    const sectorNotes = sector.notes.join(" | ");
    const worldvolume = a === b ? (worldvolumeOf.get(a) ?? "") : "";
    const head = [
      a,
      b,
      names.stack(a),
      names.stack(b),
      String(sector.nn),
      String(sector.dd),
      String(sector.nu),
      String(sector.separation),
      String(sector.tachyonic),
      String(sector.supersymmetric),
    ];
    for (const row of sector.levels) {
      records.push([
        ...head,
        row.sector,
        row.level,
        row.massSquared,
        unstretchedMassSquaredText(row, sector.zeroPoint),
        row.mass === null ? "" : String(row.mass),
        row.massGeV === undefined || row.massGeV === null ? "" : String(row.massGeV),
        row.states ?? "",
        row.withChanPaton,
        row.note ?? "",
        sectorNotes,
        worldvolume,
        ...(tower ? ["level", ""] : []),
        conventionsCell(),
      ]);
    }
    for (const state of sector.tower ?? []) {
      records.push([
        ...head,
        state.sector,
        state.level,
        state.massSquared,
        "",
        state.mass === null ? "" : String(state.mass),
        state.massGeV === undefined || state.massGeV === null ? "" : String(state.massGeV),
        state.states ?? "",
        state.withChanPaton,
        "",
        sectorNotes,
        worldvolume,
        "tower",
        quantumNumberText(state, "; "),
        conventionsCell(),
      ]);
    }
  }
  if (records.length === 0) records.push(fields.map((column) => (column === "conventions" ? conventions : "")));
  return `${Papa.unparse({ fields, data: records }, { newline: "\r\n", escapeFormulae: formulaCell })}\r\n`;
}

/**
 * Cells a spreadsheet would run as a formula (OWASP, "CSV Injection"): text starting with "-",
 * "=", "+", "@", a tab or a CR, except plain numbers as the engine writes them (decimals,
 * exponents, exact fractions such as "-1/2"). papaparse prefixes such a cell with an apostrophe.
 *
 * @example
 * formulaCell.test("=HYPERLINK(\"x\")") // => true
 * formulaCell.test("-1/2")               // => false
 */
export const formulaCell = /^(?![-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?(?:\/\d+)?$)[-=+@\t\r]/i;
