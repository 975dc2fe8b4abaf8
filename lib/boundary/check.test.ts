import { describe, expect, it } from "vitest";
import {
  ConfigurationError,
  checkConfiguration,
  configurationWarnings,
  describeStack,
  dimensionOf,
} from "./check";
import type { Configuration, Stack } from "./types";

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function config(extra: Partial<Configuration> = {}): Configuration {
  return {
    format: 1,
    title: "check",
    theory: "IIA",
    stringScaleGeV: null,
    levels: 4,
    stacks: [stack("w", [1, 2, 3, 4, 5, 6, 7, 8], { position: { "9": 0 } }), stack("p", [1, 2, 3, 4], { count: 2, position: { "9": 3.5 } })],
    ...extra,
  };
}

describe("checkConfiguration", () => {
  it("accepts the product.md example configuration", () => {
    expect(checkConfiguration(config())).toEqual([]);
  });

  it("rejects odd p in IIA and names the stack (IIA has BPS Dp-branes for even p only: common practice; Polchinski vol. 2, chapter 13, from memory)", () => {
    const problems = checkConfiguration(config({ stacks: [stack("odd", [1, 2, 3], { label: "probe" })] }));
    expect(problems).toEqual([
      {
        path: ["stacks", 0, "worldvolume"],
        message: 'Stack "odd" (probe) is a D3 brane, but IIA allows only even p (D0, D2, D4, D6, D8)',
      },
    ]);
  });

  it("rejects even p in IIB (IIB has BPS Dp-branes for odd p only: common practice; Polchinski vol. 2, chapter 13, from memory)", () => {
    const problems = checkConfiguration(config({ theory: "IIB", stacks: [stack("d0", [])] }));
    expect(problems).toHaveLength(1);
    expect(problems[0]?.message).toContain('"d0"');
    expect(problems[0]?.message).toContain("IIB allows only odd p");
  });

  it("allows any p in the bosonic theory", () => {
    const c = config({ theory: "bosonic", stacks: [stack("a", [1, 2, 3]), stack("b", [1, 2])] });
    expect(checkConfiguration(c)).toEqual([]);
  });

  it("requires D = 10 for type II and 2..26 for bosonic", () => {
    expect(checkConfiguration(config({ dimension: 11 }))[0]?.path).toEqual(["dimension"]);
    const bosonic = config({ theory: "bosonic", stacks: [] });
    expect(checkConfiguration({ ...bosonic, dimension: 27 })[0]?.path).toEqual(["dimension"]);
    expect(checkConfiguration({ ...bosonic, dimension: 6.5 })[0]?.path).toEqual(["dimension"]);
    expect(checkConfiguration({ ...bosonic, dimension: 6 })).toEqual([]);
  });

  it("rejects worldvolume axes outside 1..D-1 at the axis's own path", () => {
    const problems = checkConfiguration(config({ stacks: [stack("s", [0, 4]), stack("t", [2, 10])] }));
    expect(problems.map((problem) => problem.path)).toEqual([
      ["stacks", 0, "worldvolume", 0],
      ["stacks", 1, "worldvolume", 1],
    ]);
  });

  it("rejects unsorted and repeated worldvolume axes", () => {
    const problems = checkConfiguration(config({ stacks: [stack("s", [4, 2]), stack("t", [2, 2])] }));
    expect(problems.map((problem) => problem.message)).toEqual([
      'Worldvolume of stack "s" must be sorted in increasing order',
      'Worldvolume of stack "t" lists axis 2 twice',
    ]);
  });

  it("rejects repeated ids at the later stack", () => {
    const problems = checkConfiguration(config({ stacks: [stack("s", [2, 3]), stack("s", [4, 5])] }));
    expect(problems).toEqual([
      { path: ["stacks", 1, "id"], message: 'Stack id "s" is already used by stacks[0]; ids must be unique' },
    ]);
  });

  it("rejects malformed ids", () => {
    expect(checkConfiguration(config({ stacks: [stack("a b", [2, 3])] }))[0]?.path).toEqual(["stacks", 0, "id"]);
    expect(checkConfiguration(config({ stacks: [stack("", [2, 3])] }))[0]?.path).toEqual(["stacks", 0, "id"]);
  });

  it("rejects counts that are not whole numbers from 1 to 10000", () => {
    for (const count of [0, -1, 1.5, 10_001, Number.NaN]) {
      const problems = checkConfiguration(config({ stacks: [stack("s", [2, 3], { count })] }));
      expect(problems.map((problem) => problem.path)).toEqual([["stacks", 0, "count"]]);
    }
    expect(checkConfiguration(config({ stacks: [stack("s", [2, 3], { count: 10_000 })] }))).toEqual([]);
  });

  it("rejects levels outside 0..200", () => {
    expect(checkConfiguration(config({ levels: 201 }))[0]?.path).toEqual(["levels"]);
    expect(checkConfiguration(config({ levels: -1 }))[0]?.path).toEqual(["levels"]);
    expect(checkConfiguration(config({ levels: 2.5 }))[0]?.path).toEqual(["levels"]);
    expect(checkConfiguration(config({ levels: 200 }))).toEqual([]);
    expect(checkConfiguration(config({ levels: 0 }))).toEqual([]);
  });

  it("rejects more than 64 stacks", () => {
    const stacks = Array.from({ length: 65 }, (_, i) => stack(`s${i}`, [2, 3]));
    expect(checkConfiguration(config({ stacks })).map((problem) => problem.path)).toEqual([["stacks"]]);
    expect(checkConfiguration(config({ stacks: stacks.slice(0, 64) }))).toEqual([]);
  });

  it("bounds sectors x (levels + 1) so one result cannot list millions of rows", () => {
    const many = Array.from({ length: 64 }, (_, i) => stack(`s${i}`, [2, 3]));
    // 64 stacks: 64 * 65 / 2 = 2080 sectors; 2080 * 9 = 18720 fits, 2080 * 10 = 20800 does not.
    expect(checkConfiguration(config({ stacks: many, levels: 8 }))).toEqual([]);
    const problems = checkConfiguration(config({ stacks: many, levels: 9 }));
    expect(problems).toEqual([
      {
        path: ["levels"],
        message:
          "64 stacks give 2080 sectors, too many to list up to alpha' M^2 = 9 in one result; lower the mass cap (levels) to at most 8 or use fewer stacks",
      },
    ]);
    // Twelve stacks (78 sectors) still reach the top level 200: 78 * 201 = 15678.
    expect(checkConfiguration(config({ stacks: many.slice(0, 12), levels: 200 }))).toEqual([]);
  });

  it("rejects positions that are not finite, too large, off the axes, or on Neumann axes", () => {
    const problems = checkConfiguration(
      config({
        stacks: [
          stack("s", [2, 4], {
            position: { "1": Number.POSITIVE_INFINITY, "3": 2e6, "10": 1, x: 0, "2": 1 },
          }),
        ],
      }),
    );
    expect(problems.map((problem) => problem.path)).toEqual([
      ["stacks", 0, "position", "1"],
      ["stacks", 0, "position", "2"],
      ["stacks", 0, "position", "3"],
      ["stacks", 0, "position", "10"],
      ["stacks", 0, "position", "x"],
    ]);
    expect(problems[1]?.message).toContain("Neumann along axis 2");
  });

  it("rejects a non-positive string scale", () => {
    expect(checkConfiguration(config({ stringScaleGeV: 0 }))[0]?.path).toEqual(["stringScaleGeV"]);
    // Far above the Planck scale masses in GeV would overflow to Infinity.
    expect(checkConfiguration(config({ stringScaleGeV: Number.MAX_VALUE }))[0]?.path).toEqual(["stringScaleGeV"]);
    expect(checkConfiguration(config({ stringScaleGeV: 1e16 }))).toEqual([]);
  });

  describe("edge cases", () => {
    it("accepts an empty configuration", () => {
      expect(checkConfiguration(config({ stacks: [] }))).toEqual([]);
    });

    it("does not mutate its input", () => {
      const c = config();
      const copy = structuredClone(c);
      checkConfiguration(c);
      expect(c).toEqual(copy);
    });
  });
});

