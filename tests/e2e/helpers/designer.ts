import { expect, type Page } from "@playwright/test";
import type { Configuration } from "@/lib/boundary/types";

/** The seeded research group the demo accounts share (README, "Demo accounts"). */
export const demoGroupSlug = "brane-engineering";

/** A title no other test run uses. */
export function unique(label: string): string {
  return `${label} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
}

/** Creates a configuration in the shared demo group through the API; returns its id. */
export async function createInGroup(page: Page, document: Configuration): Promise<string> {
  const groups = (await (await page.request.get("/api/groups")).json()) as Array<{ id: string; slug: string }>;
  const group = groups.find((g) => g.slug === demoGroupSlug);
  expect(group).toBeDefined();
  const response = await page.request.post("/api/configurations", { data: { groupId: group?.id, document, message: "Created by the test" } });
  expect(response.status()).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

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
