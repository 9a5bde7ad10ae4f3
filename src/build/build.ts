/**
 * The build, in one place and in order:
 *
 *   load     validate the whole data folder; every problem reported before anything is written
 *   species  for each species: compute → page view models → render → write → release (speciesBuild.ts)
 *   site     the site-wide pages through Eleventy, from a small summary; search index; browser scripts
 *   check    anchors manifest and self-checks over the staged files
 *   publish  the staging folder renamed into place (publish.ts)
 *
 * Memory holds one species' results and pages at a time, plus the small
 * summaries of the species done so far.
 */
import { mkdirSync, writeFileSync, appendFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { editionByName } from "../physics/constants/editions.js";
import { tableCsv } from "../site/csv.js";
import { publicBase } from "../site/publicBase.js";
import { constantsSearch, mergeSearchData, searchIndexScript } from "../site/searchIndex.js";
import { sheetAddress } from "../site/sheet.js";
import { constantsTable, siteFrameParts, type SiteSummary } from "../site/siteSummary.js";
import { buildAllSpecies } from "./allSpecies.js";
import { writeAnchors } from "./anchors.js";
import { bundleBrowser } from "./bundleBrowser.js";
import { cacheRoot, codeVersion, packDir, pruneCache, sentinelFor } from "./cache.js";
import { loadWithSnapshot } from "./dataSnapshot.js";
import { ROOT } from "./paths.js";
import { makeStagingDir, publish, recoverInterrupted } from "./publish.js";
import { selfCheck } from "./selfCheck.js";
import type { SiteFrame } from "./speciesBuild.js";
import { timed, timedAsync } from "./timings.js";

export interface BuildOptions {
  dataDir: string;
  out: string;
  /** ISO date-time shown as the build date. */
  buildDate: string;
  /** Test-only fault injection (see src/cli/build.ts). */
  fault?: string;
  /** Told the staging folder as soon as it exists (for clean-up on a signal). */
  onStaging?: (dir: string | null) => void;
  /** The cache folder (ATLAS_CACHE): a path, "off", or unset for `.atlas-cache/` beside the output (see cache.ts). */
  cache?: string;
  /** Threads for the species at most (ATLAS_WORKERS); default: the machine's available parallelism. */
  workers?: number;
}

export interface BuildResult {
  species: number;
  /** Species computed by this build, and species restored from the cache. */
  computed: number;
  reused: number;
}

/** Thrown when the self-checks refuse the staged site. */
export class SelfCheckFailed extends Error {
  constructor(readonly problems: string[]) {
    super(`self-check failed:\n${problems.map((p) => `  ${p}`).join("\n")}`);
  }
}

/** The build date: SOURCE_DATE_EPOCH (seconds) when set, so builds can be reproduced; else now. */
export function buildDateFrom(env: NodeJS.ProcessEnv, now: () => Date = () => new Date()): string {
  const epoch = env.SOURCE_DATE_EPOCH;
  if (epoch !== undefined && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString();
  return now().toISOString();
}

export async function buildSite(opts: BuildOptions): Promise<BuildResult> {
  const started = Date.now();
  const out = resolve(opts.out);
  recoverInterrupted(out);
  const cache = cacheRoot(out, opts.cache);
  const packs = cache ? packDir(cache) : null;
  if (packs) pruneCache(packs, {});

  // --- load: throws InputProblems before anything is written ---
  const { folder, snapshot } = timed("load", () => loadWithSnapshot(opts.dataDir));
  const constants = editionByName(folder.site.constants)!; // the data layer checked the name
  const fields = folder.site.fields.map((f) => ({ text: f.text, tesla: f.tesla.toString() }));
  const siteUrl = publicBase(folder.site.siteUrl, folder.site.pathPrefix);
  const build = { date: opts.buildDate, constantsEdition: constants.edition, dataVersion: folder.dataVersion };
  const frame: SiteFrame = { title: folder.site.title, lab: folder.site.lab, build, sheets: siteFrameParts(constants, fields) };

  if (opts.fault === "busy") {
    // Stands for a long synchronous computation (physics of a large data set).
    process.stderr.write("busy before staging\n");
    for (;;);
  }

  const staging = makeStagingDir(out);
  opts.onStaging?.(staging);
  const write = (path: string, text: string) => {
    const file = join(staging, path);
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, text);
  };

  // Eleventy loads (a second or so) while the species are built: the main thread mostly waits for workers then.
  const eleventy = import("@11ty/eleventy");
  eleventy.catch(() => {}); // a failure is reported where it is awaited
  // --- species: restored from the cache, or computed in worker threads (allSpecies.ts); sorted by id ---
  const species = await timedAsync("species", () =>
    buildAllSpecies(folder, snapshot, {
      setup: { staging, packs, constants: constants.edition, fields, siteUrl, frame, sentinel: packs ? sentinelFor(build) : null, fault: opts.fault },
      settings: { code: packs ? codeVersion() : "", title: folder.site.title, lab: folder.site.lab, siteUrl: folder.site.siteUrl, pathPrefix: folder.site.pathPrefix, constants: constants.edition, fields },
      workers: opts.workers,
    }),
  );
  const summaries = species.summaries;

  // --- site-wide pages, from the summary ---
  const summary: SiteSummary = {
    title: folder.site.title,
    lab: folder.site.lab,
    siteUrl,
    pathPrefix: folder.site.pathPrefix,
    build,
    constants: { edition: constants.edition, reference: constants.reference },
    constantsTable: constantsTable(constants),
    fields,
    species: summaries.map(({ id, label, url, exportUrl, summary, sheet }) => ({ id, label, url, exportUrl, summary, sheet })),
    sheets: { ...frame.sheets, all: summaries.map((s) => s.sheet), allAddress: sheetAddress(siteUrl, "sheet/") },
  };
  write(summary.constantsTable.csvPath, tableCsv(summary.constantsTable));
  write("assets/search-index.js", timed("search", () => searchIndexScript(mergeSearchData(summaries.map((s) => s.search), constantsSearch(summary.constantsTable)))));
  await timedAsync("site", () => renderSitePages(staging, summary, eleventy));
  timed("bundle", () => bundleBrowser(staging));

  if (opts.fault === "render") throw new Error("rendering failed (ATLAS_FAULT=render)");
  if (opts.fault === "selfcheck") appendFileSync(join(staging, "index.html"), '<p id="fault"></p><p id="fault"></p>\n');
  if (opts.fault === "stall") {
    process.stderr.write(`stalled with staging folder ${staging}\n`);
    await new Promise(() => setInterval(() => {}, 1 << 30));
  }

  // --- check, then publish ---
  timed("anchors", () => writeAnchors(staging));
  const problems = timed("check", () => selfCheck(staging, summary));
  if (problems.length > 0) throw new SelfCheckFailed(problems);
  timed("publish", () => publish(staging, out));
  opts.onStaging?.(null);
  if (packs) pruneCache(packs, { keep: species.keys, since: started });
  return { species: summaries.length, computed: species.computed, reused: species.reused };
}

/** Eleventy renders templates/*.njk (index, constants, methods, all-species sheet) and copies the assets. */
async function renderSitePages(staging: string, summary: SiteSummary, module: Promise<typeof import("@11ty/eleventy")>): Promise<void> {
  const { default: Eleventy } = await module;
  // Passthrough copies (templates/assets, schema) are named from the repository root.
  process.chdir(ROOT);
  const eleventy = new Eleventy(join(ROOT, "templates"), staging, {
    configPath: join(ROOT, ".eleventy.js"),
    quietMode: true,
    config: (eleventyConfig: { addGlobalData(name: string, value: unknown): void }) => {
      eleventyConfig.addGlobalData("atlas", summary);
    },
  });
  await eleventy.write();
}
