/**
 * Every id (link anchor) on a page is unique: a repeated id makes a saved
 * link land on the wrong row. Read from the generated HTML, skipping
 * comments and the contents of script and style elements.
 */

import { pageIds } from "../site/idScan.js";

/** Every id attribute value of the page, in document order, repeats kept (the site's one id scanner). */
export { pageIds };

export function checkUniqueAnchors(html: string, page: string): string[] {
  const seen = new Set<string>();
  const repeated = new Set<string>();
  for (const id of pageIds(html)) {
    if (id === "") continue;
    if (seen.has(id)) repeated.add(id);
    seen.add(id);
  }
  return [...repeated].map((id) => `${page}: id ${JSON.stringify(id)} appears more than once`);
}
