/**
 * `npm run build`: validate the data folder, compute, render with Eleventy
 * into a staging folder, self-check it, and only then publish it as _site/.
 *
 * Environment: ATLAS_DATA (data folder, default "data"), ATLAS_OUT (output
 * folder, default "_site"), SOURCE_DATE_EPOCH (build date, for reproducible
 * builds). Exit codes: 0 published; 1 input problems or a failed build or
 * self-check (the old output untouched); 130/143 interrupted.
 */
import { rmSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { InputProblems } from "../data/inputError.js";
import { buildDateFrom, loadAtlas } from "../site/loadAtlas.js";
import { makeStagingDir, publish, recoverInterrupted } from "./publish.js";
import { writeAnchors } from "./anchors.js";
import { selfCheck } from "./selfCheck.js";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");

function fail(message: string): never {
  process.stderr.write(message.endsWith("\n") ? message : message + "\n");
  process.exit(1);
}

async function main(): Promise<void> {
  const dataDir = resolve(process.env.ATLAS_DATA || "data");
  const out = resolve(process.env.ATLAS_OUT || "_site");
  const buildDate = buildDateFrom(process.env);

  recoverInterrupted(out);

  let atlas;
  try {
    atlas = loadAtlas({ dataDir, buildDate });
  } catch (e) {
    if (e instanceof InputProblems) fail(`${e.format()}\n${e.problems.length} problem(s) in ${dataDir}; nothing was published.`);
    throw e;
  }

  const staging = makeStagingDir(out);
  const cleanUp = () => rmSync(staging, { recursive: true, force: true });
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
    await eleventy.write();
    writeAnchors(staging);
    const problems = selfCheck(staging, atlas);
    if (problems.length > 0) {
      cleanUp();
      fail(`self-check failed; nothing was published:\n${problems.map((p) => `  ${p}`).join("\n")}`);
    }
    publish(staging, out);
  } catch (e) {
    cleanUp();
    fail(`build failed; ${out} left as it was:\n  ${e instanceof Error ? e.message : String(e)}`);
  }
  process.stdout.write(`built ${atlas.species.length} species into ${out}\n`);
}

await main();
