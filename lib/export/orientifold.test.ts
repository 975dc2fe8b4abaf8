import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { interactionCurves, interactionSampleCount } from "@/lib/boundary/interaction";
import type { Configuration } from "@/lib/boundary/types";
import { spectrumToCsv } from "./csv";
import { interactionCsvColumns, interactionsToCsv, orientifoldExportLines, interactionExportLines } from "./orientifold";

const typeOne: Configuration = {
  format: 2,
  title: "type I with a probe",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [
    { id: "d9", label: "", count: 16, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9], position: {} },
    { id: "d1", label: "", count: 1, anti: false, worldvolume: [1], position: { "9": 2 } },
    { id: "x1", label: "", count: 1, anti: true, worldvolume: [1], position: { "9": 20 } },
  ],
  orientifolds: [{ id: "o", type: "O-", worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9], position: {} }],
};

describe("exports with an orientifold plane", () => {
  const result = computeSpectrum(typeOne);
  it("the CSV comments carry the plane, the images, the tadpole status and V at each separation", () => {
    const commentLines = [...orientifoldExportLines(result.orientifold ?? { planes: [], images: [], tadpoles: [], notes: [] }), ...interactionExportLines(interactionCurves(typeOne))];
    const csv = spectrumToCsv(result, { title: typeOne.title, commentLines });
    expect(csv.startsWith("#")).toBe(false);
    expect(csv).toContain("Orientifold plane o: O9- (p = 9)");
    expect(csv).toContain("Image of d9: on the plane");
    expect(csv).toContain("Tadpole D9 [cancelled]");
    expect(csv).toMatch(/V\(y\) d1-x1 at y = 18: -?\d/);
  });
  it("the potential CSV holds 200 samples per pair with a finite V", () => {
    const curves = interactionCurves(typeOne);
    const csv = interactionsToCsv(curves, { title: typeOne.title });
    const parsed = Papa.parse<string[]>(csv.trimEnd(), { newline: "\r\n" });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual([...interactionCsvColumns]);
    const rows = parsed.data.slice(1);
    expect(rows.every((row) => row.length === interactionCsvColumns.length)).toBe(true);
    const sampled = curves.filter((curve) => curve.samples.length > 0);
    expect(rows.length).toBe(sampled.reduce((sum, curve) => sum + curve.samples.length, 0));
    expect(sampled.some((curve) => curve.samples.length === interactionSampleCount)).toBe(true);
    expect(csv).toContain("V < 0 attracts");
  });
});
