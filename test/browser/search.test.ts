import { pathToFileURL } from "node:url";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHROMIUM, hasChromium, watchPage as watch, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

/** Type a query as a reader would, take the first result, and report where the page landed. */
async function findAndGo(page: Page, query: string): Promise<{ hash: string; rowId: string | null; visible: boolean; text: string }> {
  await page.locator("#finder-input").fill("");
  await page.locator("#finder-input").pressSequentially(query);
  const first = page.locator("#finder-results a").first();
  await first.waitFor();
  const before = page.url();
  await first.click();
  await page.waitForFunction((b) => location.href !== b && document.readyState === "complete", before);
  return page.evaluate(() => {
    const el = document.getElementById(location.hash.slice(1));
    const r = el?.getBoundingClientRect();
    return {
      hash: location.hash,
      rowId: el ? el.id : null,
      visible: !!el && !!r && r.height > 0 && r.bottom > 0 && r.top < window.innerHeight && getComputedStyle(el).visibility !== "hidden",
      text: el ? el.textContent ?? "" : "",
    };
  });
}

describe.skipIf(!hasChromium)("finder in the browser", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/lab/atlas/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  it("works from file:// with no network: F=2, 729, 3P2 and ²P₃/₂ land on their rows", async () => {
    const page = await ctx.newPage();
    const base = pathToFileURL(site).href;
    const problems = watch(page, [base, "data:"]);
    await page.goto(pathToFileURL(join(site, "index.html")).href);
    expect(await page.locator("#finder").isVisible()).toBe(true);

    // Anchor forms from src/site/anchors.ts; ids as written in data/species/*.yaml.
    const f2 = await findAndGo(page, "F=2");
    expect(f2.hash).toMatch(/^#level:[^:]+:F=2$/);
    expect([f2.rowId, f2.visible]).toEqual([f2.hash.slice(1), true]);

    const l729 = await findAndGo(page, "729");
    expect(l729.hash).toBe("#line:729");
    expect(page.url()).toContain("/species/ca40-ion/index.html#line:729");
    expect([l729.rowId, l729.visible]).toEqual(["line:729", true]);

    const p3 = await findAndGo(page, "3P2");
    expect(p3.hash).toMatch(/^#level:[^:]*3P2$/);
    expect([p3.rowId, p3.visible]).toEqual([p3.hash.slice(1), true]);

    const p32 = await findAndGo(page, "²P₃/₂");
    expect(p32.hash).toMatch(/^#level:[^:]*P3\/2$/);
    expect([p32.rowId, p32.visible]).toEqual([p32.hash.slice(1), true]);
    // The row's term cell shows the term found (sup/sub markup reads 2Po3/2 as text).
    expect(p32.text).toContain("2Po3/2");

    expect(problems).toEqual([]);
    await page.close();
  });

  it("works over http under a path prefix, from a directory URL, and jumps within the same page", async () => {
    const page = await ctx.newPage();
    const problems = watch(page, [server.url]);
    await page.goto(server.url + "species/na23/");
    const mf = await findAndGo(page, "rb87 5s-S1/2 F=2 mF=2");
    expect(page.url()).toBe(server.url + "species/rb87/index.html#level:5s-S1/2:F=2:mF=2");
    expect([mf.rowId, mf.visible]).toEqual(["level:5s-S1/2:F=2:mF=2", true]);

    // Same page now: a fragment jump, no reload.
    await page.evaluate(() => ((window as unknown as { marker: number }).marker = 1));
    const d2 = await findAndGo(page, "87Rb D2");
    expect([d2.rowId, d2.visible]).toEqual(["line:D2", true]);
    expect(await page.evaluate(() => (window as unknown as { marker?: number }).marker)).toBe(1);

    // Enter takes the first result.
    await page.goto(server.url + "constants/");
    await page.locator("#finder-input").pressSequentially("780.24");
    await page.locator("#finder-results a").first().waitFor();
    await page.keyboard.press("Enter");
    await page.waitForURL(/#line:D2$/);
    expect(page.url()).toBe(server.url + "species/rb87/index.html#line:D2");
    expect(problems).toEqual([]);
    await page.close();
  });

  it("says how many rows match and hides the list for an empty box", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url);
    await page.locator("#finder-input").pressSequentially("zz-no-such-thing");
    await page.waitForFunction(() => document.getElementById("finder-status")!.textContent === "No matches");
    await page.locator("#finder-input").fill("");
    expect(await page.locator("#finder-results").isVisible()).toBe(false);
    await page.close();
  });
});
