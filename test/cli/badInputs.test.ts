/**
 * Every case of the bad-input catalogue through the real build command, as
 * a lab would meet it: non-zero exit, the catalogue's file:line:column line
 * on stderr, no stack trace, and the previous output byte-for-byte as it
 * was. One shared previous output (built once) is compared by digest after
 * every case; builds run a few at a time so the file stays within minutes.
 */
import { availableParallelism } from "node:os";
import { rmSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BAD_INPUTS } from "../catalogue/badInputs.js";
import { writeFolder } from "../catalogue/writeFolder.js";
import { runBuild, tempDir, type BuildRun } from "../support/runBuild.js";
import { smallDataFolder } from "./smallData.js";
import { treeHash } from "./treeHash.js";

const parent = tempDir("atlas-bad-cli-");
const out = join(parent, "_site");
let before = "";

/** At most `n` builds at once. */
function limiter(n: number): <T>(job: () => Promise<T>) => Promise<T> {
  let running = 0;
  const waiting: (() => void)[] = [];
  return async (job) => {
    if (running >= n) await new Promise<void>((r) => waiting.push(r));
    running++;
    try {
      return await job();
    } finally {
      running--;
      waiting.shift()?.();
    }
  };
}
const limit = limiter(Math.max(2, Math.min(4, availableParallelism())));

beforeAll(async () => {
  const data = smallDataFolder(parent);
  const r = await runBuild({ data, out });
  expect(r.code, r.stderr).toBe(0);
  before = treeHash(out);
}, 120_000);

afterAll(() => rmSync(parent, { recursive: true, force: true }));

describe.concurrent("the build command given a bad data folder", () => {
  it("has the whole catalogue to run", () => {
    expect(BAD_INPUTS.length).toBeGreaterThanOrEqual(90);
  });

  for (const c of BAD_INPUTS) {
    it(`refuses ${c.name}, says where, and publishes nothing`, async () => {
      const r: BuildRun = await limit(async () => {
        const data = writeFolder(c.files(), parent);
        try {
          return await runBuild({ data, out });
        } finally {
          rmSync(data, { recursive: true, force: true });
        }
      });
      expect(r.code, r.stderr).toBe(1);
      const lines = r.stderr.split("\n");
      expect(lines.some((l) => c.expect.test(l)), `no stderr line matched ${c.expect}\n${r.stderr}`).toBe(true);
      expect(r.stderr).not.toMatch(/^\s+at /m); // a stack frame
      expect(r.stderr).not.toMatch(/^[A-Za-z]*Error\b/m); // Node's "TypeError: …" / "Error [CODE]: …"
      expect(r.stderr).not.toContain("Node.js v");
      expect(r.stderr).toMatch(/nothing was published\.$/m);
      expect(r.stdout).not.toMatch(/^built /m);
      expect(treeHash(out)).toBe(before);
    }, 300_000);
  }
});
