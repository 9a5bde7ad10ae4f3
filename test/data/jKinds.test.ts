/**
 * Issue 10, defect 7: integer and half-integer J in one species. One atom
 * or ion has an even or an odd number of electrons, so its J values are all
 * integer or all half-integer (common practice); a file mixing them must be
 * refused with every offending level and line located, not fail later in
 * the physics without a location.
 */
import { rmSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";
import { InputProblems } from "../../src/data/inputError.js";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { insertAfter, RB87, SITE, SR88 } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";

const made: string[] = [];
afterAll(() => {
  for (const d of made) rmSync(d, { recursive: true, force: true });
});

function problemLines(rb87: string): string[] {
  const dir = writeFolder({ "species/rb87.yaml": rb87, "species/sr88.yaml": SR88, "site.yaml": SITE });
  made.push(dir);
  try {
    loadDataFolder(dir);
  } catch (e) {
    if (e instanceof InputProblems) return e.format().split("\n").map((l) => l.replace(/^.*species\//, "species/"));
    throw e;
  }
  return [];
}

const TRIPLETS = `  - id: 5s5p-3P1
    config: 5s5p
    term: 3Po1
    source: "handbook data"
  - id: 5s5p-3P2
    config: 5s5p
    term: 3Po2
    source: "handbook data"`;

describe("integer and half-integer J in one species", () => {
  it("reports every level of the minority kind and every line joining the two kinds, each with a hint", () => {
    const text = insertAfter(RB87, 29, TRIPLETS).replace(/\n?$/, "\n") +
      "  - id: red\n    upper: 5s5p-3P1\n    lower: 5s-S1/2\n" +
      "  - id: blue\n    upper: 5p-P3/2\n    lower: 5s5p-3P2\n    multipole: E2\n" +
      "  - id: fine\n    upper: 5s5p-3P2\n    lower: 5s5p-3P1\n    multipole: M1\n";
    const lines = problemLines(text);
    expect(lines).toEqual([
      expect.stringMatching(/^species\/rb87\.yaml:32:11: level "5s5p-3P1" has integer J = 1, but the other levels .* half-integer J .*; one atom or ion/),
      expect.stringMatching(/^species\/rb87\.yaml:36:11: level "5s5p-3P2" has integer J = 2, but .*; one atom or ion/),
      expect.stringMatching(/^species\/rb87\.yaml:50:12: line red: upper level "5s5p-3P1" has integer J = 1 and lower level "5s-S1\/2" half-integer J = 1\/2; no photon joins/),
      expect.stringMatching(/^species\/rb87\.yaml:54:12: line blue: upper level "5p-P3\/2" has half-integer J = 3\/2 and lower level "5s5p-3P2" integer J = 2; no photon joins/),
    ]);
  });

  it("leaves a line between two levels of the minority kind alone (the levels are reported)", () => {
    const text = insertAfter(RB87, 29, TRIPLETS).replace(/\n?$/, "\n") + "  - id: fine\n    upper: 5s5p-3P2\n    lower: 5s5p-3P1\n    multipole: M1\n";
    expect(problemLines(text).every((l) => / level "5s5p-3P[12]" has integer J/.test(l))).toBe(true);
  });
});
