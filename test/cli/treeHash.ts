/** A digest of a folder: every file's relative path and bytes, and every folder's path, in sorted order. */
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

export function treeHash(root: string): string {
  const h = createHash("sha256");
  if (!existsSync(root)) return "absent";
  const walk = (rel: string): void => {
    const entries = readdirSync(join(root, rel), { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
    for (const e of entries) {
      const p = rel ? `${rel}/${e.name}` : e.name;
      if (e.isDirectory()) {
        h.update(`d\0${p}\0`);
        walk(p);
      } else {
        const bytes = readFileSync(join(root, p));
        h.update(`f\0${p}\0${bytes.length}\0`);
        h.update(bytes);
      }
    }
  };
  walk("");
  return h.digest("hex");
}

/** Every file of a folder (relative path → bytes), for comparing two trees with a readable failure. */
export function treeFiles(root: string): Map<string, Buffer> {
  const out = new Map<string, Buffer>();
  const walk = (rel: string): void => {
    for (const e of readdirSync(join(root, rel), { withFileTypes: true })) {
      const p = rel ? `${rel}/${e.name}` : e.name;
      if (e.isDirectory()) walk(p);
      else out.set(p, readFileSync(join(root, p)));
    }
  };
  walk("");
  return out;
}
