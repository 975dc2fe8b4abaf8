import { expect, test, type Page } from "./helpers/test";
import { computeSpectrum, tDualize } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { quantumNumberText } from "@/lib/spectrum";
import { demoAccounts, signIn } from "./helpers/accounts";
import { createInGroup, unique } from "./helpers/configurations";
import { openDesigner, saveWithMessage } from "./helpers/designer";

// Compact axes from end to end (issue 9): mark an axis compact in the boundary grid, save, T-dualise
// it and see the same lightest states, undo, fork the dual configuration, set a Wilson line on the
// fork, then read the tower on the results page, in the CSV export and in the revision diff.
// Konva draws to a canvas, so every check goes through the grid, the preview and the panels.

/** Two D0s on x9, 2.5 apart: on a circle of radius 2 their strings wind. */
function twoPoints(title: string): Configuration {
  return {
    format: 1,
    title,
    theory: "IIA",
    stringScaleGeV: null,
    levels: 2,
    stacks: [
      { id: "a", label: "a", count: 1, anti: false, worldvolume: [], position: { "9": 0 } },
      { id: "b", label: "b", count: 1, anti: false, worldvolume: [], position: { "9": 2.5 } },
    ],
  };
}

/** The preview's lightest-states table as text, row by row. */
async function lightestRows(page: Page): Promise<string[]> {
  return page.getByRole("table", { name: "Lightest states" }).getByRole("row").allInnerTexts();
}

test.describe("compact axes", () => {
  test.describe.configure({ timeout: 180_000 });

  test("marks x9 compact, T-dualises it with the same spectrum, forks the dual, sets a Wilson line and reads the tower", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const title = unique("Two points on a circle");
    const id = await createInGroup(page, twoPoints(title));
    await openDesigner(page, id);

    // x9 becomes a circle of radius 2 in the grid's radius row.
    const radius = page.getByLabel("Radius of the circle x9 (empty: non-compact)");
    await radius.fill("2");
    await expect(page.getByTestId("save-state")).toHaveText("Unsaved changes");
    await expect(page.getByRole("application", { name: /x9 a circle of radius 2/ })).toBeVisible();
    await saveWithMessage(page, "x9 on a circle");
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
    const before = await lightestRows(page);
    expect(before.length).toBeGreaterThan(1);

    // T-duality along x9: D0s become D1s of IIB, R = 2 -> 1/2, b's position 2.5 becomes the Wilson line 2.5 / 2.
    await page.getByRole("button", { name: "T-dualise along x9" }).click();
    await expect(page.getByTestId("duality-notice")).toContainText("R = 2 → 0.5, IIA → IIB");
    await expect(page.getByTestId("stack-kind-a")).toHaveText("D1");
    await expect(radius).toHaveValue("0.5");
    await expect(page.getByLabel("Wilson line of stack b on x9 (radians)")).toHaveValue("1.25");
    // The same physical spectrum: the lightest states read the same (Polchinski vol. 1, sections 8.6-8.7, from memory).
    await expect.poll(() => lightestRows(page)).toEqual(before);

    // One undo step brings the D0s back; the command again, then fork the dual draft.
    await page.getByRole("status").filter({ hasText: "T-dualised along x9" }).getByRole("button", { name: "Undo" }).click();
    await expect(page.getByTestId("stack-kind-a")).toHaveText("D0");
    await expect(radius).toHaveValue("2");
    await page.getByRole("button", { name: "T-dualise along x9" }).click();
    await expect(page.getByTestId("stack-kind-b")).toHaveText("D1");
    await page.getByRole("button", { name: "Fork the dual configuration" }).click();
    const fork = page.getByRole("dialog", { name: "Fork this configuration" });
    await fork.getByRole("button", { name: "Fork", exact: true }).click();
    await page.waitForURL((url) => url.pathname.startsWith("/configurations/") && !url.pathname.endsWith(id));
    const forkId = new URL(page.url()).pathname.split("/").at(-1) ?? "";
    await expect(page.getByRole("application", { name: /x9 a circle of radius 0.5/ })).toBeVisible({ timeout: 30_000 });
    const stored = (await (await page.request.get(`/api/configurations/${forkId}`)).json()) as { document: Configuration };
    const expectedDual = tDualize({ ...twoPoints(title), format: 2, compact: { "9": 2 } }, 9);
    expect(stored.document.theory).toBe("IIB");
    expect(stored.document.compact).toEqual(expectedDual.compact);
    expect(stored.document.stacks.map((stack) => stack.worldvolume)).toEqual([[9], [9]]);

    // A Wilson line on the fork: a and b now differ by 1.25 - 0.5, so the lightest a-b states move.
    await page.getByLabel("Wilson line of stack a on x9 (radians)").fill("0.5");
    await expect.poll(() => lightestRows(page)).not.toEqual(before);
    await saveWithMessage(page, "Wilson line on a");
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");

    // The tower of the original on its results page: the stretched strings wind w = 0, -1, ... on x9.
    const expected = computeSpectrum({ ...twoPoints(title), format: 2, compact: { "9": 2 } });
    const sectorAB = expected.sectors.find((sector) => sector.pair.join("-") === "a-b");
    expect(sectorAB?.tower?.length).toBeGreaterThan(0);
    await page.goto(`/configurations/${id}/results`);
    const card = page.getByTestId("sector-a-b");
    await expect(card).toBeVisible({ timeout: 30_000 });
    // Small results open their cards at once; a larger one would start closed.
    if (!(await card.evaluate((element) => (element as HTMLDetailsElement).open))) await card.locator("summary").first().click();
    const tower = card.getByTestId("tower-panel");
    await expect(tower).toBeVisible();
    await expect(tower.getByRole("combobox", { name: "Plot against" })).toHaveValue("9");
    const towerTable = tower.getByRole("table");
    await expect(towerTable.getByRole("row")).toHaveCount((sectorAB?.tower?.length ?? 0) + 1);
    for (const state of sectorAB?.tower ?? []) {
      await expect(towerTable).toContainText(quantumNumberText(state));
    }

    // The CSV export carries the quantum numbers.
    const csv = await (await page.request.get(`/api/configurations/${id}/export?format=csv`)).text();
    expect(csv).toContain("row,quantum_numbers");
    expect(csv).toContain(",tower,w9 = 0");

    // The revision diff names the new radius.
    await page.goto(`/configurations/${id}/history?from=1&to=2`);
    await expect(page.getByText("x9 made compact, radius 2")).toBeVisible();
  });
});
