/**
 * The lock-point table of a line page in Debian Chromium, on the demo build
 * (87Rb D2, D. A. Steck's constants): offsets from the strongest transition
 * as the page is served, offsets from the resonance picked in the select
 * box, and the absolute frequencies of the field calculator on the same page.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { CHROMIUM, hasChromium, watchPage, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

const TABLE = "table-lock:D2";
const SELECT = "lock-reference-D2";
const ROW = {
  f2to3: "lock:D2:F=2-to-F=3",
  f1to2: "lock:D2:F=1-to-F=2",
  co2to23: "lock:D2:F=2-to-F=2,3",
};

/** "−6 568.031" → -6568.031 (the page's minus sign and thin, figure and punctuation spaces). */
const shownNumber = (text: string) => Number(text.replace(/\u2212/g, "-").replace(/[\u2009\u2007\u2008\s]/g, ""));

/** Per row id: the shown offset from the reference (MHz), its data-sort and the row's data-hz. */
function offsets(page: Page): Promise<Record<string, { text: string; sort: string; hz: string }>> {
  return page.evaluate((id) => {
    const out: Record<string, { text: string; sort: string; hz: string }> = {};
    for (const td of Array.from(document.getElementById(id)!.querySelectorAll<HTMLTableCellElement>("tbody td[data-hz]"))) {
      out[td.parentElement!.id] = { text: td.textContent ?? "", sort: td.getAttribute("data-sort") ?? "", hz: td.getAttribute("data-hz") ?? "" };
    }
    return out;
  }, TABLE);
}

/** (a − b) Hz in MHz rounded half to even to 1 kHz, with decimal.js (not the page's BigInt code). */
const mhz3 = (a: string, b: string) => new Dec(a).sub(b).div("1e6").toDecimalPlaces(3, Dec.ROUND_HALF_EVEN).toNumber();

describe.skipIf(!hasChromium)("lock points on the 87Rb D2 line page", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  it("serves offsets from the strongest transition, with the select box hidden, for readers without JavaScript", () => {
    const html = readFileSync(join(site, "species/rb87/line/D2/index.html"), "utf8");
    expect(html).toMatch(/<p class="lock-choice" hidden>/);
    expect(html).toContain("offset from F = 2 → F′ = 3, the strongest transition");
    expect(html).toMatch(/<option value="lock:D2:F=2-to-F=3" selected>/);
    const cell = (row: string) => {
      const tr = new RegExp(`<tr id="${row}">(.*?)</tr>`, "s").exec(html)![1]!;
      const tds = [...tr.matchAll(/<td class="k-number"[^>]*data-hz="[^"]+"[^>]*>(.*?)<\/td>/gs)];
      return shownNumber(tds[0]![1]!.replace(/<[^>]+>/g, ""));
    };
    expect(cell(ROW.f2to3)).toBe(0);
    // from memory: Steck, "Rubidium 87 D Line Data": the F′ = 2/3 crossover lies 133.3 MHz below F = 2 → F′ = 3
    expect(Math.abs(cell(ROW.co2to23) - -133.3)).toBeLessThan(0.05);
  });

  it("recomputes the offsets from the resonance picked in the select box", async () => {
    const page = await ctx.newPage();
    const problems = watchPage(page, [server.url, "data:"]);
    await page.goto(server.url + "species/rb87/line/D2/");
    await page.locator(`[id="${SELECT}"]`).waitFor({ state: "visible" });
    const served = await offsets(page);

    await page.selectOption(`[id="${SELECT}"]`, ROW.f1to2);
    await page.waitForFunction((id) => document.getElementById(id)!.getAttribute("data-reference") === "lock:D2:F=1-to-F=2", TABLE);
    let now = await offsets(page);
    expect(shownNumber(now[ROW.f1to2]!.text)).toBe(0);
    // from memory: Steck: ground splitting 6834.682 611 MHz, F′ = 3 − F′ = 2 = 266.650 MHz, so
    // ν(2 → 3′) − ν(1 → 2′) = 266.650 − 6834.683 = −6568.033 MHz; the demo's A′, B′ give the 266.65 MHz to about 2 kHz
    expect(Math.abs(shownNumber(now[ROW.f2to3]!.text) - -6568.033)).toBeLessThan(0.005);
    // every cell is its row's frequency less the reference's, to 1 kHz, and sorts by that value
    for (const [row, c] of Object.entries(now)) {
      expect(shownNumber(c.text), row).toBe(mhz3(c.hz, now[ROW.f1to2]!.hz));
      expect(Number(c.sort), row).toBeCloseTo(mhz3(c.hz, now[ROW.f1to2]!.hz), 3);
    }

    await page.selectOption(`[id="${SELECT}"]`, ROW.co2to23);
    await page.waitForFunction((id) => document.getElementById(id)!.getAttribute("data-reference") === "lock:D2:F=2-to-F=2,3", TABLE);
    now = await offsets(page);
    // Steck (from memory), as above: F = 2 → F′ = 3 is 133.3 MHz above the crossover
    expect(Math.abs(shownNumber(now[ROW.f2to3]!.text) - 133.3)).toBeLessThan(0.05);

    // back to the strongest transition: the served digits, character for character
    await page.selectOption(`[id="${SELECT}"]`, ROW.f2to3);
    await page.waitForFunction((id) => document.getElementById(id)!.getAttribute("data-reference") === "lock:D2:F=2-to-F=3", TABLE);
    now = await offsets(page);
    for (const row of Object.keys(served)) expect(now[row]!.text, row).toBe(served[row]!.text);
    expect(problems).toEqual([]);
    await page.close();
  });

  it("gives the field calculator's components their absolute frequency, the line's c/λ plus the shift", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/line/D2/#B=0.5G");
    await page.waitForSelector(".calc-results table.calc-components");
    const cols = await page.evaluate(() => {
      const t = document.querySelector<HTMLTableElement>(".calc-results table.calc-components")!;
      const heads = Array.from(t.tHead!.rows[0]!.cells).map((th) => th.textContent ?? "");
      const shift = heads.findIndex((h) => h.startsWith("shift from line centre"));
      const nu = heads.findIndex((h) => h.startsWith("frequency"));
      return { heads, rows: Array.from(t.tBodies[0]!.rows).map((r) => [Number(r.cells[shift]!.dataset.value), Number(r.cells[nu]!.dataset.value), r.cells[nu]!.textContent ?? ""] as [number, number, string]) };
    });
    expect(cols.heads).toContain("frequency (THz)");
    // c/λ with c = 299 792 458 m/s (exact, SI) and λ = 780.241 209 686 nm (Steck, the demo data)
    const centre = new Dec("299792458").div("780.241209686e-9").toNumber();
    expect(cols.rows.length).toBeGreaterThan(30);
    for (const [shift, nu, text] of cols.rows) {
      expect(Math.abs(nu - shift - centre)).toBeLessThan(1);
      // shown in THz in the concise form: rounded at its last digit (1 kHz without an uncertainty), "(12)" after it
      const bare = text.replace(/\(\d+\)$/, "");
      const lastDigitHz = 1e12 * 10 ** -(/\.([\d\u2009]*)/.exec(bare)?.[1]!.replace(/\u2009/g, "").length ?? 0);
      expect(lastDigitHz).toBeLessThanOrEqual(1000);
      expect(Math.abs(shownNumber(bare) * 1e12 - nu)).toBeLessThanOrEqual(lastDigitHz / 2 + 0.01);
    }
    await page.close();
  });
});
