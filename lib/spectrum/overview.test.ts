import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { braneAntibranePair, landingDemoConfiguration } from "@/lib/demo-configurations";
import { resultOverview } from "./overview";

describe("resultOverview", () => {
  it("keeps every header field and drops only the detail, which together rebuild each sector", () => {
    const result = computeSpectrum(landingDemoConfiguration);
    const overview = resultOverview(result);
    expect(overview.sectors).toHaveLength(result.sectors.length);
    overview.sectors.forEach((sector, index) => {
      const full = result.sectors[index];
      expect(sector.index).toBe(index);
      expect(sector).not.toHaveProperty("levels");
      expect(sector).not.toHaveProperty("axes");
      const { index: _index, lightest: _lightest, rowCount, masslessCount, noteCount, ...header } = sector;
      expect(rowCount).toBe(full?.levels.length);
      expect(masslessCount).toBe(full?.massless.length);
      expect(noteCount).toBe(full?.notes.length);
      expect({ ...header, levels: full?.levels, axes: full?.axes, massless: full?.massless, notes: full?.notes }).toEqual(full);
    });
    expect(overview.lightest).toEqual(result.lightest);
  });

  it("names each sector's lightest surviving row: the stretched NS tachyon of a D4-antiD4 pair", () => {
    // alpha' M^2 = (y / 2 pi)^2 - 1/2 at y = 1.5 (physics.md "Mass formula"; brane-antibrane GSO keeps
    // the NS ground state, Banks and Susskind 1995, from memory).
    const overview = resultOverview(computeSpectrum(braneAntibranePair));
    const pair = overview.sectors.find((sector) => sector.pair[0] !== sector.pair[1]);
    expect(pair?.lightest?.sector).toBe("NS");
    expect(pair?.lightest?.level).toBe("0");
    expect(Number(pair?.lightest?.massSquared)).toBeCloseTo((1.5 / (2 * Math.PI)) ** 2 - 0.5, 10);
  });
});
