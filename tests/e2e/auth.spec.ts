import { expect, test, type Page } from "./helpers/test";
import { confirmSignUpFromMailbox, demoAccounts, newAccount, signIn, signInTimeout, signOut, signUp, submitSignUpForm } from "./helpers/accounts";
import { extractFirstLink, waitForMessageTo } from "./helpers/mailbox";

/** The page was sent to sign in and shows no signed-in account. */
async function expectSignedOut(page: Page): Promise<void> {
  await expect(page).toHaveURL(/\/sign-in(\?|$)/);
  await expect(page.getByRole("heading", { name: "Sign in to Mooring" })).toBeVisible();
  await expect(page.getByRole("button", { name: /^Account:/ })).toHaveCount(0);
}

test.describe("sign-up", () => {
  test("creates an account and opens its dashboard", async ({ page }) => {
    const account = newAccount("signup");
    await signUp(page, account);
    // A new account is welcomed, not welcomed back.
    await expect(page.getByRole("heading", { level: 1 })).toContainText(`Welcome to Mooring, ${account.name.split(" ")[0]}`);
    await expect(page.getByRole("heading", { name: "My configurations" })).toBeVisible();
    await expect(page.getByText("No configurations yet")).toBeVisible();
    await expect(page.getByRole("link", { name: "My space" })).toBeVisible();
  });

  test("answers a taken address like a new one and mails its owner instead of creating anything", async ({ page }) => {
    const startedAt = new Date(Date.now() - 1_000);
    await page.goto("/sign-up");
    await page.getByLabel("Name").fill("Second Ada");
    await page.getByLabel("E-mail").fill("  ADA@mooring.test ");
    await page.getByLabel("Password", { exact: true }).fill("another-password-9");
    await page.getByLabel("Repeat the password").fill("another-password-9");
    await page.getByRole("button", { name: "Create account" }).click();

    // The same answer a new address gets: nothing tells that the address has an account.
    await expect(page.getByRole("status").filter({ hasText: "Check your inbox" })).toContainText("We've sent a message to ada@mooring.test.", {
      timeout: signInTimeout,
    });
    const notice = await waitForMessageTo(demoAccounts.ada.email, { after: startedAt, subjectIncludes: "You already have a Mooring account" });
    expect(extractFirstLink(notice)).toMatch(/\/sign-in$/);
    // Ada's own password still works; the attempt changed nothing.
    await signIn(page, demoAccounts.ada);
  });

  test("checks the fields before anything is written", async ({ page }) => {
    await page.goto("/sign-up");
    await page.getByLabel("Name").fill("Short Password");
    await page.getByLabel("E-mail").fill("not-an-address");
    await page.getByLabel("Password", { exact: true }).fill("short");
    await page.getByLabel("Repeat the password").fill("different");
    await page.getByRole("button", { name: "Create account" }).click();

    await expect(page.locator("#email-error")).toHaveText("Enter a valid e-mail address.");
    await expect(page.locator("#password-error")).toHaveText("Use at least 8 characters.");
    await expect(page.locator("#confirmPassword-error")).toHaveText("The passwords don't match.");
  });
});

