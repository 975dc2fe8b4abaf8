import { describe, expect, it } from "vitest";
import type { LevelRow } from "@/lib/boundary/types";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { lightestBySector, lightestLevel } from "./lightest";
import { pairKey } from "./pair-key";

function row(level: string, massSquared: string, withChanPaton: string): LevelRow {
  return { sector: "NS", level, massSquared, mass: null, states: withChanPaton, withChanPaton };
}

describe("lightestLevel", () => {
  it("skips levels the GSO projection empties", () => {
    const sector = makeSector(["a", "a"], { levels: [row("0", "-1/2", "0"), row("1/2", "0", "16"), row("1", "1/2", "256")] });
    expect(lightestLevel(sector)?.level).toBe("1/2");
  });

  it("compares exact and decimal alpha' M^2 by value", () => {
    const sector = makeSector(["a", "b"], { levels: [row("1/2", "1.25", "4"), row("0", "-0.25", "2"), row("1", "-1/8", "8")] });
    expect(lightestLevel(sector)?.massSquared).toBe("-0.25");
  });

  it("keeps the first of two equally light rows", () => {
    const sector = makeSector(["a", "a"], { levels: [row("1/2", "0", "8"), { ...row("0", "0", "8"), sector: "R" }] });
    expect(lightestLevel(sector)?.sector).toBe("NS");
  });

  describe("edge cases", () => {
    it("returns null when no row survives and skips unreadable rows", () => {
      expect(lightestLevel(makeSector(["a", "b"], { levels: [row("0", "-1/2", "0")] }))).toBeNull();
      expect(lightestLevel(makeSector(["a", "b"], { levels: [] }))).toBeNull();
      expect(lightestLevel(makeSector(["a", "b"], { levels: [row("0", "?", "4"), row("1", "1", "4")] }))?.level).toBe("1");
    });
  });
});

describe("lightestBySector", () => {
  const result = makeSpectrumResult([
    makeSector(["a", "b"], { levels: [row("0", "-1/2", "0"), row("1/2", "0", "16")] }),
    makeSector(["c", "b"], { tachyonic: true, levels: [row("0", "-1/2", "2")] }),
    makeSector(["d", "d"], { levels: [row("0", "-1/2", "0")] }),
  ]);

  it("finds each sector's lightest surviving row under its pair key", () => {
    const map = lightestBySector(result);
    expect(map.get(pairKey("b", "a"))?.row.massSquared).toBe("0");
    expect(map.get(pairKey("b", "c"))).toMatchObject({ row: { massSquared: "-1/2" }, sector: { tachyonic: true } });
  });

  it("leaves out sectors without a surviving row", () => {
    expect([...lightestBySector(result).keys()]).toEqual(["a|b", "b|c"]);
  });

  it("does not mutate the result", () => {
    const before = structuredClone(result);
    lightestBySector(result);
    expect(result).toEqual(before);
  });
});
