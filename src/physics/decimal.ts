/**
 * The one configured decimal.js clone of the project.
 *
 * Every non-exact number in Sublevel Atlas goes through `Dec`. It works to
 * 60 significant digits with round-half-even, so that the 40 digits the
 * physics promises survive a few dozen operations with room to spare, and
 * the 25-digit field eigenvalues of the solver are not limited by the
 * arithmetic. `Dec` is only ever fed strings (or values already of type
 * `Dec`): a JavaScript number would have passed through binary floating
 * point and lost digits before we saw them.
 */
import { Decimal } from "decimal.js";

export const Dec = Decimal.clone({
  precision: 60,
  rounding: Decimal.ROUND_HALF_EVEN,
  toExpNeg: -40,
  toExpPos: 60,
});
export type Dec = Decimal;

/** Working precision in significant digits; shown here so tests and docs can name it. */
export const WORKING_DIGITS = 60;

/** A decimal from its exact text. Throws on anything that is not a plain decimal numeral. */
export function dec(text: string): Dec {
  if (typeof text !== "string") throw new TypeError("dec() takes the number's text, not a JavaScript number");
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(text)) throw new RangeError(`not a decimal numeral: ${text}`);
  return new Dec(text);
}

/** Decimal from a small JavaScript integer (quantum-number arithmetic); exact by construction. */
export function decInt(n: number | bigint): Dec {
  if (typeof n === "number" && !Number.isSafeInteger(n)) throw new RangeError(`not a safe integer: ${n}`);
  return new Dec(n.toString());
}

export const ZERO = new Dec("0");
export const ONE = new Dec("1");

/**
 * Text for export: at most `digits` significant digits, no trailing zeros,
 * no exponent for ordinary magnitudes. Negative zero prints as "0".
 */
export function exportText(x: Dec, digits = 30): string {
  if (x.isZero()) return "0";
  const s = x.toSignificantDigits(digits).toString();
  return s;
}
