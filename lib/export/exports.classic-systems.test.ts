import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { spectrumCsvColumns, spectrumToCsv } from "./csv";
import { latexProse, spectrumToLatexTable } from "./latex-table";

// What a researcher finds in the exports of the classic systems: the worldvolume theories, the mass
// cap, the named multiplets and the notes (issue 14). Physics values are checked in lib/boundary.

const axes = (from: number, to: number): number[] => Array.from({ length: to - from + 1 }, (_, i) => from + i);

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function config(theory: Configuration["theory"], stacks: Stack[]): Configuration {
  return { format: 1, title: "Classic", theory, stringScaleGeV: null, levels: 2, stacks };
}

const d3d7 = computeSpectrum(config("IIB", [stack("d3", [1, 2, 3], { count: 2 }), stack("d7", axes(1, 7))]));
const d0d8 = computeSpectrum(config("IIA", [stack("d8", axes(1, 8)), stack("d0", [], { position: { "9": 1 } })]));
const separated = computeSpectrum(config("IIB", [stack("a", [1, 2, 3]), stack("b", [1, 2, 3], { position: { "9": 2 * Math.PI } })]));

function csvRows(result: ReturnType<typeof computeSpectrum>): Record<string, string>[] {
  const csv = spectrumToCsv(result, { title: "Classic" }).replace(/\r\n$/, "");
  const parsed = Papa.parse<Record<string, string>>(csv, { header: true, delimiter: ",", newline: "\r\n" });
  expect(parsed.errors).toEqual([]);
  expect(parsed.meta.fields).toEqual([...spectrumCsvColumns]);
  return parsed.data;
}

describe("spectrumToCsv on the classic systems", () => {
  it("gives each worldvolume's theory on the rows of its stack's strings with itself (D3-D7: the 4d N=2 line)", () => {
    // D3-D7: 4d N=2 U(2), one fundamental hypermultiplet, U(1) flavour (common practice, from memory).
    const rows = csvRows(d3d7);
    const d3 = rows.filter((row) => row.stack_a === "d3" && row.stack_b === "d3");
    expect(d3.length).toBeGreaterThan(0);
    expect(d3.every((row) => row.worldvolume === d3.at(0)?.worldvolume)).toBe(true);
    expect(d3.at(0)?.worldvolume).toMatch(/^4d: U\(2\). one fundamental hypermultiplet. U\(1\) flavour. 4d N=2$/);
    expect(rows.find((row) => row.stack_a === "d7" && row.stack_b === "d7")?.worldvolume).toMatch(/^8d: U\(1\). 4d defect with "d3". 8d N=1$/);
    expect(rows.filter((row) => row.stack_a !== row.stack_b).every((row) => row.worldvolume === "")).toBe(true);
  });

  it("labels the oscillator level and gives alpha' M^2 at y = 0 beside alpha' M^2", () => {
    const row = csvRows(separated).find((r) => r.stack_a === "a" && r.stack_b === "b" && r.sector === "NS" && r.oscillator_level === "1/2");
    // y = 2 pi: alpha' M^2 = 1 + N + a with N + a = 0 (physics.md, mass formula).
    expect(row?.alpha_prime_mass_squared).toBe("1");
    expect(row?.alpha_prime_mass_squared_at_y0).toBe("0");
  });

  it("carries the W-boson multiplet and the string-creation note in the sector notes", () => {
    const w = csvRows(separated).find((row) => row.stack_a === "a" && row.stack_b === "b")?.sector_notes;
    expect(w).toContain("massive W-boson vector multiplet (short, 16 supercharges) in 4 dimensions: one massive vector (3 polarisations)");
    const note = csvRows(d0d8).find((row) => row.stack_a === "d0" && row.stack_b === "d8")?.sector_notes;
    expect(note).toContain("constant force");
    expect(note).toContain("string creation");
  });

  it("states M_s = 1/sqrt(alpha') and the mass cap in the conventions cell", () => {
    expect(csvRows(d3d7)[0]?.conventions).toContain("M_s = 1/sqrt(alpha')");
    expect(csvRows(d3d7)[0]?.conventions).toContain("N + a <= levels");
  });
});

describe("spectrumToLatexTable on the classic systems", () => {
  const tex = spectrumToLatexTable(d3d7, { title: "D3 and D7", label: "tab:d3d7" });

  it("adds a worldvolume table with the flavour group and 4d N=2", () => {
    expect(tex).toContain("\\label{tab:d3d7-worldvolumes}");
    expect(tex).toContain("    d3 & $4$ & $U(2)$ & one fundamental hypermultiplet (flavour stacks d7); U(1) flavour");
    expect(tex).toContain("& 4d $\\mathcal{N}=2$ \\\\");
    const opens = (tex.match(/(?<!\\)\{/g) ?? []).length;
    const closes = (tex.match(/(?<!\\)\}/g) ?? []).length;
    expect(opens).toBe(closes);
  });

  it("heads the levels table with the oscillator level N and alpha' M^2, and says the cap is one mass for all sectors", () => {
    expect(tex).toContain("Strings & $\\nu$ & $y/\\sqrt{\\alpha'}$ & Sector & Level $N$ & $\\alpha' M^2$ & States & With Chan--Paton \\\\");
    expect(tex).toContain("every sector listed up to the same $\\alpha' M^2$ at $y = 0$");
  });

  it("keeps the sector notes as comments, e.g. string creation for D0-D8", () => {
    const d0d8Tex = spectrumToLatexTable(d0d8);
    expect(d0d8Tex).toMatch(/^% d0-d8: nu = 8: .*string creation/m);
    expect(d0d8Tex).toContain("fermionic mode in 0+1 dimensions");
  });

  describe("latexProse", () => {
    it("typesets alpha' M^2, M sqrt(alpha'), nu and N= and quotes ids", () => {
      expect(latexProse('one hypermultiplet of mass M sqrt(alpha\') = 0.5 with "d7", alpha\' M^2 = -1/2, 4d N=2')).toBe(
        "one hypermultiplet of mass $M\\sqrt{\\alpha'}$ = 0.5 with ``d7'', $\\alpha' M^2$ = -1/2, 4d $\\mathcal{N}=2$",
      );
    });
  });
});
