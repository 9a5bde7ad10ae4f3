/**
 * Real builds with the species cache and worker threads: a rebuild after
 * editing one species restores the others from the cache and publishes,
 * byte for byte, the site a cold build without cache or workers publishes
 * (with a new build date and data version on every page).
 */
import { cpSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { DEMO_DATA, tempDir } from "../support/runBuild.js";
import { runBuildIn, snapshotCode } from "./codeSnapshot.js";
import { treeFiles } from "../cli/treeHash.js";

const parent = tempDir("atlas-cached-");
const data = join(parent, "data");
cpSync(DEMO_DATA, data, { recursive: true });
const code = snapshotCode(parent);
const n = readdirSync(join(data, "species")).filter((f) => f.endsWith(".yaml")).length;
afterAll(() => rmSync(parent, { recursive: true, force: true }));

const packs = (): string[] => readdirSync(join(parent, ".atlas-cache", "species")).filter((n) => n.endsWith(".pack"));

async function build(out: string, epoch: string, env: Record<string, string> = {}): Promise<{ files: Map<string, Buffer>; stdout: string }> {
  const r = await runBuildIn(code, { data, out: join(parent, out), env: { SOURCE_DATE_EPOCH: epoch, ...env } });
  expect(r.code, r.stderr).toBe(0);
  return { files: treeFiles(join(parent, out)), stdout: r.stdout };
}

function differing(a: Map<string, Buffer>, b: Map<string, Buffer>): string[] {
  return [...new Set([...a.keys(), ...b.keys()])].filter((k) => !a.get(k) || !b.get(k) || !a.get(k)!.equals(b.get(k)!)).sort();
}

const COLD = { ATLAS_CACHE: "off", ATLAS_WORKERS: "1" };

describe("a cached build", () => {
  it("after editing one species recomputes only it and is byte-identical to a cold build", async () => {
    // First build: every species computed in workers, and cached.
    const first = await build("_site", "1798761600", { ATLAS_WORKERS: "2" });
    expect(first.stdout).toMatch(new RegExp(`^built ${n} species into .*_site\n$`, "m"));
    expect(packs()).toHaveLength(n);
    const cold = await build("cold-1", "1798761600", COLD);
    expect(differing(first.files, cold.files)).toEqual([]);

    // The same data again: everything from the cache.
    const again = await build("_site", "1798761600");
    expect(again.stdout).toContain(`(${n} from the cache)`);
    expect(differing(again.files, cold.files)).toEqual([]);

    // One species edited, another build date: one species computed, the others restored with the new stamp.
    const file = join(data, "species", "sr88.yaml");
    writeFileSync(file, readFileSync(file, "utf8").replace("Even isotope without nuclear spin", "Even isotope (no nuclear spin)"));
    const edited = await build("_site", "1830297600");
    expect(edited.stdout).toContain(`(${n - 1} from the cache)`);
    const coldEdited = await build("cold-2", "1830297600", COLD);
    expect(differing(edited.files, coldEdited.files)).toEqual([]);
    // The stamp really changed on the restored species' pages.
    expect(differing(edited.files, first.files)).toContain("species/rb87/index.html");
    expect(edited.files.get("species/rb87/index.html")!.toString()).toContain("2028-01-01T00:00:00.000Z");
    // Bounded: the old sr88 entry is gone, nothing temporary is left.
    expect(packs()).toHaveLength(n);
    expect(readdirSync(join(parent, ".atlas-cache", "species")).filter((n) => !n.endsWith(".pack"))).toEqual([]);
  }, 600_000);
});
