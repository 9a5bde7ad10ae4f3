import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../src/physics/decimal.js";
import { correlation, divided, exact, linear, measured, minus, sqrtOf, standardUncertainty, times } from "../../src/physics/uncertain.js";

// 87Rb inputs: D. A. Steck, "Rubidium 87 D Line Data" (revision 2.3.x)
const gJ = measured("gJ", dec("2.00233113"), dec("0.00000020"));
const gI = measured("gI", dec("-0.0009951414"), dec("0.0000000010"));

describe("first-order propagation (GUM, JCGM 100:2008 §5.1)", () => {
  it("gives gF(F = 2) of 87Rb 5S1/2 = gJ/4 + 3gI/4 the hand-formula uncertainty (doc example)", () => {
    const gF = linear([[dec("0.25"), gJ], [dec("0.75"), gI]]);
    // hand formula: u = √((u_gJ/4)² + (3·u_gI/4)²) (textbook law of propagation)
    const hand = Math.sqrt((0.0000002 / 4) ** 2 + ((3 * 0.000000001) / 4) ** 2);
    expect(gF.value.toString()).toBe("0.49983642645");
    expect(Math.abs(Number(standardUncertainty(gF)) / hand - 1)).toBeLessThan(1e-12);
    expect(standardUncertainty(gF)!.toSignificantDigits(6).toNumber()).toBe(5.00056e-8);
  });

  it("keeps an exact number exact", () => {
    expect(standardUncertainty(exact(dec("0.5")))).toBeNull();
    expect(standardUncertainty(measured("x", dec("1"), dec("0")))).toBeNull();
    expect(standardUncertainty(linear([[dec("2"), exact(dec("3"))]]))).toBeNull();
  });

  it("cancels a shared input in a difference instead of adding it in quadrature", () => {
    // x − x is exactly zero with zero uncertainty (GUM §5.2, fully correlated inputs)
    expect(standardUncertainty(minus(gJ, gJ))).toBeNull();
    // gJ + gJ doubles the uncertainty, not √2 times it
    expect(standardUncertainty(linear([[dec("1"), gJ], [dec("1"), gJ]]))!.toNumber()).toBe(4e-7);
  });

  it("adds independent inputs in quadrature", () => {
    const a = measured("a", dec("3"), dec("0.3"));
    const b = measured("b", dec("4"), dec("0.4"));
    // u(a + b) = √(0.09 + 0.16) = 0.5 (textbook)
    expect(standardUncertainty(linear([[dec("1"), a], [dec("1"), b]]))!.toString()).toBe("0.5");
  });

  it("propagates relative uncertainties through a product and a quotient", () => {
    const a = measured("a", dec("2"), dec("0.02")); // 1 %
    const b = measured("b", dec("5"), dec("0.1")); // 2 %
    // relative uncertainties add in quadrature for a·b and a/b: √(1² + 2²) % (textbook)
    const rel = Math.sqrt(0.01 ** 2 + 0.02 ** 2);
    expect(Math.abs(Number(standardUncertainty(times(a, b))) / 10 / rel - 1)).toBeLessThan(1e-12);
    expect(Math.abs(Number(standardUncertainty(divided(a, b))) / 0.4 / rel - 1)).toBeLessThan(1e-12);
    // √a has half the relative uncertainty of a (textbook)
    expect(Math.abs(Number(standardUncertainty(sqrtOf(a))) / Math.sqrt(2) / 0.005 - 1)).toBeLessThan(1e-12);
  });

  it("reports the correlation two results get from one shared input", () => {
    const A = measured("A", dec("100"), dec("1"));
    const x = linear([[dec("2"), A]]);
    const y = linear([[dec("-3"), A]]);
    expect(correlation(x, y)!.toString()).toBe("-1");
    const z = measured("z", dec("1"), dec("1"));
    // x and x+z share half of their variance: r = 2/√(4+1) (textbook)
    expect(Math.abs(Number(correlation(x, linear([[new Dec(1), x], [new Dec(1), z]]))) - 2 / Math.sqrt(5))).toBeLessThan(1e-12);
  });

  it("refuses a negative standard uncertainty", () => {
    expect(() => measured("x", dec("1"), dec("-1"))).toThrow(/negative/);
  });
});
