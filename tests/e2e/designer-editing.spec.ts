import { expect, test, type Locator, type Page } from "./helpers/test";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { formatNumber, massInGeV } from "@/lib/spectrum";
import { slabAndPoint } from "../fixtures/slab-and-point";
import { demoAccounts, newAccount, signIn, signInTimeout } from "./helpers/accounts";
import { createInGroup, demoGroupSlug, unique } from "./helpers/configurations";
import { openDesigner, saveWithMessage } from "./helpers/designer";
import { waitForMessageTo } from "./helpers/mailbox";

// Editing in the designer, as a researcher meets it: document settings and masses in GeV, refused
// values that say why, paired N<->D flips, stale saves with a merge, comparisons of forks, the phone
// layout, and the wording around it. Konva draws to a canvas, so every check goes through the grid,
// the preview and the dialogs.

/** The alert a field shows beside itself. */
function alertWith(page: Page, text: string | RegExp): Locator {
  return page.getByRole("alert").filter({ hasText: text });
}

/** True when the element lies within the page's width (it may be below the fold). */
async function fitsAcross(locator: Locator, width: number): Promise<boolean> {
  const box = await locator.boundingBox();
  return box !== null && box.x >= 0 && box.x + box.width <= width;
}

/** True when the element scrolls sideways (its content is wider than its box). */
async function scrollsSideways(locator: Locator): Promise<boolean> {
  return locator.evaluate((element) => element.scrollWidth > element.clientWidth + 1);
}

