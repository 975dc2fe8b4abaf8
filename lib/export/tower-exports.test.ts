import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { spectrumCsvColumns, spectrumToCsv, towerCsvColumns } from "./csv";
import { spectrumToLatexTable } from "./latex-table";

// A D1 wrapped on a circle of radius 1/2: momentum states add n^2 / R^2 = 4 n^2 to alpha' M^2
// (Polchinski vol. 1, section 8.6, from memory).
const result = computeSpectrum({
  format: 2,
  title: "Wrapped D1",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 4,
  compact: { "9": 0.5 },
  stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [9], position: {} }],
});

describe("exports of a result on a circle", () => {
  it("adds the row kind and the quantum numbers to the CSV, before the conventions column", () => {
    const parsed = Papa.parse<Record<string, string>>(spectrumToCsv(result).trimEnd(), { header: true, newline: "\r\n" });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...spectrumCsvColumns.slice(0, -1), ...towerCsvColumns, "conventions"]);
    const towerRows = parsed.data.filter((row) => row.row === "tower");
    // n = +-1 on R = 1/2 over the massless NS level: alpha' M^2 = 4, M sqrt(alpha') = 2.
    for (const n of ["n9 = -1", "n9 = 1"]) {
      expect(towerRows.find((row) => row.quantum_numbers === n)).toMatchObject({
        stack_a: "a",
        stack_b: "a",
        sector: "NS",
        oscillator_level: "1/2",
        alpha_prime_mass_squared: "4",
        mass_sqrt_alpha_prime: "2",
        states: "8",
        with_chan_paton: "8",
      });
    }
    expect(parsed.data.some((row) => row.row === "level" && row.quantum_numbers === "")).toBe(true);
  });

  it("adds a tower table with n and w to the LaTeX", () => {
    const latex = spectrumToLatexTable(result, { label: "tab:d1" });
    expect(latex).toContain("\\label{tab:d1-tower}");
    expect(latex).toContain("a--a & NS, $\\tfrac{1}{2}$ & $n_{9} = 1$ & $4$ & $8$ \\\\");
  });

  it("keeps the flat CSV columns for a result without compact axes", () => {
    const flat = computeSpectrum({
      format: 1,
      title: "flat",
      theory: "IIB",
      stringScaleGeV: null,
      levels: 1,
      stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [9], position: {} }],
    });
    expect(spectrumToCsv(flat).split("\r\n")).toContain(spectrumCsvColumns.join(","));
  });
});
