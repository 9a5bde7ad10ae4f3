import { cpSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { htmlFiles, writeAnchors } from "../../src/build/anchors.js";
import { ANCHORS_FORMAT, parseManifest, type AnchorsManifest } from "../../src/build/anchorsManifest.js";
import { demoSite, tempDir } from "../support/runBuild.js";

let site: string;
let manifest: AnchorsManifest;
beforeAll(async () => {
  site = await demoSite();
  const m = parseManifest(JSON.parse(readFileSync(join(site, "anchors.json"), "utf8")));
  if (typeof m === "string") throw new Error(m);
  manifest = m;
}, 600_000);

describe("anchors.json of a build", () => {
  it("lists every HTML page of the build with its ids", () => {
    expect(manifest.format).toBe(ANCHORS_FORMAT);
    expect(Object.keys(manifest.pages).sort()).toEqual(htmlFiles(site).sort());
    expect(Object.keys(manifest.pages)).toContain("species/rb87/index.html");
  });

  it("holds the stable row anchors of the species tables on the pages that show them", () => {
    const rb = manifest.pages["species/rb87/index.html"]!;
    // 87Rb: I = 3/2, 5s 2S1/2 has F = 1, 2 (common practice); D2 is 5p 2P3/2 → 5s 2S1/2 (common practice).
    expect(rb).toContain("level:5s-S1/2");
    expect(rb).toContain("level:5s-S1/2:F=2:mF=-1");
    expect(rb).toContain("level:5s-S1/2:F=1");
    expect(rb).toContain("line:D2");
    expect(manifest.pages["species/rb87/line/D2/index.html"]).toContain("line:D2:mu=3/2,ml=1/2");
    expect(manifest.pages["species/rb87/level/5s-S1_2/index.html"]).toContain("rf:5s-S1/2:F=1,mF=0:F=2,mF=0");
  });

  it("forwards every id of a species' own pages that its overview does not hold, to a page that holds it", () => {
    const overview = "species/rb87/index.html";
    const forwards = manifest.forwards[overview]!;
    expect(forwards["line:D2:mu=3/2,ml=1/2"]).toBe("species/rb87/line/D2/index.html");
    for (const [id, to] of Object.entries(forwards)) {
      // "page" for an id that kept its form, "page#new-id" for one renamed (the plot switch's numbered controls).
      const [page, target] = to.includes("#") ? to.split("#") : [to, id];
      expect(manifest.pages[page!], `${id} → ${to}`).toContain(target);
      expect(manifest.pages[overview]).not.toContain(id);
    }
    // rb87's first level, 5s 2S1/2, had the plot switch numbered 1 on the one-page layout.
    expect(forwards["axis-lin-1"]).toBe("species/rb87/level/5s-S1_2/index.html#axis-lin:5s-S1/2");
  });

  it("is the same file when the same pages are scanned again", () => {
    const first = readFileSync(join(site, "anchors.json"), "utf8");
    const copy = join(tempDir(), "copy");
    cpSync(site, copy, { recursive: true });
    writeAnchors(copy);
    expect(readFileSync(join(copy, "anchors.json"), "utf8")).toBe(first);
  });
});
