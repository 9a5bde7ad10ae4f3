/**
 * Every free-text field of the data is shown as text, never run as markup:
 * a copy of the demo data with a script payload in each text field (species
 * label and notes, nucleus source, level config, source and notes, line
 * source and notes, site title and lab) is built with the real build
 * command; the HTML must hold the escaped text, and every page loaded in
 * Chromium must neither run the payload nor open a dialog.
 */
import { cpSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import type { BrowserContext } from "playwright-core";
import { parseDocument } from "yaml";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHROMIUM, hasChromium, launchBrowser, serveStatic, type StaticServer } from "../support/browser.js";
import { DEMO_DATA, runBuild, tempDir } from "../support/runBuild.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM} (install Debian's chromium package or set CHROMIUM_PATH)`);

/** The payload for field `tag`: closes attributes and tags, opens script, event-handler and javascript: vectors, and a template expression. */
const payload = (tag: string): string =>
  `${tag}<script>window.__pwned=1</script>"><img src=x onerror=window.__pwned=1>'><svg onload=window.__pwned=1>javascript:window.__pwned=1 {{ 7*7 }} ${tag}`;
/** What HTML escaping leaves of the `<script>` part, whichever quote escapes are used. */
const escapedScript = "&lt;script&gt;window.__pwned=1&lt;/script&gt;";

const parent = tempDir("atlas-xss-");
const data = join(parent, "data");
const out = join(parent, "_site");
/** Tag → the field it was put in. */
const fields = new Map<string, string>();

function poison(): void {
  cpSync(DEMO_DATA, data, { recursive: true });
  let n = 0;
  const put = (doc: ReturnType<typeof parseDocument>, path: (string | number)[], what: string): void => {
    const tag = `XSSFIELD${++n}X`;
    fields.set(tag, what);
    doc.setIn(path, payload(tag));
  };
  const site = parseDocument(readFileSync(join(data, "site.yaml"), "utf8"));
  put(site, ["title"], "site title");
  put(site, ["lab"], "site lab");
  writeFileSync(join(data, "site.yaml"), site.toString());
  for (const name of readdirSync(join(data, "species")).filter((f) => f.endsWith(".yaml"))) {
    const file = join(data, "species", name);
    const doc = parseDocument(readFileSync(file, "utf8"));
    const sp = doc.toJS() as { nucleus?: object; levels: object[]; lines?: object[] };
    put(doc, ["label"], `${name} label`);
    put(doc, ["notes"], `${name} notes`);
    if (sp.nucleus) put(doc, ["nucleus", "source"], `${name} nucleus source`);
    sp.levels.forEach((_, i) => {
      put(doc, ["levels", i, "config"], `${name} level ${i} config`);
      put(doc, ["levels", i, "source"], `${name} level ${i} source`);
      put(doc, ["levels", i, "notes"], `${name} level ${i} notes`);
    });
    (sp.lines ?? []).forEach((_, i) => {
      put(doc, ["lines", i, "source"], `${name} line ${i} source`);
      put(doc, ["lines", i, "notes"], `${name} line ${i} notes`);
    });
    writeFileSync(file, doc.toString());
  }
}

function htmlPages(root: string): string[] {
  const outList: string[] = [];
  const walk = (dir: string): void => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name.endsWith(".html")) outList.push(relative(root, p).split(sep).join("/"));
    }
  };
  walk(root);
  return outList.sort();
}

let pages: string[] = [];
let html = new Map<string, string>();

beforeAll(async () => {
  poison();
  const r = await runBuild({ data, out });
  expect(r.code, r.stderr).toBe(0);
  pages = htmlPages(out);
  html = new Map(pages.map((p) => [p, readFileSync(join(out, p), "utf8")]));
}, 600_000);

afterAll(() => rmSync(parent, { recursive: true, force: true }));

describe("a site built from data full of markup", () => {
  it("shows each poisoned field it shows as escaped text, never raw", () => {
    const all = [...html.values()].join("\n");
    const shown = new Set<string>();
    for (const [tag, what] of fields) {
      // Right after the field's own tag comes its markup: escaped wherever it appears, raw nowhere.
      if (all.includes(`${tag}${escapedScript}`)) shown.add(what);
      expect(all.includes(`${tag}<script`), `${what} appears unescaped`).toBe(false);
    }
    expect(fields.size).toBeGreaterThan(50);
    // The fields every page set shows today (others may be shown later; they are covered by the line above).
    for (const what of ["site title", "site lab", "rb87.yaml label", "rb87.yaml notes", "rb87.yaml level 0 config", "rb87.yaml level 0 source", "fe56.yaml level 3 config"]) {
      expect(shown.has(what), `${what} is shown`).toBe(true);
    }
  });

  it("has no live payload markup on any page", () => {
    for (const [page, text] of html) {
      expect(text, page).not.toContain("<script>window.__pwned");
      expect(text, page).not.toMatch(/<img[^>]*onerror=window/i);
      expect(text, page).not.toMatch(/<svg[^>]*onload=window/i);
      expect(text, page).not.toMatch(/(href|src|action)\s*=\s*["']?\s*javascript:/i);
      expect(text, page).not.toMatch(/XSSFIELD\d+X[^\n]*?\b49\b/); // {{ 7*7 }} was not evaluated
    }
  });

  it.skipIf(!hasChromium)("runs no payload and opens no dialog on any page in Chromium", async () => {
    let ctx: BrowserContext | null = null;
    let server: StaticServer | null = null;
    try {
      ctx = await launchBrowser();
      server = await serveStatic(out, "/");
      const dialogs: string[] = [];
      const checked: string[] = [];
      for (const p of pages) {
        const page = await ctx.newPage();
        page.on("dialog", (d) => {
          dialogs.push(`${p}: ${d.message()}`);
          void d.dismiss();
        });
        await page.goto(server.url + p, { waitUntil: "load" });
        // Let handlers of images that failed to load run, and the page's own scripts finish.
        await page.waitForLoadState("networkidle");
        // Where the page has the finder, show results for the poisoned labels too.
        const finder = page.locator("#finder-input");
        if ((await finder.count()) > 0 && (await finder.isVisible())) {
          await finder.fill("XSSFIELD");
          await page.waitForLoadState("networkidle");
        }
        expect(await page.evaluate(() => (window as { __pwned?: unknown }).__pwned), p).toBeUndefined();
        checked.push(p);
        await page.close();
      }
      expect(dialogs).toEqual([]);
      expect(checked.length).toBe(pages.length);
      expect(checked.length).toBeGreaterThan(5);
    } finally {
      await ctx?.close();
      await server?.close();
    }
  }, 600_000);
});
