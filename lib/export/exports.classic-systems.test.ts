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

function csvLines(result: ReturnType<typeof computeSpectrum>): string[] {
  return spectrumToCsv(result, { title: "Classic" }).split("\r\n");
}

describe("spectrumToCsv on the classic systems", () => {
  it("writes one comment record per worldvolume (D3-D7: the 4d N=2 line) before the header", () => {
    // D3-D7: 4d N=2 U(2), one fundamental hypermultiplet, U(1) flavour (common practice, from memory).
    const lines = csvLines(d3d7);
    expect(lines).toContain("# Worldvolume of d3: 4d: U(2); one fundamental hypermultiplet; U(1) flavour; 4d N=2");
    expect(lines).toContain("# Worldvolume of d7: 8d: U(1); 4d defect with 'd3'; 8d N=1");
    const header = lines.indexOf(spectrumCsvColumns.join(","));
    expect(lines.slice(0, header).every((line) => line.startsWith("# ") && !line.includes(","))).toBe(true);
  });

  it("labels the oscillator level and gives alpha' M^2 at y = 0 beside alpha' M^2", () => {
    const lines = csvLines(separated);
    const columns = lines[lines.indexOf(spectrumCsvColumns.join(","))]?.split(",") ?? [];
    expect(columns).toContain("oscillator_level");
    const row = lines.find((line) => line.startsWith("a,b,") && line.includes(",NS,1/2,"))?.split(",") ?? [];
    // y = 2 pi: alpha' M^2 = 1 + N + a with N + a = 0 (physics.md, mass formula).
    expect(row[columns.indexOf("alpha_prime_mass_squared")]).toBe("1");
    expect(row[columns.indexOf("alpha_prime_mass_squared_at_y0")]).toBe("0");
  });

  it("carries the W-boson multiplet and the string-creation note as sector comments", () => {
    const w = csvLines(separated).find((line) => line.startsWith("# Sector a-b:"));
    expect(w).toContain("massive W-boson vector multiplet (short; 16 supercharges) in 4 dimensions: one massive vector (3 polarisations)");
    const note = csvLines(d0d8).find((line) => line.startsWith("# Sector d0-d8:"));
    expect(note).toContain("constant force");
    expect(note).toContain("string creation");
  });

  it("states M_s = 1/sqrt(alpha') and the mass cap in the conventions record", () => {
    expect(csvLines(d3d7)[0]).toContain("M_s = 1/sqrt(alpha')");
    expect(csvLines(d3d7)[0]).toContain("N + a <= levels");
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
    expect(tex).toContain("Strings & $\\nu$ & $y/\\sqrt{\\alpha'}$ & Sector & Level $N$ & $\\alpha' M^2$ & States \\\\");
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
