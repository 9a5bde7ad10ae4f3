/**
 * The Eleventy plugin of Sublevel Atlas: every filter, transform and
 * passthrough copy the templates rely on, registered in one place.
 */
import { relativeUrl } from "./relativeUrl.js";
import { rewriteRootLinks } from "./rewriteRootLinks.js";
import { tableRowsHtml } from "./tableRows.js";
import type { Table } from "./table.js";
import { searchData, searchIndexScript, type SearchSource } from "./searchIndex.js";

// Eleventy's UserConfig has no published types; the few methods used here are typed locally.
interface EleventyConfigLike {
  addFilter(name: string, fn: (...args: never[]) => unknown): void;
  addPassthroughCopy(map: Record<string, string>): void;
  addTransform(name: string, fn: (this: { page?: { url?: string | false; outputPath?: string | false } }, content: string) => string): void;
}

export function atlasPlugin(eleventyConfig: EleventyConfigLike): void {
  // Static assets and the published input schemas.
  eleventyConfig.addPassthroughCopy({ "templates/assets": "assets", schema: "schema" });
  // The search library as a classic script (module scripts do not load from file://).
  eleventyConfig.addPassthroughCopy({ "node_modules/minisearch/dist/umd/index.js": "assets/minisearch.js" });

  // Every site-root link becomes relative to its page (works from file:// and under any prefix).
  // A string pass (rewriteRootLinks.ts) rather than Eleventy's HTML-parsing URL transform,
  // which took about half of a large build.
  eleventyConfig.addTransform("atlas-relative-links", function (content: string) {
    const out = this.page?.outputPath;
    if (typeof out !== "string" || !out.endsWith(".html")) return content;
    const url = this.page?.url;
    return rewriteRootLinks(content, typeof url === "string" ? url : "/");
  });

  // The <tr> rows of a table model, as HTML (output with | safe; every value escaped inside).
  eleventyConfig.addFilter("tableRows", (table: Table) => tableRowsHtml(table));

  // A value as JSON for an inline data attribute or script.
  eleventyConfig.addFilter("toJson", (value: never) => JSON.stringify(value));

  // The relative path from a page to the site root ("./", "../../"), for <body data-root> (finder links).
  eleventyConfig.addFilter("rootPath", (pageUrl: string) => relativeUrl("/index.html", pageUrl).replace(/index\.html$/, "") || "./");
  // assets/search-index.js from the atlas (templates/search-index.njk).
  eleventyConfig.addFilter("searchIndexScript", (atlas: SearchSource) => searchIndexScript(searchData(atlas)));
}
