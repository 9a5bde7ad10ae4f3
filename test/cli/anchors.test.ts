import { readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { htmlFiles, writeAnchors } from "../../src/cli/anchors.js";
import { ANCHORS_FORMAT, manifestText } from "../../src/site/idScan.js";
import { demoSite, tempDir } from "../support/runBuild.js";
import { cpSync } from "node:fs";

let site: string;
beforeAll(async () => {
  site = await demoSite();
}, 600_000);

describe("anchors.json of a build", () => {
  it("lists every HTML page of the build with its ids", () => {
    const m = JSON.parse(readFileSync(join(site, "anchors.json"), "utf8"));
    expect(m.format).toBe(ANCHORS_FORMAT);
    expect(Object.keys(m.pages).sort()).toEqual(htmlFiles(site).sort());
    expect(Object.keys(m.pages)).toContain("species/rb87/index.html");
  });

  it("holds the stable row anchors of the species tables", () => {
    const m = JSON.parse(readFileSync(join(site, "anchors.json"), "utf8"));
    const rb = m.pages["species/rb87/index.html"] as string[];
    // 87Rb: I = 3/2, 5s 2S1/2 has F = 1, 2 (common practice); D2 is 5p 2P3/2 → 5s 2S1/2 (common practice).
    expect(rb).toContain("level:5s-S1/2");
    expect(rb).toContain("level:5s-S1/2:F=2:mF=-1");
    expect(rb).toContain("level:5s-S1/2:F=1");
    expect(rb).toContain("line:D2");
    expect(rb).toContain("line:D2:mu=3/2,ml=1/2");
  });

  it("is the same file when the same pages are scanned again", () => {
    const first = readFileSync(join(site, "anchors.json"), "utf8");
    const copy = join(tempDir(), "copy");
    cpSync(site, copy, { recursive: true });
    const again = writeAnchors(copy);
    expect(manifestText(again)).toBe(first);
    expect(readFileSync(join(copy, "anchors.json"), "utf8")).toBe(first);
  });
});
