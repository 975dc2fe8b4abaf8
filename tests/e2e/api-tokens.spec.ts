import { expect, test, type Page } from "./helpers/test";
import { probeNearSevenBrane } from "@/lib/demo-configurations";
import { newAccount, signUp } from "./helpers/accounts";

/** Creates a token on the account page and returns the secret it shows once. */
async function createToken(page: Page, name: string, access: "Read only" | "Read and write"): Promise<string> {
  await page.getByLabel("Token name").fill(name);
  await page.getByLabel("Access").selectOption({ label: access });
  await page.getByLabel("Expires after").selectOption({ label: "7 days" });
  await page.getByRole("button", { name: "Create token" }).click();
  const secretField = page.getByLabel(`New token "${name}"`);
  await expect(secretField).toHaveValue(/^mooring_[A-Za-z0-9_-]{43}$/);
  await expect(page.getByRole("table", { name: "API tokens" }).getByRole("row", { name: new RegExp(name) })).toContainText("Live");
  return secretField.inputValue();
}

test.describe("personal API tokens", () => {
  test("a script outside the browser lists, reads, computes and saves with a token; read-only and revoked tokens are refused", async ({
    page,
    playwright,
    baseURL,
  }) => {
    test.slow();
    await signUp(page, newAccount("tokens"));

    // A configuration to read, created in the personal space through the browser's session.
    const groups = (await (await page.request.get("/api/groups")).json()) as { id: string; kind: string }[];
    const personal = groups.find((group) => group.kind === "personal");
    expect(personal).toBeDefined();
    const created = await page.request.post("/api/configurations", { data: { groupId: personal?.id, document: probeNearSevenBrane } });
    expect(created.status()).toBe(201);
    const configuration = (await created.json()) as { id: string; version: number; currentRevision: { id: string } };

    await page.goto("/account");
    await expect(page.getByText("No tokens yet.")).toBeVisible();
    const writeToken = await createToken(page, "batch runner", "Read and write");
    const readToken = await createToken(page, "notebook", "Read only");
    // Shown once: after a reload only the hint is left.
    await page.reload();
    await expect(page.getByRole("table", { name: "API tokens" })).toContainText(writeToken.slice(0, 12));
    await expect(page.getByText(writeToken)).toHaveCount(0);

    // Plain HTTP from outside the browser: no cookies, only the Authorization header.
    const script = await playwright.request.newContext({ baseURL });
    const as = (token: string) => ({ authorization: `Bearer ${token}` });

    const list = await script.get("/api/configurations", { headers: as(readToken) });
    expect(list.status()).toBe(200);
    expect(((await list.json()) as { items: { id: string }[] }).items.map((item) => item.id)).toContain(configuration.id);
    const read = await script.get(`/api/configurations/${configuration.id}`, { headers: as(readToken) });
    expect(read.status()).toBe(200);
    expect(((await read.json()) as { document: { title: string } }).document.title).toBe(probeNearSevenBrane.title);
    const result = await script.get(`/api/configurations/${configuration.id}/revisions/${configuration.currentRevision.id}/result`, { headers: as(readToken) });
    expect(result.status()).toBe(200);
    const stored = (await result.json()) as { result: { lightest: unknown[]; sectors: unknown[] } };
    // Two stacks: three sectors (each stack with itself and the pair), product.md "The spectrum result".
    expect(stored.result.sectors).toHaveLength(3);

    const computed = await script.post("/api/spectrum", { headers: as(readToken), data: probeNearSevenBrane });
    expect(computed.status()).toBe(200);
    expect(((await computed.json()) as { lightest: unknown[] }).lightest.length).toBeGreaterThan(0);

    const edit = { document: { ...probeNearSevenBrane, title: "Moved by a script" }, message: "from a script", expectedVersion: configuration.version };
    const refused = await script.put(`/api/configurations/${configuration.id}`, { headers: as(readToken), data: edit });
    expect(refused.status()).toBe(403);
    const saved = await script.put(`/api/configurations/${configuration.id}`, { headers: as(writeToken), data: edit });
    expect(saved.status()).toBe(200);
    expect(((await saved.json()) as { version: number }).version).toBe(configuration.version + 1);

    // Revoked on the account page: the next request is refused.
    await page.getByRole("button", { name: "Revoke the token batch runner" }).click();
    await page.getByRole("dialog").getByRole("button", { name: "Revoke token" }).click();
    await expect(page.getByRole("table", { name: "API tokens" }).getByRole("row", { name: /batch runner/ })).toContainText("Revoked");
    expect((await script.get("/api/configurations", { headers: as(writeToken) })).status()).toBe(401);
    expect((await script.get("/api/configurations", { headers: as(readToken) })).status()).toBe(200);

    // The reference page renders the document the script could also read.
    const openapi = await script.get("/api/openapi.json");
    expect(((await openapi.json()) as { openapi: string }).openapi).toBe("3.1.0");
    await page.goto("/docs/api");
    await expect(page.getByRole("heading", { name: "API reference" })).toBeVisible();
    await expect(page.getByRole("heading", { name: /POST\s*\/api\/spectrum/ })).toBeVisible();
    await script.dispose();
  });
});
