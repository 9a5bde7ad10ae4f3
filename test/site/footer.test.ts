import { readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { htmlFiles } from "../../src/build/anchors.js";
import { demoSite } from "../support/runBuild.js";

let site: string;
beforeAll(async () => {
  site = await demoSite();
}, 600_000);

describe("page footer", () => {
  it("names the constants edition, the data version and the build date from SOURCE_DATE_EPOCH on every page", () => {
    const pages = htmlFiles(site);
    const version = /^[0-9a-f]{12}$/;
    for (const p of pages) {
      const html = readFileSync(join(site, p), "utf8");
      // demoSite builds with SOURCE_DATE_EPOCH=1798761600, which is 2027-01-01T00:00:00Z (common practice: Unix time).
      expect(html, p).toContain("2027-01-01T00:00:00.000Z");
      // The demo's site.yaml chooses CODATA 2022.
      expect(html, p).toContain("CODATA 2022");
      const v = /data version <code>([^<]+)<\/code>/.exec(html);
      expect(v?.[1], p).toMatch(version);
    }
  });
});
