/**
 * `npm run check-links -- <previous anchors.json> [<current anchors.json>]`
 *
 * Lists every page#anchor that the previous build had and the current one
 * (default _site/anchors.json) has not: links that labs may have saved in
 * procedures and that would now land on the top of a page, or nowhere.
 * Exit codes: 0 nothing lost; 1 anchors lost; 2 wrong arguments or a file
 * that is not an anchors manifest.
 */
import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { compareManifests, parseManifest, type AnchorsManifest } from "../build/anchorsManifest.js";

function load(path: string): AnchorsManifest | string {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch (e) {
    return `cannot read ${path}: ${e instanceof Error ? e.message : String(e)}`;
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return `${path} is not JSON`;
  }
  const m = parseManifest(json);
  return typeof m === "string" ? `${path} is not an anchors manifest: ${m}` : m;
}

/**
 * The report and exit code for two manifests; separate from main() so tests
 * need no process. Moved anchors (forwarded to another page that has them)
 * are listed apart and do not fail; lost ones do.
 */
export function checkLinks(beforePath: string, afterPath: string): { code: number; out: string; err: string } {
  const before = load(beforePath);
  if (typeof before === "string") return { code: 2, out: "", err: before + "\n" };
  const after = load(afterPath);
  if (typeof after === "string") return { code: 2, out: "", err: after + "\n" };
  const { moved, lost } = compareManifests(before, after);
  const pagesBefore = Object.keys(before.pages).length;
  const anchorsBefore = Object.values(before.pages).reduce((n, ids) => n + ids.length, 0);
  const stayed = anchorsBefore - moved.length - lost.length;
  const out: string[] = [];
  out.push(`check-links: of ${anchorsBefore} anchors on ${pagesBefore} pages of ${beforePath}, ${stayed} are where they were in ${afterPath}, ${moved.length} moved and are forwarded, ${lost.length} lost`);
  if (moved.length > 0) {
    out.push(`moved (a link to the old place is forwarded on load):`);
    for (const m of moved) out.push(`  ${m.page}#${m.anchor} -> ${m.to}`);
  }
  if (lost.length === 0) return { code: 0, out: out.join("\n") + "\n", err: "" };
  const gonePages = [...new Set(lost.filter((l) => l.pageGone).map((l) => l.page))];
  const lines = lost.map((l) => `  ${l.page}#${l.anchor}${l.pageGone ? "   (page gone)" : ""}`);
  const summary =
    `check-links: ${lost.length} of ${anchorsBefore} anchors of ${beforePath} are gone in ${afterPath}` +
    (gonePages.length ? ` (${gonePages.length} page(s) gone entirely)` : "") +
    `; links to them will no longer land on their row:`;
  return { code: 1, out: out.join("\n") + "\n", err: [summary, ...lines, ""].join("\n") };
}

function main(argv: string[]): number {
  const args = argv.filter((a) => a !== "--");
  if (args.length < 1 || args.length > 2 || args.some((a) => a === "-h" || a === "--help")) {
    process.stderr.write("usage: npm run check-links -- <previous anchors.json> [<current anchors.json, default _site/anchors.json>]\n");
    return 2;
  }
  const r = checkLinks(args[0]!, args[1] ?? "_site/anchors.json");
  process.stdout.write(r.out);
  process.stderr.write(r.err);
  return r.code;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) process.exitCode = main(process.argv.slice(2));
