import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { join, relative } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { InputProblems } from "../../src/data/inputError.js";
import { dataVersion, loadDataFolder } from "../../src/data/loadDataFolder.js";
import { edit, RB87, SITE, SR88, validFolder } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";

const made: string[] = [];
afterAll(() => {
  for (const d of made) rmSync(d, { recursive: true, force: true });
});
const folder = (files: Record<string, string | Uint8Array>, parent?: string): string => {
  const d = writeFolder(files, parent);
  made.push(d);
  return d;
};
const problems = (dir: string): InputProblems => {
  try {
    loadDataFolder(dir);
  } catch (e) {
    if (e instanceof InputProblems) return e;
    throw e;
  }
  throw new Error("expected InputProblems");
};

describe("loadDataFolder", () => {
  it("loads a valid folder into the model", () => {
    const f = loadDataFolder(folder(validFolder()));
    expect(f.species.map((s) => s.id)).toEqual(["rb87", "sr88"]);
    const rb = f.species[0]!;
    expect(rb.file).toBe("species/rb87.yaml");
    expect(rb.nucleus?.I2).toBe(3);
    expect(rb.levels.map((l) => l.id)).toEqual(["5s-S1/2", "5p-P1/2", "5p-P3/2"]);
    expect(rb.lines.map((l) => [l.id, l.multipole])).toEqual([["D1", "E1"], ["D2", "E1"]]);
    expect(rb.levels[2]?.hyperfine?.B?.si.toFixed()).toBe("12496500");
    expect(rb.levels[0]?.pos.line).toBe(11);
    expect(f.species[1]?.nucleus).toBeNull();
    expect(f.site.title).toBe("Test atlas");
  });

  it("keeps every digit of an unquoted 27-character number", () => {
    const text = edit(RB87, `gJ: "2.00233113(20)"`, "gJ: 2.0023311300000000000000001");
    const f = loadDataFolder(folder({ "species/rb87.yaml": text }));
    expect(f.species[0]?.levels[0]?.gJ?.value.toFixed()).toBe("2.0023311300000000000000001");
  });

  it("reads an unquoted integer spin from its text", () => {
    const text = edit(edit(RB87, "spin: 3/2", "spin: 1"), `B: "12.4965 MHz"`, `B: "0 MHz"`);
    expect(loadDataFolder(folder({ "species/rb87.yaml": text })).species[0]?.nucleus?.I2).toBe(2);
  });

  it("accepts .yml files and uses site defaults without site.yaml", () => {
    const f = loadDataFolder(folder({ "species/sr88.yml": SR88 }));
    expect(f.species[0]?.file).toBe("species/sr88.yml");
    expect(f.site.pathPrefix).toBe("/");
    expect(f.site.constants).toBe("CODATA 2022");
    expect(f.site.fields.map((x) => x.text)).toEqual(["0 G", "1 G", "10 G", "100 G", "0.1 T"]);
  });

  it("reports every problem of every file at once, sorted by file and position", () => {
    const dir = folder({
      "species/rb87.yaml": edit(edit(RB87, "multipole: E1", "multipol: E1"), "term: 2S1/2", "term: 2S1"),
      "species/sr88.yaml": edit(SR88, "id: sr88", "id: Sr88"),
      "site.yaml": edit(SITE, `"10 G"`, `"-10 G"`),
    });
    const p = problems(dir);
    const lines = p.format().split("\n").map((l) => l.slice(l.indexOf(dir) === 0 ? dir.length + 1 : 0));
    expect(lines).toHaveLength(4);
    expect(lines[0]).toMatch(/^site\.yaml:3:24: field "-10 G" is negative/);
    expect(lines[1]).toMatch(/^species\/rb87\.yaml:13:11: term: /);
    expect(lines[2]).toMatch(/^species\/rb87\.yaml:39:5: unknown key "multipol"/);
    expect(lines[3]).toMatch(/^species\/sr88\.yaml:1:5: species id "Sr88"/);
    expect(p.problems.map((x) => x.line)).toEqual([3, 13, 39, 1]);
    expect(p.message).toContain("4 problems");
  });

  it("names files relative to the working directory when inside it", () => {
    const dir = folder({ "species/rb87.yaml": edit(RB87, "id: rb87", "id: RB87") }, mkdtempSync(join(process.cwd(), ".tmp-test-")));
    made.push(join(dir, ".."));
    const p = problems(dir);
    expect(p.problems[0]?.file).toBe(`${relative(process.cwd(), dir)}/species/rb87.yaml`);
  });

  it("reports a missing folder instead of throwing a system error", () => {
    const p = problems(join(folder({}), "nope"));
    expect(p.format()).toMatch(/nope:1:1: data folder does not exist/);
  });

  it("reports an empty species folder", () => {
    const dir = folder({ "species/README.md": "notes" });
    expect(problems(dir).format()).toMatch(/species\/ has no \.yaml files/);
  });
});

describe("dataVersion", () => {
  it("is 12 hex digits that change with any byte and not with nothing", () => {
    const dir = folder(validFolder());
    const v = dataVersion(dir);
    expect(v).toMatch(/^[0-9a-f]{12}$/);
    expect(dataVersion(dir)).toBe(v);
    expect(loadDataFolder(dir).dataVersion).toBe(v);
    writeFileSync(join(dir, "site.yaml"), SITE + "# edited\n");
    expect(dataVersion(dir)).not.toBe(v);
  });

  it("depends on file names as well as contents", () => {
    const a = dataVersion(folder({ "species/a.yaml": SR88 }));
    const b = dataVersion(folder({ "species/b.yaml": SR88 }));
    expect(a).not.toBe(b);
  });
});
