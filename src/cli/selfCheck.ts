/**
 * Checks run on every staged build before it is published. Each returns
 * human-readable problems; an empty list means the build may go live.
 */
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import type { Atlas } from "../site/atlas.js";

export function selfCheck(staging: string, atlas: Atlas): string[] {
  const problems: string[] = [];
  for (const s of atlas.species) {
    const path = join(staging, s.exportUrl);
    if (!existsSync(path)) {
      problems.push(`missing export ${s.exportUrl}`);
      continue;
    }
    try {
      JSON.parse(readFileSync(path, "utf8"));
    } catch {
      problems.push(`export ${s.exportUrl} is not valid JSON`);
    }
  }
  return problems;
}
