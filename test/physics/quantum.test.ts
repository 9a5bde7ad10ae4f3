import { describe, expect, it } from "vitest";
import { coupledValues, formatDoubled, mValues, parseDoubled, triangle } from "../../src/physics/quantum.js";

describe("parseDoubled", () => {
  it("doubles integers and half-integers", () => {
    expect(parseDoubled("3/2")).toBe(3);
    expect(parseDoubled("-1/2")).toBe(-1);
    expect(parseDoubled("+5/2")).toBe(5);
    expect(parseDoubled("1")).toBe(2);
    expect(parseDoubled("-2")).toBe(-4);
    expect(parseDoubled("0")).toBe(0);
    expect(parseDoubled(" 4 ")).toBe(8);
  });

  it("refuses fractions that are not half-integers", () => {
    for (const bad of ["2/2", "4/2", "1/3", "3/4", "0/2", "1/0"]) expect(() => parseDoubled(bad)).toThrow(RangeError);
  });

  it("refuses text that is not a number of the form p or p/2", () => {
    for (const bad of ["", "1.5", "½", "3/2/1", "a", "1 /2", "--1"]) expect(() => parseDoubled(bad)).toThrow(RangeError);
  });

  it("refuses absurdly large values", () => {
    expect(() => parseDoubled("1000001")).toThrow(RangeError);
    expect(() => parseDoubled("99999999999999999999")).toThrow(RangeError);
  });
});

describe("formatDoubled", () => {
  it("writes half-integers as p/2 and integers plainly", () => {
    expect(formatDoubled(3)).toBe("3/2");
    expect(formatDoubled(-1)).toBe("-1/2");
    expect(formatDoubled(4)).toBe("2");
    expect(formatDoubled(-2)).toBe("-1");
    expect(formatDoubled(0)).toBe("0");
  });

  it("round-trips with parseDoubled", () => {
    for (let k = -15; k <= 15; k++) expect(parseDoubled(formatDoubled(k))).toBe(k);
  });
});

describe("mValues", () => {
  it("runs from -j to j in steps of one, 2j+1 values", () => {
    // Source: common practice (magnetic sublevels m = -J, ..., J).
    expect(mValues(3)).toEqual([-3, -1, 1, 3]);
    expect(mValues(4)).toEqual([-4, -2, 0, 2, 4]);
    // mValues(0) currently yields -0 (from -j2); numerically equal to 0, which is what is asserted here.
    expect(mValues(0)).toHaveLength(1);
    expect(mValues(0)[0] === 0).toBe(true);
    for (let j2 = 0; j2 <= 12; j2++) expect(mValues(j2)).toHaveLength(j2 + 1);
  });
});

describe("coupledValues", () => {
  it("lists |a-b| to a+b in steps of one", () => {
    // Source: common practice (angular-momentum addition): 1/2 ⊗ 1/2 = 0 ⊕ 1; 1 ⊗ 3/2 = 1/2 ⊕ 3/2 ⊕ 5/2; I = 3/2, J = 1/2 gives F = 1, 2.
    expect(coupledValues(1, 1)).toEqual([0, 2]);
    expect(coupledValues(2, 3)).toEqual([1, 3, 5]);
    expect(coupledValues(3, 1)).toEqual([2, 4]);
    expect(coupledValues(0, 5)).toEqual([5]);
  });

  it("accounts for every product state: Σ (2c+1) = (2a+1)(2b+1)", () => {
    // Source: common practice (dimension count of coupled and uncoupled bases).
    for (let a = 0; a <= 8; a++)
      for (let b = 0; b <= 8; b++) {
        const total = coupledValues(a, b).reduce((s, c) => s + c + 1, 0);
        expect(total).toBe((a + 1) * (b + 1));
      }
  });
});

describe("triangle", () => {
  it("accepts allowed triads and refuses broken ones", () => {
    // Source: common practice (triangle rule |a-b| ≤ c ≤ a+b, a+b+c integer).
    expect(triangle(2, 2, 0)).toBe(true);
    expect(triangle(2, 2, 4)).toBe(true);
    expect(triangle(1, 1, 2)).toBe(true);
    expect(triangle(2, 2, 6)).toBe(false); // c > a + b
    expect(triangle(6, 2, 2)).toBe(false); // c < |a - b|
    expect(triangle(2, 2, 1)).toBe(false); // a + b + c half-integer
    expect(triangle(1, 1, 1)).toBe(false);
  });

  it("agrees with coupledValues", () => {
    for (let a = 0; a <= 8; a++)
      for (let b = 0; b <= 8; b++)
        for (let c = 0; c <= 16; c++) expect(triangle(a, b, c)).toBe(coupledValues(a, b).includes(c));
  });

  it("is symmetric in its three arguments", () => {
    for (let a = 0; a <= 6; a++)
      for (let b = 0; b <= 6; b++)
        for (let c = 0; c <= 6; c++) {
          const t = triangle(a, b, c);
          expect(triangle(b, a, c)).toBe(t);
          expect(triangle(c, b, a)).toBe(t);
          expect(triangle(a, c, b)).toBe(t);
        }
  });
});
