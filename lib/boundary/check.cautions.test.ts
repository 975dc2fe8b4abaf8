import { describe, expect, it } from "vitest";
import { configurationWarnings } from "./check";
import type { Configuration, Stack } from "./types";

function stack(id: string, worldvolume: number[]): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {} };
}

function config(theory: Configuration["theory"], stacks: Stack[]): Configuration {
  return { format: 1, title: "cautions", theory, stringScaleGeV: null, levels: 1, stacks };
}

describe("configurationWarnings for codimension two and less", () => {
  it("cautions about a D7: deficit angle, running coupling, 24 for a compact transverse space", () => {
    // A codimension-two brane makes a conical deficit and a logarithmically varying axio-dilaton; a compact
    // transverse sphere closes with 24 of them (common practice, from memory).
    const [warning] = configurationWarnings(config("IIB", [stack("seven", [1, 2, 3, 4, 5, 6, 7])]));
    expect(warning).toContain('Stack "seven" is a D7');
    expect(warning).toContain("deficit angle");
    expect(warning).toContain("runs logarithmically");
    expect(warning).toContain("24");
  });

  it("keeps the D8 and D9 cautions and says nothing for a D6 or lower", () => {
    const warnings = configurationWarnings(config("IIA", [stack("six", [1, 2, 3, 4, 5, 6]), stack("wall", [1, 2, 3, 4, 5, 6, 7, 8])]));
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toContain("D8");
    expect(configurationWarnings(config("IIB", [stack("nine", [1, 2, 3, 4, 5, 6, 7, 8, 9])]))[0]).toContain("RR tadpole");
  });
});
