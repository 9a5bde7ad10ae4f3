import { describe, expect, it } from "vitest";
import { checkLineReferences } from "../../src/checks/lineReferences.js";
import { realExport } from "./realExport.js";

describe("the line-reference check", () => {
  it("accepts the exports the build makes", () => {
    expect(checkLineReferences(realExport("rb87"), "rb87.json")).toEqual([]);
    expect(checkLineReferences(realExport("sr88"), "sr88.json")).toEqual([]);
  });

  it("reports a line whose lower level is not listed", () => {
    const e = realExport("rb87");
    e.lines[0].lower = "6s-S1/2";
    expect(checkLineReferences(e, "rb87.json")).toEqual(['rb87.json: line "D1" has lower level "6s-S1/2", which is not among its levels']);
  });

  it("reports a line left pointing at a removed level", () => {
    const e = realExport("rb87");
    e.levels = e.levels.filter((l: { id: string }) => l.id !== "5p-P3/2");
    expect(checkLineReferences(e, "rb87.json")).toEqual(['rb87.json: line "D2" has upper level "5p-P3/2", which is not among its levels']);
  });

  it("reports repeated level and line ids", () => {
    const e = realExport("rb87");
    e.levels.push(e.levels[0]);
    e.lines.push(e.lines[0]);
    expect(checkLineReferences(e, "rb87.json")).toEqual(['rb87.json: level "5s-S1/2" appears twice', 'rb87.json: line "D1" appears twice']);
  });
});
