import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { beforeAll, describe, expect, it } from "vitest";
import { mergeSearchData, searchData, searchIndexScript, type SearchData } from "../../src/site/searchIndex.js";
import { SYNTHETIC_FIELDS, syntheticSearchAtlas } from "../../scripts/bench/syntheticSearchAtlas.js";
import { packInts, unpackInts } from "../../src/site/searchCodec.js";
import { demoSite } from "../support/runBuild.js";
import { ASSET, clientContext, type ClientGlobal } from "./searchClient.js";

const syntheticData = (): SearchData => mergeSearchData(syntheticSearchAtlas().map((s) => searchData(s, SYNTHETIC_FIELDS)));

describe("packed lists of small integers", () => {
  it("round-trip, and fall back to plain numbers outside −32 … 31", () => {
    const doubled = [-31, -1, 0, 1, 3, 31, 17, -17];
    expect(typeof packInts(doubled)).toBe("string");
    expect(unpackInts(packInts(doubled))).toEqual(doubled);
    expect(packInts([0, 32])).toEqual([0, 32]);
    expect(unpackInts(packInts([-33, 5]))).toEqual([-33, 5]);
    expect(packInts([])).toBe("");
    // Only characters that JSON writes as they are.
    expect(JSON.stringify(packInts(Array.from({ length: 64 }, (_, i) => i - 32)))).not.toMatch(/\\/);
  });
});

describe("search data of a large synthetic atlas", () => {
  const data = syntheticData();
  const script = searchIndexScript(data);

  it("has the intended size: 100 species, 2,000 levels, 5,000 lines, their sublevel transitions", () => {
    expect([data.species.length, data.levels.length, data.lines.length]).toEqual([100, 2000, 5000]);
    expect(data.levels.reduce((n, l) => n + unpackInts(l[12]).length / 5, 0)).toBeGreaterThan(100_000);
  });

  it("stays under 1 MB gzip", () => {
    const gz = gzipSync(Buffer.from(script, "utf8"), { level: 9 }).length;
    console.info(`search-index.js for 100 species / 2,000 levels / 5,000 lines with their transitions: ${script.length} bytes, ${gz} bytes gzip`);
    expect(gz).toBeLessThan(1_000_000);
  });

  it("is pure: the same atlas gives the same script", () => {
    expect(searchIndexScript(syntheticData())).toBe(script);
  });

  it("serves searches through the bundled finder script", () => {
    const client = clientContext([{ code: script }, ASSET("finder.js")]);
    const finder = client.AtlasFinder.createFinder(client.AtlasSearchData);
    const r = finder.search("x42 L7", 5);
    expect(r.rows[0]!.href).toBe("species/x42/index.html#line:L7");
    // Every synthetic level has an F = 2 (I = 3/2 with J = 1/2 ... 7/2): 20 per species, 2,000 in all,
    // and the finder stops counting at 1,000.
    expect(finder.search("x42 F=2", 50).total).toBe(20);
    const all = finder.search("F=2", 5);
    expect([all.total, all.capped, all.rows.length]).toEqual([1000, true, 5]);
  });

  it("sends each kind of row to the page the build put it on", () => {
    // As when an overview is too large and leaves the energies and the (F, mF) shifts to the level pages.
    const [x0] = syntheticSearchAtlas();
    const levelPage = "species/x0/level/4s-S1_2/index.html";
    const moved = /^(field:|level:[^:]+:F=[^:]+:mF=)/;
    // And a level whose transitions are on one page per lower F.
    const byLowerF = (rowId: string) => /^rf:4s-S1\/2:F=(\d+)/.exec(rowId);
    const pageOf = (rowId: string) =>
      byLowerF(rowId) ? `${levelPage.replace("index.html", "")}transitions/F-${byLowerF(rowId)![1]}/index.html` : moved.test(rowId) ? levelPage : "species/x0/index.html";
    const part = searchData({ ...x0!, pageOf }, SYNTHETIC_FIELDS);
    const client = clientContext([{ code: searchIndexScript(mergeSearchData([part])) }, ASSET("finder.js")]);
    const finder = client.AtlasFinder.createFinder(client.AtlasSearchData);
    expect(finder.search("4s-S1/2 F=2 mF=1", 1).rows[0]!.href).toBe(`${levelPage}#level:4s-S1/2:F=2:mF=1`);
    expect(finder.search("4s-S1/2 F=2", 1).rows[0]!.href).toBe("species/x0/index.html#level:4s-S1/2:F=2");
    expect(finder.search("4s-S1/2 F=2 mF=1 1 T", 1).rows[0]!.href).toBe(`${levelPage}#field:4s-S1/2:F=2:mF=1`);
    const transitions = finder.search("x0 4s-S1/2 rf", 1000).rows;
    expect(transitions.length).toBeGreaterThan(10);
    for (const r of transitions) {
      const F = /#rf:4s-S1\/2:F=(\d+)/.exec(r.href)![1];
      expect(r.href, r.href).toMatch(new RegExp(`^species/x0/level/4s-S1_2/transitions/F-${F}/index\\.html#`));
    }
    expect(new Set(transitions.map((r) => r.href.split("#")[0])).size).toBeGreaterThan(1);
  });
});

