/**
 * A link checker over the demo build, written here with no dependency:
 * every href and src of every page resolves to a file of the build, and a
 * fragment names an id on the target page. No attribute points at another
 * host, and the Content-Security-Policy of each page allows only 'self'.
 */
import { existsSync, readFileSync, statSync } from "node:fs";
import { dirname, join, normalize, relative } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { htmlFiles } from "../../src/build/anchors.js";
import { scanIds, startTags } from "../../src/site/idScan.js";
import { demoSite } from "../support/runBuild.js";

let site: string;
let pages: string[];
const ids = new Map<string, Set<string>>();
const idsOf = (page: string): Set<string> => {
  let s = ids.get(page);
  if (!s) ids.set(page, (s = new Set(scanIds(readFileSync(join(site, page), "utf8")))));
  return s;
};

beforeAll(async () => {
  site = await demoSite();
  pages = htmlFiles(site);
}, 600_000);

const URL_ATTRS = ["href", "src", "action", "poster", "data"];

function links(html: string): { tag: string; attr: string; value: string }[] {
  const out: { tag: string; attr: string; value: string }[] = [];
  for (const t of startTags(html)) for (const a of URL_ATTRS) {
    const v = t.attrs.get(a);
    if (v !== undefined && !(t.name === "object" && a === "data")) out.push({ tag: t.name, attr: a, value: v });
  }
  return out;
}

describe("links of the demo build", () => {
  it("resolve to files of the build, and fragments to ids on the target page", () => {
    const broken: string[] = [];
    let checked = 0;
    let fragments = 0;
    for (const page of pages) {
      for (const l of links(readFileSync(join(site, page), "utf8"))) {
        if (/^[a-z][a-z0-9+.-]*:/i.test(l.value) || l.value.startsWith("//")) continue; // other schemes: see the next test
        checked++;
        const hashAt = l.value.indexOf("#");
        const path = decodeURIComponent(hashAt >= 0 ? l.value.slice(0, hashAt) : l.value).split("?")[0]!;
        const fragment = hashAt >= 0 ? decodeURIComponent(l.value.slice(hashAt + 1)) : "";
        let target = path === "" ? page : normalize(join(dirname(page), path));
        if (target.startsWith("..")) {
          broken.push(`${page}: ${l.attr}="${l.value}" leaves the site`);
          continue;
        }
        const file = join(site, target);
        if (existsSync(file) && statSync(file).isDirectory()) target = join(target, "index.html");
        if (!existsSync(join(site, target))) {
          broken.push(`${page}: ${l.attr}="${l.value}" → missing ${target}`);
          continue;
        }
        if (fragment && target.endsWith(".html")) {
          fragments++;
          if (!idsOf(relative(".", target)).has(fragment)) broken.push(`${page}: ${l.attr}="${l.value}" → no id "${fragment}" on ${target}`);
        }
      }
    }
    expect(broken.slice(0, 30)).toEqual([]);
    expect(checked).toBeGreaterThan(1000);
    expect(fragments).toBeGreaterThan(100);
  });

  it("never point at another host", () => {
    const outside: string[] = [];
    for (const page of pages) {
      for (const l of links(readFileSync(join(site, page), "utf8"))) {
        if (/^(https?:)?\/\//i.test(l.value) || /^(ftp|ws|wss):/i.test(l.value)) outside.push(`${page}: <${l.tag} ${l.attr}="${l.value}">`);
      }
    }
    expect(outside).toEqual([]);
  });

  it("carry a Content-Security-Policy that allows only the site itself", () => {
    for (const page of pages) {
      const csp = startTags(readFileSync(join(site, page), "utf8")).find((t) => t.name === "meta" && t.attrs.get("http-equiv")?.toLowerCase() === "content-security-policy");
      expect(csp, page).toBeDefined();
      const policy = csp!.attrs.get("content") ?? "";
      expect(policy, page).toMatch(/default-src 'self'/);
      // No source list names a host, a scheme or a wildcard.
      expect(policy.split(";").flatMap((d) => d.trim().split(/\s+/).slice(1)).filter((s) => !/^'(self|none)'$|^data:$/.test(s)), page).toEqual([]);
    }
  });
});
