/**
 * The calculator's number writer (src/browser/formatFloat.ts) writes what the
 * site's formatNumber writes for a Dec made from the number's shortest text:
 * same digits, rounding (half-even), grouping, minus sign and ×10ⁿ form.
 * Pure; no browser needed.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { formatNumber } from "../../src/site/format.js";
import { formatFloat } from "../../src/browser/formatFloat.js";

const site = (x: number, sig: number) => formatNumber(new Dec(String(x)), sig);

describe("formatFloat", () => {
  it("writes what formatNumber writes, at the calculator's digit counts", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e15, max: 1e15 }), fc.constantFrom(6, 9, 10, 12), (x, sig) => {
        expect(formatFloat(x, sig)).toBe(site(x, sig));
      }),
      { numRuns: 3000, seed: 20261202 },
    );
  });

  it("agrees on ties, carries and the edges of the fixed form", () => {
    const xs = [0, -0, 1, -1, 10, 0.5, 0.25, 0.125, 2.5e-7, 999999.9999999, 9.9999999999995, 0.2404084926015, 4375971.198655, 7.181999704135e-7, 1e12, 999999999999.5, 1e-6, 0.000001234, 1e-5, 123456789012, 5e-324, -6834682610.904290];
    for (const x of xs) for (const sig of [1, 6, 10, 12]) expect(formatFloat(x, sig), `${x} at ${sig}`).toBe(site(x, sig));
    expect(formatFloat(-4268380266.6966186, 12)).toBe("\u22124\u2009268\u2009380\u2009266.70"); // thin spaces, true minus
  });
});
