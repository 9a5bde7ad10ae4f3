/**
 * Page weight: no HTML page above 500 kB, and a species overview (the page
 * a reader opens first) under 250 kB, on any data set. The build splits
 * pages to stay inside (src/build/speciesBuild.ts); this check holds it to
 * that on what would be published.
 */

export const PAGE_BUDGET = 500_000;
export const OVERVIEW_BUDGET = 250_000;

/** A species overview: species/<id>/index.html. */
const OVERVIEW = /^species\/[^/]+\/index\.html$/;

export function checkPageBudget(page: string, bytes: number): string[] {
  if (OVERVIEW.test(page) && bytes >= OVERVIEW_BUDGET) return [`${page}: ${bytes} bytes, over the ${OVERVIEW_BUDGET}-byte budget of a species overview`];
  if (bytes > PAGE_BUDGET) return [`${page}: ${bytes} bytes, over the ${PAGE_BUDGET}-byte budget of a page`];
  return [];
}