test.describe("sign-in and sign-out", () => {
  test("signs in with a password, signs out from the account menu", async ({ page }) => {
    await signIn(page, demoAccounts.ben);
    await expect(page.getByRole("button", { name: /^Account:/ })).toBeVisible();
    await signOut(page);
    await expect(page.getByText("You have signed out.")).toBeVisible();

    await page.goto("/dashboard");
    await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fdashboard/);
  });

  test("says so when the password is wrong and keeps the e-mail", async ({ page }) => {
    const account = newAccount("wrongpw");
    await signUp(page, account);
    await signOut(page);

    await page.getByLabel("E-mail").fill(account.email);
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await expect(page.getByRole("alert").filter({ hasText: "Wrong e-mail or password." })).toBeVisible({ timeout: signInTimeout });
    await expect(page.getByLabel("E-mail")).toHaveValue(account.email);
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test("returns to the page that asked for a session", async ({ page }) => {
    await page.goto("/account");
    await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount/);
    await page.getByLabel("E-mail").fill(demoAccounts.cora.email);
    await page.getByLabel("Password").fill(demoAccounts.cora.password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await expect(page).toHaveURL(/\/account$/, { timeout: signInTimeout });
    await expect(page.getByText(demoAccounts.cora.email)).toBeVisible();
  });

  test("an account created on the way keeps the destination", async ({ page }) => {
    const account = newAccount("detour");
    await page.goto("/account");
    await page.getByRole("link", { name: "Create one" }).click();
    await expect(page).toHaveURL(/\/sign-up\?callbackUrl=%2Faccount$/);
    await submitSignUpForm(page, account);
    await confirmSignUpFromMailbox(page, account);
    await expect(page).toHaveURL(/\/account$/, { timeout: signInTimeout });
    await expect(page.getByText(account.email)).toBeVisible();
  });

  test("a callback that points off-site, or holds control characters, stays on Mooring", async ({ page, baseURL }) => {
    const origin = new URL(baseURL ?? "http://127.0.0.1:3100").origin;
    // A tab, which the browser drops ("//evil.example"), and a CR LF that once broke the redirect header.
    for (const callback of ["/\t/evil.example", "/\r\n/evil.example", "/.//evil.example"]) {
      const opened = await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(callback)}`);
      expect(opened?.status()).toBe(200);
      await expect(page.getByRole("link", { name: "Create one" })).toHaveAttribute("href", "/sign-up");
    }
    await page.getByLabel("E-mail").fill(demoAccounts.cora.email);
    await page.getByLabel("Password").fill(demoAccounts.cora.password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await expect(page).toHaveURL(`${origin}/dashboard`, { timeout: signInTimeout });
    // Signed in, the sign-in page redirects at once: to the dashboard, not to the other site, and not a 500.
    const again = await page.goto(`/sign-in?callbackUrl=${encodeURIComponent("/\n/evil.example")}`);
    expect(again?.status()).toBe(200);
    expect(page.url()).toBe(`${origin}/dashboard`);
  });

  test("a copied session cookie stops working once that session signs out", async ({ page, browser }) => {
    await signIn(page, demoAccounts.ben);
    const copied = await page.context().cookies();
    await signOut(page);

    const thief = await browser.newContext();
    await thief.addCookies(copied);
    const stolen = await thief.newPage();
    // The token itself is still validly signed; the server refuses the session it names.
    await stolen.goto("/dashboard");
    await expectSignedOut(stolen);
    await thief.close();
  });

  test("signing out of all devices ends the sessions in other browsers too", async ({ page, browser }) => {
    test.slow();
    const account = newAccount("everywhere");
    await signUp(page, account);
    const otherContext = await browser.newContext();
    const other = await otherContext.newPage();
    await signIn(other, account);

    await page.goto("/account");
    await page.getByRole("button", { name: "Sign out of all devices" }).click();
    await expect(page).toHaveURL(/\/sign-in\?signedOut=1/, { timeout: signInTimeout });
    await other.goto("/account");
    await expectSignedOut(other);
    await otherContext.close();
  });
});

test.describe("sign-in link", () => {
  test("a link from the mailbox signs in once; a second use is refused", async ({ page, browser }) => {
    test.slow();
    const account = newAccount("link");
    await signUp(page, account);
    await signOut(page);

    const requestedAt = new Date(Date.now() - 1_000);
    await page.goto("/sign-in");
    await page.getByRole("link", { name: "E-mail me a sign-in link" }).click();
    await expect(page.getByRole("heading", { name: "Sign in with an e-mail link" })).toBeVisible();
    await page.getByLabel("E-mail").fill(account.email);
    await page.getByRole("button", { name: "E-mail me a link" }).click();
    await expect(page.getByText("If an account exists for that address")).toBeVisible();

    const message = await waitForMessageTo(account.email, { subjectIncludes: "sign-in link", after: requestedAt });
    const link = extractFirstLink(message);
    expect(link).toMatch(/\/sign-in\/link\/[A-Za-z0-9_-]+$/);
    const path = new URL(link ?? "").pathname;

    const fresh = await browser.newContext();
    const other = await fresh.newPage();
    await other.goto(path);
    await other.getByRole("button", { name: "Sign in to Mooring" }).click();
    await expect(other).toHaveURL(/\/dashboard$/, { timeout: signInTimeout });
    await expect(other.getByRole("button", { name: `Account: ${account.name}` })).toBeVisible();
    await fresh.close();

    await page.goto(path);
    await page.getByRole("button", { name: "Sign in to Mooring" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "already been used" })).toBeVisible();
  });

  test("answers an unknown address exactly like a known one", async ({ page }) => {
    await page.goto("/sign-in/link");
    await page.getByLabel("E-mail").fill("nobody-here@mooring.test");
    await page.getByRole("button", { name: "E-mail me a link" }).click();
    await expect(page.getByText("If an account exists for that address, we've sent a sign-in link to it.")).toBeVisible();
  });

  test("a malformed link says it is not valid", async ({ page }) => {
    await page.goto("/sign-in/link/not%20a%20token");
    await expect(page.getByText("This link is not valid")).toBeVisible();
  });
});

test.describe("password reset", () => {
  test("a reset link from the mailbox sets a new password and works only once", async ({ page }) => {
    // Five deliberately slow bcrypt hashes and checks in one flow.
    test.slow();
    const account = newAccount("reset");
    await signUp(page, account);
    await signOut(page);

    const requestedAt = new Date(Date.now() - 1_000);
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await expect(page.getByRole("heading", { name: "Reset your password" })).toBeVisible();
    await page.getByLabel("E-mail").fill(account.email);
    await page.getByRole("button", { name: "Send the reset link" }).click();
    await expect(page.getByText("If an account exists for that address")).toBeVisible();

    const message = await waitForMessageTo(account.email, { subjectIncludes: "Reset", after: requestedAt });
    const path = new URL(extractFirstLink(message) ?? "").pathname;
    expect(path).toMatch(/^\/reset-password\/[A-Za-z0-9_-]+$/);

    await page.goto(path);
    await page.getByLabel("New password", { exact: true }).fill("brand-new-password-1");
    await page.getByLabel("Repeat the new password").fill("brand-new-password-2");
    await page.getByRole("button", { name: "Set the new password" }).click();
    await expect(page.locator("#confirmPassword-error")).toHaveText("The passwords don't match.");

    await page.getByLabel("New password", { exact: true }).fill("brand-new-password-1");
    await page.getByLabel("Repeat the new password").fill("brand-new-password-1");
    await page.getByRole("button", { name: "Set the new password" }).click();
    await expect(page).toHaveURL(/\/sign-in\?reset=1/, { timeout: signInTimeout });
    await expect(page.getByText("Your password has been changed.")).toBeVisible();

    await page.getByLabel("E-mail").fill(account.email);
    await page.getByLabel("Password").fill(account.password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await expect(page.getByRole("alert").filter({ hasText: "Wrong e-mail or password." })).toBeVisible({ timeout: signInTimeout });

    await signIn(page, { email: account.email, password: "brand-new-password-1" });

    await page.goto(path);
    await page.getByLabel("New password", { exact: true }).fill("third-password-3");
    await page.getByLabel("Repeat the new password").fill("third-password-3");
    await page.getByRole("button", { name: "Set the new password" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "already been used" })).toBeVisible({ timeout: signInTimeout });
  });
});
