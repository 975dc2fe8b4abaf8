import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { TowerPanel } from "./tower-panel";

// Two D0s on a circle of radius 1, 2.5 apart: winding states of the stretched strings.
const result = computeSpectrum({
  format: 2,
  title: "Two points on a circle",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 2,
  compact: { "9": 1 },
  stacks: [
    { id: "a", label: "", count: 1, anti: false, worldvolume: [], position: { "9": 0 } },
    { id: "b", label: "", count: 1, anti: false, worldvolume: [], position: { "9": 2.5 } },
  ],
});

describe("TowerPanel", () => {
  it("lists every tower state with its winding number", () => {
    const sector = result.sectors.find((entry) => entry.pair.join("-") === "a-b")!;
    const markup = renderToStaticMarkup(<TowerPanel sector={sector} title="a–b" kind="all" showGeV={false} />);
    expect(markup).toContain("x9: winding w (R = 1)");
    expect((markup.match(/<tr/g) ?? []).length).toBe((sector.tower?.length ?? 0) + 1);
    expect(markup).toContain("w9 = 0");
    expect(markup).toContain("w9 = -1");
  });

  it("says why a pair with only ND compact axes has no tower", () => {
    const markup = renderToStaticMarkup(<TowerPanel sector={{ compactAxes: [], tower: [], towerTruncated: false }} title="a–c" kind="all" showGeV={false} />);
    expect(markup).toContain("neither momentum nor winding");
  });
});
