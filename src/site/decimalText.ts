/**
 * Decimal numbers as text, handled exactly with BigInt and without
 * decimal.js: reading, comparing, scaling and rounding to significant
 * digits in the page's number style (the rules of numberParts in
 * format.ts). The page scripts (src/browser/) use it to sort columns by
 * their exact data-sort keys and to show a shift in the reader's unit with
 * the same digits the server would have written.
 */
import { groupDigits, MINUS, timesTenTo, type NumberParts } from "./plainFormat.js";

/** A decimal as sign, integer mantissa and power of ten: value = ±n·10^e. */
export interface ExactDecimal {
  neg: boolean;
  n: bigint;
  e: number;
}

const DECIMAL = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;

/** "−" is not accepted here: data-sort and data-hz-per-t keys use ASCII. Null for anything that is not a decimal. */
export function parseDecimal(text: string): ExactDecimal | null {
  const m = DECIMAL.exec(text.trim());
  if (!m || (m[2] ?? "") + (m[3] ?? "") === "") return null;
  const frac = m[3] ?? "";
  return { neg: m[1] === "-", n: BigInt((m[2] ?? "") + frac || "0"), e: (m[4] ? parseInt(m[4], 10) : 0) - frac.length };
}

/** A sort key of a decimal string: sign, significant digits and the exponent of the leading one (value = ±0.d × 10^e). */
export interface DecimalKey {
  sign: -1 | 0 | 1;
  d: string;
  e: number;
}

/** The sort key of a decimal string, or null when it is not one. */
export function decimalKey(s: string): DecimalKey | null {
  const m = DECIMAL.exec(s);
  if (!m || (m[2] ?? "") + (m[3] ?? "") === "") return null;
  let digits = (m[2] ?? "") + (m[3] ?? "");
  let e = (m[2] ?? "").length + (m[4] ? parseInt(m[4], 10) : 0);
  while (digits.charAt(0) === "0") {
    digits = digits.slice(1);
    e--;
  }
  digits = digits.replace(/0+$/, "");
  if (digits === "") return { sign: 0, d: "", e: 0 };
  return { sign: m[1] === "-" ? -1 : 1, d: digits, e };
}

/** Exact order of two decimal keys. */
export function compareDecimal(a: DecimalKey, b: DecimalKey): number {
  if (a.sign !== b.sign) return a.sign < b.sign ? -1 : 1;
  if (a.sign === 0) return 0;
  const mag = a.e !== b.e ? (a.e < b.e ? -1 : 1) : a.d < b.d ? -1 : a.d > b.d ? 1 : 0;
  return a.sign * mag;
}

export const pow10 = (k: number): bigint => 10n ** BigInt(k);

/** Round the positive fraction num/den to `sig` significant digits, half to even: the digits and the exponent of the first. */
export function roundSignificant(num: bigint, den: bigint, sig: number): { d: string; e: number } {
  let e = num.toString().length - den.toString().length;
  if (e >= 0 ? num < den * pow10(e) : num * pow10(-e) < den) e--;
  const t = sig - 1 - e;
  const n2 = t >= 0 ? num * pow10(t) : num;
  const d2 = t >= 0 ? den : den * pow10(-t);
  let q = n2 / d2;
  const r = n2 % d2;
  if (2n * r > d2 || (2n * r === d2 && q % 2n === 1n)) q += 1n;
  if (q === pow10(sig)) {
    q = pow10(sig - 1);
    e++;
  }
  return { d: q.toString(), e };
}

/**
 * ±num/den (num ≥ 0, den > 0) as shown number parts at `sig` significant
 * digits: thin-space groups, true minus, the ×10ⁿ form when the leading
 * digit is at 10¹² or above or at 10⁻⁶ or below (numberParts in format.ts).
 */
export function fractionParts(neg: boolean, num: bigint, den: bigint, sig: number): NumberParts {
  if (num === 0n) return { sign: "", int: "0", frac: "", exp: "" };
  const r = roundSignificant(num, den, sig);
  const sign = neg ? MINUS : "";
  if (r.e >= 12 || r.e <= -6) {
    const mant = r.d.slice(1).replace(/0+$/, "");
    return { sign, int: r.d.charAt(0), frac: mant ? "." + groupDigits(mant, true) : "", exp: timesTenTo(r.e) };
  }
  let int: string;
  let frac: string;
  if (r.e >= 0) {
    int = r.d.slice(0, r.e + 1).padEnd(r.e + 1, "0");
    frac = r.d.slice(r.e + 1);
  } else {
    int = "0";
    frac = "0".repeat(-r.e - 1) + r.d;
  }
  return { sign, int: groupDigits(int, false), frac: frac ? "." + groupDigits(frac, true) : "", exp: "" };
}

