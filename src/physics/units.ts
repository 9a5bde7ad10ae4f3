/**
 * Units the data files may use (the table is in unitTable.ts, which the page
 * scripts share), and exact conversion to the SI unit of their kind.
 */
import { Dec } from "./decimal.js";
import { SPEED_OF_LIGHT_TEXT, UNITS } from "./unitTable.js";

export { UNITS, unitsOfKind, type UnitDef, type UnitKind } from "./unitTable.js";

/** Convert value in `unit` to the SI unit of its kind. Exact. */
export function toSI(value: Dec, unit: string): Dec {
  const d = UNITS[unit];
  if (!d) throw new RangeError(`unknown unit ${unit}`);
  return value.mul(new Dec(d.factor));
}

/** Exact speed of light, m/s, for wavelength ↔ frequency conversions. */
export const SPEED_OF_LIGHT = new Dec(SPEED_OF_LIGHT_TEXT);
