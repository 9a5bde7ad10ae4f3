import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import Ajv2020 from "ajv/dist/2020.js";
import { parse } from "yaml";
import { describe, expect, it } from "vitest";
import { EDITIONS } from "../../src/physics/constants/editions.js";
import { HYPERFINE_KEYS, LEVEL_KEYS, LINE_KEYS, NUCLEUS_KEYS, SPECIES_KEYS } from "../../src/data/speciesFile.js";
import { SITE_KEYS } from "../../src/data/siteFile.js";
import { edit, RB87, SITE, SR88 } from "../catalogue/validData.js";

const root = join(import.meta.dirname, "..", "..");
const speciesSchema = JSON.parse(readFileSync(join(root, "schema/species.schema.json"), "utf8"));
const siteSchema = JSON.parse(readFileSync(join(root, "schema/site.schema.json"), "utf8"));
const ajv = new Ajv2020.default({ allErrors: true, strict: true, strictRequired: false });
const validSpecies = ajv.compile(speciesSchema);
const validSite = ajv.compile(siteSchema);
// The editor's view of the file: YAML's core schema, aliases refused.
const js = (text: string): unknown => parse(text, { maxAliasCount: 0 });

describe("species.schema.json", () => {
  it("accepts the valid test species", () => {
    for (const text of [RB87, SR88]) expect(validSpecies(js(text)), JSON.stringify(validSpecies.errors)).toBe(true);
  });

  it("accepts levels outside LS coupling with their coupling", () => {
    const jk = edit(SR88, "term: 3Po0", "term: 2[3/2]o2\n    coupling: { scheme: jK, core: 2Po3/2, l: 0 }");
    const jj = edit(SR88, "term: 3Po0", 'term: "(3/2,1/2)1"\n    coupling: { scheme: jj, l: [1, 1] }');
    for (const text of [jk, jj]) expect(validSpecies(js(text)), JSON.stringify(validSpecies.errors)).toBe(true);
  });

  it("accepts unquoted numbers an editor sees as YAML numbers", () => {
    const text = edit(edit(RB87, `gJ: "2.00233113(20)"`, "gJ: 2.0023311300000000000000001"), "spin: 3/2", "spin: 1");
    expect(validSpecies(js(text)), JSON.stringify(validSpecies.errors)).toBe(true);
  });

  it.each([
    ["an unknown key", edit(RB87, "multipole: E1", "multipol: E1")],
    ["a missing id", edit(RB87, "id: rb87\n", "")],
    ["a species id with upper case", edit(RB87, "id: rb87", "id: Rb87")],
    ["a malformed term", edit(RB87, "term: 2S1/2", "term: 2S_{1/2}")],
    ["a wavelength in MHz", edit(RB87, `"780.241209686 nm"`, `"780 MHz"`)],
    ["both gI and moment", edit(RB87, `  source: "handbook data"\nnotes`, `  moment: "+2.751818 muN"\n  source: "handbook data"\nnotes`)],
    ["a level without source", edit(SR88, `    term: 3Po0\n    source: "handbook data"\n`, "    term: 3Po0\n")],
    ["a jK term without its coupling", edit(SR88, "term: 3Po0", "term: 2[3/2]o2")],
    ["a coupling beside an LS term", edit(SR88, "term: 3Po0", "term: 3Po0\n    coupling: { scheme: jK, core: 2Po3/2, l: 0 }")],
    ["a jj coupling with one l", edit(SR88, "term: 3Po0", "term: (3/2,1/2)1\n    coupling: { scheme: jj, l: [1] }")],
    ["an unknown multipole", edit(RB87, "multipole: E1", "multipole: E4")],
    ["a malformed number", edit(RB87, `gJ: "2.00233113(20)"`, `gJ: "2.0023x"`)],
  ])("rejects %s", (_name, text) => {
    expect(validSpecies(js(text))).toBe(false);
  });

  it("lists exactly the keys the loader knows", () => {
    const keys = (o: { properties: object }) => Object.keys(o.properties).sort();
    expect(keys(speciesSchema)).toEqual([...SPECIES_KEYS].sort());
    expect(keys(speciesSchema.properties.nucleus)).toEqual([...NUCLEUS_KEYS].sort());
    expect(keys(speciesSchema.$defs.level)).toEqual([...LEVEL_KEYS].sort());
    expect(keys(speciesSchema.$defs.level.properties.hyperfine)).toEqual([...HYPERFINE_KEYS].sort());
    expect(keys(speciesSchema.$defs.line)).toEqual([...LINE_KEYS].sort());
    expect(keys(siteSchema)).toEqual([...SITE_KEYS].sort());
  });

  it("describes every property for editor completion", () => {
    const walk = (o: unknown): void => {
      if (!o || typeof o !== "object") return;
      const props = (o as { properties?: Record<string, { description?: string }> }).properties;
      for (const [k, v] of Object.entries(props ?? {})) {
        expect(v.description, k).toBeTruthy();
        walk(v);
      }
      for (const v of Object.values((o as { $defs?: object }).$defs ?? {})) walk(v);
    };
    walk(speciesSchema);
    walk(siteSchema);
  });
});

describe("site.schema.json", () => {
  it("accepts the valid test site and an empty one", () => {
    expect(validSite(js(SITE)), JSON.stringify(validSite.errors)).toBe(true);
    expect(validSite({})).toBe(true);
  });

  it("offers exactly the constants editions the build knows", () => {
    expect(siteSchema.properties.constants.enum).toEqual(Object.keys(EDITIONS));
  });

  it.each([
    ["a negative field", edit(SITE, `"10 G"`, `"-10 G"`)],
    ["a field in an unknown unit", edit(SITE, `"10 G"`, `"10 Gauss"`)],
    ["a path prefix without slashes", edit(SITE, `"/atlas/"`, `"atlas"`)],
    ["an unknown key", edit(SITE, "fields:", "feilds:")],
  ])("rejects %s", (_name, text) => {
    expect(validSite(js(text))).toBe(false);
  });
});

// The demo data folder is written by someone else; check it when it is there.
const demo = join(root, "data");
const demoSpecies = existsSync(join(demo, "species")) ? readdirSync(join(demo, "species")).filter((n) => /\.ya?ml$/.test(n)) : [];
describe.skipIf(demoSpecies.length === 0 && !existsSync(join(demo, "site.yaml")))("the demo data folder", () => {
  it.each(demoSpecies)("species/%s validates against the schema", (name) => {
    expect(validSpecies(js(readFileSync(join(demo, "species", name), "utf8"))), JSON.stringify(validSpecies.errors)).toBe(true);
  });
  it.skipIf(!existsSync(join(demo, "site.yaml")))("site.yaml validates against the schema", () => {
    expect(validSite(js(readFileSync(join(demo, "site.yaml"), "utf8"))), JSON.stringify(validSite.errors)).toBe(true);
  });
});
