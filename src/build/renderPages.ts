/**
 * Species pages rendered outside Eleventy, with a standalone Nunjucks
 * environment over the same templates and filters. Why not Eleventy: its
 * pagination wants the whole list of pages up front and keeps every rendered
 * page until the write ends, so a large data set's pages would all sit in
 * memory; here a page is rendered, written and dropped (see DEVELOPERS.md).
 * The site-wide pages still go through Eleventy, from a small summary.
 */
import nunjucks from "nunjucks";
import { join } from "node:path";
import { atlasFilters } from "../site/filters.js";
import { rewriteRootLinks } from "../site/rewriteRootLinks.js";
import { ROOT } from "./paths.js";

export type RenderPage = (template: string, pageUrl: string, context: Record<string, unknown>) => string;

/** A renderer for templates under templates/_includes/ ("species/overview.njk"); links made relative to `pageUrl`. */
export function pageRenderer(): RenderPage {
  const env = new nunjucks.Environment(new nunjucks.FileSystemLoader(join(ROOT, "templates/_includes")), {
    autoescape: true,
    throwOnUndefined: false,
  });
  for (const [name, fn] of Object.entries(atlasFilters)) env.addFilter(name, fn as (...args: unknown[]) => unknown);
  return (template, pageUrl, context) => rewriteRootLinks(env.render(template, { ...context, page: { url: pageUrl } }), pageUrl);
}
