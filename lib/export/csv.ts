/**
 * Spectrum as CSV (RFC 4180: CRLF line ends, fields quoted when they hold a comma, quote,
 * CR or LF, with quotes doubled). The first records are single-field comments starting with
 * "#": the conventions and the caution, then the theory on each worldvolume, then the notes of
 * each sector (which name its multiplet); spreadsheet users can delete them, and most CSV
 * readers accept a `comment: "#"` option.
 */
import type { SpectrumResult } from "@/lib/boundary/types";
import { formatWorldvolume, unstretchedMassSquaredText } from "@/lib/spectrum";
import { conventionsLine, exportCaution } from "./caution";

/** Column names of the spectrum CSV, one row per (sector, level). */
export const spectrumCsvColumns = [
  "stack_a",
  "stack_b",
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
  "states",
  "with_chan_paton",
  "note",
] as const;

export interface SpectrumToCsvOptions {
  /** Title written into the comment record (e.g. the configuration title). */
  title?: string;
  /** Extra comment lines after the worldvolumes (the orientifold summary and V(y) of each pair). */
  commentLines?: readonly string[];
}

/**
 * Renders a spectrum result as CSV.
 *
 * @param result - the engine result (exact rationals stay as strings like "-1/2")
 * @returns CSV text with CRLF line ends and a trailing CRLF
 * @example
 * spectrumToCsv(result).split("\r\n")[1] // => "stack_a,stack_b,nn,..."
 */
export function spectrumToCsv(result: SpectrumResult, options: SpectrumToCsvOptions = {}): string {
  const title = options.title ? `${options.title}. ` : "";
  const comments = [`${title}${conventionsLine(result)} ${exportCaution}`];
  for (const worldvolume of result.worldvolumes) {
    comments.push(`Worldvolume of ${worldvolume.stacks.join(" + ")}: ${formatWorldvolume(worldvolume)}`);
  }
  comments.push(...(options.commentLines ?? []));
  // The notes name a sector's multiplet too (the W bosons of separated stacks).
  for (const sector of result.sectors) {
    if (sector.notes.length > 0) comments.push(`Sector ${sector.pair[0]}-${sector.pair[1]}: ${sector.notes.join(" | ")}`);
  }
  const records: string[][] = [...comments.map((text) => [commentRecord(text)]), [...spectrumCsvColumns]];
  for (const sector of result.sectors) {
    for (const row of sector.levels) {
      records.push([
        sector.pair[0],
        sector.pair[1],
        String(sector.nn),
        String(sector.dd),
        String(sector.nu),
        String(sector.separation),
        String(sector.tachyonic),
        String(sector.supersymmetric),
        row.sector,
        row.level,
        row.massSquared,
        unstretchedMassSquaredText(row, sector.zeroPoint),
        row.mass === null ? "" : String(row.mass),
        row.states ?? "",
        row.withChanPaton,
        row.note ?? "",
      ]);
    }
  }
  return records.map((record) => record.map((field) => quoteCsvField(neutralizeCsvFormula(field))).join(",")).join("\r\n") + "\r\n";
}

/** One comment record: a single unquoted field, so readers with `comment: "#"` skip it. */
function commentRecord(text: string): string {
  return `# ${text}`.replace(/[\r\n]+/g, " ").replace(/,/g, ";").replace(/"/g, "'");
}

/**
 * Quotes one CSV field per RFC 4180 section 2 (rules 5-7).
 *
 * @example
 * quoteCsvField('say "hi", then') // => '"say ""hi"", then"'
 */
export function quoteCsvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replaceAll('"', '""')}"` : value;
}

// A spreadsheet reads a cell starting with one of these as a formula (OWASP, "CSV Injection").
const formulaStart = /^[-=+@\t\r]/;
// Numbers as the engine writes them: decimals, exponents and exact fractions such as "-1/2".
const plainNumber = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?(?:\/\d+)?$/i;

/**
 * Keeps a spreadsheet from running a cell as a formula: text starting with "-", "=", "+", "@", a
 * tab or a CR gets a leading apostrophe (OWASP's advice). Plain numbers, negative masses squared
 * like "-1/4" included, stay as they are.
 *
 * @example
 * neutralizeCsvFormula("=HYPERLINK(\"x\")") // => "'=HYPERLINK(\"x\")"
 * neutralizeCsvFormula("-1/2")               // => "-1/2"
 */
export function neutralizeCsvFormula(value: string): string {
  return formulaStart.test(value) && !plainNumber.test(value) ? `'${value}` : value;
}
