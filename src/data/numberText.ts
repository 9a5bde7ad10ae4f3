/**
 * Numbers as the data files write them: plain decimals, concise uncertainty
 * ("2.00233113(20)"), optionally "value ± uncertainty", and quantities
 * "<number> <unit>". Everything is decided on the text; no JavaScript number
 * is ever made, so every digit written reaches the arithmetic.
 */
import { Dec, dec } from "../physics/decimal.js";
import { UNITS, toSI, unitsOfKind, type UnitKind } from "../physics/units.js";
import type { Measured, Quantity } from "./model.js";
import { bad, ok, type Parsed } from "./parsed.js";

/** Longest mantissa accepted, in digits; longer ones are typing accidents or attacks. */
export const MAX_DIGITS = 200;
/** Largest decimal exponent accepted in magnitude. */
export const MAX_EXPONENT = 400;

const CONCISE = /^([+-]?)(\d*)(?:\.(\d*))?(?:\((\d+)\))?(?:[eE]([+-]?\d+))?$/;

const EXAMPLES = `write a decimal number such as 2.0023, -0.5e-3, or with its standard uncertainty in the last digits, 2.00233113(20)`;

function specialHint(text: string): string | null {
  const t = text.trim().toLowerCase();
  if (/^[+-]?\.?(inf|infinity|nan)$/.test(t)) return `infinite and not-a-number values are not allowed; ${EXAMPLES}`;
  if (/^[+-]?0[xob]/.test(t)) return `hexadecimal, octal and binary numerals are not allowed; ${EXAMPLES}`;
  if (/\d,\d/.test(t)) return `use a point, not a comma, as decimal separator; ${EXAMPLES}`;
  if (/\d_\d/.test(t)) return `digit separators "_" are not allowed; ${EXAMPLES}`;
  if (/^[+-]?(\d+(\.\d*)?|\.\d+)\s*\(\d*\.\d*\)/.test(t))
    return `write the uncertainty in parentheses as digits of the last places only, e.g. 12.34(12) for 12.34 ± 0.12`;
  return null;
}

function checkSize(mantissaDigits: string, exponent: string | undefined): string | null {
  if (mantissaDigits.length > MAX_DIGITS)
    return `number has ${mantissaDigits.length} digits, more than the limit of ${MAX_DIGITS}`;
  if (exponent !== undefined && Math.abs(Number(exponent)) > MAX_EXPONENT)
    return `exponent ${exponent} is out of range; exponents up to ±${MAX_EXPONENT} are accepted`;
  return null;
}

function parsePlainOrConcise(text: string): Parsed<Measured> {
  const m = CONCISE.exec(text);
  const [, sign = "", int = "", frac, unc, exp] = m ?? [];
  if (!m || (int === "" && (frac === undefined || frac === ""))) {
    return bad(`"${text}" is not a number`, specialHint(text) ?? EXAMPLES);
  }
  const tooBig = checkSize(int + (frac ?? "") + (unc ?? ""), exp);
  if (tooBig) return bad(tooBig, "no measured value needs that; check the number for a typing accident");
  const value = dec(`${sign}${int === "" ? "0" : int}${frac !== undefined ? "." + (frac === "" ? "0" : frac) : ""}${exp !== undefined ? "e" + exp : ""}`);
  let uncertainty: Dec | null = null;
  if (unc !== undefined) {
    // The digits in parentheses count in units of the last written digit.
    const places = (frac ?? "").length - Number(exp ?? "0");
    uncertainty = dec(`${unc}e${-places}`);
    if (uncertainty.isZero())
      return bad(`uncertainty (${unc}) in "${text}" is zero`, "leave out the parentheses for an exact value, or give the uncertainty");
  }
  return ok({ value, uncertainty, text });
}

/**
 * A measured number: "2.00233113(20)" → 2.00233113 with uncertainty
 * 0.00000020; "1.234(5)e-3" → 1.234e-3 ± 0.005e-3; "12(3)" → 12 ± 3;
 * "2.5 ± 0.1" (or "+/-") → 2.5 ± 0.1. `text` keeps what was written.
 */
