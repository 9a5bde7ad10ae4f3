/**
 * The bytes of a data folder as one read saw them, taken before the loader
 * validates the folder. Worker threads parse a species from these bytes
 * (not from the disk again) and the cache is keyed by them, so what is
 * built and cached is what was validated, even if a file is saved while
 * the build runs (as it is under `npm run serve`).
 *
 * The snapshot hashes every file the way `dataVersion` in
 * src/data/loadDataFolder.ts does (test/build/dataSnapshot.test.ts holds
 * the two together). The loader computes its version after validating; if
 * it equals the snapshot's, nothing changed from before the validation to
 * after it, so the snapshot holds the validated bytes.
 */
import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { allFiles, loadDataFolder } from "../data/loadDataFolder.js";
import type { DataFolder } from "../data/model.js";
import { MAX_FILE_BYTES } from "../data/yamlExact.js";

export interface DataSnapshot {
  /** Same value as the loader's dataVersion for unchanged files. */
  version: string;
  /** Bytes of every file below species/ no larger than the loader accepts, by path relative to the folder ("species/rb87.yaml"). */
  species: Map<string, Buffer>;
}

/** Read the folder once; null when it cannot be read (the loader then says why). */
export function snapshotData(dir: string): DataSnapshot | null {
  try {
    const h = createHash("sha256");
    const species = new Map<string, Buffer>();
    for (const rel of allFiles(dir)) {
      const bytes = readFileSync(join(dir, rel));
      h.update(rel, "utf8");
      h.update("\0");
      h.update(String(bytes.length));
      h.update("\0");
      h.update(bytes);
      if (rel.startsWith("species/") && bytes.length <= MAX_FILE_BYTES) species.set(rel, bytes);
    }
    return { version: h.digest("hex").slice(0, 12), species };
  } catch {
    return null;
  }
}

/**
 * Load and validate the folder (throws InputProblems as loadDataFolder
 * does) together with a snapshot of the same bytes. A folder saved while
 * it is read is read again, a few times, before the build gives up.
 */
export function loadWithSnapshot(dir: string, tries = 3): { folder: DataFolder; snapshot: DataSnapshot } {
  for (let i = 0; i < tries; i++) {
    const snapshot = snapshotData(dir);
    const folder = loadDataFolder(dir);
    if (snapshot && snapshot.version === folder.dataVersion) return { folder, snapshot };
  }
  throw new Error(`the data folder ${dir} changed while it was read, ${tries} times; build again once it is saved`);
}
