import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import {
  hzPerTeslaToGHzPerTesla,
  hzPerTeslaToMHzPerGauss,
  hzPerTeslaToWavenumberPerTesla,
  linearShiftPerTesla,
} from "../../src/physics/zeeman.js";

const MUB_H = new Dec("13996244917.1"); // CODATA 2022, Hz/T

describe("linearShiftPerTesla", () => {
  it("repeats its worked example: g·m = 1 is 1.39962449171 MHz/G, the 1.4 MHz/G bench rule", () => {
    // common practice: "1.4 MHz per gauss per unit g·m"; CODATA 2022 μB/h.
    const s = linearShiftPerTesla(new Dec(1), 2, MUB_H);
    expect(s.toString()).toBe("13996244917.1");
    expect(hzPerTeslaToMHzPerGauss(s).toString()).toBe("1.39962449171");
    expect(hzPerTeslaToMHzPerGauss(s).toDecimalPlaces(1).toNumber()).toBe(1.4);
  });

  it("gives 0.70 MHz/G for the 87Rb ground state F = 2, mF = 1 (gF = 1/2)", () => {
    // D. A. Steck, "Rubidium 87 D Line Data", table 7 and §4: gF = 1/2 for
    // 5S1/2 F = 2 gives 0.70 MHz/G for mF = 1.
    const s = hzPerTeslaToMHzPerGauss(linearShiftPerTesla(new Dec("0.5"), 2, MUB_H));
    expect(s.toDecimalPlaces(2).toString()).toBe("0.7");
  });

  it("is zero for J = 0 (no g) and for m = 0", () => {
    expect(linearShiftPerTesla(null, 0, MUB_H).isZero()).toBe(true);
    expect(linearShiftPerTesla(new Dec(2), 0, MUB_H).isZero()).toBe(true);
  });

  it("is odd in m", () => {
    const g = new Dec("1.3362");
    expect(linearShiftPerTesla(g, -3, MUB_H).neg().eq(linearShiftPerTesla(g, 3, MUB_H))).toBe(true);
  });
});

describe("unit conversions", () => {
  it("converts μB/h to μB/(hc) in cm⁻¹/T as CODATA 2022 tabulates it", () => {
    // CODATA 2022: μB/(hc) = 46.686 447 719(15) m⁻¹ T⁻¹ = 0.466 864 477 19 cm⁻¹/T.
    const w = hzPerTeslaToWavenumberPerTesla(MUB_H);
    expect(w.toSignificantDigits(11).toString()).toBe("0.46686447719");
  });

  it("converts Hz/T to GHz/T by 1e-9", () => {
    expect(hzPerTeslaToGHzPerTesla(MUB_H).toString()).toBe("13.9962449171");
  });
});
