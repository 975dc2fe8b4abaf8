import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { resultInputKey } from "./result-key";
import { computeSpectrum } from "./spectrum";
import type { Configuration, Stack } from "./types";

const d4 = (id: string, y: number, extra: Partial<Stack> = {}): Stack => ({
  id,
  label: id,
  count: 1,
  anti: false,
  worldvolume: [1, 2, 3, 4],
  position: { "5": 0, "9": y },
  ...extra,
});

const base: Configuration = {
  format: 1,
  title: "pair",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 2,
  stacks: [d4("a", 0), d4("b", 1.5, { anti: true })],
};

describe("resultInputKey", () => {
  it("ignores the title, the description, colours, stack order, key order and explicit zero positions", () => {
    const variant: Configuration = {
      levels: 2,
      stacks: [
        { position: { "9": 1.5 }, worldvolume: [1, 2, 3, 4], anti: true, count: 1, label: "b", id: "b", colour: "#112233" },
        { ...d4("a", 0), position: { "9": 0 } },
      ],
      stringScaleGeV: null,
      theory: "IIA",
      title: "another title",
      description: "notes",
      format: 1,
    };
    expect(resultInputKey(variant)).toBe(resultInputKey(base));
  });

  it("changes with every field the result reads", () => {
    const key = resultInputKey(base);
    const changed: Configuration[] = [
      { ...base, levels: 3 },
      { ...base, theory: "IIB", stacks: base.stacks.map((s) => ({ ...s, worldvolume: [1, 2, 3] })) },
      { ...base, stringScaleGeV: 1e16 },
      { ...base, stacks: [d4("a", 0), d4("b", 1.5)] },
      { ...base, stacks: [d4("a", 0), d4("b", 2, { anti: true })] },
      { ...base, stacks: [d4("a", 0, { count: 2 }), d4("b", 1.5, { anti: true })] },
      // Labels name stacks in warnings and notes.
      { ...base, stacks: [d4("a", 0, { label: "wall" }), d4("b", 1.5, { anti: true })] },
    ];
    for (const config of changed) expect(resultInputKey(config)).not.toBe(key);
  });

  it("gives equal results for equal keys (fast-check over reorderings and renamings of display fields)", () => {
    const y = fc.constantFrom(0, 0.5, 1.25, 3);
    fc.assert(
      fc.property(y, y, fc.boolean(), fc.string(), fc.boolean(), (ya, yb, anti, title, reverse) => {
        const one: Configuration = { ...base, stacks: [d4("a", ya), d4("b", yb, { anti })] };
        const stacks = [d4("a", ya, { colour: "#abcdef" }), d4("b", yb, { anti })];
        const two: Configuration = { ...base, title: title || "t", stacks: reverse ? stacks.reverse() : stacks };
        expect(resultInputKey(two)).toBe(resultInputKey(one));
        expect(computeSpectrum(two)).toEqual(computeSpectrum(one));
      }),
      { numRuns: 200 },
    );
  });
});

describe("resultInputKey: orientifold planes (format 2)", () => {
  const planeDocument: Configuration = {
    format: 2,
    title: "planes",
    theory: "IIB",
    stringScaleGeV: null,
    levels: 1,
    stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: { "9": 1 } }],
    orientifolds: [{ id: "o", label: "wall", type: "O-", worldvolume: [1, 2, 3], position: { "9": 0 } }],
  };
  it("changes with the plane's type and position, and not with its label or a written zero", () => {
    const key = resultInputKey(planeDocument);
    const plane = planeDocument.orientifolds?.[0] as NonNullable<Configuration["orientifolds"]>[number];
    expect(resultInputKey({ ...planeDocument, orientifolds: [{ ...plane, type: "O+" }] })).not.toBe(key);
    expect(resultInputKey({ ...planeDocument, orientifolds: [{ ...plane, position: { "9": 0.5 } }] })).not.toBe(key);
    expect(resultInputKey({ ...planeDocument, orientifolds: [{ ...plane, label: "other", position: {} }] })).toBe(key);
    expect(resultInputKey({ ...planeDocument, format: 2, orientifolds: undefined })).not.toBe(key);
  });
});
