/**
 * `npm run fuzz [-- --runs N] [--seed S]`: the property tests at benchmark
 * size (default 10,000 cases each; the ordinary test run tries 200). First
 * the damaged-data property of the loader, run here directly so it can
 * report what it saw, then the physics invariants through vitest with
 * ATLAS_PROPERTY_RUNS=N. Exits non-zero on the first counterexample, which
 * fast-check prints with the seed to replay it.
 */
import { spawnSync } from "node:child_process";
import { rmSync } from "node:fs";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import fc from "fast-check";
import { damage, loadOrExplain, ScratchFolder } from "../../test/properties/dataMutations.js";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");

function arg(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}
const runs = Number(arg("runs") ?? 10_000);
const seed = arg("seed") === undefined ? undefined : Number(arg("seed"));

const scratch = new ScratchFolder(join(ROOT, "data"), mkdtempSync(join(tmpdir(), "atlas-fuzz-")));
let loaded = 0;
let refused = 0;
const t0 = performance.now();
const result = fc.check(
  fc.property(damage, (d) => {
    if (scratch.with(d, () => loadOrExplain(scratch.dir)).ok) loaded++;
    else refused++;
  }),
  { numRuns: runs, seed },
);
rmSync(scratch.dir, { recursive: true, force: true });
const secs = ((performance.now() - t0) / 1000).toFixed(1);
if (result.failed) {
  process.stderr.write(`${fc.defaultReportMessage(result)}\n`);
  process.exit(1);
}
process.stdout.write(`damaged data: ${runs} cases in ${secs} s (seed ${result.seed}): ${refused} refused with file:line:column problems, ${loaded} still valid, 0 crashes\n`);

process.stdout.write(`physics invariants: ${runs} cases each (field-solver properties ${Math.max(10, Math.round(runs / 5))})\n`);
const v = spawnSync(process.execPath, [join(ROOT, "node_modules/vitest/vitest.mjs"), "run", "--testTimeout=3600000", "test/properties/physicsInvariants.test.ts"], {
  cwd: ROOT,
  stdio: "inherit",
  env: { ...process.env, ATLAS_PROPERTY_RUNS: String(runs) },
});
process.exit(v.status ?? 1);
