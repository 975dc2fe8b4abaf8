import { expect, type Page } from "@playwright/test";
import type { Configuration } from "@/lib/boundary/types";

/** The seeded demo group the flows create their configurations in. */
export const demoGroupSlug = "brane-engineering";

/** A title no other run uses. */
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
