/**
 * Reproducible builds: the same data and the same SOURCE_DATE_EPOCH give
 * byte-identical sites, whatever the output folder is called or where it
 * is, so a lab can verify a published site by rebuilding it.
 */
import { rmSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { DEMO_DATA, runBuild, tempDir } from "../support/runBuild.js";
import { smallDataFolder } from "./smallData.js";
import { treeFiles } from "./treeHash.js";

const parents: string[] = [];
afterAll(() => {
  for (const p of parents) rmSync(p, { recursive: true, force: true });
});

async function build(name: string, epoch: string, data = DEMO_DATA): Promise<Map<string, Buffer>> {
  const parent = tempDir("atlas-repro-");
  parents.push(parent);
  const out = join(parent, name);
  const r = await runBuild({ data, out, env: { SOURCE_DATE_EPOCH: epoch } });
  expect(r.code, r.stderr).toBe(0);
  return treeFiles(out);
}

describe("two builds", () => {
  it("of the demo data with the same SOURCE_DATE_EPOCH into different folders are byte-identical", async () => {
    const [a, b] = await Promise.all([build("_site", "1798761600"), build("elsewhere", "1798761600")]);
    expect([...a.keys()].sort()).toEqual([...b.keys()].sort());
    const differing = [...a.keys()].filter((k) => !a.get(k)!.equals(b.get(k)!));
    expect(differing).toEqual([]);
    expect(a.size).toBeGreaterThan(20);
  }, 600_000);

  it("with a different SOURCE_DATE_EPOCH differ (the date is really taken from it)", async () => {
    const data = smallDataFolder();
    parents.push(data);
    const [a, b] = await Promise.all([build("_site", "1798761600", data), build("_site", "1830297600", data)]);
    const differing = [...a.keys()].filter((k) => b.has(k) && !a.get(k)!.equals(b.get(k)!));
    expect(differing).toContain("index.html");
  }, 600_000);
});
