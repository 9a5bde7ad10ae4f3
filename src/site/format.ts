/**
 * How numbers are shown on pages: a fixed number of significant digits,
 * thin-space digit grouping in threes on both sides of the decimal point,
 * a true minus sign, and a scientific form only for very large or small
 * magnitudes. Exported numbers never go through here (see exportJson.ts).
 */
import { Dec } from "../physics/decimal.js";
import type { Rational } from "../physics/rational.js";
import { groupDigits, MINUS, SUPERSCRIPT, type NumberParts } from "./plainFormat.js";
import { uncertainDecimalParts } from "./decimalText.js";

// The rules that need no decimal arithmetic live in plainFormat.ts, shared with the page scripts.
export { FIGURE_SPACE, MINUS, THIN_SPACE, formatM, formatQuantum, groupDigits, partsText, polarizationSymbol, termText, transitionKindLabel, type NumberParts } from "./plainFormat.js";
const group = groupDigits;

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
    const digits = (f ?? "").replace(/0+$/, "");
    return { sign, int: i!, frac: digits ? "." + group(digits, true) : "", exp };
  }
  const text = a.toFixed(Math.max(0, sig - 1 - e));
  const [i, f] = text.split(".");
  return { sign, int: group(i!, false), frac: f ? "." + group(f, true) : "", exp: "" };
}

/**
 * A computed value with its standard uncertainty in the concise form, as
 * parts (conciseFractionParts in decimalText.ts: the uncertainty to two
 * significant digits, GUM §7.2.6; the value to the same last place):
 * 0.6995833012 with u = 0.000000123 → { int: "0", frac: ".699 583 30", unc: "(12)" }.
 * With u null or zero (an exact value) it is numberParts(x, sig).
 */
export function uncertainParts(x: Dec, u: Dec | null, sig = 9): NumberParts {
  if (u === null || u.isZero()) return numberParts(x, sig);
  return uncertainDecimalParts(x.toString(), u.abs().toString(), "1", "1")!;
}

/** One string of a value with its uncertainty: "0.699 583 30(12)"; formatNumber(x, sig) when u is null. */
export function formatUncertain(x: Dec | null, u: Dec | null, sig = 9): string {
  if (x === null) return "—";
  const p = uncertainParts(x, u, sig);
  return p.sign + p.int + p.frac + (p.unc ?? "") + p.exp;
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



const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** An ISO date-time as people read it, in UTC: "2 December 2026, 03:23 UTC". */
export function readableDate(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const hh = String(d.getUTCHours()).padStart(2, "0");
  const mm = String(d.getUTCMinutes()).padStart(2, "0");
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}, ${hh}:${mm} UTC`;
}

/**
 * A unit in the site's one typographic style: a single reciprocal unit after
 * a slash, powers as superscripts ("Hz T^-1" → "Hz/T", "m^-1 T^-1" → "m⁻¹/T",
 * "m s^-1" → "m/s", "J Hz^-1" → "J/Hz"); "1" (dimensionless) → "".
 */
export function unitText(unit: string): string {
  if (unit.trim() === "1") return "";
  const parts = unit.trim().split(/\s+/);
  const power = (p: string) => p.replace(/\^(-?\d+)/, (_all, e: string) => [...e].map((ch) => SUPERSCRIPT[ch] ?? ch).join(""));
  const last = parts[parts.length - 1]!;
  if (parts.length > 1 && /\^-1$/.test(last)) return `${parts.slice(0, -1).map(power).join(" ")}/${last.replace(/\^-1$/, "")}`;
  return parts.map(power).join(" ");
}

/**
 * A value and its standard uncertainty in the concise form used on every
 * page: the uncertainty in units of the value's last digit, in parentheses
 * ("13996244917.1", "4.4" → "13996244917.1(44)"); the "± u" form when the
 * uncertainty does not end on the value's last digit. An exact value (u null) stands alone.
 */
export function conciseText(value: string, uncertainty: string | null): string {
  if (uncertainty === null) return value;
  const m = /^([+-]?\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(value.trim());
  if (!m) return `${value} ± ${uncertainty}`;
  const decimals = (m[2] ?? "").length - (m[3] ? Number(m[3]) : 0);
  const scaled = new Dec(uncertainty).mul(new Dec(10).pow(decimals));
  if (!scaled.isInteger() || scaled.isZero()) return `${value} ± ${uncertainty}`;
  const mant = m[3] ? value.trim().slice(0, value.trim().search(/[eE]/)) : value.trim();
  return `${mant}(${scaled.toFixed(0)})${m[3] ? `e${m[3]}` : ""}`;
}
