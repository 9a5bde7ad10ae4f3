/**
 * The one declarative way to define a table: each column says what it is
 * (label, unit, kind) and how to make its cell from a row; the table says
 * its id, caption, CSV path and how a row's anchor is made. Everything
 * every table needs (decimal-point alignment, the export link, dropping
 * columns that do not apply, the numerical-zero rule) is done here once, so a page builder lists
 * columns and nothing else.
 *
 *   const t = makeTable({
 *     id: "mj:5s-S1/2", caption: "…", csvPath: "species/rb87/csv/….csv",
 *     anchor: (m) => mJAnchor("5s-S1/2", m.m2),
 *     columns: [
 *       { key: "mJ", label: "mJ", kind: "quantum", cell: (m) => quantumCell(m.m2, true) },
 *       { key: "shift", label: "shift", unit: "MHz/G", kind: "number", cell: (m) => … },
 *     ],
 *   }, sublevels);
 */
import { Dec } from "../physics/decimal.js";
import { alignTable, numberCell, type Cell, type Column, type Row, type Table } from "./table.js";

/**
 * The numerical-zero rule. Decimals carry 60 significant digits, and the
 * eigenvalue and root iterations stop within about 1e-50 of the largest
 * magnitude they handle; a computed value below NUMERICAL_ZERO times the
 * scale of its table is therefore indistinguishable from 0 and is shown as
 * 0 (the export keeps the digits as computed). The scale is the largest
 * magnitude among the table's number columns of the same unit (a column of
 * energies at 0 G is all residue; its neighbours at other fields give the
 * scale). Measured inputs and exact fractions never come near this ratio.
 */
export const NUMERICAL_ZERO = new Dec("1e-40");

function zeroNoise(rows: Row[], columns: Column[]): void {
  const scales = new Map<string, Dec>();
  const unitOf = (col: Column, i: number) => (col.unit === undefined ? `#${i}` : col.unit);
  columns.forEach((col, i) => {
    if (col.kind !== "number") return;
    let scale = scales.get(unitOf(col, i)) ?? new Dec(0);
    for (const r of rows) {
      const c = r.cells[i]!;
      if (c.parts && c.sort) scale = Dec.max(scale, new Dec(c.sort).abs());
    }
    scales.set(unitOf(col, i), scale);
  });
  columns.forEach((col, i) => {
    if (col.kind !== "number") return;
    const scale = scales.get(unitOf(col, i))!;
    if (scale.isZero()) return;
    const below = scale.mul(NUMERICAL_ZERO);
    for (const r of rows) {
      const c = r.cells[i]!;
      if (!c.parts || !c.sort) continue;
      const v = new Dec(c.sort);
      if (!v.isZero() && v.abs().lt(below)) r.cells[i] = numberCell(new Dec(0), 1, c.hzPerT === undefined ? {} : { hzPerT: "0" });
    }
  });
}

export interface ColumnSpec<R> extends Column {
  cell: (row: R, index: number) => Cell;
  /** False leaves the column out (a column that does not apply to this table). */
  when?: boolean;
}

export interface TableSpec<R> {
  id: string;
  caption: string;
  csvPath: string;
  /** The species JSON export holding the same rows. */
  exportUrl?: string;
  anchor: (row: R, index: number) => string;
  /** Anchors of earlier builds that now name this row (Row.aliases); none when absent. */
  aliases?: (row: R) => string[];
  columns: ColumnSpec<R>[];
}

/** A table model (table.ts) from a spec and its rows, aligned on the decimal point. */
export function makeTable<R>(spec: TableSpec<R>, rows: readonly R[]): Table {
  const specs = spec.columns.filter((c) => c.when !== false);
  const columns: Column[] = specs.map(({ cell: _cell, when: _when, ...col }) => col);
  const out: Row[] = rows.map((r, i) => {
    const aliases = spec.aliases?.(r) ?? [];
    return { anchor: spec.anchor(r, i), ...(aliases.length ? { aliases } : {}), cells: specs.map((c) => c.cell(r, i)) };
  });
  zeroNoise(out, columns);
  return alignTable({
    id: spec.id,
    caption: spec.caption,
    csvPath: spec.csvPath,
    ...(spec.exportUrl ? { exportUrl: spec.exportUrl } : {}),
    columns,
    rows: out,
  });
}
