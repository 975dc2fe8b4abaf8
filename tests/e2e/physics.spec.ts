import Papa from "papaparse";
import { expect, test, type Page } from "./helpers/test";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { formatEngineProse, formatWorldvolume } from "@/lib/spectrum";
import { demoAccounts, signIn } from "./helpers/accounts";
import { createInGroup, unique } from "./helpers/configurations";

// The classic systems on the results page and in the exports, compared with the engine: each
// worldvolume's theory, the mass cap, the nu = 8 statement, the named multiplets, the covariant
// count and the cautions (issue 14). Physics values themselves are checked in lib/boundary.

const axes = (from: number, to: number): number[] => Array.from({ length: to - from + 1 }, (_, i) => from + i);

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: id, count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function document(title: string, theory: Configuration["theory"], stacks: Stack[]): Configuration {
  return { format: 1, title: unique(title), theory, stringScaleGeV: null, levels: 2, stacks };
}

const systems: Configuration[] = [
  document("D3-D7", "IIB", [stack("d3", [1, 2, 3], { count: 2 }), stack("d7", axes(1, 7))]),
  document("D1-D5", "IIB", [stack("d1", [1], { count: 3 }), stack("d5", axes(1, 5), { count: 2 })]),
  document("D0-D8", "IIA", [stack("d8", axes(1, 8)), stack("d0", [], { position: { "9": 1 } })]),
  document("Coincident and apart", "IIB", [
    stack("x", [1, 2, 3], { count: 2 }),
    stack("y", [1, 2, 3]),
    stack("w", [1, 2, 3], { position: { "9": 2 * Math.PI } }),
    stack("anti", [1, 2, 3], { anti: true, position: { "8": 1 } }),
  ]),
];

async function openResults(page: Page, id: string): Promise<void> {
  await page.goto(`/configurations/${id}/results`);
  // The first visit of a route may compile it on a development server: allow for that. By role, not
  // test id: while the page streams, React may hold a hidden copy of the table for a moment.
  await expect(page.getByRole("table", { name: "Worldvolume theories" })).toBeVisible({ timeout: 30_000 });
}

test.describe("classic systems", () => {
  test.describe.configure({ timeout: 180_000 });

  test("the results page and the exports describe every worldvolume as the engine does", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    for (const system of systems) {
      const id = await createInGroup(page, system);
      const expected = computeSpectrum(system);
      await openResults(page, id);

      const lines = page.getByTestId("spectrum-worldvolumes").getByRole("listitem");
      await expect(lines).toHaveCount(expected.worldvolumes.length);
      const rows = page.getByRole("table", { name: "Worldvolume theories" }).getByRole("row");
      await expect(rows).toHaveCount(expected.worldvolumes.length + 1);
      for (const [i, worldvolume] of expected.worldvolumes.entries()) {
        await expect(lines.nth(i)).toContainText(formatEngineProse(worldvolume.summary));
        await expect(rows.nth(i + 1)).toContainText(worldvolume.supersymmetry);
        await expect(rows.nth(i + 1)).toContainText(formatEngineProse(worldvolume.content));
      }

      const csv = await (await page.request.get(`/api/configurations/${id}/export?format=csv`)).text();
      // A plain table read by a strict RFC 4180 reader; worldvolume lines ride on the stacks' own rows.
      const parsed = Papa.parse<Record<string, string>>(csv.replace(/\r\n$/, ""), { header: true, delimiter: ",", newline: "\r\n" });
      expect(parsed.errors).toEqual([]);
      expect(csv.startsWith("#")).toBe(false);
      for (const worldvolume of expected.worldvolumes) {
        expect(parsed.data.map((row) => row.worldvolume)).toContain(formatWorldvolume(worldvolume));
      }
      expect(parsed.meta.fields).toContain("oscillator_level");
      const tex = await (await page.request.get(`/api/configurations/${id}/export?format=tex`)).text();
      expect(tex).toContain("-worldvolumes}");
      expect(tex).toContain("Level $N$");
    }
  });

  test("D0-D8 says what holds: a created string makes it supersymmetric, a constant force without", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const system = systems[2]!;
    const id = await createInGroup(page, system);
    await openResults(page, id);
    await expect(page.getByTestId("spectrum-string-creation")).toContainText("between d0 and d8");
    await expect(page.getByText("BPS with a stretched string")).toBeVisible();
    const sector = page.getByTestId("sector-d0-d8");
    await expect(sector).toContainText("Without a fundamental string stretched between the stacks they feel a constant force");
    await expect(page.getByRole("table", { name: "Worldvolume theories" })).toContainText("one fundamental fermionic mode in 0+1 dimensions");
    // The worldsheet fermions and the light-cone axis in the mode expansions.
    await sector.getByText("Mode expansions", { exact: true }).click();
    await expect(sector.getByText("light-cone", { exact: true })).toHaveCount(1);
    await expect(sector.getByText(/Fermion boundary signs/)).toBeVisible();
  });

  test("separated identical stacks show their W-boson multiplet; the mass cap filter is in alpha' M^2", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const system = systems[3]!;
    const expected = computeSpectrum(system);
    const id = await createInGroup(page, system);
    await openResults(page, id);
    // Ten sectors: the cards start closed, and an opened one loads its detail.
    await page.getByTestId("sector-w-x").locator("summary").first().click();
    const multiplet = expected.sectors.find((sector) => sector.pair.join("-") === "w-x")?.multiplet;
    expect(multiplet).toBeTruthy();
    await expect(page.getByTestId("multiplet-w-x")).toContainText(`${multiplet?.name} in ${multiplet?.dimension} dimensions`);
    await expect(page.getByTestId("multiplet-w-x")).toContainText(multiplet?.content ?? "");
    // NS and R rows of the same sector stop at the same alpha' M^2 = levels + (y / 2 pi)^2 = 2 + 1.
    const table = page.getByTestId("sector-w-x").getByRole("table").first();
    await expect(table.getByRole("columnheader", { name: /Oscillator level N/ })).toBeVisible();
    const top = expected.sectors.find((sector) => sector.pair.join("-") === "w-x")!.levels.filter((row) => row.massSquared === "3");
    expect(top.map((row) => row.sector).sort()).toEqual(["NS", "R"]);
    const filter = page.getByLabel("Show levels up to alpha' M squared at zero separation");
    await filter.fill("0");
    await expect(table.getByRole("row")).toHaveCount(3);
  });

  test("a bosonic D25 with a D0 is counted covariantly, and a D7 carries its caution", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const bosonic = document("Covariant pair", "bosonic", [stack("fill", axes(1, 25)), stack("point", [])]);
    const id = await createInGroup(page, bosonic);
    await openResults(page, id);
    const sector = page.getByTestId("sector-fill-point");
    await expect(sector).toContainText("counted covariantly");
    const expected = computeSpectrum(bosonic).sectors.find((s) => s.pair.join("-") === "fill-point")!;
    await expect(sector.getByRole("table").first().getByRole("row")).toHaveCount(expected.levels.length + 1);

    const seven = await createInGroup(page, systems[0]!);
    await openResults(page, seven);
    await expect(page.getByText(/is a D7: a D7 stack has codimension two/)).toBeVisible();
  });
});
