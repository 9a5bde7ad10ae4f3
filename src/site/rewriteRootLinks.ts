/**
 * Every site-root link of a rendered page made relative to the page (see
 * relativeUrl.ts), as a plain string pass instead of an HTML parse.
 *
 * Exact for our output, not for HTML in general: our templates write every
 * href and src in double quotes, and Nunjucks autoescaping turns a '"' in
 * any data string into &quot;, so `href="` can only start an attribute
 * value and the value ends at the next '"'. Inline SVG plots are written by
 * src/site/plots/ under the same rule. Only values starting with "/" are
 * touched; relativeUrl leaves "//host" unchanged, and "#frag", "https:" and
 * "mailto:" do not match at all.
 */
import { relativeUrl } from "./relativeUrl.js";

const ROOT_LINK = /(\s(?:href|src)=")(\/[^"]*)"/g;

export function rewriteRootLinks(html: string, pageUrl: string): string {
  return html.replace(ROOT_LINK, (_all, head: string, url: string) => `${head}${relativeUrl(url, pageUrl)}"`);
}
