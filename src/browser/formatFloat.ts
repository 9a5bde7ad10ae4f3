/**
 * A JavaScript number written as the site writes numbers (src/site/format.ts,
 * formatNumber): `sig` significant digits, thin-space groups of three on
 * both sides of the point (four digits stay together), a true minus sign,
 * and the ×10ⁿ form when the leading digit is at 10¹² or above, or 10⁻⁶ or
 * below. The fixed form is plain string work, without decimal.js, so the
 * calculator can write thousands of cells quickly: the shortest decimal text
 * of the float64 value (what String(x) gives) rounded half-even to `sig`
 * digits, exactly what formatNumber does with a Dec made from that text (the
 * test compares both); the rare ×10ⁿ form is left to formatNumber itself.
 */
import { Dec } from "../physics/decimal.js";
import { formatNumber, groupDigits, MINUS } from "../site/format.js";

export function formatFloat(x: number, sig = 9): string {
  if (!Number.isFinite(x)) return "—";
  if (x === 0) return "0";
  const sign = x < 0 ? MINUS : "";
  const [m, expText] = Math.abs(x).toExponential().split("e") as [string, string];
  let digits = m.replace(".", "");
  let e = Number(expText);
  if (digits.length > sig) {
    const rest = digits.slice(sig);
    digits = digits.slice(0, sig);
    const up = rest[0]! > "5" || (rest[0] === "5" && (/[1-9]/.test(rest.slice(1)) || Number(digits[sig - 1]) % 2 === 1));
    if (up) {
      const n = [...digits];
      let k = sig - 1;
      while (k >= 0 && n[k] === "9") n[k--] = "0";
      if (k >= 0) n[k] = String(Number(n[k]) + 1);
      else {
        n.unshift("1");
        n.pop();
        e += 1;
      }
      digits = n.join("");
    }
  }
  digits = digits.padEnd(sig, "0");
  // the ×10ⁿ form is rare in the calculator's tables: the site's own writer does it (one rule)
  if (e >= 12 || e <= -6) return formatNumber(new Dec(String(x)), sig);
  let int: string;
  let frac: string;
  if (e >= 0) {
    const padded = digits.length > e + 1 ? digits : digits + "0".repeat(e + 1 - digits.length);
    int = padded.slice(0, e + 1);
    frac = padded.slice(e + 1);
  } else {
    int = "0";
    frac = "0".repeat(-e - 1) + digits;
  }
  return sign + groupDigits(int, false) + (frac ? "." + groupDigits(frac, true) : "");
}
