/**
 * The one table model every page uses. Templates render it with one macro;
 * the CSV downloads and the search index are made from the same rows, so a
 * table, its CSV and its search entries always agree.
 */
import type { Dec } from "../physics/decimal.js";
import { exportText } from "../physics/decimal.js";
import type { Rational } from "../physics/rational.js";
import { formatFraction, formatM, formatQuantum, numberParts, type NumberParts } from "./format.js";

export type ColumnKind = "text" | "number" | "term" | "quantum" | "fraction";

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
  multiplicity: string;
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
  /** Exact fraction shown beside a decimal, e.g. "4/3". */
  exact?: string;
  term?: TermParts;
  /** In-site link target (relative to the site root), e.g. "species/rb87/#level:5s-S1/2". */
  href?: string;
}

export interface Row {
  /** Stable anchor (see anchors.ts); also the row's HTML id. */
  anchor: string;
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
}

export const textCell = (text: string, href?: string): Cell => ({ text, sort: text, ...(href ? { href } : {}) });

export function numberCell(x: Dec | null, sig = 9, extra: Partial<Cell> = {}): Cell {
  if (x === null) return { text: "—", sort: "", ...extra };
  const parts = numberParts(x, sig);
  return { text: parts.sign + parts.int + parts.frac + parts.exp, sort: exportText(x, 30), parts, ...extra };
}

export const quantumCell = (k: number, signed = false): Cell => ({
  text: signed ? formatM(k) : formatQuantum(k),
  sort: String(k / 2),
});

export function fractionCell(r: Rational | null): Cell {
  if (r === null) return { text: "—", sort: "" };
  return { text: formatFraction(r), sort: exportText(r.toDecimal(), 30), exact: r.toString() };
}

/** Term symbol split for display as ²P°₃/₂ with HTML sup/sub. */
export function termParts(t: { multiplicity: number; letter: string; parity: "odd" | null; J2: number }): TermParts {
  return { multiplicity: String(t.multiplicity), letter: t.letter, parity: t.parity === "odd", J: formatQuantum(t.J2) };
}

export const termCell = (t: { text: string; multiplicity: number; letter: string; parity: "odd" | null; J2: number }): Cell => ({
  text: t.text,
  sort: t.text,
  term: termParts(t),
});
