/**
 * Uncertainties inside sentences ("G = 1.340 4(12) from the g values in
 * use"): the text escaped as Nunjucks autoescaping does, with every concise
 * uncertainty — a parenthesized digit group right after a digit, as
 * formatUncertain (format.ts) writes it — in its own
 * <span class="unc unc-prose">, so the page's "Show uncertainties" switch
 * hides it as it hides those of the tables (src/browser/uncertaintySwitch.ts).
 * In a sentence a hidden uncertainty takes no room (interactive.css), unlike
 * in a table column where it keeps its width to hold the alignment.
 */
import { escapeHtml } from "./tableRows.js";

export function uncertainProseHtml(text: string): string {
  return escapeHtml(text).replace(/(\d)\((\d+)\)/g, '$1<span class="unc unc-prose">($2)</span>');
}
