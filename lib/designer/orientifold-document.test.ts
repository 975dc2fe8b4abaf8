import { describe, expect, it } from "vitest";
import { checkConfiguration } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { addPlane, addPlaneProblem, removePlane, setPlanePosition, setPlaneType, togglePlaneAxis } from "./orientifold-document";

const doc: Configuration = {
  format: 1,
  title: "t",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [{ id: "a", label: "", count: 2, anti: false, worldvolume: [1, 2, 3], position: { "9": 1 } }],
};

describe("orientifold document edits", () => {
  it("adds a valid O- plane parallel to the first stack and sets format 2; refuses a second", () => {
    const withPlane = addPlane(doc);
    expect(withPlane.format).toBe(2);
    expect(withPlane.orientifolds).toEqual([{ id: "o", label: "", type: "O-", worldvolume: [1, 2, 3], position: {} }]);
    expect(checkConfiguration(withPlane)).toEqual([]);
    expect(addPlaneProblem(withPlane)).not.toBeNull();
    expect(addPlane(withPlane)).toBe(withPlane);
  });
  it("edits type, axes and positions, and removes the field with the last plane", () => {
    let edited = setPlaneType(addPlane(doc), "o", "O+");
    edited = setPlanePosition(edited, "o", 9, 0.5);
    expect(edited.orientifolds?.[0]).toEqual(expect.objectContaining({ type: "O+", position: { "9": 0.5 } }));
    edited = togglePlaneAxis(edited, "o", 9);
    expect(edited.orientifolds?.[0]?.worldvolume).toEqual([1, 2, 3, 9]);
    expect(edited.orientifolds?.[0]?.position).toEqual({});
    expect(togglePlaneAxis(edited, "o", 2).orientifolds?.[0]?.worldvolume).toEqual([1, 3, 9]);
    expect("orientifolds" in removePlane(edited, "o")).toBe(false);
  });
});
