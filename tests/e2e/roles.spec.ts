import { expect, test, type Page } from "./helpers/test";
import { demoAccounts, newAccount, signIn, signUp } from "./helpers/accounts";

/** The shape of GET /api/configurations rows this file reads. */
interface ConfigurationRow {
  id: string;
  version: number;
  group: { slug: string };
}

/** Opens `path` and expects the not-found page; `status` also checks the HTTP status. */
async function expectNotFoundPage(page: Page, path: string, options: { status?: number } = {}) {
  const response = await page.goto(path);
  if (options.status !== undefined) expect(response?.status()).toBe(options.status);
  await expect(page.getByRole("heading", { name: "This page isn’t here" })).toBeVisible();
}

test.describe("signed-out visitors", () => {
  test("are sent to sign in from every signed-in area", async ({ page }) => {
    for (const path of ["/dashboard", "/account", "/admin", "/groups/brane-engineering"]) {
      await page.goto(path);
      await expect(page).toHaveURL(new RegExp(`/sign-in\\?callbackUrl=${encodeURIComponent(path)}$`));
    }
  });

  test("get 401 from the configuration API", async ({ request }) => {
    const response = await request.get("/api/configurations");
    expect(response.status()).toBe(401);
  });
});

test.describe("site roles", () => {
  test("a member cannot open the admin pages", async ({ page }) => {
    await signIn(page, demoAccounts.ben);
    await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Admin" })).toHaveCount(0);
    await expectNotFoundPage(page, "/admin", { status: 404 });
    await expectNotFoundPage(page, "/admin/mailbox", { status: 404 });
  });

  test("an admin sees every account and cannot demote the last admin", async ({ page }) => {
    await signIn(page, demoAccounts.admin);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Admin" }).click();
    await expect(page.getByRole("heading", { name: "Users and roles" })).toBeVisible();
    for (const account of [demoAccounts.ada, demoAccounts.cora, demoAccounts.sky]) {
      await expect(page.getByRole("cell", { name: account.email })).toBeVisible();
    }

    const ownRow = page.getByRole("row").filter({ hasText: demoAccounts.admin.email });
    await ownRow.getByRole("combobox", { name: /^Site role of/ }).selectOption("member");
    await ownRow.getByRole("button", { name: "Save" }).click();
    await expect(ownRow.getByText("Mooring needs at least one administrator.")).toBeVisible();

    await page.reload();
    await expect(page.getByRole("heading", { name: "Users and roles" })).toBeVisible();
    await expect(ownRow.getByRole("combobox", { name: /^Site role of/ })).toHaveValue("admin");
  });

  test("an admin reads captured mail, with working links, in the development mailbox", async ({ page }) => {
    await page.goto("/reset-password");
    await page.getByLabel("E-mail").fill(demoAccounts.sky.email);
    await page.getByRole("button", { name: "Send the reset link" }).click();
    await expect(page.getByText("If an account exists for that address")).toBeVisible();

    await signIn(page, demoAccounts.admin);
    await page.goto("/admin/mailbox");
    await expect(page.getByRole("heading", { name: "Development mailbox" })).toBeVisible();
    const message = page.getByRole("listitem").filter({ hasText: demoAccounts.sky.email }).first();
    await expect(message.getByRole("heading", { name: "Reset your Mooring password" })).toBeVisible();
    await expect(message.getByRole("link", { name: /\/reset-password\/[A-Za-z0-9_-]+$/ })).toBeVisible();
  });

  test("an admin's role change takes effect on the member's next request", async ({ page, browser }) => {
    const account = newAccount("promoted");
    const memberContext = await browser.newContext();
    const member = await memberContext.newPage();
    await signUp(member, account);
    await expectNotFoundPage(member, "/admin", { status: 404 });

    await signIn(page, demoAccounts.admin, /\/dashboard$/);
    await page.goto(`/admin?q=${encodeURIComponent(account.email)}`);
    const row = page.getByRole("row").filter({ hasText: account.email });
    await row.getByRole("combobox", { name: `Site role of ${account.name}` }).selectOption("admin");
    await row.getByRole("button", { name: "Save" }).click();
    await expect(row.getByText(`${account.name} is now an admin.`)).toBeVisible();

    // The session cookie is unchanged; the role is read from the database on each request.
    await member.goto("/admin");
    await expect(member.getByRole("heading", { name: "Users and roles" })).toBeVisible();

    await row.getByRole("combobox", { name: `Site role of ${account.name}` }).selectOption("member");
    await row.getByRole("button", { name: "Save" }).click();
    await expect(row.getByText(`${account.name} is now a member.`)).toBeVisible();
    await expectNotFoundPage(member, "/admin", { status: 404 });
    await memberContext.close();
  });
});

test.describe("group roles", () => {
  test("a non-member cannot see a group; a member can", async ({ page, browser }) => {
    await signIn(page, demoAccounts.sam);
    await page.goto("/groups/brane-engineering");
    await expect(page.getByText("Group not found")).toBeVisible();
    await expect(page.getByText("Brane Engineering Group")).toHaveCount(0);
    await expect(page.getByText("Ada Quayle")).toHaveCount(0);

    const memberContext = await browser.newContext();
    const member = await memberContext.newPage();
    await signIn(member, demoAccounts.cora);
    await member.goto("/groups/brane-engineering");
    await expect(member.getByRole("heading", { level: 1, name: "Brane Engineering Group" })).toBeVisible();
    await expect(member.getByRole("cell", { name: "Ada Quayle" }).first()).toBeVisible();
    await memberContext.close();
  });

  test("a viewer cannot save a group's configuration; an editor can", async ({ page, browser }) => {
    // The editor creates a configuration of its own in the group, so no other test's data changes.
    const editorContext = await browser.newContext();
    const editor = await editorContext.newPage();
    await signIn(editor, demoAccounts.ben);
    const list = await editor.request.get("/api/configurations?scope=accessible&pageSize=100");
    expect(list.status()).toBe(200);
    const seeded = ((await list.json()) as { items: ConfigurationRow[] }).items.find((row) => row.group.slug === "brane-engineering");
    expect(seeded).toBeDefined();
    const source = (await (await editor.request.get(`/api/configurations/${seeded?.id ?? ""}`)).json()) as {
      document: Record<string, unknown>;
      group: { id: string };
    };
    // A title of its own, so tests that look configurations up by title never see this copy.
    const document = { ...source.document, title: `Role check ${Date.now().toString(36)}` };
    const created = await editor.request.post("/api/configurations", {
      data: { groupId: source.group.id, document, message: "Made for the role test" },
    });
    expect(created.status()).toBe(201);
    const { id, version } = (await created.json()) as { id: string; version: number };

    await signIn(page, demoAccounts.cora);
    const attempt = await page.request.put(`/api/configurations/${id}`, {
      headers: { "if-match": `"${version}"` },
      data: { document, message: "A viewer's edit" },
    });
    expect(attempt.status()).toBe(403);
    const afterViewer = (await (await page.request.get(`/api/configurations/${id}`)).json()) as { version: number };
    expect(afterViewer.version).toBe(version);

    const saved = await editor.request.put(`/api/configurations/${id}`, {
      headers: { "if-match": `"${version}"` },
      data: { document, message: "An editor's save" },
    });
    expect(saved.status()).toBe(200);
    expect(((await saved.json()) as { version: number }).version).toBe(version + 1);
    await editorContext.close();
  });
});
