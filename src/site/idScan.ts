/**
 * The ids of an HTML page, read from the generated markup rather than from
 * the table models, so every table on every page (whoever builds it) is
 * covered without coupling. A small tokenizer, not a full HTML parser: it
 * skips comments, raw-text elements (script, style) and quoted attribute
 * values, and decodes the character references our templates produce.
 */

const NAMED: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", nbsp: "\u00a0", AMP: "&", LT: "<", GT: ">", QUOT: '"' };

/** Decode character references in an attribute value: &amp; &#39; &#x2F; … */
export function decodeAttribute(value: string): string {
  if (value.indexOf("&") < 0) return value;
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

/** Elements whose content is text up to their end tag, never markup. */
const RAW_TEXT = new Set(["script", "style", "textarea", "title"]);

const LT = 60, GT = 62, SLASH = 47, EQ = 61, BANG = 33, QMARK = 63, DQ = 34, SQ = 39;
const isSpace = (c: number) => c === 32 || c === 9 || c === 10 || c === 12 || c === 13;
const isLetter = (c: number) => (c >= 65 && c <= 90) || (c >= 97 && c <= 122);

/**
 * Called per attribute: tag name (lower case), attribute name as written,
 * and the raw value as [start, end) offsets into the page (start = end for
 * a bare attribute). Returns nothing; the scanner never builds the values
 * itself, so a caller that wants one attribute pays for that one only.
 */
type AttrVisitor = (tag: string, name: string, start: number, end: number) => void;

/**
 * One pass over a page, in document order: every start tag's attributes go
 * to `visit`, and `onTag` hears of each start tag after its attributes.
 * Linear: each character is looked at a bounded number of times (no
 * per-tag regular expressions, no copies of the page). Comments, "<!…>" and
 * "<?…>", end tags and the content of raw-text elements are skipped; quotes
 * are honoured, so a "<" or ">" inside an attribute value is text.
 */
function scan(html: string, visit: AttrVisitor, onTag?: (tag: string) => void): void {
  const n = html.length;
  let i = 0;
  while (i < n) {
    const lt = html.indexOf("<", i);
    if (lt < 0 || lt + 1 >= n) return;
    const c1 = html.charCodeAt(lt + 1);
    if (c1 === BANG || c1 === QMARK) {
      if (html.startsWith("<!--", lt)) {
        const end = html.indexOf("-->", lt + 4);
        i = end < 0 ? n : end + 3;
      } else {
        const end = html.indexOf(">", lt + 2);
        i = end < 0 ? n : end + 1;
      }
      continue;
    }
    const endTag = c1 === SLASH;
    const nameAt = endTag ? lt + 2 : lt + 1;
    if (nameAt >= n || !isLetter(html.charCodeAt(nameAt))) {
      i = lt + 1;
      continue;
    }
    let j = nameAt + 1;
    while (j < n) {
      const c = html.charCodeAt(j);
      if (isSpace(c) || c === SLASH || c === GT) break;
      j++;
    }
    const name = html.slice(nameAt, j).toLowerCase();
    // Attributes up to the closing ">".
    for (;;) {
      let c = html.charCodeAt(j);
      while (j < n && (isSpace(c) || c === SLASH)) c = html.charCodeAt(++j);
      if (j >= n || c === GT) break;
      const an = j;
      j++; // a name may start with "=" (HTML tokenizer rule)
      while (j < n) {
        c = html.charCodeAt(j);
        if (isSpace(c) || c === SLASH || c === GT || c === EQ) break;
        j++;
      }
      const attrName = html.slice(an, j);
      let k = j;
      while (k < n && isSpace(html.charCodeAt(k))) k++;
      if (html.charCodeAt(k) !== EQ) {
        if (!endTag) visit(name, attrName, j, j);
        continue;
      }
      k++;
      while (k < n && isSpace(html.charCodeAt(k))) k++;
      const q = html.charCodeAt(k);
      let start: number, stop: number;
      if (q === DQ || q === SQ) {
        const end = html.indexOf(q === DQ ? '"' : "'", k + 1);
        start = k + 1;
        stop = end < 0 ? n : end;
        j = stop + 1;
      } else {
        start = k;
        j = k;
        while (j < n) {
          c = html.charCodeAt(j);
          if (isSpace(c) || c === GT) break;
          j++;
        }
        stop = j;
      }
      if (!endTag) visit(name, attrName, start, stop);
    }
    i = j + 1;
    if (endTag) continue;
    onTag?.(name);
    if (RAW_TEXT.has(name)) i = rawTextEnd(html, name, i);
  }
}

/** Where the end tag of a raw-text element starts ("</script" in any case), or the page's end. */
function rawTextEnd(html: string, name: string, from: number): number {
  let at = from;
  for (;;) {
    const close = html.indexOf("</", at);
    if (close < 0) return html.length;
    if (html.slice(close + 2, close + 2 + name.length).toLowerCase() === name) {
      const after = html.charCodeAt(close + 2 + name.length);
      if (Number.isNaN(after) || isSpace(after) || after === SLASH || after === GT) return close;
    }
    at = close + 2;
  }
}

/** Every start tag of a page, in document order. */
export function startTags(html: string): StartTag[] {
  const tags: StartTag[] = [];
  let attrs = new Map<string, string>();
  scan(
    html,
    (_tag, name, start, end) => {
      const key = name.toLowerCase();
      if (!attrs.has(key)) attrs.set(key, decodeAttribute(html.slice(start, end)));
    },
    (tag) => {
      tags.push({ name: tag, attrs });
      attrs = new Map();
    },
  );
  return tags;
}

/**
 * Every id of a page, in document order, repeats kept: the first id
 * attribute of each start tag (a browser ignores a second one), decoded.
 */
export function pageIds(html: string): string[] {
  const ids: string[] = [];
  let seenId = false;
  scan(
    html,
    (_tag, name, start, end) => {
      if (seenId || name.length !== 2 || name.toLowerCase() !== "id") return;
      seenId = true;
      ids.push(decodeAttribute(html.slice(start, end)));
    },
    () => {
      seenId = false;
    },
  );
  return ids;
}

/** The id attributes of a page, sorted by code point, without repeats. */
export function scanIds(html: string): string[] {
  const ids = new Set<string>();
  for (const id of pageIds(html)) if (id !== "") ids.add(id);
  return [...ids].sort(byCodePoint);
}

/** Locale-free ordering, so the manifest is byte-identical on every machine. */
export function byCodePoint(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
