import { expect, test, type Locator } from "./helpers/test";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { formatEngineProse, formatMassSquared, parseResultNumber, sectorNames } from "@/lib/spectrum";
import { slabAndPoint } from "../fixtures/slab-and-point";
import { demoAccounts, signIn } from "./helpers/accounts";
import { createInGroup, unique } from "./helpers/configurations";
import { openDesigner, saveWithMessage } from "./helpers/designer";

// The designer end to end: Konva draws to a <canvas>, so every assertion goes through the
// boundary grid, the live preview and the results tables, which mirror the model.

/** A small IIA document of our own: a D4 and a D0 above it. */
const twoStackDocument = slabAndPoint;

/** True when the Konva stage inside the canvas frame has the frame's current size in CSS pixels. */
async function stageMatchesFrame(canvas: Locator): Promise<boolean> {
  return canvas.evaluate((frame) => {
    const stage = frame.querySelector("canvas");
    const box = frame.getBoundingClientRect();
    return stage !== null && stage.style.width === `${Math.floor(box.width)}px` && stage.style.height === `${Math.floor(box.height)}px`;
  });
}

test.describe("designer", () => {
  // Whole flows with two sign-ins and several saves: longer than the default budget on a shared machine.
  test.describe.configure({ timeout: 180_000 });

  test("builds a three-stack configuration on the canvas and in the grid, saves it and reloads the same", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const title = unique("Three stacks");
    await page.goto("/configurations/new");
    await page.getByLabel("Title").fill(title);
    await page.getByLabel("Space").selectOption({ label: "Brane Engineering Group" });
    await page.getByRole("radio", { name: /Type IIA/ }).check();
    await page.getByRole("button", { name: "Create and open the designer" }).click();
    await expect(page).toHaveURL(/\/configurations\/[0-9a-f-]{36}$/);
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText("U(1)");
    await expect(page.getByRole("combobox", { name: "Vertical display axis" })).toHaveValue("9");
    await expect(page.getByRole("combobox", { name: "Horizontal display axis" })).toHaveValue("8");

    // Canvas: add a stack at the centre of the view and move it with the keyboard (one grid step = 0.5).
    await page.getByRole("button", { name: "Add stack (A)" }).click();
    await expect(page.getByLabel("Select stack s1")).toBeChecked();
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText("U(1) x U(1)");
    const canvas = page.getByRole("application", { name: /Canvas showing/ });
    await canvas.focus();
    for (let i = 0; i < 4; i++) await page.keyboard.press("ArrowUp");
    await expect(page.getByLabel("Position of stack s1 on x9")).toHaveValue("2");

    // Canvas: drag the new D0 two units to the right. The view was fitted to the starting stack at
    // the origin (80 px per unit, origin at the centre), so s1 is drawn 160 px above the centre.
    // Aim by pixels only once the stage is drawn at the canvas's current size (the layout around it
    // changes as stacks are added, and the stage follows a resize one render later).
    await expect.poll(() => stageMatchesFrame(canvas)).toBe(true);
    const box = await canvas.boundingBox();
    if (!box) throw new Error("the canvas has no box");
    const cx = box.x + box.width / 2;
    const cy = box.y + box.height / 2;
    await page.mouse.move(cx, cy - 160);
    await page.mouse.down();
    for (let step = 1; step <= 8; step++) await page.mouse.move(cx + step * 20, cy - 160);
    await page.mouse.up();
    await expect(page.getByLabel("Position of stack s1 on x8")).toHaveValue("2");
    await expect(page.getByLabel("Position of stack s1 on x9")).toHaveValue("2");

    // Grid: a third stack, made an anti-D4 pair of branes one unit above the first D4.
    await page.getByRole("button", { name: "Add stack", exact: true }).click();
    for (const axis of [1, 2, 3, 4]) await page.getByRole("button", { name: `Stack s2, axis x${axis}: Dirichlet` }).click();
    await expect(page.getByTestId("stack-kind-s2")).toHaveText("D4");
    await page.getByLabel("Number of branes N in stack s2").fill("2");
    await page.getByRole("button", { name: "Stack s2 is an antibrane" }).click();
    await page.getByLabel("Position of stack s2 on x9").fill("1");
    await expect(page.getByTestId("stack-kind-s2")).toHaveText("anti-D4");
    // U(N) per separated stack; an anti-D4 one unit from a D4 is inside y_c = pi sqrt(2), so tachyonic
    // (common practice; Banks and Susskind 1995, hep-th/9511194, from memory).
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText("U(2) x U(1) x U(1)");
    await expect(page.getByTestId("spectrum-stability")).toContainText("tachyonic sector");
    // Sectors are named by the stacks' labels (stack a is labelled "first stack"; a new stack by its id).
    await expect(page.getByTestId("spectrum-tachyons")).toContainText("first stack\u2013s2");

    // An odd p is not allowed in IIA: shown inline, and saving is blocked until it is fixed.
    await page.getByRole("button", { name: "Stack s2, axis x5: Dirichlet" }).click();
    await expect(page.getByRole("alert").filter({ hasText: /IIA allows only even p/ })).toBeVisible();
    await expect(page.getByRole("button", { name: "Save", exact: true })).toBeDisabled();
    await page.getByRole("button", { name: "Stack s2, axis x5: Neumann" }).click();
    await expect(page.getByRole("alert").filter({ hasText: /IIA allows only even p/ })).toHaveCount(0);

    await saveWithMessage(page, "Three stacks with a brane-antibrane pair");
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
    await expect(page.getByTestId("saved-version")).toHaveText("version 2");

    await page.reload();
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
    await expect(page.getByText("Unsaved draft restored")).toHaveCount(0);
    await expect(page.getByLabel("Position of stack s1 on x8")).toHaveValue("2");
    await expect(page.getByLabel("Position of stack s1 on x9")).toHaveValue("2");
    await expect(page.getByTestId("stack-kind-s2")).toHaveText("anti-D4");
    await expect(page.getByLabel("Number of branes N in stack s2")).toHaveValue("2");
    await expect(page.getByLabel("Position of stack s2 on x9")).toHaveValue("1");
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText("U(2) x U(1) x U(1)");
  });

  test("keeps an unsaved draft across a reload", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, twoStackDocument(unique("Draft kept")));
    await openDesigner(page, id);
    await page.getByLabel("Position of stack b on x9").fill("3.25");
    await expect(page.getByTestId("save-state")).toHaveText("Unsaved changes");
    await page.reload();
    await expect(page.getByText("Unsaved draft restored")).toBeVisible();
    await expect(page.getByLabel("Position of stack b on x9")).toHaveValue("3.25");
  });

  test("exports the canvas as a PNG image", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, twoStackDocument(unique("Canvas picture")));
    await openDesigner(page, id);
    await page.getByRole("button", { name: "Export", exact: true }).click();
    const downloading = page.waitForEvent("download");
    await page.getByRole("menuitem", { name: /Canvas \(PNG\)/ }).click();
    const download = await downloading;
    expect(download.suggestedFilename()).toMatch(/^canvas-picture-.*-canvas\.png$/);
    const path = await download.path();
    const { readFile } = await import("node:fs/promises");
    const bytes = await readFile(path);
    // PNG signature (RFC 2083 / ISO 15948): 89 50 4E 47 0D 0A 1A 0A.
    expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(bytes.length).toBeGreaterThan(1000);
  });

  test("a deleted configuration comes back with the dashboard's undo", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const title = unique("Undo delete");
    const id = await createInGroup(page, twoStackDocument(title));
    await openDesigner(page, id);
    await page.getByRole("button", { name: "Delete", exact: true }).click();
    await page.getByRole("dialog", { name: "Delete this configuration?" }).getByRole("button", { name: "Delete" }).click();
    await expect(page).toHaveURL(/\/dashboard\?deleted=/);
    const notice = page.getByRole("status").filter({ hasText: `“${title}” was deleted` });
    await expect(notice).toBeVisible();
    expect((await page.request.get(`/api/configurations/${id}`)).status()).toBe(404);

    await notice.getByRole("button", { name: "Undo delete" }).click();
    await expect(page).toHaveURL(new RegExp(`/configurations/${id}$`));
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
    await expect(page.getByLabel("Position of stack b on x9")).toHaveValue("1.5");
    expect((await page.request.get(`/api/configurations/${id}`)).status()).toBe(200);
  });

  test("shows results whose numbers equal the engine's", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const document: Configuration = {
      ...twoStackDocument(unique("Results check")),
      stacks: [
        ...twoStackDocument("x").stacks,
        { id: "c", label: "anti slab", count: 2, anti: true, worldvolume: [1, 2, 3, 4], position: { "9": 2 } },
      ],
    };
    const id = await createInGroup(page, document);
    await page.goto(`/configurations/${id}/results`);
    const expected = computeSpectrum(document);
    const names = sectorNames(document.stacks);
    const table = page.getByTestId("lightest-table");
    await expect(table.getByRole("row")).toHaveCount(expected.lightest.length + 1);
    const rows = await table.getByRole("row").all();
    for (const [i, state] of expected.lightest.entries()) {
      const cells = rows[i + 1]!.getByRole("cell");
      await expect(cells.nth(0)).toHaveText(names.sector(state.pair).text);
      await expect(cells.nth(1)).toHaveText(state.sector);
      await expect(cells.nth(2)).toHaveText(state.level);
      await expect(cells.nth(3)).toHaveText(formatMassSquared(state.massSquared));
      await expect(cells.nth(6)).toHaveText(state.withChanPaton);
    }
    await expect(page.getByTestId("spectrum-supersymmetry")).toHaveText(`${expected.supercharges} supercharges`);
    // The theory on each worldvolume, as the engine describes it.
    const worldvolumes = page.getByTestId("spectrum-worldvolumes").getByRole("listitem");
    await expect(worldvolumes).toHaveCount(expected.worldvolumes.length);
    for (const [i, worldvolume] of expected.worldvolumes.entries()) {
      await expect(worldvolumes.nth(i)).toContainText(formatEngineProse(worldvolume.summary));
      await expect(worldvolumes.nth(i)).toContainText(worldvolume.supersymmetry);
    }
    const tachyonic = expected.sectors.filter((s) => s.tachyonic).length;
    await expect(page.getByTestId("spectrum-stability")).toHaveText(tachyonic === 0 ? "No tachyons" : new RegExp(`^${tachyonic} tachyonic sector`));

    // The per-sector table of the brane-antibrane sector sorts by alpha' M^2.
    const sector = page.getByTestId("sector-a-c");
    await sector.getByRole("button", { name: /M²/ }).first().click();
    const firstRow = sector.getByRole("table").first().getByRole("row").nth(1);
    const lightestAc = expected.sectors.find((s) => s.pair.join("-") === "a-c")!;
    const minimum = [...lightestAc.levels].sort((x, y) => parseResultNumber(x.massSquared) - parseResultNumber(y.massSquared))[0]!;
    await expect(firstRow.getByRole("cell").nth(2)).toContainText(formatMassSquared(minimum.massSquared));
    await expect(page.getByText(/Caution/).first()).toBeVisible();
  });

  test("the whole edit-and-save flow works by keyboard through the grid", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, twoStackDocument(unique("Keyboard")));
    await openDesigner(page, id);

    await page.getByRole("button", { name: "Add stack", exact: true }).focus();
    await page.keyboard.press("Enter");
    const toggle = page.getByRole("button", { name: "Stack s1, axis x1: Dirichlet" });
    await toggle.focus();
    await page.keyboard.press("Space");
    await expect(page.getByRole("button", { name: "Stack s1, axis x1: Neumann" })).toBeFocused();
    // Tab walks to the next axis cell's toggle, Enter flips it: a D2 now.
    await page.keyboard.press("Tab");
    await expect(page.getByRole("button", { name: "Stack s1, axis x2: Dirichlet" })).toBeFocused();
    await page.keyboard.press("Enter");
    await expect(page.getByTestId("stack-kind-s1")).toHaveText("D2");

    const position = page.getByLabel("Position of stack s1 on x9");
    await position.focus();
    await page.keyboard.press("ArrowUp");
    await page.keyboard.press("ArrowUp");
    await expect(position).toHaveValue("1");
    const count = page.getByLabel("Number of branes N in stack s1");
    await count.focus();
    await page.keyboard.press("ArrowUp");
    await expect(count).toHaveValue("2");
    await expect(page.getByTestId("spectrum-gauge-group")).toHaveText(/U\(2\)/);

    await page.keyboard.press("Control+s");
    const dialog = page.getByRole("dialog", { name: "Save a revision" });
    await expect(dialog.getByLabel("What changed?")).toBeFocused();
    await page.keyboard.type("Added a D2 pair by keyboard");
    await page.keyboard.press("Enter");
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
    await expect(page.getByTestId("saved-version")).toHaveText("version 2");
  });
});
