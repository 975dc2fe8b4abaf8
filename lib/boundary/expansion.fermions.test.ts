import { describe, expect, it } from "vitest";
import { classifyPair } from "./classify";
import { CONVENTIONS_TEXT } from "./constants";
import { expandAxis, expandPair, fermionExpansionLatex, lightConeAxis } from "./expansion";
import type { AxisType } from "./types";

// Worldsheet fermions in the boundary-sign convention of expansion.ts: psi = eta psi~ with eta = +1 at
// a Neumann end and -1 at a Dirichlet end of sigma = 0, and the same times +1 (R) or -1 (NS) at
// sigma = pi (Polchinski vol. 2, sections 10.1 and 13.4, from memory).

const types: AxisType[] = ["NN", "DD", "ND", "DN"];
const eta = (end: string): 1 | -1 => (end === "N" ? 1 : -1);

describe("fermionExpansionLatex", () => {
  it.each(types)("writes psi and psi~ on a %s axis with the sign and moding the boundary conditions demand", (type) => {
    const axis = { axis: 4, type, positionA: type[0] === "D" ? 0 : null, positionB: type[1] === "D" ? 2 : null };
    const expansion = expandAxis(axis, "IIA");
    for (const sector of ["NS", "R"] as const) {
      const latex = fermionExpansionLatex(axis)[sector];
      // Mode expansion psi = sum_r psi_r e^{-ir(tau - sigma)}, psi~ = eta_0 sum_r psi_r e^{-ir(tau + sigma)}: at
      // sigma = pi the condition psi = eta_pi (+-1) psi~ requires e^{2 pi i r} = eta_0 eta_pi (+1 R, -1 NS).
      const required = eta(type[0] as string) * eta(type[1] as string) * (sector === "R" ? 1 : -1);
      const halfInteger = latex.includes("\\mathbb{Z}+1/2");
      expect(halfInteger ? -1 : 1).toBe(required);
      expect(halfInteger ? "half-integer" : "integer").toBe(expansion.fermionModing?.[sector]);
      // psi~ carries eta_0: a minus sign exactly for a Dirichlet end at sigma = 0.
      const tilde = latex.split("\\tilde\\psi^{4}(\\tau,\\sigma) = ")[1] ?? "";
      expect(tilde.startsWith("-")).toBe(type[0] === "D");
    }
  });

  it("does not depend on the endpoint positions, and hands out copies", () => {
    const at = fermionExpansionLatex({ axis: 7, type: "DD" });
    expect(fermionExpansionLatex({ axis: 7, type: "DD" })).toEqual(at);
    expect(fermionExpansionLatex({ axis: 7, type: "DD" })).not.toBe(at);
  });
});

describe("lightConeAxis", () => {
  it("pairs time with the lowest NN axis, else the lowest DD axis, else none", () => {
    // Light-cone gauge x^+- = x^0 +- x^k needs an axis that is NN (or DD) for both ends (physics.md, classifying a pair).
    const d3 = { worldvolume: [1, 2, 3], position: {} };
    const d7 = { worldvolume: [1, 2, 3, 4, 5, 6, 7], position: {} };
    const d0 = { worldvolume: [], position: {} };
    const d8 = { worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: {} };
    expect(lightConeAxis(classifyPair(d3, d7, 10))).toBe(1);
    expect(lightConeAxis(classifyPair(d0, d8, 10))).toBe(9);
    expect(lightConeAxis(classifyPair(d0, d0, 10))).toBe(1);
    const fill = { worldvolume: Array.from({ length: 25 }, (_, i) => i + 1), position: {} };
    expect(lightConeAxis(classifyPair(fill, d0, 26))).toBeNull();
  });

  it("reads the same axis from a sector's stored expansions", () => {
    const probe = { worldvolume: [2, 3], position: {} };
    const wall = { worldvolume: [1, 2, 3, 4, 5, 6], position: {} };
    expect(lightConeAxis({ axes: expandPair(classifyPair(probe, wall, 10), "IIA") })).toBe(2);
  });
});

describe("CONVENTIONS_TEXT", () => {
  it("states the string scale, the mass cap and the fermion sign convention carried with each result", () => {
    // Results state their conventions (team rule); M_s = 1/sqrt(alpha') is the definition of the string scale (common practice).
    expect(CONVENTIONS_TEXT).toContain("M_s = 1/sqrt(alpha')");
    expect(CONVENTIONS_TEXT).toContain("N + a <= levels");
    expect(CONVENTIONS_TEXT).toContain("psi = +psi~ at a Neumann end and -psi~ at a Dirichlet end");
  });
});
