import { describe, expect, it } from "vitest";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { escapeLatex, spectrumToLatexTable, toLatexNumber } from "./latex-table";

describe("spectrumToLatexTable", () => {
  const result = makeSpectrumResult([
    makeSector(["probe_1", "wall"], {
      separation: 3.5,
      levels: [
        { sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4" },
        { sector: "NS", level: "1/2", massSquared: "0.31", mass: 0.557, states: "8", withChanPaton: "32" },
        { sector: "NS", level: "3/2", massSquared: "1", mass: 1, states: "128", withChanPaton: "512" },
      ],
    }),
  ]);
  const tex = spectrumToLatexTable(result, { title: "Probe & wall" });

  it("is a booktabs table with caption and label", () => {
    expect(tex).toContain("\\begin{table}[ht]");
    expect(tex).toContain("\\toprule");
    expect(tex).toContain("\\midrule");
    expect(tex).toContain("\\bottomrule");
    expect(tex).toContain("\\label{tab:spectrum}");
    expect(tex.trimEnd().endsWith("\\end{table}")).toBe(true);
  });

  it("states the conventions and the caution in the caption and a comment", () => {
    expect(tex).toContain("Conventions: $\\alpha' = 1$");
    expect(tex.startsWith("% Mooring spectrum table.")).toBe(true);
    expect(tex).toMatch(/\\caption\{Probe \\& wall: open-string spectrum[^\n]*check published results/);
  });

  it("typesets exact masses as fractions and escapes stack ids", () => {
    expect(tex).toContain("    probe\\_1--wall & $4$ & $3.5$ & NS & $0$ & $-\\tfrac{1}{2}$ & $1$ & $4$ \\\\");
    expect(tex).toContain("& $\\tfrac{1}{2}$ & $0.31$ & $8$ & $32$ \\\\");
  });

  it("gives States as the interface does (one oriented string per Chan-Paton index pair) beside the total with Chan-Paton", () => {
    expect(tex).toContain("Level $N$ & $\\alpha' M^2$ & States & With Chan--Paton \\\\");
    const differing = spectrumToLatexTable(
      makeSpectrumResult([
        makeSector(["a", "b"], { levels: [{ sector: "R", level: "0", massSquared: "0", mass: 0, states: null, withChanPaton: "1", note: "one orientation" }] }),
      ]),
    );
    expect(differing).toContain("& $0$ & --- & $1$ \\\\");
  });

  it("names the strings by the stacks' labels when given", () => {
    const named = spectrumToLatexTable(result, { stacks: [{ id: "probe_1", label: "probe D4" }, { id: "wall", label: "D8 wall" }] });
    expect(named).toContain("    probe D4--D8 wall & $4$");
  });

  it("keeps only levels up to the mass cap N + a (here a_NS = 0)", () => {
    const short = spectrumToLatexTable(result, { massCap: 1 });
    expect(short).not.toContain("\\tfrac{3}{2}");
    expect(short).toContain("\\tfrac{1}{2}");
  });

  it("balances braces (a table that compiles needs this)", () => {
    const opens = (tex.match(/(?<!\\)\{/g) ?? []).length;
    const closes = (tex.match(/(?<!\\)\}/g) ?? []).length;
    expect(opens).toBe(closes);
  });
});

describe("toLatexNumber", () => {
  it("turns rationals into fractions and leaves integers and decimals", () => {
    expect(toLatexNumber("-3/2")).toBe("-\\tfrac{3}{2}");
    expect(toLatexNumber("1/2")).toBe("\\tfrac{1}{2}");
    expect(toLatexNumber("3")).toBe("3");
    expect(toLatexNumber("0.3097")).toBe("0.3097");
  });
});

describe("escapeLatex", () => {
  it("escapes every LaTeX special character", () => {
    expect(escapeLatex("a_b & 50% #1 $x$ {y} ~ ^ \\")).toBe(
      "a\\_b \\& 50\\% \\#1 \\$x\\$ \\{y\\} \\textasciitilde{} \\textasciicircum{} \\textbackslash{}",
    );
  });
});
