/**
 * The per-page "Show uncertainties" switch (src/browser/uncertaintySwitch.ts)
 * in Chromium on the demo: it hides and shows the concise "(12)" parts,
 * remembers the choice for the page on reload, and the unit switch converts
 * an uncertainty together with its value.
 */
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { CHROMIUM, hasChromium, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

/** A concise number as shown ("0.499 836 43(50)", "−1.3(12)×10⁻⁵") read back into its value and standard uncertainty. */
function readConcise(text: string): { value: Dec; u: Dec } {
  const SUP: Record<string, string> = { "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9", "⁻": "-" };
  const m = /^(−?)(\d+)(?:\.(\d+))?\((\d+)\)(?:×10([⁻⁰-⁹¹²³]+))?$/.exec(text.replace(/[\u2009\s]/g, ""));
  if (!m) throw new Error(`not a concise number: ${text}`);
  const [, sign, int, frac = "", unc, exp] = m;
  const e = exp ? Number([...exp].map((c) => SUP[c]).join("")) : 0;
  const place = new Dec(10).pow(e - frac.length);
  const value = new Dec(`${sign ? "-" : ""}${int}.${frac || "0"}`).mul(new Dec(10).pow(e));
  return { value, u: new Dec(unc!).mul(place) };
}

describe.skipIf(!hasChromium)("the Show uncertainties switch", () => {
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  /** The gF cell of 87Rb 5²S1/2 F = 2 in the at-a-glance table: its text, its "(12)" part, whether that shows, and the cell's width. */
  function gF2(page: Page) {
    return page.evaluate(() => {
      const tr = document.getElementById("glance:level:5s-S1/2:F=2") as HTMLTableRowElement;
      const ths = Array.from(tr.closest("table")!.tHead!.rows[0]!.cells);
      const td = tr.cells[ths.findIndex((th) => th.textContent!.includes("gJ or gF"))]!;
      const unc = td.querySelector(".unc");
      return {
        text: td.textContent!.trim(),
        unc: unc?.textContent ?? null,
        visible: unc ? getComputedStyle(unc).visibility === "visible" : false,
        width: td.querySelector(".n")!.getBoundingClientRect().width,
        hiddenClass: document.documentElement.classList.contains("hide-unc"),
        checked: (document.getElementById("unc-choice") as HTMLInputElement | null)?.checked ?? null,
      };
    });
  }

  it("shows gF of 87Rb 5²S1/2 F = 2 with a concise uncertainty, hides it when unticked and keeps the column's width", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    const shown = await gF2(page);
    expect(shown.checked).toBe(true);
    expect(shown.visible).toBe(true);
    // gF = gJ/4 + 3gI/4 = 0.499 836 426 45, u = 5.000 56e-8 (Steck, "Rubidium 87 D Line Data", eq. 22, with the demo's
    // gJ = 2.002 331 13(20), gI = −0.000 995 141 4(10); hand arithmetic): two significant digits, (50) at 10⁻⁹ (GUM §7.2.6)
    expect(shown.unc).toBe("(50)");
    const { value, u } = readConcise(shown.text);
    expect(value.toString()).toBe("0.499836426");
    expect(u.eq("5e-8")).toBe(true);
    await page.uncheck("#unc-choice");
    const hidden = await gF2(page);
    expect([hidden.hiddenClass, hidden.visible]).toEqual([true, false]);
    // hidden, not removed: the digits stay lined up on their decimal points
    expect(hidden.width).toBeCloseTo(shown.width, 3);
    await page.check("#unc-choice");
    expect((await gF2(page)).visible).toBe(true);
    await page.close();
  });

  it("remembers the choice for the page on reload, and only for that page", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    await page.uncheck("#unc-choice");
    await page.reload();
    const after = await gF2(page);
    expect([after.checked, after.hiddenClass, after.visible]).toEqual([false, true, false]);
    // another page keeps its own choice (the key is the page's path)
    await page.goto(server.url + "species/cs133/");
    expect(await page.isChecked("#unc-choice")).toBe(true);
    expect(await page.evaluate(() => document.documentElement.classList.contains("hide-unc"))).toBe(false);
    await page.goto(server.url + "species/rb87/");
    expect(await page.isChecked("#unc-choice")).toBe(false);
    await page.check("#unc-choice");
    await page.reload();
    expect((await gF2(page)).visible).toBe(true);
    await page.close();
  });

  it("hides an uncertainty inside a sentence without leaving a gap (G on the 87Rb D2 line page)", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/line/D2/");
    const g = () =>
      page.evaluate(() => {
        const p = Array.from(document.querySelectorAll(".observer p")).find((x) => x.textContent!.includes("Landé factor G ="))!;
        const unc = p.querySelector(".unc-prose");
        return { text: /G = ([^ ]+) from/.exec(p.textContent!.replace(/\u2009/g, ""))?.[1] ?? null, shown: unc ? unc.getClientRects().length > 0 : null };
      });
    const before = await g();
    // G = 1.340 39 of D2 (Na D2-like: G = 4/3 in LS; textbook), its u from the demo's gJ of 5²P3/2, 1.3362(13) (Steck)
    expect(before.shown).toBe(true);
    expect(readConcise(before.text!).value.toNumber()).toBeCloseTo(1.3404, 3);
    await page.uncheck("#unc-choice");
    expect((await g()).shown).toBe(false);
    await page.check("#unc-choice");
    await page.close();
  });

  it("converts the uncertainty of a shift with its value when the unit changes", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    const row = "level:5s-S1/2:F=2:mF=2";
    const cell = () =>
      page.evaluate((id) => {
        const tr = document.getElementById(id) as HTMLTableRowElement;
        const ths = Array.from(tr.closest("table")!.tHead!.rows[0]!.cells);
        return tr.cells[ths.findIndex((th) => th.hasAttribute("data-switchable"))]!.textContent!.trim();
      }, row);
    const mhzG = readConcise(await cell());
    // 1 G = 1e-4 T and 1 GHz = 1e3 MHz (common practice): x MHz/G = 10·x GHz/T, the uncertainty too
    await page.selectOption("#unit-choice", "GHz/T");
    const ghzT = readConcise(await cell());
    expect(ghzT.value.div(mhzG.value).toNumber()).toBeCloseTo(10, 6);
    expect(ghzT.u.eq(mhzG.u.mul(10))).toBe(true);
    // x MHz/G = 10⁶·x Hz/G
    await page.selectOption("#unit-choice", "Hz/G");
    const hzG = readConcise(await cell());
    expect(hzG.u.eq(mhzG.u.mul("1e6"))).toBe(true);
    // the shift of mF = 2 is 2·gF·μB/h = 2 · 0.499 836 426 · 1.399 624 49 = 1.399 166 6 MHz/G (μB/h: CODATA 2022; hand), and its u is
    // 2·√((μB/h·u(gF))² + (gF·u(μB/h))²) = 2·(1.399 624 9 MHz/G · 5.000 56e-8) = 1.4e-7 MHz/G to two digits (hand)
    expect(Math.abs(mhzG.value.toNumber() - 1.3991666)).toBeLessThan(1e-7);
    expect(mhzG.u.eq("1.4e-7")).toBe(true);
    await page.selectOption("#unit-choice", "MHz/G");
    expect(readConcise(await cell()).u.eq(mhzG.u)).toBe(true);
    await page.close();
  });
});
