import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { braneAntibranePair, landingDemoConfiguration } from "@/lib/demo-configurations";
import { pageSectorOverviews, resultOverview } from "./overview";
import { sectorNames } from "./sector-names";

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

describe("pageSectorOverviews", () => {
  const overview = resultOverview(computeSpectrum(landingDemoConfiguration));

  it("pages the sectors in result order and counts every match", () => {
    const first = pageSectorOverviews(overview.sectors, { limit: 2 });
    const second = pageSectorOverviews(overview.sectors, { offset: 2, limit: 2 });
    expect(first.total).toBe(overview.sectors.length);
    expect([...first.items, ...second.items]).toEqual(overview.sectors.slice(0, 4));
    expect(pageSectorOverviews(overview.sectors, { offset: 999 }).items).toEqual([]);
  });

  it("matches a stack's id or label, case-insensitively, and keeps only tachyonic sectors when asked", () => {
    const [first] = landingDemoConfiguration.stacks;
    const names = sectorNames(landingDemoConfiguration.stacks);
    const byLabel = pageSectorOverviews(overview.sectors, { search: (first?.label ?? "").toUpperCase(), names });
    expect(byLabel.total).toBe(landingDemoConfiguration.stacks.length);
    expect(byLabel.items.every((sector) => sector.pair.includes(first?.id ?? ""))).toBe(true);
    const tachyonic = pageSectorOverviews(overview.sectors, { tachyonicOnly: true });
    expect(tachyonic.items.every((sector) => sector.tachyonic)).toBe(true);
    expect(tachyonic.total).toBe(overview.sectors.filter((sector) => sector.tachyonic).length);
  });

  it("orders sectors naturally by the stacks' names when names are given: s2 before s10", () => {
    const stacks = Array.from({ length: 11 }, (_, i) => ({ id: `s${i + 1}`, label: `stack ${i + 1}`, count: 1, anti: false, worldvolume: [1, 2, 3], position: { 9: i } }));
    const sectors = resultOverview(computeSpectrum({ ...landingDemoConfiguration, stacks })).sectors;
    // The engine keys stacks in code-unit id order, so "s10" comes before "s2" there.
    expect(sectors.findIndex((s) => s.pair[0] === "s10")).toBeLessThan(sectors.findIndex((s) => s.pair[0] === "s2"));
    const page = pageSectorOverviews(sectors, { names: sectorNames(stacks), limit: 100 });
    const firsts = [...new Set(page.items.map((s) => s.pair[0]))];
    expect(firsts).toEqual(stacks.map((stack) => stack.id));
    expect(page.items.map((s) => s.index).sort((a, b) => a - b)).toEqual(sectors.map((s) => s.index));
  });
});
