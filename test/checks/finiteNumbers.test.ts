import { describe, expect, it } from "vitest";
import { checkFiniteNumbers } from "../../src/checks/finiteNumbers.js";
import { realExport } from "./realExport.js";

describe("the finite-number check", () => {
  it("accepts the exports the build makes, field tables included", () => {
    expect(checkFiniteNumbers(realExport("rb87"), "rb87.json")).toEqual([]);
    expect(checkFiniteNumbers(realExport("sr88"), "sr88.json")).toEqual([]);
  });

  it.each([
    ["NaN"],
    ["Infinity"],
    ["-Infinity"],
  ])("reports a gJ of %s", (bad) => {
    const e = realExport("rb87");
    e.levels[0].gJ = bad;
    expect(checkFiniteNumbers(e, "rb87.json")).toEqual([`rb87.json: /levels/0/gJ is "${bad}", not a finite number`]);
  });

  it("reports a non-finite shift deep inside the hyperfine sublevels", () => {
    const e = realExport("rb87");
    e.levels[0].hyperfine[1].sublevels[2].shift_Hz_per_T = "NaN";
    expect(checkFiniteNumbers(e, "rb87.json")).toEqual(['rb87.json: /levels/0/hyperfine/1/sublevels/2/shift_Hz_per_T is "NaN", not a finite number']);
  });

  it("reports a g value that is not a decimal", () => {
    const e = realExport("sr88");
    e.lines[0].g_eff = "1,5";
    expect(checkFiniteNumbers(e, "sr88.json")).toEqual(['sr88.json: /lines/0/g_eff is "1,5", not a finite decimal']);
  });

  it("reports an exact value that is not a fraction", () => {
    const e = realExport("sr88");
    e.levels[1].gJ_exact = "1.5";
    expect(checkFiniteNumbers(e, "sr88.json")).toEqual(['sr88.json: /levels/1/gJ_exact is "1.5", not an exact fraction']);
  });

  it("lets free text say NaN", () => {
    const e = realExport("sr88");
    e.label = "NaN";
    e.levels[0].config = "Infinity";
    expect(checkFiniteNumbers(e, "sr88.json")).toEqual([]);
  });
});
