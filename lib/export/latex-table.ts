/**
 * Spectrum as LaTeX tables ready to paste into a paper (needs `\usepackage{booktabs}`): the
 * levels of every sector, then the theory on each worldvolume. alpha' M^2 is typeset as a
 * fraction when exact; conventions and the caution go into the captions and leading comments,
 * and the sectors' notes (with their multiplets) into comments.
 */
import { rationalToNumber } from "@/lib/boundary/rational";
import type { SpectrumResult } from "@/lib/boundary/types";
import { parseExactRational, quantumNumbers, resultHasTower, sectorNames, unstretchedMassSquared, type StackNameSource } from "@/lib/spectrum";
import { conventionsLine, exportCaution } from "./caution";

export interface SpectrumToLatexTableOptions {
  /** Caption title (e.g. the configuration title). */
  title?: string;
  /** Extra comment lines after the header (the orientifold summary and V(y) of each pair). */
  commentLines?: readonly string[];
  /** Highest alpha' M^2 at zero separation (N + a) to include (default: every level in the result). */
  massCap?: number;
  /** `\label{...}` of the levels table (default "tab:spectrum"; the worldvolume table adds "-worldvolumes"). */
  label?: string;
  /** The configuration's stacks: the table names the strings by the stacks' labels (ids where missing). */
  stacks?: readonly StackNameSource[];
}

/**
 * Renders a spectrum result as booktabs tables: one row per (sector, level), then one per worldvolume.
 *
 * @example
 * spectrumToLatexTable(result).includes("\\toprule") // => true
 */
export function spectrumToLatexTable(result: SpectrumResult, options: SpectrumToLatexTableOptions = {}): string {
  const label = options.label ?? "tab:spectrum";
  const names = sectorNames(options.stacks ?? []);
  const lines: string[] = [
    `% Mooring spectrum table. ${conventionsLine(result)}`,
    `% ${exportCaution}`,
    "% Requires \\usepackage{booktabs}.",
    ...(options.commentLines ?? []).map((line) => `% ${line.replace(/[\r\n]+/g, " ")}`),
  ];
  // The notes name a sector's multiplet too (the W bosons of separated stacks).
  for (const sector of result.sectors) {
    for (const note of sector.notes) lines.push(`% ${sector.pair[0]}-${sector.pair[1]}: ${note.replace(/[\r\n]+/g, " ")}`);
  }
  lines.push(
    "\\begin{table}[ht]",
    "  \\centering",
    "  \\begin{tabular}{lrrlrrrr}",
    "    \\toprule",
    "    Strings & $\\nu$ & $y/\\sqrt{\\alpha'}$ & Sector & Level $N$ & $\\alpha' M^2$ & States & With Chan--Paton \\\\",
    "    \\midrule",
  );
  for (const sector of result.sectors) {
    const rows = sector.levels.filter((row) => {
      if (options.massCap === undefined) return true;
      const unstretched = unstretchedMassSquared(row, sector.zeroPoint);
      return unstretched === null || rationalToNumber(unstretched) <= options.massCap;
    });
    for (const row of rows) {
      lines.push(
        "    " +
          [
            `${escapeLatex(names.stack(sector.pair[0]))}--${escapeLatex(names.stack(sector.pair[1]))}`,
            `$${sector.nu}$`,
            `$${formatSeparation(sector.separation)}$`,
            row.sector,
            `$${toLatexNumber(row.level)}$`,
            `$${toLatexNumber(row.massSquared)}$`,
            row.states === null ? "---" : `$${row.states}$`,
            `$${row.withChanPaton}$`,
          ].join(" & ") +
          " \\\\",
      );
    }
  }
  const title = options.title ? `${escapeLatex(options.title)}: open-string` : "Open-string";
  lines.push(
    "    \\bottomrule",
    "  \\end{tabular}",
    `  \\caption{${title} spectrum, ${escapeLatex(result.theory)} in $D = ${result.dimension}$. ` +
      "Conventions: $\\alpha' = 1$, separations $y$ in units of $\\sqrt{\\alpha'}$, " +
      "$\\alpha' M^2 = (y/2\\pi)^2 + N + a$ with $N$ the oscillator level, every sector listed up to the same " +
      "$\\alpha' M^2$ at $y = 0$. States are light-cone trace counts of one oriented string per Chan--Paton " +
      "index pair (--- where the two orientations differ); With Chan--Paton totals both orientations and all " +
      `Chan--Paton labels. ${escapeLatex(exportCaution)}}`,
    `  \\label{${label}}`,
    "\\end{table}",
  );
  if (result.worldvolumes.length > 0) lines.push(...worldvolumeTable(result, options.title, label));
  if (resultHasTower(result)) lines.push(...towerTable(result, options.title, label));
  return lines.join("\n") + "\n";
}

