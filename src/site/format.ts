/**
 * How numbers are shown on pages: a fixed number of significant digits,
 * thin-space digit grouping in threes on both sides of the decimal point,
 * a true minus sign, and a scientific form only for very large or small
 * magnitudes. Exported numbers never go through here (see exportJson.ts).
 */
import { Dec } from "../physics/decimal.js";
import type { Rational } from "../physics/rational.js";
import { formatDoubled } from "../physics/quantum.js";

export const THIN_SPACE = "\u2009";
export const MINUS = "\u2212";
export const FIGURE_SPACE = "\u2007";

/**
 * Digits in groups of three with thin spaces, counted from the decimal point.
 * Four digits stay together (common practice) unless `force` is set, which a
 * column uses when any of its numbers needs grouping, so a column is grouped
 * one way throughout.
 */
export function groupDigits(digits: string, fromLeft: boolean, force = false): string {
  return group(digits, fromLeft, force);
}

function group(digits: string, fromLeft: boolean, force = false): string {
  if (digits.length <= (force ? 3 : 4)) return digits;
  const parts: string[] = [];
  if (fromLeft) {
    for (let i = 0; i < digits.length; i += 3) parts.push(digits.slice(i, i + 3));
  } else {
    for (let i = digits.length; i > 0; i -= 3) parts.unshift(digits.slice(Math.max(0, i - 3), i));
  }
  return parts.join(THIN_SPACE);
}

const SUPERSCRIPT: Record<string, string> = {
  "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻",
};

/** Parts of a shown number, so templates can align on the decimal point. */
export interface NumberParts {
  sign: string;
  int: string;
  /** Decimal point and fraction digits, grouped; "" for an integer. */
  frac: string;
  /** Concise uncertainty "(20)" or " ± 0.1", as written in the data; "" if none. */
  unc?: string;
  exp: string;
  /** Figure, punctuation and thin spaces after the number that line its decimal point up with the column (see alignTable). */
  pad?: string;
}

/**
 * Significant-digit rounding and grouping, as parts.
 * Example: 1399624.49171 at 9 digits → { int: "1 399 624", frac: ".492", … }.
 */
export function numberParts(x: Dec, sig = 9): NumberParts {
  if (x.isZero()) return { sign: "", int: "0", frac: "", exp: "" };
  const r = x.toSignificantDigits(sig);
  const sign = r.isNegative() ? MINUS : "";
  const a = r.abs();
  const e = a.e; // decimal exponent of the leading digit
  if (e >= 12 || e <= -6) {
    const [mant, ex] = a.toExponential(sig - 1).split("e");
    const [i, f] = mant!.split(".");
    const exp = "×10" + [...String(Number(ex))].map((ch) => SUPERSCRIPT[ch] ?? ch).join("");
    return { sign, int: i!, frac: f ? "." + group(f.replace(/0+$/, ""), true) : "", exp };
  }
  const text = a.toFixed(Math.max(0, sig - 1 - e));
  const [i, f] = text.split(".");
  return { sign, int: group(i!, false), frac: f ? "." + group(f, true) : "", exp: "" };
}

/** One string: sign, digits, fraction, exponent. */
export function formatNumber(x: Dec | null, sig = 9): string {
  if (x === null) return "—";
  const p = numberParts(x, sig);
  return p.sign + p.int + p.frac + p.exp;
}

/** A signed number with an explicit plus sign for positive values (for shifts). */
export function formatSigned(x: Dec | null, sig = 9): string {
  if (x === null) return "—";
  const s = formatNumber(x, sig);
  return x.isPositive() && !x.isZero() ? "+" + s : s;
}

/** Exact fraction for display, with a true minus: "−1/2". */
export function formatFraction(r: Rational | null): string {
  if (r === null) return "—";
  return r.toString().replace(/^-/, MINUS);
}

/** A doubled quantum number for display: "3/2", "−1/2". */
export function formatQuantum(k: number): string {
  return formatDoubled(k).replace(/^-/, MINUS);
}

/** A doubled m with explicit sign for non-zero values: "+3/2", "−1/2", "0". */
export function formatM(k: number): string {
  return k > 0 ? "+" + formatDoubled(k) : formatQuantum(k);
}

const WRITTEN = /^([+-]?)(\d*)(?:\.(\d*))?(?:\((\d+)\))?(?:[eE]([+-]?\d+))?$/;

function writtenPlain(text: string): NumberParts | null {
  const m = WRITTEN.exec(text.trim());
  if (!m) return null;
  const [, sign = "", int = "", frac, unc, ex] = m;
  if (int === "" && !frac) return null;
  const exp = ex === undefined ? "" : "×10" + [...String(Number(ex))].map((ch) => SUPERSCRIPT[ch] ?? ch).join("");
  return {
    sign: sign === "-" ? MINUS : "",
    int: group(int === "" ? "0" : int, false),
    frac: frac ? "." + group(frac, true) : "",
    unc: unc === undefined ? "" : `(${unc})`,
    exp,
  };
}

/**
 * A measured number shown as its data file writes it: the same digits, no
 * padding to a fixed count, the concise uncertainty kept, thin-space groups
 * and a true minus added. "2.00233113(20)" → 2.002 331 13(20);
 * "2.5 ± 0.1" → 2.5 ± 0.1. Null if the text is not a plain number.
 */
export function writtenParts(text: string): NumberParts | null {
  const pm = /^(.*?)\s*(?:±|\+\/-|\+-)\s*(.*)$/.exec(text.trim());
  if (pm) {
    const v = writtenPlain(pm[1] ?? "");
    const u = writtenPlain(pm[2] ?? "");
    if (!v || !u || v.unc || u.unc) return null;
    return { ...v, unc: ` ± ${u.sign}${u.int}${u.frac}${u.exp}`, exp: v.exp };
  }
  return writtenPlain(text);
}

/** Significant digits written in a number's mantissa: "0.00120" → 3, "407.24" → 5. */
export function writtenDigits(text: string): number {
  const m = /^[+-]?(\d*)(?:\.(\d*))?/.exec(text.trim());
  const digits = ((m?.[1] ?? "") + (m?.[2] ?? "")).replace(/^0+/, "");
  return Math.max(1, digits.length);
}

/** One display string of number parts (without padding). */
export function partsText(p: NumberParts): string {
  return p.sign + p.int + p.frac + (p.unc ?? "") + p.exp;
}

/** The symbol of a polarization as shown in tables: σ+, π, σ−, or — for |Δm| = 2. */
export function polarizationSymbol(p: "sigma+" | "pi" | "sigma-" | null): string {
  return p === "sigma+" ? "σ+" : p === "sigma-" ? "σ−" : p === "pi" ? "π" : "—";
}
