import { describe, expect, it } from "vitest";
import { Rational } from "../../src/physics/rational.js";
import { dec } from "../../src/physics/decimal.js";

describe("Rational", () => {
  it("reduces to lowest terms with a positive denominator", () => {
    // Source: common practice (canonical form of a fraction).
    const r = Rational.of(6, -4);
    expect(r.num).toBe(-3n);
    expect(r.den).toBe(2n);
    expect(Rational.of(-6n, -4n).toString()).toBe("3/2");
    expect(Rational.of(0, -7).den).toBe(1n);
    expect(Rational.of(0, 5).num).toBe(0n);
  });

  it("refuses a zero denominator", () => {
    expect(() => Rational.of(1, 0)).toThrow(RangeError);
  });

  it("makes k/2 from a doubled quantum number", () => {
    expect(Rational.half(3).toString()).toBe("3/2");
    expect(Rational.half(-4).toString()).toBe("-2");
    expect(Rational.half(0).isZero()).toBe(true);
  });

  it("parses integers and fractions, signed, with surrounding space", () => {
    expect(Rational.parse("3/2").equals(Rational.of(3, 2))).toBe(true);
    expect(Rational.parse("-4/6").equals(Rational.of(-2, 3))).toBe(true);
    expect(Rational.parse("+5").equals(Rational.of(5))).toBe(true);
    expect(Rational.parse(" 7 ").toString()).toBe("7");
  });

  it("refuses text that is not a plain fraction", () => {
    for (const bad of ["", "1.5", "1/", "/2", "1/-2", "a/b", "1//2", "1 / 2", "3/0"]) {
      expect(() => Rational.parse(bad)).toThrow(RangeError);
    }
  });

  it("adds, subtracts, multiplies and divides exactly", () => {
    // Source: common practice (fraction arithmetic); 1/3 + 1/6 = 1/2, 1/3 - 1/2 = -1/6, (2/3)(9/4) = 3/2, (1/2)/(3/4) = 2/3.
    const third = Rational.of(1, 3);
    expect(third.add(Rational.of(1, 6)).toString()).toBe("1/2");
    expect(third.sub(Rational.of(1, 2)).toString()).toBe("-1/6");
    expect(Rational.of(2, 3).mul(Rational.of(9, 4)).toString()).toBe("3/2");
    expect(Rational.of(1, 2).div(Rational.of(3, 4)).toString()).toBe("2/3");
    expect(Rational.of(1, 2).div(Rational.of(-3, 4)).toString()).toBe("-2/3");
  });

  it("refuses division by zero", () => {
    expect(() => Rational.ONE.div(Rational.ZERO)).toThrow(RangeError);
  });

  it("stays exact where binary floating point does not: 1/10 + 2/10 = 3/10", () => {
    // Source: common practice (0.1 + 0.2 ≠ 0.3 in IEEE 754 doubles).
    expect(Rational.of(1, 10).add(Rational.of(2, 10)).equals(Rational.of(3, 10))).toBe(true);
  });

  it("keeps big numerators exact", () => {
    // Source: 25! = 15 511 210 043 330 985 984 000 000 (common practice, handbook factorial tables).
    let f = Rational.ONE;
    for (let k = 1; k <= 25; k++) f = f.mul(Rational.of(k));
    expect(f.toString()).toBe("15511210043330985984000000");
    expect(f.div(Rational.of(24n * 23n)).mul(Rational.of(24n * 23n)).equals(f)).toBe(true);
  });

  it("reports sign, absolute value, negation and order", () => {
    const r = Rational.of(-5, 3);
    expect(r.sign()).toBe(-1);
    expect(Rational.ZERO.sign()).toBe(0);
    expect(r.neg().sign()).toBe(1);
    expect(r.abs().toString()).toBe("5/3");
    expect(Rational.of(5, 3).abs().toString()).toBe("5/3");
    expect(Rational.of(1, 3).cmp(Rational.of(1, 2))).toBe(-1);
    expect(Rational.of(2, 4).cmp(Rational.of(1, 2))).toBe(0);
    expect(Rational.of(-1, 2).cmp(Rational.of(-2, 3))).toBe(1);
  });

  it("treats equal values written differently as equal", () => {
    expect(Rational.of(2, 4).equals(Rational.of(-1, -2))).toBe(true);
    expect(Rational.of(1, 2).equals(Rational.of(1, 3))).toBe(false);
  });

  it("converts to a decimal at working precision", () => {
    // 2/3 to 60 significant digits, round half even: ...6667 (common practice).
    expect(Rational.of(3, 8).toDecimal().eq(dec("0.375"))).toBe(true);
    expect(Rational.of(2, 3).toDecimal().toString()).toBe("0." + "6".repeat(59) + "7");
    expect(Rational.of(-1, 4).toDecimal().eq(dec("-0.25"))).toBe(true);
  });

  it("prints an integer without a denominator", () => {
    expect(Rational.of(4, 2).toString()).toBe("2");
    expect(Rational.of(-3, 6).toString()).toBe("-1/2");
  });
});
