import { describe, expect, it, vi } from "vitest";
import * as demos from "@/lib/demo-configurations";
import type { Configuration } from "@/lib/boundary/types";
import { benchPreviewDemo, benchTwelveStacks, benchTwelveStacksCompact, benchTwelveStacksWithPlane } from "@/tests/fixtures/bench-12-stacks";

// spectrum.ts keeps the counted series and pair supersymmetry in tables across calls. A table key
// that left out an input (D, the mass cap, nu, the orientation relation) would hand one
// configuration another's counts; these checks compare every result computed after all the others
// with the result of a freshly loaded engine, whose tables are empty.

const configurations: Array<[string, Configuration]> = [
  ...Object.entries(demos).filter((entry): entry is [string, Configuration] => typeof entry[1] === "object" && entry[1] !== null && "stacks" in entry[1]),
  ["benchPreviewDemo", benchPreviewDemo],
  ["benchTwelveStacks", benchTwelveStacks],
  ["benchTwelveStacksCompact", benchTwelveStacksCompact],
  ["benchTwelveStacksWithPlane", benchTwelveStacksWithPlane],
  // The same stacks at other mass caps, and anti-branes for the other orientation relation.
  ["benchPreviewDemo, levels 1", { ...benchPreviewDemo, levels: 1 }],
  ["benchPreviewDemo, levels 3", { ...benchPreviewDemo, levels: 3 }],
  ["benchPreviewDemo, all branes", { ...benchPreviewDemo, stacks: benchPreviewDemo.stacks.map((stack) => ({ ...stack, anti: false })) }],
];

async function freshEngine() {
  vi.resetModules();
  return import("./spectrum");
}

describe("the engine's tables across calls", () => {
  it("covers D = 10 and D = 26, several mass caps and both orientation relations", () => {
    expect(new Set(configurations.map(([, configuration]) => configuration.theory))).toEqual(new Set(["IIA", "IIB", "bosonic"]));
    expect(new Set(configurations.map(([, configuration]) => configuration.levels)).size).toBeGreaterThanOrEqual(3);
  });

  it("gives every configuration, computed after all the others, the result of an engine with empty tables", async () => {
    const warm = await freshEngine();
    for (const [, configuration] of configurations) warm.computeSpectrum(configuration);
    for (const [name, configuration] of configurations) {
      const fresh = await freshEngine();
      expect(warm.computeSpectrum(configuration), name).toEqual(fresh.computeSpectrum(configuration));
    }
  });
});
