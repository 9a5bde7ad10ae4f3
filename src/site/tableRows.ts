/**
 * The <tr> rows of a table (src/site/table.ts) as HTML text, for the table
 * macro in templates/_includes/macros.njk. Written in TypeScript rather than
 * as a Nunjucks loop because the rows are most of every page's bytes and a
 * macro call per cell was most of the render time; the markup is the same
 * the macro wrote, byte for byte, escaped the way Nunjucks autoescaping does.
 */
import { NOTE_FOLD, noteSummary } from "./note.js";
import { sortKey } from "./sortKey.js";
import { uncertainProseHtml } from "./uncertainProse.js";
import type { Cell, Column, Table, TermParts } from "./table.js";

const ESCAPES: Record<string, string> = { "&": "&amp;", '"': "&quot;", "'": "&#39;", "<": "&lt;", ">": "&gt;", "\\": "&#92;" };

/** Nunjucks' autoescape (nunjucks/src/lib.js `escape`): the same six characters, the same references. */
export function escapeHtml(s: string): string {
  return /[&"'<>\\]/.test(s) ? s.replace(/[&"'<>\\]/g, (ch) => ESCAPES[ch]!) : s;
}

const e = (s: string | undefined): string => (s ? escapeHtml(s) : "");

export function termHtml(t: TermParts): string {
  return `<span class="term">${t.multiplicity ? `<sup>${e(t.multiplicity)}</sup>` : ""}${e(t.letter)}${t.parity ? "<sup>o</sup>" : ""}<sub>${e(t.J)}</sub></span>`;
}

/** The content of one cell: a term symbol, an in-site link, a number split for alignment, a folded note, or text. */
export function cellHtml(c: Cell, col: Column): string {
  if (col.kind === "note" && c.text.length > NOTE_FOLD) return `<details class="note"><summary>${e(noteSummary(c.text))}</summary>${e(c.text)}</details>`;
  if (col.kind === "term" && c.term) return termHtml(c.term);
  if (c.href) return `<a href="${e(c.href)}">${e(c.text)}</a>`;
  if (c.parts) {
    const p = c.parts;
    const fraction = c.fraction ? `<span class="q">${e(c.fraction.text)}</span> ${e(c.fraction.rel)} ` : "";
    const pad = p.pad ? `<span class="pad">${e(p.pad)}</span>` : "";
    // the uncertainty is its own element, so the page's switch can hide it (src/browser/uncertaintySwitch.ts)
    const unc = p.unc ? `<span class="unc">${e(p.unc)}</span>` : "";
    return `${fraction}<span class="n">${e(p.sign)}${e(p.int)}<span class="frac">${e(p.frac)}${unc}${e(p.exp)}</span>${pad}</span>`;
  }
  if (c.prose) return uncertainProseHtml(c.text);
  return e(c.text);
}

/** Every row of the table: its id, its cells, and a link to the row itself. */
export function tableRowsHtml(t: Table): string {
  const out: string[] = [];
  for (const r of t.rows) {
    const anchor = e(r.anchor);
    let row = `\n<tr id="${anchor}">`;
    r.cells.forEach((c, i) => {
      const col = t.columns[i];
      if (!col) return;
      const key = sortKey(c, col.kind);
      row += `<td class="k-${e(col.kind)}"${key === false ? "" : ` data-sort="${e(key)}"`}${c.hzPerT ? ` data-hz-per-t="${e(c.hzPerT)}"` : ""}${c.uHzPerT ? ` data-u-hz-per-t="${e(c.uHzPerT)}"` : ""}${c.hz ? ` data-hz="${e(c.hz)}"` : ""}>${cellHtml(c, col)}</td>`;
    });
    // an alias (an anchor of an earlier build that names this row) is an empty element inside it, so old links land here
    const aliases = (r.aliases ?? []).map((a) => `<span id="${e(a)}"></span>`).join("");
    row += `<td class="k-link">${aliases}<a class="row-link" href="#${anchor}" aria-label="Link to this row">#</a></td>\n</tr>`;
    out.push(row);
  }
  return out.join("");
}
