/**
 * Writes `anchors.json` into a built site: every HTML page (path relative to
 * the site root) with every id on it, read from the generated markup, and
 * the forwards of moved ids (forwarding.ts), read from the maps beside the
 * pages. Written as a stream, one page at a time, so a large site's ids are
 * never all in memory at once. The next build's manifest is compared with
 * this one by `npm run check-links`.
 */
import { closeSync, existsSync, openSync, readdirSync, readFileSync, writeSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { byCodePoint, scanIds } from "../site/idScan.js";
import { ANCHORS_FORMAT } from "./anchorsManifest.js";
import { MOVED_FILE, parseMovedScript } from "./forwarding.js";

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

/** Scan the pages of `siteDir` and write `siteDir/anchors.json` (two-space JSON, pages and ids sorted by code point). */
export function writeAnchors(siteDir: string): { pages: number; anchors: number } {
  const pages = htmlFiles(siteDir).sort(byCodePoint);
  const fd = openSync(join(siteDir, ANCHORS_FILE), "w");
  let anchors = 0;
  try {
    const put = (s: string) => writeSync(fd, s);
    put(`{\n  "format": ${JSON.stringify(ANCHORS_FORMAT)},\n  "pages": {`);
    pages.forEach((p, i) => {
      const ids = scanIds(readFileSync(join(siteDir, p), "utf8"));
      anchors += ids.length;
      const list = ids.length === 0 ? "[]" : `[\n${ids.map((id) => `      ${JSON.stringify(id)}`).join(",\n")}\n    ]`;
      put(`${i === 0 ? "" : ","}\n    ${JSON.stringify(p)}: ${list}`);
    });
    put(`${pages.length ? "\n  " : ""}},\n  "forwards": {`);
    let first = true;
    for (const p of pages) {
      const folder = p.slice(0, p.length - "index.html".length);
      const file = join(siteDir, folder, MOVED_FILE);
      if (!p.endsWith("index.html") || !existsSync(file)) continue;
      const map = parseMovedScript(readFileSync(file, "utf8"));
      const entries = [
        ...Object.entries(map.ids).map(([id, k]) => [id, folder + map.pages[k]!] as const),
        ...Object.entries(map.renamed ?? {}).map(([id, [k, to]]) => [id, `${folder}${map.pages[k]!}#${to}`] as const),
      ]
        .sort((a, b) => byCodePoint(a[0], b[0]))
        .map(([id, to]) => `      ${JSON.stringify(id)}: ${JSON.stringify(to)}`);
      put(`${first ? "" : ","}\n    ${JSON.stringify(p)}: {\n${entries.join(",\n")}\n    }`);
      first = false;
    }
    put(`${first ? "" : "\n  "}}\n}\n`);
  } finally {
    closeSync(fd);
  }
  return { pages: pages.length, anchors };
}
