import { readFileSync, readdirSync, existsSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { beforeAll, describe, expect, it } from "vitest";
import { searchData, searchIndexScript, type SearchSource } from "../../src/site/searchIndex.js";
import { syntheticSearchAtlas as syntheticAtlas } from "../../scripts/bench/syntheticSearchAtlas.js";
import { demoSite } from "../support/runBuild.js";
import { ASSET, clientContext, MINISEARCH, type ClientGlobal } from "./searchClient.js";

describe("search data of a large synthetic atlas", () => {
  const atlas = syntheticAtlas();
  const script = searchIndexScript(searchData(atlas));

  it("has the intended size: 100 species, 2,000 levels, 5,000 lines", () => {
    const data = searchData(atlas);
    expect([data.species.length, data.levels.length, data.lines.length]).toEqual([100, 2000, 5000]);
  });

  it("stays under 1 MB gzip", () => {
    const gz = gzipSync(Buffer.from(script, "utf8"), { level: 9 }).length;
    console.info(`search-index.js for 100 species / 2,000 levels / 5,000 lines: ${script.length} bytes, ${gz} bytes gzip`);
    expect(gz).toBeLessThan(1_000_000);
  });

  it("is pure: the same atlas gives the same script", () => {
    expect(searchIndexScript(searchData(syntheticAtlas()))).toBe(script);
  });

  it("serves searches through the finder script", () => {
    const client = clientContext([MINISEARCH, { code: script }, ASSET("finder.js")]);
    const finder = client.AtlasFinder.createFinder(client.AtlasSearchData, client.MiniSearch);
    const r = finder.search("x42 L7", 5);
    expect(r.rows[0]!.href).toBe("species/x42/index.html#line:L7");
    // Every synthetic level has an F = 2 (I = 3/2 with J = 1/2 ... 7/2): 20 per species, 2,000 in all,
    // and the finder stops counting at 1,000.
    expect(finder.search("x42 F=2", 50).total).toBe(20);
    const all = finder.search("F=2", 5);
    expect([all.total, all.capped, all.rows.length]).toEqual([1000, true, 5]);
  });
});

// The row kinds the finder covers, in the anchor forms of src/site/anchors.ts (ids cannot contain ":");
// other tables (fields, transitions) use other forms and are not searched.
const INDEXED_ROW = /^(level:[^:]+(:mJ=[^:]+|:F=[^:]+(:mF=[^:]+)?)?|line:[^:]+(:mu=[^,:]+,ml=[^,:]+)?)$/;

describe("search data of the demo site", () => {
  let site: string;
  let client: ClientGlobal;
  let finder: ReturnType<ClientGlobal["AtlasFinder"]["createFinder"]>;
  beforeAll(async () => {
    site = await demoSite();
    client = clientContext([join(site, "assets/minisearch.js"), join(site, "assets/search-index.js"), ASSET("finder.js")]);
    finder = client.AtlasFinder.createFinder(client.AtlasSearchData, client.MiniSearch);
  }, 600_000);

  const first = (q: string) => finder.search(q, 10).rows[0];

  it("reaches every level, sublevel, hyperfine, line and component row of every species page, and nothing else", () => {
    // The overview of each species and its line pages (the J-resolved components live there).
    const speciesDir = join(site, "species");
    const onPages = new Set<string>();
    const scan = (path: string, rows: RegExp) => {
      const html = readFileSync(join(site, path), "utf8");
      for (const m of html.matchAll(/<tr id="([^"]+)"/g)) {
        const rowId = m[1]!.replace(/&amp;/g, "&");
        if (INDEXED_ROW.test(rowId) && rows.test(rowId)) onPages.add(`${path}#${rowId}`);
      }
    };
    for (const id of readdirSync(speciesDir)) {
      const page = `species/${id}/index.html`;
      if (!existsSync(join(site, page))) continue;
      onPages.add(page);
      scan(page, /^(level:|line:[^:]+$)/);
      const lineDir = join(speciesDir, id, "line");
      if (existsSync(lineDir)) for (const line of readdirSync(lineDir)) scan(`species/${id}/line/${line}/index.html`, /^line:[^:]+:mu=/);
    }
    const targets = finder.all().map((r) => r.href);
    expect(new Set(targets).size).toBe(targets.length);
    expect(new Set(targets)).toEqual(onPages);
  });

  it("puts exact ids and term symbols first", () => {
    // Line and level ids as written in data/species/*.yaml; anchors as in src/site/anchors.ts.
    expect(first("729")!.href).toBe("species/ca40-ion/index.html#line:729");
    expect(first("rb87 D2")!.href).toBe("species/rb87/index.html#line:D2");
    expect(first("87Rb")!.href).toBe("species/rb87/index.html");
    expect(first("780.24")!.href).toBe("species/rb87/index.html#line:D2");
    expect(first("D2")!.kind).toBe("line");
    for (const q of ["3P2", "³P°₂", "3Po2"]) expect(first(q)!.href, q).toMatch(/#level:[^:]*3P2$/);
  });

  it("finds the same levels for every spelling of ²P°3/2, and only levels with that term first", () => {
    const spellings = ["2P3/2", "2P_{3/2}", "P3/2", "²P₃/₂", "2P°3/2", "2Po3/2"];
    const results = spellings.map((q) => finder.search(q, 50).rows.map((r) => r.href));
    for (const r of results) expect(r).toEqual(results[0]);
    const levels = results[0]!.filter((h) => /#level:[^:]*$/.test(h));
    expect(levels.length).toBeGreaterThan(0);
    // Every demo level id of a ²P°3/2 term ends in "P3/2" (data/species/*.yaml naming).
    for (const h of levels) expect(h).toMatch(/P3\/2$/);
    expect(results[0]!.indexOf(levels[levels.length - 1]!)).toBe(levels.length - 1);
  });

  it("answers quantum-number queries with the rows they name", () => {
    const f2 = finder.search("F=2", 100).rows;
    expect(f2.length).toBeGreaterThan(0);
    for (const r of f2) expect(r.href).toMatch(/:F=2$/);
    const mf = finder.search("mF=-1", 500).rows;
    for (const r of mf) expect(r.href).toMatch(/:mF=-1$/);
    const both = finder.search("F=2 mF=1", 100).rows;
    expect(both.length).toBeGreaterThan(0);
    for (const r of both) expect(r.href).toMatch(/:F=2:mF=1$/);
    expect(first("rb87 5s-S1/2 F=2 mF=-2")!.href).toBe("species/rb87/index.html#level:5s-S1/2:F=2:mF=-2");
    expect(first("rb87 D2 mu=3/2 ml=1/2")!.href).toBe("species/rb87/line/D2/index.html#line:D2:mu=3/2,ml=1/2");
  });

  it("finds nothing for an empty query and says so for a query without matches", () => {
    expect(finder.search("   ", 10).total).toBe(0);
    expect(finder.search("zz-no-such-thing", 10).total).toBe(0);
  });
});
