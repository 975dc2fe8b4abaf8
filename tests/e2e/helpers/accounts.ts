import { expect, type Page } from "@playwright/test";
import { extractFirstLink, waitForMessageTo } from "./mailbox";

/**
 * Waiting time for a navigation that follows a bcrypt hash or check (sign-up, sign-in): the hash
 * is deliberately slow and the machine is shared, so the default expect timeout is too short.
 */
export const signInTimeout = 30_000;

/** Password of every demo account in the seed (README, "Demo accounts"). */
export const demoPassword = "demo-password-1";

/** Demo accounts from the seed; each test that changes an account makes its own instead. */
export const demoAccounts = {
  admin: { email: "admin@mooring.test", password: "harbour-admin-1" },
  ada: { email: "ada@mooring.test", password: demoPassword },
  ben: { email: "ben@mooring.test", password: demoPassword },
  cora: { email: "cora@mooring.test", password: demoPassword },
  ian: { email: "ian@mooring.test", password: demoPassword },
  sam: { email: "sam@mooring.test", password: demoPassword },
  sky: { email: "sky@mooring.test", password: demoPassword },
} as const;

export interface NewAccount {
  name: string;
  email: string;
  password: string;
}

/** A fresh, unique account description (not yet created). */
export function newAccount(label: string): NewAccount {
  const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}`;
  return { name: `Test ${label} ${unique}`, email: `e2e-${label}-${unique}@mooring.test`, password: `pw-${unique}-long` };
}

/** Creates the account through the sign-up form and its mailed confirmation link; ends signed in on the dashboard. */
export async function signUp(page: Page, account: NewAccount): Promise<void> {
  await page.goto("/sign-up");
  await submitSignUpForm(page, account);
  await confirmSignUpFromMailbox(page, account);
  await expect(page).toHaveURL(/\/dashboard$/, { timeout: signInTimeout });
  await expect(page.getByRole("button", { name: /^Account:/ })).toBeVisible();
}

/** Fills in and submits the sign-up form that is open on `page`, and waits for the "check your inbox" answer. */
export async function submitSignUpForm(page: Page, account: NewAccount): Promise<void> {
  await page.getByLabel("Name").fill(account.name);
  await page.getByLabel("E-mail").fill(account.email);
  await page.getByLabel("Password", { exact: true }).fill(account.password);
  await page.getByLabel("Repeat the password").fill(account.password);
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Check your inbox" })).toBeVisible({ timeout: signInTimeout });
}

/**
 * Opens the confirmation link mailed to `account.email` (the newest one) and finishes the sign-up
 * with the account's password; the page then opens wherever the sign-up was headed.
 */
export async function confirmSignUpFromMailbox(page: Page, account: NewAccount): Promise<void> {
  const message = await waitForMessageTo(account.email, { subjectIncludes: "Confirm your address" });
  const link = extractFirstLink(message);
  expect(link).toMatch(/\/sign-up\/confirm\/[A-Za-z0-9_-]+(\?callbackUrl=[^\s]+)?$/);
  const url = new URL(link ?? "");
  await page.goto(`${url.pathname}${url.search}`);
  await expect(page.getByText(`Creating the account for ${account.email}`)).toBeVisible();
  await page.getByLabel("Your password").fill(account.password);
  await page.getByRole("button", { name: "Finish and sign in" }).click();
}

/** Signs in through the password form and waits for the dashboard (or `expectPath`). */
export async function signIn(page: Page, credentials: { email: string; password: string }, expectPath: RegExp = /\/dashboard$/): Promise<void> {
  await page.goto("/sign-in");
  // The sign-in page sends a signed-in visitor on; say so at once instead of waiting for a form that never comes.
  await expect(page, "the sign-in page redirected: this browser is still signed in").toHaveURL(/\/sign-in(\?|$)/);
  await page.getByLabel("E-mail").fill(credentials.email);
  await page.getByLabel("Password").fill(credentials.password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(expectPath, { timeout: signInTimeout });
  await expect(page.getByRole("button", { name: /^Account:/ })).toBeVisible();
}

/** Signs out through the account menu in the header. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole("button", { name: /^Account:/ }).click();
  await page.getByRole("menuitem", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
}
