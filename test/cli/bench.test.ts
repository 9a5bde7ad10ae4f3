/**
 * The benchmark script keeps working: run at a tiny size, it builds, and
 * prints every figure (values are machine-dependent and not checked).
 */
import { spawnSync } from "node:child_process";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT } from "../support/runBuild.js";

describe("npm run bench at a tiny size", () => {
  it("builds synthetic data and prints time, memory, size, the phase split and the floor ratio", () => {
    const r = spawnSync(process.execPath, ["--import", "tsx", join(ROOT, "scripts/bench/bench.ts"), "--species", "3", "--levels", "15", "--lines", "15"], {
      cwd: ROOT,
      encoding: "utf8",
    });
    expect(r.status, r.stderr).toBe(0);
    const out = r.stdout;
    expect(out).toMatch(/^size: 3 species, 15 levels, 15 lines, 7 fields/m);
    expect(out).toMatch(/^wall time: \d+\.\d\d s$/m);
    expect(out).toMatch(/^peak RSS: (\d+ MB|unknown)/m);
    // 3 species pages plus the site's own pages.
    const pages = Number(/^pages: (\d+) HTML pages, (\d+) files$/m.exec(out)?.[1]);
    expect(pages).toBeGreaterThanOrEqual(4);
    expect(out).toMatch(/^total bytes: \d+ /m);
    for (const phase of ["loading", "physics", "site model", "rendering", "writing", "self-checks", "publish"]) {
      expect(out).toMatch(new RegExp(`^${phase}: \\d+\\.\\d\\d s`, "m"));
    }
    expect(out).toMatch(/^floor: \d+\.\d\d s for \d+ static files/m);
    expect(out).toMatch(/^ratio to floor: \d+\.\d\d$/m);
  }, 600_000);
});
