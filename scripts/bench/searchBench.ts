/**
 * `npm run bench:search`: how the finder does at benchmark size, in Debian
 * Chromium. Builds the search script of a synthetic 100-species / 2,000-level
 * / 5,000-line atlas, loads it from disk in a page with the real finder
 * script, and prints the script's size (raw and gzip), the time the browser
 * takes to evaluate it and to build the index, and query times for typical
 * bench queries (median and worst of repeated runs). Targets (issue: search
 * stays instant): under 1 MB gzip, under 50 ms a query. First it prints the
 * size of every bundled page script (src/browser/ through esbuild). Then the field
 * calculator: assets/calculator.js bundled as the build bundles it, with the
 * engine data of the demo's cs133 and k40, and the time of
 * SublevelAtlas.at (first answer, with preparation; then median and worst
 * over fields from 37 mG to 3 T; target under 50 ms). Not a test: it prints.
 */
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { gzipSync } from "node:zlib";
import { mergeSearchData, searchData, searchIndexScript } from "../../src/site/searchIndex.js";
import { launchBrowser } from "../../test/support/browser.js";
import { tempDir } from "../../test/support/runBuild.js";
import { SYNTHETIC_FIELDS, syntheticSearchAtlas } from "./syntheticSearchAtlas.js";
import { BROWSER_ENTRIES, bundleBrowser } from "../../src/build/bundleBrowser.js";
import { engineData, engineDataScript } from "../../src/engine/engineData.js";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { computeFields } from "../../src/results/computeFields.js";
import { DEMO_DATA } from "../../test/support/runBuild.js";

const QUERIES = ["F=2", "mF=-1", "F=2 mF=1", "2P3/2", "²P₃/₂", "x42", "x7 L3", "L42", "780", "4p-P3/2", "3D5/2 F=3", "clock", "magic", "x42 rf", "3.228", "L7 sigma+", "x42 F=2 mF=1 1 T", "F=1 mF=0 F=2 mF=0"];
const REPEAT = 15;

const dir = tempDir("atlas-search-bench-");
const script = searchIndexScript(mergeSearchData(syntheticSearchAtlas().map((s) => searchData(s, SYNTHETIC_FIELDS))));
writeFileSync(join(dir, "search-index.js"), script);
// Every page script as the build bundles it (the finder is src/browser/finder.ts with MiniSearch); their sizes first.
bundleBrowser(dir);
for (const name of BROWSER_ENTRIES) {
  const code = readFileSync(join(dir, "assets", `${name}.js`));
  console.log(`assets/${name}.js: ${code.length} bytes, ${gzipSync(code, { level: 9 }).length} bytes gzip`);
}
writeFileSync(
  join(dir, "index.html"),
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>search bench</title>
<script>window.__t0 = performance.now();</script>
<script src="search-index.js"></script>
<script>window.__tLoaded = performance.now();</script>
<script src="assets/finder.js"></script></head><body data-root="./"></body></html>`,
);
mkdirSync(dir, { recursive: true });

const ctx = await launchBrowser();
try {
  const page = await ctx.newPage();
  await page.goto(pathToFileURL(join(dir, "index.html")).href);
  const result = await page.evaluate(
    ({ queries, repeat }) => {
      const w = window as unknown as {
        __t0: number;
        __tLoaded: number;
        AtlasSearchData: unknown;
        AtlasFinder: { createFinder(d: unknown): { search(t: string, n: number): { total: number } } };
      };
      const t1 = performance.now();
      const finder = w.AtlasFinder.createFinder(w.AtlasSearchData);
      const indexMs = performance.now() - t1;
      const perQuery = queries.map((q) => {
        const times: number[] = [];
        let total = 0;
        for (let i = 0; i < repeat; i++) {
          const t = performance.now();
          total = finder.search(q, 25).total;
          times.push(performance.now() - t);
        }
        times.sort((a, b) => a - b);
        return { q, matches: total, first: times.length ? times[0]! : 0, median: times[Math.floor(times.length / 2)]!, worst: times[times.length - 1]! };
      });
      return { loadMs: w.__tLoaded - w.__t0, indexMs, perQuery };
    },
    { queries: QUERIES, repeat: REPEAT },
  );
  const gz = gzipSync(Buffer.from(script, "utf8"), { level: 9 }).length;
  console.log(`search-index.js: ${script.length} bytes, ${gz} bytes gzip (target < 1 MB)`);
  console.log(`script evaluation ${result.loadMs.toFixed(1)} ms; index built on first query in ${result.indexMs.toFixed(1)} ms`);
  for (const r of result.perQuery) console.log(`query ${JSON.stringify(r.q).padEnd(14)} ${String(r.matches).padStart(6)} matches  median ${r.median.toFixed(2)} ms  worst ${r.worst.toFixed(2)} ms`);
  const worst = Math.max(...result.perQuery.map((r) => r.worst));
  console.log(`worst query ${worst.toFixed(2)} ms (target < 50 ms)`);

  // --- field calculator: SublevelAtlas.at for the demo's cs133 and k40 ---
  const CALC_SPECIES = ["cs133", "k40"];
  const CALC_FIELDS = ["4.7 G", "0.37 T", "37 mG", "2.2 mT", "3 T", "12 G", "0.05 T", "1 G", "250 G", "7 kG", "0.9 T"];
  const folder = loadDataFolder(DEMO_DATA);
  const constants = editionByName(folder.site.constants)!;
  for (const id of CALC_SPECIES) {
    const input = folder.species.find((sp) => sp.id === id)!;
    const result = computeSpecies(input, constants);
    writeFileSync(join(dir, `${id}.js`), engineDataScript(engineData(result, computeFields(result, constants, folder.site.fields), constants, folder.site.fields)));
  }
  writeFileSync(
    join(dir, "calc.html"),
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>calculator bench</title>
${CALC_SPECIES.map((id) => `<script src="${id}.js"></script>`).join("")}<script src="assets/calculator.js"></script></head><body></body></html>`,
  );
  const calcPage = await ctx.newPage();
  await calcPage.goto(pathToFileURL(join(dir, "calc.html")).href);
  const calc = await calcPage.evaluate(
    ({ species, fields, repeat }) => {
      const at = (window as unknown as { SublevelAtlas: { at(id: string, f: string): unknown } }).SublevelAtlas.at;
      return species.map((id) => {
        let t = performance.now();
        at(id, fields[0]!);
        const first = performance.now() - t;
        const times: number[] = [];
        for (let r = 0; r < repeat; r++) {
          for (const f of fields) {
            t = performance.now();
            at(id, f);
            times.push(performance.now() - t);
          }
        }
        times.sort((a, b) => a - b);
        return { id, first, median: times[Math.floor(times.length / 2)]!, worst: times[times.length - 1]! };
      });
    },
    { species: CALC_SPECIES, fields: CALC_FIELDS, repeat: 5 },
  );
  for (const c of calc) {
    console.log(`calculator ${c.id.padEnd(6)} first answer ${c.first.toFixed(1)} ms (with preparation)  median ${c.median.toFixed(2)} ms  worst ${c.worst.toFixed(2)} ms (target < 50 ms)`);
  }
} finally {
  await ctx.close();
}
