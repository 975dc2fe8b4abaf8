import { defineConfig, devices } from "@playwright/test";

// The app and the fake mail server are started by scripts/test.mjs (`npm test`); to run the browser
// tests alone use `node scripts/test.mjs e2e`, or point E2E_BASE_URL and MAILBOX_URL at a running app.
const baseURL = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100";

export default defineConfig({
  testDir: "tests/e2e",
  fullyParallel: false,
  forbidOnly: true,
  retries: 0,
  workers: 2,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  outputDir: "test-results",
  use: {
    baseURL,
    headless: true,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
  },
  projects: [
    {
      name: "chromium",
      use: {
        ...devices["Desktop Chrome"],
        launchOptions: {
          // Debian's Chromium; Playwright never downloads a browser here.
          executablePath: "/usr/bin/chromium",
          args: [
            "--no-sandbox",
            "--disable-gpu",
            "--disable-quic",
            "--no-first-run",
            "--disable-background-networking",
            "--disable-component-update",
            "--disable-sync",
          ],
        },
      },
    },
  ],
});
