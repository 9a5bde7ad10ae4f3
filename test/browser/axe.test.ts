import { existsSync } from "node:fs";
import { join } from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHROMIUM, hasChromium, watchPage, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

// One page of each type; the bench sheets only where the build writes them.
const PAGES = [
  "index.html",
  "species/rb87/index.html",
  "species/sr88/index.html",
  "species/rb87/level/5s-S1_2/index.html",
  "species/rb87/line/D2/index.html",
  // k40 D2 is too large for one page: one page per field; its 4p 2P3/2 transitions have a page of their own.
  "species/k40/line/D2/B-1T/index.html",
  "species/k40/level/4p-P3_2/transitions/index.html",
  "constants/index.html",
  "methods/index.html",
  "sheet/index.html",
  "species/rb87/sheet/index.html",
];

describe.skipIf(!hasChromium)("accessibility of every page type (axe-core), with the scripts running", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  for (const path of PAGES) {
    it(`${path} has no serious or critical violations, no console errors and no outside requests`, async (t) => {
      if (!existsSync(join(site, path))) t.skip();
      const page = await ctx.newPage();
      const problems = watchPage(page, [server.url, "data:"]);
      await page.goto(server.url + path);
      // With results showing, so the finder's list is checked too.
      await page.locator("#finder-input").pressSequentially("F=2");
      await page.locator("#finder-results a").first().waitFor();
      const result = await new AxeBuilder({ page }).analyze();
      const bad = result.violations
        .filter((v) => v.impact === "serious" || v.impact === "critical")
        .map((v) => `${v.id} (${v.impact}): ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join(", ")}`);
      expect(bad).toEqual([]);
      expect(problems).toEqual([]);
      await page.close();
    }, 300_000); // species pages with field tables hold thousands of rows; axe takes a while on them
  }
});
