import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHROMIUM, hasChromium, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

// A hyperfine sublevel row of 87Rb (anchor form from src/site/anchors.ts).
const ROW = "level:5s-S1/2:F=2:mF=2";
const rowLink = `[id="${ROW}"] a.row-link`;

describe.skipIf(!hasChromium)("copy-link on table rows", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/lab/atlas/"));
    await ctx.grantPermissions(["clipboard-read", "clipboard-write"], { origin: new URL(server.url).origin });
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  it("copies the row's full URL to the clipboard and announces it", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    await page.locator(rowLink).click();
    await page.waitForFunction(() => document.getElementById("atlas-announce")?.textContent === "Link copied");
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(`${server.url}species/rb87/#${ROW}`);
    expect(await page.getAttribute("#atlas-announce", "role")).toBe("status");
    await page.close();
  });

  it("falls back to a copy command where the Clipboard API is missing (file://)", async () => {
    const page = await ctx.newPage();
    await page.addInitScript(() => {
      Object.defineProperty(Navigator.prototype, "clipboard", { get: () => undefined });
      document.addEventListener("copy", (e) => {
        const t = e.target as HTMLTextAreaElement;
        (window as unknown as { copied: string }).copied = t && "value" in t ? t.value : String(getSelection());
      }, true);
    });
    const url = pathToFileURL(join(site, "species/rb87/index.html")).href;
    await page.goto(url);
    await page.locator(rowLink).click();
    await page.waitForFunction(() => document.getElementById("atlas-announce")?.textContent === "Link copied");
    expect(await page.evaluate(() => (window as unknown as { copied: string }).copied)).toBe(`${url}#${ROW}`);
    await page.close();
  });

  it("still jumps to the row when JavaScript is off", async () => {
    const page = await ctx.newPage();
    const cdp = await ctx.newCDPSession(page);
    await cdp.send("Emulation.setScriptExecutionDisabled", { value: true });
    await page.goto(server.url + "species/rb87/");
    expect(await page.locator("#finder").isVisible()).toBe(false);
    await page.locator(rowLink).click();
    await page.waitForURL(/#level:/);
    expect(new URL(page.url()).hash).toBe(`#${ROW}`);
    await page.close();
  });
});
