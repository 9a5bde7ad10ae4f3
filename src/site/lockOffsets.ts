/**
 * The "offset from the reference" of the lock-point tables: the difference
 * of two absolute frequencies (decimal texts in Hz, as the cells' data-hz
 * attributes carry them), exactly with BigInt, shown in MHz to 1 kHz. No
 * decimal.js, so the page script (src/browser/lockReference.ts) bundles the
 * same code the build uses for the table it writes: the offsets a reader
 * sees without JavaScript are the ones the script writes for the same
 * reference, digit for digit.
 */
import { fractionParts, parseDecimal, pow10, type ExactDecimal } from "./decimalText.js";
import type { NumberParts } from "./plainFormat.js";

/** Decimal places of the offsets in MHz: 1 kHz, finer than the hyperfine constants of the usual lock lines are known. */
export const OFFSET_PLACES = 3;

/** a − b of two decimal texts, exactly, as sign, mantissa and exponent; null when either is not a decimal. */
export function exactDifference(a: string, b: string): ExactDecimal | null {
  const x = parseDecimal(a);
  const y = parseDecimal(b);
  if (!x || !y) return null;
  const e = Math.min(x.e, y.e);
  const nx = (x.neg ? -x.n : x.n) * pow10(x.e - e);
  const ny = (y.neg ? -y.n : y.n) * pow10(y.e - e);
  const d = nx - ny;
  return { neg: d < 0n, n: d < 0n ? -d : d, e };
}

/** An exact decimal as plain positional text ("-133.3255", "0", no exponent), for sort keys and the CSV. */
export function exactText(d: ExactDecimal): string {
  if (d.n === 0n) return "0";
  let digits = d.n.toString();
  let text: string;
  if (d.e >= 0) text = digits + "0".repeat(d.e);
  else {
    digits = digits.padStart(-d.e + 1, "0");
    const int = digits.slice(0, digits.length + d.e);
    const frac = digits.slice(digits.length + d.e).replace(/0+$/, "");
    text = frac ? `${int}.${frac}` : int;
  }
  return (d.neg ? "-" : "") + text;
}

/**
 * A frequency difference in Hz (exact) as shown number parts in MHz,
 * rounded half to even (the site's rule, format.ts) to OFFSET_PLACES
 * decimals, and its exact sort key in MHz. Example: 133 325 500 Hz →
 * "133.326" (133.3255 rounds to even); −400 Hz → "0".
 */
export function offsetMHz(d: ExactDecimal): { parts: NumberParts; sort: string } {
  const sort = exactText({ ...d, e: d.e - 6 });
  // value in units of 10^-OFFSET_PLACES MHz = n · 10^(e − 6 + OFFSET_PLACES), rounded to an integer
  const shift = d.e - 6 + OFFSET_PLACES;
  let q: bigint;
  if (shift >= 0) q = d.n * pow10(shift);
  else {
    const den = pow10(-shift);
    q = d.n / den;
    const r = d.n % den;
    if (2n * r > den || (2n * r === den && q % 2n === 1n)) q += 1n;
  }
  if (q === 0n) return { parts: fractionParts(false, 0n, 1n, 1), sort };
  return { parts: fractionParts(d.neg, q, pow10(OFFSET_PLACES), q.toString().length), sort };
}

/** a − b (decimal texts in Hz) as offsetMHz gives it, or null when either is not a decimal. */
export function offsetFrom(a: string, b: string): { parts: NumberParts; sort: string } | null {
  const d = exactDifference(a, b);
  return d ? offsetMHz(d) : null;
}
