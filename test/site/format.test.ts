import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { Rational } from "../../src/physics/rational.js";
import { FIGURE_SPACE, THIN_SPACE, groupDigits, numberParts, partsText, writtenDigits, writtenParts } from "../../src/site/format.js";
import { PUNCTUATION_SPACE, alignTable, fractionCell, measuredCell, numberCell, type Cell, type Table } from "../../src/site/table.js";
import { buildDateFrom } from "../../src/build/build.js";

const T = THIN_SPACE;

describe("numbers as written", () => {
  it("keeps the written digits and concise uncertainty of a measured value, grouped in threes", () => {
    // 87Rb ground-state gJ as printed in the demo data's source (Steck): 2.00233113(20).
    expect(partsText(writtenParts("2.00233113(20)")!)).toBe(`2.002${T}331${T}13(20)`);
    // A value given to three digits is not padded to more.
    expect(partsText(writtenParts("0.666")!)).toBe("0.666");
    expect(partsText(writtenParts("-0.0009951414(10)")!)).toBe(`−0.000${T}995${T}141${T}4(10)`);
    expect(partsText(writtenParts("2.5 ± 0.1")!)).toBe("2.5 ± 0.1");
    expect(partsText(writtenParts("1.2e-3")!)).toBe("1.2×10⁻³");
    expect(writtenParts("abc")).toBeNull();
  });

  it("counts written significant digits", () => {
    expect(writtenDigits("407.24")).toBe(5);
    expect(writtenDigits("0.00120")).toBe(3);
    expect(writtenDigits("3417.341305452145")).toBe(16);
  });

  it("shows a measured cell as written and sorts it by value", () => {
    const c = measuredCell({ value: dec("1.3362"), uncertainty: dec("0.0013"), text: "1.3362(13)" });
    expect(c.text).toBe("1.3362(13)");
    expect(c.sort).toBe("1.3362");
  });
});

describe("digit grouping", () => {
  it("groups in threes from the point with thin spaces, leaving four digits alone unless forced", () => {
    // SI Brochure 9th ed. §5.4.4: groups of three separated by a thin space; four-digit groups may stay unsplit.
    expect(groupDigits("1234", false)).toBe("1234");
    expect(groupDigits("12345", false)).toBe(`12${T}345`);
    expect(groupDigits("1234", false, true)).toBe(`1${T}234`);
    expect(groupDigits("12345", true)).toBe(`123${T}45`);
    // μB/h = 1.399 624 491 71… MHz/G (CODATA 2022: 13.996 244 9171 GHz/T).
    expect(partsText(numberParts(dec("1.39962449171"), 9))).toBe(`1.399${T}624${T}49`);
  });
});

describe("exact fractions beside decimals", () => {
  it("writes = for a terminating decimal and ≈ otherwise", () => {
    expect(fractionCell(Rational.of(1, 4)).text).toBe("1/4 = 0.25");
    // gJ of 2P1/2 in LS coupling with gS = 2 is exactly 2/3 (common practice).
    expect(fractionCell(Rational.of(2, 3)).text).toBe(`2/3 ≈ 0.666${T}667`);
    expect(fractionCell(Rational.of(-3, 2)).text).toBe("−3/2 = −1.5");
    expect(fractionCell(Rational.of(2)).text).toBe("2");
    expect(fractionCell(Rational.of(1, 4)).exact).toBe("1/4");
  });
});

/** Width to the right of the decimal point in digit, point and thin-space units. */
function rightSide(c: Cell): { fig: number; punct: number; thin: number } {
  const p = c.parts!;
  const s = p.frac + (p.unc ?? "") + p.exp + (p.pad ?? "");
  const count = (re: RegExp) => [...s].filter((ch) => re.test(ch)).length;
  return { fig: count(new RegExp(`[0-9${FIGURE_SPACE}]`)), punct: count(new RegExp(`[.()${PUNCTUATION_SPACE}]`)), thin: count(new RegExp(THIN_SPACE)) };
}

