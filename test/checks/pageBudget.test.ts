import { describe, expect, it } from "vitest";
import { checkPageBudget } from "../../src/checks/pageBudget.js";

describe("page weight budget", () => {
  it("refuses any page above 500 kB and a species overview from 250 kB", () => {
    expect(checkPageBudget("species/rb87/line/D2/index.html", 499_999)).toEqual([]);
    expect(checkPageBudget("species/rb87/line/D2/index.html", 500_001)).toEqual(["species/rb87/line/D2/index.html: 500001 bytes, over the 500000-byte budget of a page"]);
    expect(checkPageBudget("species/rb87/index.html", 249_999)).toEqual([]);
    expect(checkPageBudget("species/rb87/index.html", 250_000)).toHaveLength(1);
    expect(checkPageBudget("index.html", 400_000)).toEqual([]);
  });
});
