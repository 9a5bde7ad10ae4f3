/**
 * How a table cell's text reads to the page scripts: the sort key of a cell
 * without data-sort, and the folded text the row filter matches. No
 * imports, so src/browser/tables.ts bundles it; sortKey.ts uses the same
 * rule to decide where a cell needs a data-sort attribute at all.
 */

/**
 * What the table script sorts a cell without data-sort by: its text with
 * thin and no-break spaces dropped and trimmed (String.prototype.trim also
 * drops the figure and punctuation spaces of the padding); "—" is empty.
 * The true minus is kept, so a label such as "mF=−1" is its own key.
 */
export function shownKey(text: string): string {
  const s = text.replace(/[\u2009\u202f\u00a0]/g, "").trim();
  return s === "—" ? "" : s;
}

/** Text as the row filter and the numeric sort see it: true minus as "-", thin and no-break spaces dropped, trimmed. */
export function plainText(s: string): string {
  return s.replace(/\u2212/g, "-").replace(/[\u2009\u202f\u00a0]/g, "").trim();
}
