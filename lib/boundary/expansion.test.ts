import { describe, expect, it } from "vitest";
import { classifyPair } from "./classify";
import { bosonExpansionLatex, bosonModing, expandAxis, expandPair, fermionModing } from "./expansion";
import { formatDecimal } from "./format";

describe("bosonModing", () => {
  it("is integer on NN/DD and half-integer on ND/DN (Polchinski vol. 2, section 13.4, from memory)", () => {
    expect(bosonModing("NN")).toBe("integer");
    expect(bosonModing("DD")).toBe("integer");
    expect(bosonModing("ND")).toBe("half-integer");
    expect(bosonModing("DN")).toBe("half-integer");
  });
});

describe("fermionModing", () => {
  it("is NS half-integer / R integer on NN and DD, swapped on ND and DN (Polchinski vol. 2, section 13.4, from memory)", () => {
    expect(fermionModing("NN")).toEqual({ NS: "half-integer", R: "integer" });
    expect(fermionModing("DD")).toEqual({ NS: "half-integer", R: "integer" });
    expect(fermionModing("ND")).toEqual({ NS: "integer", R: "half-integer" });
    expect(fermionModing("DN")).toEqual({ NS: "integer", R: "half-integer" });
  });
});

describe("expandAxis", () => {
  it("substitutes the endpoints into the DD expansion (physics.md DD form; Polchinski vol. 1, chapter 8, from memory)", () => {
    const expansion = expandAxis({ axis: 5, type: "DD", positionA: 0, positionB: 3.5 }, "bosonic");
    expect(bosonExpansionLatex(expansion)).toBe(
      "X^{5}(\\tau,\\sigma) = 0 + (3.5 - 0)\\frac{\\sigma}{\\pi} + \\sqrt{2\\alpha'}\\sum_{n\\neq0}\\frac{\\alpha_n}{n}e^{-in\\tau}\\sin n\\sigma",
    );
    expect(expansion.zeroModes).toEqual([]);
    expect(expansion.fermionModing).toBeUndefined();
    // The result stores the positions; the text is written from them when shown.
    expect(expansion).toEqual({ axis: 5, type: "DD", bosonModing: "integer", zeroModes: [], positionA: 0, positionB: 3.5 });
  });

  it("puts a negative subtracted endpoint in parentheses and trims trailing zeros", () => {
    const latex = bosonExpansionLatex(expandAxis({ axis: 7, type: "DD", positionA: -2.5, positionB: 1.25 }, "IIA"));
    expect(latex).toContain("= -2.5 + (1.25 - (-2.5))\\frac{\\sigma}{\\pi}");
  });

  it("gives the NN expansion with momentum and the x, p zero modes", () => {
    const expansion = expandAxis({ axis: 1, type: "NN", positionA: null, positionB: null }, "IIB");
    expect(bosonExpansionLatex(expansion)).toBe(
      "X^{1}(\\tau,\\sigma) = x^{1} + 2\\alpha' p^{1}\\tau + i\\sqrt{2\\alpha'}\\sum_{n\\neq0}\\frac{\\alpha_n}{n}e^{-in\\tau}\\cos n\\sigma",
    );
    expect(expansion.zeroModes).toEqual(["x", "p", "psi_0 (R)"]);
    expect(expansion.bosonModing).toBe("integer");
  });

  it("anchors ND at the Dirichlet end b and DN at the Dirichlet end a, with half-integer modes", () => {
    const nd = expandAxis({ axis: 6, type: "ND", positionA: null, positionB: 4 }, "IIA");
    expect(bosonExpansionLatex(nd)).toBe(
      "X^{6}(\\tau,\\sigma) = 4 + i\\sqrt{2\\alpha'}\\sum_{r\\in\\mathbb{Z}+1/2}\\frac{\\alpha_r}{r}e^{-ir\\tau}\\cos r\\sigma",
    );
    expect(nd.zeroModes).toEqual(["psi_0 (NS)"]);
    const dn = expandAxis({ axis: 6, type: "DN", positionA: -1, positionB: null }, "IIA");
    expect(bosonExpansionLatex(dn)).toBe(
      "X^{6}(\\tau,\\sigma) = -1 + \\sqrt{2\\alpha'}\\sum_{r\\in\\mathbb{Z}+1/2}\\frac{\\alpha_r}{r}e^{-ir\\tau}\\sin r\\sigma",
    );
    expect(dn.fermionModing).toEqual({ NS: "integer", R: "half-integer" });
  });
});

describe("expandPair", () => {
  it("lists every spatial axis of the product.md example with its type", () => {
    const wall = { worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } };
    const probe = { worldvolume: [1, 2, 3, 4], position: { "5": 0, "9": 3.5 } };
    const axes = expandPair(classifyPair(probe, wall, 10), "IIA");
    expect(axes.map((axis) => axis.axis)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(axes[4]?.type).toBe("DN");
    expect(axes[8]).toMatchObject({ positionA: 3.5, positionB: 0 });
    expect(bosonExpansionLatex(axes[8] as (typeof axes)[number])).toContain("= 3.5 + (0 - 3.5)");
    // A Neumann end has no position.
    expect(axes[0]).toMatchObject({ type: "NN", positionA: null, positionB: null });
  });
});

describe("formatDecimal", () => {
  it("rounds to 12 significant digits and trims zeros", () => {
    expect(formatDecimal(0.1 + 0.2)).toBe("0.3");
    expect(formatDecimal(1 / 3)).toBe("0.333333333333");
    expect(formatDecimal(-0)).toBe("0");
    expect(formatDecimal(100)).toBe("100");
    expect(formatDecimal(Math.PI, { significantDigits: 4 })).toBe("3.142");
  });
});
