import { expect, test } from "./helpers/test";
import type { Configuration } from "@/lib/boundary/types";
import { computeSweepPoint, pointDocument, pointVerdict, type SweepDefinition } from "@/lib/sweeps";
import { braneAntibraneAtOrigin } from "@/lib/sweeps/test-configurations";
import { demoAccounts, signIn, signInTimeout } from "./helpers/accounts";
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

test.describe("sweeps in a lab", () => {
  test.describe.configure({ timeout: 240_000 });

  test("a student sweeps N/D choices and separations of a starter, reads the map, forks a point, and the instructor sees the sweep", async ({ browser }) => {
    const studentContext = await browser.newContext();
    const instructorContext = await browser.newContext();
    const student = await studentContext.newPage();
    const instructor = await instructorContext.newPage();

    await signIn(student, demoAccounts.sky);
    await student.goto("/groups/open-strings-lab");
    await student.getByRole("region", { name: "Starter configurations" }).getByRole("button", { name: "Fork “Two D2 stacks” to my space" }).click();
    await expect(student).toHaveURL(/\/configurations\/[0-9a-f-]{36}$/, { timeout: signInTimeout });
    const forkId = new URL(student.url()).pathname.split("/").pop() ?? "";

    await student.goto(`/configurations/${forkId}/sweeps`);
    // Dimension 1: the right stack's separation along x3, at 0, 1 and 2.
    await expect(student.getByLabel("Stack")).toHaveValue("right", { timeout: 30_000 });
    await student.getByLabel("Axis").selectOption("3");
    await student.getByLabel("From (√α′)").fill("0");
    await student.getByLabel("To (√α′)").fill("2");
    await student.getByLabel("Number of values").fill("3");
    // Dimension 2: N or D for the right stack on x8 and x9, up to relabelling the two axes.
    await student.getByLabel("Add a dimension").selectOption("boundary");
    await student.getByRole("button", { name: "Add", exact: true }).click();
    await student.getByRole("checkbox", { name: "left", exact: true }).uncheck();
    await expect(student.getByRole("checkbox", { name: "x8", exact: true })).toBeChecked();
    await expect(student.getByRole("checkbox", { name: "x9", exact: true })).toBeChecked();
    // One stack on k axes up to relabelling: k + 1 choices (DD, ND, NN), a binomial sum (common practice).
    await expect(student.locator("#sweep-point-count")).toContainText("9 points");
    const title = `N/D and separation ${Date.now().toString(36)}`;
    await student.getByLabel("Title (optional)").fill(title);
    await student.getByRole("button", { name: "Start sweep" }).click();

    await expect(student).toHaveURL(new RegExp(`/configurations/${forkId}/sweeps/[0-9a-f-]{36}$`), { timeout: 30_000 });
    await expect(student.getByTestId("sweep-progress-text")).toContainText("9 of 9 points stored", { timeout: 120_000 });
    await expect(student.getByText("9 of 9 stored points shown")).toBeVisible();

    // The map agrees with the engine on every point. Facts of the trade (common practice): parallel D2
    // stacks are BPS at any separation, and a D3 (N on one of the two axes) does not exist in IIA.
    const response = await student.request.get(`/api/configurations/${forkId}`);
    const base = ((await response.json()) as { document: Configuration }).document;
    const definition: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "position", stack: "right", axis: 3, values: { kind: "range", from: 0, to: 2, steps: 3 } },
        { kind: "boundary", stacks: ["right"], axes: [8, 9], symmetry: "relabel-axes" },
      ],
    };
    const verdicts = Array.from({ length: 9 }, (_unused, index) => pointVerdict(computeSweepPoint(base, definition, index)));
    // Point 3 d + c: separation d, choice c in the order DD, ND, NN.
    expect([0, 3, 6].map((i) => verdicts[i])).toEqual(["supersymmetric", "supersymmetric", "supersymmetric"]);
    expect([1, 4, 7].map((i) => verdicts[i])).toEqual(["invalid", "invalid", "invalid"]);
    // D2-D4 has two ND axes: NS zero-point energy -1/4, plus (y / 2 pi)^2 when stretched over y
    // (alpha' = 1; from memory, the standard Dp-Dp' zero-point energy -1/2 + #ND/8).
    for (const d of [0, 1, 2]) {
      const outcome = computeSweepPoint(base, definition, 3 * d + 2);
      expect(outcome.status === "ok" ? outcome.lightestMassSquared : null).toBeCloseTo(-0.25 + (d / (2 * Math.PI)) ** 2, 9);
    }
    const map = student.getByRole("grid", { name: "Verdict map" });
    for (const verdict of ["supersymmetric", "tachyonic", "neither"] as const) {
      await expect(map.getByRole("button", { name: new RegExp(`: ${verdict}$`) })).toHaveCount(verdicts.filter((v) => v === verdict).length);
    }
    await expect(map.getByRole("button", { name: /: not allowed$/ })).toHaveCount(3);

    // Open the point with the right stack at x3 = 2 and Neumann on both axes (a D4) as a fork.
    await map.getByRole("button", { name: /^right x3 2, .*NN: / }).click();
    await expect(student.getByRole("heading", { name: /Point #8: / })).toBeVisible();
    await student.getByRole("button", { name: "Fork into my space" }).click();
    await expect(student).toHaveURL(/\/configurations\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    expect(new URL(student.url()).pathname).not.toBe(`/configurations/${forkId}`);
    await expect(student.getByLabel("Position of stack right on x3")).toHaveValue("2", { timeout: 30_000 });
    expect(pointDocument(base, definition, 8).stacks.find((stack) => stack.id === "right")?.worldvolume).toEqual([1, 2, 8, 9]);

    // The instructor sees the sweep beside the student's fork in the lab overview.
    await signIn(instructor, demoAccounts.ian);
    await instructor.goto("/groups/open-strings-lab");
    const forks = instructor.getByRole("region", { name: "Student forks" });
    await expect(forks.getByText(`${title}: completed, 9/9 points`)).toBeVisible({ timeout: 30_000 });

    await studentContext.close();
    await instructorContext.close();
  });
});
