import type { Page } from "@playwright/test";

/**
 * Waits until the page has revealed every streamed segment. React streams a Suspense boundary's
 * content into a hidden `div[hidden][id^="S:"]` and reveals it a moment later (reveals are batched);
 * until then the hidden copy sits beside what is on screen, and a text or label locator matches both
 * (a strict-mode error). Call it after navigating to a page that streams, before such locators.
 */
export async function waitForStreamedContent(page: Page, timeout = 30_000): Promise<void> {
  await page.waitForFunction(() => document.querySelectorAll('div[hidden][id^="S:"]').length === 0, undefined, { timeout });
}
