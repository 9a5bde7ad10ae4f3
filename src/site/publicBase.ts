/**
 * The public address of the site root, for what leaves the site (printed
 * bench sheets): site.yaml's `siteUrl` (the host, optionally with a path)
 * joined with its `pathPrefix` (where the site sits on that host). Links
 * inside the site never need it: they are relative (see relativeUrl.ts).
 *
 * Examples: ("https://lab.example", "/atlas/") → "https://lab.example/atlas/";
 * ("https://lab.example/atlas/", "/atlas/") → the same (the prefix is not repeated);
 * ("https://lab.example/wiki/atlas/", "/") → unchanged.
 */
export function publicBase(siteUrl: string | null, pathPrefix: string): string | null {
  if (siteUrl === null) return null;
  const base = new URL(siteUrl);
  if (!base.pathname.endsWith("/")) base.pathname += "/";
  if (pathPrefix !== "/" && !base.pathname.endsWith(pathPrefix)) base.pathname = base.pathname.replace(/\/$/, "") + pathPrefix;
  return base.toString();
}
