/**
 * `npm run build`: validate the data folder, compute, render with Eleventy
 * into a staging folder, self-check it, and only then publish it as _site/.
 *
 * Environment: ATLAS_DATA (data folder, default "data"), ATLAS_OUT (output
 * folder, default "_site"), SOURCE_DATE_EPOCH (build date, for reproducible
 * builds), ATLAS_TIMINGS=1 (print `timing <phase> <ms>` lines to stderr),
 * ATLAS_DEBUG=1 (print the stack of an unexpected failure).
 * Test only: ATLAS_FAULT=render (fail after rendering), selfcheck (corrupt
 * the staged site so the self-checks fail), stall (stop before the
 * self-checks and wait to be signalled; prints "stalled" to stderr), busy
 * (spin synchronously before the staging folder exists, as a long
 * computation does; prints "busy" to stderr).
 * Exit codes: 0 published; 1 input problems or a failed build or
 * self-check (the old output untouched); 130/143 interrupted (SIGINT/SIGTERM).
 */
import { appendFileSync, rmSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { InputProblems } from "../data/inputError.js";
import { buildDateFrom, loadAtlas } from "../site/loadAtlas.js";
import { makeStagingDir, publish, recoverInterrupted } from "./publish.js";
import { writeAnchors } from "./anchors.js";
import { selfCheck } from "./selfCheck.js";
import { formatTimings, timed, timedAsync } from "./timings.js";
import { bundleBrowser } from "../build/bundleBrowser.js";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");

/** Thrown to stop the build with a message for the user (no stack trace). */
class BuildStop extends Error {}

let staging: string | null = null;
const cleanUp = (): void => {
  if (staging) rmSync(staging, { recursive: true, force: true });
  staging = null;
};

async function main(): Promise<void> {
  const dataDir = resolve(process.env.ATLAS_DATA || "data");
  const out = resolve(process.env.ATLAS_OUT || "_site");
  const buildDate = buildDateFrom(process.env);
  const fault = process.env.ATLAS_FAULT ?? "";

  recoverInterrupted(out);

  let atlas;
  try {
    atlas = loadAtlas({ dataDir, buildDate });
  } catch (e) {
    if (e instanceof InputProblems) throw new BuildStop(`${e.format()}\n${e.problems.length} problem(s) in ${dataDir}; nothing was published.`);
    throw e;
  }

  if (fault === "busy") {
    // Stands for a long synchronous computation (physics of a large data set).
    process.stderr.write("busy before staging\n");
    for (;;);
  }
  staging = makeStagingDir(out);
  // Handlers only from here: before it there is nothing to clean up, and the
  // default action stops a long synchronous computation at once, where a
  // handler would wait for it to finish.
  for (const [sig, code] of [["SIGINT", 130], ["SIGTERM", 143]] as const) {
    process.on(sig, () => {
      cleanUp();
      process.stderr.write(`build interrupted (${sig}); ${out} left as it was\n`);
      process.exit(code);
    });
  }

  try {
    process.env.ATLAS_DATA = dataDir;
    process.chdir(ROOT);
    const { default: Eleventy } = await import("@11ty/eleventy");
    const eleventy = new Eleventy(resolve(ROOT, "templates"), staging, {
      configPath: resolve(ROOT, ".eleventy.js"),
      quietMode: true,
    });
    await timedAsync("render", () => eleventy.write());
    const bundleInto = staging;
    timed("bundle", () => bundleBrowser(bundleInto));
    if (fault === "render") throw new Error("rendering failed (ATLAS_FAULT=render)");
    if (fault === "selfcheck") appendFileSync(join(staging, "index.html"), '<p id="fault"></p><p id="fault"></p>\n');
    if (fault === "stall") {
      process.stderr.write(`stalled with staging folder ${staging}\n`);
      await new Promise(() => setInterval(() => {}, 1 << 30));
    }
    const stagedAt = staging;
    timed("anchors", () => writeAnchors(stagedAt));
    const problems = timed("check", () => selfCheck(stagedAt, atlas));
    if (problems.length > 0) {
      throw new BuildStop(`self-check failed; ${out} left as it was:\n${problems.map((p) => `  ${p}`).join("\n")}`);
    }
    timed("publish", () => publish(stagedAt, out));
    staging = null;
  } catch (e) {
    cleanUp();
    if (e instanceof BuildStop) throw e;
    throw new BuildStop(`build failed; ${out} left as it was:\n  ${e instanceof Error ? e.message : String(e)}`, { cause: e });
  }
  if (process.env.ATLAS_TIMINGS === "1") process.stderr.write(formatTimings() + "\n");
  process.stdout.write(`built ${atlas.species.length} species into ${out}\n`);
}

try {
  await main();
} catch (e) {
  cleanUp();
  const message = e instanceof Error ? e.message : String(e);
  process.stderr.write(e instanceof BuildStop ? `${message}\n` : `build failed: ${message}\n`);
  if (process.env.ATLAS_DEBUG === "1") {
    const inner = e instanceof BuildStop && e.cause instanceof Error ? e.cause : e;
    process.stderr.write(`${inner instanceof Error ? inner.stack : String(inner)}\n`);
  }
  process.exit(1);
}
