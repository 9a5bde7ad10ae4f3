/**
 * Forwarding of moved anchors. A link a lab saved (species/rb87/index.html
 * #rf:5s-S1/2:…) keeps landing after rows move to pages of their own: each
 * page that has pages below it (the species overview; a line page whose
 * fields have their own pages) gets a map from every id of those pages that
 * it does not hold itself to the page that does. The map is a classic
 * script beside the page (MOVED_FILE), loaded by assets/forward.js only when
 * the address names an id the page lacks, so it costs a normal visit
 * nothing. The same maps go into anchors.json as "forwards".
 */
import { byCodePoint } from "../site/idScan.js";

export const MOVED_FILE = "moved-anchors.js";
const PREFIX = "window.SublevelAtlasMoved = ";

/** Pages relative to the forwarding page's folder, and each moved id → index into them. */
export interface MovedMap {
  pages: string[];
  ids: Record<string, number>;
  /** Ids whose form changed as well as their page: old id → [index into pages, the id there]. */
  renamed?: Record<string, [number, string]>;
}

/** An id this page once had in another form: where its element is now. */
export interface AnchorAlias {
  id: string;
  /** Folder of the page that has the element. */
  path: string;
  target: string;
}

export interface PageIds {
  /** Folder of the page relative to the site root, ending in "/" ("species/rb87/level/5s-S1_2/"). */
  path: string;
  ids: readonly string[];
}

/**
 * The map of `page`: ids of the pages below it that it lacks, each sent to
 * the first page (by path) that has it. Null when there is nothing to send.
 */
export function movedMap(page: PageIds, all: readonly PageIds[], aliases: readonly AnchorAlias[] = []): MovedMap | null {
  const own = new Set(page.ids);
  const below = all.filter((p) => p.path !== page.path && p.path.startsWith(page.path)).sort((a, b) => byCodePoint(a.path, b.path));
  const pages: string[] = [];
  const ids: Record<string, number> = {};
  for (const p of below) {
    let index = -1;
    for (const id of p.ids) {
      if (own.has(id) || id in ids) continue;
      if (index < 0) index = pages.push(`${p.path.slice(page.path.length)}index.html`) - 1;
      ids[id] = index;
    }
  }
  const renamed: Record<string, [number, string]> = {};
  for (const a of [...aliases].sort((x, y) => byCodePoint(x.id, y.id))) {
    if (own.has(a.id) || a.id in ids || !a.path.startsWith(page.path) || a.path === page.path) continue;
    const file = `${a.path.slice(page.path.length)}index.html`;
    let k = pages.indexOf(file);
    if (k < 0) k = pages.push(file) - 1;
    renamed[a.id] = [k, a.target];
  }
  if (pages.length === 0) return null;
  const sorted: Record<string, number> = {};
  for (const id of Object.keys(ids).sort(byCodePoint)) sorted[id] = ids[id]!;
  return Object.keys(renamed).length ? { pages, ids: sorted, renamed } : { pages, ids: sorted };
}

/** Does `page` have pages below it (and so, possibly, a map)? */
export const hasPagesBelow = (page: string, all: readonly string[]): boolean => all.some((p) => p !== page && p.startsWith(page));

/** The map as the classic script assets/forward.js loads. */
export function movedScript(map: MovedMap): string {
  return `${PREFIX}${JSON.stringify(map)};\n`;
}

/** Read a map back from its script (for anchors.json and tests). */
export function parseMovedScript(text: string): MovedMap {
  if (!text.startsWith(PREFIX)) throw new Error("not a moved-anchors script");
  return JSON.parse(text.slice(PREFIX.length).replace(/;\s*$/, "")) as MovedMap;
}
