import { expect, test, type Locator } from "./helpers/test";
import { landingDemoConfiguration } from "@/lib/demo-configurations";
import { demoAccounts, signIn } from "./helpers/accounts";

// The production build's security headers, content security policy, cookie flags and CSRF check,
// as Chromium sees them. The policy itself is unit-tested in lib/server/security-headers.test.ts; here
// the pages that use KaTeX, Konva, recharts and next/font must load without a single violation.

test.describe("security in the browser", () => {
  test("pages carry the CSP and run without a violation; session cookies are httpOnly and SameSite=Lax", async ({ page, context }) => {
    // Record every CSP violation the page reports (console messages can be missed across navigations).
    await context.addInitScript(() => {
      const seen: string[] = [];
      (window as unknown as { cspViolations: string[] }).cspViolations = seen;
      document.addEventListener("securitypolicyviolation", (event) => {
        seen.push(`${event.violatedDirective} blocked ${event.blockedURI || "inline"} at ${event.sourceFile}:${event.lineNumber}`);
      });
    });
    const consoleViolations: string[] = [];
    page.on("console", (message) => {
      if (/Content Security Policy|Refused to (load|execute|apply|connect|frame)/i.test(message.text())) {
        consoleViolations.push(`${page.url()}: ${message.text()}`);
      }
    });

    const first = await page.goto("/sign-in");
    const headers = first?.headers() ?? {};
    expect(headers["content-security-policy"]).toContain("default-src 'self'");
    expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    expect(headers["x-content-type-options"]).toBe("nosniff");
    expect(headers["x-frame-options"]).toBe("DENY");

    await signIn(page, demoAccounts.ada);
    const session = (await context.cookies()).find((cookie) => cookie.name.endsWith("next-auth.session-token"));
    expect(session?.httpOnly).toBe(true);
    expect(session?.sameSite).toBe("Lax");

    // The seeded three-stack demo: its pages draw a canvas, KaTeX expansions and plots.
    const list = await page.request.get(`/api/configurations?search=${encodeURIComponent(landingDemoConfiguration.title)}`);
    expect(list.status()).toBe(200);
    const { items } = (await list.json()) as { items: { id: string; title: string }[] };
    const id = items.find((item) => item.title === landingDemoConfiguration.title)?.id;
    expect(id).toBeTruthy();

    // What each page renders on the client once it has hydrated; the checks wait for it, so any script or
    // style it needs has run by the time the violations are read.
    const pages: Array<{ path: string; rendered: Locator }> = [
      { path: "/dashboard", rendered: page.locator('table a[href^="/configurations/"]').first() },
      { path: `/configurations/${id}`, rendered: page.locator("[data-designer-canvas] canvas").first() },
      { path: `/configurations/${id}/results`, rendered: page.locator(".katex").first() },
      { path: `/configurations/${id}/history`, rendered: page.getByRole("heading", { level: 1 }) },
    ];
    for (const { path, rendered } of pages) {
      const response = await page.goto(path);
      expect(response?.headers()["content-security-policy"]).toContain("script-src 'self'");
      // The account menu's trigger is enabled only once React has hydrated the page.
      await expect(page.getByRole("button", { name: /^Account:/ })).toBeEnabled();
      await expect(rendered).toBeAttached();
      const violations = await page.evaluate(() => (window as unknown as { cspViolations?: string[] }).cspViolations ?? []);
      expect({ path, violations }).toEqual({ path, violations: [] });
    }
    expect(consoleViolations).toEqual([]);
  });

  test("the running app refuses a cross-site state-changing API request with 403 and lets same-origin ones through", async ({ page, baseURL }) => {
    await signIn(page, demoAccounts.ada);
    const forged = await page.request.post("/api/configurations/import", {
      headers: { origin: "https://evil.example", "sec-fetch-site": "cross-site" },
      multipart: { file: { name: "x.json", mimeType: "application/json", buffer: Buffer.from("{}") } },
    });
    expect(forged.status()).toBe(403);
    expect(((await forged.json()) as { error: string }).error).toBe("cross_site_request");
    // The same request from the app's own origin reaches the handler (422: the file is not a configuration).
    const own = await page.request.post("/api/configurations/import", {
      headers: { origin: new URL(baseURL ?? "http://127.0.0.1:3100").origin },
      multipart: { file: { name: "x.json", mimeType: "application/json", buffer: Buffer.from("{}") } },
    });
    expect(own.status()).toBe(422);
  });

  test("the running app refuses a cross-site server action with 403 instead of failing with a 500", async ({ page }) => {
    for (const path of ["/sign-up", "/account"]) {
      const forged = await page.request.post(path, {
        headers: { "next-action": "7f".repeat(21), origin: "https://evil.example", "sec-fetch-site": "cross-site", "content-type": "text/plain;charset=UTF-8" },
        data: "[]",
      });
      expect({ path, status: forged.status() }).toEqual({ path, status: 403 });
      expect(((await forged.json()) as { error: string }).error).toBe("cross_site_request");
    }
  });
});
