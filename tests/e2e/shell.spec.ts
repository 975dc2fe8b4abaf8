import { expect, test } from "./helpers/test";
import { demoAccounts, signIn } from "./helpers/accounts";

test.describe("theme", () => {
  test("the dark theme choice survives a reload and is applied before the page is interactive", async ({ page }) => {
    await page.emulateMedia({ colorScheme: "light" });
    await page.goto("/sign-in");
    const html = page.locator("html");
    await expect(html).not.toHaveClass(/\bdark\b/);

    const toggle = page.getByRole("button", { name: "Dark theme" });
    await toggle.click();
    await expect(html).toHaveClass(/\bdark\b/);
    await expect(toggle).toHaveAttribute("aria-pressed", "true");

    // Read the class as the document is parsed, before any React code runs.
    await page.addInitScript(() => {
      document.addEventListener("DOMContentLoaded", () => {
        (window as unknown as { themeAtParse: string }).themeAtParse = document.documentElement.className;
      });
    });
    await page.reload();
    const themeAtParse = await page.evaluate(() => (window as unknown as { themeAtParse?: string }).themeAtParse ?? "");
    expect(themeAtParse.split(/\s+/)).toContain("dark");

    await page.getByRole("button", { name: "Dark theme" }).click();
    await expect(html).not.toHaveClass(/\bdark\b/);
  });

  test("without a stored choice the system preference decides", async ({ page }) => {
    await page.emulateMedia({ colorScheme: "dark" });
    await page.goto("/sign-in");
    await expect(page.locator("html")).toHaveClass(/\bdark\b/);
  });
});

test.describe("account menu", () => {
  test("works from the keyboard: arrows move, Escape closes and returns focus", async ({ page }) => {
    await signIn(page, demoAccounts.cora);
    const trigger = page.getByRole("button", { name: /^Account:/ });
    // The trigger is disabled until the page has hydrated; focusing it earlier would not stick.
    await expect(trigger).toBeEnabled();
    await trigger.focus();
    await page.keyboard.press("Enter");
    await expect(page.getByRole("menu")).toBeVisible();
    await expect(page.getByRole("menuitem", { name: "Dashboard" })).toBeFocused();
    await page.keyboard.press("ArrowDown");
    await expect(page.getByRole("menuitem", { name: "Account settings" })).toBeFocused();
    await page.keyboard.press("End");
    await expect(page.getByRole("menuitem", { name: "Sign out" })).toBeFocused();
    await page.keyboard.press("ArrowDown");
    await expect(page.getByRole("menuitem", { name: "Dashboard" })).toBeFocused();
    await page.keyboard.press("Escape");
    await expect(page.getByRole("menu")).toHaveCount(0);
    await expect(trigger).toBeFocused();

    await page.keyboard.press("ArrowUp");
    await expect(page.getByRole("menuitem", { name: "Sign out" })).toBeFocused();
    await page.keyboard.press("ArrowUp");
    await page.keyboard.press("Enter");
    await expect(page).toHaveURL(/\/account$/);
    await expect(page.getByRole("heading", { level: 1, name: "Account" })).toBeVisible();
  });
});

test.describe("not found", () => {
  test("an unknown address shows the not-found page with a 404 status", async ({ page }) => {
    const response = await page.goto("/no-such-place");
    expect(response?.status()).toBe(404);
    await expect(page.getByRole("heading", { name: "This page isn’t here" })).toBeVisible();
  });
});
