import { describe, expect, it } from "vitest";
import { didYouMean, editDistance, nearest } from "../../src/data/didYouMean.js";

describe("didYouMean", () => {
  it("counts a swap of neighbours as one edit", () => {
    // optimal string alignment distance: kitten→sitting is 3, ab→ba is 1 (common practice)
    expect(editDistance("kitten", "sitting")).toBe(3);
    expect(editDistance("ab", "ba")).toBe(1);
    expect(editDistance("", "abc")).toBe(3);
  });

  it("suggests the close key and nothing for far ones", () => {
    expect(didYouMean("multipol", ["upper", "lower", "multipole"])).toBe("multipole");
    expect(didYouMean("lable", ["id", "label", "levels"])).toBe("label");
    expect(didYouMean("GJ", ["gJ", "term"])).toBe("gJ");
    expect(didYouMean("zzzz", ["gJ", "term"])).toBeNull();
  });

  it("orders candidates by closeness", () => {
    expect(nearest("5p-P3/2x", ["5s-S1/2", "5p-P3/2", "5p-P1/2"], 2)).toEqual(["5p-P3/2", "5p-P1/2"]);
  });
});