describe("alignTable", () => {
  const col = (cells: Cell[]): Table => ({
    id: "t",
    caption: "t",
    csvPath: "t.csv",
    columns: [{ key: "x", label: "x", kind: "number" }],
    rows: cells.map((c, i) => ({ anchor: `r${i}`, cells: [c] })),
  });

  it("pads every cell of a number column to the same width right of the point", () => {
    const t = alignTable(col([numberCell(dec("1.404011524"), 9), numberCell(dec("14.04011524"), 9), numberCell(dec("0")), numberCell(dec("-0.5"))]));
    const sides = t.rows.map((r) => rightSide(r.cells[0]!));
    for (const s of sides) expect(s).toEqual(sides[0]);
    // A whole number gets a point-wide space where the others have their point.
    expect(t.rows[2]!.cells[0]!.parts!.pad).toContain(PUNCTUATION_SPACE);
  });

  it("groups a column one way: four-digit runs are split when a neighbour has five or more", () => {
    const t = alignTable(col([numberCell(dec("1234.5"), 5), numberCell(dec("12345.6"), 6)]));
    expect(t.rows[0]!.cells[0]!.parts!.int).toBe(`1${T}234`);
    expect(t.rows[0]!.cells[0]!.text).toBe(`1${T}234.5`);
  });

  it("lines up measured values with their uncertainty and plain ones", () => {
    const t = alignTable(col([measuredCell({ value: dec("2.00233113"), uncertainty: null, text: "2.00233113(20)" }), measuredCell({ value: dec("0.666"), uncertainty: null, text: "0.666" })]));
    const [a, b] = t.rows.map((r) => rightSide(r.cells[0]!));
    expect(a).toEqual(b);
  });
});

describe("build date", () => {
  it("comes from SOURCE_DATE_EPOCH when set, else from the clock", () => {
    // 1798761600 s after 1970-01-01T00:00Z is 2027-01-01T00:00Z (20 819 days; common practice).
    expect(buildDateFrom({ SOURCE_DATE_EPOCH: "1798761600" })).toBe("2027-01-01T00:00:00.000Z");
    expect(buildDateFrom({}, () => new Date("2026-05-04T03:02:01Z"))).toBe("2026-05-04T03:02:01.000Z");
    expect(buildDateFrom({ SOURCE_DATE_EPOCH: "soon" }, () => new Date("2026-05-04T03:02:01Z"))).toBe("2026-05-04T03:02:01.000Z");
  });
});

describe("numerical zeros in tables", () => {
  it("shows a computed value below 1e-40 of its table's largest magnitude in the same unit as 0, and keeps the others", async () => {
    const { makeTable } = await import("../../src/site/tableSpec.js");
    const { numberCell: cell } = await import("../../src/site/table.js");
    // Values as the 60-digit solvers leave them: a zero-field shift of 1e-51 MHz beside shifts of order 1e3 MHz
    // (the 40-digit margin is the documented rule, src/site/tableSpec.ts).
    const t = makeTable({ id: "t", caption: "t", csvPath: "", anchor: (_r: string, i) => `r${i}`, columns: [{ key: "x", label: "x", kind: "number", cell: (r: string) => cell(dec(r), 9) }] }, ["1e-51", "-2563.005979", "1e-30", "0"]);
    expect(t.rows.map((r) => r.cells[0]!.text.replace(/[\u2007\u2008\u2009]/g, ""))).toEqual(["0", "−2563.00598", "1×10⁻³⁰", "0"]);
  });
});

describe("numerical zeros in a column of residues", () => {
  it("takes the scale from the table's other columns of the same unit", async () => {
    const { makeTable } = await import("../../src/site/tableSpec.js");
    const { numberCell: cell } = await import("../../src/site/table.js");
    // A fine-structure shift table: at 0 G every shift is a residue near 1e-50 MHz, at 1 T they are of order 1e4 MHz.
    const rows = [["-1e-50", "-13996.2"], ["2e-50", "9330.8"]];
    const t = makeTable(
      {
        id: "t", caption: "t", csvPath: "", anchor: (_r: string[], i) => `r${i}`,
        columns: [0, 1].map((k) => ({ key: `E${k}`, label: `E${k}`, unit: "MHz", kind: "number" as const, cell: (r: string[]) => cell(dec(r[k]!), 9) })),
      },
      rows,
    );
    expect(t.rows.map((r) => r.cells[0]!.text.replace(/[\u2007\u2008\u2009]/g, ""))).toEqual(["0", "0"]);
  });
});
