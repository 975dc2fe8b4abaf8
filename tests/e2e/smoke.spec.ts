import { expect, test } from "./helpers/test";

test.describe("home page", () => {
  test("loads and shows the product name", async ({ page }) => {
    const response = await page.goto("/");
    expect(response?.status()).toBe(200);
    await expect(page.getByText("Mooring").first()).toBeVisible();
  });
});
