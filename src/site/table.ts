/**
 * The one table model every page uses. Templates render it with one macro;
 * the CSV downloads and the search index are made from the same rows, so a
 * table, its CSV and its search entries always agree.
 */
import type { Dec } from "../physics/decimal.js";
import { exportText } from "../physics/decimal.js";
import type { Rational } from "../physics/rational.js";
import type { Measured } from "../data/model.js";
import { formatFraction, formatM, formatQuantum, numberParts, partsText, uncertainParts, writtenParts } from "./format.js";
import { alignParts, termSymbolParts, type NumberParts, type TermLike } from "./plainFormat.js";

export { PUNCTUATION_SPACE } from "./plainFormat.js";

/** "note": long text (sources, readings) shown folded in an expandable note, so a row stays low on a phone. */
export type ColumnKind = "text" | "note" | "number" | "term" | "quantum" | "fraction";

export interface Column {
  key: string;
  label: string;
  /** Unit shown in the header, e.g. "MHz/G". */
  unit?: string;
  kind: ColumnKind;
  /** A shift column whose unit the reader may switch (cells carry hzPerT). */
  switchable?: boolean;
}

export interface TermParts {
  /** The superscript: 2S+1 (LS), 2s+1 of the outer electron (jK), empty (jj). */
  multiplicity: string;
  /** The body: the L letter (LS), [K] (jK), (j1,j2) (jj). */
  letter: string;
  parity: boolean;
  J: string;
}

export interface Cell {
  /** Plain text of the cell (CSV, search, no-markup fallback). */
  text: string;
  /** Machine sort key: a decimal string for numbers, else the text. */
  sort: string;
  /** Number split for decimal alignment. */
  parts?: NumberParts;
  /** Exact Hz/T value for unit switching. */
  hzPerT?: string;
  /** Standard uncertainty of the value in Hz/T, converted with it by the unit switch (data-u-hz-per-t). */
  uHzPerT?: string;
  /** Standard uncertainty of a computed number in the column's unit (export text), for the CSV's "u" column; absent when exact. */
  u?: string;
  /** Exact absolute frequency (Hz) of the row, from which the page script recomputes an offset (the lock-point tables' data-hz). */
  hz?: string;
  /** Exact fraction as data ("-4/3", ASCII minus), e.g. for the CSV. */
  exact?: string;
  /** The exact fraction as shown before its decimal ("−4/3"), and "=" or "≈" between them. */
  fraction?: { text: string; rel: "=" | "≈" };
  term?: TermParts;
  /** In-site link target (relative to the site root), e.g. "species/rb87/#level:5s-S1/2". */
  href?: string;
  /** A text cell whose text holds concise uncertainties ("3.228 917(3) G"): each is written in its own hideable element (uncertainProse.ts). */
  prose?: boolean;
}

export interface Row {
  /** Stable anchor (see anchors.ts); also the row's HTML id. */
  anchor: string;
  /** Further anchors that land on this row: forms of earlier builds that name the same row (anchors.ts), as empty elements in it. */
  aliases?: string[];
  cells: Cell[];
}

export interface Table {
  /** Unique on its page; names the CSV file. */
  id: string;
  caption: string;
  columns: Column[];
  rows: Row[];
  /** CSV file path relative to the site root. */
  csvPath: string;
  /** The species JSON export holding the same rows (same ids), relative to the site root. */
  exportUrl?: string;
}

export const textCell = (text: string, href?: string): Cell => ({ text, sort: text, ...(href ? { href } : {}) });

export function numberCell(x: Dec | null, sig = 9, extra: Partial<Cell> = {}): Cell {
  if (x === null) return { text: "—", sort: "", ...extra };
  const parts = numberParts(x, sig);
  return { text: partsText(parts), sort: exportText(x, 30), parts, ...extra };
}

/**
 * A computed number with its standard uncertainty in the concise form
 * (uncertainParts in format.ts): "0.699 583 30(12)", the "(12)" kept in
 * parts.unc so the page can hide it. With u null (exact, or no uncertain
 * input) it is exactly numberCell(x, sig, extra). A cell with hzPerT in
 * `extra` (a switchable shift column) must be given `uHzPerT`, the
 * uncertainty in Hz/T, which the unit switch converts with the value.
 */
