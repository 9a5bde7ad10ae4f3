/**
 * A build whose species are computed in worker threads stays atomic: a
 * species that fails in a worker fails the build with the message a build
 * in one thread gives; SIGINT, SIGTERM and SIGKILL while the workers write
 * leave the old output byte for byte, and no staging folder survives
 * (SIGKILL's is removed by the next build). The cache beside the output is
 * not a leftover.
 */
import { cpSync, existsSync, readdirSync, rmSync } from "node:fs";
import { basename, join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_DATA, tempDir, type BuildRun } from "../support/runBuild.js";
import { runBuildIn, snapshotCode } from "./codeSnapshot.js";
import { treeHash } from "../cli/treeHash.js";

const parent = tempDir("atlas-workers-");
const out = join(parent, "_site");
const data = join(parent, "data");
cpSync(DEMO_DATA, data, { recursive: true });
const code = snapshotCode(parent);
const prefix = `.atlas-build-${basename(out)}-`;
let before = "";

const leftovers = (): string[] => readdirSync(parent).filter((n) => ![basename(out), basename(data), basename(code), ".atlas-cache"].includes(n));

beforeAll(async () => {
  const r = await runBuildIn(code, { data, out, env: { ATLAS_CACHE: "off" } });
  expect(r.code, r.stderr).toBe(0);
  before = treeHash(out);
}, 600_000);
afterAll(() => rmSync(parent, { recursive: true, force: true }));

/**
 * Start a build with workers and send `signal` once the workers have
 * written species files into the staging folder and before the site-wide
 * pages exist (assets/ is written after every species).
 */
function signalledWhileWorking(signal: NodeJS.Signals, cache = "off"): Promise<BuildRun & { staging: string }> {
  let staging = "";
  return new Promise((resolve, reject) => {
    runBuildIn(code, {
      data,
      out,
      env: { ATLAS_WORKERS: "2", ATLAS_CACHE: cache },
      onSpawn: (child) => {
        const poll = setInterval(() => {
          // This build's own staging folder (named with its pid).
          const s = readdirSync(parent).find((n) => n.startsWith(`${prefix}${child.pid}-`));
          if (!s) return;
          const dir = join(parent, s);
          try {
            if (existsSync(join(dir, "species")) && readdirSync(join(dir, "species")).length > 0 && !existsSync(join(dir, "assets"))) {
              staging = dir;
              clearInterval(poll);
              child.kill(signal);
            }
          } catch {
            // removed meanwhile
          }
        }, 5);
        child.on("close", () => clearInterval(poll));
      },
    }).then((r) => resolve({ ...r, staging }), reject);
  });
}

describe("a build with worker threads", () => {
  it.each(["2", "1"])("with a species that fails (ATLAS_WORKERS=%s) exits 1 with the species' message, no stack, and leaves the old output", async (workers) => {
    const r = await runBuildIn(code, { data, out, env: { ATLAS_FAULT: "species", ATLAS_WORKERS: workers, ATLAS_CACHE: "off" } });
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/^build failed; .*_site left as it was:\n {2}building [\w-]+ failed \(ATLAS_FAULT=species\)\n$/);
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 600_000);

  it.each([
    ["SIGINT", 130],
    ["SIGTERM", 143],
  ] as const)("stopped by %s while workers write exits %i, removes its staging folder and leaves the old output", async (signal, code) => {
    const r = await signalledWhileWorking(signal);
    expect(r.staging).not.toBe("");
    expect(r.code).toBe(code);
    expect(r.stderr).toContain(`build interrupted (${signal})`);
    expect(existsSync(r.staging)).toBe(false);
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 600_000);

  it("killed with SIGKILL while workers write leaves the old output; the next build removes the dead staging folder and publishes the same site", async () => {
    // With the cache: a killed build may leave a half-written cache entry under a temporary name.
    const r = await signalledWhileWorking("SIGKILL", "");
    expect(r.signal).toBe("SIGKILL");
    expect(leftovers()).toEqual([basename(r.staging)]);
    expect(treeHash(out)).toBe(before);
    const next = await runBuildIn(code, { data, out });
    expect(next.code, next.stderr).toBe(0);
    expect(leftovers()).toEqual([]);
    expect(treeHash(out)).toBe(before);
    expect(readdirSync(join(parent, ".atlas-cache", "species")).filter((n) => !n.endsWith(".pack"))).toEqual([]);
  }, 900_000);
});
