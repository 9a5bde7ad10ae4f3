/**
 * `npm run bench [-- options]`: how fast the real build is at a chosen size,
 * and how that compares with the least Eleventy can do for the same output.
 * A measuring script, not a test: it checks nothing and its numbers depend
 * on the machine.
 *
 * 1. Writes a synthetic data folder (scripts/bench/syntheticData.ts):
 *    default 100 species, 2,000 levels, 5,000 lines, 7 fields.
 * 2. Builds it with the real build command (src/cli/build.ts) under
 *    /usr/bin/time -v (peak RSS), with ATLAS_TIMINGS=1 for the split into
 *    loading, physics, site model, rendering + writing, self-checks, publish.
 * 3. Estimates the bare writing cost by writing the same files again.
 * 4. The floor: a throwaway Eleventy project with one static template per
 *    file the real templates wrote, each of the same byte size and with no
 *    tags, loops or data, built by Eleventy's own command; prints the ratio.
 *
 * Options: --species N, --levels N, --lines N (default 20 levels and 50
 * lines per species), --fields N, --scale X (multiplies species, levels and
 * lines), --profile (also writes a CPU profile of the build, into
 * --profile-dir DIR or <tmp>/atlas-bench-profile; summarize it with
 * scripts/bench/profileTop.ts), --keep (keep the temporary folders).
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, relative, resolve, sep } from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import { parseTimings } from "../../src/build/timings.js";
import { writeSyntheticData, type SyntheticSize } from "./syntheticData.js";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const TIME = "/usr/bin/time";

function arg(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}
const flag = (name: string): boolean => process.argv.includes(`--${name}`);

export function sizeFromArgs(): SyntheticSize {
  const scale = Number(arg("scale") ?? 1);
  const species = Math.max(1, Math.round(Number(arg("species") ?? 100) * scale));
  const levels = Math.round(Number(arg("levels") ?? (arg("species") ? species * 20 : 2000 * scale)) * (arg("levels") ? scale : 1));
  const lines = Math.round(Number(arg("lines") ?? (arg("species") ? species * 50 : 5000 * scale)) * (arg("lines") ? scale : 1));
  return { species, levels, lines, fields: Number(arg("fields") ?? 7) };
}

interface Run {
  code: number | null;
  wallS: number;
  peakRssMB: number | null;
  stdout: string;
  stderr: string;
}

/** Run a command, under /usr/bin/time -v when present, returning wall time and peak RSS. */
function measured(cmd: string, args: string[], env: NodeJS.ProcessEnv, cwd: string): Run {
  const useTime = existsSync(TIME);
  const t0 = performance.now();
  const r = spawnSync(useTime ? TIME : cmd, useTime ? ["-v", cmd, ...args] : args, { cwd, env, encoding: "utf8", maxBuffer: 1 << 28 });
  const wallS = (performance.now() - t0) / 1000;
  const rss = /Maximum resident set size \(kbytes\): (\d+)/.exec(r.stderr ?? "");
  return { code: r.status, wallS, peakRssMB: rss ? Number(rss[1]) / 1024 : null, stdout: r.stdout ?? "", stderr: r.stderr ?? "" };
}

function filesUnder(root: string): string[] {
  const out: string[] = [];
  const walk = (dir: string): void => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else out.push(relative(root, p).split(sep).join("/"));
    }
  };
  walk(root);
  return out.sort();
}

/** Files the build copies verbatim rather than rendering (see src/site/eleventyPlugin.ts). */
const PASSTHROUGH = /^(assets|schema)\//;

/** A static template of exactly `bytes` output bytes: no tags, no data, no loops. */
function filler(bytes: number): string {
  const unit = "<p>Static text of the same size as the real page.</p>\n";
  return unit.repeat(Math.floor(bytes / unit.length)) + "x".repeat(bytes % unit.length);
}

function main(): void {
  const size = sizeFromArgs();
  const work = mkdtempSync(join(tmpdir(), "atlas-bench-"));
  try {
    run(size, work);
  } finally {
    if (flag("keep")) process.stdout.write(`kept: ${work}\n`);
    else rmSync(work, { recursive: true, force: true });
  }
}

