/**
 * Run the real build command (`src/cli/build.ts`) in a child process, as a
 * user would, with its own data and output folders.
 */
import { spawn } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
export const DEMO_DATA = join(ROOT, "data");

export interface BuildRun {
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
}

export interface BuildOptions {
  data?: string;
  out: string;
  env?: Record<string, string>;
  /** Called with the child once it has started (e.g. to kill it mid-build). */
  onSpawn?: (child: ReturnType<typeof spawn>) => void;
}

export function runBuild(opts: BuildOptions): Promise<BuildRun> {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", join(ROOT, "src/cli/build.ts")], {
      cwd: ROOT,
      env: { ...process.env, ATLAS_DATA: opts.data ?? DEMO_DATA, ATLAS_OUT: opts.out, SOURCE_DATE_EPOCH: "1798761600", ...opts.env },
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

/** A fresh temporary folder. */
export function tempDir(prefix = "atlas-test-"): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

const built = new Map<string, Promise<string>>();

/**
 * The demo site built once per test file into a temporary folder (fixed
 * SOURCE_DATE_EPOCH); throws with the build's stderr if it fails.
 */
export function demoSite(data = DEMO_DATA): Promise<string> {
  let p = built.get(data);
  if (!p) {
    p = (async () => {
      const out = join(tempDir(), "_site");
      const r = await runBuild({ data, out });
      if (r.code !== 0) throw new Error(`demo build failed (${r.code}):\n${r.stderr}`);
      return out;
    })();
    built.set(data, p);
  }
  return p;
}
