/**
 * The θ control of a line page ("What the observer sees") in Debian
 * Chromium, on the demo build: the stick heights it draws at any angle are
 * strength × F(θ) over the strongest component's strength, with F the
 * textbook dipole and quadrupole angular factors; without JavaScript and on
 * paper the two pre-rendered views (θ = 0 and 90°) show instead.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OBS_Y0, OBS_Y1 } from "../../src/site/plots/observerGeometry.js";
import { CHROMIUM, hasChromium, watchPage, closeDemo, openDemo, type StaticServer } from "../support/browser.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

const rad = (d: number) => (d * Math.PI) / 180;
/** Textbook angular factors (Jackson §9.8; Blatt and Weisskopf ch. XII): E1/M1 and E2 by |Δm|. */
function textbookF(k: number, q: number, deg: number): number {
  const c = Math.cos(rad(deg));
  const s = Math.sin(rad(deg));
  if (k === 1) return q === 0 ? s * s : (1 + c * c) / 2;
  const a = Math.abs(q);
  return a === 0 ? 3 * s * s * c * c : a === 1 ? (c * c + Math.cos(rad(2 * deg)) ** 2) / 2 : (1 - c ** 4) / 2;
}

/** Δm, strength and the drawn height (from the stick's pixel top) of every stick of the selected plot. */
function sticks(page: Page, selector: string): Promise<{ q: number; s: number; h: number }[]> {
  return page.evaluate(
    ([sel, y0, y1]) =>
      Array.from(document.querySelectorAll(`${sel} g.obs-stick`)).map((g) => ({
        q: Number(g.getAttribute("data-q")),
        s: Number(g.getAttribute("data-strength")),
        h: (y0 - Number(g.querySelector("line")!.getAttribute("y2"))) / (y0 - y1),
      })),
    [selector, OBS_Y0, OBS_Y1] as const,
  );
}

function expectHeights(list: { q: number; s: number; h: number }[], k: number, deg: number): void {
  const top = Math.max(...list.map((x) => x.s));
  for (const x of list) expect(x.h, `Δm = ${x.q} at ${deg}°`).toBeCloseTo((x.s / top) * textbookF(k, x.q, deg), 3);
}

describe.skipIf(!hasChromium)("the θ control of a line page", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  it("serves the longitudinal and transverse views pre-drawn, with the control hidden, for readers without JavaScript", () => {
    const html = readFileSync(join(site, "species/rb87/line/D2/index.html"), "utf8");
    const section = html.slice(html.indexOf('data-observer'), html.indexOf("</section>", html.indexOf("data-observer")));
    expect(section).toContain('<div class="theta-control" hidden>');
    expect(section).toContain('class="plot obs-along"');
    expect(section).toContain('class="plot obs-across"');
    // Rb D2 strengths (Condon and Shortley ch. XVI): σ 1/4 and 1/12, π 1/6
    const along = [...section.slice(section.indexOf("obs-along")).matchAll(/data-q="(-?\d)" data-strength="([\d.e-]+)"[^>]*><line [^>]*y2="([\d.]+)"/g)].slice(0, 6);
    expect(along).toHaveLength(6);
    for (const [, q, s, y2] of along) {
      const h = (OBS_Y0 - Number(y2)) / (OBS_Y0 - OBS_Y1);
      expect(h).toBeCloseTo((Number(s) / 0.25) * textbookF(1, Number(q), 0), 3);
    }
  });

  it("draws Rb D2 at 90° on load and redraws it at 0°, at a typed 37° and from the slider at 120°", async () => {
    const page = await ctx.newPage();
    const problems = watchPage(page, [server.url]);
    try {
      await page.goto(server.url + "species/rb87/line/D2/index.html", { waitUntil: "load" });
      const control = page.locator("section[data-observer] .theta-control");
      await expect(control.isVisible()).resolves.toBe(true);
      await expect(page.locator("section[data-observer] .obs-views").isVisible()).resolves.toBe(false);
      expectHeights(await sticks(page, ".obs-live"), 1, 90);
      await control.getByRole("button", { name: /^0°/ }).click();
      const at0 = await sticks(page, ".obs-live");
      expectHeights(at0, 1, 0);
      expect(at0.filter((x) => x.q === 0).every((x) => Math.abs(x.h) < 1e-9)).toBe(true); // textbook: no π along the field
      await control.locator("input.theta-number").fill("37");
      expectHeights(await sticks(page, ".obs-live"), 1, 37);
      await expect(page.locator(".obs-live text.obs-theta").textContent()).resolves.toBe("θ = 37°");
      await control.locator("input.theta-range").fill("120");
      expectHeights(await sticks(page, ".obs-live"), 1, 120);
      await expect(control.locator("input.theta-number").inputValue()).resolves.toBe("120");
      expect(problems).toEqual([]);
    } finally {
      await page.close();
    }
  });

  it("uses the quadrupole factors for the 40Ca+ 729 nm E2 line", async () => {
    const page = await ctx.newPage();
    try {
      await page.goto(server.url + "species/ca40-ion/line/729/index.html", { waitUntil: "load" });
      await page.locator("section[data-observer] input.theta-number").fill("30");
      const list = await sticks(page, ".obs-live");
      expect(new Set(list.map((x) => Math.abs(x.q)))).toEqual(new Set([0, 1, 2]));
      expectHeights(list, 2, 30);
    } finally {
      await page.close();
    }
  });

  it("prints both pre-drawn views and not the control", async () => {
    const page = await ctx.newPage();
    try {
      await page.goto(server.url + "species/fe56/line/630.25/index.html", { waitUntil: "load" });
      await page.emulateMedia({ media: "print" });
      await expect(page.locator("section[data-observer] .theta-control").isVisible()).resolves.toBe(false);
      await expect(page.locator("section[data-observer] .obs-along").isVisible()).resolves.toBe(true);
      await expect(page.locator("section[data-observer] .obs-across").isVisible()).resolves.toBe(true);
    } finally {
      await page.close();
    }
  });
});
