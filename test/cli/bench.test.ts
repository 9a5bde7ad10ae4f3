/**
 * The benchmark script keeps working: run at a tiny size, it builds the
 * demo, the set, a one-species rebuild, the floor and twice the set, and
 * prints every figure (values are machine-dependent and not checked).
 */
import { spawnSync } from "node:child_process";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT } from "../support/runBuild.js";

describe("npm run bench at a tiny size", () => {
  it("prints the demo build, the set's time, memory, size and phase split, the rebuild, the floor ratio and twice the set", () => {
    const r = spawnSync(process.execPath, ["--import", "tsx", join(ROOT, "scripts/bench/bench.ts"), "--species", "3", "--levels", "15", "--lines", "15"], {
      cwd: ROOT,
      encoding: "utf8",
    });
    expect(r.status, r.stderr).toBe(0);
    const out = r.stdout;
    expect(out).toMatch(/^code: commit \w+$/m);
    expect(out).toMatch(/^machine: .+ \d+ threads/m);
    expect(out).toMatch(/^demo cold build: \d+\.\d\d s \(peak RSS/m);
    expect(out).toMatch(/^size: 3 species, 15 levels, 15 lines, 7 fields/m);
    // A build the self-checks refuse is still timed (and reported with its first messages).
    const refused = /^wall time: \d+\.\d\d s until the build failed: exit code 1$/m.test(out);
    if (!refused) {
      expect(out).toMatch(/^wall time: \d+\.\d\d s$/m);
      // 3 species overviews plus their detail pages and the site's own pages.
      const pages = Number(/^pages: (\d+) HTML pages, (\d+) files$/m.exec(out)?.[1]);
      expect(pages).toBeGreaterThanOrEqual(4);
      expect(out).toMatch(/^total bytes: \d+ /m);
      expect(out).toMatch(/^rebuild after editing one species: \d+\.\d\d s \(syn-\d+\.yaml edited, 2 species from the cache/m);
    } else {
      expect(out).toMatch(/^rebuild after editing one species: \d+\.\d\d s until the build failed \(syn-\d+\.yaml edited; restoring from the cache \d+\.\d\d s/m);
    }
    expect(out).toMatch(/^peak RSS: (\d+ MB|unknown)/m);
    for (const phase of ["loading", "species", "site pages", "anchors manifest", "self-checks", "publish", "start-up and rest"]) {
      expect(out).toMatch(new RegExp(`^${phase}: \\d+\\.\\d\\d s`, "m"));
    }
    expect(out).toMatch(/^species: \d+\.\d\d s wall; summed over the threads that built them: physics (?!0\.00)\d+\.\d\d s/m);
    expect(out).toMatch(/^floor: \d+\.\d\d s for \d+ static files/m);
    expect(out).toMatch(/^ratio to floor: \d+\.\d\d$/m);
    expect(out).toMatch(/^twice the set: \d+\.\d\d s for 6 species, 30 levels, 30 lines .*\d+\.\d\d × the set's wall time/m);
  }, 900_000);
});
