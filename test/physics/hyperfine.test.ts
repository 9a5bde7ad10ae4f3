import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { fValues, gF, hyperfineShift } from "../../src/physics/hyperfine.js";

const A = dec("3417.341305452145e6"); // 87Rb 5S1/2, D. A. Steck, "Rubidium 87 D Line Data"
const ZERO = dec("0");

describe("hyperfineShift", () => {
  it("puts 87Rb 5S1/2 F = 2 at +3A/4 and F = 1 at −5A/4 (doc example)", () => {
    expect(hyperfineShift(A, ZERO, 3, 1, 4).toString()).toBe("2563005979.08910875"); // 3A/4, exact arithmetic
    expect(hyperfineShift(A, ZERO, 3, 1, 2).toString()).toBe("-4271676631.81518125"); // −5A/4
    // ground-state splitting 6834.682610904290 MHz (Steck, Rubidium 87 D Line Data, Table 3)
    expect(hyperfineShift(A, ZERO, 3, 1, 4).minus(hyperfineShift(A, ZERO, 3, 1, 2)).toString()).toBe("6834682610.90429");
  });

  it("reproduces the 87Rb 5P3/2 F = 3 to F = 2 interval with the quadrupole term", () => {
    const a = dec("84.7185e6"); // Steck, Rubidium 87 D Line Data
    const b = dec("12.4965e6");
    const d = hyperfineShift(a, b, 3, 3, 6).minus(hyperfineShift(a, b, 3, 3, 4));
    // 3A + B = 266.6520 MHz; Steck lists the 5P3/2 F'=3–F'=2 interval as 266.650(9) MHz
    expect(d.toString()).toBe("266652000");
  });

  it("keeps the (2F+1)-weighted centre of the F levels at zero", () => {
    const a = dec("84.7185e6");
    const b = dec("12.4965e6");
    let sum = ZERO;
    for (const F2 of fValues(3, 3)) sum = sum.plus(hyperfineShift(a, b, 3, 3, F2).mul(F2 + 1)); // common practice: traceless
    expect(sum.abs().lt(dec("1e-40"))).toBe(true);
  });

  it("rejects an F that the triangle rule forbids", () => {
    expect(() => hyperfineShift(A, ZERO, 3, 1, 6)).toThrow(RangeError);
  });
});

describe("gF", () => {
  const gJ = dec("2.00233113"); // Steck, Rubidium 87 D Line Data
  const gI = dec("-0.0009951414");
  it("gives the 87Rb ground-state gF values including the nuclear term (doc example)", () => {
    expect(gF(gJ, gI, 3, 1, 4)!.toString()).toBe("0.49983642645"); // gJ/4 + 3gI/4
    expect(gF(gJ, gI, 3, 1, 2)!.toString()).toBe("-0.50182670925"); // −gJ/4 + 5gI/4
    // Steck, Table 4: gF(F=2) ≈ 1/2 (0.49983642), gF(F=1) ≈ −1/2 (−0.50182671)
    expect(gF(gJ, gI, 3, 1, 4)!.toSignificantDigits(8).toString()).toBe("0.49983643");
  });
  it("is undefined for F = 0", () => {
    expect(gF(dec("1.3362"), gI, 3, 3, 0)).toBeNull();
  });
});

describe("fValues", () => {
  it("lists F = 1, 2 for I = 3/2, J = 1/2 (doc example)", () => {
    expect(fValues(3, 1)).toEqual([2, 4]);
    expect(fValues(3, 3)).toEqual([0, 2, 4, 6]); // 87Rb 5P3/2 F' = 0..3, common practice
  });
});
