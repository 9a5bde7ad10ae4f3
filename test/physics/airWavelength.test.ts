import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../src/physics/decimal.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { val } from "../../src/physics/constants/constant.js";
import { airRefractiveIndex, airToVacuum, inAirFormulaRange, lorentzWavelengthPerTesla, vacuumToAir } from "../../src/physics/airWavelength.js";

const NM = new Dec("1e-9");
const nm = (text: string) => dec(text).mul(NM);
const inNm = (m: Dec) => m.div(NM).toNumber();
/** Within 1e-4 nm: both figures are rounded to 4 decimals. */
const near4 = (got: number, want: number) => expect(Math.abs(got - want)).toBeLessThanOrEqual(1.0001e-4);

describe("airRefractiveIndex", () => {
  it("repeats its worked example: n − 1 = 2.765 69e-4 at 630 nm", () => {
    expect(airRefractiveIndex(nm("630")).minus(1).toNumber()).toBeCloseTo(2.76569e-4, 9);
  });

  it("agrees near 630 nm with the He–Ne wavelengths in air and vacuum", () => {
    // He–Ne red line: 632.991 nm in vacuum (iodine-stabilized value 632.991 21 nm, from memory of the CIPM
    // recommended value) and 632.816 nm in standard air (common practice); their ratio is n at that wavelength,
    // to about 1e-6 from the last digit of 632.816.
    const n = 632.99121 / 632.816;
    expect(airRefractiveIndex(nm("632.99121")).toNumber()).toBeCloseTo(n, 6);
  });

  it("refuses wavelengths outside 200 nm – 2 µm", () => {
    expect(() => airRefractiveIndex(nm("150"))).toThrow(/outside the range of the air formula/);
    expect(() => airRefractiveIndex(nm("2500"))).toThrow(/outside the range of the air formula/);
    expect(inAirFormulaRange(nm("200"))).toBe(true);
    expect(inAirFormulaRange(nm("2000"))).toBe(true);
    expect(inAirFormulaRange(nm("199.9"))).toBe(false);
  });
});

describe("vacuumToAir and airToVacuum", () => {
  it("repeat the worked examples", () => {
    expect(inNm(vacuumToAir(nm("589.1583")))).toBeCloseTo(588.99506, 5);
    expect(inNm(airToVacuum(nm("630.2494")))).toBeCloseTo(630.4237, 5);
  });

  it("give the NIST ASD air and vacuum wavelengths of the sodium D lines", () => {
    // NIST Atomic Spectra Database, Na I: D2 588.9950 nm air / 589.1583 nm vacuum,
    // D1 589.5924 nm air / 589.7558 nm vacuum (from memory). The database converts with a
    // different standard-air formula (Peck & Reeder 1972), which agrees to about 1e-8 relative here.
    near4(inNm(vacuumToAir(nm("589.1583"))), 588.995);
    near4(inNm(airToVacuum(nm("588.9950"))), 589.1583);
    near4(inNm(vacuumToAir(nm("589.7558"))), 589.5924);
    near4(inNm(airToVacuum(nm("589.5924"))), 589.7558);
  });

  it("gives the He–Ne vacuum wavelength from its air wavelength", () => {
    // 632.816 nm in air (common practice) is 632.991 nm in vacuum (from memory, see above)
    expect(inNm(airToVacuum(nm("632.816")))).toBeCloseTo(632.991, 3);
  });

  it("round trip air → vacuum → air returns the air wavelength to 1e-40 relative, across the range", () => {
    for (const text of ["200.5", "253.652", "393.366", "630.2494", "1083.0", "1999"]) {
      const air = nm(text);
      const back = vacuumToAir(airToVacuum(air));
      expect(back.minus(air).abs().div(air).lte("1e-40")).toBe(true);
    }
  });

  it("refuses an air wavelength outside the range", () => {
    expect(() => airToVacuum(nm("100"))).toThrow(/outside the range of the air formula/);
  });
});

describe("lorentzWavelengthPerTesla", () => {
  const muB_hc = val(CODATA_2022.muB_hc);

  it("repeats its worked example: 18.5548 pm/T at 630.4237 nm", () => {
    expect(lorentzWavelengthPerTesla(nm("630.4237"), muB_hc).mul("1e12").toNumber()).toBeCloseTo(18.5548, 4);
  });

  it("agrees with Δλ = 4.6686e-13 λ² g B (λ, Δλ in Å, B in G) for Fe I 630.25 nm, g = 5/2, 1 kG", () => {
    // Δλ = 4.6686e-13 λ² g B, λ and Δλ in Å, B in G: common practice in solar spectroscopy.
    // Fe I 630.25 nm: g_eff = 5/2 (LS, both levels' Landé factors; textbook), vacuum λ from the
    // NIST ASD air wavelength 630.2494 nm (from memory) converted above.
    const lambdaA = 6304.237;
    const expectedA = 4.6686e-13 * lambdaA ** 2 * 2.5 * 1000;
    const perT = lorentzWavelengthPerTesla(nm("630.4237"), muB_hc); // m/T
    const got = perT.mul("2.5").mul("0.1").mul("1e10").toNumber(); // 1 kG = 0.1 T, in Å
    expect(Math.abs(got / expectedA - 1)).toBeLessThan(2e-5); // the rule's five digits
  });

  it("pm/T and mÅ/kG are the same number", () => {
    // 1 mÅ = 0.1 pm and 1 kG = 0.1 T (definitions of the units)
    const perT = lorentzWavelengthPerTesla(nm("525.1669"), muB_hc);
    const pmPerT = perT.mul("1e12");
    const mAPerKG = perT.mul("0.1").mul("1e13");
    expect(pmPerT.eq(mAPerKG)).toBe(true);
  });
});
