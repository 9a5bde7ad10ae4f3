/**
 * The template filters, one record shared by Eleventy (eleventyPlugin.ts)
 * and the standalone Nunjucks environment that renders species pages
 * (src/build/renderPages.ts), so both kinds of page are written alike.
 */
import { readableDate } from "./format.js";
import { relativeUrl } from "./relativeUrl.js";
import { tableRowsHtml } from "./tableRows.js";
import { uncertainProseHtml } from "./uncertainProse.js";
import type { Table } from "./table.js";

export const atlasFilters = {
  // The <tr> rows of a table model, as HTML (output with | safe; every value escaped inside).
  tableRows: (table: Table): string => tableRowsHtml(table),
  // A value as JSON for an inline data attribute.
  toJson: (value: unknown): string => JSON.stringify(value),
  // The relative path from a page to the site root ("./", "../../"), for <body data-root> (finder links).
  rootPath: (pageUrl: string): string => relativeUrl("/index.html", pageUrl).replace(/index\.html$/, "") || "./",
  // A sentence as HTML (output with | safe; escaped inside) with each concise uncertainty "(12)" in a span the page's switch hides.
  uncertainProse: (text: string): string => uncertainProseHtml(text),
  // An ISO build date as people read it ("2 December 2026, 03:23 UTC"); the ISO form stays in <time datetime> and <meta>.
  readableDate: (iso: string): string => readableDate(iso),
} as const;
