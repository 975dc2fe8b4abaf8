import { test as base, type BrowserContext, type Page } from "@playwright/test";

export { expect, type Locator, type Page } from "@playwright/test";

/**
 * Playwright's `test` with one change: every `page.goto` (the fixture's page and the pages of any
 * context a test opens) also waits until the page has revealed its streamed segments
 * (`waitForStreamedContent`), so that no locator sees the hidden copy React keeps until then. The
 * wait gives up quietly after 10 s: a page that streams for longer is left to the test's own checks.
 */
export const test = base.extend<object, object>({
  page: async ({ page }, use) => {
    patchPage(page);
    await use(page);
  },
  context: async ({ context }, use) => {
    patchContext(context);
    await use(context);
  },
  browser: [
    async ({ browser }, use) => {
      const newContext = browser.newContext.bind(browser);
      browser.newContext = async (...args: Parameters<typeof newContext>) => patchContext(await newContext(...args));
      await use(browser);
    },
    { scope: "worker" },
  ],
});

const patched = new WeakSet<object>();

function patchContext(context: BrowserContext): BrowserContext {
  if (patched.has(context)) return context;
  patched.add(context);
  context.pages().forEach(patchPage);
  context.on("page", patchPage);
  const newPage = context.newPage.bind(context);
  context.newPage = async () => patchPage(await newPage());
  return context;
}

function patchPage(page: Page): Page {
  if (patched.has(page)) return page;
  patched.add(page);
  const goto = page.goto.bind(page);
  page.goto = async (...args: Parameters<typeof goto>) => {
    const response = await goto(...args);
    if (args[1]?.waitUntil !== "commit") await waitForStreamedContent(page, 10_000).catch(() => undefined);
    return response;
  };
  return page;
}

/**
 * Waits until the page has revealed every streamed segment. React streams a Suspense boundary's
 * content into a hidden `div[hidden][id^="S:"]` and reveals it a moment later (reveals are batched);
 * until then the hidden copy sits beside what is on screen, and a text or label locator matches both
 * (a strict-mode error).
 */
async function waitForStreamedContent(page: Page, timeout: number): Promise<void> {
  await page.waitForFunction(() => document.querySelectorAll('div[hidden][id^="S:"]').length === 0, undefined, { timeout });
}
