import { expect, test } from "@playwright/test";
import { computeSweepPoint, pointDocument, pointVerdict, type SweepDefinition } from "@/lib/sweeps";
import { braneAntibraneAtOrigin } from "@/lib/sweeps/test-configurations";
import { demoAccounts, signIn } from "./helpers/accounts";
import { createInGroup } from "./helpers/configurations";

// A sweep end to end: define it on a saved configuration, start it, watch the worker that
// scripts/test.mjs runs against the e2e database store its points, read the table and the map,
// and open a point as a draft in the designer.

test.describe("sweeps", () => {
  test.describe.configure({ timeout: 180_000 });

  test("starts a sweep of separations, watches it finish, reads the map and opens a point as a draft", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const title = `Pull apart ${Date.now().toString(36)}`;
    // A D4 and an anti-D4, both at the origin, to be pulled apart along x9.
    const base = { ...braneAntibraneAtOrigin, title };
    const id = await createInGroup(page, base);

    await page.goto(`/configurations/${id}/sweeps`);
    await expect(page.getByText("No sweeps yet")).toBeVisible({ timeout: 30_000 });
    // The form starts with the last stack's last Dirichlet axis: b on x9, from 0 to 5.
    await expect(page.getByLabel("Stack")).toHaveValue("b");
    await expect(page.getByLabel("Axis")).toHaveValue("9");
    await page.getByLabel("To (√α′)").fill("8");
    await page.getByLabel("Number of values").fill("9");
    await expect(page.locator("#sweep-point-count")).toContainText("9 points");
    // Too many values is refused in the form, with the limit named, before anything is sent.
    await page.getByLabel("Number of values").fill("200001");
    await expect(page.getByText(/at most 200,000 are allowed/)).toBeVisible();
    await expect(page.getByRole("button", { name: "Start sweep" })).toBeDisabled();
    await page.getByLabel("Number of values").fill("9");
    await page.getByLabel("Title (optional)").fill("where the tachyon goes away");
    await page.getByRole("button", { name: "Start sweep" }).click();

    await expect(page).toHaveURL(new RegExp(`/configurations/${id}/sweeps/[0-9a-f-]{36}$`), { timeout: 30_000 });
    await expect(page.getByRole("heading", { name: "where the tachyon goes away" })).toBeVisible();
    // Progress comes in while the worker stores chunks; it ends with every point.
    await expect(page.getByTestId("sweep-progress-text")).toContainText("of 9 points stored", { timeout: 30_000 });
    await expect(page.getByTestId("sweep-progress-text")).toContainText("9 of 9 points stored", { timeout: 90_000 });
    await expect(page.getByText("completed", { exact: true })).toBeVisible();

    // The table agrees with the engine, point by point: y < pi sqrt(2) ~ 4.44 is tachyonic (Banks and Susskind, from memory).
    const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "position", stack: "b", axis: 9, values: { kind: "range", from: 0, to: 8, steps: 9 } }] };
    await expect(page.getByText("9 of 9 stored points shown")).toBeVisible();
    await page.getByLabel("Filter by verdict").selectOption("tachyonic");
    await expect(page.getByText("5 of 9 stored points shown")).toBeVisible();
    await page.getByLabel("Filter by verdict").selectOption("");
    for (const index of [0, 4, 5, 8]) {
      expect(pointVerdict(computeSweepPoint(base, definition, index))).toBe(index <= 4 ? "tachyonic" : "neither");
      const label = `b x9 ${index}: ${index <= 4 ? "tachyonic" : "neither"}`;
      await expect(page.getByRole("button", { name: label })).toBeVisible();
    }

    // Open point 6 (b at x9 = 6) from the table, as a draft of this configuration.
    await page.getByRole("button", { name: "Open point 6" }).click();
    await expect(page.getByRole("heading", { name: /Point #6: neither/ })).toBeVisible();
    await page.getByRole("button", { name: "Open as draft" }).click();
    await expect(page).toHaveURL(new RegExp(`/configurations/${id}$`));
    await expect(page.getByText("Unsaved draft restored")).toBeVisible({ timeout: 30_000 });
    const expected = pointDocument(base, definition, 6).stacks[1]?.position["9"];
    expect(expected).toBe(6);
    await expect(page.getByLabel("Position of stack b on x9")).toHaveValue(String(expected));
  });
});
