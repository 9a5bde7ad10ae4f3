/**
 * Writes `anchors.json` into a built site: every HTML page (path relative to
 * the site root) with every id on it, read from the generated markup. The
 * next build's manifest is compared with this one by `npm run check-links`,
 * so a lab learns before publishing which of its saved links would break.
 */
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { anchorsManifest, manifestText, type AnchorsManifest } from "../site/idScan.js";

export const ANCHORS_FILE = "anchors.json";

/** HTML files under `root`, as site-root-relative paths with "/" separators. */
export function htmlFiles(root: string): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.isFile() && e.name.endsWith(".html")) out.push(relative(root, p).split(sep).join("/"));
    }
  };
  walk(root);
  return out;
}

/** Scan the pages of `siteDir` and write `siteDir/anchors.json`; returns the manifest. */
export function writeAnchors(siteDir: string): AnchorsManifest {
  // Pages read lazily, one at a time: a large site's HTML is never all in memory at once.
  function* pages(): Generator<[string, string]> {
    for (const p of htmlFiles(siteDir)) yield [p, readFileSync(join(siteDir, p), "utf8")];
  }
  const manifest = anchorsManifest(pages());
  writeFileSync(join(siteDir, ANCHORS_FILE), manifestText(manifest));
  return manifest;
}
