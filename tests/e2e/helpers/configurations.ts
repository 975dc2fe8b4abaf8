import { expect, type Page } from "@playwright/test";
import type { Configuration } from "@/lib/boundary/types";

/** Slug of the seed's shared research group, where the demo researcher may write. */
export const demoGroupSlug = "brane-engineering";

/** Creates a configuration in the seed's shared group through the API as the signed-in user; returns its id. */
export async function createInDemoGroup(page: Page, document: Configuration): Promise<string> {
  const groups = (await (await page.request.get("/api/groups")).json()) as Array<{ id: string; slug: string }>;
  const group = groups.find((g) => g.slug === demoGroupSlug);
  expect(group).toBeDefined();
  const response = await page.request.post("/api/configurations", { data: { groupId: group?.id, document, message: "Created by the test" } });
  expect(response.status()).toBe(201);
  return ((await response.json()) as { id: string }).id;
}
