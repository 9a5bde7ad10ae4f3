// Row models of the per-species bench sheet, computed in src/site/sheet.ts
// (templates do no arithmetic).
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
    sheet: safe((data) => speciesSheet(data.s.result, { mList: true })),
    sheetFields: safe((data) => fieldRules(data.atlas.fields, data.atlas.constants)),
    sheetBohr: safe((data) => bohrRule(data.atlas.constants)),
    sheetAddress: safe((data) => sheetAddress(data.atlas.siteUrl, `species/${data.s.id}/sheet/`)),
  },
};
