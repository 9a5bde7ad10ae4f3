/**
 * `npm run bench [-- options]`: how fast the real build is, measured the
 * way the targets are stated. A measuring script, not a test: it checks
 * nothing and its numbers depend on the machine (and on what else runs).
 *
 * 1. demo: the demo data folder (data/) built cold (no cache).
 * 2. set: a synthetic data folder (scripts/bench/syntheticData.ts; default
 *    100 species, 2,000 levels, 5,000 lines, 7 fields) built cold with the
 *    real build command (src/cli/build.ts) under /usr/bin/time -v (peak
 *    RSS), with ATLAS_TIMINGS=1 for the split into phases.
 * 3. rebuild: one species of the set edited, built again (the cache from 2
 *    restores the others).
 * 4. floor: a throwaway Eleventy project with one static template per file
 *    the set's build wrote, each of the same byte size and with no tags,
 *    loops or data, built by Eleventy's own command; the ratio of 2 to it.
 * 5. twice the set (species, levels and lines doubled) built cold: its time
 *    against the set's.
 *
 * Each build runs with SOURCE_DATE_EPOCH set and its own output and cache
 * folders in a temporary folder, from a copy of the code taken when the
 * bench starts: by default the last commit (`git archive HEAD`), with
 * `--code tree` the working tree as it is (src/, templates/, schema/,
 * data/ and the project files), node_modules linked. Edits made while the
 * bench runs would otherwise change the code version between the builds and
 * empty the cache before the rebuild is measured. `--code live` builds the
 * working tree itself. A build that fails (for example a
 * self-check refusing a page) is reported with its time, memory and first
 * messages, and the figures that need its output are skipped.
 *
 * Options: --species N, --levels N, --lines N (default 20 levels and 50
 * lines per species), --fields N, --scale X (multiplies species, levels and
 * lines of the set), --no-demo, --no-rebuild, --no-floor, --no-double,
 * --workers N (ATLAS_WORKERS of every build), --code head|tree|live, --profile (CPU profiles of the
 * set's build, into --profile-dir DIR or <tmp>/atlas-bench-profile;
 * summarize with scripts/bench/profileTop.ts), --keep (keep the temporary
 * folders).
 */
import { spawnSync } from "node:child_process";
import { cpSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, symlinkSync, writeFileSync } from "node:fs";
import { availableParallelism, cpus, tmpdir, totalmem } from "node:os";
import { dirname, join, relative, resolve, sep } from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import { packIndex } from "../../src/build/cache.js";
import { parseTimings } from "../../src/build/timings.js";
import { writeSyntheticData, type SyntheticSize } from "./syntheticData.js";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const TIME = "/usr/bin/time";
const EPOCH = "1798761600";

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
  /** user + system CPU seconds of the process and its threads (from /usr/bin/time). */
  cpuS: number | null;
  peakRssMB: number | null;
  stdout: string;
  stderr: string;
}

