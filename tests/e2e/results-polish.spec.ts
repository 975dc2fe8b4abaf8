import { expect, test, type Page } from "./helpers/test";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { demoAccounts, signIn } from "./helpers/accounts";
import { createInGroup, unique } from "./helpers/configurations";
import { openDesigner } from "./helpers/designer";

// Issue 16: sectors named by label in natural order, the headline of the lightest states, formulas
// never upper-cased, exact numbers with a true minus sign, simplified mode expansions, the
// instructor's and the author's view of forks, and real 404/403 answers.

function stack(id: string, label: string, extra: Partial<Stack> = {}): Stack {
  return { id, label, count: 1, anti: false, worldvolume: [1, 2, 3, 4], position: {}, ...extra };
}

/** Eleven parallel D4s along x9 (ids s1..s11) and an anti-D4 on top of the first: a tachyon. */
function elevenAndAnAntibrane(title: string): Configuration {
  const stacks = Array.from({ length: 11 }, (_, i) => stack(`s${i + 1}`, `probe ${i + 1}`, { position: { "9": i * 10 } }));
  return { format: 1, title, theory: "IIA", stringScaleGeV: null, levels: 2, stacks: [...stacks, stack("z", "mirror", { anti: true })] };
}

async function personalGroupId(page: Page): Promise<string> {
  const groups = (await (await page.request.get("/api/groups")).json()) as Array<{ id: string; kind: string }>;
  const personal = groups.find((group) => group.kind === "personal");
  expect(personal).toBeDefined();
  return personal?.id ?? "";
}

/** Table cells and headers under `scope` whose content is wider than the cell, and tables wider than their scroller. */
async function overflowing(page: Page, scope: string): Promise<string[]> {
  return page.locator(scope).evaluateAll((roots) =>
    roots.flatMap((root) => [
      ...Array.from(root.querySelectorAll<HTMLElement>("th, td"))
        .filter((cell) => cell.getClientRects().length > 0 && cell.scrollWidth > cell.clientWidth + 1)
        .map((cell) => `cell "${cell.textContent?.trim() ?? ""}"`),
      ...Array.from(root.querySelectorAll<HTMLElement>("table"))
        .map((table) => table.parentElement)
        .filter((scroller): scroller is HTMLElement => scroller !== null && scroller.scrollWidth > scroller.clientWidth + 1)
        .map((scroller) => `table "${scroller.querySelector("th")?.textContent?.trim() ?? ""}..." scrolls by ${scroller.scrollWidth - scroller.clientWidth}px`),
    ]),
  );
}

