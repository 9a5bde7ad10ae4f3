/**
 * Random valid inputs for the property tests: doubled spins, g values and
 * hyperfine constants of realistic size, as Dec made from decimal text
 * (never from JS floats, as the physics code requires).
 */
import fc from "fast-check";
import { Dec, dec } from "../../src/physics/decimal.js";

/** How many cases an ordinary test run tries (ATLAS_PROPERTY_RUNS overrides; `npm run fuzz` runs far more). */
export const RUNS = Number(process.env.ATLAS_PROPERTY_RUNS || 200);

/** A decimal text with `digits` significant digits in [lo, hi] (integers), scaled by 10^exp. */
function decimalText(lo: number, hi: number, exp: number): fc.Arbitrary<string> {
  return fc.integer({ min: lo, max: hi }).map((n) => {
    const neg = n < 0;
    const s = String(Math.abs(n)).padStart(1 - exp, "0");
    const body = exp >= 0 ? s + "0".repeat(exp) : `${s.slice(0, s.length + exp) || "0"}.${s.slice(s.length + exp)}`;
    return (neg ? "-" : "") + body;
  });
}

/** A g-factor between `lo` and `hi` with eight decimals. */
export const gValue = (lo = -3, hi = 3): fc.Arbitrary<Dec> => decimalText(lo * 1e8, hi * 1e8, -8).map(dec);

/** gI in Bohr magnetons: |gI| ≤ 0.003 (proton-like at most), either sign. */
export const gIValue: fc.Arbitrary<Dec> = decimalText(-3_000_000, 3_000_000, -9).map(dec);

/** A hyperfine constant in Hz: |A| ≤ 10 GHz in steps of 1 kHz, either sign. */
export const hyperfineConstant: fc.Arbitrary<Dec> = decimalText(-10_000_000, 10_000_000, 3).map(dec);

/** Doubled nuclear spin 0 … 9/2 and doubled J 1/2 … 4 (J > 0: a level that shifts). */
export const I2 = fc.integer({ min: 0, max: 9 });
export const J2 = fc.integer({ min: 1, max: 8 });
/** Doubled J including 0. */
export const J2orZero = fc.integer({ min: 0, max: 8 });

/** A field in tesla: 0 … 2 T in steps of 0.1 mT. */
export const field: fc.Arbitrary<Dec> = fc.integer({ min: 0, max: 20_000 }).map((n) => new Dec(n).div(10_000));

/** |x − y| ≤ tol·max(1, |x|, |y|). */
export function close(x: Dec, y: Dec, tol: string): boolean {
  const scale = Dec.max(new Dec(1), x.abs(), y.abs());
  return x.minus(y).abs().lte(scale.mul(tol));
}
