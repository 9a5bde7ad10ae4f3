import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkExportSchema, EXPORT_SCHEMA_PATH } from "../../src/checks/exportSchema.js";
import { realExport } from "./realExport.js";

describe("the export schema check", () => {
  it("accepts the exports the build makes", () => {
    expect(checkExportSchema(realExport("rb87"), "rb87.json")).toEqual([]);
    expect(checkExportSchema(realExport("sr88"), "sr88.json")).toEqual([]);
  });

  it("is a documented draft 2020-12 schema", () => {
    const schema = JSON.parse(readFileSync(EXPORT_SCHEMA_PATH, "utf8"));
    expect(schema.$schema).toBe("https://json-schema.org/draft/2020-12/schema");
    expect(schema.description.length).toBeGreaterThan(50);
    for (const def of ["level", "line"]) {
      for (const [key, prop] of Object.entries(schema.$defs[def].properties as Record<string, { description?: string }>)) {
        expect(prop.description, `${def}.${key}`).toBeTruthy();
      }
    }
  });

  it("reports a level without its sublevels", () => {
    const e = realExport("rb87");
    delete e.levels[0].sublevels;
    expect(checkExportSchema(e, "rb87.json").join("\n")).toMatch(/rb87\.json: schema: \/levels\/0 must have required property 'sublevels'/);
  });

  it("reports a shift given as a JSON number", () => {
    const e = realExport("rb87");
    e.levels[0].sublevels[0].shift_Hz_per_T = 1.5;
    expect(checkExportSchema(e, "rb87.json").join("\n")).toMatch(/\/levels\/0\/sublevels\/0\/shift_Hz_per_T must be string/);
  });

  it("reports a polarization outside π and σ±", () => {
    const e = realExport("sr88");
    e.lines[0].components[0].polarization = "circular";
    expect(checkExportSchema(e, "sr88.json").join("\n")).toMatch(/\/lines\/0\/components\/0\/polarization must be equal to one of the allowed values/);
  });

  it("reports a wrong format name", () => {
    const e = realExport("sr88");
    e.format = "something-else@9";
    expect(checkExportSchema(e, "sr88.json")).toEqual(["sr88.json: schema: /format must be equal to constant"]);
  });

  it("allows keys it does not know (later additions of the same format)", () => {
    const e = realExport("sr88");
    e.levels[0].a_new_table = [{ anything: 1 }];
    expect(checkExportSchema(e, "sr88.json")).toEqual([]);
  });
});
