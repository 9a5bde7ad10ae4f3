/**
 * The field text parser shared by the calculator and `npm run at`. Unit
 * factors are exact by definition (common practice: 1 G = 1e-4 T in the
 * CGS–SI correspondence, SI prefixes m = 1e-3, µ = 1e-6, k = 1e3).
 */
import { describe, expect, it } from "vitest";
import { parseFieldText } from "../../src/engine/fieldText.js";

const tesla = (text: string): string => {
  const p = parseFieldText(text);
  if (!p.ok) throw new Error(p.message);
  return p.tesla.toString();
};
const error = (text: string): string => {
  const p = parseFieldText(text);
  if (p.ok) throw new Error(`"${text}" was accepted`);
  return p.message;
};

describe("parseFieldText", () => {
  it("reads the doc comment's examples exactly", () => {
    expect(tesla("4.7 G")).toBe("0.00047"); // 1 G = 1e-4 T (common practice)
    expect(tesla("0.47mT")).toBe("0.00047");
    expect(tesla("37 µT")).toBe("0.000037");
    expect(tesla("0.37")).toBe("0.37"); // a plain number is tesla
    expect(tesla("1e-3 T")).toBe("0.001");
  });

  it("takes every field unit, with or without a space, and both spellings of micro", () => {
    expect(tesla("4.7G")).toBe("0.00047");
    expect(tesla("470 mG")).toBe("0.000047");
    expect(tesla("4.7 kG")).toBe("0.47");
    expect(tesla("470 uT")).toBe("0.00047");
    expect(tesla("470 μT")).toBe("0.00047"); // Greek mu
    expect(tesla("470µT")).toBe("0.00047"); // micro sign
    expect(tesla("  2   T ")).toBe("2");
    expect(tesla("0 G")).toBe("0");
    expect(tesla("1.5e3G")).toBe("0.15");
    expect(tesla(".5 T")).toBe("0.5");
  });

  it("refuses what is not a field, in one line each", () => {
    const bad = ["", "G", "4.7 Hz", "-4.7 G", "4.7(2) G", "four gauss", "4,7 G", "NaN", "Infinity T", "4.7 furlong", "1e999 T"];
    for (const b of bad) {
      const m = error(b);
      expect(m, b).not.toMatch(/\n/);
      expect(m.length, b).toBeGreaterThan(10);
    }
    expect(error("4.7 Hz")).toMatch(/frequency unit/);
    expect(error("-4.7 G")).toMatch(/negative/);
    expect(error("4.7(2) G")).toMatch(/uncertainty/);
  });

  it("accepts −0 as zero", () => {
    expect(tesla("-0 G")).toBe("0");
  });
});
