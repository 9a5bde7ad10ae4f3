/**
 * The finder's examples of issue 9 in Debian Chromium, each with the row it
 * must land on, at 1920 × 1080 and at 360 × 740: the result line shows the
 * answer, and after the jump the row is marked, below its table's column
 * headings, with the heading row and the answer column in view.
 */
import { pathToFileURL } from "node:url";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHROMIUM, hasChromium, launchBrowser, serveStatic, watchPage, type StaticServer } from "../support/browser.js";
import { demoSite } from "../support/runBuild.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

interface Example {
  query: string;
  /** Page and row id the first result must land on (page from the site root); row null for a species page. */
  page: string;
  row: string | null;
  /** Key of the column (th data-key) that holds the answer. */
  column?: string;
  /** Text the first result line must show. */
  answer?: RegExp;
}

// Row ids in the anchor forms of src/site/anchors.ts; pages as in src/site/pageUrls.ts; level and line ids as in data/species/*.yaml.
const RB_CLOCK = "rf:5s-S1/2:F=1,mF=0:F=2,mF=0";
const RB_MAGIC = "rf:5s-S1/2:F=1,mF=-1:F=2,mF=1";
const RB_LEVEL_PAGE = "species/rb87/level/5s-S1_2/index.html";
const EXAMPLES: Example[] = [
  // 87Rb ground state: the 0–0 clock transition is field-insensitive at B = 0; the two-photon F=1, mF=−1 ↔ F=2, mF=1
  // transition near 3.229 G (common practice, from memory).
  { query: "87Rb clock", page: RB_LEVEL_PAGE, row: RB_CLOCK, column: "insensitive", answer: /field-insensitive at 0 G/ },
  { query: "87Rb magic", page: RB_LEVEL_PAGE, row: RB_MAGIC, column: "insensitive", answer: /field-insensitive at 3\.228\u20099\d\d G/ },
  { query: "87Rb 3.228", page: RB_LEVEL_PAGE, row: RB_MAGIC, column: "insensitive", answer: /field-insensitive at 3\.228\u20099\d\d G/ },
  { query: "87Rb rf", page: RB_LEVEL_PAGE, row: RB_CLOCK, column: "insensitive" },
  // Demo fields (data/site.yaml) end with 1 T: the seventh energy column, E6.
  { query: "Cs F=4 mF=4 1 T", page: "species/cs133/index.html", row: "field:6s-S1/2:F=4:mF=4", column: "E6", answer: /energy at 1 T/ },
  { query: "rubidium", page: "species/rb87/index.html", row: null },
  { query: "caesium", page: "species/cs133/index.html", row: null },
  { query: "cesium", page: "species/cs133/index.html", row: null },
  // σ+: m_upper − m_lower = +1 (common practice); the first D2 of the demo in species order is 133Cs.
  { query: "D2 sigma+", page: "species/cs133/line/D2/index.html", row: "line:D2:mu=3/2,ml=1/2", column: "pol", answer: /σ\+/ },
  // 87Rb 5²S1/2 F = 2: gF ≈ 0.4998 and about 0.70 MHz/G per unit mF (Steck, from memory).
  { query: "87Rb F=2 mF=1", page: "species/rb87/index.html", row: "level:5s-S1/2:F=2:mF=1", column: "shift", answer: /gF = 0\.499\u20098.*shift 0\.699\u20095.* MHz\/G/ },
];

const VIEWPORTS = [
  { width: 1920, height: 1080 },
  { width: 360, height: 740 },
];

