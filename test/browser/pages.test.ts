/**
 * Pages in a real browser (Debian Chromium): usable on a 360 px phone and on
 * a 1920 px screen, decimal points aligned in number columns, the default
 * unit readable with JavaScript off; a full-page screenshot of the 87Rb page
 * is saved to test-artifacts/species-rb87.png for a look by eye.
 */
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chromium, type Browser } from "playwright-core";
import { CHROMIUM, hasChromium, serveStatic, type StaticServer } from "../support/browser.js";
import { ROOT, demoSite } from "../support/runBuild.js";

if (!hasChromium) console.warn("page tests skipped: no Chromium at /usr/bin/chromium (install the Debian package chromium)");

let server: StaticServer;
let browser: Browser;
const PAGES = ["", "species/rb87/", "species/fe56/", "species/cs133/", "constants/", "methods/", "sheet/", "species/k40/sheet/"];

beforeAll(async () => {
  if (!hasChromium) return;
  server = await serveStatic(await demoSite());
  browser = await chromium.launch({ executablePath: CHROMIUM, args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking"] });
}, 600_000);

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe.skipIf(!hasChromium)("pages on screens", () => {
  it("have no horizontal overflow of the page at 360 px (tables scroll in their wrapper)", async () => {
    const ctx = await browser.newContext({ viewport: { width: 360, height: 740 } });
    const page = await ctx.newPage();
    for (const path of PAGES) {
      await page.goto(server.url + path, { waitUntil: "load" });
      const w = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
      expect(w.scroll, `${path || "index"} at 360 px`).toBeLessThanOrEqual(w.client);
    }
    await ctx.close();
  }, 120_000);

  it("keep every table row within three lines of text at 360 px (long text folds into notes)", async () => {
    const ctx = await browser.newContext({ viewport: { width: 360, height: 740 } });
    const page = await ctx.newPage();
    for (const path of ["species/rb87/", "species/sr88/", "species/rb87/line/D2/", "constants/"]) {
      await page.goto(server.url + path, { waitUntil: "load" });
      const tallest = await page.evaluate(() => {
        let worst = { id: "", lines: 0 };
        for (const tr of document.querySelectorAll<HTMLTableRowElement>("table.atlas-table tbody tr")) {
          const line = parseFloat(getComputedStyle(tr.cells[0]!).lineHeight) || 16;
          const lines = (tr.getBoundingClientRect().height - 4) / line;
          if (lines > worst.lines) worst = { id: tr.id, lines };
        }
        return worst;
      });
      expect(tallest.lines, `${path}: row ${tallest.id}`).toBeLessThanOrEqual(3);
    }
    await ctx.close();
  }, 120_000);

  it("show every cell whole at 1920 px: a wide table scrolls inside its box, none is cut off by the page", async () => {
    const ctx = await browser.newContext({ viewport: { width: 1920, height: 1080 } });
    const page = await ctx.newPage();
    for (const path of ["species/rb87/level/5s-S1_2/", "species/cs133/level/6s-S1_2/"]) {
      await page.goto(server.url + path, { waitUntil: "load" });
      // The answer columns of a transitions table (states, zero-field frequency, field-insensitive field) are visible without scrolling.
      const cut = await page.evaluate(() => {
        const t = document.querySelector<HTMLTableElement>('table[id^="table-rf:"]')!;
        const box = t.closest(".table-wrap")!.getBoundingClientRect();
        const heads = Array.from(t.tHead!.rows[0]!.cells).slice(0, 4);
        return heads.filter((th) => th.getBoundingClientRect().right > box.right + 1).map((th) => th.textContent);
      });
      expect(cut, path).toEqual([]);
    }
    await ctx.close();
  }, 120_000);

  it("keep prose lines readable and the content bounded at 1920 px", async () => {
    const ctx = await browser.newContext({ viewport: { width: 1920, height: 1080 } });
    const page = await ctx.newPage();
    for (const path of ["species/rb87/", "methods/"]) {
      await page.goto(server.url + path, { waitUntil: "load" });
      const m = await page.evaluate(() => {
        const main = document.querySelector("main")!.getBoundingClientRect().width;
        const paras = [...document.querySelectorAll("main p")].map((p) => p.getBoundingClientRect().width);
        const em = parseFloat(getComputedStyle(document.querySelector("main p")!).fontSize);
        return { main, widest: Math.max(...paras), em };
      });
      expect(m.main, path).toBeLessThanOrEqual(1600);
      // About 80 characters at most per prose line (common practice for legibility): well under 50 em.
      expect(m.widest / m.em, path).toBeLessThan(50);
    }
    await ctx.close();
  }, 120_000);

  it("line up decimal points in the number columns of the 87Rb page", async () => {
    const ctx = await browser.newContext({ viewport: { width: 1400, height: 900 } });
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/", { waitUntil: "load" });
    // Right edge of the integer part (where the point starts) of every number in two tables.
    const spread = await page.evaluate(() => {
      const out: number[] = [];
      for (const id of ["table-mf:5p-P3/2", "table-levels"]) {
        const table = document.getElementById(id)!;
        const cols = table.querySelectorAll("thead th").length;
        for (let c = 0; c < cols; c++) {
          const xs: number[] = [];
          for (const row of table.querySelectorAll("tbody tr")) {
            const frac = row.children[c]?.querySelector(".n > .frac");
            if (frac && frac.textContent!.startsWith(".")) xs.push(frac.getBoundingClientRect().left);
          }
          if (xs.length > 1) out.push(Math.max(...xs) - Math.min(...xs));
        }
      }
      return out;
    });
    expect(spread.length).toBeGreaterThan(3);
    // Padding uses digit-, point- and thin-wide spaces; parentheses of a written
    // uncertainty are only near the width of a point, so allow 0.2 em (≈ 2.6 px here).
    for (const s of spread) expect(s).toBeLessThan(2.6);
    await ctx.close();
  }, 60_000);

  it("show the MHz/G shift column with numbers when JavaScript is off", async () => {
    const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 }, javaScriptEnabled: false });
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/", { waitUntil: "load" });
    const cell = await page.evaluate(() => {
      const th = document.querySelector("#table-mf\\:5s-S1\\/2 th[data-switchable]") as HTMLElement;
      const index = [...th.parentElement!.children].indexOf(th);
      const td = document.querySelector(`[id="level:5s-S1/2:F=2:mF=2"]`)!.children[index] as HTMLElement;
      return { header: th.innerText, value: td.innerText, visible: td.getBoundingClientRect().width > 0 };
    });
    expect(cell.header).toContain("MHz/G");
    // 87Rb 5²S1/2 F = 2, mF = 2: gF ≈ 1/2, shift ≈ 1.40 MHz/G (Steck, Rubidium 87 D Line Data, table of Zeeman shifts).
    expect(cell.value).toMatch(/^1\.399/);
    expect(cell.visible).toBe(true);
    await ctx.close();
  }, 60_000);

  it("saves a full-page screenshot of the 87Rb page", async () => {
    const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/", { waitUntil: "load" });
    const dir = join(ROOT, "test-artifacts");
    mkdirSync(dir, { recursive: true });
    const png = await page.screenshot({ path: join(dir, "species-rb87.png"), fullPage: true });
    expect(png.length).toBeGreaterThan(10_000);
    await ctx.close();
  }, 60_000);
});
