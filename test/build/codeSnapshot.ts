/**
 * A frozen copy of the build's code for tests that compare several builds:
 * in a working tree that others edit while the test runs, two builds of the
 * live tree may differ for reasons the test is not about (and the cache
 * correctly drops every entry when the code changes). The copy holds what
 * a build reads (src/, templates/, schema/, the project files), with
 * node_modules linked.
 */
import { spawn } from "node:child_process";
import { cpSync, existsSync, mkdirSync, symlinkSync } from "node:fs";
import { join } from "node:path";
import { ROOT, type BuildOptions, type BuildRun } from "../support/runBuild.js";

const PARTS = ["src", "templates", "schema", "package.json", "package-lock.json", ".eleventy.js", "tsconfig.json"];

export function snapshotCode(parent: string): string {
  const code = join(parent, "code");
  mkdirSync(code, { recursive: true });
  for (const name of PARTS) if (existsSync(join(ROOT, name))) cpSync(join(ROOT, name), join(code, name), { recursive: true });
  symlinkSync(join(ROOT, "node_modules"), join(code, "node_modules"), "dir");
  return code;
}

/** runBuild (test/support/runBuild.ts) with the build command of a snapshot. */
export function runBuildIn(code: string, opts: BuildOptions & { data: string }): Promise<BuildRun> {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", join(code, "src/cli/build.ts")], {
      cwd: code,
      env: { ...process.env, ATLAS_DATA: opts.data, ATLAS_OUT: opts.out, SOURCE_DATE_EPOCH: "1798761600", ...opts.env },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("error", reject);
    child.on("close", (code, signal) => resolvePromise({ code, signal, stdout, stderr }));
    opts.onSpawn?.(child);
  });
}
