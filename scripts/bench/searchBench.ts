/**
 * `npm run bench:search`: how the finder does at benchmark size, in Debian
 * Chromium. Builds the search script of a synthetic 100-species / 2,000-level
 * / 5,000-line atlas, loads it from disk in a page with the real finder
 * script, and prints the script's size (raw and gzip), the time the browser
 * takes to evaluate it and to build the index, and query times for typical
 * bench queries (median and worst of repeated runs). Targets (issue: search
 * stays instant): under 1 MB gzip, under 50 ms a query. Not a test: it prints.
 */
import { copyFileSync, mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { gzipSync } from "node:zlib";
import { searchData, searchIndexScript } from "../../src/site/searchIndex.js";
import { launchBrowser } from "../../test/support/browser.js";
import { ROOT, tempDir } from "../../test/support/runBuild.js";
import { syntheticSearchAtlas } from "./syntheticSearchAtlas.js";

const QUERIES = ["F=2", "mF=-1", "F=2 mF=1", "2P3/2", "²P₃/₂", "x42", "x7 L3", "L42", "780", "4p-P3/2", "3D5/2 F=3"];
const REPEAT = 15;

const dir = tempDir("atlas-search-bench-");
const script = searchIndexScript(searchData(syntheticSearchAtlas()));
writeFileSync(join(dir, "search-index.js"), script);
copyFileSync(join(ROOT, "node_modules/minisearch/dist/umd/index.js"), join(dir, "minisearch.js"));
copyFileSync(join(ROOT, "templates/assets/finder.js"), join(dir, "finder.js"));
writeFileSync(
  join(dir, "index.html"),
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>search bench</title>
<script>window.__t0 = performance.now();</script>
<script src="minisearch.js"></script><script src="search-index.js"></script>
<script>window.__tLoaded = performance.now();</script>
<script src="finder.js"></script></head><body data-root="./"></body></html>`,
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
        MiniSearch: unknown;
        AtlasFinder: { createFinder(d: unknown, m: unknown): { search(t: string, n: number): { total: number } } };
      };
      const t1 = performance.now();
      const finder = w.AtlasFinder.createFinder(w.AtlasSearchData, w.MiniSearch);
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
} finally {
  await ctx.close();
}
