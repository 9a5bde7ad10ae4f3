import { describe, expect, it } from "vitest";
import { checkStrengthSums } from "../../src/checks/strengthSums.js";
import { realExport } from "./realExport.js";

describe("the strength-sum check", () => {
  it("accepts every line the build makes", () => {
    expect(checkStrengthSums(realExport("rb87"), "rb87.json")).toEqual([]);
    expect(checkStrengthSums(realExport("sr88"), "sr88.json")).toEqual([]);
  });

  it("accepts the Na D2 textbook strengths 3:1:2:2:1:3 over 12, which sum to 1", () => {
    // Na D2 relative strengths: Condon & Shortley (1935) §16, common practice.
    const line = { id: "D2", components: ["1/4", "1/12", "1/6", "1/6", "1/12", "1/4"].map((strength) => ({ strength })) };
    expect(checkStrengthSums({ lines: [line] }, "x.json")).toEqual([]);
  });

  it("reports a line with a dropped component", () => {
    const e = realExport("rb87");
    e.lines[1].components.pop();
    expect(checkStrengthSums(e, "rb87.json")).toEqual([expect.stringMatching(/^rb87\.json: line "D2" strengths sum to \d+\/\d+, not 1$/)]);
  });

  it("reports a sum that misses 1 by far less than a float could see", () => {
    const line = { id: "L", components: [{ strength: "1/2" }, { strength: "500000000000000000001/1000000000000000000000" }] };
    expect(checkStrengthSums({ lines: [line] }, "x.json")).toEqual(['x.json: line "L" strengths sum to 1000000000000000000001/1000000000000000000000, not 1']);
  });

  it("reports a strength written as a decimal instead of an exact fraction", () => {
    const line = { id: "L", components: [{ strength: "0.5" }, { strength: "1/2" }] };
    expect(checkStrengthSums({ lines: [line] }, "x.json")).toEqual(['x.json: line "L" component #0 has strength "0.5", not an exact fraction']);
  });

  it("reports a zero or negative strength", () => {
    const line = { id: "L", components: [{ strength: "3/2" }, { strength: "-1/2" }] };
    expect(checkStrengthSums({ lines: [line] }, "x.json")).toEqual(['x.json: line "L" component #1 has strength -1/2, not positive']);
  });
});

describe("the strength-sum check on hyperfine groups and field tables", () => {
  const rbLine = (): Record<string, any> => realExport("rb87").lines[1];

  it("accepts the groups and field tables the build makes", () => {
    const line = rbLine();
    expect(line.hyperfine_groups.length).toBeGreaterThan(0);
    expect(line.at_fields.length).toBeGreaterThan(0);
    expect(checkStrengthSums({ lines: [line] }, "rb87.json")).toEqual([]);
  });

  it("reports group strengths that do not sum to 1", () => {
    const line = rbLine();
    line.hyperfine_groups.pop();
    expect(checkStrengthSums({ lines: [line] }, "rb87.json").join("\n")).toMatch(/hyperfine group strengths sum to \d+\/\d+, not 1/);
  });

  it("reports a group whose components miss its strength", () => {
    const line = rbLine();
    line.hyperfine_groups[0].components.pop();
    expect(checkStrengthSums({ lines: [line] }, "rb87.json").join("\n")).toMatch(/hyperfine group #0 components sum to \d+\/\d+, not its strength \d+\/\d+/);
  });

  it("reports field-table strengths that do not sum to 1 beyond rounding", () => {
    const line = rbLine();
    line.at_fields[2].components.pop();
    expect(checkStrengthSums({ lines: [line] }, "rb87.json").join("\n")).toMatch(/at .+: relative strengths sum to 0\.\d+, not 1/);
  });
});