describe("configurationWarnings", () => {
  it("cautions about D8 and D9 stacks (RR tadpoles and a varying dilaton: common practice)", () => {
    const warnings = configurationWarnings(config());
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toContain('Stack "w" is a D8');
    expect(warnings[0]).toContain("dilaton");
    const d9 = configurationWarnings(config({ theory: "IIB", stacks: [stack("f", [1, 2, 3, 4, 5, 6, 7, 8, 9])] }));
    expect(d9[0]).toContain("tadpole");
  });

  it("warns about a non-critical bosonic dimension (the level-1 vector is massless only at D = 26: Polchinski vol. 1, section 1.3, from memory)", () => {
    const warnings = configurationWarnings(config({ theory: "bosonic", dimension: 6, stacks: [] }));
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toContain("D = 6");
    expect(warnings[0]).toContain("level-1 vector massless");
    expect(configurationWarnings(config({ theory: "bosonic", stacks: [] }))).toEqual([]);
  });

  it("says that the bosonic theory ignores the antibrane flag", () => {
    const warnings = configurationWarnings(config({ theory: "bosonic", stacks: [stack("a", [2], { anti: true })] }));
    expect(warnings).toEqual([expect.stringContaining('antibrane flag of "a" is ignored')]);
  });

  it("flags a pair whose spatial axes are all ND", () => {
    const warnings = configurationWarnings(
      config({ theory: "bosonic", dimension: 4, stacks: [stack("point", []), stack("fill", [1, 2, 3])] }),
    );
    expect(warnings.some((warning) => warning.includes("Every spatial axis is ND"))).toBe(true);
  });

  it("lists the same warnings in the same order whatever the order of the stacks", () => {
    // Found by the stack-order property in spectrum.property.test.ts: two D8s came out in input order.
    const d8a = stack("s1", [1, 2, 3, 4, 5, 6, 7, 9]);
    const d8b = stack("s3", [2, 3, 4, 5, 6, 7, 8, 9]);
    const forward = configurationWarnings(config({ theory: "IIA", stacks: [d8a, d8b] }));
    expect(forward).toHaveLength(2);
    expect(forward[0]).toContain('Stack "s1"');
    expect(configurationWarnings(config({ theory: "IIA", stacks: [d8b, d8a] }))).toEqual(forward);
    const bosonic = (stacks: Stack[]) => configurationWarnings(config({ theory: "bosonic", stacks }));
    const antis = [stack("b", [2], { anti: true }), stack("a", [2], { anti: true })];
    expect(bosonic(antis)).toEqual(bosonic([...antis].reverse()));
  });
});

describe("dimensionOf", () => {
  it("defaults to the critical dimensions 26 and 10 (common practice)", () => {
    expect(dimensionOf({ theory: "bosonic" })).toBe(26);
    expect(dimensionOf({ theory: "IIA" })).toBe(10);
    expect(dimensionOf({ theory: "bosonic", dimension: 8 })).toBe(8);
  });
});

describe("describeStack", () => {
  it("shows the label only when it adds something", () => {
    expect(describeStack({ id: "p", label: "probe" })).toBe('stack "p" (probe)');
    expect(describeStack({ id: "p", label: "p" })).toBe('stack "p"');
    expect(describeStack({ id: "p", label: " " })).toBe('stack "p"');
  });
});

describe("ConfigurationError", () => {
  it("carries every problem and summarises the first in its message", () => {
    const error = new ConfigurationError(checkConfiguration(config({ levels: -1, stringScaleGeV: -2 })));
    expect(error).toBeInstanceOf(Error);
    expect(error.problems).toHaveLength(2);
    expect(error.message).toContain("and 1 more");
  });
});
