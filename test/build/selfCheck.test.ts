/**
 * The self-checks as the build runs them, on a real staged site (built once
 * from small data) and on copies of it broken in one way each.
 */
import { cpSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { selfCheck } from "../../src/build/selfCheck.js";
import type { SiteSummary } from "../../src/site/siteSummary.js";
import { runBuild, tempDir } from "../support/runBuild.js";
import { smallDataFolder } from "../cli/smallData.js";

const parent = tempDir("atlas-selfcheck-");
const built = join(parent, "_site");
const atlas = { species: [{ exportUrl: "export/sr88.json" }] } as unknown as Pick<SiteSummary, "species">;
let n = 0;

/** A copy of the built site with `edit` applied. */
function broken(edit: (dir: string) => void): string {
  const dir = join(parent, `copy-${++n}`);
  cpSync(built, dir, { recursive: true });
  edit(dir);
  return dir;
}

function editJson(dir: string, file: string, fn: (x: any) => void): void {
  const p = join(dir, file);
  const x = JSON.parse(readFileSync(p, "utf8"));
  fn(x);
  writeFileSync(p, JSON.stringify(x, null, 2));
}

beforeAll(async () => {
  const r = await runBuild({ data: smallDataFolder(parent), out: built });
  expect(r.code, r.stderr).toBe(0);
}, 120_000);
afterAll(() => rmSync(parent, { recursive: true, force: true }));

describe("the self-checks of a staged site", () => {
  it("pass on the site the build published", () => {
    expect(selfCheck(built, atlas)).toEqual([]);
  });

  it("fail when a line's strengths no longer sum to 1", () => {
    const dir = broken((d) => editJson(d, "export/sr88.json", (x) => (x.lines[0].components[0].strength = "1/5")));
    expect(selfCheck(dir, atlas).join("\n")).toMatch(/export\/sr88\.json: line "intercombination" strengths sum to \d+\/\d+, not 1/);
  });

  it("fail when an export is missing or is not JSON", () => {
    expect(selfCheck(broken((d) => rmSync(join(d, "export/sr88.json"))), atlas)).toEqual(["missing export export/sr88.json"]);
    expect(selfCheck(broken((d) => writeFileSync(join(d, "export/sr88.json"), "{")), atlas)).toEqual(["export export/sr88.json is not valid JSON"]);
  });

  it("fail when a number in an export is not finite", () => {
    const dir = broken((d) => editJson(d, "export/sr88.json", (x) => (x.levels[1].sublevels[0].shift_Hz_per_T = "Infinity")));
    const problems = selfCheck(dir, atlas);
    expect(problems).toContain('export/sr88.json: /levels/1/sublevels/0/shift_Hz_per_T is "Infinity", not a finite number');
    expect(problems.some((p) => p.startsWith("export/sr88.json: schema: /levels/1/sublevels/0/shift_Hz_per_T"))).toBe(true);
  });

  it("fail when a line points at a level the export lacks", () => {
    const dir = broken((d) => editJson(d, "export/sr88.json", (x) => (x.lines[0].upper = "nowhere")));
    expect(selfCheck(dir, atlas).join("\n")).toMatch(/line "intercombination" has upper level "nowhere", which is not among its levels/);
  });

  it("fail when a page repeats an id", () => {
    const dir = broken((d) => {
      const p = join(d, "species/sr88/index.html");
      const html = readFileSync(p, "utf8");
      const id = /\sid="([^"]+)"/.exec(html)![1]!;
      writeFileSync(p, html.replace("</body>", `<span id="${id}"></span></body>`));
    });
    expect(selfCheck(dir, atlas).join("\n")).toMatch(/^species\/sr88\/index\.html: id ".+" appears more than once$/m);
  });
});
