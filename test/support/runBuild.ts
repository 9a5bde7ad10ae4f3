/**
 * Run the real build command (`src/cli/build.ts`) in a child process, as a
 * user would, with its own data and output folders.
 */
import { spawn } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
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

/** sha-256 over every file below the given roots (sorted paths + bytes): what a demo build depends on. */
function treeHash(roots: string[]): string {
  const h = createHash("sha256");
  const walk = (p: string) => {
    if (!existsSync(p)) return;
    if (statSync(p).isDirectory()) {
      for (const name of readdirSync(p).sort()) if (name !== "node_modules") walk(join(p, name));
    } else {
      h.update(p.slice(ROOT.length)).update("\0").update(readFileSync(p));
    }
  };
  for (const r of roots) walk(r);
  return h.digest("hex").slice(0, 16);
}

const built = new Map<string, Promise<string>>();

/**
 * The demo site (or another data folder's site) built once and shared: by
 * every test in this process through a promise, and by every test process
 * through a folder in the system temp directory named after a hash of the
 * sources, templates and data. The first process to need it builds it
 * under a lock; the others wait for its "complete" marker. The site is
 * read-only for tests: a test that changes files builds its own.
 */
export function demoSite(data = DEMO_DATA): Promise<string> {
  let p = built.get(data);
  if (!p) {
    p = sharedBuild(data);
    built.set(data, p);
  }
  return p;
}

async function sharedBuild(data: string): Promise<string> {
  const key = treeHash([join(ROOT, "src"), join(ROOT, "templates"), join(ROOT, "schema"), join(ROOT, ".eleventy.js"), join(ROOT, "package-lock.json"), data]);
  const dir = join(tmpdir(), `sublevel-atlas-site-${key}`);
  const out = join(dir, "_site");
  const done = join(dir, "complete");
  const lock = `${dir}.lock`;
  if (existsSync(done)) return out;
  let mine = false;
  try {
    mkdirSync(lock);
    mine = true;
  } catch {
    // another process is building it
  }
  if (mine) {
    try {
      rmSync(dir, { recursive: true, force: true });
      mkdirSync(dir, { recursive: true });
      const r = await runBuild({ data, out });
      if (r.code !== 0) throw new Error(`demo build failed (${r.code}):\n${r.stderr}`);
      writeFileSync(done, "");
      return out;
    } finally {
      rmSync(lock, { recursive: true, force: true });
    }
  }
  const started = Date.now();
  while (!existsSync(done)) {
    if (!existsSync(lock)) return sharedBuild(data); // the builder failed or died: try ourselves
    if (Date.now() - started > 20 * 60_000) throw new Error("timed out waiting for the shared demo build");
    await new Promise((r) => setTimeout(r, 250));
  }
  return out;
}
