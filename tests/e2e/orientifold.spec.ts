import { expect, test } from "./helpers/test";
import type { Configuration } from "@/lib/boundary/types";
import { demoAccounts, signIn } from "./helpers/accounts";
import { createInGroup, unique } from "./helpers/configurations";
import { openDesigner, saveWithMessage } from "./helpers/designer";

// Orientifold planes from the designer to the results page (issue 12). The physics values are
// checked in lib/boundary; here the flow: add a plane, read SO/USp and the tadpole line, see V(y).

const all9 = [1, 2, 3, 4, 5, 6, 7, 8, 9];

test.describe("orientifold planes", () => {
  test.describe.configure({ timeout: 180_000 });

  test("a plane added in the grid gives SO(32) with the tadpole cancelled; O+ gives USp(32) and says what would cancel it", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const document: Configuration = {
      format: 1,
      title: unique("Sixteen D9 and a mirror"),
      theory: "IIB",
      stringScaleGeV: null,
      levels: 1,
      stacks: [{ id: "nine", label: "nine", count: 16, anti: false, worldvolume: all9, position: {} }],
    };
    const id = await createInGroup(page, document);
    await openDesigner(page, id);

    const grid = page.getByTestId("orientifold-grid");
    await expect(grid).toContainText("No orientifold plane");
    await grid.getByRole("button", { name: "Add orientifold plane" }).click();
    await expect(grid.getByLabel("Type of plane o")).toHaveValue("O-");
    // The plane follows the first stack: an O9- plane, RR charge -16.
    await expect(grid.getByRole("row").nth(1)).toContainText("-16");
    await expect(grid.getByRole("button", { name: "Add orientifold plane" })).toHaveCount(0);
    await saveWithMessage(page, "add an O9- plane");
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");

    await page.goto(`/configurations/${id}/results`);
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText("SO(32)", { timeout: 30_000 });
    const tadpoles = page.getByTestId("tadpole-table");
    await expect(tadpoles.getByRole("row").nth(1)).toContainText("cancelled");
    await expect(tadpoles.getByRole("row").nth(1)).toContainText("-16");

    await openDesigner(page, id);
    await page.getByTestId("orientifold-grid").getByLabel("Type of plane o").selectOption("O+");
    // The live preview warns at once, before any save.
    await expect(page.getByText(/RR tadpole is not cancelled/).first()).toBeVisible();
    await saveWithMessage(page, "make it O+");
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
    await page.goto(`/configurations/${id}/results`);
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText("USp(32)", { timeout: 30_000 });
    await expect(page.getByTestId("tadpole-table")).toContainText("To cancel: Add 32 anti-D9 branes");
  });

  test("a D3 and an anti-D3 show their attraction V(y) with the critical separation marked", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const document: Configuration = {
      format: 2,
      title: unique("D3 and anti-D3 by a plane"),
      theory: "IIB",
      stringScaleGeV: null,
      levels: 1,
      stacks: [
        { id: "d3", label: "d3", count: 1, anti: false, worldvolume: [1, 2, 3], position: { "9": 4 } },
        { id: "bar", label: "bar", count: 1, anti: true, worldvolume: [1, 2, 3], position: { "9": -6 } },
      ],
      orientifolds: [{ id: "o", type: "O-", worldvolume: [1, 2, 3], position: {} }],
    };
    const id = await createInGroup(page, document);
    await page.goto(`/configurations/${id}/results`);
    const plot = page.getByTestId("interaction-plot");
    await expect(plot).toBeVisible({ timeout: 30_000 });
    await page.getByLabel("Pair for the interaction potential").selectOption({ label: "bar \u2013 d3 (nu = 0)" });
    await expect(page.getByTestId("interaction-summary")).toContainText("brane\u2013antibrane");
    await expect(page.getByTestId("interaction-summary")).toContainText("tachyonic below y_c = 4.443");
    await expect(page.getByTestId("interaction-summary")).toContainText(/V = \u2212/);
    await expect(plot.locator("svg .recharts-line")).toHaveCount(1);
    await expect(plot).toContainText("y_c = 4.443");
    // Images of both stacks, and the strings to them.
    await expect(page.getByTestId("image-table")).toContainText("d3'");
    await page.getByLabel("Pair for the interaction potential").selectOption({ label: "d3 \u2013 d3' (nu = 0)" });
    await expect(page.getByTestId("interaction-summary")).toContainText("V(y) = 0 at every separation");
  });
});
