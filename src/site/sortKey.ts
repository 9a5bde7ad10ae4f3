/**
 * The data-sort attribute of a table cell: always in number, fraction and
 * quantum columns, and in text and term columns only where the browser
 * could not read the same key from the cell's text (src/browser/tables.ts
 * falls back to the text, folded by `shownKey` of cellText.ts). Numeric
 * keys are cut to SORT_DIGITS significant digits in the page; the CSV and
 * the JSON export keep the full `sort` of the cell.
 */
import { NOTE_FOLD, noteSummary } from "./note.js";
import { dec, exportText } from "../physics/decimal.js";
import { shownKey } from "./cellText.js";
import type { Cell, ColumnKind } from "./table.js";

/**
 * 17 significant digits: more than any number is shown with (at most 12
 * in the tables), so rounding, which never reverses an order, can only
 * tie values that already look the same; the sort keeps their page order.
 */
export const SORT_DIGITS = 17;

/** The cell's text as the reader's browser has it (textContent of the macro's markup). */
export function shownText(c: Cell, kind: ColumnKind): string {
  if (kind === "note" && c.text.length > NOTE_FOLD) return noteSummary(c.text) + c.text;
  if (kind === "term" && c.term) return c.term.multiplicity + c.term.letter + (c.term.parity ? "o" : "") + c.term.J;
  if (c.href) return c.text;
  if (c.parts) {
    const p = c.parts;
    return (c.fraction ? `${c.fraction.text} ${c.fraction.rel} ` : "") + p.sign + p.int + p.frac + (p.unc ?? "") + p.exp + (p.pad ?? "");
  }
  return c.text;
}

export { shownKey };

const NUMERIC_KINDS = new Set<ColumnKind>(["number", "fraction", "quantum"]);

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** The data-sort value to write, or false where the cell's text gives the same key. */
export function sortKey(c: Cell, kind: ColumnKind): string | false {
  // Number, fraction and quantum columns always carry their keys: the page's own tests and
  // readers' scripts read a numeric column's values from data-sort.
  if (!NUMERIC_KINDS.has(kind) && shownKey(shownText(c, kind)) === c.sort) return false;
  if (DECIMAL.test(c.sort) && c.sort.replace(/e.*$/i, "").replace(/\D/g, "").replace(/^0+/, "").length > SORT_DIGITS) {
    return exportText(dec(c.sort), SORT_DIGITS);
  }
  return c.sort;
}