test.describe("designer editing", () => {
  // Flows with several page loads, saves and sign-ins on a shared machine.
  test.describe.configure({ timeout: 180_000 });

  test("sets the highest level and the string scale, explains refused values and moves a worldvolume without breaking p", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, slabAndPoint(unique("Settings")));
    await openDesigner(page, id);

    // Levels and string scale: the preview shows masses in GeV once a scale is set.
    await page.getByLabel("Highest level N").fill("5");
    const scale = page.getByLabel(/^String scale M/);
    await scale.fill("1e16");
    await expect(page.getByTestId("preview-string-scale")).toContainText(`String scale Ms = ${formatNumber(1e16)} GeV`);
    const lightest = page.getByRole("table", { name: "Lightest states" });
    await expect(lightest.getByRole("columnheader", { name: "M (GeV)" })).toBeVisible();
    const expected = computeSpectrum({ ...slabAndPoint(), levels: 5, stringScaleGeV: 1e16 }).lightest.slice(0, 8);
    const massive = expected.findIndex((state) => state.mass !== null && state.mass > 0);
    expect(massive).toBeGreaterThanOrEqual(0);
    // M = (M sqrt(alpha')) x M_s (M_s = 1/sqrt(alpha'), common practice); column 6 of the row.
    await expect(lightest.getByRole("row").nth(massive + 1).getByRole("cell").nth(5)).toHaveText(
      formatNumber(massInGeV(expected[massive]!.mass, 1e16)),
    );
    await scale.fill("0");
    await expect(alertWith(page, "The string scale must be greater than 0: 0 GeV is not.")).toBeVisible();
    await scale.fill("1e16");

    // Out-of-range N says why while typing, and which value stayed after leaving the field.
    const count = page.getByLabel("Number of branes N in stack a");
    await count.fill("0");
    await expect(alertWith(page, "N must be at least 1: 0 is too small.")).toBeVisible();
    await count.fill("100000");
    await expect(alertWith(page, "N can be at most 10000: 100000 is too large.")).toBeVisible();
    await count.fill("2.5");
    await expect(alertWith(page, "N must be a whole number: 2.5 is not.")).toBeVisible();
    await count.press("Tab");
    await expect(count).toHaveValue("1");
    await expect(alertWith(page, "N must be a whole number: 2.5 is not. N stays 1.")).toBeVisible();

    // A title over the limit is cut, and the note says so.
    await page.getByLabel("Title", { exact: true }).fill("x".repeat(250));
    await expect(page.getByLabel("Title", { exact: true })).toHaveValue("x".repeat(200));
    await expect(alertWith(page, "Titles hold at most 200 characters; the last 50 were left out.")).toBeVisible();
    await page.getByLabel("Title", { exact: true }).fill(unique("Settings kept"));

    // Paired flip from the grid: the D4 moves from x4 to x6 and stays a D4, so IIA still computes.
    await page.getByRole("button", { name: "Move the worldvolume of stack a" }).click();
    const move = page.getByRole("dialog", { name: "Move the worldvolume of slab" });
    await move.getByLabel("To axis (Dirichlet now)").selectOption("6");
    await expect(move.getByRole("status")).toContainText("The D4 stays a D4");
    await move.getByRole("button", { name: "Move x4 to x6" }).click();
    await expect(page.getByRole("button", { name: "Stack a, axis x6: Neumann" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Stack a, axis x4: Dirichlet" })).toBeVisible();
    await expect(page.getByTestId("stack-kind-a")).toHaveText("D4");
    await expect(alertWith(page, /IIA allows only even p/)).toHaveCount(0);

    // And back from the canvas toolbar, for the selected stack.
    await page.getByLabel("Select stack a").check();
    await page.getByRole("button", { name: "Move the worldvolume of the selected stack (M)" }).click();
    const back = page.getByRole("dialog", { name: "Move the worldvolume of slab" });
    await back.getByLabel("From axis (Neumann now)").selectOption("6");
    await back.getByLabel("To axis (Dirichlet now)").selectOption("4");
    await back.getByRole("button", { name: "Move x6 to x4" }).click();
    await expect(page.getByRole("button", { name: "Stack a, axis x4: Neumann" })).toBeVisible();

    await saveWithMessage(page, "Levels and a string scale");
    await expect(page.getByTestId("saved-version")).toHaveText("version 2");
    await page.reload();
    await expect(page.getByLabel("Highest level N")).toHaveValue("5");
    await expect(page.getByLabel(/^String scale M/)).toHaveValue("1e16");

    // A 65th stack is refused with the reason.
    const full: Configuration = {
      ...slabAndPoint(unique("Full")),
      levels: 0,
      stacks: Array.from({ length: 64 }, (_, i): Stack => ({ id: `p${i}`, label: `p${i}`, count: 1, anti: false, worldvolume: [], position: { "9": i } })),
    };
    await openDesigner(page, await createInGroup(page, full));
    await expect(page.getByText("64 stacks, the most a configuration holds")).toBeVisible();
    await page.getByRole("button", { name: "Add stack", exact: true }).click();
    await expect(page.getByRole("status").filter({ hasText: "A configuration holds at most 64 stacks" })).toBeVisible();
    await expect(page.getByLabel("Select stack p63")).toBeVisible();
    await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
  });

  test("a stale save shows who saved what, merges edits of different fields and tells the other tabs", async ({ page, browser }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, slabAndPoint(unique("Merge")));
    await openDesigner(page, id);
    const otherTab = await page.context().newPage();
    await openDesigner(otherTab, id);

    const benContext = await browser.newContext();
    const ben = await benContext.newPage();
    await signIn(ben, demoAccounts.ben);
    await openDesigner(ben, id);
    await ben.getByLabel("Number of branes N in stack a").fill("3");
    await saveWithMessage(ben, "Three slabs");
    await expect(ben.getByTestId("saved-version")).toHaveText("version 2");

    // Ada edits another field and saves against version 1.
    await page.getByLabel("Label of stack b").fill("ada's point");
    await saveWithMessage(page, "Renamed the point");
    const conflict = page.getByRole("dialog", { name: "Someone saved a newer version" });
    await expect(conflict.getByTestId("conflict-saves")).toContainText("Version 2 by Ben Castellan");
    await expect(conflict.getByTestId("conflict-saves")).toContainText("Three slabs");
    await expect(conflict.getByTestId("conflict-changes")).toContainText("Stack a: N 1 → 3");
    await conflict.getByRole("button", { name: "Merge my changes" }).click();
    await expect(conflict).toBeHidden();
    await expect(page.getByLabel("Number of branes N in stack a")).toHaveValue("3");
    await expect(page.getByLabel("Label of stack b")).toHaveValue("ada's point");
    await expect(page.getByRole("status").filter({ hasText: "Your changes now sit on top of version 2" })).toBeVisible();
    await saveWithMessage(page, "Renamed the point, merged");
    await expect(page.getByTestId("saved-version")).toHaveText("version 3");

    // The other tab hears of version 3 at once and loads it.
    const newer = otherTab.getByTestId("newer-version");
    await expect(newer).toContainText("Version 3 was saved");
    await newer.getByRole("button", { name: "Load version 3" }).click();
    await expect(otherTab.getByTestId("saved-version")).toHaveText("version 3");
    await expect(otherTab.getByLabel("Label of stack b")).toHaveValue("ada's point");

    // The same field changed on both sides cannot be merged: the dialog says which.
    await ben.getByLabel("Label of stack b").fill("ben's point");
    await saveWithMessage(ben, "Renamed the point too");
    const clash = ben.getByRole("dialog", { name: "Someone saved a newer version" });
    await expect(clash.getByTestId("conflict-clashes")).toContainText("stack b: label: yours ben's point, stored ada's point");
    await expect(clash.getByRole("button", { name: "Merge my changes" })).toHaveCount(0);
    await expect(clash).toContainText("You edited version 2, but version 3 is now stored");
    await expect(clash.getByRole("button", { name: "Save as fork" })).toBeVisible();
    // Reloading gives up the draft for the stored version.
    await clash.getByRole("button", { name: /Reload latest/ }).click();
    await expect(clash).toBeHidden();
    await expect(ben.getByLabel("Label of stack b")).toHaveValue("ada's point");
    await expect(ben.getByLabel("Number of branes N in stack a")).toHaveValue("3");
    await expect(ben.getByTestId("saved-version")).toHaveText("version 3");
    await benContext.close();
  });

  test("a collaborator forks into their own space; a repeat fork gets a distinct title, and the fork compares side by side with its source", async ({ page, browser }) => {
    await signIn(page, demoAccounts.ada);
    const title = unique("Compare source");
    const sourceId = await createInGroup(page, slabAndPoint(title));

    const benContext = await browser.newContext();
    const ben = await benContext.newPage();
    await signIn(ben, demoAccounts.ben);
    await openDesigner(ben, sourceId);
    await ben.getByRole("button", { name: "Fork", exact: true }).click();
    const dialog = ben.getByRole("dialog", { name: "Fork this configuration" });
    const personal = (await dialog.locator("option", { hasText: "(personal)" }).getAttribute("value")) ?? "";
    await dialog.getByLabel("Space").selectOption(personal);
    await dialog.getByRole("button", { name: "Fork", exact: true }).click();
    const forkedFrom = ben.getByTestId("forked-from");
    await expect(forkedFrom).toContainText(`forked from ${title} (revision 1)`, { timeout: 30_000 });
    expect(new URL(ben.url()).pathname).toMatch(/^\/configurations\/[0-9a-f-]{36}$/);
    expect(new URL(ben.url()).pathname).not.toBe(`/configurations/${sourceId}`);
    await expect(forkedFrom.getByRole("link")).toHaveAttribute("href", `/configurations/${sourceId}`);
    await expect(ben.getByText("Personal space")).toBeVisible();
    await expect(ben.getByLabel("Title", { exact: true })).toHaveValue(`${title} (fork)`);

    // The same fork again into the same space is numbered.
    const again = await ben.request.post(`/api/configurations/${sourceId}/fork`, { data: { targetGroupId: personal, title: `${title} (fork)` } });
    expect(again.status()).toBe(201);
    expect(((await again.json()) as { title: string }).title).toBe(`${title} (fork 2)`);

    await ben.getByLabel("Number of branes N in stack a").fill("2");
    await saveWithMessage(ben, "Two slabs");
    await expect(ben.getByTestId("saved-version")).toHaveText("version 2");
    await ben.getByRole("link", { name: "Compare with source" }).click();
    await expect(ben.getByRole("heading", { level: 1 })).toHaveText(`Compare “${title} (fork)” with “${title}”`);
    const source = ben.getByRole("region", { name: title, exact: true });
    const fork = ben.getByRole("region", { name: `${title} (fork)`, exact: true });
    await expect(source).toContainText("The source");
    await expect(fork).toContainText("The fork");
    await expect(source.getByRole("table", { name: `Stacks of ${title}` }).getByRole("row").filter({ hasText: "slab" })).toContainText("1");
    const forkRow = fork.getByRole("table", { name: `Stacks of ${title} (fork)` }).getByRole("row").filter({ hasText: "slab" });
    await expect(forkRow).toContainText("changed");
    await expect(forkRow.getByRole("cell").nth(3)).toHaveText("2");
    await expect(ben.getByRole("region", { name: "What differs" })).toContainText("the source → the fork");

    // The history page leads to the same comparison.
    await ben.goBack();
    await ben.getByRole("link", { name: "History", exact: true }).click();
    await ben.getByRole("link", { name: "Compare with the source" }).click();
    await expect(ben.getByRole("heading", { level: 1 })).toHaveText(`Compare “${title} (fork)” with “${title}”`);
    await benContext.close();
  });

  test("lays the designer out in one column on a phone with the header in a menu, and nothing is clipped at 1440 px", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, slabAndPoint(unique("Layout")));

    await page.setViewportSize({ width: 390, height: 844 });
    await openDesigner(page, id);
    await expect.poll(() => scrollsSideways(page.locator("html"))).toBe(false);
    const canvas = page.getByRole("region", { name: "Canvas" });
    const preview = page.getByRole("region", { name: "Live spectrum" });
    const [canvasBox, previewBox] = [await canvas.boundingBox(), await preview.boundingBox()];
    expect(canvasBox && previewBox && previewBox.y > canvasBox.y + canvasBox.height).toBe(true);
    await expect(page.getByRole("navigation", { name: "Main" })).toBeHidden();
    await page.getByRole("button", { name: "Menu" }).click();
    await page.getByRole("menuitem", { name: "New configuration" }).click();
    await expect(page).toHaveURL(/\/configurations\/new$/);

    await page.setViewportSize({ width: 1440, height: 900 });
    await openDesigner(page, id);
    await expect(page.getByRole("navigation", { name: "Main" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Menu" })).toBeHidden();
    // The grid's colour column and the preview's last column fit without scrolling.
    await expect.poll(() => scrollsSideways(page.getByTestId("boundary-grid-scroller"))).toBe(false);
    expect(await fitsAcross(page.getByLabel("Colour of stack b"), 1440)).toBe(true);
    await expect.poll(() => scrollsSideways(page.getByRole("table", { name: "Lightest states" }).locator(".."))).toBe(false);
    expect(await fitsAcross(page.getByRole("columnheader", { name: "With Chan-Paton" }), 1440)).toBe(true);
    // An inline error stays inside the page.
    await page.getByRole("button", { name: "Stack b, axis x1: Dirichlet" }).click();
    const error = alertWith(page, /IIA allows only even p/).first();
    await expect(error).toBeVisible();
    expect(await fitsAcross(error, 1440)).toBe(true);
  });

  test("words counts, roles and activity as sentences, and restores through the app's own dialog", async ({ page, browser }) => {
    await signIn(page, demoAccounts.ada);
    const title = unique("Wording");
    const id = await createInGroup(page, slabAndPoint(title));
    const saved = await page.request.put(`/api/configurations/${id}`, {
      headers: { "if-match": '"1"' },
      data: { document: { ...slabAndPoint(title), levels: 4 }, message: "Four levels" },
    });
    expect(saved.status()).toBe(200);

    // Restore asks in a dialog of the page (a window.confirm would fail this test: Playwright dismisses it).
    await page.goto(`/configurations/${id}/history`);
    await page.getByRole("button", { name: "Restore revision 1" }).click();
    const restore = page.getByRole("dialog", { name: "Restore revision 1?" });
    await expect(restore).toContainText("saved as version 3");
    await restore.getByRole("button", { name: "Restore as version 3" }).click();
    await expect(page.getByText("3 revisions, newest first.")).toBeVisible();

    await page.goto("/dashboard");
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Welcome back, Ada");
    await expect(page.getByRole("region", { name: "Recent activity" })).toContainText(`Restored revision 1 of ${title} as version 3 in Brane Engineering Group.`);
    await page.goto(`/groups/${demoGroupSlug}/audit`);
    await expect(page.getByRole("row").filter({ hasText: title }).first()).toContainText(`Ada Quayle restored revision 1 of “${title}” as version 3.`);

    // An invitation as a viewer, in the mail and on its page.
    const invitee = newAccount("viewer");
    await page.goto(`/groups/${demoGroupSlug}`);
    const invitations = page.getByRole("region", { name: "Invitations" });
    await invitations.getByLabel("E-mail address").fill(invitee.email);
    await invitations.getByLabel("Role").selectOption("viewer");
    const sentAt = new Date(Date.now() - 1000);
    await invitations.getByRole("button", { name: "Send invitation" }).click();
    const message = await waitForMessageTo(invitee.email, { subjectIncludes: "invited you", after: sentAt });
    expect(message.text).toContain("on Mooring as a viewer.");
    const link = /\/invitations\/[A-Za-z0-9_-]{43}/.exec(message.text ?? "")?.[0] ?? "";
    const visitor = await browser.newContext();
    const invitationPage = await visitor.newPage();
    await invitationPage.goto(link);
    await expect(invitationPage.getByText(`invited ${invitee.email} to this research group as a viewer.`)).toBeVisible();
    await visitor.close();

    // One account is "1 account".
    const adminContext = await browser.newContext();
    const admin = await adminContext.newPage();
    await signIn(admin, demoAccounts.admin);
    await admin.goto(`/admin?q=${encodeURIComponent(demoAccounts.ada.email)}`);
    await expect(admin.getByText(`1 account matching “${demoAccounts.ada.email}”`)).toBeVisible({ timeout: signInTimeout });
    await adminContext.close();
  });
});
