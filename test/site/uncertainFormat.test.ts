import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { THIN_SPACE, formatUncertain, numberParts, partsText, uncertainParts } from "../../src/site/format.js";
import { uncertainDecimalParts } from "../../src/site/decimalText.js";
import { convertShiftUncertain } from "../../src/site/shiftUnits.js";
import { alignTable, numberCell, uncertainCell, type Table } from "../../src/site/table.js";
import { tableCsv } from "../../src/site/csv.js";

const T = THIN_SPACE;

describe("a computed value with its standard uncertainty (concise form)", () => {
  it("rounds the uncertainty to two significant digits and the value to the same last place", () => {
    // GUM (JCGM 100:2008) §7.2.6: at most two significant digits; §7.2.2 form (2): the uncertainty in units of the last digit.
    expect(formatUncertain(dec("0.6995833012"), dec("0.000000123"))).toBe(`0.699${T}583${T}30(12)`);
    // the GUM's own example of §7.2.2: m_S = 100.021 47(35) g
    expect(formatUncertain(dec("100.0214712"), dec("0.00035"))).toBe(`100.021${T}47(35)`);
  });

  it("rounds both halves to even, like every other rounding of the site", () => {
    // u = 0.125 → 0.12 (half to even, common practice of the project's decimal rounding); value 2.0125 → 2.01 at that place
    expect(formatUncertain(dec("2.015"), dec("0.125"))).toBe("2.02(12)");
    expect(formatUncertain(dec("2.025"), dec("0.135"))).toBe("2.02(14)");
  });

  it("moves the last place when the uncertainty rounds up to a new digit", () => {
    // 0.0996 → 0.10 (two significant digits): the last place is 10⁻², written (10)
    expect(formatUncertain(dec("1.23456"), dec("0.0996"))).toBe("1.23(10)");
  });

  it("writes the uncertainty itself in parentheses when its last digit is left of the point", () => {
    // 123 456 ± 1 234: u → 1 200, value → 123 500 (common practice: the parenthesis is in units of the last digit shown, here 1)
    expect(formatUncertain(dec("123456"), dec("1234"))).toBe(`123${T}500(1200)`);
    expect(formatUncertain(dec("123456"), dec("12"))).toBe(`123${T}456(12)`);
  });

  it("uses the ×10ⁿ form for very large and very small magnitudes, with a digit before the point", () => {
    // 87Rb D2 frequency c/λ ≈ 384 230 484 468 500 Hz with u = 1 234 Hz (made-up u for the form)
    expect(formatUncertain(dec("384230484468500"), dec("1234"))).toBe(`3.842${T}304${T}844${T}685(12)×10¹⁴`);
    expect(formatUncertain(dec("0.000000780241209686"), dec("0.0000000000000013"))).toBe(`7.802${T}412${T}097(13)×10⁻⁷`);
    // an uncertainty larger than the value sets the exponent (its leading digit, 10⁻⁷); the value 5×10⁻⁹ rounds to 0 at the last place 10⁻⁸ (half to even)
    expect(formatUncertain(dec("5e-9"), dec("1.2e-7"))).toBe("0.0(12)×10⁻⁷");
    expect(formatUncertain(dec("6e-9"), dec("1.2e-7"))).toBe("0.1(12)×10⁻⁷");
  });

  it("keeps a true minus and drops the sign of a value that rounds to zero", () => {
    expect(formatUncertain(dec("-0.0009951414"), dec("0.0000000010"))).toBe(`−0.000${T}995${T}141${T}4(10)`);
    expect(formatUncertain(dec("-0.0004"), dec("0.012"))).toBe("0.000(12)");
  });

  it("is the plain significant-digit form for an exact value", () => {
    expect(uncertainParts(dec("0.5"), null, 9)).toEqual(numberParts(dec("0.5"), 9));
    expect(uncertainParts(dec("2.00231930436"), dec("0"), 6)).toEqual(numberParts(dec("2.00231930436"), 6));
  });

  it("scales value and uncertainty together into another unit, exactly", () => {
    // 13 996 244 917.1(44) Hz/T (μB/h, CODATA 2022) in MHz/G: × 1e-4 / 1e6 → 1.399 624 491 71(44)
    expect(partsText(uncertainDecimalParts("13996244917.1", "4.4", "1e-4", "1e6")!)).toBe(`1.399${T}624${T}491${T}71(44)`);
    expect(partsText(convertShiftUncertain("13996244917.1", "4.4", "Hz/T")!)).toBe(`13${T}996${T}244${T}917.1(44)`);
    expect(uncertainDecimalParts("1", "0", "1", "1")).toBeNull();
  });
});

describe("uncertain table cells", () => {
  it("is exactly today's number cell without an uncertainty", () => {
    expect(uncertainCell(dec("1.25"), null, 9, { hzPerT: "1" })).toEqual(numberCell(dec("1.25"), 9, { hzPerT: "1" }));
    expect(uncertainCell(null, dec("1"))).toEqual(numberCell(null));
  });

  it("keeps the concise uncertainty apart, aligns it with the column and writes a 'u' column in the CSV", () => {
    const t: Table = alignTable({
      id: "t",
      caption: "c",
      csvPath: "t.csv",
      columns: [{ key: "g", label: "gF", kind: "number" }],
      rows: [
        { anchor: "a", cells: [uncertainCell(dec("0.4998364196"), dec("0.0000000500056"))] },
        { anchor: "b", cells: [uncertainCell(dec("-0.5"), null, 3)] },
      ],
    });
    expect(t.rows[0]!.cells[0]!.parts!.unc).toBe("(50)");
    expect(t.rows[0]!.cells[0]!.text).toBe(`0.499${T}836${T}420(50)`);
    // "−0.5" is padded by as many digit widths as ".499 836 420(50)" has more digits
    expect(t.rows[1]!.cells[0]!.parts!.pad!.length).toBeGreaterThan(8);
    const csv = tableCsv(t).split("\r\n");
    expect(csv[0]).toBe("anchor,gF,gF u");
    expect(csv[1]).toBe("a,0.4998364196,0.0000000500056");
    expect(csv[2]).toBe("b,-0.5,");
  });

  it("refuses a switchable cell without its uncertainty in Hz/T", () => {
    expect(() => uncertainCell(dec("1"), dec("0.1"), 9, { hzPerT: "1" })).toThrow(/Hz\/T/);
  });
});