/** Run a command, under /usr/bin/time -v when present, returning wall time, CPU time and peak RSS. */
function measured(cmd: string, args: string[], env: NodeJS.ProcessEnv, cwd: string): Run {
  const useTime = existsSync(TIME);
  const t0 = performance.now();
  const r = spawnSync(useTime ? TIME : cmd, useTime ? ["-v", cmd, ...args] : args, { cwd, env, encoding: "utf8", maxBuffer: 1 << 28 });
  const wallS = (performance.now() - t0) / 1000;
  const err = r.stderr ?? "";
  const rss = /Maximum resident set size \(kbytes\): (\d+)/.exec(err);
  const user = /User time \(seconds\): ([\d.]+)/.exec(err);
  const sys = /System time \(seconds\): ([\d.]+)/.exec(err);
  return {
    code: r.status,
    wallS,
    cpuS: user && sys ? Number(user[1]) + Number(sys[1]) : null,
    peakRssMB: rss ? Number(rss[1]) / 1024 : null,
    stdout: r.stdout ?? "",
    stderr: err,
  };
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

const say = (k: string, v: string): void => void process.stdout.write(`${k}: ${v}\n`);
const s2 = (x: number): string => `${x.toFixed(2)} s`;
const mb = (r: Run): string => (r.peakRssMB === null ? "unknown (no /usr/bin/time)" : `${r.peakRssMB.toFixed(0)} MB`);
const cpu = (r: Run): string => (r.cpuS === null ? "" : `, CPU ${s2(r.cpuS)}`);

/** The code the builds run: the working tree, or a copy of it taken now. */
let CODE = ROOT;

const CODE_PARTS = ["src", "templates", "schema", "data", "package.json", "package-lock.json", ".eleventy.js", "tsconfig.json"];

/** Copy the code (the last commit, or the working tree) into `to`. */
function copyCode(to: string, from: "head" | "tree"): string {
  mkdirSync(to, { recursive: true });
  if (from === "head") {
    const tar = join(to, "..", "code.tar");
    const archive = spawnSync("git", ["archive", "--format=tar", `--output=${tar}`, "HEAD", ...CODE_PARTS], { cwd: ROOT, encoding: "utf8" });
    if (archive.status !== 0) throw new Error(`git archive failed: ${archive.stderr}`);
    const untar = spawnSync("tar", ["-xf", tar, "-C", to], { encoding: "utf8" });
    if (untar.status !== 0) throw new Error(`tar failed: ${untar.stderr}`);
    rmSync(tar);
  } else {
    for (const name of CODE_PARTS) if (existsSync(join(ROOT, name))) cpSync(join(ROOT, name), join(to, name), { recursive: true });
  }
  symlinkSync(join(ROOT, "node_modules"), join(to, "node_modules"), "dir");
  const rev = spawnSync("git", ["rev-parse", "--short", "HEAD"], { cwd: ROOT, encoding: "utf8" }).stdout.trim();
  return from === "head" ? `commit ${rev}` : `working tree at commit ${rev}, with its uncommitted edits`;
}

/** The real build command of `data` into `out` (its cache beside `out`). */
function build(data: string, out: string, extraNodeArgs: string[] = []): Run {
  const env: NodeJS.ProcessEnv = { ...process.env, ATLAS_DATA: data, ATLAS_OUT: out, ATLAS_TIMINGS: "1", SOURCE_DATE_EPOCH: EPOCH };
  delete env.ATLAS_CACHE;
  if (arg("workers")) env.ATLAS_WORKERS = arg("workers");
  return measured(process.execPath, [...extraNodeArgs, "--import", "tsx", join(CODE, "src/cli/build.ts")], env, CODE);
}

/** Why a build failed, in a few lines (the build's own messages). */
function failure(r: Run): string {
  const lines = r.stderr.split("\n").filter((l) => l && !l.startsWith("\t") && !/^\s*(Command being timed|User time|System time|Percent of CPU|Elapsed|Average|Maximum|Major|Minor|Voluntary|Involuntary|Swaps|File system|Socket|Signals|Page size|Exit status)/.test(l) && !l.startsWith("timing "));
  const shown = lines.slice(0, 4).map((l) => `    ${l}`);
  return `exit code ${r.code}\n${shown.join("\n")}${lines.length > 4 ? `\n    … ${lines.length - 4} more line(s)` : ""}`;
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
  const code = arg("code") ?? "head";
  if (code !== "head" && code !== "tree" && code !== "live") throw new Error(`--code takes head, tree or live, not ${code}`);
  let what = "the working tree itself";
  if (code !== "live") {
    CODE = join(work, "code");
    what = copyCode(CODE, code);
  }
  say("code", what);
  say("machine", `${cpus()[0]?.model.trim() ?? "unknown CPU"}, ${availableParallelism()} threads, ${(totalmem() / 2 ** 30).toFixed(1)} GiB, Node ${process.version}`);

  // 1. The demo, cold.
  if (!flag("no-demo")) {
    const demo = build(join(CODE, "data"), join(work, "demo", "_site"));
    if (demo.code === 0) say("demo cold build", `${s2(demo.wallS)} (peak RSS ${mb(demo)}${cpu(demo)}; target < 3 s)`);
    else say("demo cold build", `failed after ${s2(demo.wallS)}: ${failure(demo)}`);
  }

  // 2. The set, cold.
  const data = join(work, "data");
  const out = join(work, "set", "_site");
  const t0 = performance.now();
  writeSyntheticData(data, size);
  say("size", `${size.species} species, ${size.levels} levels, ${size.lines} lines, ${size.fields} fields (generated in ${((performance.now() - t0) / 1000).toFixed(1)} s)`);
  const profileDir = resolve(arg("profile-dir") ?? join(tmpdir(), "atlas-bench-profile"));
  const set = build(data, out, flag("profile") ? ["--cpu-prof", `--cpu-prof-dir=${profileDir}`] : []);
  const ok = set.code === 0;
  say("wall time", ok ? s2(set.wallS) : `${s2(set.wallS)} until the build failed: ${failure(set)}`);
  say("peak RSS", `${mb(set)}${cpu(set)}`);
  const t = parseTimings(set.stderr);
  const ms = (k: string): number => t.get(k) ?? 0;
  const sec = (k: string): string => s2(ms(k) / 1000);
  let files: string[] = [];
  const sizes = new Map<string, number>();
  if (ok) {
    files = filesUnder(out);
    for (const f of files) sizes.set(f, statSync(join(out, f)).size);
    const pages = files.filter((f) => f.endsWith(".html"));
    const total = [...sizes.values()].reduce((a, b) => a + b, 0);
    const htmlBytes = pages.reduce((a, p) => a + sizes.get(p)!, 0);
    say("pages", `${pages.length} HTML pages, ${files.length} files`);
    say("total bytes", `${total} (${(total / 1e6).toFixed(1)} MB; HTML ${(htmlBytes / 1e6).toFixed(1)} MB; largest page ${(Math.max(0, ...pages.map((p) => sizes.get(p)!)) / 1e3).toFixed(0)} kB)`);
  }
  say("loading", sec("load"));
  say("species", `${sec("species")} wall; summed over the threads that built them: physics ${sec("physics")}, page models ${sec("views")}, rendering ${sec("render")}, writing ${s2((ms("write") + ms("export")) / 1000)}`);
  say("site pages", `${s2((ms("site") + ms("search") + ms("bundle")) / 1000)} (Eleventy, search index, browser scripts)`);
  say("anchors manifest", sec("anchors"));
  say("self-checks", sec("check"));
  say("publish", sec("publish"));
  const accounted = ms("load") + ms("species") + ms("site") + ms("search") + ms("bundle") + ms("anchors") + ms("check") + ms("publish");
  say("start-up and rest", `${s2(Math.max(0, set.wallS - accounted / 1000))} (node, tsx, Eleventy configuration)`);
  if (flag("profile")) say("profile", profileDir);

  // 3. One species edited, rebuilt with the cache of 2.
  if (!flag("no-rebuild")) {
    // The species of median file size: a typical one, not the largest or the smallest.
    const names = readdirSync(join(data, "species")).sort((a, b) => statSync(join(data, "species", a)).size - statSync(join(data, "species", b)).size || (a < b ? -1 : 1));
    const edited = names[Math.floor((names.length - 1) / 2)]!;
    const file = join(data, "species", edited);
    writeFileSync(file, readFileSync(file, "utf8").replace(`notes: "Generated for timing the build."`, `notes: "Generated for timing the build; edited."`));
    const re = build(data, out);
    const rt = parseTimings(re.stderr);
    const restored = `restoring from the cache ${s2((rt.get("cache") ?? 0) / 1000)}, computing ${s2((rt.get("physics") ?? 0) / 1000)} physics`;
    if (re.code === 0) {
      const from = /\((\d+) from the cache\)/.exec(re.stdout)?.[1] ?? "0";
      say("rebuild after editing one species", `${s2(re.wallS)} (${edited} edited, ${from} species from the cache: ${restored}; peak RSS ${mb(re)}${cpu(re)}; target < 5 s)`);
    } else say("rebuild after editing one species", `${s2(re.wallS)} until the build failed (${edited} edited; ${restored}${cpu(re)}): ${failure(re)}`);
  }

  // 4. The floor: the same rendered files from static templates (only their sizes are kept; the set's folders go first, to spare the disk).
  let from = "";
  if (!ok) {
    // Refused builds publish nothing; their cache entries list every species file and its size.
    const packs = join(work, "set", ".atlas-cache", "species");
    for (const name of existsSync(packs) ? readdirSync(packs).filter((n) => n.endsWith(".pack")) : []) {
      for (const [f, n] of packIndex(join(packs, name))?.files ?? []) sizes.set(f, n);
    }
    files = [...sizes.keys()].sort();
    from = " (species files as listed by the refused builds' cache; site-wide pages left out)";
  }
  rmSync(join(work, "set"), { recursive: true, force: true });
  if (!flag("no-floor")) {
    if (files.length === 0) say("floor", "not measured: the set's build left no files to copy");
    else {
      const floor = join(work, "floor");
      mkdirSync(join(floor, "src"), { recursive: true });
      writeFileSync(join(floor, "eleventy.config.js"), "export default function () { return { templateFormats: ['njk'], htmlTemplateEngine: false }; }\n");
      let i = 0;
      for (const f of files) {
        if (PASSTHROUGH.test(f)) continue;
        writeFileSync(join(floor, "src", `t${i++}.njk`), `---\npermalink: "${f}"\n---\n${filler(sizes.get(f)!)}`);
      }
      const floorRun = measured(process.execPath, [join(CODE, "node_modules/@11ty/eleventy/cmd.cjs"), "--input=src", "--output=out", "--config=eleventy.config.js", "--quiet"], { ...process.env }, floor);
      if (floorRun.code !== 0) say("floor", `failed: ${failure(floorRun)}`);
      else {
        const floorFiles = filesUnder(join(floor, "out"));
        const floorBytes = floorFiles.reduce((a, f) => a + statSync(join(floor, "out", f)).size, 0);
        say("floor", `${s2(floorRun.wallS)} for ${floorFiles.length} static files, ${floorBytes} bytes (Eleventy, no loops, no physics; peak RSS ${mb(floorRun)})${from}`);
        say("ratio to floor", `${(set.wallS / floorRun.wallS).toFixed(2)}`);
      }
      rmSync(floor, { recursive: true, force: true });
    }
  }

  // 5. Twice the set, cold.
  if (!flag("no-double")) {
    const double: SyntheticSize = { ...size, species: size.species * 2, levels: size.levels * 2, lines: size.lines * 2 };
    const data2 = join(work, "data-2x");
    writeSyntheticData(data2, double);
    const two = build(data2, join(work, "set-2x", "_site"));
    const head = `${double.species} species, ${double.levels} levels, ${double.lines} lines`;
    // CPU time as well as wall time: on a shared machine the wall-time ratio moves with what else runs.
    const ratio = `${(two.wallS / set.wallS).toFixed(2)} × the set's wall time${two.cpuS !== null && set.cpuS ? `, ${(two.cpuS / set.cpuS).toFixed(2)} × its CPU time` : ""}`;
    say(
      "twice the set",
      two.code === 0
        ? `${s2(two.wallS)} for ${head} (peak RSS ${mb(two)}${cpu(two)}; ${ratio}; target ≤ 2)`
        : `${s2(two.wallS)} for ${head} until the build failed (peak RSS ${mb(two)}${cpu(two)}; ${ratio}): ${failure(two)}`,
    );
  }
}

main();
