/**
 * The field calculator in Debian Chromium, on the demo build: the form fed
 * from the address (#B=4.7G) shows the numbers of SublevelAtlas.at (same
 * page) and of `npm run at` (the exact path) to 1e-9 relative or 1 Hz;
 * SublevelAtlas.at at a configured field gives the JSON export's entries;
 * restriction to one level or line; errors; file://. Prints the time of
 * SublevelAtlas.at for cs133 and k40 (no timed assertion).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { AxeBuilder } from "@axe-core/playwright";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { AtResult } from "../../src/engine/types.js";
import { CHROMIUM, hasChromium, watchPage, closeDemo, openDemo, type StaticServer } from "../support/browser.js";
import { runAt } from "../support/runAt.js";
import { close, expectAgrees } from "../engine/compare.js";
import { exportAt } from "../engine/exportAt.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

/** The page's global, as src/browser/calculator.ts defines it. */
type CalcWindow = { SublevelAtlas: { at(id: string, field: string | number): AtResult<number>; atWithUncertainty(id: string, field: string | number): AtResult<number>; species(): string[] } };

/** Wait until the calculator has said something, and return what. */
async function statusOf(page: Page, previous = ""): Promise<string> {
  await page.waitForFunction((p) => {
    const t = document.querySelector(".calc-status")?.textContent ?? "";
    return t !== "" && t !== p;
  }, previous);
  return (await page.textContent(".calc-status")) ?? "";
}

/** Energies shown in the calculator's tables: per table caption, the full values (data-value, Hz) and the shown MHz text. */
function shownEnergies(page: Page): Promise<{ caption: string; values: number[]; texts: string[] }[]> {
  return page.evaluate(() =>
    Array.from(document.querySelectorAll<HTMLTableElement>(".calc-results table.calc-energies")).map((t) => ({
      caption: t.caption?.textContent ?? "",
      values: Array.from(t.querySelectorAll<HTMLTableCellElement>("tbody td.k-number")).map((td) => Number(td.dataset.value)),
      texts: Array.from(t.querySelectorAll<HTMLTableCellElement>("tbody td.k-number")).map((td) => td.textContent ?? ""),
    })),
  );
}

/** "−4 268.380 266 696 62(56)" → −4268.38026669662 (the page's thin spaces and minus sign; the concise uncertainty left out). */
const shownNumber = (text: string) => Number(text.replace(/\(\d+\)$/, "").replace(/\u2212/g, "-").replace(/[\u2009\u2007\u2008\s]/g, ""));
/** One unit of the last digit a shown number (in MHz) writes, in Hz: a concise value is rounded there. */
const lastDigitHz = (text: string) => 1e6 * 10 ** -(/\.([\d\u2009]*)/.exec(text.replace(/\(\d+\)$/, ""))?.[1]!.replace(/\u2009/g, "").length ?? 0);

