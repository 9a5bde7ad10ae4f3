/**
 * Links a lab saved before the page split keep landing: each old
 * page#anchor of the committed manifest (the demo built with one page per
 * species) opens on the element with that id, on the page that now holds
 * it, over http and from disk.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseManifest, type AnchorsManifest } from "../../src/build/anchorsManifest.js";
import { CHROMIUM, closeDemo, hasChromium, openDemo, watchPage, type StaticServer } from "../support/browser.js";
import { ROOT } from "../support/runBuild.js";

if (!hasChromium) console.warn(`browser tests skipped: no Chromium at ${CHROMIUM}`);

const load = (path: string): AnchorsManifest => {
  const m = parseManifest(JSON.parse(readFileSync(path, "utf8")));
  if (typeof m === "string") throw new Error(m);
  return m;
};

/** The kind of an anchor: its text up to the first ":" or "-" ("rf", "line", "axis", "plot", …). */
const kindOf = (id: string) => /^[^:-]+/.exec(id)![0];

/**
 * One old link of every anchor kind on the species pages, and of every kind
 * of row that moved (the first of each kind in manifest order, per species
 * when it moved there), so every forwarding path is walked at least once.
 */
function sample(before: AnchorsManifest): { page: string; id: string }[] {
  const seen = new Set<string>();
  const out: { page: string; id: string }[] = [];
  for (const [page, ids] of Object.entries(before.pages)) {
    if (!page.startsWith("species/")) continue;
    for (const id of ids) {
      const key = kindOf(id) + (page.includes("/k40/") ? ":k40" : "");
      if (seen.has(key)) continue;
      seen.add(key);
      out.push({ page, id });
    }
  }
  return out;
}

/** Open `url` and wait until the address names `id` and the element is there; the page path and hash it ends on. */
async function land(page: Page, url: string, id: string): Promise<{ path: string; found: boolean }> {
  await page.goto(url, { waitUntil: "load" });
  await page.waitForFunction((want) => document.getElementById(want) !== null && decodeURIComponent(location.hash.slice(1)) === want, id, { timeout: 10_000 });
  return { path: new URL(page.url()).pathname, found: await page.evaluate((want) => document.getElementById(want) !== null, id) };
}

describe.skipIf(!hasChromium)("old links after the page split, in the browser", () => {
  let site: string;
  let ctx: BrowserContext;
  let server: StaticServer;
  let now: AnchorsManifest;
  const before = load(join(ROOT, "test/fixtures/anchors/manifest-before-page-split.json"));
  beforeAll(async () => {
    ({ site, ctx, server } = await openDemo("/"));
    now = load(join(site, "anchors.json"));
  }, 600_000);
  afterAll(() => closeDemo(ctx, server));

  /** Where an old link should end: the same page if it still has the id, else the forward's target ("page" or "page#new-id"). */
  const expected = (page: string, id: string): { page: string; id: string } | undefined => {
    if (now.pages[page]?.includes(id)) return { page, id };
    const to = now.forwards[page]?.[id];
    if (to === undefined) return undefined;
    return to.includes("#") ? { page: to.slice(0, to.indexOf("#")), id: to.slice(to.indexOf("#") + 1) } : { page: to, id };
  };

  it("covers every kind of anchor the species pages had", () => {
    const kinds = new Set(sample(before).map((s) => kindOf(s.id)));
    for (const k of ["level", "line", "rf", "field", "hfc", "hfl", "term", "plot", "sticks", "axis", "table", "h"]) expect(kinds, k).toContain(k);
  });

  it("lands every sampled old link on its element over http, on the page that holds it now", async () => {
    const page = await ctx.newPage();
    const problems = watchPage(page, [server.url]);
    for (const { page: old, id } of sample(before)) {
      const target = expected(old, id);
      expect(target, `${old}#${id}`).toBeDefined();
      const r = await land(page, `${server.url}${old}#${encodeURI(id)}`, target!.id);
      expect(r.found, `${old}#${id}`).toBe(true);
      expect(r.path, `${old}#${id}`).toBe(`/${target!.page}`);
    }
    expect(problems).toEqual([]);
    await page.close();
  }, 300_000);

  it("lands old links opened from disk (file://) too", async () => {
    const page = await ctx.newPage();
    const picks = [
      { old: "species/rb87/index.html", id: "rf:5s-S1/2:F=1,mF=0:F=2,mF=0" },
      { old: "species/rb87/index.html", id: "line:D2:mu=3/2,ml=1/2" },
      // A component at a field of k40 D2, whose fields now have a page each.
      { old: "species/k40/index.html", id: before.pages["species/k40/index.html"]!.find((id) => /^line:D2:B=[^:]+:F=/.test(id))! },
    ];
    for (const { old, id } of picks) {
      const target = expected(old, id)!;
      const r = await land(page, `${pathToFileURL(join(site, old)).href}#${encodeURI(id)}`, target.id);
      expect(r.path.endsWith(`/${target.page}`), `${old}#${id} → ${r.path}`).toBe(true);
    }
    await page.close();
  }, 120_000);
});