/** Type a query, take the first result, wait for the page at `expected`, and report the result line and where the page landed. */
async function findAndLand(page: Page, ex: Example, expected: string) {
  await page.locator("#finder-input").fill("");
  await page.locator("#finder-input").pressSequentially(ex.query);
  const first = page.locator("#finder-results a").first();
  await first.waitFor();
  const line = (await first.textContent()) ?? "";
  await first.click();
  await page.waitForFunction((want) => location.href === want && document.readyState === "complete", expected);
  // Landing runs on load; give the layout one frame to settle.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  const where = await page.evaluate((column) => {
    const id = decodeURIComponent(location.hash.slice(1));
    const row = id ? (document.getElementById(id) as HTMLTableRowElement | null) : null;
    if (!row) return { id, row: null };
    const vh = window.innerHeight;
    const vw = window.innerWidth;
    const table = row.closest("table")!;
    // The heading row as drawn: its cells (sticky), not the thead box (which stays in the flow).
    const ths = Array.from(table.tHead!.rows[0]!.cells).map((th) => th.getBoundingClientRect());
    const head = { top: Math.min(...ths.map((b) => b.top)), bottom: Math.max(...ths.map((b) => b.bottom)), height: Math.max(...ths.map((b) => b.height)) };
    const r = row.getBoundingClientRect();
    const wrap = row.closest(".table-wrap")!.getBoundingClientRect();
    const col = Array.from(table.tHead!.rows[0]!.cells).findIndex((th) => th.getAttribute("data-key") === column);
    const cell = col >= 0 ? row.cells[col]!.getBoundingClientRect() : null;
    const pinned = row.cells[0]!.getBoundingClientRect();
    // The part of the table box a reader sees right of the pinned first column.
    const from = col === 0 ? wrap.left : pinned.right;
    const to = Math.min(wrap.right, vw);
    return {
      id,
      row: {
        landed: row.classList.contains("landed"),
        visible: r.top >= 0 && r.bottom <= vh,
        headVisible: head.top >= 0 && head.bottom <= vh && head.height > 0,
        belowHead: r.top >= head.bottom - 1,
        cell: cell
          ? {
              // Whole when it fits; else from its start (where the answer begins), filling the visible part.
              inView: cell.left >= from - 1 && (cell.right <= to + 0.5 || (cell.width > to - from && cell.left <= from + 12)),
              clearOfPinned: col === 0 || cell.left >= pinned.right - 1,
              marked: row.cells[col]!.classList.contains("landed-cell"),
            }
          : null,
      },
    };
  }, ex.column ?? "");
  return { line, url: page.url(), ...where };
}

