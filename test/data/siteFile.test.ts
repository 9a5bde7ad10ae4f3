import { describe, expect, it } from "vitest";
import { ProblemSink } from "../../src/data/inputError.js";
import { defaultSite, readSiteFile } from "../../src/data/siteFile.js";
import { parseYaml } from "../../src/data/yamlExact.js";

function site(text: string) {
  const sink = new ProblemSink("site.yaml");
  const src = parseYaml(text, sink);
  const s = src ? readSiteFile(src) : null;
  return { s, problems: sink.problems.map((p) => p.format()) };
}

describe("readSiteFile", () => {
  it("sorts fields by value and merges equal values, keeping the first text", () => {
    // 1000 G = 0.1 T (1 G = 1e-4 T, CGS–SI definition)
    const { s } = site(`fields: ["10 G", "0.1 T", "0 G", "1000 G", "1 mT"]\n`);
    expect(s?.fields.map((f) => f.text)).toEqual(["0 G", "10 G", "0.1 T"]);
    expect(s?.fields.map((f) => f.tesla.toFixed())).toEqual(["0", "0.001", "0.1"]);
  });

  it("gives defaults for an empty file", () => {
    const { s } = site("");
    expect(s).toEqual(defaultSite());
    expect(s?.title).toBe("Sublevel Atlas");
  });

  it("accepts a path prefix and web address", () => {
    const { s } = site(`pathPrefix: /atlas/\nsiteUrl: https://example.org/\n`);
    expect(s?.pathPrefix).toBe("/atlas/");
    expect(s?.siteUrl).toBe("https://example.org/");
  });

  it("refuses bad path prefixes, empty field lists and fields with uncertainty", () => {
    expect(site(`pathPrefix: /a/../b/\n`).problems[0]).toMatch(/segments that are not allowed/);
    expect(site(`fields: []\n`).problems[0]).toMatch(/fields is empty/);
    expect(site(`fields: ["10(1) G"]\n`).problems[0]).toMatch(/has an uncertainty/);
  });

  it("accepts minus zero as the zero field", () => {
    expect(site(`fields: ["-0 G"]\n`).problems).toEqual([]);
  });
});
