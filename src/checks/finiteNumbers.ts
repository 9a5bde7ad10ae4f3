/**
 * Every g value, shift, energy and frequency in an export is a finite
 * decimal string (or an exact fraction where the contract says so), never
 * "NaN" or "Infinity" and never a bare JSON number that lost digits. The
 * whole document is walked, so keys added later (field tables) are covered
 * when they follow the naming of the contract: g…, …shift…, …_Hz, …_m, …_T.
 */
import { isObject } from "./exportShape.js";

const DECIMAL = /^-?(0|[1-9][0-9]*)(\.[0-9]+)?([eE][+-]?[0-9]+)?$/;
const FRACTION = /^-?(0|[1-9][0-9]*)(\/[1-9][0-9]*)?$/;
/** Keys holding a number; `…_exact` keys hold fractions; a strength may be either (exact at zero field, decimal at a field). */
const NUMERIC_KEY = /^(g(?!.*_from$)|.*shift|.*_Hz(_|$)|.*_m$|.*_T$|.*_per_T$|energy|.*_uncertainty$)/;
const FRACTION_KEY = /_exact$/;
const EITHER_KEY = /^strength$/;
const NON_FINITE = /^[-+]?(nan|inf(inity)?)$/i;
/** Free text and names copied from the data files: any words allowed, even "NaN". */
const TEXT_KEY = new Set(["id", "label", "config", "term", "summary", "pattern", "notes", "source", "upper", "lower", "constants", "format", "data_version"]);

export function checkFiniteNumbers(value: unknown, file: string): string[] {
  const problems: string[] = [];
  const walk = (x: unknown, path: string, key: string | null): void => {
    if (Array.isArray(x)) {
      x.forEach((v, i) => walk(v, `${path}/${i}`, key));
      return;
    }
    if (isObject(x)) {
      for (const [k, v] of Object.entries(x)) walk(v, `${path}/${k}`, k);
      return;
    }
    if (typeof x === "number") {
      if (!Number.isFinite(x)) problems.push(`${file}: ${path} is ${x}, not finite`);
      else if (key !== null && NUMERIC_KEY.test(key) && !Number.isInteger(x)) problems.push(`${file}: ${path} is the JSON number ${x}; numbers are exported as decimal strings`);
      return;
    }
    if (typeof x !== "string") return;
    if (key !== null && TEXT_KEY.has(key)) return;
    if (NON_FINITE.test(x.trim())) {
      problems.push(`${file}: ${path} is ${JSON.stringify(x)}, not a finite number`);
      return;
    }
    if (key === null) return;
    if (EITHER_KEY.test(key)) {
      if (!FRACTION.test(x) && !DECIMAL.test(x)) problems.push(`${file}: ${path} is ${JSON.stringify(x)}, not a finite number`);
    } else if (FRACTION_KEY.test(key)) {
      if (!FRACTION.test(x)) problems.push(`${file}: ${path} is ${JSON.stringify(x)}, not an exact fraction`);
    } else if (NUMERIC_KEY.test(key) && !DECIMAL.test(x)) {
      problems.push(`${file}: ${path} is ${JSON.stringify(x)}, not a finite decimal`);
    }
  };
  walk(value, "", null);
  return problems;
}
