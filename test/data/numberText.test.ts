import { describe, expect, it } from "vitest";
import { parseMeasured, parseQuantity, MOMENT_UNITS } from "../../src/data/numberText.js";

function measured(text: string) {
  const r = parseMeasured(text);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

describe("parseMeasured", () => {
  it("keeps all 25 significant digits of a long numeral", () => {
    // 25 significant digits; a JavaScript number would keep about 17 (common practice)
    const m = measured("2.002331130000000000000001");
    expect(m.value.toFixed()).toBe("2.002331130000000000000001");
    expect(m.uncertainty).toBeNull();
  });

  it("reads concise uncertainty in units of the last digit", () => {
    // concise notation as in the CODATA tables, e.g. gJ 2.00233113(20) = 2.00233113 ± 0.00000020 (common practice)
    const m = measured("2.00233113(20)");
    expect(m.value.toFixed()).toBe("2.00233113");
    expect(m.uncertainty?.toFixed()).toBe("0.0000002");
    expect(m.text).toBe("2.00233113(20)");
  });

  it("applies the exponent to value and uncertainty alike", () => {
    // 1.234(5)e-3 = (1.234 ± 0.005) × 10^-3 (common practice)
    const m = measured("1.234(5)e-3");
    expect(m.value.toFixed()).toBe("0.001234");
    expect(m.uncertainty?.toFixed()).toBe("0.000005");
  });

  it("reads an integer with concise uncertainty", () => {
    // 12(3) = 12 ± 3 (common practice)
    const m = measured("12(3)");
    expect(m.value.toFixed()).toBe("12");
    expect(m.uncertainty?.toFixed()).toBe("3");
  });

  it("reads value ± uncertainty", () => {
    // 2.5 ± 0.1 (common practice)
    const m = measured("2.5 ± 0.1");
    expect(m.value.toFixed()).toBe("2.5");
    expect(m.uncertainty?.toFixed()).toBe("0.1");
    expect(measured("2.5 +/- 0.1").uncertainty?.toFixed()).toBe("0.1");
  });

  it.each([".inf", "-.inf", ".nan", "0x1F", "0o17", "1,5", "1_000", "", "abc", "1.2.3", "--1", "1e", "(3)"])("refuses %j", (t) => {
    expect(parseMeasured(t).ok).toBe(false);
  });

  it("refuses more than 200 digits and accepts 200", () => {
    expect(parseMeasured("1" + "0".repeat(199)).ok).toBe(true);
    expect(parseMeasured("1" + "0".repeat(200)).ok).toBe(false);
  });
});

describe("parseQuantity", () => {
  it("converts a wavelength in nm to metres exactly", () => {
    // 1 nm = 1e-9 m by definition (SI prefix)
    const r = parseQuantity("780.241209686 nm", "length", "wavelength");
    expect(r.ok && r.value.si.toFixed()).toBe("0.000000780241209686");
    expect(r.ok && r.value.unit).toBe("nm");
  });

  it("converts cm-1 to Hz with c exact", () => {
    // 1 cm^-1 ↔ 100 c Hz = 29 979 245 800 Hz, c = 299 792 458 m/s exact (SI definition)
    const r = parseQuantity("1 cm-1", "frequency", "energy");
    expect(r.ok && r.value.si.toFixed()).toBe("29979245800");
  });

  it("converts an uncertainty together with its value", () => {
    // 84.7185(20) MHz = 84 718 500 ± 2 000 Hz (SI prefix)
    const r = parseQuantity("84.7185(20) MHz", "frequency", "A");
    expect(r.ok && r.value.siUncertainty?.toFixed()).toBe("2000");
  });

  it("converts gauss to tesla", () => {
    // 1 G = 1e-4 T (CGS–SI definition)
    const r = parseQuantity("1000 G", "field", "field");
    expect(r.ok && r.value.si.toFixed()).toBe("0.1");
  });

  it("names the right units when the unit is of the wrong kind", () => {
    const r = parseQuantity("780 MHz", "length", "wavelength");
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.message).toMatch(/frequency unit, not a length unit/);
      expect(r.hint).toMatch(/nm/);
    }
  });

  it("accepts nuclear moments in muN with either Greek mu or micro sign", () => {
    for (const t of ["2.751818 muN", "2.751818 μN", "2.751818 µN"]) {
      const r = parseQuantity(t, MOMENT_UNITS, "moment");
      expect(r.ok && r.value.value.toFixed()).toBe("2.751818");
    }
  });

  it("refuses a number without a unit", () => {
    expect(parseQuantity("780", "length", "wavelength").ok).toBe(false);
  });
});
