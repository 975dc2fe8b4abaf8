import { describe, expect, it } from "vitest";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { pngLegend } from "./png-legend";

describe("pngLegend", () => {
  const legend = pngLegend(braneAntibranePair, { horizontal: 4, vertical: 9 }, 40);

  it("titles the picture and states the axes and units", () => {
    expect(legend.title).toBe(braneAntibranePair.title);
    expect(legend.subtitle).toBe("IIA; horizontal x4, vertical x9; lengths in \u221a\u03b1\u2032 (\u03b1\u2032 = 1)");
  });

  it("lists each stack by label with its kind and count, an antibrane hollow, then the two kinds of string", () => {
    expect(legend.entries.map((entry) => [entry.swatch, entry.text])).toEqual([
      ["stack", "D4: D4, N = 1"],
      ["antistack", "anti-D4: anti-D4, N = 1"],
      ["string", "string, labelled with its lightest \u03b1\u2032M\u00b2"],
      ["tachyon", "tachyonic string"],
    ]);
  });

  it("picks the longest round scale bar up to 160 px", () => {
    // 40 px per sqrt(alpha'): 5 units would be 200 px, so 2 units (80 px).
    expect(legend.scaleBar).toEqual({ lengthPx: 80, text: "2 \u221a\u03b1\u2032" });
    expect(pngLegend(braneAntibranePair, { horizontal: 4, vertical: 9 }, 1000).scaleBar).toEqual({ lengthPx: 100, text: "0.1 \u221a\u03b1\u2032" });
    expect(pngLegend(braneAntibranePair, { horizontal: 4, vertical: 9 }, 0).scaleBar).toBeNull();
  });
});
