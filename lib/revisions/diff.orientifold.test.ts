import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { diffConfigurations, diffInteractions, diffSpectra } from "./diff";
import { describeConfigurationDiff } from "./describe";

const base: Configuration = {
  format: 2,
  title: "plane diff",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [
    { id: "a", label: "", count: 2, anti: false, worldvolume: [1, 2, 3], position: { "9": 1 } },
    { id: "b", label: "", count: 1, anti: true, worldvolume: [1, 2, 3], position: { "9": 12 } },
  ],
  orientifolds: [{ id: "o", type: "O-", worldvolume: [1, 2, 3], position: {} }],
};
const moved: Configuration = { ...base, orientifolds: [{ id: "o", type: "O+", worldvolume: [1, 2, 3], position: { "9": 0.5 } }] };

describe("diff with orientifold planes", () => {
  it("lists a changed plane in the document diff and its description", () => {
    const diff = diffConfigurations(base, moved);
    expect(diff.identical).toBe(false);
    expect(diff.planes).toEqual([{ key: "o", before: "O3- along x1, x2, x3 through the origin", after: "O3+ along x1, x2, x3 at x9 = 0.5" }]);
    expect(describeConfigurationDiff(diff)).toContain("Plane o: O3- along x1, x2, x3 through the origin → O3+ along x1, x2, x3 at x9 = 0.5");
    expect(diffConfigurations(base, { ...base, orientifolds: [] }).planes[0]?.after).toBeNull();
  });
  it("lists moved images and the tadpole status in the spectrum diff", () => {
    const diff = diffSpectra(computeSpectrum(base), computeSpectrum(moved));
    expect(diff.orientifold).toContainEqual({ key: "image a'", before: "brane x9 = -1", after: "brane at the origin" });
    expect(diff.orientifold.find((change) => change.key === "tadpole D3")).toEqual({
      key: "tadpole D3",
      before: "net charge, net 3/4",
      after: "net charge, net 5/4",
    });
  });
  it("lists the pairs whose V(y) at their separation changed", () => {
    const changes = diffInteractions(base, moved);
    // a-b did not move; a-a' and b-b' did (the plane moved), and a-b' too.
    expect(changes.map((change) => change.key)).not.toContain("a-b");
    expect(changes.map((change) => change.key)).toContain("a-b'");
    expect(diffInteractions(base, base)).toEqual([]);
  });
});
