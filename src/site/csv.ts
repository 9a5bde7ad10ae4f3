/**
 * CSV (RFC 4180) of a table: CRLF line ends, fields quoted when they hold a
 * comma, quote, CR or LF, quotes doubled. Numbers are written at full export
 * precision (the cell's sort key), not as shown, so scripts lose nothing.
 * The first column is the row's anchor, the same id as on the page and in
 * the JSON export's keys. A number column whose cells carry standard
 * uncertainties is followed by a "<label> u (<unit>)" column (empty for an
 * exact value), so the concise "(12)" of the page is never lost.
 */
import type { Table } from "./table.js";

function field(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function tableCsv(t: Table): string {
  // A number column with any uncertain cell gets a "<label> u" column right after it: the
  // standard uncertainty in the same unit, empty where the value is exact.
  const withU = t.columns.map((c, i) => c.kind === "number" && t.rows.some((r) => r.cells[i]?.u !== undefined));
  const header = ["anchor", ...t.columns.flatMap((c, i) => {
    const name = c.unit ? `${c.label} (${c.unit})` : c.label;
    return withU[i] ? [name, c.unit ? `${c.label} u (${c.unit})` : `${c.label} u`] : [name];
  })];
  const lines = [header.map(field).join(",")];
  for (const r of t.rows) {
    const values = r.cells.flatMap((c, i) => {
      const col = t.columns[i]!;
      const v = col.switchable && c.hzPerT !== undefined ? c.sort : col.kind === "number" ? c.sort : col.kind === "fraction" ? (c.exact ?? c.text) : c.text.replace(/\u2212/g, "-");
      return withU[i] ? [v, c.u ?? ""] : [v];
    });
    lines.push([r.anchor, ...values].map(field).join(","));
  }
  return lines.join("\r\n") + "\r\n";
}
