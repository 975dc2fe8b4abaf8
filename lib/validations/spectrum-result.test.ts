import { describe, expect, it } from "vitest";
import { bosonExpansionLatex, computeSpectrum } from "@/lib/boundary";
import { CONVENTIONS_TEXT } from "@/lib/boundary/constants";
import type { Configuration } from "@/lib/boundary/types";
import { conventionsBeforeMassCap, readStoredResult, StoredResultError } from "./spectrum-result";

/**
 * A D0 separated from a D8 in IIA (nu = 8: the R ground state sits in one orientation, so its rows
 * carry notes), plus a string scale so that masses in GeV are present: every optional field of a
 * result appears.
 */
const document: Configuration = {
  format: 1,
  title: "Point and wall",
  theory: "IIA",
  stringScaleGeV: 1e16,
  levels: 2,
  stacks: [
    { id: "wall", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
    { id: "point", label: "", count: 2, anti: false, worldvolume: [], position: { "9": 1.5 } },
  ],
};

/** What the database hands back: the result after a JSON round trip. */
function stored(): Record<string, unknown> {
  return JSON.parse(JSON.stringify(computeSpectrum(document))) as Record<string, unknown>;
}

/** A stored result as an older engine would have written it: without the fields added since. */
function olderEngineResult(): Record<string, unknown> {
  const result = stored();
  const sectors = result.sectors as Array<Record<string, unknown>>;
  for (const sector of sectors) {
    delete sector.supersymmetric;
    delete sector.massless;
    delete sector.notes;
  }
  delete result.warnings;
  delete result.conventions;
  return { ...result, engineVersion: "0.9.0" };
}

describe("readStoredResult", () => {
  it("reads a result of the current engine back unchanged, every optional field included", () => {
    const result = computeSpectrum(document);
    const levels = result.sectors.flatMap((sector) => sector.levels);
    // The fixture must exercise the optional fields, or stripping one would go unnoticed.
    expect(levels.some((row) => row.note !== undefined)).toBe(true);
    expect(levels.some((row) => typeof row.massGeV === "number")).toBe(true);
    expect(result.sectors.some((sector) => sector.massless.some((m) => m.withChanPaton !== undefined))).toBe(true);
    expect(readStoredResult(stored())).toEqual(result);
  });

  it("keeps the engine version that computed the result", () => {
    expect(readStoredResult({ ...stored(), engineVersion: "0.9.0" }).engineVersion).toBe("0.9.0");
  });

  describe("a result of an older engine version", () => {
    const upgraded = readStoredResult(olderEngineResult());

    it("gives every sector the lists and flags the older engine did not store", () => {
      for (const sector of upgraded.sectors) {
        expect(sector.massless).toEqual([]);
        expect(sector.notes).toEqual([]);
        expect(sector.supersymmetric).toBe(false);
      }
    });

    it("states the conventions of the engines that stored none (alpha' = 1, levels cut by oscillator level)", () => {
      expect(upgraded.conventions).toBe(conventionsBeforeMassCap);
      expect(upgraded.conventions).not.toBe(CONVENTIONS_TEXT);
    });

    it("warns that supersymmetry and massless content were not recorded instead of presenting the defaults as physics", () => {
      expect(upgraded.warnings).toEqual([
        "Stored by engine 0.9.0, which did not record which sectors are supersymmetric or the massless content of each sector; " +
          "save the configuration again to recompute the result with the current engine.",
        "Stored by engine 0.9.0, which listed every sector up to the oscillator level N = levels rather than up to the same alpha' M^2, " +
          "so NS and R rows may stop at different masses; save the configuration again to cut them at one mass.",
      ]);
    });

    it("keeps everything the older engine did store", () => {
      const current = computeSpectrum(document);
      expect(upgraded.sectors.map((sector) => sector.levels)).toEqual(current.sectors.map((sector) => sector.levels));
      expect(upgraded.lightest).toEqual(current.lightest);
      expect(upgraded.gaugeGroup).toBe(current.gaugeGroup);
    });
  });

  describe("a result of engine 1.0.1 (before the mass cap and the worldvolumes)", () => {
    /** What 1.0.1 stored: no worldvolumes and no multiplets. */
    function engine101Result(): Record<string, unknown> {
      const result = stored();
      delete result.worldvolumes;
      for (const sector of result.sectors as Array<Record<string, unknown>>) delete sector.multiplet;
      return { ...result, engineVersion: "1.0.1" };
    }
    const upgraded = readStoredResult(engine101Result());

    it("fills the new fields with defaults that claim nothing: no worldvolumes and no multiplets", () => {
      expect(upgraded.worldvolumes).toEqual([]);
      for (const sector of upgraded.sectors) expect(sector.multiplet).toBeNull();
    });

    it("says what was not recorded and that its levels were cut by oscillator level, not by mass", () => {
      // The fixture is IIA D0 and D8 along x9 (nu = 8): no separated identical stacks, so no multiplet is missing.
      expect(upgraded.warnings.filter((warning) => warning.startsWith("Stored by engine"))).toEqual([
        "Stored by engine 1.0.1, which did not record " +
          "the theory on each worldvolume (gauge and flavour groups, light matter and supersymmetry); " +
          "save the configuration again to recompute the result with the current engine.",
        "Stored by engine 1.0.1, which listed every sector up to the oscillator level N = levels rather than up to the same alpha' M^2, " +
          "so NS and R rows may stop at different masses; save the configuration again to cut them at one mass.",
      ]);
    });

    it("keeps the conventions it stored", () => {
      expect(upgraded.conventions).toBe(CONVENTIONS_TEXT);
    });

    it("names the missing W-boson multiplets only where separated stacks of one worldvolume could have one", () => {
      const result = engine101Result();
      const sectors = result.sectors as Array<Record<string, unknown>>;
      sectors[0] = { ...sectors[0], nu: 0, separation: 1.5 };
      const upgrade = readStoredResult(result).warnings.find((warning) => warning.startsWith("Stored by engine"));
      expect(upgrade).toContain("the W-boson multiplets of separated stacks");
    });
  });

  describe("a result of engine 1.2.0 (mode expansions stored as LaTeX)", () => {
    /** The axes as engines before 1.3.0 wrote them: the boson's LaTeX instead of the end positions. */
    function withLatexAxes(mangle: (latex: string) => string = (latex) => latex): Record<string, unknown> {
      const result = stored();
      for (const sector of result.sectors as Array<{ axes: Array<Record<string, unknown>> }>) {
        sector.axes = sector.axes.map(({ positionA, positionB, ...axis }) => ({
          ...axis,
          latex: mangle(bosonExpansionLatex({ axis: axis.axis as number, type: axis.type as "DD", positionA: positionA as number | null, positionB: positionB as number | null })),
        }));
      }
      return { ...result, engineVersion: "1.2.0" };
    }

    it("reads the end positions back from the LaTeX, so the expansions show as the current engine's do", () => {
      const current = computeSpectrum(document);
      const upgraded = readStoredResult(withLatexAxes());
      expect(upgraded.sectors.map((sector) => sector.axes)).toEqual(current.sectors.map((sector) => sector.axes));
      // The point at x9 = 1.5 and the wall at 0: the DD axis of the point-wall string keeps both ends.
      const pair = upgraded.sectors.find((sector) => sector.pair.join() === "point,point");
      expect(pair?.axes.find((axis) => axis.axis === 9)).toMatchObject({ type: "DD", positionA: 1.5, positionB: 1.5 });
      expect(upgraded.warnings.some((warning) => warning.startsWith("Stored by engine"))).toBe(false);
    });

    it("says so when a stored expansion cannot be read, instead of placing its ends at the origin silently", () => {
      const upgraded = readStoredResult(withLatexAxes((latex) => latex.replace(" = ", " == ")));
      const dirichlet = upgraded.sectors.flatMap((sector) => sector.axes).filter((axis) => axis.type === "DD");
      expect(dirichlet.every((axis) => axis.positionA === null && axis.positionB === null)).toBe(true);
      expect(upgraded.warnings.find((warning) => warning.startsWith("Stored by engine"))).toContain("the end positions of some mode expansions");
    });
  });

  describe("edge cases", () => {
    it("does not warn about supersymmetry for the bosonic string, which has none", () => {
      const bosonic: Configuration = {
        ...document,
        theory: "bosonic",
        stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} }],
      };
      const result = JSON.parse(JSON.stringify(computeSpectrum(bosonic))) as Record<string, unknown>;
      for (const sector of result.sectors as Array<Record<string, unknown>>) delete sector.supersymmetric;
      const upgraded = readStoredResult(result);
      expect(upgraded.sectors[0]?.supersymmetric).toBe(false);
      expect(upgraded.warnings.some((warning) => warning.startsWith("Stored by engine"))).toBe(false);
    });

    it("does not mutate the stored value", () => {
      const older = olderEngineResult();
      const before = structuredClone(older);
      readStoredResult(older);
      expect(older).toEqual(before);
    });

    it("throws a StoredResultError naming the path of an unreadable number", () => {
      const result = stored();
      const sectors = result.sectors as Array<{ levels: Array<Record<string, unknown>> }>;
      sectors[0]!.levels[0]!.massSquared = "about one";
      expect(() => readStoredResult(result)).toThrow(StoredResultError);
      expect(() => readStoredResult(result)).toThrow(/sectors\.0\.levels\.0\.massSquared/);
    });

    it("checks the level and counts of the lightest states too", () => {
      const result = stored();
      const lightest = result.lightest as Array<Record<string, unknown>>;
      lightest[0]!.level = "0.5";
      lightest[1]!.withChanPaton = "-2";
      expect(() => readStoredResult(result)).toThrow(
        expect.objectContaining({
          name: "StoredResultError",
          issues: [expect.objectContaining({ path: ["lightest", 0, "level"] }), expect.objectContaining({ path: ["lightest", 1, "withChanPaton"] })],
        }),
      );
    });

    it("throws a StoredResultError for a result without an engine version or a value that is no result", () => {
      const unversioned = stored();
      delete unversioned.engineVersion;
      expect(() => readStoredResult(unversioned)).toThrow(StoredResultError);
      expect(() => readStoredResult(null)).toThrow(StoredResultError);
      expect(() => readStoredResult("result")).toThrow(StoredResultError);
    });
  });
});

describe("readStoredResult with compact axes", () => {
  const onCircle: Configuration = { ...document, format: 2, compact: { "9": 1.5 } };

  it("reads back the tower of a result on a circle unchanged", () => {
    const result = computeSpectrum(onCircle);
    expect(result.sectors.some((sector) => (sector.tower?.length ?? 0) > 0)).toBe(true);
    expect(readStoredResult(JSON.parse(JSON.stringify(result)))).toEqual(JSON.parse(JSON.stringify(result)));
  });

  it("names a tower row whose numbers cannot be read", () => {
    const result = JSON.parse(JSON.stringify(computeSpectrum(onCircle))) as { sectors: { tower: { massSquared: string }[] }[] };
    const first = result.sectors[0]?.tower[0];
    if (first) first.massSquared = "heavy";
    expect(() => readStoredResult(result)).toThrow(StoredResultError);
  });
});
