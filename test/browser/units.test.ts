import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Dec, dec } from "../../src/physics/decimal.js";
import { formatNumber } from "../../src/site/format.js";
import { ASSET, clientContext } from "../site/searchClient.js";
import { CHROMIUM, hasChromium, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

const units = clientContext([ASSET("units.js")]).AtlasUnits;
const show = (hzPerT: string, unit: string) => {
  const p = units.convert(hzPerT, unit)!;
  return p.sign + p.int + p.frac + p.exp;
};

describe("shift unit conversion in the page script", () => {
  it("converts the Bohr magneton to each unit (CODATA 2018)", () => {
    // CODATA 2018: μB/h = 1.399 624 493 61 × 10¹⁰ Hz/T; μB/(hc) = 46.686 447 783 m⁻¹/T = 0.466 864 477 83 cm⁻¹/T.
    const muB = "13996244936.1";
    expect(show(muB, "MHz/G")).toBe("1.399\u2009624\u200949");
    expect(show(muB, "GHz/T")).toBe("13.996\u2009244\u20099");
    expect(show(muB, "kHz/T")).toBe("13\u2009996\u2009244.9");
    expect(show(muB, "Hz/G")).toBe("1\u2009399\u2009624.49");
    expect(show(muB, "cm⁻¹/T")).toBe("0.466\u2009864\u2009478");
    expect(show(muB, "cm⁻¹/G")).toBe("0.000\u2009046\u2009686\u2009447\u20098");
    expect(show("-" + muB, "GHz/T")).toBe("\u221213.996\u2009244\u20099");
  });

  it("rounds and writes numbers exactly as the server does (src/site/format.ts)", () => {
    // Powers of ten are exact shifts; cm⁻¹ divides by 100·c = 29 979 245 800 (exact, SI definition of c).
    const factor: Record<string, string> = {
      "Hz/T": "1", "kHz/T": "1e3", "MHz/T": "1e6", "GHz/T": "1e9", "cm⁻¹/T": "29979245800",
      "Hz/G": "1e4", "kHz/G": "1e7", "MHz/G": "1e10", "GHz/G": "1e13", "cm⁻¹/G": "299792458000000",
    };
    const samples = ["0", "1", "-7", "13991666086.16448099459", "-4663727711.1234567", "0.000123456789", "5e-9", "98765432109876543210.5", "12345.6785", "12345.6775", "-0.35", "2.5e12"];
    for (const v of samples) {
      for (const u of units.UNITS) {
        const expected = formatNumber(dec(v).div(new Dec(factor[u]!)), 9);
        // The server writes an exact power-of-ten mantissa as "1.×10ⁿ"; the page script leaves out the lone point.
        expect(show(v, u), `${v} in ${u}`).toBe(expected.replace(".×", "×"));
      }
    }
  });

  it("refuses what it cannot read", () => {
    expect(units.convert("abc", "MHz/G")).toBeNull();
    expect(units.convert("1", "MHz/furlong")).toBeNull();
  });
});

describe.skipIf(!hasChromium)("shift unit choice in the browser", () => {
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  /** The switchable cell of a row, and the row's cells under the fixed GHz/T and cm⁻¹/T headers. */
  function cells(page: Page, rowId: string) {
    return page.evaluate((id) => {
      const tr = document.getElementById(id) as HTMLTableRowElement;
      const ths = Array.from(tr.closest("table")!.tHead!.rows[0]!.cells);
      const at = (f: (th: HTMLTableCellElement) => boolean) => tr.cells[ths.findIndex(f)]!.textContent!.trim();
      return {
        switchable: at((th) => th.hasAttribute("data-switchable")),
        header: ths.find((th) => th.hasAttribute("data-switchable"))!.querySelector(".unit")!.textContent,
        GHzT: at((th) => !th.hasAttribute("data-switchable") && th.textContent!.includes("(GHz/T)")),
        cmT: at((th) => !th.hasAttribute("data-switchable") && th.textContent!.includes("(cm⁻¹/T)")),
      };
    }, rowId);
  }

  it("switches to GHz/T and cm⁻¹/T, matching the server's own columns, and back to MHz/G", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    const row = "level:5s-S1/2:F=2:mF=2";
    const before = await cells(page, row);
    expect(before.header).toBe("(MHz/G)");
    await page.selectOption("#unit-choice", "GHz/T");
    const g = await cells(page, row);
    expect([g.header, g.switchable]).toEqual(["(GHz/T)", before.GHzT]);
    // 87Rb ground state, F = 2, mF = 2: gF ≈ 1/2 (Steck, Rubidium 87 D Line Data), so the shift is close to μB/h = 13.996 GHz/T (CODATA 2018).
    // (the cell carries its concise uncertainty, "(14)", which is left out here)
    expect(Math.abs(Number(g.switchable.replace(/\u2009/g, "").replace(/\(\d+\)/, "")) - 13.996)).toBeLessThan(0.01);
    await page.selectOption("#unit-choice", "cm⁻¹/T");
    expect((await cells(page, row)).switchable).toBe(before.cmT);
    await page.selectOption("#unit-choice", "MHz/G");
    expect((await cells(page, row)).switchable).toBe(before.switchable);
    // Every switchable cell of the page agrees, markup and alignment padding included, with its row's GHz/T column.
    await page.selectOption("#unit-choice", "GHz/T");
    const mismatches = await page.evaluate(() => {
      const bad: string[] = [];
      for (const table of Array.from(document.querySelectorAll("table.atlas-table"))) {
        const ths = Array.from((table as HTMLTableElement).tHead!.rows[0]!.cells);
        const s = ths.findIndex((th) => th.hasAttribute("data-switchable"));
        const gi = ths.findIndex((th) => !th.hasAttribute("data-switchable") && th.textContent!.includes("(GHz/T)"));
        if (s < 0 || gi < 0) continue;
        for (const tr of Array.from((table as HTMLTableElement).tBodies[0]!.rows)) {
          if (tr.cells[s]!.innerHTML !== tr.cells[gi]!.innerHTML) bad.push(`${tr.id}: ${tr.cells[s]!.innerHTML} ≠ ${tr.cells[gi]!.innerHTML}`);
        }
      }
      return bad;
    });
    expect(mismatches).toEqual([]);
    await page.close();
  });

  it("remembers the choice on other pages and after a reload", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    await page.selectOption("#unit-choice", "GHz/T");
    await page.goto(server.url + "species/cs133/");
    expect(await page.inputValue("#unit-choice")).toBe("GHz/T");
    // The first row of a level's mJ table (shift in MHz/G, switchable, beside the fixed GHz/T column).
    const row = await page.evaluate(() => document.querySelector('table[id^="table-mj:"]')!.querySelector("tbody tr")!.id);
    const c = await cells(page, row);
    expect([c.header, c.switchable]).toEqual(["(GHz/T)", c.GHzT]);
    await page.reload();
    expect(await page.inputValue("#unit-choice")).toBe("GHz/T");
    await page.selectOption("#unit-choice", "MHz/G");
    await page.close();
  });
});