/**
 * value × mul / div as shown number parts, exactly (mul and div decimal
 * texts, div non-zero). Example: decimalParts("13996244917.1", "1e-4", "1e6", 9)
 * → 1.399 624 49 (μB/h in MHz/G).
 */
export function decimalParts(value: string, mul: string, div: string, sig: number): NumberParts | null {
  const v = parseDecimal(value);
  const m = parseDecimal(mul);
  const d = parseDecimal(div);
  if (!v || !m || !d || d.n === 0n) return null;
  let num = v.n * m.n;
  let den = d.n;
  const e = v.e + m.e - d.e;
  if (e >= 0) num *= pow10(e);
  else den *= pow10(-e);
  return fractionParts(v.neg !== m.neg !== d.neg && num !== 0n, num, den, sig);
}

/**
 * A value and its standard uncertainty in the concise form, as shown number
 * parts: the uncertainty rounded to two significant digits (GUM, JCGM
 * 100:2008 §7.2.6: "at most two significant digits"; half to even like every
 * other rounding here), the value rounded to the same last place, and the
 * uncertainty written in units of that last digit in parentheses (GUM
 * §7.2.2, form 2): 0.6995833012 ± 0.000000123 → 0.699 583 30(12). When the
 * last place is left of the decimal point the value is an integer and the
 * parentheses hold the uncertainty itself (123 456 ± 1 234 → 123 500(1200)).
 * The ×10ⁿ form is used, with the same thresholds as fractionParts, when
 * the larger of the value and the uncertainty has its leading digit at 10¹²
 * or above or at 10⁻⁶ or below; its exponent is that leading digit's, so
 * the mantissa always has a digit before the point: 3.771 074 633 8(12)×10¹⁴.
 * ±num/den is the value, uNum/uDen (> 0) the uncertainty.
 */
export function conciseFractionParts(neg: boolean, num: bigint, den: bigint, uNum: bigint, uDen: bigint): NumberParts {
  const ur = roundSignificant(uNum, uDen, 2);
  const p = ur.e - (ur.d.length - 1); // the power of ten of the uncertainty's last digit
  // the value rounded to 10^p, half to even: q·10^p
  const n2 = p <= 0 ? num * pow10(-p) : num;
  const d2 = p <= 0 ? den : den * pow10(p);
  let q = n2 / d2;
  const r = n2 % d2;
  if (2n * r > d2 || (2n * r === d2 && q % 2n === 1n)) q += 1n;
  const sign = neg && q !== 0n ? MINUS : "";
  const qs = q.toString();
  const lead = Math.max(q === 0n ? ur.e : qs.length - 1 + p, ur.e);
  if (lead >= 12 || lead <= -6) {
    const s = qs.padStart(lead - p + 1, "0");
    return { sign, int: s.charAt(0), frac: "." + groupDigits(s.slice(1), true), unc: `(${ur.d})`, exp: timesTenTo(lead) };
  }
  if (p >= 0) {
    return { sign, int: groupDigits((q * pow10(p)).toString(), false), frac: "", unc: `(${(BigInt(ur.d) * pow10(p)).toString()})`, exp: "" };
  }
  const s = qs.padStart(-p + 1, "0");
  return { sign, int: groupDigits(s.slice(0, s.length + p), false), frac: "." + groupDigits(s.slice(s.length + p), true), unc: `(${ur.d})`, exp: "" };
}

/**
 * value × mul / div with its uncertainty u × mul / div (all decimal texts,
 * u > 0, div non-zero) in the concise form of conciseFractionParts, exactly.
 * The unit switch uses it to show a shift and its uncertainty in the
 * reader's unit; format.ts's uncertainParts is this with mul = div = 1.
 * Null when a text is not a decimal, or u is zero or negative.
 */
export function uncertainDecimalParts(value: string, u: string, mul: string, div: string): NumberParts | null {
  const v = parseDecimal(value);
  const w = parseDecimal(u);
  const m = parseDecimal(mul);
  const d = parseDecimal(div);
  if (!v || !w || !m || !d || d.n === 0n || w.n === 0n || w.neg) return null;
  const scale = (x: ExactDecimal): [bigint, bigint] => {
    const e = x.e + m.e - d.e;
    return e >= 0 ? [x.n * m.n * pow10(e), d.n] : [x.n * m.n, d.n * pow10(-e)];
  };
  const [num, den] = scale(v);
  const [uNum, uDen] = scale(w);
  return conciseFractionParts(v.neg !== m.neg !== d.neg && num !== 0n, num, den, uNum, uDen);
}
