/**
 * The anchors manifest (`anchors.json`): every page of a build with every id
 * on it, and the forwards, that is, the ids a page once held that now live
 * on another page (see forwarding.ts). A lab keeps the manifest of a
 * published build; `npm run check-links` compares the next build with it.
 *
 * Format 2 ("sublevel-atlas/anchors@2") adds `forwards`; format 1 manifests
 * (pages only) are still read, as the "before" side of a comparison.
 *
 *   { "format": "sublevel-atlas/anchors@2",
 *     "pages": { "species/rb87/index.html": ["level:5s-S1/2", …], … },
 *     "forwards": { "species/rb87/index.html": { "rf:5s-S1/2:…": "species/rb87/level/5s-S1_2/index.html" } } }
 */
import { byCodePoint } from "../site/idScan.js";

export const ANCHORS_FORMAT = "sublevel-atlas/anchors@2";
const FORMAT_1 = "sublevel-atlas/anchors@1";

export interface AnchorsManifest {
  format: string;
  /** Page path relative to the site root (e.g. "species/rb87/index.html") → its ids, sorted. */
  pages: Record<string, string[]>;
  /** Page path → id that moved → the page (site-root path) that holds it now, or "page#id" when its form changed too. */
  forwards: Record<string, Record<string, string>>;
}

/** Read a manifest from parsed JSON, or say why it is not one. */
export function parseManifest(value: unknown): AnchorsManifest | string {
  if (typeof value !== "object" || value === null) return "not a JSON object";
  const v = value as { format?: unknown; pages?: unknown; forwards?: unknown };
  if (v.format !== ANCHORS_FORMAT && v.format !== FORMAT_1) return `format is ${JSON.stringify(v.format)}, expected "${ANCHORS_FORMAT}"`;
  if (typeof v.pages !== "object" || v.pages === null || Array.isArray(v.pages)) return `"pages" is not an object`;
  for (const [page, ids] of Object.entries(v.pages)) {
    if (!Array.isArray(ids) || !ids.every((x) => typeof x === "string")) return `"pages" entry ${JSON.stringify(page)} is not a list of strings`;
  }
  const forwards = v.forwards ?? {};
  if (typeof forwards !== "object" || forwards === null || Array.isArray(forwards)) return `"forwards" is not an object`;
  for (const [page, map] of Object.entries(forwards)) {
    if (typeof map !== "object" || map === null || Array.isArray(map) || !Object.values(map).every((x) => typeof x === "string")) {
      return `"forwards" entry ${JSON.stringify(page)} is not a map of ids to pages`;
    }
  }
  return { format: v.format, pages: v.pages as Record<string, string[]>, forwards: forwards as Record<string, Record<string, string>> };
}

export interface AnchorFate {
  page: string;
  anchor: string;
  /** Where a moved anchor lands now (page#anchor); absent for a lost one. */
  to?: string;
  /** The page itself is gone (lost anchors only). */
  pageGone?: boolean;
}

/**
 * Every page#anchor of `before` that `after` no longer has on the same page:
 * moved (a forward of `after` sends it to a page that has the id) or lost.
 * Both lists sorted by page, then as in `before`.
 */
export function compareManifests(before: AnchorsManifest, after: AnchorsManifest): { moved: AnchorFate[]; lost: AnchorFate[] } {
  const moved: AnchorFate[] = [];
  const lost: AnchorFate[] = [];
  const idsOf = new Map<string, Set<string>>();
  const has = (page: string, id: string): boolean => {
    let set = idsOf.get(page);
    if (!set) {
      const list = after.pages[page];
      if (!list) return false;
      idsOf.set(page, (set = new Set(list)));
    }
    return set.has(id);
  };
  for (const page of Object.keys(before.pages).sort(byCodePoint)) {
    for (const anchor of before.pages[page] ?? []) {
      if (has(page, anchor)) continue;
      const target = after.forwards[page]?.[anchor];
      const [toPage, toId] = target === undefined ? [undefined, anchor] : target.includes("#") ? [target.slice(0, target.indexOf("#")), target.slice(target.indexOf("#") + 1)] : [target, anchor];
      if (toPage !== undefined && has(toPage, toId)) moved.push({ page, anchor, to: `${toPage}#${toId}` });
      else lost.push({ page, anchor, pageGone: after.pages[page] === undefined });
    }
  }
  return { moved, lost };
}
