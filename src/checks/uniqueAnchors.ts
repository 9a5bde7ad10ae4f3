/**
 * Every id (link anchor) on a page is unique: a repeated id makes a saved
 * link land on the wrong row. Read from the generated HTML, skipping
 * comments and the contents of script and style elements.
 */

const NAMED: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'" };

function decode(v: string): string {
  return v.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (all, r: string) => {
    if (r[0] === "#") {
      const n = r[1] === "x" || r[1] === "X" ? parseInt(r.slice(2), 16) : parseInt(r.slice(1), 10);
      return n <= 0x10ffff ? String.fromCodePoint(n) : all;
    }
    return NAMED[r.toLowerCase()] ?? all;
  });
}

/** Every id attribute value of the page, in document order, repeats kept. */
export function pageIds(html: string): string[] {
  const text = html
    .replace(/<!--[\s\S]*?(-->|$)/g, "")
    .replace(/<(script|style)\b[^>]*>[\s\S]*?(<\/\1\s*>|$)/gi, "<$1>");
  const ids: string[] = [];
  // A start tag: its attributes, honouring quotes.
  for (const tag of text.matchAll(/<[a-zA-Z][a-zA-Z0-9-]*((?:\s+[^\s"'>/=]+(?:\s*=\s*(?:"[^"]*"|'[^']*'|[^\s"'>]+))?)*)\s*\/?>/g)) {
    for (const a of tag[1]!.matchAll(/\s([^\s"'>/=]+)(?:\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'>]+)))?/g)) {
      if (a[1]!.toLowerCase() === "id") ids.push(decode(a[2] ?? a[3] ?? a[4] ?? ""));
    }
  }
  return ids;
}

export function checkUniqueAnchors(html: string, page: string): string[] {
  const seen = new Set<string>();
  const repeated = new Set<string>();
  for (const id of pageIds(html)) {
    if (id === "") continue;
    if (seen.has(id)) repeated.add(id);
    seen.add(id);
  }
  return [...repeated].map((id) => `${page}: id ${JSON.stringify(id)} appears more than once`);
}
