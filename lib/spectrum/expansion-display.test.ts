import { evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { bosonExpansionLatex } from "@/lib/boundary/expansion";
import { expansionEndPositions, simplifyExpansionLatex } from "./expansion-display";

const oscillatorsDD = String.raw`\sqrt{2\alpha'}\sum_{n\neq0}\frac{\alpha_n}{n}e^{-in\tau}\sin n\sigma`;

function dd(positionA: number, positionB: number): string {
  return simplifyExpansionLatex(bosonExpansionLatex({ axis: 9, type: "DD", positionA, positionB }));
}

/** The classical part of a simplified DD expansion, evaluated with mathjs at sigma. */
function classicalAt(latex: string, sigma: number): number {
  const rhs = latex.split(" = ")[1] ?? "";
  const classical = rhs.slice(0, rhs.indexOf(String.raw`\sqrt`)).trim().replace(/[+-]$/, "").trim();
  if (classical === "") return 0;
  // "2.5\frac{\sigma}{\pi}" is 2.5 * (s / pi); a bare "\frac{\sigma}{\pi}" has coefficient 1.
  const expression = classical.replace(/(^|[+-]\s*)\\frac\{\\sigma\}\{\\pi\}/g, (_, before: string) => `${before}1\\frac{\\sigma}{\\pi}`).replaceAll(String.raw`\frac{\sigma}{\pi}`, " * (s / pi)");
  return Number(evaluate(expression, { s: sigma }));
}

describe("simplifyExpansionLatex", () => {
  it("drops the classical part of a string between two ends at the origin", () => {
    expect(dd(0, 0)).toBe(String.raw`X^{9}(\tau,\sigma) = ${oscillatorsDD}`);
  });

  it("works x_b - x_a out exactly and keeps a nonzero start", () => {
    expect(dd(1, 3.5)).toBe(String.raw`X^{9}(\tau,\sigma) = 1 + 2.5\frac{\sigma}{\pi} + ${oscillatorsDD}`);
    expect(dd(0, 3.5)).toBe(String.raw`X^{9}(\tau,\sigma) = 3.5\frac{\sigma}{\pi} + ${oscillatorsDD}`);
    expect(dd(-1.25, -1.25)).toBe(String.raw`X^{9}(\tau,\sigma) = -1.25 + ${oscillatorsDD}`);
    // Decimal digits, not doubles: 0.3 - 0.1 is 0.2 exactly.
    expect(dd(0.1, 0.3)).toBe(String.raw`X^{9}(\tau,\sigma) = 0.1 + 0.2\frac{\sigma}{\pi} + ${oscillatorsDD}`);
    expect(dd(2, 1)).toBe(String.raw`X^{9}(\tau,\sigma) = 2 - \frac{\sigma}{\pi} + ${oscillatorsDD}`);
  });

  it("keeps the boundary values: X = x_a at sigma = 0 and x_b at sigma = pi (physics.md, DD expansion; checked with mathjs)", () => {
    for (const [a, b] of [
      [0, 3.5],
      [1, 3.5],
      [-2, 0.75],
      [2, 1],
      [0.1, 0.3],
    ] as const) {
      const latex = dd(a, b);
      expect(classicalAt(latex, 0)).toBeCloseTo(a, 12);
      expect(classicalAt(latex, Math.PI)).toBeCloseTo(b, 12);
    }
  });

  it("drops a zero position on a mixed axis and leaves everything else alone", () => {
    const nd = bosonExpansionLatex({ axis: 4, type: "ND", positionA: null, positionB: 0 });
    expect(simplifyExpansionLatex(nd)).toBe(nd.replace("= 0 + ", "= "));
    const dn = bosonExpansionLatex({ axis: 4, type: "DN", positionA: 2, positionB: null });
    expect(simplifyExpansionLatex(dn)).toBe(dn);
    const nn = bosonExpansionLatex({ axis: 1, type: "NN", positionA: null, positionB: null });
    expect(simplifyExpansionLatex(nn)).toBe(nn);
    expect(simplifyExpansionLatex("not an expansion")).toBe("not an expansion");
  });
});

describe("expansionEndPositions", () => {
  it("reads the end positions back from the LaTeX engines before 1.3.0 stored, for every axis type", () => {
    for (const axis of [
      { axis: 9, type: "DD", positionA: -2.5, positionB: 1.25 },
      { axis: 9, type: "DD", positionA: 0, positionB: 0 },
      { axis: 4, type: "ND", positionA: null, positionB: 3 },
      { axis: 4, type: "DN", positionA: 1e-7, positionB: null },
      { axis: 1, type: "NN", positionA: null, positionB: null },
    ] as const) {
      expect(expansionEndPositions(axis.type, bosonExpansionLatex(axis))).toEqual({ positionA: axis.positionA, positionB: axis.positionB });
    }
  });

  it("answers null for text without the engine's shape", () => {
    expect(expansionEndPositions("DD", "not an expansion")).toBeNull();
    expect(expansionEndPositions("NN", bosonExpansionLatex({ axis: 9, type: "DD", positionA: 0, positionB: 1 }))).toBeNull();
  });
});
