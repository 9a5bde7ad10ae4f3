import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { CHROMIUM, hasChromium, watchPage, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

/** data-sort keys of one column of a table, in the order shown (visible rows only). */
function columnKeys(page: Page, tableId: string, col: number): Promise<string[]> {
  return page.evaluate(
    ([id, c]) =>
      Array.from(document.getElementById(id as string)!.querySelectorAll("tbody tr"))
        .filter((tr) => !(tr as HTMLElement).hidden)
        .map((tr) => (tr as HTMLTableRowElement).cells[c as number]!.getAttribute("data-sort") ?? ""),
    [tableId, col],
  );
}
function headerButton(page: Page, tableId: string, col: number) {
  return page.locator(`[id="${tableId}"] thead th`).nth(col).locator("button.sort");
}
function ariaSorts(page: Page, tableId: string): Promise<(string | null)[]> {
  return page.locator(`[id="${tableId}"] thead th`).evaluateAll((ths) => ths.map((th) => th.getAttribute("aria-sort")));
}
const byValue = (a: string, b: string) => dec(a).comparedTo(dec(b));

describe.skipIf(!hasChromium)("table filter and sort in the browser", () => {
  let ctx: BrowserContext;
  let server: StaticServer;
  let errors: string[];
  beforeAll(async () => {
    ({ ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));
  async function open(path: string): Promise<Page> {
    const page = await ctx.newPage();
    errors = watchPage(page, [server.url, "data:"]);
    await page.goto(server.url + path);
    return page;
  }

  // The sections of an overview are the page's <section> elements with an h2 (templates/_includes/species/overview.njk).
  const SHIFTS = '.table-tools[data-for="h-shifts"], section[aria-labelledby="h-shifts"] > .table-tools';

  it("puts one filter box in each section with a table of 10 rows or more, for all its tables, and none in small sections", async () => {
    const page = await open("species/rb87/");
    const boxes = await page.evaluate(() =>
      Array.from(document.querySelectorAll("main > section")).map((sec) => [
        sec.getAttribute("aria-labelledby"),
        sec.querySelectorAll(".table-tools input[type=search]").length,
        sec.querySelectorAll("table.atlas-table").length,
        Math.max(0, ...Array.from(sec.querySelectorAll("table.atlas-table")).map((t) => (t as HTMLTableElement).tBodies[0]!.rows.length)),
      ]),
    );
    for (const [id, inputs, tables, largest] of boxes as [string, number, number, number][]) {
      expect(inputs, `${id}: ${tables} tables, largest ${largest} rows`).toBe(tables > 0 && largest >= 10 ? 1 : 0);
    }
    // rb87 (data/species/rb87.yaml): three levels, so no box on the levels table; the shift tables of 5p-P3/2 (16 sublevels) get one for the whole section.
    expect(boxes.find((b) => b[0] === "h-levels")?.[1]).toBe(0);
    expect(boxes.find((b) => b[0] === "h-shifts")?.[1]).toBe(1);
    await page.close();
  });

  it("filters the rows of every table of the section as the reader types and says how many are left", async () => {
    const page = await open("species/rb87/");
    const box = page.locator(SHIFTS).first();
    const visible = () =>
      page.evaluate(() => Array.from(document.querySelectorAll('section[aria-labelledby="h-shifts"] tbody tr')).filter((r) => !(r as HTMLElement).hidden).map((r) => r.id));
    const all = (await visible()).length;
    await box.locator("input").pressSequentially("5p-P3/2");
    const shown = await visible();
    expect(shown.length).toBeGreaterThan(0);
    for (const id of shown) expect(id).toContain("5p-P3/2");
    expect(await box.locator(".table-count").textContent()).toBe(`${shown.length} of ${all} rows`);
    // A typed ASCII minus finds the page's true minus (U+2212).
    await box.locator("input").fill("");
    await box.locator("input").pressSequentially("-2");
    expect(await visible()).toContain("level:5s-S1/2:F=2:mF=-2");
    await box.locator("input").fill("");
    expect(await visible()).toHaveLength(all);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("sorts a signed number column by value, not as text, both ways, with aria-sort on the header", async () => {
    const page = await open("species/rb87/");
    const id = "table-mf:5s-S1/2";
    const col = await page.locator(`[id="${id}"] thead th`).evaluateAll((ths) => ths.findIndex((th) => th.hasAttribute("data-switchable")));
    expect(col).toBeGreaterThan(0);
    const original = await columnKeys(page, id, col);
    // The column mixes signs, and text order would differ from value order: the test can fail.
    expect(original.some((k) => k.startsWith("-")) && original.some((k) => !k.startsWith("-"))).toBe(true);
    expect([...original].sort()).not.toEqual([...original].sort(byValue));

    await headerButton(page, id, col).click();
    expect(await columnKeys(page, id, col)).toEqual([...original].sort(byValue));
    expect((await ariaSorts(page, id))[col]).toBe("ascending");
    await headerButton(page, id, col).click();
    expect(await columnKeys(page, id, col)).toEqual([...original].sort(byValue).reverse());
    expect((await ariaSorts(page, id)).filter((s) => s !== null)).toEqual(["descending"]);
    await page.close();
  });

  it("sorts fractions by their decimal keys and keeps empty cells last in both directions", async () => {
    let page = await open("species/sr88/");
    // sr88's levels table: "gJ exact (gL = 1, gS = 2)" is a fraction, "—" for the J = 0 levels 1S0 and 3P0.
    const col = await page.locator("#table-levels thead th").evaluateAll((ths) => ths.findIndex((th) => th.classList.contains("k-fraction")));
    const keys = await columnKeys(page, "table-levels", col);
    expect(keys.filter((k) => k === "").length).toBe(2);
    const values = keys.filter((k) => k !== "").sort(byValue);
    await headerButton(page, "table-levels", col).click();
    expect(await columnKeys(page, "table-levels", col)).toEqual([...values, "", ""]);
    await headerButton(page, "table-levels", col).click();
    expect(await columnKeys(page, "table-levels", col)).toEqual([...values.reverse(), "", ""]);

    await page.close();

    // Zeeman components (on the line's own page): strengths are exact fractions such as 1/3 and 1/12 whose text order is wrong.
    page = await open("species/sr88/line/689/");
    const cmp = "table-cmp:689";
    const sc = await page.locator(`[id="${cmp}"] thead th`).evaluateAll((ths) => ths.findIndex((th) => th.classList.contains("k-fraction")));
    const strengths = await columnKeys(page, cmp, sc);
    await headerButton(page, cmp, sc).click();
    expect(await columnKeys(page, cmp, sc)).toEqual([...strengths].sort(byValue));
    expect(errors).toEqual([]);
    await page.close();
  });

  it("shows a row reached by its anchor even when a filter had hidden it", async () => {
    const page = await open("species/rb87/");
    await page.locator(SHIFTS).first().locator("input").pressSequentially("5s-S1/2");
    const row = "level:5p-P3/2:F=3:mF=3";
    expect(await page.evaluate((id) => (document.getElementById(id) as HTMLElement).hidden, row)).toBe(true);
    await page.evaluate((id) => { location.hash = id; }, row);
    await page.waitForFunction((id) => !(document.getElementById(id) as HTMLElement).hidden, row);
    await page.close();
  });
});
