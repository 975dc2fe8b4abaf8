import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { formatWorldvolume, listWorldvolume, stringCreationSectors, worldvolumeKey } from "./worldvolumes";

const pointAndWall: Configuration = {
  format: 1,
  title: "point and wall",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 1,
  stacks: [
    { id: "wall", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
    { id: "point", label: "", count: 1, anti: false, worldvolume: [], position: { "9": 2 } },
  ],
};

describe("formatWorldvolume", () => {
  it("joins the summary and the supersymmetry", () => {
    const result = computeSpectrum({
      ...pointAndWall,
      theory: "IIB",
      stacks: [
        { id: "d3", label: "", count: 2, anti: false, worldvolume: [1, 2, 3], position: {} },
        { id: "d7", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7], position: {} },
      ],
    });
    // D3-D7: 4d N=2 U(2) with one fundamental hypermultiplet and U(1) flavour (common practice, from memory).
    expect(formatWorldvolume(result.worldvolumes[0]!)).toBe("4d: U(2), one fundamental hypermultiplet; U(1) flavour; 4d N=2");
    expect(worldvolumeKey(result.worldvolumes[0]!)).toBe("d3");
  });
});

describe("stringCreationSectors", () => {
  it("finds the nu = 8 pairs that share a Dirichlet axis (D0-D8 along x9)", () => {
    // nu = 8 with a common transverse axis: string creation (Bachas, Green and Schwimmer 1997, from memory).
    expect(stringCreationSectors(computeSpectrum(pointAndWall)).map((sector) => sector.pair)).toEqual([["point", "wall"]]);
  });

  it("leaves out D1-D9 (no shared Dirichlet axis) and the bosonic string", () => {
    const d1d9 = makeSpectrumResult([makeSector(["d1", "d9"], { nu: 8, dd: 0 })]);
    expect(stringCreationSectors(d1d9)).toEqual([]);
    expect(stringCreationSectors(makeSpectrumResult([makeSector(["a", "b"], { nu: 8, dd: 1 })], { theory: "bosonic" }))).toEqual([]);
  });
});

describe("listWorldvolume", () => {
  it("keeps the first entries of each list in the engine's order and counts the rest", () => {
    // Six parallel D4s spread along x9 (a made-up layout, not a physics claim): each worldvolume
    // lists the strings to the five others.
    const slabs = Array.from({ length: 6 }, (_, index) => ({
      id: `s${index}`, label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4], position: { "9": index * 3 },
    }));
    const full = computeSpectrum({ ...pointAndWall, stacks: slabs }).worldvolumes.find((worldvolume) => worldvolume.stacks.includes("s0"));
    expect(full).toBeDefined();
    if (!full) return;
    expect(full.matter).toHaveLength(5);
    const listed = listWorldvolume(full, 1);
    expect(listed.matter).toEqual(full.matter.slice(0, 1));
    expect(listed.defects).toEqual(full.defects.slice(0, 1));
    expect(listed.omitted).toEqual({
      matter: Math.max(0, full.matter.length - 1),
      flavour: Math.max(0, full.flavour.length - 1),
      defects: Math.max(0, full.defects.length - 1),
    });
    expect(listWorldvolume(full, 100).omitted).toEqual({ matter: 0, flavour: 0, defects: 0 });
    expect(full.summary).toBe(listed.summary);
  });
});
