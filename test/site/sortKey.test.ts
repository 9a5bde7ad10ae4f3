import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { Rational } from "../../src/physics/rational.js";
import { fractionCell, numberCell, quantumCell, termCell, textCell } from "../../src/site/table.js";
import { SORT_DIGITS, shownKey, shownText, sortKey } from "../../src/site/sortKey.js";

describe("sortKey", () => {
  it("writes no data-sort in a text or term column where the cell's text gives the same key", () => {
    expect(sortKey(textCell("measured"), "text")).toBe(false);
    expect(sortKey(textCell("5p-P3/2", "species/rb87/#level:5p-P3/2"), "text")).toBe(false);
    // tables.js keeps the true minus (U+2212) of a label, so the label is its own key.
    expect(sortKey(textCell("F=1, mF=\u22121"), "text")).toBe(false);
    // ²P°₃/₂ reads "2Po3/2" as text, the same as its key.
    expect(sortKey(termCell({ text: "2Po3/2", multiplicity: 2, letter: "P", parity: "odd", J2: 3 }), "term")).toBe(false);
    expect(sortKey(textCell("—"), "text")).toBe("—");
  });

  it("always writes data-sort in number, fraction and quantum columns, even where the text would do", () => {
    // 84.718 5 with a thin space between digit groups (common practice: SI digit grouping).
    expect(sortKey(numberCell(dec("84.7185"), 6), "number")).toBe("84.7185");
    expect(sortKey(numberCell(null), "number")).toBe("");
    expect(sortKey(fractionCell(null), "fraction")).toBe("");
  });

  it("keeps data-sort where text and key differ: quantum numbers, negative numbers, rounded numbers", () => {
    expect(sortKey(quantumCell(1, true), "quantum")).toBe("0.5"); // m = +1/2 (common practice)
    expect(sortKey(numberCell(dec("-7.5")), "number")).toBe("-7.5");
    expect(sortKey(numberCell(dec("3761.11740432901379304131044184")), "number")).toBe("3761.1174043290138"); // rounded half-up at 17 digits (common practice)
  });

  it("cuts long keys to 17 significant digits and keeps their order", () => {
    // 4/3 = 1.333… (exact arithmetic); its key is rounded, not its CSV value.
    const c = fractionCell(Rational.of(4n, 3n));
    expect(sortKey(c, "fraction")).toBe("1.3333333333333333");
    expect(c.sort.length).toBeGreaterThan(SORT_DIGITS + 1);
    const a = sortKey(numberCell(dec("0.1234567890123456789"), 9), "number") as string;
    const b = sortKey(numberCell(dec("0.1234567890123457789"), 9), "number") as string;
    expect(dec(a).lessThan(dec(b))).toBe(true);
  });

  it("reads the text as the macro writes it and folds it as tables.js does", () => {
    const c = fractionCell(Rational.of(1n, 4n));
    expect(shownText(c, "fraction")).toBe(`1/4 = ${c.parts!.sign}${c.parts!.int}${c.parts!.frac}`); // 1/4 = 0.25 (exact arithmetic)
    expect(shownKey("\u2007 1\u2009234\u2008 ")).toBe("1234");
    expect(shownKey("—")).toBe("");
  });
});
