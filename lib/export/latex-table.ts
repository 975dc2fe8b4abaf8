/**
 * Spectrum as a LaTeX table ready to paste into a paper (needs `\usepackage{booktabs}`).
 * alpha' M^2 is typeset as a fraction when exact; conventions and the caution go into the
 * caption and a leading comment.
 */
import type { SpectrumResult } from "@/lib/boundary/types";
import { parseExactRational, parseResultNumber } from "@/lib/spectrum";
import { conventionsLine, exportCaution } from "./caution";

export interface SpectrumToLatexTableOptions {
  /** Caption title (e.g. the configuration title). */
  title?: string;
  /** Highest oscillator level to include, as a number (default: every level in the result). */
  maxLevel?: number;
  /** `\label{...}` of the table (default "tab:spectrum"). */
  label?: string;
}

/**
 * Renders a spectrum result as a booktabs table, one row per (sector, level).
 *
 * @example
 * spectrumToLatexTable(result).includes("\\toprule") // => true
 */
export function spectrumToLatexTable(result: SpectrumResult, options: SpectrumToLatexTableOptions = {}): string {
  const lines: string[] = [
    `% Mooring spectrum table. ${conventionsLine(result)}`,
    `% ${exportCaution}`,
    "% Requires \\usepackage{booktabs}.",
    "\\begin{table}[ht]",
    "  \\centering",
    "  \\begin{tabular}{llrrlrr}",
    "    \\toprule",
    "    Strings & $\\nu$ & $y/\\sqrt{\\alpha'}$ & Sector & $N$ & $\\alpha' M^2$ & States \\\\",
    "    \\midrule",
  ];
  for (const sector of result.sectors) {
    const rows = sector.levels.filter(
      (row) => options.maxLevel === undefined || parseResultNumber(row.level) <= options.maxLevel,
    );
    for (const row of rows) {
      lines.push(
        "    " +
          [
            `${escapeLatex(sector.pair[0])}--${escapeLatex(sector.pair[1])}`,
            `$${sector.nu}$`,
            `$${formatSeparation(sector.separation)}$`,
            row.sector,
            `$${toLatexNumber(row.level)}$`,
            `$${toLatexNumber(row.massSquared)}$`,
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
      "$\\alpha' M^2 = (y/2\\pi)^2 + N + a$; states counted over both orientations and all " +
      `Chan--Paton labels. ${escapeLatex(exportCaution)}}`,
    `  \\label{${options.label ?? "tab:spectrum"}}`,
    "\\end{table}",
  );
  return lines.join("\n") + "\n";
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
