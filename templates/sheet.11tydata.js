// Row models of the all-species bench sheet, computed in src/site/sheet.ts.
import { types } from "node:util";
import { bohrRule, fieldRules, sheetAddress, speciesSheet } from "../src/site/sheet.ts";

// Eleventy first calls computed functions on a stand-in of the data to learn
// which keys they read; its arrays are not the real ones, so that pass may
// throw. Only that pass is forgiven: a failure on the real data stops the build.
const safe = (fn) => (data) => {
  try {
    return fn(data);
  } catch (e) {
    if (!types.isProxy(data)) throw e;
    return undefined;
  }
};

export default {
  eleventyComputed: {
    sheets: safe((data) => data.atlas.species.map((s) => speciesSheet(s.result, { mList: false }))),
    sheetFields: safe((data) => fieldRules(data.atlas.fields, data.atlas.constants)),
    sheetBohr: safe((data) => bohrRule(data.atlas.constants)),
    sheetAddress: safe((data) => sheetAddress(data.atlas.siteUrl, "sheet/")),
  },
};
