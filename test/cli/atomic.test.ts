/**
 * A build publishes whole or not at all: real child-process builds into a
 * temporary output folder, each failure mode compared by a digest of every
 * file path and byte of the previous output.
 */
import { existsSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { basename, dirname, join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { edit, SITE, SR88 } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";
import { runBuild, tempDir, type BuildRun } from "../support/runBuild.js";
import { smallDataFolder } from "./smallData.js";
import { treeHash } from "./treeHash.js";

const parent = tempDir("atlas-atomic-");
const out = join(parent, "_site");
const data = smallDataFolder(parent);
let before = "";

/** Names beside the output other than the output, the data folder and the build cache: staging or aside leftovers. */
const leftovers = (): string[] => readdirSync(parent).filter((n) => n !== basename(out) && n !== basename(data) && n !== ".atlas-cache");

/** Start a build that stops before its self-checks, and send it `signal` once it says so. */
function interrupted(signal: NodeJS.Signals): Promise<BuildRun & { staging: string }> {
  let staging = "";
  return new Promise((resolve, reject) => {
    runBuild({
      data,
      out,
      env: { ATLAS_FAULT: "stall" },
      onSpawn: (child) => {
        let err = "";
        child.stderr!.on("data", (d) => {
          err += d;
          const m = /stalled with staging folder (.+)\n/.exec(err);
          if (m && !staging) {
            staging = m[1]!;
            child.kill(signal);
          }
        });
      },
    }).then((r) => resolve({ ...r, staging }), reject);
  });
}

beforeAll(async () => {
  const r = await runBuild({ data, out });
  expect(r.code, r.stderr).toBe(0);
  before = treeHash(out);
}, 120_000);

afterAll(() => rmSync(parent, { recursive: true, force: true }));

describe("an unsuccessful build", () => {
  it("with bad input exits 1 and leaves the old output byte-for-byte", async () => {
    const bad = writeFolder({ "species/sr88.yaml": edit(SR88, "term: 3Po1", "term: 3Qo1"), "site.yaml": SITE }, parent);
    const r = await runBuild({ data: bad, out });
    rmSync(bad, { recursive: true, force: true });
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/sr88\.yaml:\d+:\d+: /);
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 60_000);

  it("that fails while rendering exits 1, removes its staging folder and leaves the old output", async () => {
    const r = await runBuild({ data, out, env: { ATLAS_FAULT: "render" } });
    expect(r.code).toBe(1);
    expect(r.stderr).toContain("build failed;");
    expect(r.stderr).not.toMatch(/^\s+at /m);
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 60_000);

  it("whose staged site fails a self-check exits 1 naming the problem and publishes nothing", async () => {
    const r = await runBuild({ data, out, env: { ATLAS_FAULT: "selfcheck" } });
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('self-check failed');
    expect(r.stderr).toContain('index.html: id "fault" appears more than once');
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 60_000);

  it.each([
    ["SIGINT", 130],
    ["SIGTERM", 143],
  ] as const)("stopped by %s exits %i, removes its staging folder and leaves the old output", async (signal, code) => {
    const r = await interrupted(signal);
    expect(r.staging).not.toBe("");
    expect(dirname(r.staging)).toBe(parent);
    expect(r.code).toBe(code);
    expect(r.stderr).toContain(`build interrupted (${signal})`);
    expect(existsSync(r.staging)).toBe(false);
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 60_000);

  it("stopped by SIGINT during a long synchronous computation stops at once and leaves the old output", async () => {
    // A handler installed this early would wait for the computation to end; the default action does not.
    const r = await runBuild({
      data,
      out,
      env: { ATLAS_FAULT: "busy" },
      onSpawn: (child) => {
        let err = "";
        child.stderr!.on("data", (d) => {
          err += d;
          if (err.includes("busy before staging\n")) child.kill("SIGINT");
        });
      },
    });
    expect(r.signal).toBe("SIGINT");
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 60_000);

  it("killed with SIGKILL mid-render leaves the old output, and the next build removes the dead staging folder", async () => {
    // No hook: kill as soon as the real render has started writing into the staging folder.
    const prefix = `.atlas-build-${basename(out)}-`;
    let seen = "";
    const r = await runBuild({
      data,
      out,
      onSpawn: (child) => {
        const poll = setInterval(() => {
          const s = readdirSync(parent).find((n) => n.startsWith(prefix));
          if (s && readdirSync(join(parent, s)).length > 0) {
            seen = s;
            clearInterval(poll);
            child.kill("SIGKILL");
          }
        }, 5);
        child.on("close", () => clearInterval(poll));
      },
    });
    expect(r.signal).toBe("SIGKILL");
    expect(leftovers()).toEqual([seen]);
    expect(treeHash(out)).toBe(before);

    const next = await runBuild({ data, out });
    expect(next.code, next.stderr).toBe(0);
    expect(leftovers()).toEqual([]);
    // Same data, same SOURCE_DATE_EPOCH: the republished site is the same.
    expect(treeHash(out)).toBe(before);
  }, 120_000);

  it("cut between the two renames of publishing is put back by the next build", async () => {
    // What a kill between "old → aside" and "staged → out" leaves: no output, the old one aside.
    const { renameSync } = await import("node:fs");
    renameSync(out, `${out}.previous`);
    writeFileSync(join(parent, `.atlas-build-${basename(out)}-999999999-abcdef`), "");
    const r = await runBuild({ data: join(parent, "no-such-folder"), out });
    expect(r.code).toBe(1);
    expect(treeHash(out)).toBe(before);
    expect(leftovers()).toEqual([]);
  }, 60_000);
});
