import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { diffSpectra } from "./diff";

const d3d7: Configuration = {
  format: 1,
  title: "D3 at a D7",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [
    { id: "d3", label: "", count: 2, anti: false, worldvolume: [1, 2, 3], position: {} },
    { id: "d7", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7], position: {} },
  ],
};

describe("diffSpectra on worldvolumes", () => {
  it("tells a collaborator when a worldvolume's theory changes: a second D7 gives the D3s 2 flavours", () => {
    // One hypermultiplet per D7 brane: U(2) flavour for two coincident D7s (common practice, from memory).
    const after: Configuration = { ...d3d7, stacks: [d3d7.stacks[0]!, { ...d3d7.stacks[1]!, count: 2 }] };
    const diff = diffSpectra(computeSpectrum(d3d7), computeSpectrum(after));
    expect(diff.worldvolumes).toContainEqual({
      key: "d3",
      before: "4d: U(2), one fundamental hypermultiplet; U(1) flavour; 4d N=2",
      after: "4d: U(2), 2 fundamental hypermultiplets; U(2) flavour; 4d N=2",
    });
    expect(diff.identical).toBe(false);
  });

  it("lists a worldvolume that appears or goes, and nothing for identical results", () => {
    const alone: Configuration = { ...d3d7, stacks: [d3d7.stacks[0]!] };
    const diff = diffSpectra(computeSpectrum(alone), computeSpectrum(d3d7));
    expect(diff.worldvolumes.find((change) => change.key === "d7")).toEqual(expect.objectContaining({ before: null }));
    expect(diffSpectra(computeSpectrum(d3d7), computeSpectrum(d3d7)).worldvolumes).toEqual([]);
  });

  describe("edge cases", () => {
    it("compares no worldvolumes when one result was stored before they were recorded", () => {
      const old = { ...computeSpectrum(d3d7), worldvolumes: [] };
      expect(diffSpectra(old, computeSpectrum({ ...d3d7, stacks: [d3d7.stacks[0]!] })).worldvolumes).toEqual([]);
    });
  });
});
