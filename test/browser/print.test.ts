/**
 * Bench sheets print on one page of A4 and of US Letter, each; rendered by
 * Debian Chromium to PDF and counted with pdfinfo (poppler-utils).
 */
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { hasChromium, launchBrowser, serveStatic, type StaticServer } from "../support/browser.js";
import { ROOT, demoSite, tempDir } from "../support/runBuild.js";

const hasPdfinfo = existsSync("/usr/bin/pdfinfo");
const ready = hasChromium && hasPdfinfo;
if (!hasChromium) console.warn("print tests skipped: no Chromium at /usr/bin/chromium (install the Debian package chromium)");
if (!hasPdfinfo) console.warn("print tests skipped: no pdfinfo (install the Debian package poppler-utils)");

/** Page count of a PDF file, from pdfinfo's "Pages:" line. */
function pdfPages(file: string): number {
  const info = execFileSync("pdfinfo", [file], { encoding: "utf8" });
  const m = /^Pages:\s+(\d+)/m.exec(info);
  if (!m) throw new Error(`pdfinfo gave no page count for ${file}:\n${info}`);
  return Number(m[1]);
}

let site: string;
let server: StaticServer;
let browser: BrowserContext;
const out = tempDir("atlas-pdf-");

beforeAll(async () => {
  if (!ready) return;
  site = await demoSite();
  server = await serveStatic(site);
  browser = await launchBrowser();
}, 600_000);

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function printPages(path: string, format: "A4" | "Letter"): Promise<number> {
  const page = await browser.newPage();
  try {
    await page.goto(server.url + path, { waitUntil: "load" });
    await page.emulateMedia({ media: "print" });
    const file = join(out, `${path.replace(/[^a-z0-9]+/gi, "_")}-${format}.pdf`);
    writeFileSync(file, await page.pdf({ format, printBackground: false }));
    return pdfPages(file);
  } finally {
    await page.close();
  }
}

const demoSpecies = readdirSync(join(ROOT, "data", "species"))
  .filter((f) => f.endsWith(".yaml"))
  .map((f) => f.replace(/\.yaml$/, ""));

describe.skipIf(!ready)("bench sheets on paper", () => {
  it("has a sheet for every demo species", () => {
    expect(demoSpecies.length).toBeGreaterThanOrEqual(9);
    for (const id of demoSpecies) expect(existsSync(join(site, "species", id, "sheet", "index.html")), id).toBe(true);
  });

  for (const format of ["A4", "Letter"] as const) {
    it(`prints every species sheet on exactly one ${format} page`, async () => {
      for (const id of demoSpecies) expect(await printPages(`species/${id}/sheet/`, format), `${id} on ${format}`).toBe(1);
    }, 300_000);

    it(`prints the all-species sheet on exactly one ${format} page`, async () => {
      expect(await printPages("sheet/", format)).toBe(1);
    }, 120_000);
  }

  it("fills most of the page with a species sheet: what a bench needs, not a third of a page", async () => {
    // a context's newPage takes no options: the A4 viewport is set on the page itself
    const page = await browser.newPage();
    try {
      await page.setViewportSize({ width: 794, height: 1123 });
      // A4 at 96 px/inch is 794 × 1123 px (common practice: 210 × 297 mm); Chromium's default print margins are about 0.4 inch.
      await page.goto(server.url + "species/rb87/sheet/", { waitUntil: "load" });
      await page.emulateMedia({ media: "print" });
      const h = await page.evaluate(() => document.querySelector(".sheet")!.getBoundingClientRect().height);
      expect(h / (1123 - 2 * 38)).toBeGreaterThan(0.6);
      const text = await page.evaluate(() => document.querySelector(".sheet")!.textContent ?? "");
      // 87Rb (data/species/rb87.yaml): hyperfine splittings, the clock transition's field-insensitive point at 0 G, where linear shifts stop holding.
      for (const words of ["Zero-field hyperfine splittings", "Field-insensitive transitions", "Linear shifts within 1 %", "components: shift in Lorentz units"]) expect(text).toContain(words);
    } finally {
      await page.close();
    }
  });

  it("hides navigation, search, row links and downloads in print", async () => {
    const page = await browser.newPage();
    try {
      await page.goto(server.url + "species/rb87/", { waitUntil: "load" });
      await page.emulateMedia({ media: "print" });
      const shown = await page.evaluate(() =>
        [".masthead nav", ".finder", ".row-link", ".download", ".k-link"].map((sel) => {
          const els = [...document.querySelectorAll(sel)];
          return { sel, count: els.length, visible: els.filter((e) => getComputedStyle(e).display !== "none").length };
        }),
      );
      for (const s of shown) expect(s.visible, s.sel).toBe(0);
      expect(shown.find((s) => s.sel === ".row-link")!.count).toBeGreaterThan(10);
    } finally {
      await page.close();
    }
  });
});

// Keep the PDFs next to the screenshots for a look by eye (test-artifacts/ is not committed).
afterAll(() => {
  if (!ready) return;
  const dir = join(ROOT, "test-artifacts");
  mkdirSync(dir, { recursive: true });
  for (const f of readdirSync(out)) if (f.startsWith("sheet_") || f.startsWith("species_rb87")) execFileSync("cp", [join(out, f), join(dir, f)]);
});
