/**
 * The units a reader may choose for shift columns (Hz, kHz, MHz, GHz or
 * cm⁻¹, per tesla or per gauss) and the exact conversion of a shift in
 * Hz/T into one of them, as shown number parts. Factors come from the one
 * unit table (src/physics/unitTable.ts): powers of ten are exact decimal
 * shifts, and cm⁻¹ divides by 100·c = 29 979 245 800 exactly. Rounding is
 * the server's (9 significant digits, half to even; format.ts), so the
 * default MHz/G computed here equals the server's text. Used by the unit
 * switch and by the finder's result lines.
 */
import { UNITS } from "../physics/unitTable.js";
import { decimalParts, uncertainDecimalParts } from "./decimalText.js";
import type { NumberParts } from "./plainFormat.js";

export const SHIFT_UNITS = ["Hz/T", "kHz/T", "MHz/T", "GHz/T", "cm⁻¹/T", "Hz/G", "kHz/G", "MHz/G", "GHz/G", "cm⁻¹/G"] as const;
export type ShiftUnit = (typeof SHIFT_UNITS)[number];
export const DEFAULT_SHIFT_UNIT: ShiftUnit = "MHz/G";
/** Significant digits of shifts on pages (SHOWN_DIGITS of linearTables.ts). */
export const SHIFT_DIGITS = 9;

function factor(unit: string, kind: "frequency" | "field"): string | null {
  const u = UNITS[unit];
  return u && u.kind === kind ? u.factor : null;
}

function factors(unit: string): { field: string; freq: string } | null {
  if (!(SHIFT_UNITS as readonly string[]).includes(unit)) return null;
  const slash = unit.lastIndexOf("/");
  const freq = factor(unit.slice(0, slash), "frequency");
  const field = factor(unit.slice(slash + 1), "field");
  return freq === null || field === null ? null : { field, freq };
}

/** A shift in Hz/T (decimal text) in `unit`, or null when either cannot be read. */
export function convertShift(hzPerT: string, unit: string): NumberParts | null {
  const f = factors(unit);
  // (Hz/T) × (T per field unit) / (Hz per frequency unit)
  return f && decimalParts(hzPerT, f.field, f.freq, SHIFT_DIGITS);
}

/** A shift and its standard uncertainty, both in Hz/T, in `unit` in the concise form ("1.399 624 491 71(44)"); null when either cannot be read. */
export function convertShiftUncertain(hzPerT: string, uHzPerT: string, unit: string): NumberParts | null {
  const f = factors(unit);
  return f && uncertainDecimalParts(hzPerT, uHzPerT, f.field, f.freq);
}
