/**
 * The Eleventy plugin of Sublevel Atlas: every filter, transform and
 * passthrough copy the site-wide pages rely on, registered in one place.
 * Species pages are rendered outside Eleventy with the same filters
 * (src/build/renderPages.ts).
 */
import { rewriteRootLinks } from "./rewriteRootLinks.js";
import { atlasFilters } from "./filters.js";

// Eleventy's UserConfig has no published types; the few methods used here are typed locally.
interface EleventyConfigLike {
  addFilter(name: string, fn: (...args: never[]) => unknown): void;
  addPassthroughCopy(map: Record<string, string>): void;
  addTransform(name: string, fn: (this: { page?: { url?: string | false; outputPath?: string | false } }, content: string) => string): void;
}

export function atlasPlugin(eleventyConfig: EleventyConfigLike): void {
  // Static assets and the published input schemas.
  eleventyConfig.addPassthroughCopy({ "templates/assets": "assets", schema: "schema" });
  // The page scripts (finder with its search library, tables, units, …) are bundled by src/build/bundleBrowser.ts.

  // Every site-root link becomes relative to its page (works from file:// and under any prefix).
  // A string pass (rewriteRootLinks.ts) rather than Eleventy's HTML-parsing URL transform.
  eleventyConfig.addTransform("atlas-relative-links", function (content: string) {
    const out = this.page?.outputPath;
    if (typeof out !== "string" || !out.endsWith(".html")) return content;
    const url = this.page?.url;
    return rewriteRootLinks(content, typeof url === "string" ? url : "/");
  });

  for (const [name, fn] of Object.entries(atlasFilters)) eleventyConfig.addFilter(name, fn as (...args: never[]) => unknown);
}
