import { expect, type Page } from "@playwright/test";

/** Opens the designer of a configuration and waits until its draft is loaded. */
export async function openDesigner(page: Page, id: string): Promise<void> {
  await page.goto(`/configurations/${id}`);
  // The first visit of a route may compile it on a development server: allow for that.
  await expect(page.getByRole("application", { name: /Canvas showing/ })).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId("save-state")).toHaveText("All changes saved");
}

/** Saves the draft as a revision with `message` (the save dialog's path). */
export async function saveWithMessage(page: Page, message: string): Promise<void> {
  await page.getByRole("button", { name: "Save", exact: true }).click();
  const dialog = page.getByRole("dialog", { name: "Save a revision" });
  await dialog.getByLabel("What changed?").fill(message);
  await dialog.getByRole("button", { name: "Save revision" }).click();
}
