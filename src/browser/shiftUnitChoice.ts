/**
 * The reader's chosen shift unit, remembered across pages in localStorage
 * (read by the unit switch and by the finder's result lines). Storage can
 * throw (file:// in some browsers, private modes, disabled storage): then
 * the default stands and nothing is remembered.
 */
import { DEFAULT_SHIFT_UNIT, SHIFT_UNITS } from "../site/shiftUnits.js";

const KEY = "sublevel-atlas:shift-unit";

export function readShiftUnit(): string {
  try {
    const v = globalThis.localStorage?.getItem(KEY);
    return v && (SHIFT_UNITS as readonly string[]).includes(v) ? v : DEFAULT_SHIFT_UNIT;
  } catch {
    return DEFAULT_SHIFT_UNIT;
  }
}

export function saveShiftUnit(unit: string): void {
  try {
    globalThis.localStorage?.setItem(KEY, unit);
  } catch {
    /* not remembered */
  }
}