export function parseMeasured(text: string): Parsed<Measured> {
  const t = text.trim();
  const pm = /^(.*?)\s*(?:±|\+\/-|\+-)\s*(.*)$/.exec(t);
  if (pm) {
    const v = parsePlainOrConcise(pm[1] ?? "");
    const u = parsePlainOrConcise(pm[2] ?? "");
    if (!v.ok) return v;
    if (!u.ok) return bad(`uncertainty "${pm[2]}" after ± is not a number`, EXAMPLES);
    if (v.value.uncertainty || u.value.uncertainty)
      return bad(`"${t}" gives the uncertainty twice`, "use either 2.5(1) or 2.5 ± 0.1, not both");
    if (u.value.value.isNegative() || u.value.value.isZero())
      return bad(`uncertainty in "${t}" must be positive`, "write the standard uncertainty as a positive number, or leave it out");
    return ok({ value: v.value.value, uncertainty: u.value.value, text: t });
  }
  const r = parsePlainOrConcise(t);
  return r.ok ? ok({ ...r.value, text: t }) : r;
}

/** Units accepted for one quantity; `kind` picks them from physics/units.ts, or a table given here. */
export type UnitTable = Readonly<Record<string, string>>;

/** Nuclear magnetic moments, in nuclear magnetons; both spellings of the Greek letter. */
export const MOMENT_UNITS: UnitTable = Object.freeze({ muN: "1", "μN": "1", "µN": "1" });

function kindTable(kind: UnitKind): UnitTable {
  return Object.fromEntries(unitsOfKind(kind).map((u) => [u, UNITS[u]?.factor ?? "1"]));
}

/** Micro sign (U+00B5) and Greek mu (U+03BC) look the same; accept either. */
function lookUp(unit: string, table: UnitTable): string | null {
  for (const u of [unit, unit.replace(/μ/g, "µ"), unit.replace(/µ/g, "μ")]) {
    if (Object.hasOwn(table, u)) return u;
  }
  return null;
}

/**
 * "<number> <unit>" with a unit of the given kind, e.g. "780.241209686 nm"
 * for a length, converted exactly to SI (Hz, T, m, u; nuclear magnetons for
 * MOMENT_UNITS). The wrong kind of unit or an unknown unit is an error that
 * lists the units that would do.
 */
export function parseQuantity(text: string, kind: UnitKind | UnitTable, what: string): Parsed<Quantity> {
  const table = typeof kind === "string" ? kindTable(kind) : kind;
  const kindName = typeof kind === "string" ? kind : "moment";
  const right = `${kindName} units are ${Object.keys(table).join(", ")}`;
  const t = text.trim();
  const m = /^(.*\S)\s+(\S+)$/.exec(t);
  if (!m) {
    const glued = /^([+-]?[\d.]+(?:\(\d+\))?(?:[eE][+-]?\d+)?)([^\d\s].*)$/.exec(t);
    if (glued && glued[2] !== undefined && lookUp(glued[2], table))
      return bad(`"${t}" needs a space between number and unit`, `write "${glued[1]} ${glued[2]}"`);
    const number = parseMeasured(t);
    if (number.ok) return bad(`"${t}" has no unit`, `write ${what} as "<number> <unit>"; ${right}`);
    return bad(`"${t}" is not "<number> <unit>"`, `e.g. "${example(table)}"; ${right}`);
  }
  const [, numText = "", unitText = ""] = m;
  const unit = lookUp(unitText, table);
  if (!unit) {
    const other = UNITS[unitText];
    const wrong = other ? `"${unitText}" is a ${other.kind} unit, not a ${kindName} unit` : `unknown unit "${unitText}" in "${t}"`;
    return bad(wrong, `${what} needs a ${kindName} unit; ${right}`);
  }
  const n = parseMeasured(numText);
  if (!n.ok) return n;
  const factor = table[unit] ?? "1";
  const si = typeof kind === "string" ? toSI(n.value.value, unit) : n.value.value.mul(new Dec(factor));
  const siUncertainty =
    n.value.uncertainty === null ? null : typeof kind === "string" ? toSI(n.value.uncertainty, unit) : n.value.uncertainty.mul(new Dec(factor));
  return ok({ value: n.value.value, uncertainty: n.value.uncertainty, text: t, unit: unitText, si, siUncertainty });
}

function example(table: UnitTable): string {
  const u = Object.keys(table)[0] ?? "";
  return `1.5 ${u}`;
}
