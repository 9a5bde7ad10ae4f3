/**
 * CSV (RFC 4180) of a table: CRLF line ends, fields quoted when they hold a
 * comma, quote, CR or LF, quotes doubled. Numbers are written at full export
 * precision (the cell's sort key), not as shown, so scripts lose nothing.
 * The first column is the row's anchor, the same id as on the page and in
 * the JSON export's keys.
 */
import type { Table } from "./table.js";

function field(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function tableCsv(t: Table): string {
  const header = ["anchor", ...t.columns.map((c) => (c.unit ? `${c.label} (${c.unit})` : c.label))];
  const lines = [header.map(field).join(",")];
  for (const r of t.rows) {
    const values = r.cells.map((c, i) => {
      const col = t.columns[i]!;
      if (col.switchable && c.hzPerT !== undefined) return c.sort;
      if (col.kind === "number") return c.sort;
      if (col.kind === "fraction") return c.exact ?? c.text;
      return c.text.replace(/\u2212/g, "-");
    });
    lines.push([r.anchor, ...values].map(field).join(","));
  }
  return lines.join("\r\n") + "\r\n";
}
