/**
 * The preview in Chromium: an open page reloads by itself after a save is
 * rebuilt, shows a broken save's message at its foot (the page stays), and
 * drops the message once the data builds again.
 */
import { rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SR88 } from "../catalogue/validData.js";
import { hasChromium, launchBrowser } from "../support/browser.js";
import { tempDir } from "../support/runBuild.js";
import { startServe, waitForState, type Served } from "./serveProcess.js";

const parent = tempDir("atlas-serve-reload-");
let served: Served;
let browser: BrowserContext;

beforeAll(async () => {
  if (!hasChromium) return;
  served = await startServe(parent);
  await waitForState(served.url, (s) => s.version >= 1 && !s.building);
  browser = await launchBrowser();
}, 180_000);
afterAll(async () => {
  await browser?.close();
  await served?.stop();
  rmSync(parent, { recursive: true, force: true });
});

describe.skipIf(!hasChromium)("the preview in a browser", () => {
  it("reloads the open page after a rebuild and shows a broken save's message over the old page", async () => {
    const page = await browser.newPage();
    const outside: string[] = [];
    page.on("request", (r) => {
      if (!r.url().startsWith(served.url) && !r.url().startsWith("data:")) outside.push(r.url());
    });
    const refused: string[] = [];
    page.on("console", (m) => {
      if (/Content Security Policy/i.test(m.text())) refused.push(m.text());
    });
    await page.goto(new URL("species/sr88/index.html", served.url).href);
    await page.evaluate(() => ((window as unknown as { marker: number }).marker = 1));
    const file = join(served.data, "species", "sr88.yaml");

    writeFileSync(file, SR88.replace('label: "88Sr"', 'label: "88Sr (saved)"'));
    await page.waitForFunction(() => document.title.includes("88Sr (saved)"), null, { timeout: 120_000 });
    // A real reload: the page's own state is gone.
    expect(await page.evaluate(() => (window as unknown as { marker?: number }).marker)).toBeUndefined();

    writeFileSync(file, SR88.replace('label: "88Sr"', 'label: "88Sr (saved)"').replace("term: 3Po1", "term: 3Qo1"));
    const alert = page.locator("#atlas-preview-error");
    await alert.waitFor({ state: "visible", timeout: 120_000 });
    expect(await alert.getAttribute("role")).toBe("alert");
    expect(await alert.locator("pre").textContent()).toMatch(/sr88\.yaml:\d+:\d+: /);
    expect(await page.title()).toContain("88Sr (saved)");

    writeFileSync(file, SR88);
    await page.waitForFunction(() => !document.title.includes("(saved)") && !document.getElementById("atlas-preview-error"), null, { timeout: 120_000 });
    expect(outside).toEqual([]);
    // The added script and its polling are allowed by the pages' own CSP.
    expect(refused).toEqual([]);
  }, 400_000);
});
