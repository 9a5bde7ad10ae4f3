/**
 * The ids of an HTML page, read from the generated markup rather than from
 * the table models, so every table on every page (whoever builds it) is
 * covered without coupling. A small tokenizer, not a full HTML parser: it
 * skips comments, raw-text elements (script, style) and quoted attribute
 * values, and decodes the character references our templates produce.
 */

const NAMED: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", nbsp: "\u00a0" };

/** Decode character references in an attribute value: &amp; &#39; &#x2F; … */
export function decodeAttribute(value: string): string {
  return value.replace(/&(#[xX][0-9a-fA-F]+|#\d+|[a-zA-Z]+);/g, (all, ref: string) => {
    if (ref[0] === "#") {
      const code = ref[1] === "x" || ref[1] === "X" ? parseInt(ref.slice(2), 16) : parseInt(ref.slice(1), 10);
      return Number.isFinite(code) && code <= 0x10ffff ? String.fromCodePoint(code) : all;
    }
    return NAMED[ref] ?? all;
  });
}

export interface StartTag {
  name: string;
  /** Attribute names lower-cased; values decoded; a bare attribute has value "". */
  attrs: Map<string, string>;
}

const RAW_TEXT = new Set(["script", "style"]);

/** Every start tag of a page, in document order. */
export function startTags(html: string): StartTag[] {
  const tags: StartTag[] = [];
  let i = 0;
  const n = html.length;
  while (i < n) {
    const lt = html.indexOf("<", i);
    if (lt < 0) break;
    if (html.startsWith("<!--", lt)) {
      const end = html.indexOf("-->", lt + 4);
      i = end < 0 ? n : end + 3;
      continue;
    }
    const nameMatch = /^<([a-zA-Z][a-zA-Z0-9:-]*)/.exec(html.slice(lt, lt + 64));
    if (!nameMatch) {
      i = lt + 1;
      continue;
    }
    const name = nameMatch[1]!.toLowerCase();
    let j = lt + nameMatch[0].length;
    const attrs = new Map<string, string>();
    // Attributes up to the closing ">", honouring quotes.
    for (;;) {
      while (j < n && /[\s/]/.test(html[j]!)) j++;
      if (j >= n || html[j] === ">") break;
      const an = /^[^\s"'>/=]+/.exec(html.slice(j, j + 256));
      if (!an) {
        j++;
        continue;
      }
      const attrName = an[0].toLowerCase();
      j += an[0].length;
      while (j < n && /\s/.test(html[j]!)) j++;
      let value = "";
      if (html[j] === "=") {
        j++;
        while (j < n && /\s/.test(html[j]!)) j++;
        const q = html[j];
        if (q === '"' || q === "'") {
          const end = html.indexOf(q, j + 1);
          const stop = end < 0 ? n : end;
          value = html.slice(j + 1, stop);
          j = stop + 1;
        } else {
          const un = /^[^\s>]*/.exec(html.slice(j))!;
          value = un[0];
          j += un[0].length;
        }
      }
      if (!attrs.has(attrName)) attrs.set(attrName, decodeAttribute(value));
    }
    tags.push({ name, attrs });
    i = j + 1;
    if (RAW_TEXT.has(name)) {
      const close = html.toLowerCase().indexOf(`</${name}`, i);
      i = close < 0 ? n : close;
    }
  }
  return tags;
}

/** The id attributes of a page, sorted by code point, without repeats. */
export function scanIds(html: string): string[] {
  const ids = new Set<string>();
  for (const t of startTags(html)) {
    const id = t.attrs.get("id");
    if (id !== undefined && id !== "") ids.add(id);
  }
  return [...ids].sort(byCodePoint);
}

/** Locale-free ordering, so the manifest is byte-identical on every machine. */
export function byCodePoint(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

export const ANCHORS_FORMAT = "sublevel-atlas/anchors@1";

export interface AnchorsManifest {
  format: typeof ANCHORS_FORMAT;
  /** Page path relative to the site root (e.g. "species/rb87/index.html") → its ids, sorted. */
  pages: Record<string, string[]>;
}

/** The manifest of a set of pages (path → HTML), pages and ids sorted. */
export function anchorsManifest(pages: Iterable<[path: string, html: string]>): AnchorsManifest {
  const entries = [...pages].map(([path, html]) => [path, scanIds(html)] as const).sort((a, b) => byCodePoint(a[0], b[0]));
  return { format: ANCHORS_FORMAT, pages: Object.fromEntries(entries) };
}

/** The manifest as file text: two-space JSON with a final newline. */
export function manifestText(m: AnchorsManifest): string {
  return JSON.stringify(m, null, 2) + "\n";
}

/** Every page#anchor of `before` that `after` lacks, sorted; a vanished page loses all its anchors. */
export function lostAnchors(before: AnchorsManifest, after: AnchorsManifest): { page: string; anchor: string; pageGone: boolean }[] {
  const lost: { page: string; anchor: string; pageGone: boolean }[] = [];
  for (const page of Object.keys(before.pages).sort(byCodePoint)) {
    const now = after.pages[page];
    const have = new Set(now ?? []);
    for (const anchor of before.pages[page] ?? []) {
      if (!have.has(anchor)) lost.push({ page, anchor, pageGone: now === undefined });
    }
  }
  return lost;
}

/** Read a manifest from parsed JSON, or say why it is not one. */
export function parseManifest(value: unknown): AnchorsManifest | string {
  if (typeof value !== "object" || value === null) return "not a JSON object";
  const v = value as { format?: unknown; pages?: unknown };
  if (v.format !== ANCHORS_FORMAT) return `format is ${JSON.stringify(v.format)}, expected "${ANCHORS_FORMAT}"`;
  if (typeof v.pages !== "object" || v.pages === null || Array.isArray(v.pages)) return `"pages" is not an object`;
  for (const [page, ids] of Object.entries(v.pages)) {
    if (!Array.isArray(ids) || !ids.every((x) => typeof x === "string")) return `"pages" entry ${JSON.stringify(page)} is not a list of strings`;
  }
  return v as AnchorsManifest;
}
