/**
 * Checks run on every staged build before it is published (see
 * src/checks/). Each returns human-readable problems; an empty list means
 * the build may go live. They read the staged files, not the models the
 * pages were made from, so what is checked is what would be published.
 */
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { checkExportSchema } from "../checks/exportSchema.js";
import { checkFiniteNumbers } from "../checks/finiteNumbers.js";
import { checkLineReferences } from "../checks/lineReferences.js";
import { checkPageBudget } from "../checks/pageBudget.js";
import { checkStrengthSums } from "../checks/strengthSums.js";
import { checkUniqueAnchors } from "../checks/uniqueAnchors.js";
import type { SiteSummary } from "../site/siteSummary.js";
import { htmlFiles } from "./anchors.js";

/** Every check of one parsed export. */
export function checkExport(value: unknown, file: string): string[] {
  return [
    ...checkExportSchema(value, file),
    ...checkStrengthSums(value, file),
    ...checkFiniteNumbers(value, file),
    ...checkLineReferences(value, file),
  ];
}

export function selfCheck(staging: string, atlas: Pick<SiteSummary, "species">): string[] {
  const problems: string[] = [];
  for (const s of atlas.species) {
    const path = join(staging, s.exportUrl);
    if (!existsSync(path)) {
      problems.push(`missing export ${s.exportUrl}`);
      continue;
    }
    let value: unknown;
    try {
      value = JSON.parse(readFileSync(path, "utf8"));
    } catch {
      problems.push(`export ${s.exportUrl} is not valid JSON`);
      continue;
    }
    problems.push(...checkExport(value, s.exportUrl));
  }
  const pages = htmlFiles(staging).sort();
  if (pages.length === 0) problems.push("no HTML pages were written");
  for (const page of pages) {
    const bytes = readFileSync(join(staging, page));
    problems.push(...checkPageBudget(page, bytes.length), ...checkUniqueAnchors(bytes.toString("utf8"), page));
  }
  return problems;
}