describe.skipIf(!hasChromium)("finder examples land on their rows with headings and answer in view", () => {
  let site: string;
  let server: StaticServer;
  beforeAll(async () => {
    site = await demoSite();
    server = await serveStatic(site, "/");
  }, 600_000);
  afterAll(() => server?.close());

  for (const vp of VIEWPORTS) {
    describe(`at ${vp.width} × ${vp.height}`, () => {
      let ctx: BrowserContext;
      beforeAll(async () => {
        ctx = await launchBrowser(vp);
      }, 60_000);
      afterAll(() => ctx?.close());

      it("lands every example on its row, below the table's headings, with the answer column in view", async () => {
        const page = await ctx.newPage();
        const problems = watchPage(page, [server.url]);
        await page.goto(server.url + "methods/");
        for (const ex of EXAMPLES) {
          const want = server.url + ex.page + (ex.row ? `#${encodeURI(ex.row)}` : "");
          const got = await findAndLand(page, ex, want);
          if (ex.answer) expect(got.line, ex.query).toMatch(ex.answer);
          expect(got.url, ex.query).toBe(want);
          if (!ex.row) continue;
          expect(got.id, ex.query).toBe(ex.row);
          expect(got.row, ex.query).toMatchObject({ landed: true, visible: true, headVisible: true, belowHead: true });
          expect(got.row!.cell, ex.query).toEqual({ inView: true, clearOfPinned: true, marked: true });
        }
        expect(problems).toEqual([]);
        await page.close();
      });
    });
  }

  it("keeps every table's heading row in view while its rows scroll (sticky headings)", async () => {
    const ctx = await launchBrowser({ width: 360, height: 740 });
    try {
      const page = await ctx.newPage();
      for (const path of ["species/rb87/index.html", RB_LEVEL_PAGE, "species/rb87/line/D2/index.html", "constants/index.html"]) {
        await page.goto(server.url + path);
        const tables = await page.evaluate(() =>
          Array.from(document.querySelectorAll("table.atlas-table")).map((t) => {
            const th = (t as HTMLTableElement).tHead?.rows[0]?.cells[1] ?? (t as HTMLTableElement).tHead?.rows[0]?.cells[0];
            return th ? getComputedStyle(th).position : "none";
          }),
        );
        expect(tables.length, path).toBeGreaterThan(0);
        expect(new Set(tables), path).toEqual(new Set(["sticky"]));
      }
      // A long table (the 202 transitions of 40K 4²P3/2, on a page of their own): landed on its last row, its headings are on screen above it.
      await page.goto(server.url + "species/k40/level/4p-P3_2/transitions/index.html");
      const last = await page.evaluate(() => Array.from(document.querySelectorAll("table.atlas-table tbody tr")).pop()!.id);
      await page.evaluate((id) => (location.hash = id), last);
      await page.waitForFunction((id) => document.getElementById(id)?.classList.contains("landed"), last);
      await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
      const seen = await page.evaluate((id) => {
        const row = document.getElementById(id)!;
        const head = row.closest("table")!.tHead!.rows[0]!.cells[1]!.getBoundingClientRect();
        const r = row.getBoundingClientRect();
        const wrap = row.closest(".table-wrap") as HTMLElement;
        return { scrolled: wrap.scrollTop > 0, head: head.top >= 0 && head.bottom <= r.top + 1, row: r.bottom <= window.innerHeight };
      }, last);
      expect(seen).toEqual({ scrolled: true, head: true, row: true });
    } finally {
      await ctx.close();
    }
  });

  it("lands from disk too (file://), with the answer column of the landing", async () => {
    const ctx = await launchBrowser({ width: 360, height: 740 });
    try {
      const page = await ctx.newPage();
      const base = pathToFileURL(site).href;
      const problems = watchPage(page, [base, "data:"]);
      await page.goto(pathToFileURL(join(site, "index.html")).href);
      const want = `${base}/${RB_LEVEL_PAGE}#${encodeURI(RB_CLOCK)}`;
      const got = await findAndLand(page, EXAMPLES[0]!, want);
      expect(got.url).toBe(want);
      expect(got.row).toMatchObject({ landed: true, visible: true, headVisible: true, belowHead: true });
      expect(got.row!.cell).toEqual({ inView: true, clearOfPinned: true, marked: true });
      expect(problems).toEqual([]);
    } finally {
      await ctx.close();
    }
  });

  it("focuses the search box with / and clears it with Esc", async () => {
    const ctx = await launchBrowser({ width: 1920, height: 1080 });
    try {
      const page = await ctx.newPage();
      await page.goto(server.url + "species/rb87/index.html");
      await page.locator("h1").click();
      await page.keyboard.press("/");
      expect(await page.evaluate(() => document.activeElement?.id)).toBe("finder-input");
      // The slash itself is not typed into the box.
      expect(await page.locator("#finder-input").inputValue()).toBe("");
      await page.keyboard.type("rubidium");
      await page.locator("#finder-results a").first().waitFor();
      await page.keyboard.press("Escape");
      expect(await page.locator("#finder-input").inputValue()).toBe("");
      expect(await page.locator("#finder-results").isVisible()).toBe(false);
      // "/" typed into another text field stays there.
      const filter = page.locator(".table-tools input").first();
      if ((await filter.count()) > 0) {
        await filter.click();
        await page.keyboard.type("/");
        expect(await filter.inputValue()).toBe("/");
        expect(await page.evaluate(() => document.activeElement?.id)).not.toBe("finder-input");
      }
    } finally {
      await ctx.close();
    }
  });
});
