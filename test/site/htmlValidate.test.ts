/**
 * Every page of the demo build passes html-validate with the project's
 * .htmlvalidate.json (recommended rules; ids may hold ":" and "/", which
 * HTML5 allows: an id is any non-empty string without whitespace).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { HtmlValidate, FileSystemConfigLoader } from "html-validate";
import { beforeAll, describe, expect, it } from "vitest";
import { htmlFiles } from "../../src/build/anchors.js";
import { ROOT, demoSite } from "../support/runBuild.js";

let site: string;
beforeAll(async () => {
  site = await demoSite();
}, 600_000);

describe("HTML of the demo build", () => {
  it("has no html-validate errors on any page", async () => {
    const validator = new HtmlValidate(new FileSystemConfigLoader());
    const pages = htmlFiles(site);
    expect(pages.length).toBeGreaterThan(15);
    const problems: string[] = [];
    for (const p of pages) {
      const report = await validator.validateString(readFileSync(join(site, p), "utf8"), join(ROOT, "templates", "page.html"));
      for (const r of report.results) for (const m of r.messages) problems.push(`${p}:${m.line}:${m.column} ${m.ruleId}: ${m.message}`);
    }
    expect(problems.slice(0, 40)).toEqual([]);
  }, 300_000);

  it("accepts ids with colons and slashes but still catches a duplicate id", async () => {
    const validator = new HtmlValidate(new FileSystemConfigLoader());
    const doc = (body: string) =>
      `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>t</title></head><body>${body}</body></html>`;
    const okReport = await validator.validateString(doc(`<p id="level:5s-S1/2:F=2:mF=-1">x</p>`), join(ROOT, "templates", "t.html"));
    expect(okReport.valid).toBe(true);
    const dup = await validator.validateString(doc(`<p id="a">x</p><p id="a">y</p>`), join(ROOT, "templates", "t.html"));
    expect(dup.valid).toBe(false);
  });
});
