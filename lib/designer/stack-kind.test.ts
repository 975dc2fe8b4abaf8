import { describe, expect, it } from "vitest";
import { stackKind } from "./stack-kind";

describe("stackKind", () => {
  it("names Dp by the number of Neumann axes", () => {
    expect(stackKind({ worldvolume: [], anti: false }, "IIA")).toBe("D0");
    expect(stackKind({ worldvolume: [1, 2, 3], anti: false }, "IIB")).toBe("D3");
  });

  it("names type II antibranes, but not bosonic ones (no RR charge: common practice)", () => {
    expect(stackKind({ worldvolume: [1, 2, 3, 4], anti: true }, "IIA")).toBe("anti-D4");
    expect(stackKind({ worldvolume: [1, 2, 3, 4], anti: true }, "bosonic")).toBe("D4");
  });
});
