import { expect, test, type Page } from "./helpers/test";
import { demoAccounts, newAccount, signIn, signInTimeout } from "./helpers/accounts";
import { waitForMessageTo } from "./helpers/mailbox";

/** The path of the first configuration linked in the group's configurations table. */
async function firstConfigurationPath(page: Page): Promise<string> {
  const card = page.getByRole("region", { name: "Configurations" });
  const href = await card.getByRole("link").first().getAttribute("href");
  expect(href).toMatch(/^\/configurations\/[0-9a-f-]{36}$/);
  return href ?? "";
}

/** The "N forks" count shown for the first starter in the instructor's comparison. */
async function starterForkCount(page: Page): Promise<number> {
  const heading = page.getByRole("region", { name: "Student forks" }).getByRole("heading", { level: 3 }).first();
  const text = (await heading.textContent()) ?? "";
  const match = /(\d+) forks?/.exec(text);
  expect(match).not.toBeNull();
  return Number(match?.[1]);
}

test.describe("collaboration", () => {
  test("an owner invites a collaborator by e-mail; the collaborator joins, comments and forks", async ({ browser }) => {
    // Two browsers, several sign-ins (bcrypt) and page loads: give it the longer budget.
    test.slow();
    const ownerContext = await browser.newContext();
    const collaboratorContext = await browser.newContext();
    const owner = await ownerContext.newPage();
    const collaborator = await collaboratorContext.newPage();
    const account = newAccount("collaborator");

    await signIn(owner, demoAccounts.ada);
    await owner.goto("/groups/brane-engineering");
    const invitations = owner.getByRole("region", { name: "Invitations" });
    await invitations.getByLabel("E-mail address").fill(account.email);
    await invitations.getByLabel("Role").selectOption("editor");
    const sentAt = new Date(Date.now() - 1000);
    await invitations.getByRole("button", { name: "Send invitation" }).click();
    await expect(invitations.getByText(`Invitation sent to ${account.email}.`)).toBeVisible({ timeout: signInTimeout });
    await expect(invitations.getByRole("row").filter({ hasText: account.email })).toContainText("pending");

    // The collaborator follows the link from the fake mailbox and creates an account on the way.
    const message = await waitForMessageTo(account.email, { subjectIncludes: "invited you", after: sentAt });
    const link = /\/invitations\/[A-Za-z0-9_-]{43}/.exec(message.text ?? "")?.[0];
    expect(link).toBeDefined();
    await collaborator.goto(link ?? "");
    await expect(collaborator.getByText(/^Join /)).toBeVisible();
    await collaborator.getByLabel("Name").fill(account.name);
    await collaborator.getByLabel("Password", { exact: true }).fill(account.password);
    await collaborator.getByLabel("Repeat the password").fill(account.password);
    await collaborator.getByRole("button", { name: "Create account and join" }).click();
    await expect(collaborator).toHaveURL(/\/groups\/brane-engineering$/, { timeout: signInTimeout });
    const members = collaborator.getByRole("region", { name: "Members" });
    await expect(members.getByRole("row").filter({ hasText: account.email })).toContainText("editor");

    // The link works once.
    await collaborator.goto(link ?? "");
    await expect(collaborator.getByText("This invitation has been used")).toBeVisible();

    // Comment on the group's configuration; the owner sees it, tied to its revision.
    await collaborator.goto("/groups/brane-engineering");
    const configurationPath = await firstConfigurationPath(collaborator);
    await collaborator.goto(`${configurationPath}/results`);
    const comment = `Lightest sector looks right to me (${account.name}).`;
    await collaborator.getByLabel(/^Comment on revision \d+$/).fill(comment);
    await collaborator.getByRole("button", { name: "Add comment" }).click();
    const posted = collaborator.getByRole("list", { name: "Comments, oldest first" }).getByRole("listitem").filter({ hasText: comment });
    await expect(posted).toContainText(/on revision \d+/, { timeout: signInTimeout });

    await owner.goto(`${configurationPath}/results`);
    await expect(owner.getByText(comment)).toBeVisible();

    // Fork into the collaborator's own space from the results page.
    await collaborator.getByRole("button", { name: "Fork", exact: true }).click();
    // The personal space is the default target.
    const dialog = collaborator.getByRole("dialog", { name: "Fork this configuration" });
    await dialog.getByRole("button", { name: "Fork", exact: true }).click();
    await expect(collaborator).toHaveURL(/\/configurations\/[0-9a-f-]{36}$/, { timeout: 2 * signInTimeout });
    expect(new URL(collaborator.url()).pathname).not.toBe(configurationPath);

    await ownerContext.close();
    await collaboratorContext.close();
  });

  test("a student forks a lab starter and the instructor sees the fork", async ({ browser }) => {
    test.slow();
    const instructorContext = await browser.newContext();
    const studentContext = await browser.newContext();
    const instructor = await instructorContext.newPage();
    const student = await studentContext.newPage();

    await signIn(instructor, demoAccounts.ian);
    await instructor.goto("/groups/open-strings-lab");
    const before = await starterForkCount(instructor);

    await signIn(student, demoAccounts.sky);
    await student.goto("/groups/open-strings-lab");
    const starters = student.getByRole("region", { name: "Starter configurations" });
    await starters.getByRole("button", { name: /^Fork “.*” to my space$/ }).first().click();
    await expect(student).toHaveURL(/\/configurations\/[0-9a-f-]{36}$/, { timeout: signInTimeout });

    await instructor.reload();
    // At least one more: other browser tests may fork starters in parallel.
    await expect.poll(() => starterForkCount(instructor)).toBeGreaterThanOrEqual(before + 1);
    const forks = instructor.getByRole("region", { name: "Student forks" });
    await expect(forks.getByRole("row").filter({ hasText: "Sky Varga" }).first()).toBeVisible();
    // A student does not see the comparison.
    await student.goto("/groups/open-strings-lab");
    await expect(student.getByRole("region", { name: "Student forks" })).toHaveCount(0);

    await instructorContext.close();
    await studentContext.close();
  });

  test("an invalid configuration file lists every problem with its JSON path and saves nothing", async ({ page }) => {
    await signIn(page, demoAccounts.ben);
    await page.goto("/configurations/import");
    const broken = {
      format: 1,
      title: "Broken on purpose",
      theory: "IIA",
      stringScaleGeV: null,
      levels: -3,
      stacks: [{ id: "a", label: "a", count: 0, anti: false, worldvolume: [1, 2, 3, 4], position: {} }],
    };
    await page.getByLabel("Configuration file").setInputFiles({
      name: "broken.json",
      mimeType: "application/json",
      buffer: Buffer.from(JSON.stringify(broken)),
    });
    await page.getByRole("button", { name: "Import" }).click();
    const problems = page.getByRole("list", { name: "Problems in the file" });
    await expect(problems).toBeVisible({ timeout: signInTimeout });
    await expect(problems.getByRole("listitem").filter({ hasText: /^levels/ })).toBeVisible();
    await expect(problems.getByRole("listitem").filter({ hasText: /^stacks\[0\]\.count/ })).toBeVisible();
    await expect(page.getByText(/nothing was saved/)).toBeVisible();
    await expect(page).toHaveURL(/\/configurations\/import$/);
  });

  test("viewers see no invitations panel and outsiders cannot open a group", async ({ browser }) => {
    const viewerContext = await browser.newContext();
    const viewer = await viewerContext.newPage();
    await signIn(viewer, demoAccounts.cora);
    await viewer.goto("/groups/brane-engineering");
    await expect(viewer.getByRole("region", { name: "Members" })).toBeVisible();
    await expect(viewer.getByRole("region", { name: "Invitations" })).toHaveCount(0);
    await expect(viewer.getByRole("combobox", { name: /^Role of/ })).toHaveCount(0);
    const audit = await viewer.request.get("/api/groups/00000000-0000-4000-8000-000000000000/audit");
    expect(audit.status()).toBe(404);

    const outsider = await viewer.goto("/groups/open-strings-lab");
    expect(outsider?.status()).toBe(404);
    await expect(viewer.getByText("Group not found")).toBeVisible();
    await viewerContext.close();
  });
});