test.describe("results polish", () => {
  test.describe.configure({ timeout: 120_000 });

  test("sectors are named by label in natural order, with ids on hover, and the filter matches labels", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, elevenAndAnAntibrane(unique("Labels")));
    await page.goto(`/configurations/${id}/results`);
    const cards = page.locator('[data-testid^="sector-"] > summary > span:first-child');
    await expect(cards.first()).toBeVisible({ timeout: 30_000 });
    const names = await cards.allTextContents();
    // Natural order of the names: "probe 2" before "probe 10"; the engine's id order puts s10 before s2.
    expect(names.slice(0, 3)).toEqual(["mirror\u2013mirror", "probe 1\u2013mirror", "probe 1\u2013probe 1"]);
    // The list is virtualised: read each card's position in the list from its wrapper.
    const position = async (name: string) => {
      const card = page.locator("[data-index]").filter({ has: page.locator("summary > span:first-child", { hasText: new RegExp(`^${name}$`) }) });
      // Scroll down until the list has rendered the card.
      await expect
        .poll(async () => {
          const count = await card.count();
          if (count === 0) await page.mouse.wheel(0, 400);
          return count;
        }, { timeout: 30_000 })
        .toBe(1);
      return Number(await card.getAttribute("data-index"));
    };
    expect(await position("probe 1\u2013probe 2")).toBeLessThan(await position("probe 1\u2013probe 10"));
    expect(await position("probe 9\u2013probe 9")).toBeLessThan(await position("probe 10\u2013probe 10"));
    await page.evaluate(() => window.scrollTo(0, 0));
    const probeOne = cards.filter({ hasText: /^probe 1\u2013probe 1$/ });
    await expect(probeOne).toHaveAttribute("title", "Stacks s1\u2013s1");

    await page.getByLabel("Show sectors of stacks whose label or id contains").fill("mirror");
    await expect(cards.first()).toHaveText("mirror\u2013mirror");
    // Every sector left has the mirror at one end, named by label (no ids shown).
    // Polled as one condition: while the filtered page loads the list is briefly empty, and an empty
    // list would pass an "every" check on its own.
    await expect
      .poll(async () => {
        const left = await cards.allTextContents();
        return left.length > 1 && left.every((name) => name.includes("mirror") && !/\bs\d/.test(name));
      })
      .toBe(true);
  });

  test("the headline names the tachyon, the massless content and the first massive state; the tachyon row is marked", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, elevenAndAnAntibrane(unique("Headline")));
    await page.goto(`/configurations/${id}/results`);
    const headline = page.getByTestId("spectrum-headline");
    // Brane on antibrane at y = 0: the NS ground state survives, alpha' M^2 = -1/2 (physics.md "GSO
    // projection"; Banks and Susskind 1995, from memory), written exactly with a true minus sign.
    await expect(headline.getByTestId("headline-tachyon")).toHaveText("Tachyon \u03b1\u2032M\u00b2 = \u22121/2 in probe 1\u2013mirror (NS)", { timeout: 30_000 });
    await expect(headline.getByTestId("headline-massless")).toContainText("massless states in");
    await expect(headline.getByTestId("headline-first-massive")).toContainText("first massive \u03b1\u2032M\u00b2 =");
    const lightest = page.getByTestId("lightest-table");
    await expect(lightest.locator('tr[data-tachyon="true"]').first()).toContainText("\u22121/2");
    await expect(lightest).not.toContainText("-1/2");

    // The same headline in the designer's live preview.
    await openDesigner(page, id);
    await expect(page.getByTestId("spectrum-headline").getByTestId("headline-tachyon")).toContainText("probe 1\u2013mirror");
  });

  test("formulas are never upper-cased", async ({ page }) => {
    await signIn(page, demoAccounts.ian);
    await page.goto("/groups/open-strings-lab");
    const header = page.getByRole("region", { name: "Student forks" }).getByRole("columnheader", { name: "Lightest \u03b1\u2032M\u00b2" }).first();
    await expect(header).toBeVisible();
    expect(await header.evaluate((element) => getComputedStyle(element).textTransform)).toBe("none");
  });

  test("mode expansions drop zero terms", async ({ page }) => {
    await signIn(page, demoAccounts.ada);
    const id = await createInGroup(page, elevenAndAnAntibrane(unique("Expansions")));
    await page.goto(`/configurations/${id}/results`);
    const sector = page.locator('[data-testid="sector-s1-s1"]');
    await sector.locator("summary").first().click();
    // The summary itself: once the detail has loaded, the (closed) table's caption "Mode expansions per axis" matches a looser text too.
    await sector.locator("summary", { hasText: /^Mode expansions$/ }).click();
    const table = sector.getByRole("table", { name: "Mode expansions per axis" });
    await expect(table).toBeVisible({ timeout: 30_000 });
    const x9 = (await table.getByRole("row").filter({ hasText: /^x9/ }).textContent()) ?? "";
    // Both ends at x9 = 0: the classical part vanishes (physics.md, DD expansion), so the typeset
    // formula starts with the oscillators (the square root is drawn, so only "2α′" is text).
    expect(x9).toMatch(/X9\(τ,σ\)=2α′/);
    const all = (await table.textContent()) ?? "";
    expect(all).not.toMatch(/\(0[\u2212-]0\)/);
    expect(all).not.toMatch(/=0\+/);
  });

  test("at 1440 px no column of the preview, the grid or the results tables is clipped", async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await signIn(page, demoAccounts.ada);
    const document = elevenAndAnAntibrane(unique("Wide"));
    const id = await createInGroup(page, document);
    await openDesigner(page, id);
    await expect(page.getByRole("table", { name: "Lightest states" })).toBeVisible();
    expect(await overflowing(page, 'section[aria-labelledby="spectrum-preview-title"]')).toEqual([]);
    expect(await overflowing(page, '[data-testid="boundary-grid-scroller"]')).toEqual([]);
    // An inline error in the grid too: a D5 has no place in IIA.
    await page.getByLabel("Stack s1, axis x5: Dirichlet").click();
    await expect(page.locator('[data-testid="boundary-grid-scroller"] [role="alert"]').first()).toBeVisible();
    expect(await overflowing(page, '[data-testid="boundary-grid-scroller"]')).toEqual([]);

    await page.goto(`/configurations/${id}/results`);
    await expect(page.getByTestId("lightest-table")).toBeVisible({ timeout: 30_000 });
    expect(await overflowing(page, "main")).toEqual([]);
  });

  test("the canvas PNG has a title, a legend and a scale bar on a light background in the dark theme", async ({ page }) => {
    await page.addInitScript(() => window.localStorage.setItem("mooring-theme", "dark"));
    await signIn(page, demoAccounts.ada);
    const title = unique("Picture");
    const id = await createInGroup(page, elevenAndAnAntibrane(title));
    await openDesigner(page, id);
    const frame = page.locator("[data-designer-canvas]");
    await expect(frame.locator("canvas").first()).toBeAttached({ timeout: 30_000 });
    const stageHeight = await frame.locator("canvas").first().evaluate((canvas: HTMLCanvasElement) => canvas.height / window.devicePixelRatio);

    const download = page.waitForEvent("download");
    await page.getByRole("button", { name: "Export" }).click();
    await page.getByRole("menuitem", { name: /Canvas \(PNG\)/ }).click();
    const file = await (await download).path();
    const { readFile } = await import("node:fs/promises");
    const dataUrl = `data:image/png;base64,${(await readFile(file)).toString("base64")}`;
    const picture = await page.evaluate(async (url) => {
      const image = new Image();
      image.src = url;
      await image.decode();
      const canvas = document.createElement("canvas");
      canvas.width = image.width;
      canvas.height = image.height;
      const context = canvas.getContext("2d");
      if (!context) throw new Error("no 2d context");
      context.drawImage(image, 0, 0);
      const ratio = window.devicePixelRatio;
      const pixel = (x: number, y: number) => Array.from(context.getImageData(x * ratio, y * ratio, 1, 1).data);
      // Dark pixels in the title band (the title's letters) and in the band below the drawing (legend, scale bar).
      const darkIn = (top: number, bottom: number) => {
        const band = context.getImageData(0, top * ratio, canvas.width, (bottom - top) * ratio).data;
        let dark = 0;
        for (let i = 0; i < band.length; i += 4) if ((band[i] ?? 255) + (band[i + 1] ?? 255) + (band[i + 2] ?? 255) < 300) dark += 1;
        return dark;
      };
      const cssHeight = image.height / ratio;
      return { corner: pixel(2, 2), cssHeight, titleInk: darkIn(14, 40), footerInk: darkIn(cssHeight - 50, cssHeight - 4) };
    }, dataUrl);
    // A light background whatever the theme (the dark theme's background is near black).
    for (const channel of picture.corner.slice(0, 3)) expect(channel).toBeGreaterThan(230);
    expect(picture.cssHeight).toBeGreaterThan(stageHeight + 60);
    expect(picture.titleInk).toBeGreaterThan(50);
    expect(picture.footerInk).toBeGreaterThan(50);
  });

  test("an instructor opens a student's fork from the lab and compares it with the starter", async ({ page }) => {
    await signIn(page, demoAccounts.ian);
    await page.goto("/groups/open-strings-lab");
    const forks = page.getByRole("region", { name: "Student forks" });
    const samRow = forks.getByRole("row").filter({ hasText: "Sam Okafor" }).first();
    await samRow.getByRole("link").first().click();
    await expect(page).toHaveURL(/\/configurations\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await expect(page.getByRole("application", { name: /Canvas showing/ })).toBeVisible({ timeout: 30_000 });

    await page.goBack();
    await forks.getByRole("link", { name: "Compare Sam Okafor's fork with the starter" }).first().click();
    await expect(page).toHaveURL(/\/compare\?with=/, { timeout: 30_000 });
    await expect(page.getByRole("heading", { name: "What differs" })).toBeVisible();
    // The seeded fork flipped the right stack to an antibrane.
    await expect(page.getByText(/antibrane/).first()).toBeVisible();
  });

  test("missing configurations answer 404 and hidden ones 403, each with a page that says so", async ({ page, browser }) => {
    await signIn(page, demoAccounts.ada);
    const hidden = await createInGroup(page, elevenAndAnAntibrane(unique("Hidden")));
    const missing = await page.goto("/configurations/00000000-0000-4000-8000-000000000000");
    expect(missing?.status()).toBe(404);
    await expect(page.getByText("No such configuration")).toBeVisible();
    expect((await page.goto("/configurations/not-an-id/results"))?.status()).toBe(404);

    // Sam in a browser of his own: clearing Ada's cookies instead raced the session refresh the page
    // had in flight, whose answer set her cookie again, so the sign-in page sent Sam to her dashboard.
    const samContext = await browser.newContext();
    const sam = await samContext.newPage();
    await signIn(sam, demoAccounts.sam);
    for (const path of ["", "/results", "/history", "/compare"]) {
      const response = await sam.goto(`/configurations/${hidden}${path}`);
      expect(response?.status(), path).toBe(403);
    }
    await expect(sam.getByText("You cannot open this configuration")).toBeVisible();
    await samContext.close();
  });

  test("an author sees who forked her configuration, in its history and in her recent activity", async ({ browser }) => {
    const authorContext = await browser.newContext();
    const forkerContext = await browser.newContext();
    const author = await authorContext.newPage();
    const forker = await forkerContext.newPage();
    await signIn(author, demoAccounts.ada);
    const title = unique("Forked");
    const id = await createInGroup(author, elevenAndAnAntibrane(title));

    await signIn(forker, demoAccounts.ben);
    const response = await forker.request.post(`/api/configurations/${id}/fork`, {
      data: { targetGroupId: await personalGroupId(forker), title: `${title} (Ben's)` },
    });
    expect(response.status()).toBe(201);

    await author.goto(`/configurations/${id}/history`);
    const list = author.getByRole("table", { name: "Forks of this configuration" });
    const row = list.getByRole("row").filter({ hasText: `${title} (Ben's)` });
    await expect(row).toContainText("Ben");
    // Ben's personal space is not shared with the author: the fork is listed, not linked.
    await expect(row).toContainText("not shared with you");

    await author.goto("/dashboard");
    const activity = author.getByTestId("activity-by-other").filter({ hasText: title });
    await expect(activity.first()).toContainText(`forked ${title}`);
    await expect(activity.first()).toContainText(`as \u201c${title} (Ben's)\u201d`);

    await authorContext.close();
    await forkerContext.close();
  });
});
