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
  it("adds the row kind and the quantum numbers to the CSV", () => {
    const lines = spectrumToCsv(result).split("\r\n");
    const header = lines.find((line) => line.startsWith("stack_a,"));
    expect(header).toBe([...spectrumCsvColumns, ...towerCsvColumns].join(","));
    expect(lines).toContain("a,a,1,8,0,0,false,true,NS,1/2,4,,2,8,8,,tower,n9 = -1");
    expect(lines).toContain("a,a,1,8,0,0,false,true,NS,1/2,4,,2,8,8,,tower,n9 = 1");
    expect(lines.some((line) => line.endsWith(",level,"))).toBe(true);
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
