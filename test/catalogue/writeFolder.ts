/** Write a FileMap into a fresh temporary data folder; returns its path. */
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import type { FileMap } from "./validData.js";

export function writeFolder(files: FileMap, parent = tmpdir()): string {
  const dir = mkdtempSync(join(parent, "atlas-data-"));
  for (const [rel, content] of Object.entries(files)) {
    const abs = join(dir, rel);
    mkdirSync(dirname(abs), { recursive: true });
    writeFileSync(abs, content);
  }
  return dir;
}
