import { rmSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";
import { InputProblems } from "../../src/data/inputError.js";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { BAD_INPUTS } from "../catalogue/badInputs.js";
import { validFolder } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";

const made: string[] = [];
afterAll(() => {
  for (const d of made) rmSync(d, { recursive: true, force: true });
});

function problemsOf(files: ReturnType<typeof validFolder>): string[] {
  const dir = writeFolder(files);
  made.push(dir);
  try {
    loadDataFolder(dir);
  } catch (e) {
    if (e instanceof InputProblems) return e.format().split("\n");
    throw e;
  }
  return [];
}

describe("the bad-input catalogue", () => {
  it("holds at least 45 distinct cases", () => {
    expect(BAD_INPUTS.length).toBeGreaterThanOrEqual(45);
    expect(new Set(BAD_INPUTS.map((c) => c.name)).size).toBe(BAD_INPUTS.length);
  });

  it("starts from a folder that loads without problems", () => {
    expect(problemsOf(validFolder())).toEqual([]);
  });

  for (const c of BAD_INPUTS) {
    it(`reports ${c.name} as file:line:column with a hint`, () => {
      const lines = problemsOf(c.files());
      expect(lines.length).toBeGreaterThan(0);
      const hit = lines.find((l) => c.expect.test(l));
      expect(hit, `no line matched ${c.expect}\n${lines.join("\n")}`).toBeDefined();
      for (const l of lines) {
        expect(l).toMatch(/^[^\n]+:\d+:\d+: \S/);
        expect(l).not.toMatch(/\n|\s+at \S+ \(|\.ts:\d+:\d+\)/); // never a stack trace
      }
    });
  }
});