export function uncertainCell(x: Dec | null, u: Dec | null, sig = 9, extra: Partial<Cell> = {}, uHzPerT?: Dec): Cell {
  if (x === null || u === null || u.isZero()) return numberCell(x, sig, extra);
  const parts = uncertainParts(x, u, sig);
  const uText = exportText(u.abs(), 30);
  if (extra.hzPerT !== undefined && uHzPerT === undefined) throw new Error("uncertainCell: a cell with hzPerT needs its uncertainty in Hz/T too");
  const switchU = uHzPerT === undefined ? {} : { uHzPerT: exportText(uHzPerT.abs(), 30) };
  return { text: partsText(parts), sort: exportText(x, 30), parts, u: uText, ...switchU, ...extra };
}

/**
 * A measured input shown as written (its own digits and concise
 * uncertainty), sorted by its value. `value` is the number in the column's
 * unit; when the written text cannot be shown as is, the value is shown
 * with as many significant digits as were written.
 */
export function measuredCell(m: Measured, value: Dec = m.value, numberText: string = m.text): Cell {
  const parts = writtenParts(numberText);
  if (!parts) return numberCell(value, 9);
  return { text: partsText(parts), sort: exportText(value, 30), parts };
}

export const quantumCell = (k: number, signed = false): Cell => ({
  text: signed ? formatM(k) : formatQuantum(k),
  sort: String(k / 2),
});

/** Decimal places of a fraction whose decimal terminates, else null (2^a·5^b denominators only). */
function terminatingPlaces(r: Rational): number | null {
  let d = r.den;
  let twos = 0;
  let fives = 0;
  while (d % 2n === 0n) (d /= 2n), twos++;
  while (d % 5n === 0n) (d /= 5n), fives++;
  return d === 1n ? Math.max(twos, fives) : null;
}

/** Significant digits of the decimal beside a fraction that does not terminate. */
export const FRACTION_DIGITS = 6;

/**
 * An exact fraction with its decimal beside it: "1/4 = 0.25",
 * "2/3 ≈ 0.666 667"; an integer is shown alone. The decimal carries the
 * parts, so it aligns on its point with the rest of the column.
 */
export function fractionCell(r: Rational | null): Cell {
  if (r === null) return { text: "—", sort: "" };
  const sort = exportText(r.toDecimal(), 30);
  if (r.den === 1n) {
    const parts = numberParts(r.toDecimal(), Math.max(1, (r.num < 0n ? -r.num : r.num).toString().length));
    return { text: partsText(parts), sort, exact: r.toString(), parts };
  }
  const places = terminatingPlaces(r);
  const exactDecimal = places !== null && places <= FRACTION_DIGITS;
  const dec = r.toDecimal();
  const parts = exactDecimal ? numberParts(dec, Math.max(1, dec.abs().toFixed(places).replace(".", "").replace(/^0+/, "").length)) : numberParts(dec, FRACTION_DIGITS);
  const rel = exactDecimal ? "=" : "≈";
  const text = formatFraction(r);
  return { text: `${text} ${rel} ${partsText(parts)}`, sort, exact: r.toString(), fraction: { text, rel }, parts };
}

/** Term symbol split for display as ²P°₃/₂ (or ²[3/2]°₂, (3/2,1/2)₁) with HTML sup/sub. */
export function termParts(t: TermLike): TermParts {
  const { sup, body } = termSymbolParts(t);
  return { multiplicity: sup, letter: body, parity: t.parity === "odd", J: formatQuantum(t.J2) };
}

export const termCell = (t: TermLike & { text: string }): Cell => ({
  text: t.text,
  sort: t.text,
  term: termParts(t),
});

/**
 * Lines up the decimal points of every number and fraction column of a
 * table (alignParts in plainFormat.ts, the rule the page scripts use too):
 * digit groups made uniform per column, then trailing figure, punctuation
 * and thin spaces so every cell has as many of each right of its point.
 * Returns a new table; `text` of each cell follows the regrouping.
 */
export function alignTable(t: Table): Table {
  const rows = t.rows.map((r) => ({ ...r, cells: r.cells.map((c) => ({ ...c })) }));
  t.columns.forEach((col, i) => {
    if (col.kind !== "number" && col.kind !== "fraction") return;
    const cells = rows.map((r) => r.cells[i]).filter((c): c is Cell => c?.parts !== undefined);
    if (cells.length === 0) return;
    const aligned = alignParts(cells.map((c) => c.parts!));
    cells.forEach((c, k) => {
      const before = partsText(c.parts!);
      const after = partsText(aligned[k]!);
      if (after !== before) c.text = c.text.replace(before, after);
      c.parts = aligned[k]!;
    });
  });
  return { ...t, rows };
}