// The row kinds the finder covers, in the anchor forms of src/site/anchors.ts (ids cannot contain ":"):
// levels and their sublevels, energies at the bias fields, sublevel transitions, lines and components, constants.
const INDEXED_ROW = /^(level:[^:]+(:mJ=[^:]+|:F=[^:]+(:mF=[^:]+)?)?|field:[^:]+:F=[^:]+:mF=[^:]+|rf:[^:]+:F=[^,:]+,mF=[^:]+:F=[^,:]+,mF=[^:]+|line:[^:]+(:mu=[^,:]+,ml=[^,:]+)?|const:.+)$/;

describe("search data of the demo site", () => {
  let site: string;
  let client: ClientGlobal;
  let finder: ReturnType<ClientGlobal["AtlasFinder"]["createFinder"]>;
  beforeAll(async () => {
    site = await demoSite();
    // The search data and the finder script as the build wrote them.
    client = clientContext([join(site, "assets/search-index.js"), join(site, "assets/finder.js")]);
    finder = client.AtlasFinder.createFinder(client.AtlasSearchData);
  }, 600_000);

  const first = (q: string) => finder.search(q, 10).rows[0];

  it("reaches every row of the kinds it indexes, each on a page that holds it, and nothing else", () => {
    // Every HTML page of the site with the row ids on it (a row may be on the overview and on a detail page).
    const idsOn = new Map<string, Set<string>>();
    const walk = (dir: string) => {
      for (const name of readdirSync(join(site, dir), { withFileTypes: true })) {
        const path = dir ? `${dir}/${name.name}` : name.name;
        if (name.isDirectory()) walk(path);
        else if (name.name === "index.html") {
          const html = readFileSync(join(site, path), "utf8");
          idsOn.set(path, new Set([...html.matchAll(/<tr id="([^"]+)"/g)].map((m) => m[1]!.replace(/&amp;/g, "&"))));
        }
      }
    };
    walk("");
    // The row ids of the kinds the finder covers, wherever they are (the bench sheets repeat none of them as row ids).
    const onSite = new Set<string>();
    for (const [path, ids] of idsOn) for (const id of ids) if (INDEXED_ROW.test(id) && !/(^|\/)sheet\//.test(path)) onSite.add(id);
    const targets = finder.all().map((r) => r.href);
    expect(new Set(targets).size).toBe(targets.length);
    const reached = new Set<string>();
    for (const href of targets) {
      const [page, id] = href.split("#") as [string, string | undefined];
      expect(idsOn.has(page), href).toBe(true);
      if (id === undefined) {
        expect(page, href).toMatch(/^species\/[^/]+\/index\.html$/);
        continue;
      }
      expect(idsOn.get(page)!.has(id), href).toBe(true);
      reached.add(id);
    }
    expect(reached).toEqual(onSite);
    // A row on the overview is reached there.
    for (const href of targets) {
      const [page, id] = href.split("#") as [string, string | undefined];
      const overview = page.replace(/^(species\/[^/]+\/).*$/, "$1index.html");
      if (id && page !== overview && idsOn.get(overview)?.has(id)) expect.fail(`${href} is on the overview too`);
    }
  });

  it("puts exact ids and term symbols first", () => {
    // Line and level ids as written in data/species/*.yaml; anchors as in src/site/anchors.ts.
    expect(first("729")!.href).toBe("species/ca40-ion/index.html#line:729");
    expect(first("rb87 D2")!.href).toBe("species/rb87/index.html#line:D2");
    expect(first("87Rb")!.href).toBe("species/rb87/index.html");
    expect(first("780.24")!.href).toBe("species/rb87/index.html#line:D2");
    // Fe I 630.25 nm is given in air in data/species/fe56.yaml (NIST ASD air wavelength 630.2494 nm); its vacuum wavelength is 630.42 nm.
    expect(first("630.2494")!.href).toBe("species/fe56/index.html#line:630.25");
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

  it("finds species by symbol, name and the common spellings of both", () => {
    // Element names (common practice: IUPAC "caesium", American "cesium"); labels and ids as in data/species/*.yaml.
    for (const q of ["rubidium", "Rubidium", "Rb", "87Rb", "Rb87", "Rb-87", "rb87", "rubidium-87", "rubidium 87"]) expect(first(q), q).toMatchObject({ kind: "species", href: "species/rb87/index.html" });
    for (const q of ["caesium", "cesium", "Cs", "133Cs", "Cs-133"]) expect(first(q), q).toMatchObject({ kind: "species", href: "species/cs133/index.html" });
    expect(first("calcium ion")).toMatchObject({ kind: "species", href: "species/ca40-ion/index.html" });
    expect(first("40Ca+")).toMatchObject({ kind: "species", href: "species/ca40-ion/index.html" });
  });

  it("answers a sublevel with its gF and its shift per gauss, exactly as the tables write them", () => {
    const r = first("87Rb F=2 mF=1")!;
    expect(r.href).toBe("species/rb87/index.html#level:5s-S1/2:F=2:mF=1");
    // gF and shift as the overview's mF table shows them (same formatting code); the shift is gF·mF·μB/h.
    const html = readFileSync(join(site, "species/rb87/index.html"), "utf8");
    const row = new RegExp(`<tr id="level:5s-S1/2:F=2:mF=1">(.*?)</tr>`, "s").exec(html)![1]!;
    const cells = [...row.matchAll(/<td[^>]*>(.*?)<\/td>/gs)].map((m) => m[1]!.replace(/<[^>]+>/g, "").replace(/[\u2007\u2008]/g, "").trim());
    expect(r.answer).toBe(`gF = ${cells[2]}; shift ${cells[3]} MHz/G`);
    // 87Rb 5²S1/2 F = 2: gF ≈ 0.4998 (Steck, "Rubidium 87 D Line Data", from memory), so mF = 1 moves by
    // gF·μB/h ≈ 0.6996 MHz/G (μB/h = 1.399 624 49 MHz/G, CODATA 2022).
    // Both carry their standard uncertainty in the concise form, u(gF) = u(gJ)/4 ≈ 5·10⁻⁸ (Steck's gJ = 2.00233113(20)),
    // so the shift's is u(gF)·μB/h ≈ 7·10⁻⁸ MHz/G.
    expect(r.answer).toMatch(/^gF = 0\.499\u20098\d\d\u2009\d+\(50\); shift 0\.699\u20095\d\d\u2009\d+\(70\) MHz\/G$/);
    // The reader's unit is followed: GHz/T is 10⁴ × MHz/G… in the server's own rounding.
    expect(finder.search("87Rb F=2 mF=1", 1, { unit: "GHz/T" }).rows[0]!.answer).toMatch(/shift 6\.99\d.* GHz\/T$/);
  });

  it("finds the 87Rb clock transition and its field-insensitive points by clock, magic, rf and the field", () => {
    // 87Rb ground state: the 0–0 transition F=1, mF=0 ↔ F=2, mF=0 is field-insensitive at B = 0; the two-photon
    // F=1, mF=−1 ↔ F=2, mF=1 transition is field-insensitive near 3.229 G (the "magic" field; common practice, from memory).
    const clock = "species/rb87/level/5s-S1_2/index.html#rf:5s-S1/2:F=1,mF=0:F=2,mF=0";
    const magic = "species/rb87/level/5s-S1_2/index.html#rf:5s-S1/2:F=1,mF=-1:F=2,mF=1";
    expect(first("87Rb clock")).toMatchObject({ kind: "sublevel transition", href: clock, answer: "field-insensitive at 0 G" });
    expect(first("87Rb rf")!.href).toBe(clock);
    expect(first("Rb clock transition")!.href).toBe(clock);
    expect(first("87Rb magic")!.href).toBe(magic);
    expect(first("87Rb magic")!.answer).toMatch(/^field-insensitive at 3\.228\u20099\d\d G$/);
    expect(first("87Rb 3.228")!.href).toBe(magic);
    expect(first("3.228")!.href).toBe(magic);
    expect(first("87Rb field-insensitive two-photon")!.href).toBe(magic);
    expect(first("87Rb F=1 mF=-1 F=2 mF=1")!.href).toBe(magic);
    expect(first("87Rb 5s-S1/2 F=2 mF=1 F=1 mF=-1")!.href).toBe(magic);
    // Microwave transitions join different hyperfine levels F.
    const microwave = finder.search("87Rb microwave", 200).rows;
    expect(microwave.length).toBeGreaterThan(0);
    for (const r of microwave) {
      const [, F1, F2] = /#rf:[^:]+:F=([^,]+),mF=[^:]+:F=([^,]+),/.exec(r.href)!;
      expect(F1, r.href).not.toBe(F2);
    }
  });

  it("offers the energy at a configured field in the field table's column, and the calculator for any other field", () => {
    // Demo fields (data/site.yaml): 0 G, 0.5 G, 3.228 G, 10 G, 100 G, 0.1 T, 1 T; 1 T is the seventh (column E6).
    for (const q of ["Cs F=4 mF=4 1 T", "caesium F=4 mF=4 1T", "Cs F=4 mF=4 10 kG", "Cs F=4 mF=4 10000 G"]) {
      expect(first(q), q).toMatchObject({ kind: "energy at a field", href: "species/cs133/index.html#field:6s-S1/2:F=4:mF=4", column: "E6" });
    }
    expect(first("Cs F=4 mF=4 0.5 G")!.column).toBe("E1");
    expect(first("40Ca+ 4s-S1/2 mJ=1/2 1 T")).toMatchObject({ href: "species/ca40-ion/index.html#field:4s-S1/2:F=1/2:mF=1/2", column: "E6" });
    expect(first("87Rb F=2 mF=1 4.7 G")).toMatchObject({ kind: "field calculator", href: "species/rb87/index.html#B=4.7G" });
  });

  it("finds lines by id, wavelength and multipole with their pattern, and components by polarization words", () => {
    // The anomalous pattern of ²P3/2 → ²S1/2 in the classical notation (common practice; the README's export example).
    expect(first("87Rb D2")).toMatchObject({ kind: "line", answer: "pattern (1) 3, 5 / 3" });
    // D2 (²P3/2 → ²S1/2): σ+ components have m_upper − m_lower = +1 (common practice).
    for (const q of ["D2 sigma+", "D2 σ+", "D2 sigma plus", "D2 Δm=+1", "D2 dm=1"]) {
      const rows = finder.search(q, 100).rows;
      expect(rows.length, q).toBeGreaterThan(0);
      for (const r of rows) {
        expect(r.kind, q).toBe("Zeeman component");
        const [, mu, ml] = /:mu=([^,]+),ml=(.+)$/.exec(r.href)!;
        const half = (t: string) => (t.includes("/") ? Number(t.split("/")[0]) / 2 : Number(t));
        expect(half(mu!) - half(ml!), `${q} ${r.href}`).toBe(1);
        expect(r.answer).toBe("σ+");
      }
    }
    // D1 (²P1/2 → ²S1/2) has two π components, mJ = ±1/2 → ±1/2 (common practice).
    for (const r of finder.search("rb87 D1 pi", 100).rows) expect(r.answer).toBe("π");
    expect(finder.search("rb87 D1 π", 100).rows.length).toBe(2);
    // "line" keeps a search to lines: the D lines of rubidium are D1 and D2 (common practice).
    expect(finder.search("Rb D line", 10).rows.map((r) => r.href)).toEqual(["species/rb87/index.html#line:D1", "species/rb87/index.html#line:D2"]);
    // "ground": the level listed without an energy while the others have one (data/species/rb87.yaml).
    expect(first("87Rb ground F=2 mF=2")!.href).toBe("species/rb87/index.html#level:5s-S1/2:F=2:mF=2");
    // 729 nm of 40Ca+ is the quadrupole (E2) line (data/species/ca40-ion.yaml).
    expect(first("ca40 729 E2")!.href).toBe("species/ca40-ion/index.html#line:729");
  });

  it("finds constants with their values", () => {
    const bohr = finder.search("Bohr magneton", 10).rows;
    expect(bohr.length).toBeGreaterThanOrEqual(4);
    for (const r of bohr) expect(r.kind).toBe("constant");
    for (const q of ["Bohr magneton Hz/T", "muB/h", "μB/h"]) {
      const r = first(q)!;
      expect(r.href, q).toBe("constants/index.html#const:muB_h");
      // μB/h = 13 996 244 917.1(44) Hz/T (CODATA 2022).
      expect(r.answer!.replace(/\u2009/g, ""), q).toBe("13996244917.1(44) Hz/T");
    }
  });

  it("finds nothing for an empty query and says so for a query without matches", () => {
    expect(finder.search("   ", 10).total).toBe(0);
    expect(finder.search("zz-no-such-thing", 10).total).toBe(0);
  });
});
