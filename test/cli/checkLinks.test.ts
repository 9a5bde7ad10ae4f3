import { spawnSync } from "node:child_process";
import { cpSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { parseDocument, isSeq } from "yaml";
import { checkLinks } from "../../src/cli/checkLinks.js";
import { DEMO_DATA, ROOT, demoSite, runBuild, tempDir } from "../support/runBuild.js";

/** A copy of the demo data with the rb87 file changed by `edit` (a YAML document). */
function editedDemo(edit: (doc: ReturnType<typeof parseDocument>) => void): string {
  const dir = join(tempDir(), "data");
  cpSync(DEMO_DATA, dir, { recursive: true });
  const file = join(dir, "species", "rb87.yaml");
  const doc = parseDocument(readFileSync(file, "utf8"));
  edit(doc);
  writeFileSync(file, doc.toString());
  return dir;
}

async function build(data: string): Promise<string> {
  const out = join(tempDir(), "_site");
  const r = await runBuild({ data, out });
  if (r.code !== 0) throw new Error(r.stderr);
  return out;
}

function cli(...args: string[]) {
  return spawnSync(process.execPath, ["--import", "tsx", join(ROOT, "src/cli/checkLinks.ts"), ...args], { cwd: ROOT, encoding: "utf8" });
}

/** The markup of every table row with an id, by id. */
function rows(html: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of html.matchAll(/<tr id="([^"]+)">[\s\S]*?<\/tr>/g)) out.set(m[1]!, m[0]);
  return out;
}

let demo: string;
beforeAll(async () => {
  demo = await demoSite();
}, 600_000);

describe("check-links against a rebuilt site", () => {
  it("loses no anchor and changes no row when a level is added and levels and lines are reordered", async () => {
    const data = editedDemo((doc) => {
      const levels = doc.get("levels");
      const lines = doc.get("lines");
      if (!isSeq(levels) || !isSeq(lines)) throw new Error("rb87.yaml has no levels or lines list");
      levels.items.reverse();
      lines.items.reverse();
      levels.add(
        doc.createNode({
          id: "4d-D5/2",
          config: "4d",
          term: "2D5/2",
          hyperfine: { A: "-16.8 MHz" },
          energy: "19355.2 cm-1",
          source: "added by a test to check anchor stability",
        }),
      );
    });
    const after = await build(data);
    const r = cli(join(demo, "anchors.json"), join(after, "anchors.json"));
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/, 0 moved and are forwarded, 0 lost$/m);

    const now = JSON.parse(readFileSync(join(after, "anchors.json"), "utf8")).pages["species/rb87/index.html"] as string[];
    expect(now).toContain("level:4d-D5/2:F=4");

    // Same id, same row: every row of the old page is unchanged in the new one, but for the spaces that
    // line decimal points up (the at-a-glance table lists every level, so a new level's digits can widen a column).
    const unpadded = (m: Map<string, string>) => new Map([...m].map(([id, html]) => [id, html.replace(/<span class="pad">[^<]*<\/span>/g, "")]));
    const before = unpadded(rows(readFileSync(join(demo, "species/rb87/index.html"), "utf8")));
    const later = unpadded(rows(readFileSync(join(after, "species/rb87/index.html"), "utf8")));
    expect(before.size).toBeGreaterThan(50);
    for (const [id, html] of before) expect(later.get(id), id).toBe(html);
  }, 300_000);

  it("reports every anchor of a removed level and exits 1", async () => {
    const data = editedDemo((doc) => {
      const levels = doc.get("levels");
      const lines = doc.get("lines");
      if (!isSeq(levels) || !isSeq(lines)) throw new Error("rb87.yaml has no levels or lines list");
      // Remove 5p-P1/2 and the D1 line that needs it.
      levels.items = levels.items.filter((n) => (n as { get(k: string): unknown }).get("id") !== "5p-P1/2");
      lines.items = lines.items.filter((n) => (n as { get(k: string): unknown }).get("id") !== "D1");
    });
    const after = await build(data);
    const r = cli(join(demo, "anchors.json"), join(after, "anchors.json"));
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/anchors of .* are gone/);
    expect(r.stderr).toContain("species/rb87/index.html#level:5p-P1/2\n");
    // 87Rb 5p 2P1/2 has F = 1, 2 (common practice).
    expect(r.stderr).toContain("species/rb87/index.html#level:5p-P1/2:F=2:mF=-2");
    expect(r.stderr).toContain("species/rb87/index.html#line:D1");
    expect(r.stderr).not.toContain("#line:D2\n");
  }, 300_000);
});

describe("check-links arguments", () => {
  it("exits 2 when a manifest cannot be read", () => {
    const missing = join(tempDir(), "nothing.json");
    const r = checkLinks(missing, missing);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/cannot read/);
  });

  it("prints usage and exits 2 without arguments", () => {
    const r = cli();
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/usage: npm run check-links/);
  });

  it("exits 2 for a file that is not a manifest", () => {
    const f = join(tempDir(), "x.json");
    writeFileSync(f, JSON.stringify({ pages: {} }));
    const r = cli(f, f);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not an anchors manifest/);
  });
});
