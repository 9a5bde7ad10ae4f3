/**
 * `npm run build`: the command around src/build/build.ts. Reads the
 * environment, reports input problems, and cleans up on a signal.
 *
 * Environment: ATLAS_DATA (data folder, default "data"), ATLAS_OUT (output
 * folder, default "_site"), SOURCE_DATE_EPOCH (build date, for reproducible
 * builds), ATLAS_TIMINGS=1 (print `timing <phase> <ms>` lines to stderr),
 * ATLAS_DEBUG=1 (print the stack of an unexpected failure), ATLAS_CACHE
 * (cache folder, default .atlas-cache/ beside the output; "off" or 0 for none;
 * see src/build/cache.ts), ATLAS_WORKERS (threads for the species at most,
 * default the available parallelism; 1 builds in this thread).
 * Test only: ATLAS_FAULT=species (fail each species once its files are
 * written, in whichever thread builds it), render (fail after rendering),
 * selfcheck (corrupt the staged site so the self-checks fail), stall (stop
 * before the self-checks and wait to be signalled; prints "stalled" to
 * stderr), busy
 * (spin synchronously before the staging folder exists, as a long
 * computation does; prints "busy" to stderr).
 * Exit codes: 0 published; 1 input problems or a failed build or
 * self-check (the old output untouched); 130/143 interrupted (SIGINT/SIGTERM).
 */
import { rmSync } from "node:fs";
import { resolve } from "node:path";
import { InputProblems } from "../data/inputError.js";
import { buildDateFrom, buildSite, SelfCheckFailed } from "../build/build.js";
import { formatTimings } from "../build/timings.js";

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
  let handlers = false;
  const onStaging = (dir: string | null) => {
    staging = dir;
    // Handlers only from here: before it there is nothing to clean up, and the
    // default action stops a long synchronous computation at once, where a
    // handler would wait for it to finish.
    if (dir && !handlers) {
      handlers = true;
      for (const [sig, code] of [["SIGINT", 130], ["SIGTERM", 143]] as const) {
        process.on(sig, () => {
          cleanUp();
          process.stderr.write(`build interrupted (${sig}); ${out} left as it was\n`);
          process.exit(code);
        });
      }
    }
  };
  let built;
  try {
    const workers = /^\d+$/.test(process.env.ATLAS_WORKERS ?? "") ? Math.max(1, Number(process.env.ATLAS_WORKERS)) : undefined;
    built = await buildSite({ dataDir, out, buildDate: buildDateFrom(process.env), fault: process.env.ATLAS_FAULT ?? "", onStaging, cache: process.env.ATLAS_CACHE || undefined, workers });
  } catch (e) {
    cleanUp();
    if (e instanceof InputProblems) throw new BuildStop(`${e.format()}\n${e.problems.length} problem(s) in ${dataDir}; nothing was published.`);
    if (e instanceof SelfCheckFailed) throw new BuildStop(`self-check failed; ${out} left as it was:\n${e.problems.map((p) => `  ${p}`).join("\n")}`);
    throw new BuildStop(`build failed; ${out} left as it was:\n  ${e instanceof Error ? e.message : String(e)}`, { cause: e });
  }
  if (process.env.ATLAS_TIMINGS === "1") process.stderr.write(formatTimings() + "\n");
  process.stdout.write(`built ${built.species} species into ${out}${built.reused > 0 ? ` (${built.reused} from the cache)` : ""}\n`);
}

try {
  await main();
} catch (e) {
  cleanUp();
  // Timings of a failed build too: the benchmark reports how far it got.
  if (process.env.ATLAS_TIMINGS === "1") process.stderr.write(formatTimings() + "\n");
  const message = e instanceof Error ? e.message : String(e);
  process.stderr.write(e instanceof BuildStop ? `${message}\n` : `build failed: ${message}\n`);
  if (process.env.ATLAS_DEBUG === "1") {
    const inner = e instanceof BuildStop && e.cause instanceof Error ? e.cause : e;
    process.stderr.write(`${inner instanceof Error ? inner.stack : String(inner)}\n`);
  }
  process.exit(1);
}