describe.skipIf(!hasChromium)("field calculator in the browser", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  it("opens at #B=4.7G with the numbers of SublevelAtlas.at and of npm run at", async () => {
    const page = await ctx.newPage();
    const problems = watchPage(page, [server.url, "data:"]);
    await page.goto(server.url + "species/rb87/#B=4.7G");
    const status = await statusOf(page);
    expect(status).toMatch(/^Computed at 4\.7 G \(0\.00047 T\)/);
    expect(await page.inputValue("#calc-field")).toBe("4.7");
    expect(await page.inputValue("#calc-unit")).toBe("G");
    expect(await page.locator("#calculator").isVisible()).toBe(true);

    const inPage = await page.evaluate(() => (window as unknown as CalcWindow).SublevelAtlas.at("rb87", "4.7 G"));
    const shown = await shownEnergies(page);
    // captions as the tables at the bias fields write them: level id, typeset term, what and where
    expect(shown.map((t) => t.caption)).toEqual(["5s-S1/2 ²S₁/₂", "5p-P1/2 ²P°₁/₂", "5p-P3/2 ²P°₃/₂"].map((c) => `${c}: sublevel energies at 4.7 G, from the level centre`));
    const cli = await runAt(["rb87", "4.7 G"]);
    expect(cli.code).toBe(0);
    const exact = JSON.parse(cli.stdout) as AtResult<string>;
    inPage.levels.forEach((l, i) => {
      l.states.forEach((s, k) => {
        const value = shown[i]!.values[k]!;
        const what = `${l.id} F=${s.F} mF=${s.mF}`;
        // the table holds the engine's number; it agrees with the exact path (npm run at)
        expect(close(value, s.E_Hz, 1), what).toBe(true);
        expect(close(value, Number(exact.levels[i]!.states[k]!.E_Hz), 1), `${what} vs npm run at`).toBe(true);
        // and its shown text (MHz, 12 significant digits) is the same number
        // (to half its last digit when the concise form rounds it to its uncertainty's place)
        expect(Math.abs(shownNumber(shown[i]!.texts[k]!) * 1e6 - value), `${what} shown`).toBeLessThan(Math.max(1e-9 * Math.abs(value), 1, 0.5 * lastDigitHz(shown[i]!.texts[k]!) * 1.000001));
      });
    });
    expectAgrees(inPage, exact, "rb87 at 4.7 G in the page");
    // every kind of table is there: energies per level, transitions of the hyperfine levels, components per line
    const counts = await page.evaluate(() => ["calc-energies", "calc-transitions", "calc-components"].map((c) => document.querySelectorAll(`.calc-results table.${c}`).length));
    expect(counts).toEqual([3, 3, 2]);
    expect(problems).toEqual([]);
  });

  it("shows each number's standard uncertainty as a concise (12), which the Show uncertainties switch hides", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/#B=4.7G");
    await statusOf(page);
    // "(56)" is u in units of the value's last digit (MHz column; u in Hz in data-u)
    const cells = await page.evaluate(() =>
      Array.from(document.querySelectorAll<HTMLTableCellElement>(".calc-results table.calc-energies tbody td.k-number")).map((td) => ({
        text: td.textContent ?? "",
        unc: td.querySelector(".unc")?.textContent ?? null,
        u: Number(td.dataset.u),
      })),
    );
    expect(cells.length).toBeGreaterThan(0);
    for (const c of cells) {
      expect(c.unc, c.text).toMatch(/^\(\d{1,2}\)$/);
      expect(c.text.endsWith(c.unc!)).toBe(true);
      const units = Number(c.unc!.slice(1, -1));
      expect(Math.abs(units * lastDigitHz(c.text) - c.u), c.text).toBeLessThanOrEqual(0.5 * lastDigitHz(c.text) * 1.000001);
    }
    // every kind of table carries them: transitions and line components too
    for (const cls of ["calc-transitions", "calc-components"]) expect(await page.locator(`.calc-results table.${cls} td.k-number .unc`).count(), cls).toBeGreaterThan(0);
    const first = page.locator(".calc-results table.calc-energies td.k-number .unc").first();
    await page.check("#unc-choice");
    expect(await first.isVisible()).toBe(true);
    await page.uncheck("#unc-choice");
    expect(await first.isVisible()).toBe(false);
    // a new answer (another field) is written hidden too
    await page.fill("#calc-field", "12");
    const before = await page.textContent(".calc-status");
    await page.click(".calc-form button[type=submit]");
    await statusOf(page, before ?? "");
    expect(await page.locator(".calc-results td.k-number .unc").first().isVisible()).toBe(false);
    await page.check("#unc-choice");
    expect(await page.locator(".calc-results td.k-number .unc").first().isVisible()).toBe(true);
  });

  it("gives the JSON export's entries at a configured field", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/");
    await page.waitForFunction(() => !!(window as unknown as CalcWindow).SublevelAtlas);
    const exp = JSON.parse(readFileSync(join(site, "export", "rb87.json"), "utf8")) as { levels: { field_table: { B_T: string; B_text: string }[] }[]; lines: unknown[] };
    const fields = exp.levels[0]!.field_table.map((f) => f.B_text);
    expect(fields.length).toBeGreaterThan(3);
    for (const [i, text] of fields.entries()) {
      const answer = await page.evaluate((t) => (window as unknown as CalcWindow).SublevelAtlas.at("rb87", t), text);
      expect(answer.B_T).toBe(Number(exp.levels[0]!.field_table[i]!.B_T));
      expectAgrees(answer, exportAt(exp, i), `rb87 at ${text} (export)`);
    }
  });

  it("follows the address: #B=0.47mT is the same field, and the form writes the address", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/#B=4.7G");
    const first = await statusOf(page);
    const before = await shownEnergies(page);
    await page.evaluate(() => (location.hash = "#B=0.47mT"));
    const second = await statusOf(page, first);
    expect(second).toMatch(/^Computed at 0\.47 mT \(0\.00047 T\)/);
    expect([await page.inputValue("#calc-field"), await page.inputValue("#calc-unit")]).toEqual(["0.47", "mT"]);
    expect((await shownEnergies(page)).map((t) => t.values)).toEqual(before.map((t) => t.values));

    await page.fill("#calc-field", "12.5");
    await page.selectOption("#calc-unit", "mG");
    await page.click(".calc-form button");
    const third = await statusOf(page, second);
    expect(third).toMatch(/^Computed at 12\.5 mG \(0\.00000125 T\)/);
    expect(new URL(page.url()).hash).toBe("#B=12.5mG");
  });

  it("shows one level or one line on their own pages", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/level/5s-S1_2/#B=4.7G");
    await statusOf(page);
    const kinds = () => page.evaluate(() => ["calc-energies", "calc-transitions", "calc-components"].map((c) => document.querySelectorAll(`.calc-results table.${c}`).length));
    expect(await kinds()).toEqual([1, 1, 0]);
    await page.goto(server.url + "species/rb87/line/D2/#B=4.7G");
    await statusOf(page);
    expect(await kinds()).toEqual([0, 0, 1]);
    const caption = await page.textContent(".calc-results table.calc-components caption");
    expect(caption).toBe("D2 at 4.7 G: components (term hyperfine–Zeeman eigenstates)");
  });

  it("says what is wrong with a field, and what is missing", async () => {
    const page = await ctx.newPage();
    await page.goto(server.url + "species/rb87/#B=4.7Hz");
    expect(await statusOf(page)).toMatch(/^Cannot compute: .*frequency unit/);
    expect(await page.getAttribute("#calc-field", "aria-invalid")).toBe("true");
    expect(await page.locator(".calc-results table").count()).toBe(0);
    const missing = await page.evaluate(() => {
      try {
        (window as unknown as CalcWindow).SublevelAtlas.at("cs133", "1 G");
        return "no error";
      } catch (e) {
        return (e as Error).message;
      }
    });
    expect(missing).toMatch(/no field-calculator data for species "cs133" on this page \(loaded: rb87\)/);
    expect(await page.evaluate(() => (window as unknown as CalcWindow).SublevelAtlas.species())).toEqual(["rb87"]);
  });

  it("has no serious or critical accessibility violations with results and with an error showing", async () => {
    const page = await ctx.newPage();
    for (const hash of ["#B=4.7G", "#B=4.7Hz"]) {
      await page.goto(server.url + "species/rb87/line/D2/" + hash);
      await statusOf(page);
      const result = await new AxeBuilder({ page }).include("#calculator").analyze();
      const bad = result.violations
        .filter((v) => v.impact === "serious" || v.impact === "critical")
        .map((v) => `${v.id} (${v.impact}): ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join(", ")}`);
      expect(bad, hash).toEqual([]);
    }
  }, 120_000);

  it("works from file:// with no network", async () => {
    const page = await ctx.newPage();
    const base = pathToFileURL(site).href;
    const problems = watchPage(page, [base, "data:"]);
    await page.goto(pathToFileURL(join(site, "species", "k40", "index.html")).href + "#B=0.37T");
    expect(await statusOf(page)).toMatch(/^Computed at 0\.37 T/);
    expect(problems).toEqual([]);
  });

  it("answers for cs133 and k40 (times printed, not asserted)", async () => {
    const page = await ctx.newPage();
    const lines: string[] = [];
    for (const id of ["cs133", "k40"]) {
      await page.goto(`${server.url}species/${id}/`);
      await page.waitForFunction(() => !!(window as unknown as CalcWindow).SublevelAtlas);
      const t = await page.evaluate((id) => {
        const data = (window as unknown as { SublevelAtlasData: Record<string, unknown> }).SublevelAtlasData;
        // a fresh copy: its first answer includes the preparation (the page may have prepared the original already)
        data[`${id}-fresh`] = JSON.parse(JSON.stringify(data[id]));
        let t0 = performance.now();
        (window as unknown as CalcWindow).SublevelAtlas.at(`${id}-fresh`, "4.7 G");
        const first = performance.now() - t0;
        const times: number[] = [];
        for (const f of ["4.7 G", "0.37 T", "37 mG", "2.2 mT", "3 T", "12 G", "0.05 T", "1 G", "250 G", "7 kG", "0.9 T"]) {
          t0 = performance.now();
          (window as unknown as CalcWindow).SublevelAtlas.at(id, f);
          times.push(performance.now() - t0);
        }
        times.sort((a, b) => a - b);
        // with uncertainties (one pair of solves per uncertain input), first answer on another fresh copy
        data[`${id}-fresh-u`] = JSON.parse(JSON.stringify(data[id]));
        t0 = performance.now();
        (window as unknown as CalcWindow).SublevelAtlas.atWithUncertainty(`${id}-fresh-u`, "4.7 G");
        const firstU = performance.now() - t0;
        const timesU: number[] = [];
        for (const f of ["4.7 G", "0.37 T", "37 mG", "2.2 mT", "3 T", "12 G", "0.05 T", "1 G", "250 G", "7 kG", "0.9 T"]) {
          t0 = performance.now();
          (window as unknown as CalcWindow).SublevelAtlas.atWithUncertainty(`${id}-fresh-u`, f);
          timesU.push(performance.now() - t0);
        }
        timesU.sort((a, b) => a - b);
        return { first, median: times[Math.floor(times.length / 2)]!, max: times[times.length - 1]!, firstU, medianU: timesU[5]!, maxU: timesU[10]! };
      }, id);
      // the form on a freshly opened page: preparation, compiling, computing and writing every table
      await page.goto(`${server.url}species/${id}/#B=4.7G`);
      const form = /in (under 1|\d+) ms/.exec(await statusOf(page))?.[1];
      lines.push(`${id}: first answer ${t.first.toFixed(1)} ms (with preparation), then median ${t.median.toFixed(1)} ms, slowest ${t.max.toFixed(1)} ms; with uncertainties first ${t.firstU.toFixed(0)} ms, then median ${t.medianU.toFixed(1)} ms, slowest ${t.maxU.toFixed(1)} ms; the form on a fresh page ${form} ms`);
      expect(t.median).toBeGreaterThanOrEqual(0);
    }
    console.log(`SublevelAtlas.at in Chromium:\n  ${lines.join("\n  ")}`);
  });
});
