/**
 * Site-root links ("/species/rb87/#line:D2") rewritten relative to the page
 * that holds them ("../rb87/index.html#line:D2"), with "index.html" spelled
 * out, so one _site/ works from any web server under any path prefix and
 * straight from disk (file://), where a directory URL shows a listing.
 * Links that are not site-root paths (fragments, "https:", "mailto:",
 * protocol-relative "//") are returned unchanged.
 */
export function relativeUrl(target: string, pageUrl: string): string {
  if (!target.startsWith("/") || target.startsWith("//")) return target;
  const hashAt = target.indexOf("#");
  const path = hashAt >= 0 ? target.slice(0, hashAt) : target;
  const hash = hashAt >= 0 ? target.slice(hashAt) : "";
  const from = pageUrl.endsWith("/") ? pageUrl : pageUrl.slice(0, pageUrl.lastIndexOf("/") + 1);
  const fromParts = from.split("/").filter(Boolean);
  const file = path.endsWith("/") ? path + "index.html" : path;
  const toParts = file.split("/").filter(Boolean);
  let common = 0;
  while (common < fromParts.length && common < toParts.length - 1 && fromParts[common] === toParts[common]) common++;
  const up = fromParts.length - common;
  const rel = [...Array(up).fill(".."), ...toParts.slice(common)].join("/");
  return (rel || "index.html") + hash;
}