function run(size: SyntheticSize, work: string): void {
  const data = join(work, "data");
  const out = join(work, "_site");
  const t0 = performance.now();
  writeSyntheticData(data, size);
  const genS = (performance.now() - t0) / 1000;
  const say = (k: string, v: string): void => void process.stdout.write(`${k}: ${v}\n`);
  say("size", `${size.species} species, ${size.levels} levels, ${size.lines} lines, ${size.fields} fields (generated in ${genS.toFixed(1)} s)`);

  const profileDir = resolve(arg("profile-dir") ?? join(tmpdir(), "atlas-bench-profile"));
  const nodeArgs = [...(flag("profile") ? ["--cpu-prof", `--cpu-prof-dir=${profileDir}`] : []), "--import", "tsx", join(ROOT, "src/cli/build.ts")];
  const build = measured(process.execPath, nodeArgs, { ...process.env, ATLAS_DATA: data, ATLAS_OUT: out, ATLAS_TIMINGS: "1", SOURCE_DATE_EPOCH: "1798761600" }, ROOT);
  if (build.code !== 0) {
    process.stderr.write(build.stderr.slice(-20_000));
    throw new Error(`build failed with exit code ${build.code} after ${build.wallS.toFixed(1)} s, peak RSS ${build.peakRssMB?.toFixed(0) ?? "unknown"} MB`);
  }
  const t = parseTimings(build.stderr);
  const files = filesUnder(out);
  const pages = files.filter((f) => f.endsWith(".html"));
  const sizes = new Map(files.map((f) => [f, statSync(join(out, f)).size]));
  const total = [...sizes.values()].reduce((a, b) => a + b, 0);
  const htmlBytes = pages.reduce((a, p) => a + sizes.get(p)!, 0);

  // Bare writing: the same bytes into a fresh folder, synchronously.
  const copy = join(work, "write-copy");
  const w0 = performance.now();
  for (const f of files) {
    mkdirSync(dirname(join(copy, f)), { recursive: true });
    writeFileSync(join(copy, f), readFileSync(join(out, f)));
  }
  const writeMs = performance.now() - w0;

  say("wall time", `${build.wallS.toFixed(2)} s`);
  say("peak RSS", build.peakRssMB === null ? "unknown (no /usr/bin/time)" : `${build.peakRssMB.toFixed(0)} MB`);
  say("pages", `${pages.length} HTML pages, ${files.length} files`);
  say("total bytes", `${total} (${(total / 1e6).toFixed(1)} MB; HTML ${(htmlBytes / 1e6).toFixed(1)} MB)`);
  const ms = (k: string): number => t.get(k) ?? 0;
  const physics = ms("physics");
  say("loading", `${(ms("load") / 1000).toFixed(2)} s`);
  say("physics", `${(physics / 1000).toFixed(2)} s`);
  say("site model", `${(Math.max(0, ms("compute") - physics) / 1000).toFixed(2)} s (page models, CSV and JSON text)`);
  say("rendering", `${(Math.max(0, ms("render") - writeMs) / 1000).toFixed(2)} s (Eleventy, less the writing estimate)`);
  say("writing", `${(writeMs / 1000).toFixed(2)} s (estimate: the same files written again)`);
  say("anchors manifest", `${(ms("anchors") / 1000).toFixed(2)} s`);
  say("self-checks", `${(ms("check") / 1000).toFixed(2)} s`);
  say("publish", `${(ms("publish") / 1000).toFixed(2)} s`);
  const accounted = ms("load") + ms("compute") + ms("render") + ms("anchors") + ms("check") + ms("publish");
  say("start-up and rest", `${Math.max(0, build.wallS - accounted / 1000).toFixed(2)} s (node, tsx, Eleventy configuration)`);

  // The floor: the same rendered files from static templates.
  const floor = join(work, "floor");
  mkdirSync(join(floor, "src"), { recursive: true });
  writeFileSync(join(floor, "eleventy.config.js"), "export default function () { return { templateFormats: ['njk'], htmlTemplateEngine: false }; }\n");
  let i = 0;
  for (const f of files) {
    if (PASSTHROUGH.test(f)) continue;
    writeFileSync(join(floor, "src", `t${i++}.njk`), `---\npermalink: "${f}"\n---\n${filler(sizes.get(f)!)}`);
  }
  const floorRun = measured(process.execPath, [join(ROOT, "node_modules/@11ty/eleventy/cmd.cjs"), "--input=src", "--output=out", "--config=eleventy.config.js", "--quiet"], { ...process.env }, floor);
  if (floorRun.code !== 0) {
    process.stderr.write(floorRun.stderr);
    throw new Error(`floor build failed with exit code ${floorRun.code}`);
  }
  const floorFiles = filesUnder(join(floor, "out"));
  const floorBytes = floorFiles.reduce((a, f) => a + statSync(join(floor, "out", f)).size, 0);
  say("floor", `${floorRun.wallS.toFixed(2)} s for ${floorFiles.length} static files, ${floorBytes} bytes (Eleventy, no loops, no physics)`);
  say("ratio to floor", `${(build.wallS / floorRun.wallS).toFixed(2)}`);
  if (flag("profile")) say("profile", profileDir);
}

main();