/** The tower of momentum and winding states of every sector (a result on compact axes). */
function towerTable(result: SpectrumResult, title: string | undefined, label: string): string[] {
  const lines = [
    "\\begin{table}[ht]",
    "  \\centering",
    "  \\begin{tabular}{lllrr}",
    "    \\toprule",
    "    Strings & Sector, level $N$ & Momentum $n$, winding $w$ & $\\alpha' M^2$ & States \\\\",
    "    \\midrule",
  ];
  for (const sector of result.sectors) {
    for (const state of sector.tower ?? []) {
      const numbers = quantumNumbers(state).map((entry) => `${entry.kind}_{${entry.axis}} = ${entry.value}`);
      lines.push(
        "    " +
          [
            `${escapeLatex(sector.pair[0])}--${escapeLatex(sector.pair[1])}`,
            `${state.sector}, $${toLatexNumber(state.level)}$`,
            numbers.length > 0 ? `$${numbers.join(",\\ ")}$` : "none",
            `$${toLatexNumber(state.massSquared)}$`,
            `$${state.withChanPaton}$`,
          ].join(" & ") +
          " \\\\",
      );
    }
  }
  const heading = title ? `${escapeLatex(title)}: momentum` : "Momentum";
  lines.push(
    "    \\bottomrule",
    "  \\end{tabular}",
    `  \\caption{${heading} and winding states on the compact axes, up to the mass cap: $\\alpha' M^2 = N + a + ` +
      "\\sum_{NN} ((n + (\\theta_b - \\theta_a)/2\\pi)/R)^2 + \\sum_{DD} ((\\Delta x + 2\\pi R w)/2\\pi)^2$ " +
      "(plus the stretching along non-compact axes), $\\alpha' = 1$, radii and positions in units of $\\sqrt{\\alpha'}$; " +
      `the string from $b$ to $a$ has the opposite numbers. ${escapeLatex(exportCaution)}}`,
    `  \\label{${label}-tower}`,
    "\\end{table}",
  );
  return lines;
}

function worldvolumeTable(result: SpectrumResult, title: string | undefined, label: string): string[] {
  const lines = [
    "\\begin{table}[ht]",
    "  \\centering",
    "  \\begin{tabular}{lrlp{0.45\\linewidth}l}",
    "    \\toprule",
    "    Stacks & $d$ & Gauge group & Strings from other stacks & Supersymmetry \\\\",
    "    \\midrule",
  ];
  for (const worldvolume of result.worldvolumes) {
    const others = [
      ...worldvolume.matter.map((matter) => `${matter.description} (${matter.role} stacks ${matter.stacks.join(", ")})`),
      ...(worldvolume.flavour.length > 0 ? [`${worldvolume.flavour.map((group) => group.group).join(" x ")} flavour`] : []),
      ...worldvolume.defects.map((defect) => `${defect.dimension}d defect with ${defect.stacks.join(", ")}`),
    ];
    lines.push(
      "    " +
        [
          escapeLatex(worldvolume.stacks.join(", ")),
          `$${worldvolume.dimension}$`,
          `$${worldvolume.gaugeGroup}$`,
          others.length > 0 ? latexProse(others.join("; ")) : "none",
          latexProse(worldvolume.supersymmetry),
        ].join(" & ") +
        " \\\\",
    );
  }
  const heading = title ? `${escapeLatex(title)}: worldvolume` : "Worldvolume";
  lines.push(
    "    \\bottomrule",
    "  \\end{tabular}",
    `  \\caption{${heading} theories, ${escapeLatex(result.theory)} in $D = ${result.dimension}$: gauge group of each set of ` +
      "coincident stacks, light states of the strings from stacks that fill its worldvolume (the groups of higher-dimensional " +
      `stacks act as flavour symmetries), and the supersymmetry it preserves. ${escapeLatex(exportCaution)}}`,
    `  \\label{${label}-worldvolumes}`,
    "\\end{table}",
  );
  return lines;
}

/**
 * Escapes engine prose for LaTeX and typesets the few formulas it contains (alpha' M^2,
 * M sqrt(alpha'), nu, "N=2"), with quoted ids as LaTeX quotes.
 *
 * @example
 * latexProse("one fundamental hypermultiplet of mass M sqrt(alpha') = 0.2387") // => "one fundamental hypermultiplet of mass $M\\sqrt{\\alpha'}$ = 0.2387"
 */
export function latexProse(text: string): string {
  return escapeLatex(text)
    .replaceAll("alpha' M\\textasciicircum{}2", "$\\alpha' M^2$")
    .replaceAll("M sqrt(alpha')", "$M\\sqrt{\\alpha'}$")
    .replace(/\bnu = /g, "$\\nu$ = ")
    .replace(/"([^"]*)"/g, "``$1''")
    .replace(/N=(\d+)/g, "$\\mathcal{N}=$1$");
}

/**
 * Typesets an exact rational string as LaTeX: "-1/2" -> "-\tfrac{1}{2}", "3" -> "3";
 * decimals stay as they are.
 *
 * @example
 * toLatexNumber("-3/2") // => "-\\tfrac{3}{2}"
 */
export function toLatexNumber(value: string): string {
  const exact = parseExactRational(value);
  if (!exact) return value.trim();
  if (exact.den === 1n) return exact.num.toString();
  const sign = exact.num < 0n ? "-" : "";
  const magnitude = exact.num < 0n ? -exact.num : exact.num;
  return `${sign}\\tfrac{${magnitude}}{${exact.den}}`;
}

/**
 * Escapes the ten LaTeX special characters in free text.
 *
 * @example
 * escapeLatex("a_b & 50%") // => "a\\_b \\& 50\\%"
 */
export function escapeLatex(text: string): string {
  const replacements: Record<string, string> = {
    "\\": "\\textbackslash{}",
    "{": "\\{",
    "}": "\\}",
    "#": "\\#",
    $: "\\$",
    "%": "\\%",
    "&": "\\&",
    _: "\\_",
    "~": "\\textasciitilde{}",
    "^": "\\textasciicircum{}",
  };
  return text.replace(/[\\{}#$%&_~^]/g, (char) => replacements[char] ?? char);
}

function formatSeparation(value: number): string {
  // Four significant decimals are plenty for a table; exact integers print as integers.
  return Number.isInteger(value) ? String(value) : String(Number(value.toFixed(4)));
}
